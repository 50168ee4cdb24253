package app.latentledger.report;

import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.files.SafeFiles;
import app.latentledger.store.Ledger;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;

/**
 * The visit report as a PDF: the API the command line and the app's visit and compare views call.
 * Runs without a display ({@code java.awt.headless=true}, no JavaFX): the charts are painted as
 * vectors straight into the PDF.
 *
 * <p>Nothing is left behind on failure: the PDF is written to a temporary file in the target
 * folder and moved into place only when complete.
 */
public final class VisitReport {
    private VisitReport() {
    }

    /**
     * Writes the report of {@code visitId} (compared with {@code compareVisitIdOrNull} when given) to
     * {@code output}, replacing a file already there.
     *
     * @param visitId              exact visit id
     * @param compareVisitIdOrNull exact id of another visit, or null for a one-visit report
     * @param paper                page size
     * @param units                display units
     * Each worked-out reading set of the report is kept as a results snapshot once the file is
     * written ({@link ReportSnapshots}).
     *
     * @return the file written
     * @throws ReportRefusedException for an unknown visit, a visit compared with itself, or an output
     *                                path that cannot be written (missing folder, a folder, no permission)
     */
    public static Path write(Ledger ledger, String visitId, String compareVisitIdOrNull, PaperSize paper, UnitSystem units,
                             Path output) {
        ReportData data = ReportData.load(ledger, visitId, compareVisitIdOrNull, units);
        OffsetDateTime now = OffsetDateTime.now(data.latest().visit().startedAt().getOffset());
        Path written = SafeFile.write(output, out -> ReportDocument.write(data, paper, now, out));
        // what the customer was given is kept with the readings, whatever a later version computes
        ReportSnapshots.keep(ledger, data, now);
        return written;
    }

    /** As {@link #write}, into a stream (the caller owns it); for previews and tests. */
    public static void write(Ledger ledger, String visitId, String compareVisitIdOrNull, PaperSize paper, UnitSystem units,
                             OutputStream out) throws IOException {
        ReportData data = ReportData.load(ledger, visitId, compareVisitIdOrNull, units);
        ReportDocument.write(data, paper, OffsetDateTime.now(data.latest().visit().startedAt().getOffset()), out);
    }

    /** Refuses a target the tech cannot have meant, then writes through {@link SafeFiles}. */
    static final class SafeFile {
        interface Body {
            void write(OutputStream out) throws IOException;
        }

        private SafeFile() {
        }

        static Path write(Path output, Body body) {
            Path target = output.toAbsolutePath().normalize();
            Path folder = target.getParent();
            if (folder == null || !Files.isDirectory(folder)) {
                throw new ReportRefusedException("cannot write " + output + ": folder " + folder + " does not exist");
            }
            if (Files.isDirectory(target)) {
                throw new ReportRefusedException("cannot write " + output + ": it is a folder; give a file name");
            }
            try {
                return SafeFiles.writeAtomically(target, body::write, SafeFiles.Durability.REPLACE_WHOLE);
            } catch (AccessDeniedException | SecurityException e) {
                throw new ReportRefusedException("cannot write " + output + ": no permission to create files in "
                        + folder, e);
            } catch (IOException e) {
                throw new ReportRefusedException("cannot write " + output + ": " + e.getMessage(), e);
            }
        }
    }
}
