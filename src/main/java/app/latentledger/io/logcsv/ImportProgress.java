package app.latentledger.io.logcsv;

/** Told how far an import has got, so the app can show a bar and the command a percentage. */
@FunctionalInterface
public interface ImportProgress {
    ImportProgress NONE = fraction -> { };

    /** @param fraction 0–1 of the file read so far (approximate: characters against bytes) */
    void progress(double fraction);
}
