package org.spanlift.validation.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.validation.wings.Wings;

/**
 * The two-dimensional limit: a flat rectangular wing of very large aspect ratio has the flat-plate lift
 * slope 2 pi per radian of thin-airfoil theory (Glauert 1926, The Elements of Aerofoil and Airscrew
 * Theory; Anderson, Fundamentals of Aerodynamics, thin-airfoil chapter). The 1/4-3/4 rule makes each strip
 * exact in 2-D, so what remains is the finite-span loss, of order 2/A.
 */
class TwoDimensionalLimitTest {

    @Test
    void aspectRatioThousandHasTwoPiLiftSlope() {
        // Measured 0.99520 x 2 pi (default lattice). One percent: the finite-span loss at A = 1000 is a few
        // tenths of a percent (lifting-line estimate 2(1 + tau)/A for the rectangle, 0.2-0.3%).
        double slope = EngineChecks.liftSlope(Wings.rectangular(1000, Wings.FLAT, LatticeSpec.DEFAULT));
        assertEquals(2 * Math.PI, slope, 0.01 * 2 * Math.PI);
    }

    @Test
    void liftSlopeApproachesTwoPiMonotonically() {
        // Measured ratios to 2 pi: A = 10 0.7699, 100 0.9643, 1000 0.9952.
        double previous = 0;
        for (double aspectRatio : new double[] {10, 100, 1000}) {
            double ratio = EngineChecks.liftSlope(Wings.rectangular(aspectRatio, Wings.FLAT, LatticeSpec.DEFAULT))
                    / (2 * Math.PI);
            assertTrue(ratio < 1 && ratio > previous, "A = " + aspectRatio + ": ratio " + ratio);
            previous = ratio;
        }
    }
}
