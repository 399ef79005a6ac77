package org.spanlift.input.quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** The one number syntax of the files and of quantities: decimal, an exponent of at most three digits. */
class DecimalTest {

    @ParameterizedTest(name = "{0}")
    @CsvSource({"12, 12", "-2.5, -2.5", ".5, 0.5", "1., 1", "+3e-2, 0.03", "1.5E+6, 1500000", "1e308, 1e308",
        "4.9e-324, 4.9e-324", "' 7 ', 7"})
    void readsDecimalNumbers(String text, double value) {
        assertTrue(Decimal.matches(text), text);
        assertEquals(value, Decimal.parse(text));
    }

    @ParameterizedTest(name = "\"{0}\"")
    @ValueSource(strings = {"0x10", "0x1p3", "1.5d", "2f", "1_000", "0o17", "1,5", "1e", "e3", ".", "", "1 000", "--1",
        "1e1.5"})
    void refusesWhatIsNotADecimalNumber(String text) {
        assertFalse(Decimal.matches(text), text);
        QuantityFormatException e = assertThrows(QuantityFormatException.class, () -> Decimal.parse(text));
        assertTrue(e.getMessage().startsWith("expected a decimal number (such as 1.25 or 3e-2), got \""),
                e.getMessage());
    }

    @ParameterizedTest(name = "\"{0}\"")
    @ValueSource(strings = {"NaN", ".nan", "inf", "-.inf", "Infinity"})
    void refusesNonFiniteWords(String text) {
        QuantityFormatException e = assertThrows(QuantityFormatException.class, () -> Decimal.parse(text));
        assertEquals("expected a finite number, got \"" + text + "\"", e.getMessage());
    }

    @Test
    void refusesAnExponentOfMoreThanThreeDigitsWithoutReadingIt() {
        String text = "1e-" + "9".repeat(1_000_000);
        QuantityFormatException e = assertTimeoutPreemptively(Duration.ofSeconds(5),
                () -> assertThrows(QuantityFormatException.class, () -> Decimal.parse(text)));
        assertTrue(e.getMessage().startsWith("expected a decimal number (such as 1.25 or 3e-2) with an exponent of at "
                + "most 3 digits, got \"1e-9999999"), e.getMessage());
        assertTrue(e.getMessage().length() < 200, "the number is abbreviated: " + e.getMessage().length());
    }

    @Test
    void refusesANumberLongerThanFortyCharacters() {
        String text = "0." + "0".repeat(40) + "1";
        QuantityFormatException e = assertThrows(QuantityFormatException.class, () -> Decimal.parse(text));
        assertTrue(e.getMessage().startsWith("expected a decimal number (such as 1.25 or 3e-2) of at most 40 "
                + "characters"), e.getMessage());
        assertTrue(Decimal.matches("0." + "0".repeat(37) + "1"), "40 characters are accepted");
    }

    @Test
    void refusesAnExponentBeyondTheRangeOfNumbers() {
        QuantityFormatException e = assertThrows(QuantityFormatException.class, () -> Decimal.parse("1e999"));
        assertEquals("expected a finite number, got \"1e999\" (beyond the range of numbers, about 1.8e308)",
                e.getMessage());
    }

    @Test
    void quantityNumbersFollowTheSameSyntax() {
        QuantityFormatException e = assertThrows(QuantityFormatException.class,
                () -> Quantity.parse("1e-99999999kt", QuantityKind.SPEED));
        assertEquals("expected a speed with a unit (m/s, km/h, kt, mph), got \"1e-99999999kt\": expected a decimal "
                + "number (such as 1.25 or 3e-2) with an exponent of at most 3 digits before the unit", e.getMessage());
    }
}
