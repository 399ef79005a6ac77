package org.spanlift.vocabulary;

/** The SI unit of a result and the kind of quantity it measures, as JSON and CSV write it. */
public enum ResultUnit {
    /** A ratio or coefficient. */
    NONE("-", "dimensionless"),
    /** Per radian (a lift slope). */
    PER_RADIAN("1/rad", "slope per angle"),
    /** Per degree (a lift slope). */
    PER_DEGREE("1/deg", "slope per angle"),
    /** Degrees. */
    DEGREE("deg", "angle"),
    /** Metres. */
    METRE("m", "length"),
    /** Square metres. */
    SQUARE_METRE("m^2", "area"),
    /** Newtons. */
    NEWTON("N", "force"),
    /** Newton metres. */
    NEWTON_METRE("N m", "moment"),
    /** Pascals. */
    PASCAL("Pa", "pressure"),
    /** Metres per second. */
    METRE_PER_SECOND("m/s", "speed"),
    /** A whole number. */
    COUNT("count", "count"),
    /** True or false. */
    FLAG("true/false", "flag"),
    /** A name. */
    TEXT("text", "name");

    private final String symbol;
    private final String kind;

    ResultUnit(String symbol, String kind) {
        this.symbol = symbol;
        this.kind = kind;
    }

    /** The SI symbol: {@code m}, {@code m^2}, {@code deg}, {@code -} for a ratio. */
    public String symbol() {
        return symbol;
    }

    /** The kind of quantity: length, area, angle, speed, dimensionless, ... */
    public String kind() {
        return kind;
    }

    /** True for a number. */
    public boolean numeric() {
        return this != FLAG && this != TEXT;
    }
}
