package app.latentledger.store;

/** The version written into snapshots and bundles: the jar's Implementation-Version, or "dev". */
public final class AppVersion {
    private AppVersion() {
    }

    public static String current() {
        String v = AppVersion.class.getPackage().getImplementationVersion();
        return v == null || v.isBlank() ? "dev" : v;
    }
}
