package app.latentledger.core.settings;

/** How the settings screen and {@code settings show} group the settings, in this order. */
public enum SettingGroup {
    UNITS_AND_SITE("Units & site"),
    INSTRUMENTS("Instruments"),
    INDOOR_TARGET("Indoor target"),
    FINDING_THRESHOLDS("Finding thresholds"),
    DISPLAY_AND_PAPER("Display & paper");

    private final String title;

    SettingGroup(String title) {
        this.title = title;
    }

    /** The heading a tech reads. */
    public String title() {
        return title;
    }
}
