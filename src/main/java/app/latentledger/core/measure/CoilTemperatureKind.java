package app.latentledger.core.measure;

import app.latentledger.core.units.Quantity;

import java.util.Locale;
import java.util.Set;

/**
 * What a measured coil temperature is. They mean different things, so the check draws different
 * conclusions from each:
 * <ul>
 *   <li>{@link #COIL_SURFACE}: a probe on the fins or tubes of the wet coil — the surface itself;</li>
 *   <li>{@link #EVAPORATOR_SATURATION}: the refrigerant's saturation temperature from the suction
 *       pressure. Fin and air-film resistance keep the coil surface several degrees warmer than the
 *       refrigerant, so it is an <i>upper bound on how cold the surface can be</i>: it can show the
 *       surface is above the dew point, but shows it below only with an allowance to spare.</li>
 * </ul>
 * A suction-line temperature (a clamp on the vapour line) is not accepted as a coil temperature:
 * it includes the superheat, often 8–20 °F (common practice, no source), and would fake a warm coil.
 */
public enum CoilTemperatureKind {
    /** A probe on the fins or tubes of the wet coil. */
    COIL_SURFACE("coil-surface", "coil surface temperature"),
    /** Evaporator (suction) saturation temperature from a certified technician's gauge reading. */
    EVAPORATOR_SATURATION("evaporator-saturation", "evaporator saturation temperature");

    /** What the tech hears when a suction-line (vapour-line) temperature is offered as the coil temperature. */
    public static final String SUCTION_LINE_REFUSAL = "a suction-line temperature is not a coil temperature:"
            + " it includes the superheat (often 8–20 °F) and would make the coil look warmer than it is;"
            + " enter a probe on the coil fins (coil-surface) or the saturation temperature from the suction"
            + " pressure (evaporator-saturation)";

    private static final Set<String> SUCTION_LINE_WORDS = Set.of("suction-line", "suction", "suction-line-temperature",
            "vapor-line", "vapour-line", "line", "clamp", "line-clamp");

    private final String key;
    private final String label;

    CoilTemperatureKind(String key, String label) {
        this.key = key;
        this.label = label;
    }

    /** Stable key: command line, JSON, stored records. */
    public String key() {
        return key;
    }

    public String label() {
        return label;
    }

    public Quantity quantity() {
        return Quantity.TEMPERATURE;
    }

    public Quantity toleranceQuantity() {
        return Quantity.TEMPERATURE_DIFFERENCE;
    }

    /** True when the reading is the surface itself; false when it only bounds how cold the surface can be. */
    public boolean isSurface() {
        return this == COIL_SURFACE;
    }

    /**
     * The kind for {@code key} ("coil-surface" | "evaporator-saturation"); a suction-line word is
     * refused with {@link #SUCTION_LINE_REFUSAL}, anything else naming the choices.
     */
    public static CoilTemperatureKind parse(String field, String key) {
        if (key != null && SUCTION_LINE_WORDS.contains(key.strip().toLowerCase(Locale.ROOT).replace('_', '-'))) {
            throw new InvalidChoiceException(field, SUCTION_LINE_REFUSAL);
        }
        return Choices.parse(field, CoilTemperatureKind.class, key, CoilTemperatureKind::key);
    }
}
