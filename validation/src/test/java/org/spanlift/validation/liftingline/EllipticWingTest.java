package org.spanlift.validation.liftingline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The untwisted elliptic wing, the closed-form case of Prandtl's lifting-line theory: elliptic circulation,
 * constant downwash and section cl, e = 1 (delta = tau = 0) and lift slope a = a0 / (1 + a0/(pi A)).
 * Source: L. Prandtl's lifting-line theory as given by H. Glauert, The Elements of Aerofoil and Airscrew
 * Theory, Cambridge University Press, 1926, chapter XI (the elliptic distribution); and J. D. Anderson,
 * Fundamentals of Aerodynamics, chapter 5, section on the elliptical lift distribution (e = 1 and the
 * lift slope formula). The tolerance 1e-9 is round-off level: with elliptic chord the exact solution is the
 * first Fourier term alone, so the series method has no truncation error here.
 */
class EllipticWingTest {

    private static final double TOL = 1e-9;
    private final LiftingLineSolver solver = new LiftingLineSolver();

    @ParameterizedTest(name = "A = {0}, a0 = {1}")
    @CsvSource({"4, 6.283185307179586", "8, 6.283185307179586", "12, 5.7", "6, 5.0"})
    void ellipticWingHasUnitSpanEfficiencyAndClosedFormLiftSlope(double aspectRatio, double a0) {
        double rootChord = 1.3;
        double span = aspectRatio * Math.PI * rootChord / 4.0; // A = 4 b / (pi c_root)
        LiftingLineWing wing = LiftingLineWing.elliptic(span, rootChord, a0);
        assertEquals(aspectRatio, wing.aspectRatio(), 1e-12 * aspectRatio);

        LiftingLineSolution s = solver.solve(wing, Math.toRadians(5.0));

        assertNotNull(s.spanEfficiency());
        assertEquals(1.0, s.spanEfficiency(), TOL, "e (Prandtl: elliptic load is the minimum-drag load)");
        assertEquals(0.0, s.inducedDragFactor(), TOL, "delta");
        assertEquals(0.0, s.additionalInducedDragFactor(), TOL, "delta of the additional load");
        double expectedSlope = a0 / (1.0 + a0 / (Math.PI * aspectRatio));
        assertEquals(expectedSlope, s.liftSlope(), TOL * expectedSlope, "a = a0/(1 + a0/(pi A))");
        assertNotNull(s.liftSlopeFactor());
        assertEquals(0.0, s.liftSlopeFactor(), TOL, "tau");
        double cl = s.liftCoefficient();
        assertEquals(cl * cl / (Math.PI * aspectRatio), s.inducedDragCoefficient(), TOL * cl * cl,
                "CDi = CL^2/(pi A)");
        assertEquals(0.0, s.zeroLiftAngle(), TOL, "untwisted symmetric sections lift nothing at alpha = 0");
    }

    @ParameterizedTest(name = "A = {0}")
    @CsvSource({"5", "9"})
    void ellipticWingHasConstantSectionLiftAndEllipticCirculation(double aspectRatio) {
        double rootChord = 0.8;
        double span = aspectRatio * Math.PI * rootChord / 4.0;
        double alpha = Math.toRadians(4.0);
        LiftingLineSolution s = solver.solve(LiftingLineWing.elliptic(span, rootChord), alpha);

        double[] eta = s.eta();
        double[] cl = s.sectionLift();
        double[] g = s.circulation();
        double cL = s.liftCoefficient();
        // Elliptic load: section cl equals CL everywhere; Gamma/(V b) = (2 CL / (pi A)) sqrt(1 - eta^2).
        for (int k = 0; k < eta.length; k++) {
            assertEquals(cL, cl[k], TOL, "section cl at eta = " + eta[k]);
            double expected = 2.0 * cL / (Math.PI * aspectRatio) * Math.sqrt(1.0 - eta[k] * eta[k]);
            assertEquals(expected, g[k], TOL, "Gamma/(V b) at eta = " + eta[k]);
        }
        assertTrue(eta[0] == 0.0 && eta[eta.length - 1] < 1.0, "stations run from the root toward the tip");
    }
}
