package org.spanlift.validation.engine;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.lattice.Lattice;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.validation.wings.Wings;

/**
 * The textbook worked example of the vortex-lattice method: a flat swept wing of aspect ratio 5, taper 1,
 * quarter-chord sweep 45 degrees, four horseshoe vortices per semi-span in one chordwise row, uniform
 * spacing (Bertin and Smith, Aerodynamics for Engineers, worked example in the vortex-lattice chapter;
 * the figures recalled from memory): CL_alpha = 3.443 per radian and circulations
 * Gamma / (4 pi b V alpha) root to tip. Reproduced with its own lattice: bound legs on the quarter-chord
 * line, control points at three-quarter chord of each strip's midpoint, trailing legs parallel to x.
 */
class SweptWingWorkedExampleTest {

    private static final double SPAN = 5;

    private static WingAnalysis example() {
        Trapezoid shape = new Trapezoid(SPAN, 1, 1, Math.toRadians(45), 0, 0, 0, Wings.FLAT, 0, 0);
        return WingAnalysis.of(Wings.of(shape.surface("swept", List.of(),
                new LatticeSpec(4, 1, Spacing.UNIFORM, Spacing.UNIFORM))));
    }

    /** Gamma / (4 pi b V alpha) of the four right-half horseshoes, root to tip. */
    private static double[] circulations(WingAnalysis analysis) {
        double[] g = new double[4];
        for (int i = 0; i < 4; i++) {
            g[i] = analysis.basis().alongZ(i) / (4 * Math.PI * SPAN);
        }
        return g;
    }

    @Test
    void liftSlope() {
        // Measured 3.4442 per radian. 0.1%: the rounding of the printed figure and of the circulations it
        // was summed from (3.443 = 2 pi A (0.0273 + 0.0287 + 0.0286 + 0.0250)).
        assertEquals(3.443, EngineChecks.liftSlope(example()), 0.001 * 3.443);
    }

    @Test
    void circulationsToThePrintedThreeFigures() {
        // As recalled from memory, the example prints three significant figures (and sums them to its
        // 3.443). The engine's values rounded to that precision must equal them exactly.
        double[] g = circulations(example());
        double[] rounded = new double[4];
        for (int i = 0; i < 4; i++) {
            rounded[i] = Math.round(g[i] * 1e4) / 1e4;
        }
        assertArrayEquals(new double[] {0.0273, 0.0287, 0.0286, 0.0250}, rounded, 1e-12);
    }

    @Test
    void engineMatchesAnIndependentHorseshoeSolveOfTheSameLattice() {
        // The same four-by-four system written out from the Biot-Savart law with image horseshoes, solved
        // by Gaussian elimination. Both are exact to rounding, so they agree to near machine precision.
        double[] independent = IndependentHorseshoes.sweptExample(SPAN, 1, Math.toRadians(45), 4);
        WingAnalysis analysis = example();
        Lattice lattice = analysis.lattice();
        for (int i = 0; i < 4; i++) {
            assertEquals(lattice.cy(i), (i + 0.5) * SPAN / 8, 1e-12, "control point order");
            assertEquals(independent[i], analysis.basis().alongZ(i), 1e-12 * Math.abs(independent[i]));
        }
    }
}
