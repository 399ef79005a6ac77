package org.spanlift.cli.sweep;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Reads a one-line JSON object whose values are strings, numbers, booleans or null (the rows and manifests
 * the sweep writes). Values come back as text; null as null.
 */
final class FlatJson {

    private final String s;
    private int i;

    private FlatJson(String s) {
        this.s = s;
    }

    static Map<String, String> parse(String line) {
        FlatJson p = new FlatJson(line.strip());
        Map<String, String> out = new LinkedHashMap<>();
        p.expect('{');
        p.space();
        if (p.peek() == '}') {
            return out;
        }
        while (true) {
            p.space();
            String key = p.string();
            p.space();
            p.expect(':');
            p.space();
            out.put(key, p.value());
            p.space();
            char c = p.next();
            if (c == '}') {
                return out;
            }
            if (c != ',') {
                throw new IllegalArgumentException("expected , or } at " + p.i);
            }
        }
    }

    private char peek() {
        if (i >= s.length()) {
            throw new IllegalArgumentException("the object ends early");
        }
        return s.charAt(i);
    }

    private char next() {
        char c = peek();
        i++;
        return c;
    }

    private void expect(char c) {
        if (next() != c) {
            throw new IllegalArgumentException("expected " + c + " at " + (i - 1));
        }
    }

    private void space() {
        while (i < s.length() && Character.isWhitespace(s.charAt(i))) {
            i++;
        }
    }

    private String value() {
        char c = peek();
        if (c == '"') {
            return string();
        }
        int start = i;
        while (i < s.length() && ",}".indexOf(s.charAt(i)) < 0 && !Character.isWhitespace(s.charAt(i))) {
            i++;
        }
        String t = s.substring(start, i);
        if (t.isEmpty()) {
            throw new IllegalArgumentException("a value is missing at " + start);
        }
        return t.equals("null") ? null : t;
    }

    private String string() {
        expect('"');
        StringBuilder b = new StringBuilder();
        while (true) {
            char c = next();
            if (c == '"') {
                return b.toString();
            }
            if (c == '\\') {
                char e = next();
                switch (e) {
                    case 'n' -> b.append('\n');
                    case 'r' -> b.append('\r');
                    case 't' -> b.append('\t');
                    case 'b' -> b.append('\b');
                    case 'f' -> b.append('\f');
                    case 'u' -> {
                        b.append((char) Integer.parseInt(s.substring(i, i + 4), 16));
                        i += 4;
                    }
                    default -> b.append(e);
                }
            } else {
                b.append(c);
            }
        }
    }
}
