package org.spanlift.validation.nonlinear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;
import org.spanlift.validation.liftingline.LiftingLineSolution;
import org.spanlift.validation.liftingline.LiftingLineSolver;
import org.spanlift.validation.liftingline.LiftingLineWing;

/**
 * Where the section curves are straight lines the nonlinear equation is Prandtl's linear one, so the
 * nonlinear solver must give the linear solver's answer. Sources: Prandtl's lifting-line equation in
 * Glauert's sine series (H. Glauert, The Elements of Aerofoil and Airscrew Theory, 1926, chapter XI), of
 * which the nonlinear form with section data (J. C. Sivells and R. H. Neely, NACA TN 1269, 1947) keeps the
 * induced angle and replaces a0 (alpha_eff - alpha0) by the section curve; the lift slope
 * a = a0 / (1 + (a0 / (pi A)) (1 + tau)) is Glauert's (same chapter), tau taken from the linear solver.
 * The two solvers share the stations and the linear-algebra routine but not the equations' assembly: the
 * linear solver builds its matrix and right-hand sides directly, the nonlinear one reaches them through its
 * residual and Jacobian. Agreement to 1e-9 (relative to the largest value compared) leaves room for
 * round-off in Newton's last step and nothing else.
 */
class LinearLimitTest {

    private static final double DEG = Math.PI / 180.0;
    private static final int TERMS = 64;

    static Stream<Arguments> wings() {
        return Stream.of(
                Arguments.of("rectangular A 8", LiftingLineWing.rectangular(8.0, 1.0, 2.0 * Math.PI)),
                Arguments.of("taper 0.5 A 8, 3 deg washout",
                        LiftingLineWing.trapezoidal(6.0, 1.0, 0.5).withLinearWashout(3.0 * DEG)),
                Arguments.of("pointed tip A 8", LiftingLineWing.trapezoidal(4.0, 1.0, 0.0)),
                Arguments.of("elliptic A 8", LiftingLineWing.elliptic(2.0 * Math.PI, 1.0)));
    }

