package app.latentledger.chart.source;

import app.latentledger.chart.timeline.CycleMark;
import app.latentledger.chart.timeline.TimelineData;
import app.latentledger.core.cycles.AirSeries;
import app.latentledger.core.cycles.BlowerState;
import app.latentledger.core.cycles.Channel;
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
 * learns from the analysis. Relay bands come from the log's status columns when it has them, and
 * otherwise from the cycles the analysis found (so an inferred run shows as inferred timing).
 */
public final class LogTimelineSource {
    private LogTimelineSource() {
    }

    public static TimelineData timeline(LogSeries log, RunCycleReport report, double pressurePa, UnitSystem units,
                                        String title) {
        int n = log.size();
        double[] time = new double[n];
        for (int i = 0; i < n; i++) {
            time[i] = log.timeS(i);
        }
        AirSeries air = AirSeries.of(log, pressurePa);
        double[] returnW = orNaN(air.returnHumidityRatio(), n);
        double[] supplyW = orNaN(air.supplyHumidityRatio(), n);
        boolean[] compressor = new boolean[n];
        boolean[] blower = new boolean[n];
        boolean compressorColumn = log.has(Channel.COMPRESSOR);
        boolean fanColumn = log.has(Channel.FAN);
        for (int i = 0; i < n; i++) {
            compressor[i] = compressorColumn && log.status(Channel.COMPRESSOR, i) == 1;
            blower[i] = fanColumn && log.status(Channel.FAN, i) == 1;
        }
        List<CycleMark> marks = new ArrayList<>();
        for (CycleResult c : report.cycles()) {
            Cycle cy = c.cycle();
            if (!compressorColumn) {
                Arrays.fill(compressor, cy.startIndex(), Math.min(cy.stopIndex(), n), true);
            }
            if (!fanColumn) {
                Arrays.fill(blower, cy.startIndex(), Math.min(cy.stopIndex(), n), true);
                if (cy.offBlower() == BlowerState.ON && Double.isFinite(cy.blowerOnSeconds())) {
                    double until = cy.startS() + cy.onSeconds() + cy.blowerOnSeconds();
                    for (int i = cy.stopIndex(); i < Math.min(cy.endIndex(), n) && time[i] <= until; i++) {
                        blower[i] = true;
                    }
                }
            }
            double onEnd = cy.startS() + cy.onSeconds();
            double end = Math.max(onEnd, cy.startS() + cy.onSeconds() + cy.offSeconds());
            double onset = c.moisture().wet() && Double.isFinite(c.moisture().onsetS())
                    ? cy.startS() + c.moisture().onsetS() : Double.NaN;
            marks.add(new CycleMark(cy.startS(), onEnd, end, c.removedKg(), c.returnedKg(), onset));
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
