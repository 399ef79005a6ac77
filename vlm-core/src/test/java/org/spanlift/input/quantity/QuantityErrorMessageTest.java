package org.spanlift.input.quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class QuantityErrorMessageTest {

    private static final String FORCE = "expected a force with a unit (N, kN, kgf, lbf, lb), got ";

    private static String messageFor(String text, QuantityKind kind) {
        return assertThrows(QuantityFormatException.class, () -> Quantity.parse(text, kind)).getMessage();
    }

    @Test
    void bareNumberIsRefusedListingTheUnits() {
        assertEquals(FORCE + "\"6000\"", messageFor("6000", QuantityKind.FORCE));
        assertEquals("expected a temperature difference with a unit (K), got \"15\"",
                messageFor("15", QuantityKind.TEMPERATURE_DIFFERENCE));
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "   "})
    void emptyTextIsRefused(String text) {
        assertEquals(FORCE + "an empty string", messageFor(text, QuantityKind.FORCE));
    }

    @Test
    void nullTextIsRefusedAsEmpty() {
        assertEquals(FORCE + "an empty string", messageFor(null, QuantityKind.FORCE));
    }

    @ParameterizedTest
    @ValueSource(strings = {"NaN N", "nanN", "Infinity N", "-InfinityN", "infN", "1e400N", "1e308kN"})
    void nonFiniteNumberIsRefused(String text) {
        assertEquals(FORCE + "\"" + text + "\": the number must be finite", messageFor(text, QuantityKind.FORCE));
    }

    @ParameterizedTest
    @ValueSource(strings = {"N", "abc", "six N", "-N", "e3N"})
    void textNotStartingWithANumberIsRefused(String text) {
        assertEquals(FORCE + "\"" + text + "\": it does not start with a number", messageFor(text, QuantityKind.FORCE));
    }

    @Test
    void unknownUnitIsNamed() {
        assertEquals(FORCE + "\"6000Nm\": \"Nm\" is not a force unit", messageFor("6000Nm", QuantityKind.FORCE));
        assertEquals("expected a temperature difference with a unit (K), got \"15C\": \"C\" is not a temperature"
                + " difference unit", messageFor("15C", QuantityKind.TEMPERATURE_DIFFERENCE));
    }

    @ParameterizedTest
    @CsvSource({"2.5KN, KN, kN", "15k, k, K", "3000M, M, m", "90KT, KT, kt"})
    void unitInTheWrongCaseIsRefusedWithTheAcceptedSpelling(String text, String unit, String accepted) {
        QuantityKind kind = kindAccepting(accepted);
        String message = messageFor(text, kind);
        assertEquals("\"" + unit + "\" is not a " + kind.description() + " unit (units are case-sensitive: "
                + accepted + "?)", message.substring(message.indexOf(": ") + 2));
    }

    @Test
    void unitOfAnotherKindIsRefusedNamingThatKind() {
        assertEquals(FORCE + "\"45m/s\": \"m/s\" is a speed unit", messageFor("45m/s", QuantityKind.FORCE));
        assertEquals("expected a length with a unit (m, mm, km, ft, in), got \"90kt\": \"kt\" is a speed unit",
                messageFor("90kt", QuantityKind.LENGTH));
        assertEquals("expected a speed with a unit (m/s, km/h, kt, mph), got \"1350lb\": \"lb\" is a force or mass"
                + " unit", messageFor("1350lb", QuantityKind.SPEED));
        assertEquals("expected a mass with a unit (kg, g, lb), got \"6000N\": \"N\" is a force unit",
                messageFor("6000N", QuantityKind.MASS));
    }

    @Test
    void massInKilogramsGivenAsAForceSuggestsKilogramForce() {
        assertEquals(FORCE + "\"612kg\": \"kg\" is a mass unit; write a weight in kilograms as kgf",
                messageFor("612kg", QuantityKind.FORCE));
    }

    @Test
    void moreThanOneSpaceBeforeTheUnitIsRefused() {
        assertEquals(FORCE + "\"6000  N\": only one space, and no other white space, may separate the number"
                + " and the unit", messageFor("6000  N", QuantityKind.FORCE));
    }

    @Test
    void messageStaysOnOneLineWhateverTheText() {
        String message = messageFor("6000\nN", QuantityKind.FORCE);
        assertFalse(message.contains("\n"), message);
        assertEquals(FORCE + "\"6000\\nN\": only one space, and no other white space, may separate the number"
                + " and the unit", message);
    }

    @Test
    void formatExceptionIsAnIllegalArgumentException() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Quantity.parse("6000", QuantityKind.FORCE));
        assertEquals(QuantityFormatException.class, e.getClass());
    }

    private static QuantityKind kindAccepting(String unit) {
        for (QuantityKind kind : QuantityKind.values()) {
            if (kind.accepts(unit)) {
                return kind;
            }
        }
        throw new AssertionError("no kind accepts " + unit);
    }
}
