package org.spanlift.cli.sweep;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;

import org.spanlift.cli.options.OutputTarget;
import org.spanlift.cli.output.Json;
import org.spanlift.input.InputException;
import org.spanlift.sweep.Sweep;

/**
 * The one-line description written beside a sweep's output ({@code results.csv.manifest.json} beside
 * {@code results.csv}; the whole file name is kept, so {@code results.csv} and {@code results.jsonl} have
 * one each): which sweep (by fingerprint of the sweep and base wing files), which slice of its cases, the
 * header of its rows, how many of those columns are parameters, and the ranking. {@code --resume} refuses an
 * output whose manifest differs from the run's, and {@code merge} checks the shards' manifests against each
 * other. A manifest read back is checked key by key ({@link #read}) before anything trusts it.
 *
 * @param fields the manifest's keys and values, in order
 */
public record Manifest(Map<String, String> fields) {

    public static final String VERSION = "2";

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
        f.put("parameters", Integer.toString(sweep.parameters().size()));
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

    /** A file beside an output: the output's name with its extension replaced by {@code suffix}. */
    public static Path beside(Path output, String suffix) {
        String name = output.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String stem = dot > 0 ? name.substring(0, dot) : name;
        return output.resolveSibling(stem + suffix);
    }

    /** The manifest's path beside an output file: the output's whole name and {@code .manifest.json}. */
    public static Path pathFor(Path output) {
        return output.resolveSibling(output.getFileName() + ".manifest.json");
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

    /** Writes the manifest beside an output (whole or not at all). */
    public void write(Path output) {
        OutputTarget.resolve("manifest", pathFor(output)).write(text().getBytes(StandardCharsets.UTF_8));
    }

    /**
     * The manifest beside an output, checked, or null when there is none.
     *
     * @throws InputException naming the manifest, its line and the key when it cannot be read or a key is
     *                        missing or malformed
     */
    public static Manifest read(Path output) {
        Path p = pathFor(output);
        if (!Files.isRegularFile(p)) {
            return null;
        }
        String file = p.toString();
        Map<String, String> f;
        try {
            f = FlatJson.parse(Files.readString(p, StandardCharsets.UTF_8));
        } catch (IOException | IllegalArgumentException e) {
            throw new InputException(file, 1, "", "cannot read this sweep manifest (" + e.getMessage()
                    + "); expected the one-line JSON object spanlift sweep writes");
        }
        Manifest m = new Manifest(f);
        m.validate(file);
        return m;
    }

    private static final Pattern WHOLE = Pattern.compile("0|[1-9]\\d{0,17}");
    private static final Pattern HEX = Pattern.compile("[0-9a-f]{64}");

    /** Checks every key a reader relies on, so that nothing later meets a missing or malformed value. */
    private void validate(String file) {
        String version = required(file, "spanlift_sweep");
        if (!version.equals(VERSION)) {
            throw new InputException(file, 1, "spanlift_sweep", "expected " + VERSION
                    + " (this version of spanlift), got '"
                    + version + "'; run the sweep again without --resume");
        }
        required(file, "sweep");
        required(file, "design");
        if (!HEX.matcher(required(file, "fingerprint")).matches()) {
            throw new InputException(file, 1, "fingerprint", "expected 64 hexadecimal digits, got '"
                    + get("fingerprint") + "'");
        }
        long cases = whole(file, "cases");
        String shardText = required(file, "shard");
        Shard shard;
        try {
            shard = Shard.parse(shardText);
        } catch (InputException e) {
            throw new InputException(file, 1, "shard", "expected i/n with 1 <= i <= n (such as 2/4), got '" + shardText
                    + "'");
        }
        if (whole(file, "first_case") != shard.first(cases) || whole(file, "end_case") != shard.end(cases)) {
            throw new InputException(file, 1, "first_case", "shard " + shard + " of " + cases + " cases is cases "
                    + shard.first(cases) + " up to " + shard.end(cases) + ", not " + get("first_case") + " up to "
                    + get("end_case"));
        }
        String format = required(file, "format");
        if (!format.equals("csv") && !format.equals("jsonl")) {
            throw new InputException(file, 1, "format", "expected csv or jsonl, got '" + format + "'");
        }
        List<String> columns = columns(file);
        long parameters = whole(file, "parameters");
        int fixed = 3 + (columns.contains("feasible") ? 1 : 0);
        if (parameters > columns.size() - fixed) {
            throw new InputException(file, 1, "parameters", "expected at most " + (columns.size() - fixed)
                    + " parameter columns, got " + parameters);
        }
        String by = get("rank_by");
        if (by != null || get("rank_order") != null || get("rank_keep") != null) {
            if (by == null || !columns.contains(by)) {
                throw new InputException(file, 1, "rank_by", "expected one of the columns, got "
                        + (by == null ? "nothing" : "'" + by + "'"));
            }
            String order = required(file, "rank_order");
            if (!order.equals("max") && !order.equals("min")) {
                throw new InputException(file, 1, "rank_order", "expected max or min, got '" + order + "'");
            }
            long keep = whole(file, "rank_keep");
            if (keep < 1 || keep > Integer.MAX_VALUE) {
                throw new InputException(file, 1, "rank_keep", "expected a positive whole number, got " + keep);
            }
        }
    }

    private String required(String file, String key) {
        String v = fields.get(key);
        if (v == null || v.isEmpty()) {
            throw new InputException(file, 1, key, (fields.containsKey(key) ? "empty" : "missing key")
                    + "; expected the manifest spanlift sweep writes");
        }
        return v;
    }

    private long whole(String file, String key) {
        String v = required(file, key);
        if (!WHOLE.matcher(v).matches()) {
            throw new InputException(file, 1, key, "expected a whole number, got '" + v + "'");
        }
        return Long.parseLong(v);
    }

    private List<String> columns(String file) {
        List<String> c = Arrays.asList(required(file, "columns").split(",", -1));
        if (c.size() < 3 || !c.get(0).equals("case") || !c.get(1).equals("id") || !c.get(c.size() - 1).equals("error")
                || c.stream().anyMatch(String::isEmpty) || new HashSet<>(c).size() != c.size()) {
            throw new InputException(file, 1, "columns", "expected case,id, the parameters and results, then error; "
                    + "got '"
                    + get("columns") + "'");
        }
        return c;
    }

    /** The column names (checked when read). */
    public List<String> columnNames() {
        return Arrays.asList(fields.get("columns").split(",", -1));
    }

    /** How many parameter columns follow case and id. */
    public int parameterCount() {
        return Integer.parseInt(fields.get("parameters"));
    }

    /** The slice (checked when read). */
    public Shard shard() {
        return Shard.parse(fields.get("shard"));
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
