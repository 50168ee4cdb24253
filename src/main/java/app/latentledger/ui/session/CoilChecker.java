package app.latentledger.ui.session;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;

/**
 * How the session works out a reading set's coil check. The app always uses {@link #STANDARD} (the
 * one adapter the commands and the report use too); a test passes its own to count or observe the
 * checks, without any global switch.
 */
@FunctionalInterface
public interface CoilChecker {
    /** {@link ReadingSetCheck#run}: the same numbers as the {@code coil} command and the report. */
    CoilChecker STANDARD = ReadingSetCheck::run;

    /**
     * @throws app.latentledger.core.InvalidInputException when a reading is refused
     */
    CoilResult check(ReadingSet readings, HvacSystem system, Site site, ThresholdSettings thresholds,
                     UnitSystem units);
}
