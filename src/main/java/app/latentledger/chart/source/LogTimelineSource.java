package app.latentledger.chart.source;

import app.latentledger.chart.timeline.CycleMark;
import app.latentledger.chart.timeline.TimelineData;
import app.latentledger.core.cycles.AirSeries;
import app.latentledger.core.cycles.Channel;
import app.latentledger.core.cycles.CycleSeries;
import app.latentledger.core.cycles.Cycle;
import app.latentledger.core.cycles.CycleResult;
import app.latentledger.core.cycles.LogSeries;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.units.UnitSystem;

import java.time.Instant;
import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A logged series and its cycle analysis as the timeline draws them: the one place the timeline
 * learns from the analysis. The humidity lines are the series the analysis used (after any probe
 * correction); relay bands are the compressor and blower state per sample as the analysis took them
 * (status columns when logged, else the runs and blower stops it inferred).
 */
public final class LogTimelineSource {
    private LogTimelineSource() {
    }

    /**
     * @param pressurePa kept for callers; the per-sample air comes from the report, as analysed
     */
    public static TimelineData timeline(LogSeries log, RunCycleReport report, double pressurePa, UnitSystem units,
                                        String title) {
        int n = log.size();
        double[] time = new double[n];
        for (int i = 0; i < n; i++) {
            time[i] = log.timeS(i);
        }
        // the series the analysis used (after any probe correction), never worked out a second time
        CycleSeries used = report.series();
        AirSeries air = used.air();
        double[] returnW = orNaN(air.returnHumidityRatio(), n);
        double[] supplyW = orNaN(air.supplyHumidityRatio(), n);
        boolean[] compressor = new boolean[n];
        boolean[] blower = new boolean[n];
        boolean compressorColumn = log.has(Channel.COMPRESSOR);
        for (int i = 0; i < n; i++) {
            compressor[i] = compressorColumn ? log.status(Channel.COMPRESSOR, i) == 1 : used.compressorOn(i);
            blower[i] = used.blowerOn(i);
        }
        List<CycleMark> marks = new ArrayList<>();
        for (CycleResult c : report.cycles()) {
            Cycle cy = c.cycle();
            double onEnd = cy.startS() + cy.onSeconds();
            double end = Math.max(onEnd, cy.startS() + cy.onSeconds() + cy.offSeconds());
            double onset = c.moisture().wet() && Double.isFinite(c.moisture().onsetS())
                    ? cy.startS() + c.moisture().onsetS() : Double.NaN;
            marks.add(new CycleMark(cy.startS(), onEnd, end, c.removedKg(), c.returnedKg(), onset,
                    app.latentledger.core.cycles.RestBlower.sentence(cy)));
        }
        LocalDateTime start = log.origin() == null ? null : LocalDateTime.ofInstant(
                Instant.ofEpochSecond((long) Math.floor(log.origin().firstEpochSecond())),
                ZoneOffset.ofTotalSeconds(log.origin().offsetSeconds()));
        return new TimelineData(units, title, start, time, air.returnDryBulbC(), air.supplyDryBulbC(), returnW, supplyW,
                compressor, blower, marks);
    }

    private static double[] orNaN(double[] values, int n) {
        if (values != null) {
            return values;
        }
        double[] none = new double[n];
        Arrays.fill(none, Double.NaN);
        return none;
    }
}
