package org.spanlift.input.quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * A weight is a force, or a mass under standard gravity 9.80665 m/s^2 (3rd CGPM, 1901); the pound read as a
 * weight is the pound-force 4.4482216152605 N (0.45359237 kg x 9.80665, exact by definition).
 */
class WeightParseTest {

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "10787.315N | 10787.315",
        "1100kg     | 10787.315",
        "1100kgf    | 10787.315",
        "1.1kN      | 1100",
        "2400lb     | 10675.7318766252",
        "2400lbf    | 10675.7318766252",
        "500g       | 4.903325",
    })
    void readsAForceOrAMassUnderStandardGravity(String text, double newtons) {
        assertEquals(newtons, Quantity.weight(text), 1e-9 * newtons);
    }

    @ParameterizedTest(name = "\"{0}\"")
    @ValueSource(strings = {"0kg", "-5N", "0lb"})
    void refusesAWeightThatIsNotPositive(String text) {
        QuantityFormatException e = assertThrows(QuantityFormatException.class, () -> Quantity.weight(text));
        assertEquals("a weight must be positive, got \"" + text + "\"", e.getMessage());
    }

    @ParameterizedTest(name = "\"{0}\"")
    @ValueSource(strings = {"1100", "1100 m", "heavy"})
    void namesBothAcceptedFormsWhenNeitherReads(String text) {
        QuantityFormatException e = assertThrows(QuantityFormatException.class, () -> Quantity.weight(text));
        assertEquals(true, e.getMessage().startsWith("expected a force with a unit (N, kN, kgf, lbf, lb), got \""
                + text + "\""), e.getMessage());
        assertEquals(true, e.getMessage().endsWith(", or a mass in kg"), e.getMessage());
    }
}
