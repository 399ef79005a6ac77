package org.spanlift.input.quantity;

import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The one syntax of a number in every input file and in the numbers of quantities: a decimal number
 * ({@code 12}, {@code -2.5}, {@code .5}, {@code 1.}) with an optional exponent of at most
 * {@value #MAX_EXPONENT_DIGITS} digits ({@code 3e-2}, {@code 1.5E+6}), at most {@value #MAX_LENGTH}
 * characters long. Hexadecimal numbers, Java's type suffixes ({@code 1d}, {@code 2f}), digit separators,
 * {@code NaN} and {@code Infinity} are not numbers here. The bounds keep the work of reading a number (and
 * of exact decimal arithmetic on it, as a sweep range does) small whatever the text.
 */
public final class Decimal {

    /** The longest number accepted, in characters (sign, digits, point and exponent). */
    public static final int MAX_LENGTH = 40;
    /** The most digits an exponent may have: enough for every finite double. */
    public static final int MAX_EXPONENT_DIGITS = 3;

    /** A decimal number with an exponent of any length; the bounds are checked after a match. */
    private static final Pattern NUMBER =
            Pattern.compile("[-+]?(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+)(?:[eE][-+]?([0-9]+))?");
    private static final Pattern NON_FINITE = Pattern.compile("[-+]?(?:\\.?nan|\\.?inf|infinity)",
            Pattern.CASE_INSENSITIVE);

    /** What {@link #problem} says of a word for infinity or NaN. */
    public static final String NOT_FINITE = "expected a finite number";

    /** The syntax in words, for messages. */
    public static final String EXPECTED = "a decimal number (such as 1.25 or 3e-2)";

    private Decimal() {
    }

    /** True when the whole text (surrounding white space ignored) is a number in this syntax. */
    public static boolean matches(String text) {
        return text != null && problem(text.strip()).isEmpty();
    }

    /**
     * What was expected instead of the text when it is not a number in this syntax (a phrase such as
     * {@code "expected a finite number"}, to which the caller adds what it got), or empty when it is one.
     *
     * @param text the number as written, without surrounding white space
     */
    public static Optional<String> problem(String text) {
        if (NON_FINITE.matcher(text).matches()) {
            return Optional.of(NOT_FINITE);
        }
        Matcher m = NUMBER.matcher(text);
        if (!m.matches()) {
            return Optional.of("expected " + EXPECTED);
        }
        if (m.group(1) != null && m.group(1).length() > MAX_EXPONENT_DIGITS) {
            return Optional.of("expected " + EXPECTED + " with an exponent of at most " + MAX_EXPONENT_DIGITS
                    + " digits");
        }
        if (text.length() > MAX_LENGTH) {
            return Optional.of("expected " + EXPECTED + " of at most " + MAX_LENGTH + " characters");
        }
        return Optional.empty();
    }

    /**
     * The number at the start of the text in this syntax (without checking its bounds), for a quantity
     * that continues with its unit.
     *
     * @return the number's text, or empty when the text does not start with a number
     */
    public static Optional<String> leading(String text) {
        Matcher m = NUMBER.matcher(text);
        return m.lookingAt() ? Optional.of(m.group()) : Optional.empty();
    }

    /**
     * Reads a number in this syntax.
     *
     * @return its value, finite
     * @throws QuantityFormatException when the text is not such a number, or its value is beyond the range
     *         of a double
     */
    public static double parse(String text) {
        String t = text == null ? "" : text.strip();
        Optional<String> problem = problem(t);
        if (problem.isPresent()) {
            throw new QuantityFormatException(problem.get() + ", got " + Quantity.quote(t));
        }
        double d = Double.parseDouble(t);
        if (!Double.isFinite(d)) {
            throw new QuantityFormatException("expected a finite number, got " + Quantity.quote(t)
                    + " (beyond the range of numbers, about 1.8e308)");
        }
        return d;
    }
}
