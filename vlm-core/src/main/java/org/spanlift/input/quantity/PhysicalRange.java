package org.spanlift.input.quantity;

import java.util.Locale;

/**
 * The range of values a typed quantity may take in the files and on the command line: far wider than any
 * aircraft the tool is for, narrow enough that every dynamic pressure, force and moment computed from it
 * stays a finite number. A value outside is refused up front, naming the range, instead of ending in an
 * infinite or undefined result.
 *
 * @param what        the quantity in words, with its article ({@code "a speed"})
 * @param kind        what it measures
 * @param min         the least value accepted, SI
 * @param max         the greatest value accepted, SI
 * @param alternative the same range in another common unit, for the message (may be empty)
 */
public record PhysicalRange(String what, QuantityKind kind, double min, double max, String alternative) {

    /**
     * A speed (equivalent or true airspeed, a gust velocity): 0.1 m/s to 1000 m/s (about Mach 3 at sea
     * level, 1944 kt).
     */
    public static final PhysicalRange SPEED = new PhysicalRange("a speed", QuantityKind.SPEED, 0.1, 1000,
            "about 0.19 kt to 1944 kt");
    /** An aircraft's weight: 0.01 N (about a gram) to 1e7 N (about a thousand tonnes). */
    public static final PhysicalRange WEIGHT = new PhysicalRange("a weight", QuantityKind.FORCE, 0.01, 1e7,
            "about 1 g to 1000 t as a mass");
    /** A mass of the structure (the wing's, a point mass): 0 to 1e6 kg (a thousand tonnes). */
    public static final PhysicalRange MASS = new PhysicalRange("a mass", QuantityKind.MASS, 0, 1e6, "0 lb to 2.2e6 lb");
    /**
     * An offset of the air temperature from the standard atmosphere: -100 K to 100 K, which keeps the
     * temperature positive at every altitude of the standard atmosphere's range.
     */
    public static final PhysicalRange TEMPERATURE_OFFSET = new PhysicalRange("a temperature offset from the standard "
            + "atmosphere", QuantityKind.TEMPERATURE_DIFFERENCE, -100, 100, "");

    /** The range in words: {@code "from 0.1 m/s to 1000 m/s (about 0.19 kt to 1944 kt)"}. */
    public String describe() {
        String si = kind.siUnit();
        return "from " + number(min) + " " + si + " to " + number(max) + " " + si
                + (alternative.isEmpty() ? "" : " (" + alternative + ")");
    }

    /**
     * Refuses a value outside the range.
     *
     * @param si   the value, SI
     * @param text the text it was read from, for the message
     * @return the value
     * @throws QuantityFormatException naming the range and the text
     */
    public double check(double si, String text) {
        if (!(si >= min && si <= max)) {
            throw new QuantityFormatException(what + " must be " + describe() + ", got "
                    + Quantity.quote(text));
        }
        return si;
    }

    /**
     * Reads a quantity of this range's kind and checks it.
     *
     * @return the value, SI
     * @throws QuantityFormatException for text that is not such a quantity, or a value outside the range
     */
    public double parse(String text) {
        return check(Quantity.parse(text, kind).value(), text);
    }

    private static String number(double d) {
        if (d == Math.rint(d) && Math.abs(d) < 1e6) {
            return String.valueOf((long) d);
        }
        return Math.abs(d) >= 1e6 ? String.format(Locale.ROOT, "%.0e", d).replace("e+0", "e").replace("e+", "e")
                : String.valueOf(d);
    }
}
