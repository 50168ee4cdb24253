package app.latentledger.core.psychro;

import app.latentledger.core.units.Conversions;
import app.latentledger.core.units.UnitSystem;

/**
 * ASHRAE publishes Handbook—Fundamentals ch. 1 in an SI and an inch-pound edition. The equations
 * are the same physics, but their coefficients are rounded separately and the enthalpy datum
 * differs (dry air at 0 °C in SI, at 0 °F in IP). A tech comparing against the IP tables expects
 * IP-edition numbers, so each state is computed with the edition of the tech's unit system —
 * still in SI variables inside, with the IP coefficients converted exactly.
 *
 * <p>Where the editions differ: the psychrometer equations (2017 ch. 1, eqs. 33 and 35), the
 * enthalpy (eq. 32) and the specific volume (eq. 28). Saturation pressure (eqs. 5, 6) is taken
 * from the SI form for both; the IP fit reproduces it to about 1 part in 10⁵.
 */
public enum HandbookEdition {
    /**
     * SI edition. Eq. 33 (wet bulb ≥ 0 °C): W = ((2501 − 2.326 t*) Ws* − 1.006 (t − t*)) /
     * (2501 + 1.86 t − 4.186 t*); eq. 35 (t* &lt; 0 °C): W = ((2830 − 0.24 t*) Ws* − 1.006 (t − t*)) /
     * (2830 + 1.86 t − 2.1 t*); eq. 32: h = 1.006 t + W (2501 + 1.86 t) kJ/kg;
     * eq. 28: v = 0.287042 (t + 273.15)(1 + 1.607858 W)/p.
     */
    SI(new double[] {2501, 2.326, 1.006, 1.86, 4.186},
       new double[] {2830, 0.24, 1.006, 1.86, 2.1},
       1.006, 2501, 1.86, 1000.0, 0.287042e3),
    /**
     * IP edition. Eq. 33 (t* ≥ 32 °F): W = ((1093 − 0.556 t*) Ws* − 0.240 (t − t*)) /
     * (1093 + 0.444 t − t*); eq. 35 (t* &lt; 32 °F): W = ((1220 − 0.04 t*) Ws* − 0.240 (t − t*)) /
     * (1220 + 0.444 t − 0.48 t*); eq. 32: h = 0.240 t + W (1061 + 0.444 t) Btu/lb;
     * eq. 28: v = 0.370486 (t + 459.67)(1 + 1.607858 W)/p with p in psia.
     */
    IP(new double[] {1093, 0.556, 0.240, 0.444, 1.0},
       new double[] {1220, 0.04, 0.240, 0.444, 0.48},
       0.240, 1061, 0.444, Conversions.J_PER_KG_PER_BTU_PER_LB, 0.370486);

    /** Ratio of molecular masses of water and dry air, 18.015268/28.966 (eq. 22). */
    static final double MASS_RATIO = 0.621945;

    // psychrometer coefficients {a, b, c, d, e}: W = ((a − b t*) Ws* − c (t − t*)) / (a + d t − e t*)
    private final double[] liquid;
    private final double[] ice;
    private final double cpAir;
    private final double hg0;
    private final double cpVapor;
    private final double joulesPerKgPerEnergyUnit;
    private final double volumeCoefficient;

    HandbookEdition(double[] liquid, double[] ice, double cpAir, double hg0, double cpVapor,
                    double joulesPerKgPerEnergyUnit, double volumeCoefficient) {
        this.liquid = liquid;
        this.ice = ice;
        this.cpAir = cpAir;
        this.hg0 = hg0;
        this.cpVapor = cpVapor;
        this.joulesPerKgPerEnergyUnit = joulesPerKgPerEnergyUnit;
        this.volumeCoefficient = volumeCoefficient;
    }

    /** The edition whose numbers a tech working in {@code units} compares against. */
    public static HandbookEdition of(UnitSystem units) {
        return units == UnitSystem.IP ? IP : SI;
    }

    /** Temperature on this edition's scale (°C or °F). */
    double scale(double tempC) {
        return this == IP ? tempC * 1.8 + 32.0 : tempC;
    }

    /** Degrees of this edition's scale per kelvin. */
    double degreesPerKelvin() {
        return this == IP ? 1.8 : 1.0;
    }

