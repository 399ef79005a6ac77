package org.spanlift.input.quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Speeds, weights, masses and temperature offsets outside their physical range are refused with the range
 * named, so that no dynamic pressure, force or moment computed from them can overflow.
 */
class PhysicalRangeTest {

    @Test
    void speedsFarBeyondAnyAircraftAreRefusedWithTheRange() {
        QuantityFormatException e = assertThrows(QuantityFormatException.class,
                () -> PhysicalRange.SPEED.parse("1e160m/s"));
        assertEquals("a speed must be from 0.1 m/s to 1000 m/s (about 0.19 kt to 1944 kt), got \"1e160m/s\"",
                e.getMessage());
        assertThrows(QuantityFormatException.class, () -> PhysicalRange.SPEED.parse("1e-300m/s"));
    }

    @Test
    void speedsAtTheEndsOfTheRangeAreAccepted() {
        assertEquals(0.1, PhysicalRange.SPEED.parse("0.1m/s"));
        assertEquals(1000, PhysicalRange.SPEED.parse("3600km/h"), 1e-9);
        assertEquals(1852.0 / 3600 * 1943, PhysicalRange.SPEED.parse("1943kt"), 1e-9);
    }

    @Test
    void dynamicPressureOfTheLargestSpeedAtSeaLevelIsFinite() {
        double q = 0.5 * 1.225 * PhysicalRange.SPEED.max() * PhysicalRange.SPEED.max();
        assertEquals(612_500, q, 1e-6);
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"1e307kg", "1e8N", "1e-300N", "0.001N"})
    void weightsOutsideTheRangeAreRefused(String text) {
        QuantityFormatException e = assertThrows(QuantityFormatException.class, () -> Quantity.weight(text));
        assertEquals("a weight must be from 0.01 N to 1e7 N (about 1 g to 1000 t as a mass), got \"" + text + "\"",
                e.getMessage());
    }

    @Test
    void massesOutsideTheRangeAreRefused() {
        QuantityFormatException e = assertThrows(QuantityFormatException.class,
                () -> PhysicalRange.MASS.parse("1e307kg"));
        assertEquals("a mass must be from 0 kg to 1e6 kg (0 lb to 2.2e6 lb), got \"1e307kg\"", e.getMessage());
        assertThrows(QuantityFormatException.class, () -> PhysicalRange.MASS.parse("-1kg"));
        assertEquals(0, PhysicalRange.MASS.parse("0kg"));
    }

    @Test
    void temperatureOffsetsOutsideTheRangeAreRefused() {
        QuantityFormatException e = assertThrows(QuantityFormatException.class,
                () -> PhysicalRange.TEMPERATURE_OFFSET.parse("1e200K"));
        assertEquals("a temperature offset from the standard atmosphere must be from -100 K to 100 K, got \"1e200K\"",
                e.getMessage());
    }

    @Test
    void longTextIsAbbreviatedInTheMessage() {
        String text = "1" + "0".repeat(39) + "kg";
        QuantityFormatException e = assertThrows(QuantityFormatException.class, () -> PhysicalRange.MASS.parse(text));
        assertEquals("a mass must be from 0 kg to 1e6 kg (0 lb to 2.2e6 lb), got \"" + text.substring(0, 37) + "...\"",
                e.getMessage());
    }
}
