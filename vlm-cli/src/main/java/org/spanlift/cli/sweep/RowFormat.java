package org.spanlift.cli.sweep;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;

import org.spanlift.cli.output.Csv;
import org.spanlift.cli.output.Json;
import org.spanlift.cli.output.Numbers;
import org.spanlift.batch.CaseResult;
import org.spanlift.sweep.ResultColumn;
import org.spanlift.sweep.Sweep;

/**
 * How sweep rows are written and read back: CSV (a header line, then one line per case) or JSON Lines (one
 * flat object per case). Columns: {@code case} (index from 0 in the whole design), {@code id}, the parameter
 * paths, the derived paths (each case's derived value, empty when it could not be computed), the result columns, {@code
 * feasible} (with constraints) and {@code error}. Numbers are written in full precision (Java's shortest round-trip
 * form); an absent value is an empty cell or null. A row ends with a line feed: in JSON Lines every row is one line; in
 * CSV a text cell holding a comma, a quote or a line break is quoted (RFC 4180), so a row is complete when its line
 * feed outside quotes is there ({@link RowReader}).
 */
public enum RowFormat {
    CSV, JSONL;

    private static final Pattern JSON_NUMBER = Pattern.compile("-?(?:0|[1-9]\\d*)(?:\\.\\d+)?(?:[eE][-+]?\\d+)?");

    /** The format of an output file by its extension, or null. */
    public static RowFormat of(String fileName) {
        String lower = fileName.toLowerCase(Locale.ROOT);
        if (lower.endsWith(".csv")) {
            return CSV;
        }
        if (lower.endsWith(".jsonl")) {
            return JSONL;
        }
        return null;
    }

    public String extension() {
        return this == CSV ? ".csv" : ".jsonl";
    }

    /** The column names of a sweep's rows. */
    public static List<String> columnNames(Sweep sweep) {
        List<String> names = new ArrayList<>();
        names.add("case");
        names.add("id");
        sweep.parameters().forEach(p -> names.add(p.key()));
        sweep.derivation().derived().forEach(d -> names.add(d.path().text()));
        sweep.columns().forEach(c -> names.add(c.name()));
        if (!sweep.constraints().isEmpty()) {
            names.add("feasible");
        }
        names.add("error");
        return names;
    }

    /** The header line with its newline (CSV), or null (JSON Lines has none). */
    public String header(List<String> names) {
        if (this == JSONL) {
            return null;
        }
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < names.size(); i++) {
            b.append(i == 0 ? "" : ",").append(csvText(names.get(i)));
        }
        return b.append('\n').toString();
    }

    /** One row with its newline. */
    public String row(List<String> names, Sweep sweep, CaseResult r) {
        List<Object> cells = new ArrayList<>();
        cells.add(r.index());
        cells.add(r.id());
        for (String v : r.values()) {
            cells.add(new ParameterValue(v));
        }
        int derived = sweep.derivation().derived().size();
        for (int i = 0; i < derived; i++) {
            cells.add(r.derived() == null ? null : (Object) r.derived()[i]);
        }
        List<ResultColumn> columns = sweep.columns();
        for (int i = 0; i < columns.size(); i++) {
            cells.add(r.results()[i]);
        }
        if (!sweep.constraints().isEmpty()) {
            cells.add(r.feasible());
        }
        cells.add(r.error());
        StringBuilder b = new StringBuilder();
        if (this == CSV) {
            for (int i = 0; i < cells.size(); i++) {
                b.append(i == 0 ? "" : ",").append(csvCell(cells.get(i)));
            }
        } else {
            b.append('{');
            for (int i = 0; i < cells.size(); i++) {
                b.append(i == 0 ? "" : ",");
                Json.string(names.get(i), b);
                b.append(':');
                jsonCell(cells.get(i), b);
            }
            b.append('}');
        }
        return b.append('\n').toString();
    }

    /** A parameter value as written in the sweep (a number stays a number in JSON Lines). */
    private record ParameterValue(String text) {
    }

    static String number(double d) {
        return Numbers.shortest(d);
    }

    private static String csvCell(Object v) {
        if (v == null) {
            return "";
        }
        if (v instanceof Double d) {
            return number(d);
        }
        if (v instanceof ParameterValue p) {
            return csvText(p.text());
        }
        return csvText(String.valueOf(v));
    }

    private static String csvText(String s) {
        return Csv.text(s);
    }

    private static void jsonCell(Object v, StringBuilder b) {
        if (v == null) {
            b.append("null");
        } else if (v instanceof Double d) {
            b.append(number(d));
        } else if (v instanceof Long || v instanceof Integer || v instanceof Boolean) {
            b.append(v);
        } else if (v instanceof ParameterValue p) {
            if (JSON_NUMBER.matcher(p.text()).matches()) {
                b.append(p.text());
            } else {
                Json.string(p.text(), b);
            }
        } else {
            Json.string(String.valueOf(v), b);
        }
    }


    /**
     * The cells of a row written by {@link #row}, by column name; absent values are null, and everything
     * else is the cell's text (a JSON string unescaped, a number or boolean as written).
     */
    public Map<String, String> parse(List<String> names, String line) {
        Map<String, String> out = new LinkedHashMap<>();
        if (this == CSV) {
            List<String> cells = Csv.cells(line);
            if (cells.size() != names.size()) {
                throw new IllegalArgumentException("the row has " + cells.size() + " cells, the header "
                        + names.size());
            }
            for (int i = 0; i < names.size(); i++) {
                out.put(names.get(i), cells.get(i).isEmpty() ? null : cells.get(i));
            }
            return out;
        }
        out = FlatJson.parse(line);
        if (!List.copyOf(out.keySet()).equals(names)) {
            throw new IllegalArgumentException("the row's keys are not the sweep's columns in order");
        }
        return out;
    }
}
