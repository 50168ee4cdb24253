package app.latentledger.report;

import app.latentledger.core.coil.CoilVerdict;
import app.latentledger.core.findings.Severity;
import app.latentledger.core.records.SystemType;
import app.latentledger.core.records.VisitPurpose;

import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.util.Locale;

/** The report's words for a homeowner: verdicts, severities, purposes and dates. */
public final class PlainWords {
    private static final DateTimeFormatter DATE = DateTimeFormatter.ofPattern("d MMMM uuuu", Locale.ENGLISH);
    private static final DateTimeFormatter DATE_TIME = DateTimeFormatter.ofPattern("d MMMM uuuu, HH:mm", Locale.ENGLISH);
    private static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("HH:mm", Locale.ENGLISH);

    private PlainWords() {
    }

    /** One sentence on what the coil check concluded. */
    public static String verdict(CoilVerdict v) {
        return switch (v) {
            case DEHUMIDIFYING -> "The cooling coil is taking water out of the air: it dries the house as well as"
                    + " cooling it.";
            case NOT_DEHUMIDIFYING -> "The cooling coil cools the air but takes no measurable water out of it, so"
                    + " the house can feel cool and clammy.";
            case CANT_TELL -> "These readings cannot show for certain whether the coil is drying the air; the"
                    + " findings say what to check.";
        };
    }

    /** Short form for tables: "drying the air", "not drying the air", "cannot tell". */
    public static String verdictShort(CoilVerdict v) {
        return switch (v) {
            case DEHUMIDIFYING -> "drying the air";
            case NOT_DEHUMIDIFYING -> "not drying the air";
            case CANT_TELL -> "cannot tell";
        };
    }

    public static String severity(Severity s) {
        return switch (s) {
            case FIX -> "Needs a repair or change";
            case CHECK -> "Worth checking";
            case NOTE -> "For information";
        };
    }

    public static String purpose(VisitPurpose p) {
        return switch (p) {
            case COMPLAINT -> "service call (comfort complaint)";
            case COMMISSIONING -> "commissioning check";
            case BEFORE -> "readings before work";
            case AFTER -> "readings after work";
            case FOLLOW_UP -> "follow-up visit";
        };
    }

    public static String systemType(SystemType t) {
        return switch (t) {
            case SINGLE_STAGE -> "single-stage";
            case TWO_STAGE -> "two-stage";
            case VARIABLE_CAPACITY -> "variable-capacity";
        };
    }

    public static String date(OffsetDateTime t) {
        return t.format(DATE);
    }

    /** "16 July 2024, 09:40 (UTC−04:00)". */
    public static String dateTime(OffsetDateTime t) {
        return t.format(DATE_TIME) + " (UTC" + offset(t) + ")";
    }

    public static String time(OffsetDateTime t) {
        return t.format(TIME);
    }

    private static String offset(OffsetDateTime t) {
        String id = t.getOffset().getId();
        return id.equals("Z") ? "" : id.replace('-', '−');
    }
}
