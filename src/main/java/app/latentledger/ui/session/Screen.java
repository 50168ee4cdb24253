package app.latentledger.ui.session;

/** The app's main screens, in the order a visit walks through them. */
public enum Screen {
    JOB("job", "Job"),
    READINGS("readings", "Readings"),
    RESULTS("results", "Results"),
    LOGS("logs", "Logs"),
    /** Why the house is humid: its moisture budget and the fixes compared. */
    HOUSE("house", "House"),
    COMPARE("compare", "Compare"),
    RECORD("record", "Record"),
    EXPORT("export", "Export"),
    SETTINGS("settings", "Settings");

    private final String key;
    private final String title;

    Screen(String key, String title) {
        this.key = key;
        this.title = title;
    }

    /** Node ids and PNG file names. */
    public String key() {
        return key;
    }

    public String title() {
        return title;
    }
}
