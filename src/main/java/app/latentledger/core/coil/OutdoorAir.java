package app.latentledger.core.coil;

import app.latentledger.core.measure.FieldLimits;

import java.util.Objects;

/**
 * Outdoor air joining the return air upstream of the coil: its reading and its share of the
 * coil airflow.
 *
 * <p>The share is <b>by volume</b>, as a tech measures it (outdoor-air flow over total flow from a
 * flow hood or station) or sets it (damper position, ventilator flow over blower flow), each
 * volume at its own stream's state: f = V̇_oa / (V̇_oa + V̇_ra). The check converts it to a dry-air
 * mass fraction with each stream's specific volume before mixing ({@link MixedAir}). A fraction
 * worked out from temperatures ((t_mix − t_ra)/(t_oa − t_ra)) is nearly a mass fraction, not a
 * volume one; they differ by about the ratio of the specific volumes (20 % by volume of 92 °F /
 * 77 °F wb outdoor air into 75 °F / 50 % return is 19.3 % by mass).
 *
 * @param air           the outdoor dry bulb and humidity reading, with their tolerances
 * @param fraction      outdoor air's share of the coil airflow by volume, 0…1
 * @param fractionTol   ± tolerance of {@code fraction}, as a fraction (0.05 = ±5 %-points)
 */
public record OutdoorAir(AirReading air, double fraction, double fractionTol) {
    public OutdoorAir {
        Objects.requireNonNull(air, "air");
        FieldLimits.OUTDOOR_FRACTION.check(fraction);
        FieldLimits.OUTDOOR_FRACTION_TOLERANCE.check(fractionTol);
    }
}
