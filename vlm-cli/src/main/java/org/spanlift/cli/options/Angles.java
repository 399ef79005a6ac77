package org.spanlift.cli.options;

import java.util.regex.Pattern;

import org.spanlift.input.InputException;

/**
 * The one syntax of every angle and flap setting the command line takes, in degrees: a decimal number
 * ({@code 20}, {@code -2.5}, {@code .5}, {@code 1e1}), optionally followed by {@code deg}. Hexadecimal
 * numbers and Java's {@code d}/{@code f} suffixes are refused, as in the files.
 */
public final class Angles {

    private static final Pattern DEGREES = Pattern.compile("[-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d{1,3})?(?:deg)?");

    private Angles() {
    }

    /** True when {@code text} is an angle in this syntax. */
    public static boolean matches(String text) {
        return DEGREES.matcher(text.strip()).matches();
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
            throw new InputException(option, 0, "", "expected " + what + " in degrees, a number such as 20 or -2.5 "
                    + "(optionally followed by deg), got '" + text + "'");
        }
        double d = Double.parseDouble(t.endsWith("deg") ? t.substring(0, t.length() - 3) : t);
        if (!(Math.abs(d) <= limit)) {
            throw new InputException(option, 0, "", "expected " + what + " from -" + (int) limit + " to "
                    + (int) limit + " degrees, got " + t);
        }
        return d;
    }
}