    /**
     * Humidity ratio from dry bulb and thermodynamic wet bulb, eq. 33 for a wet bulb at or above
     * freezing and eq. 35 (ice bulb) below it. Not limited to saturation: callers clamp.
     *
     * @param dryBulbC dry bulb, °C
     * @param wetBulbC wet bulb, °C, at or below the dry bulb
     * @param pressurePa total pressure, Pa
     * @return humidity ratio, kg/kg (negative when the wet bulb is too low for any real air)
     */
    public double humidityRatioFromWetBulb(double dryBulbC, double wetBulbC, double pressurePa) {
        double pws = SaturationPressure.pascals(wetBulbC);
        double wsStar = MASS_RATIO * pws / (pressurePa - pws);
        double[] k = wetBulbC >= 0 ? liquid : ice;
        double t = scale(dryBulbC);
        double s = scale(wetBulbC);
        return ((k[0] - k[1] * s) * wsStar - k[2] * (t - s)) / (k[0] + k[3] * t - k[4] * s);
    }

    /**
     * The psychrometer equation with its first and second derivatives in one pass, for Halley's
     * method: returns W(t*) and stores dW/dt* (per K) in {@code slope[0]} and d²W/dt*² (per K²) in
     * {@code slope[1]}. The caller supplies pws(t*) and the first two derivatives of ln pws at t*,
     * so a value it already has costs no further exp or log.
     */
    double humidityRatioAndSlope(double dryBulbC, double wetBulbC, double pressurePa, boolean iceBulb,
                                 double pws, double dLnPwsDT, double d2LnPwsDT2, double[] slope) {
        double q = pressurePa - pws;
        double wsStar = MASS_RATIO * pws / q;
        double dPws = pws * dLnPwsDT;
        double d2Pws = pws * (dLnPwsDT * dLnPwsDT + d2LnPwsDT2);
        double perK = degreesPerKelvin();
        // Ws* and its derivatives per degree of this edition's scale
        double dWs = MASS_RATIO * pressurePa * dPws / (q * q) / perK;
        double d2Ws = MASS_RATIO * pressurePa * (d2Pws * q + 2 * dPws * dPws) / (q * q * q) / (perK * perK);
        double[] k = iceBulb ? ice : liquid;
        double t = scale(dryBulbC);
        double s = scale(wetBulbC);
        double d = k[0] + k[3] * t - k[4] * s;
        double w = ((k[0] - k[1] * s) * wsStar - k[2] * (t - s)) / d;
        // W·D = N with D linear in s: W' = (N' + e W)/D, W'' = (N'' + 2 e W')/D
        double dN = -k[1] * wsStar + (k[0] - k[1] * s) * dWs + k[2];
        double d2N = -2 * k[1] * dWs + (k[0] - k[1] * s) * d2Ws;
        double dW = (dN + k[4] * w) / d;
        double d2W = (d2N + 2 * k[4] * dW) / d;
        slope[0] = dW * perK;
        slope[1] = d2W * perK * perK;
        return w;
    }

    /**
     * Moist-air specific enthalpy per mass of dry air, eq. 32 of this edition, on its own datum
     * (dry air at 0 °C for SI, 0 °F for IP). Compare enthalpies of one edition only.
     *
     * @param dryBulbC dry bulb, °C
     * @param humidityRatio kg/kg
     * @return enthalpy, J/kg of dry air
     */
    public double enthalpyJPerKg(double dryBulbC, double humidityRatio) {
        double t = scale(dryBulbC);
        return (cpAir * t + humidityRatio * (hg0 + cpVapor * t)) * joulesPerKgPerEnergyUnit;
    }

    /**
     * Specific volume per mass of dry air, eq. 28 of this edition (perfect-gas relation, eq. 26).
     *
     * @return m³/kg of dry air
     */
    public double specificVolumeM3PerKg(double dryBulbC, double humidityRatio, double pressurePa) {
        double moist = 1.0 + 1.607858 * humidityRatio;
        if (this == IP) {
            double ft3PerLb = volumeCoefficient * (dryBulbC * 1.8 + 32.0 + 459.67) * moist
                    / (pressurePa / Conversions.PA_PER_PSI);
            return ft3PerLb * Conversions.M3_PER_FT3 / Conversions.KG_PER_LB;
        }
        return volumeCoefficient * (dryBulbC + SaturationPressure.ZERO_CELSIUS_K) * moist / pressurePa;
    }

    /** Coefficients of the psychrometer equation for tests: {a, b, c, d, e}. */
    double[] psychrometerCoefficients(boolean iceBulb) {
        return (iceBulb ? ice : liquid).clone();
    }
}
