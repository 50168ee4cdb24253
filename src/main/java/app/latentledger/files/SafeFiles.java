package app.latentledger.files;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * The one way the app writes a file it must never leave half-written: the draft the tech is
 * typing, a PDF report, a bundle. The body goes to a hidden temporary file in the target's folder,
 * which then replaces the target in one move, so a reader (or a crash) sees the old file or the new
 * one, never a mix; a failed write leaves the old file as it was and no temporary behind.
 *
 * <p>The move is atomic where the file system offers it (POSIX rename, NTFS MoveFileEx); where it
 * does not, the file is replaced in place after it was written whole. What {@link Durability} adds
 * is chosen per caller on purpose.
 */
public final class SafeFiles {
    /** How hard a write tries to survive a power cut, not just a crash of the app. */
    public enum Durability {
        /**
         * Moved into place whole, but the operating system may still hold the data in its cache
         * when the call returns: for files that can be made again (reports, bundles).
         */
        REPLACE_WHOLE,
        /**
         * As {@link #REPLACE_WHOLE}, and forced to the disk, data and the folder's entry, before the
         * call returns: for what the tech typed and nothing else holds (the draft).
         */
        ON_DISK
    }

    /** Writes the file's contents. */
    @FunctionalInterface
    public interface Body {
        void write(OutputStream out) throws IOException;
    }

    private SafeFiles() {
    }

    /**
     * Writes {@code body} to {@code target}, replacing it whole. The folder must exist. The file is
     * readable by the tech's account only (rw------- where permissions are POSIX): drafts, reports,
     * exports and bundles hold customer names, addresses and notes. The temporary file is named for
     * this process, so a killed run's leftover is removed by the next write ({@link TempFiles}).
     *
     * @return the absolute target
     * @throws IOException when the folder cannot take the file; the old file is then unchanged
     */
    public static Path writeAtomically(Path target, Body body, Durability durability) throws IOException {
        Path absolute = target.toAbsolutePath().normalize();
        Path folder = absolute.getParent();
        Path temp = TempFiles.beside(absolute);
        boolean moved = false;
        try {
            try (OutputStream out = Files.newOutputStream(temp)) {
                body.write(out);
            }
            if (durability == Durability.ON_DISK) {
                try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.WRITE)) {
                    ch.force(true);
                }
            }
            try {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
            moved = true;
            if (durability == Durability.ON_DISK) {
                forceFolder(folder);
            }
            return absolute;
        } finally {
            if (!moved) {
                Files.deleteIfExists(temp);
            }
        }
    }

    private static void forceFolder(Path folder) {
        try (FileChannel dir = FileChannel.open(folder, StandardOpenOption.READ)) {
            dir.force(true);
        } catch (IOException ignored) {
            // some platforms cannot open a folder for syncing; the rename is still atomic there
        }
    }
}
