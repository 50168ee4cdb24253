package app.latentledger.chart.timeline;

import java.time.LocalDateTime;
import java.time.format.TextStyle;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Time-axis ticks that follow the zoom: days for a week, hours for a day, minutes for a cycle, at
 * clock-friendly steps (1, 2, 5, 10, 15, 30 min; 1, 2, 3, 6, 12 h; 1, 2 days). Common practice, no
 * source.
 */
public final class TimeTicks {
    static final double[] STEPS_S = {60, 120, 300, 600, 900, 1800, 3600, 7200, 10_800, 21_600, 43_200, 86_400,
        172_800};

    /** A tick at {@code timeS} with its label; {@code major} ticks fall on midnight. */
    public record Tick(double timeS, String label, boolean major) { }

    private TimeTicks() {
    }

    /** The smallest step that leaves at least {@code minPixels} between ticks. */
    public static double step(TimeViewport vp, double minPixels) {
        for (double s : STEPS_S) {
            if (s / vp.spanS() * vp.width() >= minPixels) {
                return s;
            }
        }
        return STEPS_S[STEPS_S.length - 1];
    }

    /** Ticks aligned to the wall clock when {@code startLocal} is known, else to whole elapsed steps. */
    public static List<Tick> ticks(TimeViewport vp, LocalDateTime startLocal, double minPixels) {
        double step = step(vp, minPixels);
        // seconds of the local day at t = 0, so ticks land on :00, :15, midnight...
        double offset = startLocal == null ? 0 : startLocal.toLocalTime().toSecondOfDay();
        List<Tick> out = new ArrayList<>();
        long first = (long) Math.ceil((vp.startS() + offset) / step - 1e-9);
        long last = (long) Math.floor((vp.endS() + offset) / step + 1e-9);
        for (long k = first; k <= last; k++) {
            double t = k * step - offset;
            boolean midnight = Math.floorMod(Math.round(t + offset), 86_400L) == 0;
            out.add(new Tick(t, label(t, startLocal, step, midnight), midnight));
        }
        return out;
    }

    static String label(double t, LocalDateTime startLocal, double step, boolean midnight) {
        if (startLocal == null) {
            long s = Math.round(t);
            long day = Math.floorDiv(s, 86_400L);
            long rest = Math.floorMod(s, 86_400L);
            String clock = String.format(Locale.ROOT, "%02d:%02d", rest / 3600, rest % 3600 / 60);
            return step >= 86_400 || rest == 0 ? "day " + (day + 1) : clock;
        }
        LocalDateTime at = startLocal.plusSeconds(Math.round(t));
        if (step >= 86_400 || midnight) {
            return at.getDayOfWeek().getDisplayName(TextStyle.SHORT, Locale.ENGLISH) + " " + at.getDayOfMonth();
        }
        return String.format(Locale.ROOT, "%02d:%02d", at.getHour(), at.getMinute());
    }
}
