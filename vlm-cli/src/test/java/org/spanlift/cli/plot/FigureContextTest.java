package org.spanlift.cli.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Font;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;

class FigureContextTest {

    private static final Wing TRAINER = WingFileReader.read(Path.of("..", "geometries", "trainer.wing.yaml"));

    /** The trainer's controls in file order: flap, then aileron. */
    private static double[] deflections(double flapDeg, double aileronDeg) {
        return new double[] {Math.toRadians(flapDeg), Math.toRadians(aileronDeg)};
    }

    private static Optional<FlightCondition> condition(double weight, double altitude, double n) {
        return Optional.of(new FlightCondition(weight, n, StandardAtmosphere.at(altitude, 0), OptionalDouble.empty()));
    }

    @Test
    void namesEveryDeflectedControlWithItsSenseAndLeavesTheOthersOut() {
        FigureContext flap = FigureContext.of(TRAINER, deflections(20, 0), Optional.empty());
        assertEquals("flap 20\u00b0 trailing edge down", flap.text());
        assertEquals(1, flap.deflections().size());
        assertEquals(ControlKind.FLAP, flap.deflections().get(0).kind());
        assertEquals(Math.toRadians(20), flap.deflection("flap"), 0);
        assertEquals(0, flap.deflection("aileron"), 0);
        FigureContext both = FigureContext.of(TRAINER, deflections(-5, 7.5), Optional.empty());
        assertEquals("flap 5\u00b0 trailing edge up, aileron 7.5\u00b0 (right trailing edge down, left up)",
                both.text());
        assertEquals("no control deflected", FigureContext.of(TRAINER, deflections(0, 0), Optional.empty()).text());
    }

    @Test
    void statesWeightPressureAltitudeAndALoadFactorOtherThanOneOnlyWithACondition() {
        FigureContext level = FigureContext.of(TRAINER, deflections(20, 0), condition(7355.0, 1500, 1));
        assertEquals("flap 20\u00b0 trailing edge down  \u00b7  weight 7355 N  \u00b7  pressure altitude 1500 m",
                level.text());
        assertEquals(7355.0, level.weight().getAsDouble(), 0);
        assertEquals(1500, level.pressureAltitude(), 1e-9);
        assertEquals("Drawn for flap 20\u00b0 trailing edge down; weight 7355 N; pressure altitude 1500 m.",
                level.sentence());
        FigureContext pulled = FigureContext.of(TRAINER, deflections(0, 0), condition(7355.0, 0, 2.5));
        assertTrue(pulled.text().endsWith("pressure altitude 0 m  \u00b7  load factor 2.5"), pulled.text());
        FigureContext none = FigureContext.of(TRAINER, deflections(0, 0), Optional.empty());
        assertFalse(none.text().contains("weight") || none.text().contains("altitude") || none.text().contains("load"),
                none.text());
    }

    @Test
    void severalWingsShareOneLineWhenTheyAgreeAndAreKeyedWhenNot() {
        FigureContext clean = FigureContext.undeflected();
        FigureContext flap = FigureContext.of(TRAINER, deflections(15, 0), Optional.empty());
        assertEquals("every wing: no control deflected", FigureContext.text(List.of("A", "B"), List.of(clean, clean)));
        assertEquals("A: no control deflected  \u00b7  B: flap 15\u00b0 trailing edge down",
                FigureContext.text(List.of("A", "B"), List.of(clean, flap)));
        assertEquals("Drawn for A: no control deflected; B: flap 15\u00b0 trailing edge down.",
                FigureContext.sentence(List.of("A", "B"), List.of(clean, flap)));
    }

    @Test
    void subtitlesBreakBetweenTheirPartsFirst() {
        Font font = ChartFigure.SUBTITLE;
        String text = String.join(Text.SEPARATOR, "flap 20\u00b0 trailing edge down", "weight 7355 N",
                "pressure altitude 0 m", "load factor 2.5");
        double narrow = Text.width("flap 20\u00b0 trailing edge down" + Text.SEPARATOR + "weight 7355 N", font) + 1;
        List<String> lines = Text.wrap(text, font, narrow);
        assertEquals(List.of("flap 20\u00b0 trailing edge down" + Text.SEPARATOR + "weight 7355 N",
                "pressure altitude 0 m" + Text.SEPARATOR + "load factor 2.5"), lines);
        assertEquals(List.of(text), Text.wrap(text, font, Text.width(text, font) + 1));
        for (String line : Text.wrap(text, font, 90)) {
            assertTrue(Text.width(line, font) <= 90 || !line.contains(" "), "too wide: " + line);
        }
    }
}
