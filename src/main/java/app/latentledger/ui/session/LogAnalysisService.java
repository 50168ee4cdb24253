package app.latentledger.ui.session;

import app.latentledger.io.logcsv.ImportProgress;

import java.nio.file.Path;
import java.util.Optional;
import java.util.ServiceLoader;

/**
 * The log screen's only way into log import and cycle analysis, so the screen does not depend on
 * how logs are parsed. {@link #find} gives the build's implementation (the one registered as a
 * service in {@code META-INF/services/app.latentledger.ui.session.LogAnalysisService}, else the
 * fallback the app passes, {@code ui.log.CycleLogAnalysis}); {@link #NOT_WIRED} is a stand-in for
 * tests of the screen without the analysis. It lives with the session, not with the log screen, so
 * the session imports no screen.
 */
public interface LogAnalysisService {
    /** False for a stand-in without log analysis; the screen then says so. */
    boolean wired();

    /**
     * Imports the log file, keeps it with the visit and analyses its cycles. Runs off the FX thread.
     *
     * @param progress told how far the import has got (0–1), on the calling thread
     * @throws Exception with a message for the tech (file unreadable, columns not recognised, …)
     */
    LogAnalysis importAndAnalyse(LogRequest request, Path file, ImportProgress progress) throws Exception;

    /**
     * The visit's latest kept log, analysed again (so a reopened visit shows it); empty when the
     * visit has none.
     *
     * @throws Exception with a message for the tech when the kept log cannot be analysed
     */
    Optional<LogAnalysis> latestKept(LogRequest request) throws Exception;

    /**
     * One of the visit's kept logs, by id, analysed again with what it was kept with; empty when the
     * visit has no log of that id (deleted meanwhile).
     *
     * @throws Exception with a message for the tech when the kept log cannot be analysed
     */
    Optional<LogAnalysis> kept(LogRequest request, String logId) throws Exception;

    /** What the log screen says when the build has no log analysis. */
    String NOT_WIRED_MESSAGE = "Log analysis arrives in a later build: this build can keep"
            + " readings but cannot read a logger file yet.";

    /** The implementation registered with {@link ServiceLoader}, else {@code fallback}. */
    static LogAnalysisService find(LogAnalysisService fallback) {
        return ServiceLoader.load(LogAnalysisService.class).findFirst().orElse(fallback);
    }

    /** A stand-in without log analysis (screen tests). */
    LogAnalysisService NOT_WIRED = new LogAnalysisService() {
        @Override
        public boolean wired() {
            return false;
        }

        @Override
        public LogAnalysis importAndAnalyse(LogRequest request, Path file, ImportProgress progress) {
            throw new UnsupportedOperationException(NOT_WIRED_MESSAGE);
        }

        @Override
        public Optional<LogAnalysis> latestKept(LogRequest request) {
            return Optional.empty();
        }

        @Override
        public Optional<LogAnalysis> kept(LogRequest request, String logId) {
            return Optional.empty();
        }
    };
}
