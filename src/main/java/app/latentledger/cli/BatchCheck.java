package app.latentledger.cli;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.coil.CoilCheck;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.OutdoorAir;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Ids;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.SetLabel;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.SystemType;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPurpose;
import app.latentledger.core.settings.InstrumentTolerances;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.StoredReadings;

import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Checks one batch row: its reading cells become the {@code coil} command's options and are read
 * by {@link CoilOptions} (the same units, defaults, tolerances and refusals as {@code coil} and
 * {@code readings add}), the coil check runs as {@code coil} runs it, and the row's site, system,
 * visit and reading set are made as the record commands make them, so storing them later saves
 * exactly what was checked. Thread-safe: it keeps no state between rows.
 */
final class BatchCheck {
    private static final Pattern OPTION = Pattern.compile("--([a-z][a-z-]*[a-z])");

    private final UnitSystem inputUnits;
    private final UnitSystem outputUnits;
    private final double defaultElevationM;
    private final InstrumentTolerances tolerances;
    private final ThresholdSettings thresholds;
    private final String technician;
    private final boolean decimalComma;
    private final OffsetDateTime now;
    private final boolean technicianRequired;

    /** The visit's technician when a row is only checked (neither stored nor reported). */
    static final String NO_TECHNICIAN = "not given";

    /**
     * @param inputUnits  units of a row without a {@code units} cell
     * @param outputUnits units the results and findings are said in
     * @param technician  technician of a row without a {@code technician} cell, or null
     * @param technicianRequired whether a row needs a technician (its visit is stored or reported)
     */
    BatchCheck(UnitSystem inputUnits, UnitSystem outputUnits, double defaultElevationM, InstrumentTolerances tolerances,
               ThresholdSettings thresholds, String technician, boolean decimalComma, OffsetDateTime now,
               boolean technicianRequired) {
        this.inputUnits = inputUnits;
        this.outputUnits = outputUnits;
        this.defaultElevationM = defaultElevationM;
        this.tolerances = tolerances;
        this.thresholds = thresholds;
        this.technician = technician;
        this.decimalComma = decimalComma;
        this.now = now;
        this.technicianRequired = technicianRequired;
    }

    /**
     * What a row gave: either {@code checked} or {@code refused}.
     *
     * @param checked the records made from the row and its coil check, or null
     * @param refused why the row was not checked, or null
     */
    record Outcome(BatchCsv.Row row, Checked checked, BatchRefusal refused) {
        String site() {
            return row.cell(BatchColumns.SITE);
        }

        String system() {
            return row.cell(BatchColumns.SYSTEM);
        }
    }

    /**
     * A checked row as records. {@code set} keeps the coil-entering air like every stored reading set;
     * with outdoor air mixed in it also carries the outdoor reading, which a stored set cannot be
     * worked out from, so such a row is reported but not stored ({@link #storable}).
     */
    record Checked(Site site, HvacSystem system, Visit visit, ReadingSet set, CoilResult result, boolean storable) {
    }

    Outcome check(BatchCsv.Row row) {
        UnitSystem units = inputUnits;
        try {
            units = UnitOptions.units(options(row, Set.of("units")), inputUnits);
            return new Outcome(row, records(row, units), null);
        } catch (UsageException e) {
            return new Outcome(row, null, refusal(row, e, units));
        } catch (InvalidInputException e) {
            return new Outcome(row, null, refusal(row, "", e, units));
        } catch (InvalidRecordException e) {
            return new Outcome(row, null, new BatchRefusal(row.line(), column(row, e.field()), e.field(),
                    row.cell(column(row, e.field())), "", e.getMessage()));
        }
    }

