package org.spanlift.cli.output;

import java.util.List;
import java.util.Locale;

/** Comma-separated rows (RFC 4180 quoting); numbers with full precision. */
public final class Csv {

    private final StringBuilder b = new StringBuilder();

    public Csv(List<String> header) {
        row(header.toArray());
    }

    public Csv row(Object... cells) {
        for (int i = 0; i < cells.length; i++) {
            if (i > 0) {
                b.append(',');
            }
            b.append(cell(cells[i]));
        }
        b.append('\n');
        return this;
    }

    private static String cell(Object v) {
        if (v == null) {
            return "";
        }
        if (v instanceof Double d) {
            if (!Double.isFinite(d)) {
                throw new IllegalStateException("a result is not a finite number");
            }
            return String.format(Locale.ROOT, "%.10g", d).replaceAll("(\\.\\d*?)0+(e|$)", "$1$2").replace(".e", "e")
                    .replaceAll("\\.$", "");
        }
        String s = String.valueOf(v);
        if (s.contains(",") || s.contains("\"") || s.contains("\n")) {
            return '"' + s.replace("\"", "\"\"") + '"';
        }
        return s;
    }

    @Override
    public String toString() {
        return b.toString();
    }
}
