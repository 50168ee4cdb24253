package app.latentledger.store;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One schema step, a SQL file {@code V<n>__<what>.sql} in
 * {@code src/main/resources/app/latentledger/store/migrations}. Statements end with a semicolon at
 * the end of a line; {@code --} comments are dropped. No triggers (their bodies hold semicolons).
 *
 * @param version   1, 2, 3… (rising; a number may be skipped)
 * @param name      the file name
 * @param statements the SQL statements in order
 */
record Migration(int version, String name, List<String> statements) {
    private static final Pattern NAME = Pattern.compile("V(\\d+)__[a-z0-9_]+\\.sql");

    /** Every schema step this build knows, in order. A new step is a new file and a new line here. */
    static final List<String> FILES = List.of(
            "V1__sites_systems_visits_readings.sql",
            "V2__imported_logs.sql",
            "V3__results_snapshots_and_labels.sql",
            "V4__settings.sql",
            "V5__airflow_basis_and_probes.sql",
            "V6__log_conditions.sql",
            "V7__paperwork_and_recycle_bin.sql",
            "V9__house_facts.sql",
            "V10__office_sync.sql",
            "V11__site_time_zone.sql");

    static List<Migration> all() {
        List<Migration> all = new ArrayList<>();
        for (String f : FILES) {
            all.add(load(f));
        }
        // numbers rise but may skip: steps are numbered when work starts, and a number given out
        // for work that never lands leaves a gap (a database never records a step it did not run)
        for (int i = 1; i < all.size(); i++) {
            if (all.get(i).version <= all.get(i - 1).version) {
                throw new IllegalStateException("migration " + all.get(i).name + " out of order");
            }
        }
        return all;
    }

    static int latestVersion() {
        return load(FILES.get(FILES.size() - 1)).version();
    }

    static Migration load(String file) {
        Matcher m = NAME.matcher(file);
        if (!m.matches()) {
            throw new IllegalStateException("migration file name " + file + " is not V<n>__<name>.sql");
        }
        String path = "migrations/" + file;
        try (InputStream in = Migration.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalStateException("migration " + path + " missing from the build");
            }
            return new Migration(Integer.parseInt(m.group(1)), file, split(new String(in.readAllBytes(), StandardCharsets.UTF_8)));
        } catch (IOException e) {
            throw new IllegalStateException("cannot read migration " + path, e);
        }
    }

    static List<String> split(String sql) {
        List<String> out = new ArrayList<>();
        StringBuilder current = new StringBuilder();
        for (String line : sql.split("\r?\n")) {
            int comment = line.indexOf("--");
            String code = (comment >= 0 ? line.substring(0, comment) : line).stripTrailing();
            if (code.isBlank()) {
                continue;
            }
            current.append(code).append('\n');
            if (code.endsWith(";")) {
                out.add(current.toString().strip());
                current.setLength(0);
            }
        }
        if (!current.toString().isBlank()) {
            throw new IllegalStateException("statement without a closing semicolon: " + current);
        }
        return out;
    }
}