    private Checked records(BatchCsv.Row row, UnitSystem units) {
        Args args = options(row, null);
        SitePressure pressure = UnitOptions.site(args, units, defaultElevationM);
        CoilReadings readings = CoilOptions.read(args, units, pressure, tolerances);
        String siteName = required(row, BatchColumns.SITE);
        String systemLabel = required(row, BatchColumns.SYSTEM);
        if (!readings.hasNominalCapacity()) {
            throw new UsageException("--nominal-tons is required: a system is recorded with its nameplate size"
                    + " (or give nominal-kw)");
        }
        String tech = row.cell(BatchColumns.TECHNICIAN).isBlank() ? technician : row.cell(BatchColumns.TECHNICIAN);
        if ((tech == null || tech.isBlank()) && !technicianRequired) {
            tech = NO_TECHNICIAN; // a check alone keeps no visit; the placeholder is never stored or printed
        }
        if (tech == null || tech.isBlank()) {
            throw new UsageException("--technician is required: give a technician cell or batch --technician NAME");
        }
        String label = label(row.cell(BatchColumns.LABEL));
        OffsetDateTime takenAt = takenAt(row.cell(BatchColumns.TAKEN_AT));
        double elevationM = pressure.measured() ? defaultElevationM : pressure.elevationM();

        Site site = new Site(Ids.newId(), siteName, row.cell(BatchColumns.ADDRESS), elevationM, "");
        HvacSystem system = new HvacSystem(Ids.newId(), site.id(), systemLabel, SystemType.SINGLE_STAGE,
                readings.nominalCapacityW(), "", "", "", "");
        Visit visit = new Visit(Ids.newId(), site.id(), system.id(), takenAt, tech, VisitPurpose.COMMISSIONING, "");
        Measurement station = pressure.measured()
                ? new Measurement(pressure.pressurePa(), ReadingsCommand.DEFAULT_PRESSURE_TOL_PA) : null;
        OutdoorAir outdoor = readings.outdoor();
        // the reading set as readings add keeps it: the coil-entering air (here the return reading)
        ReadingSet set = StoredReadings.of(Ids.newId(), visit.id(), takenAt, label, "",
                outdoor == null ? readings : readings.withOutdoor(null), station, "", row.cell(BatchColumns.NOTES));
        if (outdoor != null) {
            set = new ReadingSet(set.id(), set.visitId(), set.takenAt(), set.label(), set.instrument(),
                    set.returnDryBulb(), set.returnHumidity(), set.supplyDryBulb(), set.supplyHumidity(),
                    new Measurement(outdoor.air().dryBulbC(), outdoor.air().dryBulbTolK()),
                    new HumidityReading(outdoor.air().humidityKind(),
                            new Measurement(outdoor.air().humiditySi(), outdoor.air().humidityTolSi())),
                    set.coilTemperature(), set.airflow(), set.stationPressurePa(), set.condensate(), set.notes(),
                    set.probes());
        }
        CoilResult result = CoilCheck.run(readings, thresholds, outputUnits);
        return new Checked(site, system, visit, set, result, outdoor == null);
    }

    /** The row's option cells as the words {@code coil} would be given ({@code --name=value}). */
    private Args options(BatchCsv.Row row, Set<String> only) {
        List<String> words = new ArrayList<>();
        for (Map.Entry<String, String> c : row.cells().entrySet()) {
            String name = c.getKey();
            if (BatchColumns.RECORD.contains(name) || c.getValue().isBlank() || (only != null && !only.contains(name))) {
                continue;
            }
            words.add("--" + name + "=" + c.getValue().strip());
        }
        if (decimalComma) {
            words.add("--" + Args.DECIMAL_COMMA);
        }
        return Args.parse(words, BatchColumns.FLAGS);
    }

    private static String required(BatchCsv.Row row, String column) {
        String v = row.cell(column).strip();
        if (v.isEmpty()) {
            throw new UsageException("--" + column + " is required: " + BatchColumns.ALL.get(column));
        }
        return v;
    }

    private static String label(String text) {
        if (text.isBlank()) {
            return "";
        }
        try {
            return SetLabel.parse("--label", text.strip()).key();
        } catch (InvalidRecordException e) {
            throw new UsageException("--label: " + e.getMessage());
        }
    }

    private OffsetDateTime takenAt(String text) {
        if (text.isBlank()) {
            return now;
        }
        try {
            return OffsetDateTime.parse(text.strip());
        } catch (DateTimeParseException e) {
            throw new UsageException("--taken-at '" + text + "' is not an ISO-8601 date-time with offset,"
                    + " e.g. 2026-07-16T10:05:00-04:00");
        }
    }

    /** A refusal from the option reader, placed on the column it names. */
    private static BatchRefusal refusal(BatchCsv.Row row, UsageException e, UnitSystem units) {
        String column = "";
        Matcher m = OPTION.matcher(e.getMessage());
        while (m.find()) {
            if (BatchColumns.ALL.containsKey(m.group(1))) {
                column = m.group(1);
                break;
            }
        }
        if (e.getCause() instanceof InvalidInputException i) {
            return refusal(row, column, i, units);
        }
        String message = e.getMessage().replaceAll("--(" + String.join("|", BatchColumns.ALL.keySet()) + ")\\b", "$1");
        return new BatchRefusal(row.line(), column, column, row.cell(column), BatchColumns.range(column, units),
                message);
    }

    private static BatchRefusal refusal(BatchCsv.Row row, String column, InvalidInputException e, UnitSystem rowUnits) {
        // said in the unit the cell was typed in (a condensate catch is mL or fl oz whatever the row's units)
        UnitSystem units = BatchColumns.unitsOf(column, rowUnits);
        return new BatchRefusal(row.line(), column, e.field(), row.cell(column), BatchColumns.rangeOf(e, units),
                (column.isEmpty() ? "" : column + ": ") + e.message(units));
    }

    /** The column a record refusal names, e.g. "site name" → site; "" when none fits. */
    private static String column(BatchCsv.Row row, String field) {
        String f = field.toLowerCase(java.util.Locale.ROOT);
        String c = f.contains("address") ? BatchColumns.ADDRESS
                : f.contains("technician") ? BatchColumns.TECHNICIAN
                : f.contains("notes") ? BatchColumns.NOTES
                : f.startsWith("reading set label") ? BatchColumns.LABEL
                : f.startsWith("system") ? BatchColumns.SYSTEM
                : f.startsWith("site") ? BatchColumns.SITE
                : f.contains("taken-at") || f.contains("date-time") ? BatchColumns.TAKEN_AT : "";
        return c;
    }
}
