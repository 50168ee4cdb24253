package app.latentledger.core.cycles;

import java.util.List;
import java.util.Locale;

/**
 * What the blower did in one rest, in the words a tech uses, read from the one blower record of the
 * rest ({@link Cycle#offBlower()} and {@link Cycle#blowerOnSeconds()}, themselves from the blower's
 * status column or the air): the cycle table, the summary and the findings all count rests through
 * this, so they cannot disagree.
 *
 * <ul>
 *   <li>{@link #LEFT_ON}: the blower ran through (most of) the rest — thermostat fan ON, continuous fan;
 *   <li>{@link #RAN_ON}: the blower stopped by itself after running on for a while once the compressor
 *       stopped — a fan-off delay;
 *   <li>{@link #STOPPED}: the blower stopped with the compressor;
 *   <li>{@link #UNKNOWN}: the log cannot tell.
 * </ul>
 * The split between left on and ran on is the detector's: running for at least half the rest is left on
 * (see {@link CycleDetector}).
 */
public enum RestBlower {
    LEFT_ON, RAN_ON, STOPPED, UNKNOWN;

    /** "left-on" | "ran-on" | "off" | "unknown", as in the log command's JSON. */
    public String key() {
        return this == STOPPED ? "off" : name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** The blower in the rest of this cycle. */
    public static RestBlower of(Cycle c) {
        return switch (c.offBlower()) {
            case ON -> LEFT_ON;
            case UNKNOWN -> UNKNOWN;
            case OFF -> c.blowerOnSeconds() > 0 ? RAN_ON : STOPPED;
        };
    }

    /** Rests of these cycles with this blower behaviour. */
    public static int count(List<CycleResult> cycles, RestBlower which) {
        return (int) cycles.stream().filter(c -> of(c.cycle()) == which).count();
    }

    /**
     * Median blower time in the rests of this kind, s (NaN when none): for {@link #RAN_ON} the fan-off
     * delay, for {@link #LEFT_ON} how long the blower ran in a rest it was left on through.
     */
    public static double medianBlowerS(List<CycleResult> cycles, RestBlower which) {
        double[] v = cycles.stream().filter(c -> of(c.cycle()) == which)
                .mapToDouble(c -> c.cycle().blowerOnSeconds()).toArray();
        return Stats.median(v, v.length);
    }

    /**
     * The cycle table's blower cell: "left on", "ran on 180 s", "off with comp." or "unknown". Short
     * enough for a table column; the summary and the findings use the same words at length.
     */
    public static String cell(Cycle c) {
        return switch (of(c)) {
            case LEFT_ON -> "left on";
            case RAN_ON -> String.format(Locale.ROOT, "ran on %.0f s", c.blowerOnSeconds());
            case STOPPED -> "off";
            case UNKNOWN -> "unknown";
        };
    }

    /** The same at length, for a readout of one cycle: "Blower left on through the rest" and so on. */
    public static String sentence(Cycle c) {
        return switch (of(c)) {
            case LEFT_ON -> "Blower left on through the rest";
            case RAN_ON -> String.format(Locale.ROOT, "Blower ran on %.0f s after the compressor, then stopped",
                    c.blowerOnSeconds());
            case STOPPED -> "Blower stopped with the compressor";
            case UNKNOWN -> "Blower in the rest not known";
        };
    }

    /** "31 of 31 rests" style count for the summary. */
    public static String ofRests(int n, int rests) {
        return (n == 0 ? "none" : String.valueOf(n)) + " of " + rests + (rests == 1 ? " rest" : " rests");
    }
}
