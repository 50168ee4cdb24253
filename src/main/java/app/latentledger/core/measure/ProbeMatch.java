package app.latentledger.core.measure;

/**
 * How the return and supply humidity probes relate, as the tech knows it.
 *
 * @param sameInstrument         true when return and supply were read with one instrument moved
 *                               between them, or with two probes compared side by side in the same
 *                               air and corrected to each other: their offsets are then one error
 *                               that cancels in the difference, and the check treats them as fully
 *                               correlated (JCGM 100:2008 §5.2)
 * @param supplyDewPointOffsetK  the supply probe's reading minus the return probe's, as a dew-point
 *                               difference, found with both in the same air, K; the check subtracts
 *                               it from the supply dew point. 0 when none was found or entered.
 */
public record ProbeMatch(boolean sameInstrument, double supplyDewPointOffsetK) {
    /** Two independent probes, no offset entered. */
    public static final ProbeMatch INDEPENDENT = new ProbeMatch(false, 0);

    public ProbeMatch {
        FieldLimits.SUPPLY_DEW_POINT_OFFSET.check(supplyDewPointOffsetK);
    }

    /** True when an offset is to be taken off the supply reading. */
    public boolean hasOffset() {
        return supplyDewPointOffsetK != 0;
    }
}
