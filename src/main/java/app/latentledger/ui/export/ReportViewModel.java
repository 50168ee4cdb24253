package app.latentledger.ui.export;

import app.latentledger.core.settings.PaperSize;
import app.latentledger.report.ReportRefusedException;
import app.latentledger.report.VisitDataExport;
import app.latentledger.report.VisitReport;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.concurrent.Executor;

/**
 * The visit's PDF report (alone or compared with an earlier visit) and its open data export
 * (CSV, JSON), written into the data folder's {@code reports} folder off the FX thread, the paper
 * and units from the settings. The status names the file written, or why nothing was.
 */
public final class ReportViewModel {
    private static final System.Logger LOG = System.getLogger(ReportViewModel.class.getName());

    private final AppSession session;
    private final Executor work;
    private final Executor fx;
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper("");
    private final ReadOnlyBooleanWrapper busy = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyBooleanWrapper failed = new ReadOnlyBooleanWrapper(false);
    private final javafx.beans.property.ReadOnlyObjectWrapper<Path> lastFile = new javafx.beans.property.ReadOnlyObjectWrapper<>();

    public ReportViewModel(AppSession session) {
        this(session, Background.worker(), Background.fx());
    }

    /** @param work where the file is written; @param fx where the status is set */
    public ReportViewModel(AppSession session, Executor work, Executor fx) {
        this.session = session;
        this.work = work;
        this.fx = fx;
    }

    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    /** True while a file is being written (the buttons wait). */
    public ReadOnlyBooleanProperty busyProperty() {
        return busy.getReadOnlyProperty();
    }

    /** The last file written (report or data), for the open, print and share buttons; null before any. */
    public javafx.beans.property.ReadOnlyObjectProperty<Path> lastFileProperty() {
        return lastFile.getReadOnlyProperty();
    }

    /** True when the last job wrote nothing. */
    public ReadOnlyBooleanProperty failedProperty() {
        return failed.getReadOnlyProperty();
    }

    public Path folder() {
        return session.dataFolder().resolve("reports");
    }

    /** The report of the visit in hand (its own before/after sets compared when it has them). */
    public void visitReport() {
        String visitId = session.visit().id();
        Path file = file("report", visitId, "pdf");
        run("report", file, () -> VisitReport.write(session.ledger(), visitId, null, paper(), session.units(), file));
    }

    /**
     * The before/after report of the visit in hand against the visit of an earlier reading set; when
     * that set is on the same visit, the visit's own report already compares its sets.
     */
    public void beforeAfterReport(String earlierVisitId) {
        String visitId = session.visit().id();
        String other = earlierVisitId == null || earlierVisitId.equals(visitId) ? null : earlierVisitId;
        Path file = file("before-after", visitId, "pdf");
        run("before/after report", file,
                () -> VisitReport.write(session.ledger(), visitId, other, paper(), session.units(), file));
    }

    public void csvData() {
        dataExport(VisitDataExport.Format.CSV);
    }

    public void jsonData() {
        dataExport(VisitDataExport.Format.JSON);
    }

    public void dataExport(VisitDataExport.Format format) {
        String visitId = session.visit().id();
        Path file = file("data", visitId, format.key());
        run(format.key().toUpperCase(Locale.ROOT) + " data", file,
                () -> VisitDataExport.write(session.ledger(), visitId, format, session.units(), file));
    }

    private PaperSize paper() {
        return session.settings().paper();
    }

    private Path file(String what, String visitId, String extension) {
        return folder().resolve(slug(session.site().name()) + "-" + what + "-" + LocalDate.now() + "-"
                + visitId.substring(0, Math.min(8, visitId.length())) + "." + extension);
    }

    /**
     * What the tech reads when no file was written: the report's own refusal as it is; anything
     * else as a plain sentence, with the technical details kept in the app's log, never on screen.
     */
    static String failure(String what, Path file, Path folder, Exception e) {
        String start = "No " + what + " written (" + file.getFileName() + "): ";
        if (e instanceof ReportRefusedException) {
            return start + e.getMessage();
        }
        LOG.log(System.Logger.Level.ERROR, "writing the " + what + " " + file + " failed", e);
        if (e instanceof IOException) {
            return start + "the folder " + folder + " could not be written. Check the free space and try again.";
        }
        return start + "something went wrong while making it. Nothing saved was changed; the details are in"
                + " the app's log.";
    }

    private void run(String what, Path file, Callable<Path> job) {
        if (busy.get()) {
            return;
        }
        busy.set(true);
        failed.set(false);
        status.set("Writing the " + what + "…");
        work.execute(() -> {
            String message;
            boolean bad;
            Path done = null;
            try {
                Files.createDirectories(folder());
                Path written = job.call();
                done = written;
                message = "Saved the " + what + ": " + written.getFileName() + " in " + folder();
                bad = false;
            } catch (Exception e) {
                message = failure(what, file, folder(), e);
                bad = true;
            }
            String shown = message;
            boolean refused = bad;
            Path writtenFile = done;
            fx.execute(() -> {
                if (writtenFile != null) {
                    lastFile.set(writtenFile);
                }
                status.set(shown);
                failed.set(refused);
                busy.set(false);
            });
        });
    }

    static String slug(String s) {
        String t = s.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("(^-|-$)", "");
        return t.isEmpty() ? "site" : t;
    }
}
