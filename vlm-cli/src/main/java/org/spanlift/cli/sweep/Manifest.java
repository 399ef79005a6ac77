package org.spanlift.cli.sweep;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Locale;

import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.output.Json;
import org.spanlift.input.InputException;
import org.spanlift.sweep.Sweep;

/**
 * The one-line description written beside a sweep's output ({@code results.manifest.json} beside
 * {@code results.csv}): which sweep (by fingerprint of the sweep and base wing files), which slice of its
 * cases, the header of its rows and the ranking. {@code --resume} refuses an output whose manifest differs
 * from the run's, and {@code merge} checks the shards' manifests against each other.
 *
 * @param fields the manifest's keys and values, in order
 */
public record Manifest(Map<String, String> fields) {

    public static final String VERSION = "1";

    /** The manifest of a run of a sweep over one shard. */
    public static Manifest of(Sweep sweep, Shard shard, RowFormat format) {
        long n = sweep.design().count();
        Map<String, String> f = new LinkedHashMap<>();
        f.put("spanlift_sweep", VERSION);
        f.put("sweep", sweep.file());
        f.put("fingerprint", sweep.fingerprint());
        f.put("design", sweep.design().describe());
        f.put("cases", Long.toString(n));
        f.put("shard", shard.toString());
        f.put("first_case", Long.toString(shard.first(n)));
        f.put("end_case", Long.toString(shard.end(n)));
        f.put("format", format.name().toLowerCase(Locale.ROOT));
        f.put("columns", String.join(",", RowFormat.columnNames(sweep)));
        sweep.ranking().ifPresent(r -> {
            f.put("rank_by", r.by());
            f.put("rank_order", r.highestFirst() ? "max" : "min");
            f.put("rank_keep", Integer.toString(r.keep()));
        });
        return new Manifest(f);
    }

    /** A copy for another slice (the merged whole). */
    public Manifest whole() {
        Map<String, String> f = new LinkedHashMap<>(fields);
        f.put("shard", "1/1");
        f.put("first_case", "0");
        f.put("end_case", fields.get("cases"));
        return new Manifest(f);
    }

    /** The manifest's path beside an output file: its name with the extension replaced. */
    public static Path beside(Path output, String suffix) {
        String name = output.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String stem = dot > 0 ? name.substring(0, dot) : name;
        return output.resolveSibling(stem + suffix);
    }

    public static Path pathFor(Path output) {
        return beside(output, ".manifest.json");
    }

    public String text() {
        StringBuilder b = new StringBuilder("{");
        boolean first = true;
        for (Map.Entry<String, String> e : fields.entrySet()) {
            b.append(first ? "" : ", ");
            first = false;
            Json.string(e.getKey(), b);
            b.append(": ");
            Json.string(e.getValue(), b);
        }
        return b.append("}\n").toString();
    }

    public void write(Path output) {
        OutputOptions.writeAtomically(pathFor(output), text().getBytes(StandardCharsets.UTF_8));
    }

    /** The manifest beside an output, or null when there is none. */
    public static Manifest read(Path output) {
        Path p = pathFor(output);
        if (!Files.isRegularFile(p)) {
            return null;
        }
        try {
            return new Manifest(FlatJson.parse(Files.readString(p, StandardCharsets.UTF_8)));
        } catch (IOException | IllegalArgumentException e) {
            throw new InputException(p.toString(), 0, "", "cannot read this sweep manifest (" + e.getMessage() + ")");
        }
    }

    /** True when both describe the same run (the sweep file's path as typed may differ). */
    public boolean sameRun(Manifest other) {
        Map<String, String> a = new LinkedHashMap<>(fields);
        Map<String, String> b = new LinkedHashMap<>(other.fields);
        a.remove("sweep");
        b.remove("sweep");
        return a.equals(b);
    }

    public String get(String key) {
        return fields.get(key);
    }

    public long number(String key) {
        return Long.parseLong(fields.get(key));
    }
}
