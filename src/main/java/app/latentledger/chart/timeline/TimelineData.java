package app.latentledger.chart.timeline;

import app.latentledger.core.units.UnitSystem;

import java.time.LocalDateTime;
import java.util.List;
import java.util.Objects;

/**
 * A logged system, column by column, as the timeline draws it. The arrays are shared, not copied (a
 * week at 1 Hz is 604,800 samples per column): the caller hands them over and must not change them.
 * NaN marks a missing reading and breaks the line there.
 *
 * @param startLocal wall-clock time of {@code timeS == 0} for clock labels, or null for elapsed time
 * @param timeS      seconds from the start of the log, non-decreasing
 * @param returnDbC  return (entering) dry bulb, °C
 * @param supplyDbC  supply (leaving) dry bulb, °C
 * @param returnW    return humidity ratio, kg/kg
 * @param supplyW    supply humidity ratio, kg/kg
 */
public record TimelineData(UnitSystem units, String title, LocalDateTime startLocal, double[] timeS,
                           double[] returnDbC, double[] supplyDbC, double[] returnW, double[] supplyW,
                           boolean[] compressorOn, boolean[] blowerOn, List<CycleMark> cycles) {

    public TimelineData {
        Objects.requireNonNull(units, "units");
        Objects.requireNonNull(title, "title");
        int n = timeS.length;
        if (n < 2) {
            throw new IllegalArgumentException("a timeline needs at least 2 samples, got " + n);
        }
        checkLength("return dry bulb", returnDbC.length, n);
        checkLength("supply dry bulb", supplyDbC.length, n);
        checkLength("return humidity ratio", returnW.length, n);
        checkLength("supply humidity ratio", supplyW.length, n);
        checkLength("compressor", compressorOn.length, n);
        checkLength("blower", blowerOn.length, n);
        for (int i = 1; i < n; i++) {
            if (!(timeS[i] >= timeS[i - 1])) {
                throw new IllegalArgumentException("time must not run backwards: sample " + i + " is at " + timeS[i]
                        + " s after " + timeS[i - 1] + " s");
            }
        }
        cycles = List.copyOf(cycles);
    }

    private static void checkLength(String column, int length, int expected) {
        if (length != expected) {
            throw new IllegalArgumentException(column + " has " + length + " samples, time has " + expected);
        }
    }

    public int size() {
        return timeS.length;
    }

    public double firstS() {
        return timeS[0];
    }

    public double lastS() {
        return timeS[timeS.length - 1];
    }
}
