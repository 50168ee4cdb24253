package app.latentledger.files;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileAttribute;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The hidden temporary file a report, data export or bundle is written to before it is moved over
 * its target in one step. Its name carries the writing process's id
 * ({@code .<target>.<pid>-<random>.part}), so the next write into that folder removes what a
 * killed run left behind (a process id that is no longer running) and never touches a file
 * another running export is still writing.
 *
 * <p>Permissions: the temporary file, and so the file it becomes, is created {@code rw-------}:
 * reports, data exports and bundles hold customer names, addresses and notes, so they are
 * readable by the tech's own account only, whatever the umask (docs/data-export.md).
 */
public final class TempFiles {
    private static final Pattern OURS = Pattern.compile("\\.(.+)\\.(\\d+)-\\d+\\.part");

    private TempFiles() {
    }

    /** Creates the private temporary file for {@code target}, after removing stale ones of killed runs. */
    public static Path beside(Path target) throws IOException {
        Path folder = target.toAbsolutePath().getParent();
        String name = target.getFileName().toString();
        cleanStale(folder, name);
        String prefix = "." + name + "." + ProcessHandle.current().pid() + "-";
        if (folder.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            FileAttribute<?> privateFile = PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString("rw-------"));
            return Files.createTempFile(folder, prefix, ".part", privateFile);
        }
        return Files.createTempFile(folder, prefix, ".part");
    }

    /** Removes temporary files for {@code name} in {@code folder} left by processes no longer running. */
    static int cleanStale(Path folder, String name) {
        int removed = 0;
        try (DirectoryStream<Path> files = Files.newDirectoryStream(folder, "." + globSafe(name) + ".*.part")) {
            for (Path f : files) {
                Matcher m = OURS.matcher(f.getFileName().toString());
                if (!m.matches() || !m.group(1).equals(name)) {
                    continue;
                }
                long pid = Long.parseLong(m.group(2));
                if (pid != ProcessHandle.current().pid() && ProcessHandle.of(pid).isEmpty() && Files.deleteIfExists(f)) {
                    removed++;
                }
            }
        } catch (IOException | RuntimeException e) {
            // cleaning is a courtesy: a folder we cannot list is reported by the write itself
        }
        return removed;
    }

    private static String globSafe(String name) {
        return name.replaceAll("([\\\\*?\\[\\]{}])", "\\\\$1");
    }
}
