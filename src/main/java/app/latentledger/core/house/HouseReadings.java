package app.latentledger.core.house;

import app.latentledger.core.coil.AirReading;

/**
 * The readings of one visit the budget needs beyond the coil check: the house air, the weather and,
 * for the return-leak check, the return grille, the return plenum and the attic or crawlspace air
 * around the duct (all three, or none).
 *
 * @param indoor  house air (usually the return grille or the thermostat location)
 * @param outdoor outdoor air (the day's weather, not air mixed into the coil)
 * @param grille  return grille, or null
 * @param plenum  return plenum after the duct run, or null
 * @param space   attic or crawlspace air around the return duct, or null
 */
public record HouseReadings(AirReading indoor, AirReading outdoor, AirReading grille, AirReading plenum,
                            AirReading space) {
    public HouseReadings {
        if (indoor == null || outdoor == null) {
            throw new IllegalArgumentException("indoor and outdoor readings are required");
        }
        int leak = (grille != null ? 1 : 0) + (plenum != null ? 1 : 0) + (space != null ? 1 : 0);
        if (leak != 0 && leak != 3) {
            throw new IllegalArgumentException("the return-leak check needs all three readings: grille, plenum, space");
        }
    }

    /** True when the three return-leak readings are present. */
    public boolean hasLeakCheck() {
        return grille != null;
    }
}
