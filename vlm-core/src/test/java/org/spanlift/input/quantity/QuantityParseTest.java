package org.spanlift.input.quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.math.BigDecimal;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class QuantityParseTest {

    /** Every accepted unit, with the SI value the text stands for (decimal arithmetic by hand). */
    @ParameterizedTest(name = "{0} as {1}")
    @CsvSource(delimiter = '|', value = {
        "6000N       | FORCE                  | 6000",
        "2.5kN       | FORCE                  | 2500",
        "612kgf      | FORCE                  | 6001.6698",
        "1350lbf     | FORCE                  | 6005.099180601675",
        "1350lb      | FORCE                  | 6005.099180601675",
        "40kg        | MASS                   | 40",
        "750g        | MASS                   | 0.75",
        "1350lb      | MASS                   | 612.3496995",
        "3000m       | LENGTH                 | 3000",
        "1200mm      | LENGTH                 | 1.2",
        "2.5km       | LENGTH                 | 2500",
        "9800ft      | LENGTH                 | 2987.04",
        "60in        | LENGTH                 | 1.524",
        "45m/s       | SPEED                  | 45",
        "160km/h     | SPEED                  | 44.44444444444444",
        "90kt        | SPEED                  | 46.3",
        "100mph      | SPEED                  | 44.704",
        "15K         | TEMPERATURE_DIFFERENCE | 15",
        "-10K        | TEMPERATURE_DIFFERENCE | -10",
    })
    void readsEveryAcceptedUnitIntoSi(String text, QuantityKind kind, double si) {
        Quantity q = Quantity.parse(text, kind);
        assertEquals(si, q.value(), 2 * Math.ulp(si));
        assertSame(kind, q.kind());
        assertEquals(text, q.text());
    }

    @ParameterizedTest(name = "\"{0}\"")
    @CsvSource(delimiter = '|', value = {
        "1e3 N      | 1000",
        "1E3N       | 1000",
        "2.5e-1kN   | 250",
        "+5 N       | 5",
        "-5N        | -5",
        ".5N        | 0.5",
        "5.N        | 5",
        "0N         | 0",
    })
    void acceptsDecimalPointExponentSignAndOneSpace(String text, double si) {
        assertEquals(si, Quantity.parse(text, QuantityKind.FORCE).value(), 0.0);
    }

    @Test
    void ignoresSurroundingWhiteSpaceAndKeepsTheTextAsGiven() {
        Quantity q = Quantity.parse("  6000 N\t", QuantityKind.FORCE);
        assertEquals(6000.0, q.value(), 0.0);
        assertEquals("  6000 N\t", q.text());
    }

    @Test
    void poundForceIsExactlyThePoundUnderStandardGravity() {
        assertEquals(4.4482216152605, Quantity.parse("1lbf", QuantityKind.FORCE).value(), 0.0);
        assertEquals(4.4482216152605, Quantity.parse("1lb", QuantityKind.FORCE).value(), 0.0);
        // 0.45359237 kg x 9.80665 m/s^2 = 4.4482216152605 N exactly, in decimal.
        assertEquals(0, new BigDecimal("0.45359237").multiply(new BigDecimal("9.80665"))
                .compareTo(new BigDecimal("4.4482216152605")));
    }

    @Test
    void kilogramForceIsStandardGravity() {
        // Standard acceleration of gravity 9.80665 m/s^2, exact by definition (3rd CGPM, 1901).
        assertEquals(9.80665, Quantity.parse("1kgf", QuantityKind.FORCE).value(), 0.0);
    }

    @Test
    void poundFootAndInchAreTheInternationalDefinitions() {
        // International yard and pound agreement, 1959: exact by definition.
        assertEquals(0.45359237, Quantity.parse("1lb", QuantityKind.MASS).value(), 0.0);
        assertEquals(0.3048, Quantity.parse("1ft", QuantityKind.LENGTH).value(), 0.0);
        assertEquals(0.0254, Quantity.parse("1in", QuantityKind.LENGTH).value(), 0.0);
    }

    @Test
    void knotIsTheInternationalNauticalMilePerHour() {
        // International nautical mile = 1852 m exactly.
        assertEquals(1852.0 / 3600.0, Quantity.parse("1kt", QuantityKind.SPEED).value(), 0.0);
    }

    @Test
    void mileAndKilometrePerHourAreExact() {
        // International mile = 5280 ft = 1609.344 m exactly, so 1 mph = 0.44704 m/s exactly.
        assertEquals(0, new BigDecimal("1609.344").divide(new BigDecimal("3600"))
                .compareTo(new BigDecimal("0.44704")));
        assertEquals(0.44704, Quantity.parse("1mph", QuantityKind.SPEED).value(), 0.0);
        assertEquals(1000.0 / 3600.0, Quantity.parse("1km/h", QuantityKind.SPEED).value(), 0.0);
    }

    @Test
    void eachKindKnowsItsSiUnitAndAcceptedUnits() {
        assertEquals("N", QuantityKind.FORCE.siUnit());
        assertEquals(List.of("N", "kN", "kgf", "lbf", "lb"), QuantityKind.FORCE.units());
        assertEquals(List.of("kg", "g", "lb"), QuantityKind.MASS.units());
        assertEquals(List.of("m", "mm", "km", "ft", "in"), QuantityKind.LENGTH.units());
        assertEquals(List.of("m/s", "km/h", "kt", "mph"), QuantityKind.SPEED.units());
        assertEquals(List.of("K"), QuantityKind.TEMPERATURE_DIFFERENCE.units());
        assertEquals("K", QuantityKind.TEMPERATURE_DIFFERENCE.siUnit());
    }

    @Test
    void quantityRefusesNonFiniteValue() {
        assertThrows(IllegalArgumentException.class, () -> new Quantity(Double.NaN, QuantityKind.MASS, "x"));
    }
}
