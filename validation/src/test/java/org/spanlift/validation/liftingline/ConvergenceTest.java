package org.spanlift.validation.liftingline;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The default number of Fourier terms is converged: CL and e change by less than 1e-6 (relative) when the
 * number of terms is doubled, for every kind of wing the other tests use (common practice for a
 * convergence check; 1e-6 is the requirement set for this solver).
 */
class ConvergenceTest {

    static Stream<Arguments> wings() {
        return Stream.of(
                Arguments.of("rectangular A 8", LiftingLineWing.rectangular(8.0, 1.0, 2.0 * Math.PI)),
                Arguments.of("taper 0.4 A 6", LiftingLineWing.trapezoidal(4.2, 1.0, 0.4)),
                Arguments.of("pointed tip A 8", LiftingLineWing.trapezoidal(4.0, 1.0, 0.0)),
                Arguments.of("taper 0.5 A 8, 4 deg washout",
                        LiftingLineWing.trapezoidal(6.0, 1.0, 0.5).withLinearWashout(Math.toRadians(4.0))),
                Arguments.of("elliptic A 8", LiftingLineWing.elliptic(2.0 * Math.PI, 1.0)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("wings")
    void liftAndSpanEfficiencyChangeLessThanOnePpmWhenTermsDouble(String name, LiftingLineWing wing) {
        double alpha = Math.toRadians(6.0);
        LiftingLineSolution n = new LiftingLineSolver().solve(wing, alpha);
        LiftingLineSolution twoN = new LiftingLineSolver(2 * LiftingLineSolver.DEFAULT_TERMS).solve(wing, alpha);
        assertEquals(twoN.liftCoefficient(), n.liftCoefficient(), 1e-6 * Math.abs(twoN.liftCoefficient()), "CL");
        assertEquals(twoN.spanEfficiency(), n.spanEfficiency(), 1e-6 * twoN.spanEfficiency(), "e");
    }
}
