package app.latentledger.ui.paperwork;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.records.Ids;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.StatedAccuracy;
import app.latentledger.core.settings.InstrumentTolerances;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.TypedNumber;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.Ledger;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;

/**
 * The instruments of the open visit: the list, a form to add one (name, serial, calibration date,
 * stated accuracy in the tech's units), and which of them took the reading set on the pad.
 * {@link #tolerances} gives what the chosen instruments state; the pad takes the same figures
 * through the session's one tolerance rule ({@code ui.session.Tolerancing}) when the tech comes back
 * to it.
 */
public final class InstrumentsViewModel {
    /** One instrument as the list shows it, with whether it took the current set. */
    public record Row(Instrument instrument, String text, boolean usedOnSet) {
    }

    private final Ledger ledger;
    private String visitId;
    private String readingSetId;
    private UnitSystem units = UnitSystem.IP;

    private final ObservableList<Row> rows = FXCollections.observableArrayList();
    private final StringProperty name = new SimpleStringProperty("");
    private final StringProperty serial = new SimpleStringProperty("");
    private final StringProperty calibrated = new SimpleStringProperty("");
    private final StringProperty dryBulb = new SimpleStringProperty("");
    private final StringProperty relativeHumidity = new SimpleStringProperty("");
    private final StringProperty wetBulb = new SimpleStringProperty("");
    private final StringProperty dewPoint = new SimpleStringProperty("");
    private final StringProperty coil = new SimpleStringProperty("");
    private final StringProperty airflowPct = new SimpleStringProperty("");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");

    public InstrumentsViewModel(Ledger ledger) {
        this.ledger = ledger;
    }

    /** Shows the visit's instruments and which took {@code readingSetId} (null: no stored set yet). */
    public void load(String visitId, String readingSetId, UnitSystem units) {
        this.visitId = visitId;
        this.readingSetId = readingSetId;
        this.units = units;
        message.set("");
        refresh();
    }

    private void refresh() {
        List<Row> out = new ArrayList<>();
        if (visitId != null) {
            List<Instrument> used = readingSetId == null ? List.of() : ledger.instruments().usedOn(readingSetId);
            for (Instrument i : ledger.instruments().forVisit(visitId)) {
                out.add(new Row(i, i.describe() + accuracy(i.accuracy()), used.contains(i)));
            }
        }
        rows.setAll(out);
    }

    /** Adds the instrument typed in the form to the visit. */
    public boolean add() {
        if (visitId == null) {
            message.set("Start or open a visit first.");
            return false;
        }
        try {
            LocalDate date = calibrated.get().isBlank() ? null : LocalDate.parse(calibrated.get().strip());
            StatedAccuracy a = new StatedAccuracy(temperature(dryBulb, "dry bulb"), number(relativeHumidity, "RH"),
                    temperature(wetBulb, "wet bulb"), temperature(dewPoint, "dew point"), temperature(coil, "coil probe"),
                    fraction(airflowPct));
            Instrument i = new Instrument(Ids.newId(), visitId, name.get(), serial.get(), date, a);
            ledger.instruments().save(i);
            message.set("Added " + i.name() + ".");
            for (StringProperty p : List.of(name, serial, calibrated, dryBulb, relativeHumidity, wetBulb, dewPoint, coil,
                    airflowPct)) {
                p.set("");
            }
            refresh();
            return true;
        } catch (DateTimeParseException e) {
            message.set("Not added: calibration date '" + calibrated.get() + "' is not a date like 2026-03-02.");
        } catch (InvalidInputException e) {
            message.set("Not added: " + e.message(units));
        } catch (InvalidRecordException | NumberFormatException e) {
            message.set("Not added: " + e.getMessage());
        }
        return false;
    }

    /** Marks an instrument as used, or not, on the current reading set. */
    public void setUsed(Instrument instrument, boolean used) {
        if (readingSetId == null) {
            message.set("Save a reading on the pad first; then choose the instruments that took it.");
            return;
        }
        List<String> ids = new ArrayList<>();
        for (Row r : rows) {
            boolean on = r.instrument().equals(instrument) ? used : r.usedOnSet();
            if (on) {
                ids.add(r.instrument().id());
            }
        }
        ledger.instruments().useOn(readingSetId, ids);
        message.set(used ? instrument.name() + " took this set." : instrument.name() + " no longer on this set.");
        refresh();
    }

    /** The tolerances new entries on the current set start with: the chosen instruments' over {@code base}. */
    public InstrumentTolerances tolerances(InstrumentTolerances base) {
        List<Instrument> used = new ArrayList<>();
        rows.stream().filter(Row::usedOnSet).forEach(r -> used.add(r.instrument()));
        return Instrument.accuracyOf(used).over(base);
    }

    private Double temperature(StringProperty p, String what) {
        Double v = number(p, what);
        return v == null ? null : Quantity.TEMPERATURE_DIFFERENCE.fromDisplay(units, v);
    }

    private static Double fraction(StringProperty p) {
        Double v = number(p, "airflow");
        return v == null ? null : v / 100;
    }

    private static Double number(StringProperty p, String what) {
        return TypedNumber.parseOrNull("stated " + what + " accuracy", p.get());
    }

    private String accuracy(StatedAccuracy a) {
        List<String> parts = new ArrayList<>();
        String t = " " + Quantity.TEMPERATURE_DIFFERENCE.symbol(units);
        add(parts, "dry bulb", a.dryBulbK(), t);
        if (a.relativeHumidityPct() != null) {
            parts.add("RH ±" + trim(a.relativeHumidityPct()) + " %");
        }
        add(parts, "wet bulb", a.wetBulbK(), t);
        add(parts, "dew point", a.dewPointK(), t);
        add(parts, "coil", a.coilK(), t);
        if (a.airflowFraction() != null) {
            parts.add("airflow ±" + trim(a.airflowFraction() * 100) + " %");
        }
        return parts.isEmpty() ? "" : " · " + String.join(", ", parts);
    }

    private void add(List<String> parts, String what, Double k, String unit) {
        if (k != null) {
            parts.add(what + " ±" + trim(Quantity.TEMPERATURE_DIFFERENCE.toDisplay(units, k)) + unit);
        }
    }

    private static String trim(double v) {
        return String.format(java.util.Locale.ROOT, "%.2f", v).replaceAll("\\.?0+$", "");
    }

    public ObservableList<Row> rows() {
        return rows;
    }

    public StringProperty nameProperty() {
        return name;
    }

    public StringProperty serialProperty() {
        return serial;
    }

    public StringProperty calibratedProperty() {
        return calibrated;
    }

    public StringProperty dryBulbProperty() {
        return dryBulb;
    }

    public StringProperty relativeHumidityProperty() {
        return relativeHumidity;
    }

    public StringProperty wetBulbProperty() {
        return wetBulb;
    }

    public StringProperty dewPointProperty() {
        return dewPoint;
    }

    public StringProperty coilProperty() {
        return coil;
    }

    public StringProperty airflowPctProperty() {
        return airflowPct;
    }

    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }
}
