package org.spanlift.cli.options;

import org.spanlift.input.InputException;
import org.spanlift.input.quantity.Decimal;

/**
 * The one syntax of every angle and flap setting the command line takes, in degrees: a decimal number
 * ({@code 20}, {@code -2.5}, {@code .5}, {@code 1e1}) in the syntax of the files ({@link Decimal}),
 * optionally followed by {@code deg}. Hexadecimal numbers and Java's {@code d}/{@code f} suffixes are
 * refused, as in the files.
 */
public final class Angles {

    private Angles() {
    }

    /** True when {@code text} is an angle in this syntax: a number as {@link Decimal} reads it, then perhaps deg. */
    public static boolean matches(String text) {
        String t = text.strip();
        return Decimal.problem(t.endsWith("deg") ? t.substring(0, t.length() - 3) : t).isEmpty();
    }

    /**
     * An angle in degrees within +-{@code limit}.
     *
     * @param option the option, for the message ({@code --flaps})
     * @param what   what the angle is, for the message ({@code "a deflection"})
     * @throws InputException naming the option and the expected form and range
     */
    public static double parse(String option, String text, String what, double limit) {
        String t = text.strip();
        if (!matches(t)) {
            String shown = text.length() > 40 ? text.substring(0, 37) + "..." : text;
            throw new InputException(option, 0, "", "expected " + what + " in degrees, a number such as 20 or -2.5 "
                    + "(optionally followed by deg), got '" + shown + "'");
        }
        double d = Double.parseDouble(t.endsWith("deg") ? t.substring(0, t.length() - 3) : t);
        if (!(Math.abs(d) <= limit)) {
            throw new InputException(option, 0, "", "expected " + what + " from -" + (int) limit + " to "
                    + (int) limit + " degrees, got " + t);
        }
        return d;
    }
}
