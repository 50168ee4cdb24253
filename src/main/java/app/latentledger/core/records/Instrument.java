package app.latentledger.core.records;

import java.time.LocalDate;
import java.util.List;

/**
 * An instrument used on a visit, as written on a calibration sticker: kept with the visit and
 * chosen for each reading set it took. Its stated accuracy fills the tolerances of the readings it
 * takes (see {@link #accuracyOf}).
 *
 * @param id           stable id
 * @param visitId      the visit it was used on
 * @param name         how the tech names it, e.g. "Probe kit A"
 * @param serial       serial number, "" when unknown
 * @param calibratedOn last calibration or check date, or null when unknown
 * @param accuracy     the maker's stated accuracy ({@link StatedAccuracy#NONE} when not typed)
 */
public record Instrument(String id, String visitId, String name, String serial, LocalDate calibratedOn,
                         StatedAccuracy accuracy) {
    public Instrument {
        id = Check.id("instrument id", id);
        visitId = Check.id("instrument visit", visitId);
        name = Check.text("instrument name", name, 200);
        serial = Check.optionalText("instrument serial", serial, 100);
        accuracy = accuracy == null ? StatedAccuracy.NONE : accuracy;
    }

    /** The accuracy a reading set taken with all of {@code used} has: the wider stated figure per part. */
    public static StatedAccuracy accuracyOf(List<Instrument> used) {
        StatedAccuracy a = StatedAccuracy.NONE;
        for (Instrument i : used) {
            a = a.combine(i.accuracy());
        }
        return a;
    }

    /** One line for a reading set's instrument text and the report: "Probe kit A, s/n 123, calibrated 2026-05-01". */
    public String describe() {
        StringBuilder b = new StringBuilder(name);
        if (!serial.isEmpty()) {
            b.append(", s/n ").append(serial);
        }
        b.append(calibratedOn == null ? ", calibration date not recorded" : ", calibrated " + calibratedOn);
        return b.toString();
    }
}
