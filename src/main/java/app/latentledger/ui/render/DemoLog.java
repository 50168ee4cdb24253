package app.latentledger.ui.render;

import app.latentledger.core.units.UnitSystem;
import app.latentledger.io.logcsv.ImportProgress;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.LogRequest;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Map;

/**
 * Gives the demo's complaint visit a logger file, so the log screen has cycles to show: the
 * invented field-data sample {@code blower-left-on.csv} (a copy kept as a resource, °C, elapsed
 * seconds), imported the way the log screen imports, once. Only the demo visit is touched.
 */
final class DemoLog {
    static final String RESOURCE = "demo-log.csv";
    static final String FILE_NAME = "blower-left-on.csv";

    private DemoLog() {
    }

    /** Imports the sample into the demo complaint visit unless a log is kept on it already. */
    static void seed(AppSession session) throws Exception {
        var visit = session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT);
        if (visit.isEmpty() || !session.ledger().logs().idsForVisit(visit.get().id()).isEmpty()) {
            return;
        }
        Path tmp = Files.createTempDirectory("latent-ledger-demo-log");
        Path file = tmp.resolve(FILE_NAME);
        try (InputStream in = DemoLog.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IOException("demo log " + RESOURCE + " missing from the build");
            }
            Files.copy(in, file, StandardCopyOption.REPLACE_EXISTING);
            var site = session.ledger().sites().find(visit.get().siteId()).orElseThrow();
            // the sample's own airflow (field-data-samples/README.md): 520 L/s, invented
            LogRequest request = new LogRequest(session.ledger(), visit.get(),
                    app.latentledger.core.psychro.StandardAtmosphere.pressurePa(site.elevationM()), 0.52,
                    UnitSystem.SI, session.thresholds(), Map.of());
            new CycleLogAnalysis().importAndAnalyse(request, file, ImportProgress.NONE);
        } finally {
            Files.deleteIfExists(file);
            Files.deleteIfExists(tmp);
        }
    }
}
