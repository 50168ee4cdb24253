package app.latentledger.core.records;

/**
 * Condensate caught at the drain over a timed interval.
 *
 * @param volume  liquid caught, m³, with tolerance in m³
 * @param seconds collection time, s, with tolerance in s
 */
public record Condensate(Measurement volume, Measurement seconds) {
    public Condensate {
        Check.present("condensate volume", volume);
        Check.present("condensate collection time", seconds);
    }
}
