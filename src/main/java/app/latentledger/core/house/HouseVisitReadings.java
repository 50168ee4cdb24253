package app.latentledger.core.house;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.units.Quantity;

/**
 * The house readings kept with a visit, each filled as the tech types it (null or NaN until then):
 * the day's outdoor air, the three return-leak readings, and a typed compressor runtime fraction.
 *
 * @param outdoor          outdoor air, or null
 * @param grille           return grille, or null
 * @param plenum           return plenum, or null
 * @param space            attic or crawlspace air around the return duct, or null
 * @param runtimeFraction  compressor runtime fraction 0–1, or NaN
 */
public record HouseVisitReadings(AirReading outdoor, AirReading grille, AirReading plenum, AirReading space,
                                 double runtimeFraction) {
    /** Nothing typed yet. */
    public static final HouseVisitReadings EMPTY = new HouseVisitReadings(null, null, null, null, Double.NaN);

    public HouseVisitReadings {
        if (!Double.isNaN(runtimeFraction)) {
            InputLimits.check("runtime fraction", Quantity.FRACTION_PERCENT, runtimeFraction, 0.01, 1.0, null);
        }
    }

    public HouseVisitReadings withOutdoor(AirReading r) {
        return new HouseVisitReadings(r, grille, plenum, space, runtimeFraction);
    }

    public HouseVisitReadings withGrille(AirReading r) {
        return new HouseVisitReadings(outdoor, r, plenum, space, runtimeFraction);
    }

    public HouseVisitReadings withPlenum(AirReading r) {
        return new HouseVisitReadings(outdoor, grille, r, space, runtimeFraction);
    }

    public HouseVisitReadings withSpace(AirReading r) {
        return new HouseVisitReadings(outdoor, grille, plenum, r, runtimeFraction);
    }

    public HouseVisitReadings withRuntimeFraction(double f) {
        return new HouseVisitReadings(outdoor, grille, plenum, space, f);
    }

    /** The budget's readings with {@code indoor} as the house air; the leak trio only when all three are in. */
    public HouseReadings forBudget(AirReading indoor) {
        boolean leak = grille != null && plenum != null && space != null;
        return new HouseReadings(indoor, outdoor, leak ? grille : null, leak ? plenum : null, leak ? space : null);
    }
}
