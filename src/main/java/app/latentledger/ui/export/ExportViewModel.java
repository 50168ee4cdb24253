package app.latentledger.ui.export;

import app.latentledger.bundle.Bundles;
import app.latentledger.ui.session.AppSession;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;

/**
 * The export screen: writes the visit (or the whole site) as a bundle into the data folder's
 * {@code exports} folder, where the tablet's file sharing can pick it up; and, through
 * {@link #reports()}, the visit's PDF report and open data export into {@code reports}.
 */
public final class ExportViewModel {
    private final AppSession session;
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper("");
    /** The bundle last written from this screen, for its Open/Share bar; null until one is. */
    private final javafx.beans.property.ReadOnlyObjectWrapper<Path> lastBundle =
            new javafx.beans.property.ReadOnlyObjectWrapper<>();
    private final ReportViewModel reports;

    public ExportViewModel(AppSession session) {
        this(session, new ReportViewModel(session));
    }

    public ExportViewModel(AppSession session, ReportViewModel reports) {
        this.session = session;
        this.reports = reports;
    }

    /** The visit's PDF report and its CSV/JSON data, beside the bundle. */
    /** Opens the Record screen: the customer's words, work done, instruments, sign-off, recycle bin. */
    public void openRecord() {
        session.screenProperty().set(app.latentledger.ui.session.Screen.RECORD);
    }

    public ReportViewModel reports() {
        return reports;
    }

    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    public javafx.beans.property.ReadOnlyObjectProperty<Path> lastBundleProperty() {
        return lastBundle.getReadOnlyProperty();
    }

    /** The folder bundles are written to. */
    public Path folder() {
        return session.dataFolder().resolve("exports");
    }

    /** Exports the current visit; returns the file or null when it failed (status says why). */
    public Path exportVisit() {
        return export("visit", session.visit().id(), true);
    }

    public Path exportSite() {
        return export("site", session.site().id(), false);
    }

    private Path export(String what, String id, boolean visit) {
        try {
            Files.createDirectories(folder());
            String name = slug(session.site().name()) + "-" + what + "-" + LocalDate.now() + "-"
                    + id.substring(0, Math.min(8, id.length())) + ".zip";
            Path file = folder().resolve(name);
            if (visit) {
                Bundles.exportVisit(session.ledger(), id, file);
            } else {
                Bundles.exportSite(session.ledger(), id, file);
            }
            status.set("Saved " + file.getFileName() + " in " + folder());
            lastBundle.set(file);
            return file;
        } catch (IOException | RuntimeException e) {
            status.set("Not exported: " + e.getMessage());
            return null;
        }
    }

    private static String slug(String s) {
        String t = s.toLowerCase(java.util.Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("(^-|-$)", "");
        return t.isEmpty() ? "site" : t;
    }
}
