package org.spanlift.validation.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.Spacing;
import org.spanlift.validation.wings.Wings;

/**
 * Induced drag on square tips (common practice: mesh convergence of the span efficiency on a rectangular
 * wing, here of aspect ratio 8). The engine's formulation is the plain Trefftz-plane sum of point vortices
 * at the strip edges with piecewise-constant circulation, evaluated at the control-point stations; with
 * cosine strips and control points at the angular midpoint it converges fast, with uniform strips slowly
 * (the tip's square-root load singularity is resolved badly by equal strips).
 *
 * <p>Measured (6 cosine rows): cosine 8/16/24/40/80 strips e = 0.97172, 0.97201, 0.97206, 0.97209,
 * 0.97210; uniform 1.03315, 1.00215, 0.99203, 0.98401, 0.97804.
 */
class SquareTipDragConvergenceTest {

    private static final int[] STRIPS = {8, 16, 24, 40, 80};

    private static double[] spanEfficiencies(Spacing stripSpacing) {
        double[] e = new double[STRIPS.length];
        for (int i = 0; i < STRIPS.length; i++) {
            e[i] = EngineChecks.spanEfficiency(Wings.rectangular(8, Wings.FLAT,
                    new LatticeSpec(STRIPS[i], 6, stripSpacing, Spacing.COSINE)));
        }
        return e;
    }

    private static void assertMonotone(double[] e) {
        double sign = Math.signum(e[e.length - 1] - e[0]);
        for (int i = 1; i < e.length; i++) {
            assertTrue(Math.signum(e[i] - e[i - 1]) == sign,
                    "not monotone at " + STRIPS[i] + " strips: " + e[i - 1] + " then " + e[i]);
        }
    }

    @Test
    void cosineStripsConvergeMonotonicallyAndTheDefaultIsConverged() {
        double[] e = spanEfficiencies(Spacing.COSINE);
        assertMonotone(e);
        // Spread over 8..80 strips measured 0.04%; the default (24 strips) must be within half a percent
        // of the finest lattice (the accuracy asked of the default in the design notes' drag warning).
        double finest = e[e.length - 1];
        assertEquals(finest, e[2], 0.005 * finest);
    }

    @Test
    void uniformStripsConvergeSlowlyAtFirstOrder() {
        double converged = spanEfficiencies(Spacing.COSINE)[STRIPS.length - 1];
        double[] e = spanEfficiencies(Spacing.UNIFORM);
        assertMonotone(e);
        // Still outside the half percent the cosine default meets at 80 uniform strips (measured 0.61%)...
        double error80 = e[4] - converged;
        assertTrue(Math.abs(error80) > 0.005 * converged, "uniform 80-strip error " + error80);
        // ...because the error falls only as 1/n: observed order between 40 and 80 strips (measured 1.00);
        // first order expected from the tip singularity, +-0.2 for the pre-asymptotic range.
        double order = Math.log((e[3] - converged) / error80) / Math.log(2);
        assertEquals(1, order, 0.2);
    }
}
