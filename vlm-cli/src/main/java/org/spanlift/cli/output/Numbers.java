package org.spanlift.cli.output;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * How JSON and CSV write a number: the shortest decimal that reads back to the same double, produced the
 * same way on every Java version (from the double's exact binary value rounded half-even with BigDecimal,
 * not from {@code Double.toString}, whose digits differ between Java 17 and 19). Whole numbers below 1e15
 * are written as integers, -0.0 as 0; plain notation from 1e-5 to below 1e15, else {@code 1.5e-07}-style
 * exponents. A non-finite number is a bug upstream and is refused.
 */
public final class Numbers {

    private Numbers() {
    }

    /** The shortest round-trip decimal of {@code d}. */
    public static String shortest(double d) {
        if (!Double.isFinite(d)) {
            throw new IllegalStateException("a result is not a finite number");
        }
        if (d == 0) {
            return "0";
        }
        if (d == Math.rint(d) && Math.abs(d) < 1e15) {
            return Long.toString((long) d);
        }
        BigDecimal exact = new BigDecimal(d);
        for (int digits = 1; digits <= 17; digits++) {
            BigDecimal r = exact.round(new MathContext(digits, RoundingMode.HALF_EVEN));
            if (r.doubleValue() == d) {
                return write(r.stripTrailingZeros());
            }
        }
        throw new IllegalStateException("17 significant digits always read back: " + d);
    }

    private static String write(BigDecimal r) {
        int exponent = r.precision() - r.scale() - 1;
        if (exponent >= -5 && exponent < 15) {
            return r.toPlainString();
        }
        String digits = r.unscaledValue().abs().toString();
        String mantissa = digits.length() == 1 ? digits : digits.charAt(0) + "." + digits.substring(1);
        return (r.signum() < 0 ? "-" : "") + mantissa + "e" + (exponent < 0 ? "-" : "+")
                + String.format(java.util.Locale.ROOT, "%02d", Math.abs(exponent));
    }
}
