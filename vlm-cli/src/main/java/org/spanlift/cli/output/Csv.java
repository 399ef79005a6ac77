package org.spanlift.cli.output;

import java.util.ArrayList;
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
            return Numbers.shortest(d);
        }
        return text(String.valueOf(v));
    }

    /**
     * A text cell as RFC 4180 writes it: quoted when it holds a comma, a double quote, a carriage return or
     * a line feed, with each double quote doubled; line breaks stay as they are, inside the quotes.
     */
    public static String text(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == ',' || c == '"' || c == '\r' || c == '\n') {
                return '"' + s.replace("\"", "\"\"") + '"';
            }
        }
        return s;
    }

    /**
     * The cells of one record (RFC 4180: a quoted cell may hold commas, doubled quotes and line breaks).
     *
     * @throws IllegalArgumentException when a quote is left open or text follows a closing quote
     */
    public static List<String> cells(String record) {
        List<String> out = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        int i = 0;
        int n = record.length();
        while (true) {
            if (i < n && record.charAt(i) == '"') {
                i++;
                while (true) {
                    if (i >= n) {
                        throw new IllegalArgumentException("a quoted cell is not closed");
                    }
                    char c = record.charAt(i++);
                    if (c == '"') {
                        if (i < n && record.charAt(i) == '"') {
                            cell.append('"');
                            i++;
                        } else {
                            break;
                        }
                    } else {
                        cell.append(c);
                    }
                }
                if (i < n && record.charAt(i) != ',') {
                    throw new IllegalArgumentException("text follows a closing quote in cell " + (out.size() + 1));
                }
            } else {
                while (i < n && record.charAt(i) != ',') {
                    char c = record.charAt(i++);
                    if (c == '"') {
                        throw new IllegalArgumentException("a double quote inside an unquoted cell "
                                + (out.size() + 1));
                    }
                    cell.append(c);
                }
            }
            out.add(cell.toString());
            cell.setLength(0);
            if (i >= n) {
                return out;
            }
            i++;
        }
    }

    /**
     * The records of a whole CSV text, each split into its cells: a record ends at a line break (LF or CRLF)
     * outside quotes.
     */
    public static List<List<String>> records(String text) {
        List<List<String>> out = new ArrayList<>();
        boolean quoted = false;
        int start = 0;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '"') {
                quoted = !quoted;
            } else if (c == '\n' && !quoted) {
                int end = i > start && text.charAt(i - 1) == '\r' ? i - 1 : i;
                out.add(cells(text.substring(start, end)));
                start = i + 1;
            }
        }
        if (start < text.length()) {
            out.add(cells(text.substring(start)));
        }
        return out;
    }

    @Override
    public String toString() {
        return b.toString();
    }
}
