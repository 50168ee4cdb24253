package app.latentledger.files;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** A safe write replaces the file whole, or leaves the old one and nothing else behind. */
class SafeFilesTest {
    @TempDir
    Path dir;

    @Test
    void theNewContentsReplaceTheOldWhole() throws IOException {
        Path f = dir.resolve("draft.json");
        Files.writeString(f, "old");
        for (SafeFiles.Durability d : SafeFiles.Durability.values()) {
            SafeFiles.writeAtomically(f, out -> out.write(("new " + d).getBytes(StandardCharsets.UTF_8)), d);
            assertEquals("new " + d, Files.readString(f));
        }
        assertEquals(1, count(), "no temporary file stays behind");
    }

    @Test
    void aFailedWriteLeavesTheOldFileAndNoTemporary() throws IOException {
        Path f = dir.resolve("report.pdf");
        Files.writeString(f, "the report as it was");
        IOException e = assertThrows(IOException.class, () -> SafeFiles.writeAtomically(f, out -> {
            out.write("half a rep".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full");
        }, SafeFiles.Durability.REPLACE_WHOLE));
        assertEquals("disk full", e.getMessage());
        assertEquals("the report as it was", Files.readString(f));
        assertEquals(1, count());
    }

    @Test
    void theFileIsReadableByTheOwnerOnly() throws IOException {
        // drafts, reports and bundles hold customer names and addresses (common practice, no source)
        org.junit.jupiter.api.Assumptions.assumeTrue(dir.getFileSystem().supportedFileAttributeViews().contains("posix"));
        Path f = SafeFiles.writeAtomically(dir.resolve("visit.zip"), out -> out.write(1), SafeFiles.Durability.ON_DISK);
        assertEquals("rw-------", java.nio.file.attribute.PosixFilePermissions.toString(Files.getPosixFilePermissions(f)));
    }

    private long count() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.count();
        }
    }
}
