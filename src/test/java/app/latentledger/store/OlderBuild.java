package app.latentledger.store;

import app.latentledger.core.records.ImportedLog;

/** Writes what an older build could store before today's record rules applied. */
public final class OlderBuild {
    private OlderBuild() {
    }

    public static void saveLog(Ledger ledger, ImportedLog log) {
        ledger.logs().saveUnchecked(log);
    }
}
