package org.spanlift.geometry;

import java.util.Locale;

/** The length units a wing file may use. */
public enum LengthUnit {
    /** Metres. */
    M("m", 1.0),
    /** International feet. */
    FT("ft", 0.3048),
    /** International inches. */
    IN("in", 0.0254);

    private final String symbol;
    private final double metres;

    LengthUnit(String symbol, double metres) {
        this.symbol = symbol;
        this.metres = metres;
    }

    /** The symbol a wing file writes: {@code m}, {@code ft} or {@code in}. */
    public String symbol() {
        return symbol;
    }

    /** Metres in one of this unit (exact: international foot and inch, 1959). */
    public double metres() {
        return metres;
    }

    /** The unit of a symbol (surrounding blanks and case ignored). */
    public static LengthUnit parse(String text) {
        for (LengthUnit u : values()) {
            if (u.symbol.equals(text.trim().toLowerCase(Locale.ROOT))) {
                return u;
            }
        }
        throw new IllegalArgumentException("expected m, ft or in");
    }
}
