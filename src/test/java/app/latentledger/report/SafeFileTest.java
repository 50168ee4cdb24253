package app.latentledger.report;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** A write that fails half way leaves neither a partial file nor its temporary file. */
class SafeFileTest {
    @TempDir
    Path dir;

    @Test
    void failureHalfWayLeavesNothing() throws Exception {
        Path out = dir.resolve("r.pdf");
        assertThrows(IllegalStateException.class, () -> VisitReport.SafeFile.write(out, o -> {
            o.write("%PDF-1.7 half a report".getBytes(StandardCharsets.US_ASCII));
            throw new IllegalStateException("layout failed");
        }));
        assertThrows(ReportRefusedException.class, () -> VisitReport.SafeFile.write(out, o -> {
            o.write(1);
            throw new IOException("disk full");
        }));
        assertFalse(Files.exists(out));
        try (var s = Files.list(dir)) {
            assertEquals(List.of(), s.toList());
        }
    }

    @Test
    void completeWriteAppearsWhole() {
        Path out = dir.resolve("r.csv");
        VisitReport.SafeFile.write(out, o -> o.write("a,b\n".getBytes(StandardCharsets.US_ASCII)));
        assertEquals(4, out.toFile().length());
    }
}
