package app.latentledger.ui;

import app.latentledger.core.records.VisitPurpose;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.LogAnalysisService;

import java.nio.file.Path;

/** Sessions on a fresh data folder (the Saltreed demo seeded on open), as the app makes them. */
public final class TestSessions {
    private TestSessions() {
    }

    public static AppSession open(Path dir) {
        return AppSession.open(dir, LogAnalysisService.NOT_WIRED);
    }

    /** A session with a new complaint visit started on the demo's Heron Spit Road system. */
    public static AppSession withNewVisit(Path dir) {
        AppSession s = open(dir);
        s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(s::openVisit);
        s.startVisit(s.site(), s.system(), VisitPurpose.COMPLAINT, "Test Tech", "");
        return s;
    }
}
