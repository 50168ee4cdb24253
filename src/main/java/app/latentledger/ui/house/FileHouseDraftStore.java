package app.latentledger.ui.house;

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
import java.util.EnumMap;
import java.util.Map;

/**
 * The House pad's drafts as one small JSON file per visit in {@code <data folder>/drafts/house}, kept
 * the way the Readings pad keeps its drafts ({@code ui.session.FileDraftStore}): each save writes a
 * temporary file, forces it to the disk and renames it over the old one ({@link SafeFiles}), so after a
 * kill the file is the previous draft or the new one. A file beside the ledger, not a table in it,
 * for the same reason: half an air reading or a house with only its floor area is no record the
 * ledger keeps. A draft with nothing waiting removes its file.
 *
 * <p>A file that cannot be read back (damaged by hand) gives an empty draft: the screen opens, the
 * box shows "—" and the number is typed again; the next save replaces the file.
 */
public final class FileHouseDraftStore implements HouseDraftStore {
    private static final Gson GSON = new Gson();
    private final Path folder;

    public FileHouseDraftStore(Path dataFolder) {
        this.folder = dataFolder.resolve("drafts").resolve("house");
    }

    @Override
    public void save(HouseDraft d) {
        Path f = file(d.visitId());
        try {
            if (d.isEmpty()) {
                Files.deleteIfExists(f);
                return;
            }
            JsonObject o = new JsonObject();
            o.addProperty("format", 1);
            o.addProperty("visitId", d.visitId());
            o.addProperty("savedAt", OffsetDateTime.now().toString());
            JsonObject halves = new JsonObject();
            d.halves().forEach((field, h) -> {
                JsonObject x = new JsonObject();
                x.addProperty("valueSi", h.valueSi());
                x.addProperty("choice", h.choice());
                halves.add(field.key(), x);
            });
            o.add("halves", halves);
            byte[] bytes = GSON.toJson(o).getBytes(StandardCharsets.UTF_8);
            Files.createDirectories(folder);
            SafeFiles.writeAtomically(f, out -> out.write(bytes), SafeFiles.Durability.ON_DISK);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot save the house draft in " + folder + ": " + e.getMessage(), e);
        }
    }

    @Override
    public HouseDraft find(String visitId) {
        Path f = file(visitId);
        if (!Files.exists(f)) {
            return HouseDraft.empty(visitId);
        }
        try {
            JsonObject o = GSON.fromJson(Files.readString(f, StandardCharsets.UTF_8), JsonObject.class);
            Map<HouseField, HouseDraft.Half> halves = new EnumMap<>(HouseField.class);
            o.getAsJsonObject("halves").entrySet().forEach(e -> {
                JsonObject x = e.getValue().getAsJsonObject();
                halves.put(field(e.getKey()), new HouseDraft.Half(x.get("valueSi").getAsDouble(),
                        x.get("choice").getAsString()));
            });
            return new HouseDraft(visitId, halves);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the house draft " + f, e);
        } catch (JsonParseException | IllegalStateException | NullPointerException | IllegalArgumentException
                 | UnsupportedOperationException e) {
            return HouseDraft.empty(visitId);
        }
    }

    private static HouseField field(String key) {
        for (HouseField f : HouseField.values()) {
            if (f.key().equals(key)) {
                return f;
            }
        }
        throw new IllegalArgumentException("house box '" + key + "'");
    }

    private Path file(String visitId) {
        return folder.resolve(visitId + ".json");
    }
}
