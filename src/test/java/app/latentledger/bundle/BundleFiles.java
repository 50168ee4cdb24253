package app.latentledger.bundle;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Enumeration;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import java.util.zip.ZipOutputStream;

/**
 * Bundles changed the way a careful tamperer would: entries edited, then the manifest's sizes and
 * SHA-256 sums recomputed, so only the content checks can refuse them.
 */
public final class BundleFiles {
    private BundleFiles() {
    }

    public static Map<String, byte[]> entries(Path zipFile) throws IOException {
        Map<String, byte[]> entries = new LinkedHashMap<>();
        try (ZipFile zip = new ZipFile(zipFile.toFile())) {
            Enumeration<? extends ZipEntry> all = zip.entries();
            while (all.hasMoreElements()) {
                ZipEntry e = all.nextElement();
                try (InputStream in = zip.getInputStream(e)) {
                    entries.put(e.getName(), in.readAllBytes());
                }
            }
        }
        return entries;
    }

    /** {@code template} with {@code change} applied to its entries and the manifest re-hashed. */
    public static Path rehashed(Path template, Path out, Consumer<Map<String, byte[]>> change) throws IOException {
        Map<String, byte[]> entries = entries(template);
        change.accept(entries);
        write(out, rehash(entries));
        return out;
    }

    /** The manifest's entry list rebuilt from the entries as they now are. */
    public static Map<String, byte[]> rehash(Map<String, byte[]> entries) {
        JsonObject manifest = JsonParser.parseString(new String(entries.get("manifest.json"), StandardCharsets.UTF_8))
                .getAsJsonObject();
        JsonArray list = new JsonArray();
        for (Map.Entry<String, byte[]> e : entries.entrySet()) {
            if (e.getKey().equals("manifest.json")) {
                continue;
            }
            JsonObject o = new JsonObject();
            o.addProperty("name", e.getKey());
            o.addProperty("bytes", e.getValue().length);
            o.addProperty("sha256", BundleFormat.sha256(e.getValue()));
            list.add(o);
        }
        manifest.add("entries", list);
        Map<String, byte[]> out = new LinkedHashMap<>();
        out.put("manifest.json", BundleFormat.GSON.toJson(manifest).getBytes(StandardCharsets.UTF_8));
        entries.forEach((k, v) -> {
            if (!k.equals("manifest.json")) {
                out.put(k, v);
            }
        });
        return out;
    }

    public static void write(Path out, Map<String, byte[]> entries) throws IOException {
        try (OutputStream file = Files.newOutputStream(out); ZipOutputStream zip = new ZipOutputStream(file)) {
            for (Map.Entry<String, byte[]> e : entries.entrySet()) {
                zip.putNextEntry(new ZipEntry(e.getKey()));
                zip.write(e.getValue());
                zip.closeEntry();
            }
        }
    }

    /** One entry's text with {@code edit} applied. */
    public static void editText(Map<String, byte[]> entries, String name, java.util.function.UnaryOperator<String> edit) {
        entries.put(name, edit.apply(new String(entries.get(name), StandardCharsets.UTF_8)).getBytes(StandardCharsets.UTF_8));
    }

    /**
     * Every id in {@code ids} renamed to id + suffix in every entry and entry name, whole words only,
     * so each copy imports as new records.
     */
    public static Map<String, byte[]> renamed(Map<String, byte[]> entries, Set<String> ids, String suffix) {
        Pattern any = Pattern.compile("(?<![A-Za-z0-9_-])(" + String.join("|", ids.stream().map(Pattern::quote).toList())
                + ")(?![A-Za-z0-9_-])");
        Map<String, byte[]> out = new LinkedHashMap<>();
        for (Map.Entry<String, byte[]> e : entries.entrySet()) {
            String name = any.matcher(e.getKey()).replaceAll(m -> Matcher.quoteReplacement(m.group(1) + suffix));
            String text = new String(e.getValue(), StandardCharsets.UTF_8);
            out.put(name, any.matcher(text).replaceAll(m -> Matcher.quoteReplacement(m.group(1) + suffix))
                    .getBytes(StandardCharsets.UTF_8));
        }
        return rehash(out);
    }
}
