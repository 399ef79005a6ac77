package org.spanlift.validation.liftingline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Twist, section zero-lift angle and the linearity of Prandtl's equation. Sources: the superposition of a
 * basic (twist) load and an additional (angle-of-attack) load is a consequence of the equation being linear
 * (H. Glauert, The Elements of Aerofoil and Airscrew Theory, 1926, chapter XI; J. D. Anderson,
 * Fundamentals of Aerodynamics, chapter 5); that washout lowers the lift at a given angle and raises the
 * induced drag above the elliptic minimum is the common-practice expectation for a wing whose untwisted
 * load is already elliptic. Identities are checked to round-off (1e-12 relative unless stated).
 */
class TwistAndLinearityTest {

    private final LiftingLineSolver solver = new LiftingLineSolver();

    @Test
    void washoutLowersLiftAtAGivenAngleOfAttack() {
        LiftingLineWing plain = LiftingLineWing.trapezoidal(6.0, 1.0, 0.5);
        LiftingLineWing washed = plain.withLinearWashout(Math.toRadians(3.0));
        double alpha = Math.toRadians(5.0);
        LiftingLineSolution p = solver.solve(plain, alpha);
        LiftingLineSolution w = solver.solve(washed, alpha);
        assertTrue(w.liftCoefficient() < p.liftCoefficient(), "washout lowers CL");
        assertTrue(w.zeroLiftAngle() > 0.0, "with the tips nose-down the wing needs a positive root angle to lift "
                + "nothing");
        assertEquals(p.liftSlope(), w.liftSlope(), 1e-12 * p.liftSlope(), "twist leaves the lift slope unchanged");
    }

    @Test
    void washoutOnAnEllipticWingCostsSpanEfficiencyAtModerateLift() {
        LiftingLineWing washed = LiftingLineWing.elliptic(2.0 * Math.PI, 1.0).withLinearWashout(Math.toRadians(4.0));
        LiftingLineSolution s = solver.solve(washed, Math.toRadians(7.0));
        assertTrue(s.liftCoefficient() > 0.4 && s.liftCoefficient() < 0.8, "moderate CL, got " + s.liftCoefficient());
        assertNotNull(s.spanEfficiency());
        assertTrue(s.spanEfficiency() < 1.0 - 1e-3, "e below 1 with washout, got " + s.spanEfficiency());
        assertTrue(s.spanEfficiency() > 0.5, "and still a sensible value, got " + s.spanEfficiency());
    }

    @Test
    void spanEfficiencyIsAbsentNearZeroLiftNeverNaN() {
        LiftingLineWing washed = LiftingLineWing.trapezoidal(6.0, 1.0, 0.5).withLinearWashout(Math.toRadians(4.0));
        LiftingLineSolution atZeroLift = solver.solve(washed, solver.solve(washed, 0.0).zeroLiftAngle());
        assertEquals(0.0, atZeroLift.liftCoefficient(), 1e-12);
        assertTrue(atZeroLift.inducedDragCoefficient() > 0.0, "the basic load has induced drag at zero lift");
        assertNull(atZeroLift.spanEfficiency());
        assertNull(atZeroLift.inducedDragFactor());

        LiftingLineSolution untwistedAtZero = solver.solve(LiftingLineWing.rectangular(6.0, 1.0, 5.8), 0.0);
        assertEquals(0.0, untwistedAtZero.liftCoefficient(), 0.0);
        assertEquals(0.0, untwistedAtZero.inducedDragCoefficient(), 0.0);
        assertNull(untwistedAtZero.spanEfficiency());
        assertTrue(Double.isFinite(untwistedAtZero.additionalInducedDragFactor()));
        for (double v : untwistedAtZero.sectionLift()) {
            assertEquals(0.0, v, 0.0);
        }
    }

    @Test
    void liftIsExactlyLinearInAngleOfAttack() {
        LiftingLineWing wing = LiftingLineWing.trapezoidal(7.0, 1.2, 0.45)
                .withLinearWashout(Math.toRadians(2.5))
                .withZeroLiftAngle(eta -> Math.toRadians(-2.0 + eta));
        LiftingLineSolution ref = solver.solve(wing, 0.0);
        for (double deg : new double[] {-4.0, 1.0, 6.0, 12.0}) {
            double alpha = Math.toRadians(deg);
            LiftingLineSolution s = solver.solve(wing, alpha);
            double expected = ref.liftSlope() * (alpha - ref.zeroLiftAngle());
            assertEquals(expected, s.liftCoefficient(), 1e-12 * Math.max(1.0, Math.abs(expected)), "CL at " + deg
                    + " deg");
        }
    }

    @Test
    void uniformSectionZeroLiftAngleBecomesTheWingZeroLiftAngle() {
        double alpha0 = Math.toRadians(-2.7);
        LiftingLineWing cambered = LiftingLineWing.trapezoidal(6.0, 1.0, 0.6).withZeroLiftAngle(eta -> alpha0);
        LiftingLineWing flat = LiftingLineWing.trapezoidal(6.0, 1.0, 0.6);
        assertEquals(alpha0, solver.solve(cambered, 0.0).zeroLiftAngle(), 1e-12);
        // A uniform incidence eps0 acts like an angle of attack: zero lift at alpha = -eps0.
        double eps0 = Math.toRadians(1.5);
        assertEquals(-eps0, solver.solve(flat.withTwist(eta -> eps0), 0.0).zeroLiftAngle(), 1e-12);
        // Same load as the flat wing at alpha - alpha0.
        double alpha = Math.toRadians(4.0);
        LiftingLineSolution c = solver.solve(cambered, alpha);
        LiftingLineSolution f = solver.solve(flat, alpha - alpha0);
        assertEquals(f.liftCoefficient(), c.liftCoefficient(), 1e-12);
        assertEquals(f.inducedDragCoefficient(), c.inducedDragCoefficient(), 1e-12);
    }

    /**
     * The span load integrates to the wing lift: CL = 2 A * integral over eta in [0, 1] of Gamma/(V b),
     * evaluated with the trapezoidal rule in theta (eta = cos theta) on the solver's own stations plus the
     * tip, where the load vanishes; this rule is exact for the series up to its last term, so the check
     * holds to 1e-9 relative.
     */
    @Test
    void spanLoadIntegratesToTheWingLift() {
        LiftingLineWing wing = LiftingLineWing.trapezoidal(5.0, 1.0, 0.3).withLinearWashout(Math.toRadians(2.0));
        double alpha = Math.toRadians(6.0);
        LiftingLineSolution s = solver.solve(wing, alpha);
        double[] eta = s.eta();
        double[] g = s.circulation();
        double[] ccl = s.chordTimesSectionLift();
        double[] cl = s.sectionLift();
        int n = eta.length;
        double h = Math.PI / (2.0 * n);
        double sum = 0.0;
        for (int k = 0; k < n; k++) {
            double theta = Math.acos(eta[k]);
            double weight = k == 0 ? 0.5 : 1.0; // root end of the interval; the tip end carries zero load
            sum += weight * g[k] * Math.sin(theta);
            assertEquals(4.0 * g[k] * wing.span() / 2.0, ccl[k], 1e-12 * Math.abs(ccl[k]) + 1e-15,
                    "c cl = 2 Gamma / V");
            assertEquals(ccl[k] / wing.chord().applyAsDouble(eta[k]), cl[k], 1e-12 * Math.abs(cl[k]) + 1e-15);
        }
        double integral = sum * h;
        assertEquals(s.liftCoefficient(), 2.0 * wing.aspectRatio() * integral, 1e-9 * s.liftCoefficient());
    }
}
