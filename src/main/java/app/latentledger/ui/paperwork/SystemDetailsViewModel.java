package app.latentledger.ui.paperwork;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.SystemType;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;

import java.util.function.Consumer;

/**
 * The open visit's system as found: stages, refrigerant, metering device, blower type and
 * setting, filter, thermostat. Saved as a correction of the system record (same id).
 */
public final class SystemDetailsViewModel {
    private final Consumer<HvacSystem> keep;
    private HvacSystem system;
    private final ObjectProperty<SystemType> stages = new SimpleObjectProperty<>(SystemType.SINGLE_STAGE);
    private final StringProperty refrigerant = new SimpleStringProperty("");
    private final StringProperty meteringDevice = new SimpleStringProperty("");
    private final StringProperty blowerType = new SimpleStringProperty("");
    private final StringProperty blowerSetting = new SimpleStringProperty("");
    private final StringProperty filter = new SimpleStringProperty("");
    private final StringProperty thermostat = new SimpleStringProperty("");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");

    /** @param keep saves a corrected system (the session's, so every screen sees it) */
    public SystemDetailsViewModel(Consumer<HvacSystem> keep) {
        this.keep = keep;
    }

    public void load(HvacSystem s) {
        system = s;
        message.set("");
        stages.set(s == null ? SystemType.SINGLE_STAGE : s.type());
        refrigerant.set(s == null ? "" : s.refrigerant());
        meteringDevice.set(s == null ? "" : s.meteringDevice());
        blowerType.set(s == null ? "" : s.blowerType());
        blowerSetting.set(s == null ? "" : s.fanSetting());
        filter.set(s == null ? "" : s.filter());
        thermostat.set(s == null ? "" : s.thermostatNotes());
    }

    public boolean save() {
        if (system == null) {
            message.set("Pick a system on the Job screen first.");
            return false;
        }
        try {
            HvacSystem changed = new HvacSystem(system.id(), system.siteId(), system.label(), stages.get(),
                    system.nominalCapacityW(), refrigerant.get(), blowerType.get(), blowerSetting.get(), thermostat.get(),
                    meteringDevice.get(), filter.get());
            keep.accept(changed);
            system = changed;
            message.set("System details saved.");
            return true;
        } catch (InvalidRecordException e) {
            message.set("Not saved: " + e.getMessage());
            return false;
        }
    }

    public ObjectProperty<SystemType> stagesProperty() {
        return stages;
    }

    public StringProperty refrigerantProperty() {
        return refrigerant;
    }

    public StringProperty meteringDeviceProperty() {
        return meteringDevice;
    }

    public StringProperty blowerTypeProperty() {
        return blowerType;
    }

    public StringProperty blowerSettingProperty() {
        return blowerSetting;
    }

    public StringProperty filterProperty() {
        return filter;
    }

    public StringProperty thermostatProperty() {
        return thermostat;
    }

    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }
}
