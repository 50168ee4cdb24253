package app.latentledger.core.records;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.units.Quantity;

/**
 * A value as entered, in SI, with the instrument tolerance the tech accepted for it (±, in the same
 * SI unit). Kept together so a stored reading can always be reworked with its uncertainty.
 *
 * @param valueSi     the reading, SI
 * @param toleranceSi half-width of the instrument tolerance, SI, zero or more
 */
public record Measurement(double valueSi, double toleranceSi) {
    public Measurement {
        if (!Double.isFinite(valueSi)) {
            throw new InvalidRecordException("measurement", "value must be a finite number, got " + valueSi);
        }
        if (!Double.isFinite(toleranceSi) || toleranceSi < 0) {
            throw new InvalidRecordException("measurement", "tolerance must be zero or more, got " + toleranceSi);
        }
    }

    /**
     * Refuses a value or tolerance outside the ranges, naming the field.
     *
     * @param maxToleranceSi largest believable tolerance (a tolerance wider than this is a typo)
     */
    Measurement within(String field, FieldLimits.Limit limit, double maxToleranceSi) {
        Quantity q = limit.quantity();
        Check.range(field, q, valueSi, limit.minSi(), limit.maxSi());
        if (toleranceSi > maxToleranceSi) {
            throw new InvalidInputException(field + " tolerance", q == Quantity.TEMPERATURE
                    ? Quantity.TEMPERATURE_DIFFERENCE : q, toleranceSi, 0, maxToleranceSi, null);
        }
        return this;
    }
}
