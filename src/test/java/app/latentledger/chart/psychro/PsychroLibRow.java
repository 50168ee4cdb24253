package app.latentledger.chart.psychro;

import app.latentledger.core.units.Conversions;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Objects;

/**
 * One row of the PsychroLib 2.5.0 reference grid (src/test/resources/reference/psychrolib, see its
 * README for how it was generated), converted to SI.
 */
record PsychroLibRow(String id, double pressurePa, double dryBulbC, double wetBulbC, double dewPointC, double rhPct,
                     double humidityRatio, double enthalpyShown, double volumeShown) {

    static PsychroLibRow get(String caseId) {
        try (BufferedReader r = new BufferedReader(new InputStreamReader(Objects.requireNonNull(
                PsychroLibRow.class.getResourceAsStream("/reference/psychrolib/psychrolib-grid.csv")),
                StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                String[] f = line.split(",");
                if (f.length > 1 && f[1].equals(caseId)) {
                    boolean ip = f[0].equals("ip");
                    double p = Double.parseDouble(f[3]) * (ip ? Conversions.PA_PER_PSI : 1000);
                    return new PsychroLibRow(caseId, p, c(f[4], ip), c(f[7], ip), c(f[8], ip),
                            Double.parseDouble(f[9]), Double.parseDouble(f[10]), Double.parseDouble(f[11]),
                            Double.parseDouble(f[12]));
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        throw new IllegalArgumentException("no PsychroLib grid row " + caseId);
    }

    private static double c(String v, boolean ip) {
        double d = Double.parseDouble(v);
        return ip ? (d - 32) / 1.8 : d;
    }
}
