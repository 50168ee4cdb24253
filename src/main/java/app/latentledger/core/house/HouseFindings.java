package app.latentledger.core.house;

import app.latentledger.core.coil.Estimate;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.findings.Evidence;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.FindingCode;
import app.latentledger.core.findings.Severity;
import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The findings of a house moisture budget, each with its evidence (k = 2) and next checks. */
public final class HouseFindings {
    /** Attic heat, before anyone goes up to seal a return duct. */
    public static final String ATTIC_HEAT = "Caution: attics reach dangerous temperatures on a summer afternoon —"
            + " work there early, hydrated, with a second person; mind the ceiling joists and any wiring.";
    /** Mold found while working. */
    public static final String MOLD = "Caution: visible mold on ducts, the coil or drywall needs assessment and"
            + " remediation under local guidance (US EPA mold guide) before or alongside any fix.";
    /** Changes to exhaust or ventilation can backdraft combustion appliances. */
    public static final String COMBUSTION = "Caution: changing exhaust, ventilation or envelope tightness changes"
            + " house pressure — test combustion appliances for backdrafting and CO (worst-case depressurisation)"
            + " after the change.";
    /** Licensed practice. */
    public static final String LICENSED = "Fixes to refrigerant, electrical, duct and combustion systems follow"
            + " local codes and are done by licensed practitioners.";

    private HouseFindings() {
    }

    static List<Finding> of(HouseInputs in, ScenarioResult found, List<ScenarioResult> fixes,
                            DehumidifierRating.Rated rated, UnitSystem units) {
        final Quantity day = Quantity.WATER_MASS_DAILY;
        List<Finding> out = new ArrayList<>();
        double gains = found.gains().valueSi();
        Estimate f = found.leakFraction();
        double fMax = in.thresholds().valueSi(Thresholds.RETURN_LEAK_FRACTION);
        if (f.exists() && f.valueSi() - nz(f.expandedSi()) > fMax) {
            out.add(new Finding(FindingCode.RETURN_LEAK, Severity.FIX,
                    "The return duct is drawing attic or crawlspace air into the system, and with it water.",
                    String.format(Locale.ROOT, "leak fraction f = %.3f ± %.3f (k = 2) from W_plenum, W_grille, W_space;"
                                    + " threshold %.2f; brings %s", f.valueSi(), f.expandedSi(), fMax,
                            shown(day, units, found.returnLeak())),
                    List.of(new Evidence("returnLeakFraction", "return leak fraction", Quantity.FRACTION_PERCENT,
                                    f.valueSi(), f.expandedSi()),
                            ev("returnLeakGain", "water from the return leak", found.returnLeak())),
                    List.of("Repeat grille and plenum readings with the same probe to cancel its offset",
                            "Find the leak: inspect the return plenum, filter rack and duct joints with smoke",
                            "Seal with mastic or listed tape; repeat the three readings")));
        }
        share(out, in, units, found.ventilation(), gains, Thresholds.VENTILATION_LOAD_SHARE,
                FindingCode.VENTILATION_MOISTURE_LOAD,
                "Mechanical ventilation brings in a large share of the house's water on humid days.",
                "ventilationGain", "water from ventilation",
                List.of("Measure the ventilation airflow and compare it with the ASHRAE 62.2 rate",
                        "Consider an ERV or running ventilation through the air handler with dehumidification"));
        share(out, in, units, found.infiltration(), gains, Thresholds.INFILTRATION_LOAD_SHARE,
                FindingCode.INFILTRATION_MOISTURE_LOAD,
                "Outdoor air leaking into the house brings in a large share of its water.",
                "infiltrationGain", "water from air leakage",
                List.of("Confirm the blower-door result (CFM50) and the shelter class",
                        "Air-seal the attic floor, rim joists and penetrations; retest"));
        double target = in.rhTargetPct();
        Estimate deficit = found.deficitAtTarget();
        if (!found.hasEquilibrium() || deficit.valueSi() - nz(deficit.expandedSi()) > 0) {
            String tech = found.hasEquilibrium()
                    ? String.format(Locale.ROOT, "equilibrium %.1f %% RH (dew point %s) above the %.0f %% target;"
                            + " gains minus removal at the target %s", found.equilibriumRhPct().valueSi(),
                    shown(Quantity.TEMPERATURE, units, found.equilibriumDewPointC()), target,
                    shown(day, units, deficit))
                    : "no equilibrium below saturation: gains " + shown(day, units, found.gains())
                    + " exceed removal " + shown(day, units, found.removal()) + " at every indoor humidity";
            out.add(new Finding(FindingCode.REMOVAL_BELOW_GAINS, found.hasEquilibrium() ? Severity.CHECK : Severity.FIX,
                    found.hasEquilibrium()
                            ? "The system removes less water than the house gains at the humidity you want."
                            : "The system cannot keep up with the house's water at any indoor humidity.",
                    tech, List.of(ev("gains", "water gains", found.gains()), ev("removal", "removal", found.removal()),
                    ev("deficitAtTarget", "gains minus removal at the RH target", deficit)),
                    List.of("Check the fixes compared: the largest gain first",
                            "Keep a log over a humid day to confirm runtime and part-load latent fraction")));
        }
        boolean anyFixHolds = false;
        for (ScenarioResult s : fixes) {
            if (!"add-dehumidifier".equals(s.scenario().key()) && s.hasEquilibrium()
                    && s.deficitAtTarget().valueSi() <= 0) {
                anyFixHolds = true;
            }
        }
        Estimate needed = found.neededDehumidifier();
        if (needed.valueSi() - nz(needed.expandedSi()) > 0 && !anyFixHolds) {
            out.add(new Finding(FindingCode.DEHUMIDIFIER_ADVISED, Severity.CHECK,
                    "No single change to the system or house holds the humidity target; a dehumidifier would.",
                    "needed " + shown(Quantity.WATER_RATE_DAILY, units, new Estimate(rated.needed(), Double.NaN))
                            + " at the house condition; rated " + pints(rated.portable65F(), units)
                            + " (DOE portable 65 °F/60 %), " + pints(rated.wholeHome73F(), units)
                            + " (DOE whole-home 73 °F/60 %), " + pints(rated.rated80F(), units) + " (80 °F/60 %)",
                    List.of(new Evidence("dehumidifierNeeded", "dehumidifier capacity needed",
                            Quantity.WATER_RATE_DAILY, needed.valueSi(), needed.expandedSi())),
                    List.of("Pick a unit by its rating basis (portable 65 °F or whole-home 73 °F) and round up",
                            "Plan the condensate drain and where the unit's heat goes")));
        }
        return out;
    }

