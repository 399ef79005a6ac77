package org.spanlift.input.quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class QuantityFormatTest {

    @ParameterizedTest(name = "{0} written in {2}")
    @CsvSource(delimiter = '|', value = {
        "9800ft   | LENGTH                 | ft    | 9800ft",
        "9800ft   | LENGTH                 | m     | 2987.04m",
        "1350lb   | FORCE                  | lbf   | 1350lbf",
        "612kgf   | FORCE                  | N     | 6001.6698N",
        "6000N    | FORCE                  | kN    | 6kN",
        "90kt     | SPEED                  | kt    | 90kt",
        "90kt     | SPEED                  | m/s   | 46.3m/s",
        "160km/h  | SPEED                  | km/h  | 160km/h",
        "100mph   | SPEED                  | km/h  | 160.9344km/h",
        "40kg     | MASS                   | g     | 40000g",
        "-10K     | TEMPERATURE_DIFFERENCE | K     | -10K",
        "0m       | LENGTH                 | ft    | 0ft",
        "1e-9m    | LENGTH                 | m     | 0.000000001m",
    })
    void writesTheValueInTheChosenUnit(String text, QuantityKind kind, String unit, String written) {
        assertEquals(written, Quantity.parse(text, kind).format(unit));
    }

    @Test
    void writtenTextReadsBackToTheSameValue() {
        Quantity q = Quantity.parse("1234.5678ft", QuantityKind.LENGTH);
        Quantity back = Quantity.parse(q.format("in"), QuantityKind.LENGTH);
        assertEquals(q.value(), back.value(), Math.ulp(q.value()) * 4);
    }

    @Test
    void valueInAUnitDividesByTheUnitSize() {
        assertEquals(1350.0, Quantity.parse("1350lb", QuantityKind.MASS).in("lb"), 1e-12);
        assertEquals(100.0 / 0.3048, Quantity.parse("100m", QuantityKind.LENGTH).in("ft"), 0.0);
    }

    @Test
    void unitOfAnotherKindIsRefusedWhenWriting() {
        QuantityFormatException e = assertThrows(QuantityFormatException.class,
                () -> Quantity.parse("3000m", QuantityKind.LENGTH).format("kt"));
        assertEquals("expected a length unit (m, mm, km, ft, in), got \"kt\"", e.getMessage());
    }

    @Test
    void nonFiniteValueIsRefusedWhenWriting() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> QuantityKind.FORCE.format(Double.POSITIVE_INFINITY, "N"));
        assertEquals("cannot write a force that is not finite: Infinity", e.getMessage());
    }
}
