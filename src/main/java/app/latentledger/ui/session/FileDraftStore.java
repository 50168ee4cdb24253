package app.latentledger.ui.session;

import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.files.SafeFiles;
import com.google.gson.Gson;
import com.google.gson.JsonObject;
import com.google.gson.JsonParseException;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.Set;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * Drafts as one small JSON file per reading set in {@code <data folder>/drafts}. Each save writes a
 * temporary file, forces it to the disk, renames it over the old one (atomic on one file system)
 * and forces the folder, so after a kill the file is either the previous draft or the new one.
 *
 * <p>Why a file beside the ledger and not a table in it: a reading set the ledger keeps must have
 * its return and supply readings; the first three taps of a visit make no such record yet. Once a
 * draft is complete the session also saves it as the reading set in the ledger, in its own
 * transaction, on every accepted value.
 */
public final class FileDraftStore implements DraftStore {
    private static final Gson GSON = new Gson();
    private final Path folder;

    public FileDraftStore(Path dataFolder) {
        this.folder = dataFolder.resolve("drafts");
    }

    @Override
    public void save(Draft d) {
        JsonObject o = new JsonObject();
        o.addProperty("format", 1);
        o.addProperty("readingSetId", d.readingSetId());
        o.addProperty("visitId", d.visitId());
        o.addProperty("takenAt", d.takenAt() == null ? null : d.takenAt().toString());
        o.addProperty("savedAt", OffsetDateTime.now().toString());
        JsonObject values = new JsonObject();
        d.values().forEach((slot, v) -> {
            JsonObject x = new JsonObject();
            x.addProperty("valueSi", v.valueSi());
            x.addProperty("toleranceSi", v.toleranceSi());
            values.add(slot.key(), x);
        });
        o.add("values", values);
        JsonObject choices = new JsonObject();
        d.choices().forEach((slot, c) -> choices.addProperty(slot.key(), c));
        o.add("choices", choices);
        o.addProperty("airflowBasis", d.airflowBasis().key());
        o.addProperty("sameProbe", d.sameProbe());
        com.google.gson.JsonArray typed = new com.google.gson.JsonArray();
        d.typedTolerances().forEach(s -> typed.add(s.key()));
        o.add("typedTolerances", typed);
        write(file(d.readingSetId()), GSON.toJson(o).getBytes(StandardCharsets.UTF_8));
    }

    @Override
    public Optional<Draft> find(String readingSetId) {
        Path f = file(readingSetId);
        if (!Files.exists(f)) {
            return Optional.empty();
        }
        try {
            JsonObject o = GSON.fromJson(Files.readString(f, StandardCharsets.UTF_8), JsonObject.class);
            Map<Slot, SlotValue> values = new EnumMap<>(Slot.class);
            o.getAsJsonObject("values").entrySet().forEach(e -> {
                JsonObject x = e.getValue().getAsJsonObject();
                values.put(Slot.ofKey(e.getKey()), new SlotValue(x.get("valueSi").getAsDouble(),
                        x.get("toleranceSi").getAsDouble()));
            });
            Map<Slot, String> choices = new EnumMap<>(Slot.class);
            o.getAsJsonObject("choices").entrySet().forEach(e ->
                    choices.put(Slot.ofKey(e.getKey()), e.getValue().getAsString()));
            OffsetDateTime taken = o.has("takenAt") && !o.get("takenAt").isJsonNull()
                    ? OffsetDateTime.parse(o.get("takenAt").getAsString()) : null;
            // a draft kept before the basis and probe switches existed: actual airflow, independent probes,
            // and every tolerance as it was kept (nothing is changed under the tech's hands)
            AirflowBasis basis = o.has("airflowBasis")
                    ? AirflowBasis.parse("airflow basis", o.get("airflowBasis").getAsString()) : AirflowBasis.ACTUAL;
            boolean sameProbe = o.has("sameProbe") && o.get("sameProbe").getAsBoolean();
            Set<Slot> typed = EnumSet.noneOf(Slot.class);
            if (o.has("typedTolerances")) {
                o.getAsJsonArray("typedTolerances").forEach(k -> typed.add(Slot.ofKey(k.getAsString())));
            } else {
                typed.addAll(values.keySet());
            }
            return Optional.of(new Draft(o.get("readingSetId").getAsString(), o.get("visitId").getAsString(),
                    values, choices, null, taken, basis, sameProbe, typed));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the draft " + f, e);
        } catch (JsonParseException | IllegalStateException | NullPointerException | IllegalArgumentException e) {
            throw new IllegalStateException("the draft " + f + " is damaged: " + e.getMessage(), e);
        }
    }

    @Override
    public List<String> forVisit(String visitId) {
        if (!Files.isDirectory(folder)) {
            return List.of();
        }
        List<Path> files = new ArrayList<>();
        try (Stream<Path> s = Files.list(folder)) {
            s.filter(p -> p.getFileName().toString().endsWith(".json")).forEach(files::add);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        files.sort(Comparator.comparing(FileDraftStore::modified).reversed());
        List<String> ids = new ArrayList<>();
        for (Path p : files) {
            String id = p.getFileName().toString().replaceFirst("\\.json$", "");
            find(id).filter(d -> d.visitId().equals(visitId)).ifPresent(d -> ids.add(id));
        }
        return ids;
    }

    private Path file(String readingSetId) {
        return folder.resolve(readingSetId + ".json");
    }

    private static long modified(Path p) {
        try {
            return Files.getLastModifiedTime(p).toMillis();
        } catch (IOException e) {
            return 0;
        }
    }

    private void write(Path target, byte[] bytes) {
        try {
            Files.createDirectories(folder);
            SafeFiles.writeAtomically(target, out -> out.write(bytes), SafeFiles.Durability.ON_DISK);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot save the draft in " + folder + ": " + e.getMessage(), e);
        }
    }
}
