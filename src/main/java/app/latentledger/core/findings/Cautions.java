package app.latentledger.core.findings;

/**
 * The safety wording every findings list, readable output and report ends with. One place, so the
 * app, the command line and the report say the same thing.
 */
public final class Cautions {
    /** Ends every list of findings. */
    public static final String SAFETY_LINE = "Safety: air handlers hold live electrical parts — isolate power"
            + " before opening panels; refrigerant work needs the required certification (EPA Section 608"
            + " in the US); wet coils, pans and ducts can hold mold — wear respiratory protection; attics"
            + " get dangerously hot — limit your time there and drink water; where a fuel-burning appliance"
            + " shares the air handler or the space, check for carbon monoxide; local codes and licensed"
            + " practice govern any repair.";

    /** Shown before coil-surface or refrigerant-side readings are taken. */
    public static final String BEFORE_COIL_READINGS = "Caution: isolate power before opening the air handler;"
            + " refrigerant gauges only by a certified technician.";

    private Cautions() {
    }
}