    /** The safety lines for the fixes compared. */
    static List<String> cautions(List<ScenarioResult> fixes) {
        List<String> c = new ArrayList<>();
        boolean pressure = fixes.stream().anyMatch(s -> switch (s.scenario().key()) {
            case "reduce-ventilation", "add-erv", "tighten-envelope" -> true;
            default -> false;
        });
        c.add(ATTIC_HEAT);
        c.add(MOLD);
        if (pressure) {
            c.add(COMBUSTION);
        }
        c.add(LICENSED);
        c.add(Cautions.SAFETY_LINE);
        return c;
    }

    private static void share(List<Finding> out, HouseInputs in, UnitSystem units, Estimate term, double gains,
                              app.latentledger.core.findings.Threshold t, FindingCode code, String message, String key,
                              String label, List<String> next) {
        double min = in.thresholds().valueSi(t);
        if (gains > 0 && term.valueSi() > 0 && term.valueSi() >= min * gains) {
            out.add(new Finding(code, Severity.CHECK, message,
                    shown(Quantity.WATER_MASS_DAILY, units, term) + " of " + shown(Quantity.WATER_MASS_DAILY, units,
                            new Estimate(gains, Double.NaN)) + " gains (" + Math.round(100 * term.valueSi() / gains)
                            + " %; threshold " + Math.round(100 * min) + " %)",
                    List.of(ev(key, label, term)), next));
        }
    }

    /** A value with its k = 2 uncertainty in the tech's units, e.g. "52.2 ± 9.1 lb/day". */
    static String shown(Quantity q, UnitSystem units, Estimate e) {
        Quantity spread = q == Quantity.TEMPERATURE ? Quantity.TEMPERATURE_DIFFERENCE : q;
        String v = String.format(Locale.ROOT, "%.1f", q.toDisplay(units, e.valueSi()));
        if (Double.isFinite(e.expandedSi())) {
            v += String.format(Locale.ROOT, " ± %.1f", spread.toDisplay(units, e.expandedSi()));
        }
        return v + " " + q.symbol(units);
    }

    private static String pints(double kgPerS, UnitSystem units) {
        return String.format(Locale.ROOT, "%.1f", Quantity.WATER_RATE_DAILY.toDisplay(units, kgPerS));
    }

    private static Evidence ev(String key, String label, Estimate e) {
        return new Evidence(key, label, Quantity.WATER_MASS_DAILY, e.valueSi(), e.expandedSi());
    }

    private static double nz(double v) {
        return Double.isFinite(v) ? v : 0.0;
    }
}
