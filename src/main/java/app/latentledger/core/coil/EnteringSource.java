package app.latentledger.core.coil;

/** Where the state of the air entering the coil came from. */
public enum EnteringSource {
    /** A reading (return air, or mixed air read directly). */
    MEASURED("measured"),
    /** The adiabatic mix of the return and outdoor readings. */
    MIXED("mixed");

    private final String key;

    EnteringSource(String key) {
        this.key = key;
    }

    /** JSON key: "measured" | "mixed". */
    public String key() {
        return key;
    }
}
