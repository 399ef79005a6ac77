package org.spanlift.cli.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/** JSON and CSV numbers: shortest, exact on reading back, the same on every Java version. */
class NumbersTest {

    @Test
    void fullPrecisionWhereTheOldCsvCutAtTenDigits() {
        assertEquals("0.3333333333333333", Numbers.shortest(1.0 / 3));
        assertEquals("0.1", Numbers.shortest(0.1));
        assertEquals("12.100000000000001", Numbers.shortest(12.100000000000001));
    }

    @Test
    void wholeNumbersZeroAndExponents() {
        assertEquals("0", Numbers.shortest(-0.0));
        assertEquals("42", Numbers.shortest(42.0));
        assertEquals("-3", Numbers.shortest(-3.0));
        assertEquals("1.5e-07", Numbers.shortest(1.5e-7));
        assertEquals("0.00001", Numbers.shortest(1e-5));
        assertEquals("1e+15", Numbers.shortest(1e15));
        // Java 17's Double.toString writes 9.999999999999999E22 for this double; 1e23 reads back to it
        assertEquals("1e+23", Numbers.shortest(1e23));
        assertEquals("2.2250738585072014e-308", Numbers.shortest(Double.MIN_NORMAL));
        assertEquals("5e-324", Numbers.shortest(Double.MIN_VALUE));
    }

    @Test
    void everyNumberReadsBackExactlyAndNoShorterOneWould() {
        SplittableRandom random = new SplittableRandom(20261202L);
        for (int i = 0; i < 20_000; i++) {
            double d = Double.longBitsToDouble(random.nextLong());
            if (!Double.isFinite(d)) {
                continue;
            }
            String s = Numbers.shortest(d);
            assertEquals(d == 0 ? 0.0 : d, Double.parseDouble(s), 0.0, s);
            assertTrue(s.matches("-?(0|[1-9]\\d*)(\\.\\d+)?(e[-+]\\d{2,3})?"), "JSON number grammar: " + s);
            String digits = s.replaceAll("e.*", "").replace("-", "").replace(".", "").replaceAll("^0+", "");
            int length = digits.replaceAll("0+$", "").length();
            if (length > 1 && d != Math.rint(d)) {
                java.math.BigDecimal shorter = new java.math.BigDecimal(d).round(new java.math.MathContext(length - 1,
                        java.math.RoundingMode.HALF_EVEN));
                assertTrue(shorter.doubleValue() != d, "a shorter decimal reads back too: " + s);
            }
        }
    }

    @Test
    void aNonFiniteNumberIsABug() {
        assertThrows(IllegalStateException.class, () -> Numbers.shortest(Double.NaN));
        assertThrows(IllegalStateException.class, () -> Numbers.shortest(Double.POSITIVE_INFINITY));
    }
}
