package app.latentledger.core.records;

import app.latentledger.core.units.Quantity;

/**
 * One air-conditioning system at a site (indoor coil, blower and its outdoor unit).
 *
 * @param id                 stable id
 * @param siteId             the site it serves
 * @param label              how the tech tells it apart, e.g. "Main floor"
 * @param type               capacity staging
 * @param nominalCapacityW   nameplate cooling capacity, W (1 ton = 3516.85 W); 0.5 to 200 kW
 *                           (about 0.15 to 57 tons, common practice, no source: wider than any
 *                           residential or light-commercial unit)
 * @param refrigerant        e.g. "R-410A"; free text
 * @param blowerType         e.g. "ECM constant torque", "PSC"; free text
 * @param fanSetting         blower setting: thermostat fan mode and speed tap or ECM profile as found, free text
 * @param thermostatNotes    set point, dehumidify setting, fan-off delay as found
 * @param meteringDevice     e.g. "TXV", "fixed orifice (piston)", "EEV"; free text
 * @param filter             filter size, type and condition as found, e.g. "16x25x1 pleated, dirty"
 */
public record HvacSystem(String id, String siteId, String label, SystemType type, double nominalCapacityW,
                         String refrigerant, String blowerType, String fanSetting, String thermostatNotes,
                         String meteringDevice, String filter) {
    public static final double MIN_CAPACITY_W = 500;
    public static final double MAX_CAPACITY_W = 200_000;

    public HvacSystem {
        id = Check.id("system id", id);
        siteId = Check.id("system site", siteId);
        label = Check.text("system label", label, 200);
        Check.present("system type", type);
        Check.range("system nominal capacity", Quantity.POWER_LARGE, nominalCapacityW, MIN_CAPACITY_W, MAX_CAPACITY_W);
        refrigerant = Check.optionalText("system refrigerant", refrigerant, 50);
        blowerType = Check.optionalText("system blower type", blowerType, 200);
        fanSetting = Check.optionalText("system fan setting", fanSetting, 200);
        thermostatNotes = Check.optionalText("system thermostat notes", thermostatNotes, 2000);
        meteringDevice = Check.optionalText("system metering device", meteringDevice, 200);
        filter = Check.optionalText("system filter", filter, 500);
    }

    /** A system with no metering device or filter recorded (as systems were before those details). */
    public HvacSystem(String id, String siteId, String label, SystemType type, double nominalCapacityW,
                      String refrigerant, String blowerType, String fanSetting, String thermostatNotes) {
        this(id, siteId, label, type, nominalCapacityW, refrigerant, blowerType, fanSetting, thermostatNotes, "", "");
    }
}
