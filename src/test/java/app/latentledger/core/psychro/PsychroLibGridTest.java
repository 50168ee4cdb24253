package app.latentledger.core.psychro;

import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The core against PsychroLib 2.5.0 (npm psychrolib@1.1.1; D. Meyer and D. Thevenard 2019,
 * J. Open Source Software 4(33), 1137), an independent implementation of the same ASHRAE
 * Handbook—Fundamentals 2017 ch. 1 equations. The grid (4070 states, IP and SI, four elevations
 * each, below-freezing rows included) was written by the committed node script beside it; see its
 * README for how and for PsychroLib's conventions.
 *
 * <p>Tolerances are the project's acceptance limits: dew point and wet bulb 0.01 °F (0.005 K in
 * SI), RH 0.05 %-points, humidity ratio 0.05 % relative, enthalpy 0.01 Btu/lb (0.02 kJ/kg).
 * PsychroLib's wet bulb from RH is a bisection good to about 0.0009 °F, inside that limit.
 * Rows tagged {@code _twowb} lie in the band near 32 °F where two wet bulbs satisfy the
 * psychrometer equations; PsychroLib returns either root there, so their wet bulb is checked in
 * {@link WetBulbConventionTest} instead.
 */
class PsychroLibGridTest {

    record Row(UnitSystem units, String id, double pressure, double dryBulb, String kind, double input,
               double wetBulb, double dewPoint, double rhPct, double w, double h, double v) {
    }

    static List<Row> rows() throws IOException {
        List<Row> rows = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(Objects.requireNonNull(
                PsychroLibGridTest.class.getResourceAsStream("/reference/psychrolib/psychrolib-grid.csv")),
                StandardCharsets.UTF_8))) {
            String header = r.readLine();
            assertEquals("units,case,elevation,pressure,dry_bulb,input_kind,input_value,wet_bulb,dew_point,"
                    + "rel_hum_pct,hum_ratio,enthalpy,volume", header);
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                String[] f = line.split(",");
                rows.add(new Row(UnitSystem.parse(f[0]), f[1], d(f[3]), d(f[4]), f[5], d(f[6]), d(f[7]), d(f[8]),
                        d(f[9]), d(f[10]), d(f[11]), d(f[12])));
            }
        }
        return rows;
    }

    private static double d(String s) {
        return Double.parseDouble(s);
    }

    @TestFactory
    Stream<DynamicTest> everyUnitSystemAgreesWithPsychroLib() throws IOException {
        List<Row> all = rows();
        assertTrue(all.size() > 4000, "grid has all its rows");
        return Stream.of(UnitSystem.IP, UnitSystem.SI).map(units -> DynamicTest.dynamicTest(
                "PsychroLib grid, " + units.key(), () -> checkAll(all.stream().filter(r -> r.units == units).toList(), units)));
    }

    private static void checkAll(List<Row> rows, UnitSystem units) {
        double tempTol = units == UnitSystem.IP ? 0.01 : 0.005;
        double hTol = units == UnitSystem.IP ? 0.01 : 0.02;
        List<String> failures = new ArrayList<>();
        Stats worst = new Stats();
        for (Row row : rows) {
            MoistAirState s = compute(row, units);
            double wb = Quantity.TEMPERATURE.toDisplay(units, s.wetBulbC());
            double dp = Quantity.TEMPERATURE.toDisplay(units, s.dewPointC());
            double h = units == UnitSystem.IP ? s.enthalpyJPerKg() / 2326.0 : s.enthalpyJPerKg() / 1000.0;
            double v = Quantity.SPECIFIC_VOLUME.toDisplay(units, s.specificVolumeM3PerKg());
            boolean twoRoots = row.id.endsWith("_twowb");
            if (!twoRoots) {
                worst.wb = Math.max(worst.wb, Math.abs(wb - row.wetBulb));
                check(failures, row, "wet bulb", wb, row.wetBulb, tempTol);
            }
            worst.dp = Math.max(worst.dp, Math.abs(dp - row.dewPoint));
            worst.rh = Math.max(worst.rh, Math.abs(s.relativeHumidityPct() - row.rhPct));
            worst.w = Math.max(worst.w, Math.abs(s.humidityRatio() / row.w - 1));
            worst.h = Math.max(worst.h, Math.abs(h - row.h));
            check(failures, row, "dew point", dp, row.dewPoint, tempTol);
            check(failures, row, "RH", s.relativeHumidityPct(), row.rhPct, 0.05);
            check(failures, row, "W (relative)", s.humidityRatio() / row.w, 1.0, 5e-4);
            check(failures, row, "enthalpy", h, row.h, hTol);
            check(failures, row, "volume (relative)", v / row.v, 1.0, 1e-4);
        }
        System.out.printf("PsychroLib grid %s: %d rows; worst |Δ| wb %.2g, dp %.2g, RH %.2g %%-pt, W %.2g rel, h %.2g%n",
                units.key(), rows.size(), worst.wb, worst.dp, worst.rh, worst.w, worst.h);
        assertTrue(failures.isEmpty(), failures.size() + " disagreements, first: "
                + failures.subList(0, Math.min(10, failures.size())));
    }

    static MoistAirState compute(Row row, UnitSystem units) {
        double p = Quantity.PRESSURE.fromDisplay(units, row.pressure);
        double db = Quantity.TEMPERATURE.fromDisplay(units, row.dryBulb);
        HandbookEdition ed = HandbookEdition.of(units);
        if (row.kind.equals("wet_bulb")) {
            return MoistAirState.fromWetBulb(p, db, Quantity.TEMPERATURE.fromDisplay(units, row.input), ed);
        }
        return MoistAirState.fromRelativeHumidity(p, db, row.input, ed);
    }

    private static void check(List<String> failures, Row row, String what, double got, double want, double tol) {
        if (!(Math.abs(got - want) <= tol)) {
            failures.add(row.id + " " + what + ": " + got + " vs PsychroLib " + want);
        }
    }

    private static final class Stats {
        double wb;
        double dp;
        double rh;
        double w;
        double h;
    }
}
