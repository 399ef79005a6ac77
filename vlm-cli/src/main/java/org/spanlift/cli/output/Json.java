package org.spanlift.cli.output;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * Serializes a tree of maps, lists, arrays, strings, numbers, booleans and nulls as JSON, with stable key
 * order (use ordered maps). A non-finite number is a bug upstream and is refused, never printed.
 */
public final class Json {

    private Json() {
    }

    public static String write(Object value) {
        StringBuilder b = new StringBuilder();
        write(value, b, 0);
        return b.append('\n').toString();
    }

    private static void indent(StringBuilder b, int depth) {
        b.append('\n');
        b.append("  ".repeat(depth));
    }

    private static void write(Object v, StringBuilder b, int depth) {
        if (v == null) {
            b.append("null");
        } else if (v instanceof String s) {
            string(s, b);
        } else if (v instanceof Boolean || v instanceof Integer || v instanceof Long) {
            b.append(v);
        } else if (v instanceof Double d) {
            number(d, b);
        } else if (v instanceof OptionalDouble o) {
            if (o.isPresent()) {
                number(o.getAsDouble(), b);
            } else {
                b.append("null");
            }
        } else if (v instanceof double[] a) {
            b.append('[');
            for (int i = 0; i < a.length; i++) {
                if (i > 0) {
                    b.append(", ");
                }
                number(a[i], b);
            }
            b.append(']');
        } else if (v instanceof Map<?, ?> m) {
            if (m.isEmpty()) {
                b.append("{}");
                return;
            }
            b.append('{');
            boolean first = true;
            for (Map.Entry<?, ?> e : m.entrySet()) {
                if (!first) {
                    b.append(',');
                }
                first = false;
                indent(b, depth + 1);
                string(String.valueOf(e.getKey()), b);
                b.append(": ");
                write(e.getValue(), b, depth + 1);
            }
            indent(b, depth);
            b.append('}');
        } else if (v instanceof List<?> l) {
            if (l.isEmpty()) {
                b.append("[]");
                return;
            }
            b.append('[');
            for (int i = 0; i < l.size(); i++) {
                if (i > 0) {
                    b.append(',');
                }
                indent(b, depth + 1);
                write(l.get(i), b, depth + 1);
            }
            indent(b, depth);
            b.append(']');
        } else {
            throw new IllegalArgumentException("cannot write " + v.getClass().getSimpleName() + " as JSON");
        }
    }

    private static void number(double d, StringBuilder b) {
        b.append(Numbers.shortest(d));
    }

    /** Appends the JSON string literal of {@code s} (quoted and escaped) to {@code b}. */
    public static void string(String s, StringBuilder b) {
        b.append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                default -> {
                    if (c < 0x20) {
                        b.append(String.format("\\u%04x", (int) c));
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        b.append('"');
    }
}
