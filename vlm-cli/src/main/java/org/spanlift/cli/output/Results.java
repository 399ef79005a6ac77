package org.spanlift.cli.output;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.spanlift.vocabulary.ResultKey;

/**
 * Writes vocabulary results: into JSON trees (a dotted key nests, and an object whose values are all
 * absent is written as null), and as table cells in the wing file's length unit. Every
 * writer that shows a result goes through here, so the key, its unit and its table label come from the
 * vocabulary alone.
 */
public final class Results {

    private Results() {
    }

    /**
     * Puts each key's value into {@code tree} under its dotted key, nesting objects (in key order).
     *
     * @param tree the JSON object to fill (modified)
     */
    public static <S> void put(Map<String, Object> tree, List<ResultKey<S>> keys, S source) {
        for (ResultKey<S> k : keys) {
            nest(tree, k.key(), k.of(source));
        }
        collapse(tree);
    }

    @SuppressWarnings("unchecked")
    private static void nest(Map<String, Object> tree, String dotted, Object value) {
        String[] parts = dotted.split("\\.");
        Map<String, Object> m = tree;
        for (int i = 0; i < parts.length - 1; i++) {
            Object child = m.get(parts[i]);
            if (!(child instanceof Map)) {
                child = new LinkedHashMap<String, Object>();
                m.put(parts[i], child);
            }
            m = (Map<String, Object>) child;
        }
        m.put(parts[parts.length - 1], value);
    }

    /** Replaces every nested object whose leaves are all null by null. Returns true when all of tree's are. */
    @SuppressWarnings("unchecked")
    private static boolean collapse(Map<String, Object> tree) {
        boolean allNull = true;
        for (Map.Entry<String, Object> e : new ArrayList<>(tree.entrySet())) {
            Object v = e.getValue();
            if (v instanceof Map<?, ?> child) {
                if (collapse((Map<String, Object>) child) && !child.isEmpty()) {
                    tree.put(e.getKey(), null);
                } else {
                    allNull = false;
                }
            } else if (v != null) {
                allNull = false;
            }
        }
        return allNull;
    }

    /** The table label of a key, with its unit in the display units: {@code alpha [deg]}. */
    public static String label(ResultKey<?> key, DisplayUnits units) {
        String u = units.symbol(key.unit());
        return u.isEmpty() ? key.label() : key.label() + " [" + u + "]";
    }

    /** A value in the display units. */
    public static double display(ResultKey<?> key, double si, DisplayUnits units) {
        return units.convert(key.unit(), si);
    }

    /** A table cell: the value in display units with the key's decimals, text as it is, "-" where absent. */
    public static <S> String cell(ResultKey<S> key, S source, DisplayUnits units) {
        return cellOf(key, key.of(source), units);
    }

    /** A table cell of a value already read. */
    public static String cellOf(ResultKey<?> key, Object value, DisplayUnits units) {
        if (value == null) {
            return "-";
        }
        if (value instanceof Double d) {
            return TextTable.fixed(display(key, d, units), key.decimals());
        }
        return String.valueOf(value);
    }
}
