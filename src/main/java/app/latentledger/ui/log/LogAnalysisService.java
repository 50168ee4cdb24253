package app.latentledger.ui.log;

import app.latentledger.io.logcsv.ImportProgress;

import java.nio.file.Path;
import java.util.Optional;

/**
 * The log screen's only way into log import and cycle analysis, so the screen does not depend on
 * how logs are parsed. {@link #find()} gives the build's implementation ({@link CycleLogAnalysis},
 * unless another is registered as a service in
 * {@code META-INF/services/app.latentledger.ui.log.LogAnalysisService}); {@link #NOT_WIRED} is a
 * stand-in for tests of the screen without the analysis.
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

    /** The implementation registered with {@link java.util.ServiceLoader}, else {@link CycleLogAnalysis}. */
    static LogAnalysisService find() {
        return java.util.ServiceLoader.load(LogAnalysisService.class).findFirst().orElse(new CycleLogAnalysis());
    }

    /** A stand-in without log analysis (screen tests). */
    LogAnalysisService NOT_WIRED = new LogAnalysisService() {
        @Override
        public boolean wired() {
            return false;
        }

        @Override
        public LogAnalysis importAndAnalyse(LogRequest request, Path file, ImportProgress progress) {
            throw new UnsupportedOperationException(LogImportViewModel.NOT_WIRED_MESSAGE);
        }

        @Override
        public Optional<LogAnalysis> latestKept(LogRequest request) {
            return Optional.empty();
        }
    };
}
