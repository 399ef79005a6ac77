package org.spanlift.cli.options;

import java.util.Locale;

/** Output formats. Which ones a command offers is its own choice. */
public enum Format {
    TABLE, JSON, CSV, HTML, SVG, PNG;

    /** The format a file name's extension implies, or null. */
    public static Format fromFileName(String name) {
        String lower = name.toLowerCase(Locale.ROOT);
        if (lower.endsWith(".json") || lower.endsWith(".jsonl")) {
            return JSON;
        }
        if (lower.endsWith(".csv")) {
            return CSV;
        }
        if (lower.endsWith(".html") || lower.endsWith(".htm")) {
            return HTML;
        }
        if (lower.endsWith(".svg")) {
            return SVG;
        }
        if (lower.endsWith(".png")) {
            return PNG;
        }
        if (lower.endsWith(".txt")) {
            return TABLE;
        }
        return null;
    }

    @Override
    public String toString() {
        return name().toLowerCase(Locale.ROOT);
    }
}
