package app.latentledger.ui.log;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Visit;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.Ledger;

import java.nio.file.Path;

/**
 * The log screen's only way into log import and cycle analysis, so the screen does not depend on
 * how logs are parsed. The app starts with {@link #NOT_WIRED}; the build that carries the cycle
 * analysis registers its implementation as a service
 * ({@code META-INF/services/app.latentledger.ui.log.LogAnalysisService}, found by
 * {@link #find()}), or passes it to {@code AppSession} directly.
 */
public interface LogAnalysisService {
    /** False while this build has no log analysis; the screen then says so. */
    boolean wired();

    /**
     * Imports the log file into the visit and analyses its cycles.
     *
     * @throws Exception with a message for the tech (file unreadable, columns not recognised, …)
     */
    LogAnalysis importAndAnalyse(Ledger ledger, Path file, Visit visit, HvacSystem system, UnitSystem units)
            throws Exception;

    /** The implementation registered with {@link java.util.ServiceLoader}, else {@link #NOT_WIRED}. */
    static LogAnalysisService find() {
        return java.util.ServiceLoader.load(LogAnalysisService.class).findFirst().orElse(NOT_WIRED);
    }

    /** The stand-in until the cycle analysis is wired in. */
    LogAnalysisService NOT_WIRED = new LogAnalysisService() {
        @Override
        public boolean wired() {
            return false;
        }

        @Override
        public LogAnalysis importAndAnalyse(Ledger ledger, Path file, Visit visit, HvacSystem system,
                                           UnitSystem units) {
            throw new UnsupportedOperationException(LogImportViewModel.NOT_WIRED_MESSAGE);
        }
    };
}
