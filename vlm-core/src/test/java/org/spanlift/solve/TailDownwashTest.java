package org.spanlift.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.SurfaceRole;
import org.spanlift.geometry.Wing;
import org.spanlift.results.SpanLoad;
import org.spanlift.section.CamberLines;

/**
 * A tail in the wing's wake: its span load stays smooth at the wake's height (the wing's trailing legs pass
 * within millimetres of its control points; their cores keep the load smooth) and the downwash gradient at
 * the tail converges as the lattice is refined.
 *
 * <p>The configuration: a straight-tapered wing of span 10 m, root chord 1.6 m, taper 0.5 (aspect ratio
 * 8.3), and a rectangular tail of span 3.4 m and chord 0.8 m whose leading edge is 5 m aft of the wing's
 * root leading edge, at height z (the wing's wake lies in z = 0), both flat and untwisted.
 */
class TailDownwashTest {

    private static final double DEG = Math.PI / 180;

    static Wing configuration(double tailHeight, int strips, int rows) {
        LatticeSpec spec = new LatticeSpec(strips, rows, Spacing.COSINE, Spacing.COSINE);
        Surface wing = new Trapezoid(10, 1.6, 0.5, 0, 0, 0, 0, "s", 0, 0).surface("wing", List.of(), spec);
        Surface tail = new Trapezoid(3.4, 0.8, 1, 0, 0, 0, 0, "s", 5, tailHeight).surface("tail", List.of(), spec);
        return new Wing("wing and tail", LengthUnit.M, Wing.defaultReference(wing), List.of(wing, tail),
                Map.of("s", Section.of("s", CamberLines.parse("flat"))));
    }

    /** The largest second difference of strip cl along the span, over the mean cl. */
    static double jaggedness(SpanLoad load) {
        double[] cl = load.cl();
        double mean = 0;
        for (double c : cl) {
            mean += c / cl.length;
        }
        double worst = 0;
        for (int i = 1; i + 1 < cl.length; i++) {
            worst = Math.max(worst, Math.abs(cl[i - 1] - 2 * cl[i] + cl[i + 1]));
        }
        return worst / Math.abs(mean);
    }

    private static double tailJaggedness(double height, int strips) {
        return jaggedness(WingAnalysis.of(configuration(height, strips, 4)).solve(5 * DEG).spanLoad(1));
    }

    @Test
    void aTailAtTheWakeHeightHasASmoothLoad() {
        // Measured with potential trailing legs (before the cores): 0.78, 0.54, 1.20 at z = 0 for 16, 32, 64
        // strips; with the cores 0.020, 0.0060, 0.0019 (and 0.016, 0.0042, 0.0010 with the tail 0.5 m above
        // the wake). The cores leave a ripple of order the wake's local strength (see TrailingCoreTest), so the
        // bound is an absolute one, a hundred times below the potential legs' jags.
        for (double height : new double[] {0, 0.05}) {
            double previous = Double.POSITIVE_INFINITY;
            for (int strips : new int[] {16, 32, 64}) {
                double jag = tailJaggedness(height, strips);
                assertTrue(jag < previous, "z = " + height + ", " + strips + " strips: " + jag);
                if (strips >= 32) {
                    assertTrue(jag < 0.01, "z = " + height + ", " + strips + " strips: " + jag);
                }
                previous = jag;
            }
        }
    }

    @Test
    void theDownwashGradientAtTheTailConvergesWithRefinement() {
        // Measured (cosine, 4 rows): 8, 16, 32, 64, 128 strips give 0.3975, 0.4047, 0.4100, 0.4121, 0.4132
        // at the wake height (potential legs: 0.382, 0.216, 0.290, 0.191, 0.293).
        double[] gradient = new double[4];
        int[] strips = {16, 32, 64, 128};
        for (int k = 0; k < strips.length; k++) {
            gradient[k] = TailDownwash.of(configuration(0, strips[k], 4), 1).gradient();
        }
        for (int k = 2; k < strips.length; k++) {
            double change = Math.abs(gradient[k] - gradient[k - 1]);
            double before = Math.abs(gradient[k - 1] - gradient[k - 2]);
            assertTrue(change < 0.6 * before, strips[k] + " strips: change " + change + " after " + before);
        }
        assertEquals(gradient[3], gradient[2], 0.005 * gradient[3]);
        // continuous across the wake: 5 cm above it the gradient differs by under 1% (measured 0.6%)
        double above = TailDownwash.of(configuration(0.05, 64, 4), 1).gradient();
        assertEquals(gradient[2], above, 0.01 * gradient[2]);
    }

    @Test
    void theGradientIsTheDerivativeOfTheAngle() {
        // a cambered wing at 6 degrees: the exact derivative from the basis against a central difference
        Wing base = configuration(0.3, 16, 4);
        Wing cambered = new Wing(base.name(), base.displayUnit(), base.reference(), base.surfaces(),
                Map.of("s", Section.of("s", CamberLines.parse("NACA 4412"))));
        double alpha = 6 * DEG;
        double step = 1e-4;
        double difference = (TailDownwash.of(cambered, 1, alpha + step).angle()
                - TailDownwash.of(cambered, 1, alpha - step).angle()) / (2 * step);
        TailDownwash at = TailDownwash.of(cambered, 1, alpha);
        assertEquals(difference, at.gradient(), 1e-7);
        assertTrue(at.angle() > 0, "a lifting wing turns the flow down at its tail: " + at.angle());
    }

    @Test
    void theTailIsFoundByItsIndexWhateverTheOrder() {
        Wing w = configuration(0.1, 16, 4);
        // roles cleared: the first surface of a wing becomes its wing
        Wing reversed = new Wing(w.name(), w.displayUnit(), w.reference(),
                List.of(w.surfaces().get(1).withRole(SurfaceRole.OTHER),
                        w.surfaces().get(0).withRole(SurfaceRole.OTHER)),
                w.sections());
        TailDownwash a = TailDownwash.of(w, 1, 4 * DEG);
        TailDownwash b = TailDownwash.of(reversed, 0, 4 * DEG);
        assertEquals(a.angle(), b.angle(), 1e-14);
        assertEquals(a.gradient(), b.gradient(), 1e-14);
    }

    @Test
    void aWingOfOneSurfaceOrAMissingTailIsRefused() {
        Wing w = configuration(0, 8, 2);
        Wing alone = new Wing(w.name(), w.displayUnit(), w.reference(), List.of(w.surfaces().get(0)), w.sections());
        assertThrows(IllegalArgumentException.class, () -> TailDownwash.of(alone, 0));
        assertThrows(IllegalArgumentException.class, () -> TailDownwash.of(w, 2));
    }
}
