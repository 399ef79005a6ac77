package org.spanlift.input.quantity;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * What a quantity measures, with the unit symbols accepted for it and their sizes in SI. Unit
 * symbols are case-sensitive.
 */
public enum QuantityKind {
    /** Force [N]; {@code lb} is read as a weight, that is pound-force. */
    FORCE("force",
            new Unit("N", 1.0),
            new Unit("kN", 1000.0),
            new Unit("kgf", ExactFactors.KILOGRAM_FORCE),
            new Unit("lbf", ExactFactors.POUND_FORCE),
            new Unit("lb", ExactFactors.POUND_FORCE)),
    /** Mass [kg]. */
    MASS("mass",
            new Unit("kg", 1.0),
            new Unit("g", 1.0e-3),
            new Unit("lb", ExactFactors.POUND)),
    /** Length [m]. */
    LENGTH("length",
            new Unit("m", 1.0),
            new Unit("mm", 1.0e-3),
            new Unit("km", 1000.0),
            new Unit("ft", ExactFactors.FOOT),
            new Unit("in", ExactFactors.INCH)),
    /** Speed [m/s]. */
    SPEED("speed",
            new Unit("m/s", 1.0),
            new Unit("km/h", ExactFactors.KILOMETRE_PER_HOUR),
            new Unit("kt", ExactFactors.KNOT),
            new Unit("mph", ExactFactors.MILE_PER_HOUR)),
    /**
     * Temperature difference [K], such as an offset from the standard atmosphere. Kelvin only: a
     * Celsius sign invites an absolute temperature where a difference is meant, and {@code C} is the
     * coulomb.
     */
    TEMPERATURE_DIFFERENCE("temperature difference",
            new Unit("K", 1.0));

    /** Digits written by {@link #format}: enough to keep the value, few enough to drop conversion round-off. */
    private static final MathContext FORMAT_DIGITS = new MathContext(15);

    private final String description;
    private final List<Unit> units;

    QuantityKind(String description, Unit... units) {
        this.description = description;
        this.units = List.of(units);
    }

    /** @return the kind in words, such as {@code "temperature difference"} */
    public String description() {
        return description;
    }

    /** @return the SI unit symbol, in which {@link Quantity#value()} is given */
    public String siUnit() {
        return units.get(0).symbol();
    }

    /** @return the accepted unit symbols, SI unit first */
    public List<String> units() {
        return units.stream().map(Unit::symbol).toList();
    }

    /**
     * @param unit a unit symbol
     * @return whether this kind accepts it (case-sensitive)
     */
    public boolean accepts(String unit) {
        return find(unit).isPresent();
    }

    /**
     * The size of a unit in SI.
     *
     * @param unit an accepted unit symbol
     * @return SI units per one of that unit, such as 0.3048 for {@code ft}
     * @throws QuantityFormatException for a symbol this kind does not accept
     */
    public double siPerUnit(String unit) {
        return find(unit).orElseThrow(() -> new QuantityFormatException("expected a " + description
                + " unit (" + unitList() + "), got " + Quantity.quote(unit))).siPerUnit();
    }

    /**
     * Writes an SI value in a chosen unit, readable back by {@link Quantity#parse}: the number to
     * 15 significant digits without exponent, then the unit symbol, such as {@code 9800ft}.
     *
     * @param siValue the value in the SI unit of this kind
     * @param unit an accepted unit symbol
     * @return the value in that unit with its symbol
     * @throws QuantityFormatException for a symbol this kind does not accept
     * @throws IllegalArgumentException for a value that is not finite
     */
    public String format(double siValue, String unit) {
        double factor = siPerUnit(unit);
        if (!Double.isFinite(siValue)) {
            throw new IllegalArgumentException("cannot write a " + description + " that is not finite: " + siValue);
        }
        BigDecimal number = new BigDecimal(siValue / factor).round(FORMAT_DIGITS).stripTrailingZeros();
        return number.toPlainString() + unit;
    }

    /** @return the accepted symbols separated by commas, as messages list them */
    String unitList() {
        return String.join(", ", units());
    }

    /** @return an accepted symbol equal to the given one but for letter case */
    Optional<String> caseInsensitiveMatch(String unit) {
        String lower = unit.toLowerCase(Locale.ROOT);
        return units().stream().filter(u -> u.toLowerCase(Locale.ROOT).equals(lower)).findFirst();
    }

    private Optional<Unit> find(String unit) {
        return units.stream().filter(u -> u.symbol().equals(unit)).findFirst();
    }

    /** A unit symbol and its size in SI. */
    private record Unit(String symbol, double siPerUnit) {
    }
}
