package org.spanlift.cli.output;

import java.util.ArrayList;
import java.util.List;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;

/**
 * An aligned text table: a header row, then rows of cells two spaces apart; the first column (and any
 * chosen with {@link #leftAlign}) left-aligned, the others (numbers) right-aligned.
 */
public final class TextTable {

    private final List<String> headers;
    private final List<List<String>> rows = new ArrayList<>();
    private final Set<Integer> leftAligned = new HashSet<>(List.of(0));

    public TextTable(List<String> headers) {
        this.headers = List.copyOf(headers);
    }

    /** Left-aligns these columns (text), besides the first. */
    public TextTable leftAlign(int... columns) {
        for (int c : columns) {
            leftAligned.add(c);
        }
        return this;
    }

    public TextTable row(List<String> cells) {
        if (cells.size() != headers.size()) {
            throw new IllegalArgumentException("row has " + cells.size() + " cells, table has " + headers.size());
        }
        rows.add(List.copyOf(cells));
        return this;
    }

    public String render() {
        int n = headers.size();
        int[] width = new int[n];
        for (int c = 0; c < n; c++) {
            width[c] = headers.get(c).length();
            for (List<String> r : rows) {
                width[c] = Math.max(width[c], r.get(c).length());
            }
        }
        StringBuilder b = new StringBuilder();
        line(b, headers, width, leftAligned);
        StringBuilder rule = new StringBuilder();
        for (int c = 0; c < n; c++) {
            rule.append(c == 0 ? "" : "  ").append("-".repeat(width[c]));
        }
        b.append(rule).append('\n');
        for (List<String> r : rows) {
            line(b, r, width, leftAligned);
        }
        return b.toString();
    }

    private static void line(StringBuilder b, List<String> cells, int[] width, Set<Integer> left) {
        StringBuilder l = new StringBuilder();
        for (int c = 0; c < cells.size(); c++) {
            if (c > 0) {
                l.append("  ");
            }
            String s = cells.get(c);
            String pad = " ".repeat(width[c] - s.length());
            l.append(left.contains(c) ? s + pad : pad + s);
        }
        b.append(l.toString().stripTrailing()).append('\n');
    }

    /** A number in fixed notation with the given decimals. */
    public static String fixed(double v, int decimals) {
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        // no "-0.000": a value that rounds to zero prints without a sign
        return s.startsWith("-") && s.chars().noneMatch(ch -> ch >= '1' && ch <= '9') ? s.substring(1) : s;
    }

    /** Text as an indented paragraph, lines of at most 100 characters. */
    public static String wrap(String text) {
        StringBuilder out = new StringBuilder("  ");
        int col = 2;
        for (String word : text.split(" ")) {
            if (col + word.length() > 100) {
                out.append("\n  ");
                col = 2;
            }
            out.append(word).append(' ');
            col += word.length() + 1;
        }
        return out.toString().replace(" \n", "\n").stripTrailing();
    }
}
