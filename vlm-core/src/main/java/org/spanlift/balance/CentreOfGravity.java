package org.spanlift.balance;

import java.util.Locale;
import java.util.OptionalDouble;

import org.spanlift.input.RefusedException;
import org.spanlift.input.quantity.Decimal;
import org.spanlift.input.quantity.Quantity;
import org.spanlift.input.quantity.QuantityFormatException;
import org.spanlift.input.quantity.QuantityKind;

/**
 * Where the centre of gravity is, as a user writes it: the x of the wing file's axes as a length with its unit
 * ({@code 0.62m}, {@code 24in}), or a percentage of the wing's mean aerodynamic chord from its leading edge
 * ({@code 25%mac}).
 *
 * @param text        as written
 * @param x           the x, m, when given as a length
 * @param macFraction the fraction of the MAC, when given as a percentage
 */
public record CentreOfGravity(String text, OptionalDouble x, OptionalDouble macFraction) {

    /** How a centre of gravity is written, for messages. */
    public static final String EXPECTED = "a length with its unit (0.62m, 24in: the x of the wing file's axes) or a "
            + "percentage of the mean aerodynamic chord (25%mac)";

    /** The largest percentage of the MAC accepted either way, ahead of or behind its leading edge. */
    public static final double MAX_PERCENT = 500;

    /**
     * Reads a centre of gravity.
     *
     * @throws QuantityFormatException with a one-line message saying what was expected
     */
    public static CentreOfGravity parse(String text) {
        String body = text == null ? "" : text.strip();
        String lower = body.toLowerCase(Locale.ROOT);
        if (lower.endsWith("%mac")) {
            String number = body.substring(0, body.length() - 4).strip();
            if (!Decimal.matches(number)) {
                throw new QuantityFormatException("expected " + EXPECTED + ", got '" + shown(body)
                        + "': the percentage "
                        + "is not a decimal number");
            }
            double percent = Decimal.parse(number);
            if (!(Math.abs(percent) <= MAX_PERCENT)) {
                throw new QuantityFormatException("expected " + EXPECTED + ", got '" + shown(body) + "': a percentage "
                        + "of the MAC within " + (int) MAX_PERCENT);
            }
            return new CentreOfGravity(body, OptionalDouble.empty(), OptionalDouble.of(percent / 100));
        }
        try {
            double x = Quantity.parse(body, QuantityKind.LENGTH).value();
            if (!(Math.abs(x) <= 10_000)) {
                throw new QuantityFormatException("expected " + EXPECTED + ", got '" + shown(body) + "': within 10 km");
            }
            return new CentreOfGravity(body, OptionalDouble.of(x), OptionalDouble.empty());
        } catch (QuantityFormatException e) {
            throw new QuantityFormatException("expected " + EXPECTED + ", got '" + shown(body) + "'");
        }
    }

    private static String shown(String s) {
        return s.length() > 40 ? s.substring(0, 40) + "..." : s;
    }

    /**
     * The x of the centre of gravity, m, on the balance's wing.
     *
     * @throws RefusedException for a centre of gravity more than {@value #MAX_PERCENT}% of the MAC from the MAC's
     *                          leading edge (far outside any airframe of this wing)
     */
    public double x(Balance balance) {
        double at = x.isPresent() ? x.getAsDouble() : balance.macPoint(macFraction.getAsDouble());
        double fraction = balance.macFraction(at);
        if (!(Math.abs(fraction) <= MAX_PERCENT / 100)) {
            throw new RefusedException(String.format(Locale.ROOT, "the centre of gravity %s lies %.0f%% of the mean "
                    + "aerodynamic chord from its leading edge at x %.3f m; expected one within %.0f%%", text,
                    100 * fraction, balance.macPoint(0), MAX_PERCENT));
        }
        return at;
    }
}
