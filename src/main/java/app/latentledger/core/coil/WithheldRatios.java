package app.latentledger.core.coil;

import app.latentledger.core.units.Ratio;

/**
 * Why a coil check withholds a ratio, in the words every face shows ({@link Ratio}): the sensible
 * heat ratio, the same from the water caught, the bypass factor and the apparatus dew point are
 * "not measurable (why)" when their denominators are not clearly positive, never NaN, a bare dash
 * or a misleading 0. The check itself decides what to withhold ({@link CoilCheck}); this only words
 * the reason from what it found.
 */
public final class WithheldRatios {
    private WithheldRatios() {
    }

    /** The sensible heat ratio, or why it is not measurable. */
    public static Ratio shr(CoilResult r) {
        return ratio(r.estimate(Measurand.SHR), shrWhyNot(r.estimate(Measurand.SENSIBLE), r.estimate(Measurand.TOTAL)));
    }

    /** The sensible heat ratio with the latent from the water caught, or why it is not measurable. */
    public static Ratio shrFromCondensate(CoilResult r) {
        if (r.condensate() == null) {
            return new Ratio(Double.NaN, "no condensate caught");
        }
        if (!r.condensate().usable()) {
            return new Ratio(Double.NaN, "the catch was not steady, or is less certain than the air side");
        }
        Estimate sensible = r.estimate(Measurand.SENSIBLE);
        Estimate latent = r.estimate(Measurand.LATENT_FROM_CONDENSATE);
        Estimate total = new Estimate(sensible.valueSi() + latent.valueSi(),
                Math.hypot(sensible.expandedSi(), latent.expandedSi()));
        return ratio(r.estimate(Measurand.SHR_FROM_CONDENSATE), shrWhyNot(sensible, total));
    }

    /** The bypass factor, or why it is not measurable. */
    public static Ratio bypassFactor(CoilResult r) {
        if (!r.adp().found()) {
            return new Ratio(Double.NaN, r.adp().explanation());
        }
        return ratio(r.estimate(Measurand.BYPASS_FACTOR),
                "the entering air is not clearly warmer than the apparatus dew point");
    }

    /** Why there is no apparatus dew point, or "" when there is one. */
    public static String apparatusDewPointWhyNot(CoilResult r) {
        return r.adp().found() ? "" : r.adp().explanation();
    }

    /** The airflow per nominal (nameplate) size, or why it cannot be given. */
    public static String airflowPerNominalWhyNot(CoilResult r) {
        return r.readings().hasNominalCapacity() ? "" : "no nameplate size given";
    }

    private static String shrWhyNot(Estimate sensible, Estimate total) {
        if (sensible.exists() && sensible.valueSi() < 0) {
            return "the air leaves warmer than it enters";
        }
        if (!total.exists() || total.valueSi() <= 0) {
            return "the coil removes no heat from the air";
        }
        return "the total capacity is within its uncertainty of zero";
    }

    private static Ratio ratio(Estimate e, String whyNot) {
        return e != null && e.exists() ? new Ratio(e.valueSi(), "") : new Ratio(Double.NaN, whyNot);
    }
}
