package org.spanlift.validation.liftingline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Invalid input is refused with a clear message, never answered with NaN (project rule on bad input). */
class InputValidationTest {

    private final LiftingLineSolver solver = new LiftingLineSolver(32);

    @Test
    void nonPositiveSpanIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LiftingLineWing.trapezoidal(0.0, 1.0, 0.5));
        assertTrue(e.getMessage().contains("span"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> LiftingLineWing.elliptic(-3.0, 1.0));
        assertThrows(IllegalArgumentException.class, () -> LiftingLineWing.rectangular(Double.NaN, 1.0, 6.0));
    }

    @Test
    void chordThatVanishesInboardOfTheTipIsRefused() {
        // of() samples the chord densely while integrating the area, so a zero band is found there.
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LiftingLineWing.of(6.0, eta -> eta > 0.4 && eta < 0.6 ? 0.0 : 1.0,
                        eta -> 0.0, eta -> 2.0 * Math.PI, eta -> 0.0));
        assertTrue(e.getMessage().contains("chord must be positive away from the tip"), e.getMessage());
    }

    @Test
    void negativeChordAwayFromTheTipIsRefusedBySolver() {
        LiftingLineWing wing = new LiftingLineWing(6.0, eta -> 1.0 - 2.0 * eta, eta -> 0.0, eta -> 2.0 * Math.PI,
                eta -> 0.0, 3.0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> solver.solve(wing, 0.1));
        assertTrue(e.getMessage().contains("chord must be positive away from the tip"), e.getMessage());
    }

    @Test
    void zeroChordAtTheTipIsAccepted() {
        LiftingLineSolution s = solver.solve(LiftingLineWing.trapezoidal(6.0, 1.0, 0.0), 0.1);
        assertTrue(s.liftCoefficient() > 0.0);
        for (double v : s.sectionLift()) {
            assertTrue(Double.isFinite(v));
        }
    }

    @Test
    void otherInvalidInputIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> LiftingLineWing.trapezoidal(6.0, 0.0, 0.5));
        assertThrows(IllegalArgumentException.class, () -> LiftingLineWing.trapezoidal(6.0, 1.0, -0.1));
        assertThrows(IllegalArgumentException.class, () -> LiftingLineWing.trapezoidal(6.0, 1.0, 0.5, 0.0));
        assertThrows(IllegalArgumentException.class,
                () -> solver.solve(LiftingLineWing.rectangular(6.0, 1.0, 6.0), Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> new LiftingLineSolver(0));
        assertThrows(IllegalArgumentException.class,
                () -> solver.solve(LiftingLineWing.rectangular(6.0, 1.0, 6.0).withTwist(eta -> Double.NaN), 0.1));
        LiftingLineWing badSlope = new LiftingLineWing(6.0, eta -> 1.0, eta -> 0.0, eta -> -1.0, eta -> 0.0, 6.0);
        assertThrows(IllegalArgumentException.class, () -> solver.solve(badSlope, 0.1));
    }

    @Test
    void generalPlanformAreaIsIntegratedFromTheChord() {
        // Straight taper built by hand: area b c_root (1 + taper) / 2 in closed form.
        LiftingLineWing general = LiftingLineWing.of(6.0, eta -> 1.0 - 0.6 * eta, eta -> 0.0,
                eta -> 2.0 * Math.PI, eta -> 0.0);
        assertEquals(6.0 * 1.4 / 2.0, general.referenceArea(), 1e-9);
        // Elliptic chord: pi b c_root / 4.
        LiftingLineWing ellipse = LiftingLineWing.of(6.0, eta -> Math.sqrt(Math.max(0.0, 1.0 - eta * eta)),
                eta -> 0.0, eta -> 2.0 * Math.PI, eta -> 0.0);
        assertEquals(Math.PI * 6.0 / 4.0, ellipse.referenceArea(), 1e-9);
    }
}
