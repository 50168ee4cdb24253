package app.latentledger.report;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;

/**
 * What changed between the before and after readings, one figure per row.
 *
 * <p>Change Δ = after − before. Its expanded uncertainty (k = 2) is the root sum of squares of the
 * two expanded uncertainties, U(Δ) = √(U_b² + U_a²): the GUM's law of propagation for a difference
 * of uncorrelated estimates (JCGM 100:2008, eq. 10). The two sets usually share instruments, whose
 * fixed offsets partly cancel in a difference, so treating them as independent errs on the wide
 * (cautious) side. A change is "clear" when |Δ| &gt; U(Δ), otherwise "within uncertainty". Log
 * figures (cycles per hour, latent fraction) carry no uncertainty estimate and get none here.
 *
 * @param key      stable key for the export, e.g. "moistureRemoval"
 * @param label    what a homeowner or tech calls it
 * @param quantity how it is shown
 * @param before   value before, SI, with U (NaN U when none)
 * @param after    value after, SI, with U
 * @param better   +1 when a rise is an improvement, −1 when a fall is, 0 when neither
 * @param decimals decimals shown
 */
public record Improvement(String key, String label, Quantity quantity, Estimate before, Estimate after, int better,
                          int decimals) {

    /** The figures page 1 shows; the technical pages show every row. */
    public boolean onSummary() {
        return !key.equals("indoorRelativeHumidity") && !key.equals("supplyDewPoint");
    }

    public double changeSi() {
        return after.valueSi() - before.valueSi();
    }

    /** U(Δ), k = 2; NaN when either side has no uncertainty. */
    public double changeUncertaintySi() {
        return Math.hypot(before.expandedSi(), after.expandedSi());
    }

    /** |Δ| beyond U(Δ). */
    public boolean clear() {
        double u = changeUncertaintySi();
        return Double.isFinite(changeSi()) && Double.isFinite(u) && Math.abs(changeSi()) > u;
    }

    /** "better", "worse", "no clear change" or "" (for figures where neither direction is better). */
    public String verdict() {
        if (!Double.isFinite(changeSi())) {
            return "";
        }
        boolean assessable = Double.isFinite(changeUncertaintySi());
        if (assessable && !clear()) {
            return "no clear change";
        }
        if (better == 0 || changeSi() == 0) {
            return assessable ? "changed" : "";
        }
        return Math.signum(changeSi()) == better ? "better" : "worse";
    }

    /** The rows of a before/after pair, coil figures first, then log figures when both sides have a log. */
    public static List<Improvement> of(BeforeAfter pair, UnitSystem units) {
        CoilResult b = pair.before().result();
        CoilResult a = pair.after().result();
        List<Improvement> rows = new ArrayList<>();
        rows.add(coil("moistureRemoval", Measurand.MOISTURE_REMOVAL.title(units) + " while running",
                Measurand.MOISTURE_REMOVAL, b, a, +1, units));
        rows.add(coil("latent", "Latent (drying) capacity", Measurand.LATENT, b, a, +1, units));
        rows.add(coil("shr", "Sensible heat ratio (lower = more drying)", Measurand.SHR, b, a, -1, units));
        rows.add(coil("indoorDewPoint", "Indoor (return) dew point", Measurand.RETURN_DEW_POINT, b, a, -1, units));
        rows.add(coil("indoorRelativeHumidity", "Indoor (return) relative humidity", Measurand.RETURN_RELATIVE_HUMIDITY,
                b, a, -1, units));
        rows.add(coil("supplyDewPoint", "Supply-air dew point", Measurand.LEAVING_DEW_POINT, b, a, -1, units));
        AnalysedLog lb = pair.beforeLog();
        AnalysedLog la = pair.afterLog();
        if (lb != null && la != null && lb.analysed() && la.analysed()) {
            rows.add(log("cyclesPerHour", "Cycles per hour (logged)", Quantity.DIMENSIONLESS,
                    lb.report(), la.report(), RunCycleReport::cyclesPerHour, -1, 1));
            rows.add(log("latentFraction", "Latent fraction (logged)", Quantity.FRACTION_PERCENT,
                    lb.report(), la.report(), RunCycleReport::latentFractionMeasured, +1, 0));
        }
        return rows;
    }

    private static Improvement coil(String key, String label, Measurand m, CoilResult b, CoilResult a, int better,
                                    UnitSystem units) {
        return new Improvement(key, label, m.quantity(), b.estimate(m), a.estimate(m), better,
                DisplayNumber.decimals(m.quantity(), units));
    }

    private static Improvement log(String key, String label, Quantity q, RunCycleReport b, RunCycleReport a,
                                   ToDoubleFunction<RunCycleReport> f, int better, int decimals) {
        return new Improvement(key, label, q, new Estimate(f.applyAsDouble(b), Double.NaN),
                new Estimate(f.applyAsDouble(a), Double.NaN), better, decimals);
    }
}
