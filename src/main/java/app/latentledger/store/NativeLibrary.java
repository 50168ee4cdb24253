package app.latentledger.store;

import org.sqlite.util.LibraryLoaderUtil;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * SQLite's native library, unpacked once into the app's own folder instead of into the system's
 * temporary folder on every start. The JDBC driver otherwise writes a fresh 1.1 MB copy per run to
 * {@code java.io.tmpdir} and removes it only on a clean exit, so every killed run left one behind.
 * The copy is named by its SHA-256, so a new driver version gets its own and a damaged or partial
 * copy is never used; it is written to a temporary name and moved into place in one step.
 * Uses the driver's documented {@code org.sqlite.lib.path} / {@code org.sqlite.lib.name} settings.
 */
public final class NativeLibrary {
    static final String PATH_PROPERTY = "org.sqlite.lib.path";
    static final String NAME_PROPERTY = "org.sqlite.lib.name";

    private NativeLibrary() {
    }

    /**
     * Points the driver at the library in {@code appFolder/native/sqlite-<hash>/}, unpacking it
     * there first when it is not there yet. Does nothing when the location is already set (a
     * packaged build, a test) or the library is not in the driver's jar for this platform; when the
     * folder cannot be written the driver's own unpacking is left in place.
     *
     * @return the folder used, or null when the driver's default applies
     */
    public static Path useAppFolder(Path appFolder) {
        if (System.getProperty(PATH_PROPERTY) != null) {
            return null;
        }
        try {
            String name = LibraryLoaderUtil.getNativeLibName();
            String resource = "/" + LibraryLoaderUtil.getNativeLibResourcePath() + "/" + name;
            byte[] bytes;
            try (InputStream in = org.sqlite.JDBC.class.getResourceAsStream(resource.replace("//", "/"))) {
                if (in == null) {
                    return null;
                }
                bytes = in.readAllBytes();
            }
            String hash = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes), 0, 8);
            Path folder = appFolder.resolve("native").resolve("sqlite-" + hash);
            Path lib = folder.resolve(name);
            if (!Files.isRegularFile(lib) || Files.size(lib) != bytes.length) {
                Files.createDirectories(folder);
                Path temp = Files.createTempFile(folder, name, ".part");
                try {
                    Files.write(temp, bytes);
                    Files.move(temp, lib, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
                } finally {
                    Files.deleteIfExists(temp);
                }
            }
            System.setProperty(PATH_PROPERTY, folder.toString());
            System.setProperty(NAME_PROPERTY, name);
            System.setProperty("org.sqlite.tmpdir", folder.toString());
            return folder;
        } catch (IOException | RuntimeException | NoSuchAlgorithmException e) {
            return null;
        }
    }
}
