package app.latentledger.fielddata;

import app.latentledger.fielddata.SyntheticLog.Blower;
import app.latentledger.fielddata.SyntheticLog.Layout;
import app.latentledger.fielddata.SyntheticLog.Scenario;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Writes the invented logs in {@code field-data-samples/} (Saltreed, an invented humid coastal
 * town; every number is made up by {@link SyntheticLog}). Deterministic: same seed, same bytes.
 *
 * <p>Regenerate (see field-data-samples/README.md):
 * <pre>mvn -B -q test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp target/classes:target/test-classes:$(cat target/cp.txt) app.latentledger.fielddata.FieldSamples field-data-samples</pre>
 */
public final class FieldSamples {
    /** One sample file: name, text and the command-line options it needs. */
    public record Sample(String file, String text, List<String> options, int trueRuns) {
    }

    private FieldSamples() {
    }

    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args.length > 0 ? args[0] : "field-data-samples");
        Files.createDirectories(dir);
        for (Sample s : all()) {
            Files.writeString(dir.resolve(s.file()), s.text(), StandardCharsets.UTF_8);
            System.out.println(s.file() + "  " + s.text().length() / 1024 + " KiB  options: " + String.join(" ", s.options()));
        }
    }

    public static List<Sample> all() throws IOException {
        return List.of(healthy(), shortCycling(), blowerLeftOn(), otherLogger());
    }

    private static double[] pattern(double... onOff) {
        return onOff;
    }

    /** A right-sized system on a mild day: long runs, blower off between them. */
    static Sample healthy() throws IOException {
        Scenario s = new Scenario();
        s.intervalS = 60;
        s.leadOffS = 1500;
        s.onOff = pattern(1980, 1500, 2400, 1320, 2100, 1680, 2700, 1200, 1800, 1800);
        s.fillToS = 86_400;
        s.blower = Blower.AUTO;
        s.returnDbC = 24.2;
        s.returnRhPct = 52;
        s.returnDailySwingK = 0.4;
        s.splitK = 11;
        s.supplyLagS = 45;
        s.steadyDryingW = 0.0016;
        s.noiseK = 0.05;
        s.noiseRhPct = 0.4;
        s.seed = 101;
        s.start = LocalDateTime.of(2026, 7, 14, 0, 0);
        Layout l = new Layout();
        l.headers = new String[] {"time", "return_db", "return_rh", "supply_db", "supply_rh"};
        l.status = false;
        l.time = Layout.Time.ISO_LOCAL;
        return new Sample("healthy-long-cycling.csv", text(s, l), List.of("--units", "ip", "--airflow", "1200"), runs(s));
    }

    /** An oversized unit: short runs, many starts, a 3-minute fan-off delay; status wires logged. */
    static Sample shortCycling() throws IOException {
        Scenario s = new Scenario();
        s.intervalS = 10;
        s.leadOffS = 900;
        s.onOff = pattern(360, 420, 330, 480, 400, 390, 300, 450, 1080, 420);
        s.fillToS = 86_400;
        s.blower = Blower.DELAY;
        s.fanDelayS = 180;
        s.returnDbC = 24.4;
        s.returnRhPct = 58;
        s.splitK = 10.5;
        s.supplyLagS = 20;
        s.steadyDryingW = 0.0015;
        s.noiseK = 0.05;
        s.noiseRhPct = 0.3;
        s.seed = 202;
        s.start = LocalDateTime.of(2026, 7, 15, 0, 0);
        Layout l = new Layout();
        l.time = Layout.Time.ISO_OFFSET;
        return new Sample("oversized-short-cycling.csv", text(s, l), List.of("--units", "ip", "--airflow", "1400"), runs(s));
    }

    /** Thermostat fan set to ON: the blower runs through every rest over a wet coil. */
    static Sample blowerLeftOn() throws IOException {
        Scenario s = new Scenario();
        s.intervalS = 60;
        s.leadOffS = 1200;
        s.onOff = pattern(1500, 960, 1800, 1080, 1320, 1200, 2100, 900);
        s.fillToS = 86_400;
        s.blower = Blower.CONTINUOUS;
        s.twetS = 1300;
        s.gamma = 1.3;
        s.returnDbC = 24.0;
        s.returnRhPct = 50;
        s.splitK = 11;
        s.supplyLagS = 30;
        s.steadyDryingW = 0.0014;
        s.noiseK = 0.05;
        s.noiseRhPct = 0.3;
        s.seed = 303;
        Layout l = new Layout();
        l.headers = new String[] {"seconds", "return_db", "return_rh", "supply_db", "supply_rh"};
        l.status = false;
        l.ip = false;
        l.time = Layout.Time.SECONDS;
        return new Sample("blower-left-on.csv", text(s, l), List.of("--units", "si", "--airflow", "520"), runs(s));
    }

    /**
     * Another logger's export: its own headers, ';' and decimal comma, a battery column; continuous
     * blower with long night rests and a supply RH probe reading 4.5 % high; three bad rows.
     */
    static Sample otherLogger() throws IOException {
        Scenario s = new Scenario();
        s.intervalS = 60;
        s.leadOffS = 1800;
        s.onOff = pattern(1200, 3000, 1500, 2700, 1800, 900, 2100, 900, 1800, 1200);
        s.fillToS = 86_400;
        s.blower = Blower.CONTINUOUS;
        s.returnDbC = 23.6;
        s.returnRhPct = 54;
        s.splitK = 10.5;
        s.supplyLagS = 30;
        s.steadyDryingW = 0.0013;
        s.noiseK = 0.05;
        s.noiseRhPct = 0.3;
        s.supplyRhOffsetPct = 4.5;
        s.seed = 404;
        s.start = LocalDateTime.of(2026, 7, 16, 0, 0);
        Layout l = new Layout();
        l.headers = new String[] {"Date/Time", "RA Temp [°C]", "RA RH [%]", "SA Temp [°C]", "SA RH [%]"};
        l.delimiter = ";";
        l.decimalComma = true;
        l.status = false;
        l.ip = false;
        l.time = Layout.Time.ISO_LOCAL;
        l.localFormat = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss");
        l.extra = new String[][] {{"Battery [V]", "3,02"}};
        String text = text(s, l);
        // three bad rows, as exports have them: a sensor error code, a line cut short, a repeated time
        String[] lines = text.split("\n", -1);
        lines[200] = lines[200].replaceFirst(";[^;]*;", ";ERR;");
        lines[500] = lines[500].substring(0, lines[500].indexOf(';', lines[500].indexOf(';') + 1));
        List<String> out = new ArrayList<>(List.of(lines));
        out.add(901, lines[900]);
        Map<String, String> maps = new LinkedHashMap<>();
        maps.put("Date/Time", "time");
        maps.put("RA Temp [°C]", "return_db");
        maps.put("RA RH [%]", "return_rh");
        maps.put("SA Temp [°C]", "supply_db");
        maps.put("SA RH [%]", "supply_rh");
        List<String> options = new ArrayList<>(List.of("--units", "si", "--airflow", "470"));
        maps.forEach((k, v) -> {
            options.add("--map");
            options.add(k + "=" + v);
        });
        return new Sample("other-logger-export.csv", String.join("\n", out), options, runs(s));
    }

    private static String text(Scenario s, Layout l) throws IOException {
        StringWriter w = new StringWriter();
        SyntheticLog.generate(s).write(w, l);
        return w.toString();
    }

    private static int runs(Scenario s) {
        return SyntheticLog.generate(s).runs.size();
    }
}
