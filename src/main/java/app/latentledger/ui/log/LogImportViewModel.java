package app.latentledger.ui.log;

import app.latentledger.core.findings.Cautions;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.ui.AppSession;
import app.latentledger.ui.results.FindingCard;
import app.latentledger.ui.results.Row;
import app.latentledger.ui.results.VisitResults;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The log screen: a log file to import into the visit, then its cycle summary and findings, all
 * from the {@link LogAnalysisService} the session was given.
 */
public final class LogImportViewModel {
    public static final String NOT_WIRED_MESSAGE = "Log analysis arrives in a later build: this build can keep"
            + " readings but cannot read a logger file yet.";

    private final AppSession session;
    private final StringProperty file = new SimpleStringProperty("");
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper("");
    private final ObservableList<Row> summary = FXCollections.observableArrayList();
    private final ObservableList<FindingCard> findings = FXCollections.observableArrayList();
    private final ObservableList<String> imported = FXCollections.observableArrayList();

    public LogImportViewModel(AppSession session) {
        this.session = session;
        session.visitProperty().addListener((o, a, b) -> refresh());
        refresh();
    }

    public boolean wired() {
        return session.logAnalysis().wired();
    }

    /** The path of the file to import, as typed or picked. */
    public StringProperty fileProperty() {
        return file;
    }

    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    public ObservableList<Row> summary() {
        return summary;
    }

    public ObservableList<FindingCard> findings() {
        return findings;
    }

    /** Logs already kept on this visit, as "file name (n samples)". */
    public ObservableList<String> imported() {
        return imported;
    }

    /** Imports and analyses the chosen file. */
    public void importFile() {
        if (!wired()) {
            status.set(NOT_WIRED_MESSAGE);
            return;
        }
        String f = file.get() == null ? "" : file.get().strip();
        if (f.isEmpty() || !Files.isRegularFile(Path.of(f))) {
            status.set("Choose a log file first" + (f.isEmpty() ? "." : ": " + f + " is not a file."));
            return;
        }
        try {
            LogAnalysis a = session.logAnalysis().importAndAnalyse(session.ledger(), Path.of(f), session.visit(), session.system(),
                    session.units());
            summary.setAll(a.summary());
            findings.clear();
            for (Finding x : a.findings()) {
                findings.add(VisitResults.card(x, session.units()));
            }
            status.set("Imported " + a.source() + ". " + Cautions.SAFETY_LINE);
            refresh();
        } catch (Exception e) {
            status.set("Not imported: " + e.getMessage());
        }
    }

    private void refresh() {
        imported.clear();
        if (session.visit() == null) {
            return;
        }
        for (ImportedLog l : session.ledger().logs().forVisit(session.visit().id())) {
            imported.add(l.sourceFileName());
        }
        if (!wired()) {
            status.set(NOT_WIRED_MESSAGE);
        }
    }
}