    /** The thin-airfoil line 2 pi (alpha - alpha0), given as a line and as a two-point table. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("wings")
    void withTheThinAirfoilLineTheNonlinearSolutionIsTheLinearOne(String name, LiftingLineWing wing) {
        double alpha0 = -2.0 * DEG;
        LiftingLineWing cambered = wing.withZeroLiftAngle(eta -> alpha0);
        SectionLiftCurve line = SectionLiftCurve.linear(2.0 * Math.PI, alpha0);
        SectionLiftCurve table = SectionLiftCurve.tableDegrees(new double[] {-40.0, 60.0},
                new double[] {2.0 * Math.PI * (-40.0 * DEG - alpha0), 2.0 * Math.PI * (60.0 * DEG - alpha0)});
        NonlinearLiftingLineSolver nonlinear = new NonlinearLiftingLineSolver(TERMS);
        LiftingLineSolver linear = new LiftingLineSolver(TERMS);
        for (double deg : new double[] {-3.0, 4.0, 9.0}) {
            LiftingLineSolution expected = linear.solve(cambered, deg * DEG);
            for (SectionLiftCurve curve : new SectionLiftCurve[] {line, table}) {
                NonlinearPoint point = nonlinear.solve(NonlinearWing.uniform(wing, curve), deg * DEG);
                NonlinearSolution s = assertInstanceOf(NonlinearSolution.class, point, name + " at " + deg + " deg");
                assertSame(expected, s, name + " at " + deg + " deg, " + curve);
                assertEquals(1, s.index(), "positive slopes: index +1");
                assertEquals(0, s.stationsPastPeak());
            }
        }
    }

    /**
     * Below the rounding of the peak, a section of slope a0 = 5.7 per radian and zero-lift angle -2 degrees
     * gives the linear solver's solution with that a0 and alpha0, and the lift slope of Glauert's formula
     * with the linear solver's tau; the solution's own dCL/dalpha (from the Jacobian) is the same number.
     */
    @Test
    void belowTheRoundedPeakASmallerSectionSlopeGivesGlauertsLiftSlope() {
        double a0 = 5.7;
        double alpha0 = -2.0 * DEG;
        double clMax = 1.5;
        double cap = 4.0 * DEG;
        double capStart = alpha0 + clMax / a0 - cap / 2.0; // where the straight line ends
        LiftingLineWing wing = LiftingLineWing.rectangular(7.0, 1.0, a0).withZeroLiftAngle(eta -> alpha0);
        NonlinearWing nonlinearWing = NonlinearWing.uniform(wing, SectionLiftCurve.synthetic(a0, alpha0, clMax, cap));
        NonlinearLiftingLineSolver nonlinear = new NonlinearLiftingLineSolver(TERMS);
        LiftingLineSolver linear = new LiftingLineSolver(TERMS);
        double low = 2.0 * DEG;
        double high = 7.0 * DEG;
        NonlinearSolution sLow = assertInstanceOf(NonlinearSolution.class, nonlinear.solve(nonlinearWing, low));
        NonlinearSolution sHigh = assertInstanceOf(NonlinearSolution.class, nonlinear.solve(nonlinearWing, high));
        for (double ae : sHigh.effectiveAngle()) {
            assertTrue(ae < capStart, "every station on the straight part of its curve");
        }
        LiftingLineSolution lLow = linear.solve(wing, low);
        LiftingLineSolution lHigh = linear.solve(wing, high);
        assertSame(lLow, sLow, "at 2 deg");
        assertSame(lHigh, sHigh, "at 7 deg");

        Double tau = lHigh.liftSlopeFactor();
        assertNotNull(tau);
        double aspectRatio = wing.aspectRatio();
        double glauert = a0 / (1.0 + a0 / (Math.PI * aspectRatio) * (1.0 + tau));
        double measured = (sHigh.liftCoefficient() - sLow.liftCoefficient()) / (high - low);
        assertEquals(glauert, measured, 1e-9 * glauert, "lift slope from two angles");
        assertNotNull(sHigh.liftSlope());
        assertEquals(glauert, sHigh.liftSlope(), 1e-9 * glauert, "lift slope from the Jacobian");
        assertTrue(glauert < a0 && glauert > a0 / (1.0 + a0 / (Math.PI * aspectRatio) * 1.5),
                "a finite wing lifts less than its section, by a tau between 0 and 0.5");
    }

    private static void assertSame(LiftingLineSolution expected, NonlinearSolution actual, String what) {
        double[] a = expected.fourierCoefficients();
        double[] b = actual.fourierCoefficients();
        double scale = 0.0;
        for (double v : a) {
            scale = Math.max(scale, Math.abs(v));
        }
        for (int j = 0; j < a.length; j++) {
            assertEquals(a[j], b[j], 1e-9 * scale, what + ": A_" + (2 * j + 1));
        }
        assertEquals(expected.liftCoefficient(), actual.liftCoefficient(),
                1e-9 * Math.abs(expected.liftCoefficient()), what + ": CL");
        assertEquals(expected.inducedDragCoefficient(), actual.inducedDragCoefficient(),
                1e-9 * expected.inducedDragCoefficient(), what + ": CDi");
        double[] clExpected = expected.sectionLift();
        double[] clActual = actual.sectionLift();
        double[] etaExpected = expected.eta();
        double[] etaActual = actual.eta();
        double clScale = 0.0;
        for (double v : clExpected) {
            clScale = Math.max(clScale, Math.abs(v));
        }
        for (int k = 0; k < clExpected.length; k++) {
            assertEquals(etaExpected[k], etaActual[k], 0.0, what + ": same stations");
            assertEquals(clExpected[k], clActual[k], 1e-9 * clScale, what + ": cl at eta " + etaExpected[k]);
        }
    }
}
