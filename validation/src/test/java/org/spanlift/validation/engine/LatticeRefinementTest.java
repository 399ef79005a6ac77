package org.spanlift.validation.engine;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.Spacing;
import org.spanlift.validation.wings.Wings;

/**
 * Refining the lattice converges monotonically (common practice: a mesh-convergence study), on the flat
 * elliptic wing of aspect ratio 6, strips 8, 16, 32, 64 per half with 6 cosine rows. Measured: lift slope
 * 4.35872, 4.38274, 4.38956, 4.39163 per radian; e 0.99626, 0.99760, 0.99791, 0.99800.
 */
class LatticeRefinementTest {

    private static final int[] STRIPS = {8, 16, 32, 64};

    /** Each step moves the same way, and by less than the step before (a converging sequence). */
    private static void assertMonotoneConvergence(double[] v, String what) {
        for (int i = 2; i < v.length; i++) {
            double before = v[i - 1] - v[i - 2];
            double now = v[i] - v[i - 1];
            assertTrue(Math.signum(now) == Math.signum(before) && now != 0, what + " not monotone at "
                    + STRIPS[i] + " strips");
            assertTrue(Math.abs(now) < Math.abs(before), what + " not converging at " + STRIPS[i] + " strips");
        }
    }

    @Test
    void ellipticWingLiftSlopeAndSpanEfficiencyConvergeMonotonically() {
        double[] slope = new double[STRIPS.length];
        double[] e = new double[STRIPS.length];
        for (int i = 0; i < STRIPS.length; i++) {
            LatticeSpec lattice = new LatticeSpec(STRIPS[i], 6, Spacing.COSINE, Spacing.COSINE);
            slope[i] = EngineChecks.liftSlope(Wings.elliptic(6, lattice));
            e[i] = EngineChecks.spanEfficiency(Wings.elliptic(6, lattice));
        }
        assertMonotoneConvergence(slope, "lift slope");
        assertMonotoneConvergence(e, "span efficiency");
    }
}
