package org.spanlift.validation.loads;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.spanlift.geometry.Wing;
import org.spanlift.structure.LoadCase;
import org.spanlift.loads.LoadsAnalysis;
import org.spanlift.loads.SpanwiseLoads;
import org.spanlift.structure.WingStructure;
import org.spanlift.solve.WingAnalysis;

/**
 * Root bending of massless flat wings against the classic span-load results. The spar line is the quarter
 * chord (straight on these planforms), so the bending axis is x, and the longitudinal axis is the chord line,
 * so the bending is the moment of the normal force (n W on the whole wing) and the chord bending that of the
 * chordwise force (CC q S): the span distributions of both follow the load's (an elliptic load has uniform
 * downwash, so its induced drag is distributed like its lift).
 */
class ClassicSpanLoadTest {

    private static final WingStructure MASSLESS = new WingStructure(0.25, 0.40, Optional.empty(), Optional.empty(),
            List.of());

    private static SpanwiseLoads solve(Wing wing, double weight, double speed) {
        WingAnalysis a = WingAnalysis.of(wing);
        return LoadsAnalysis.of(a, MASSLESS, a.fileDeflections()).loads(new LoadCase("1 g", weight, 1.0, speed, 0,
                "given"));
    }

    /**
     * Elliptic load: a half-wing carrying n W/2 normal to its plane with an elliptic load has the root bending moment
     * (L/2)(4 s / (3 pi)), s the semi-span (the centroid of a semi-ellipse; classic lifting-line result,
     * e.g. any text on Prandtl's lifting-line theory). That is the limit of large aspect ratio; the lattice
     * (a lifting surface) puts the load slightly inboard, by an amount measured here to fall as 1/A:
     * -0.59% at A 12.7, -0.26% at A 25, -0.10% at A 51 (48 strips, converged to 0.02% in strips). The
     * check asks for 0.15% at A 51 and for the deficit to halve (within 0.35 to 0.65) each time A doubles.
     */
    @Test
    void ellipticWingRootBendingTendsToTheClassicResult() {
        double weight = 8000;
        double[] spans = {12, 24, 48};
        double[] error = new double[3];
        for (int i = 0; i < 3; i++) {
            SpanwiseLoads l = solve(LoadsFixtures.elliptic(spans[i], 1.2, 48), weight, 40 * Math.sqrt(12 / spans[i]));
            double classic = weight / 2 * 4 * (spans[i] / 2) / (3 * Math.PI);
            assertEquals(classic, l.rootBending(), 0.007 * classic, "bending");
            double area = LoadsFixtures.elliptic(spans[i], 1.2, 48).reference().area();
            double chordClassic = l.chordCoefficient() * l.dynamicPressure() * area / 2 * 4 * (spans[i] / 2)
                    / (3 * Math.PI);
            assertEquals(chordClassic, l.chordBending()[0], 0.007 * classic, "chord bending");
            error[i] = l.rootBending() / classic - 1;
        }
        assertTrue(Math.abs(error[2]) < 1.5e-3, "A 51: " + error[2]);
        for (int i = 1; i < 3; i++) {
            double ratio = error[i] / error[i - 1];
            assertTrue(ratio > 0.35 && ratio < 0.65, "first order in 1/A: " + ratio);
        }
    }

    /**
     * The definition on the flat elliptic wing without mass, its longitudinal axis along its chord: the
     * root beam shear (normal to the wing plane, which is the airplane's normal axis here) is n W / 2 to 1e-6
     * relative for any angle of attack (14 CFR 23.321(a), text before the 2017 rewrite: the load factor is the
     * aerodynamic force normal to the longitudinal axis over the weight).
     */
    @Test
    void flatEllipticWingRootShearIsHalfTheNormalLoadAtAnyAngle() {
        Wing wing = LoadsFixtures.elliptic(12, 1.2, 32);
        WingAnalysis a = WingAnalysis.of(wing);
        LoadsAnalysis la = LoadsAnalysis.of(a, MASSLESS, a.fileDeflections());
        double w = 6000;
        for (double[] nv : new double[][] {{3.8, 50}, {2.5, 35}, {1, 25}, {1, 90}, {-1.5, 40}}) {
            SpanwiseLoads l = la.loads(new LoadCase("c", w, nv[0], nv[1], 0, "given"));
            assertEquals(nv[0] * w / 2, l.rootShear(), 1e-6 * Math.abs(nv[0] * w / 2), "n " + nv[0] + " at " + nv[1]);
        }
    }

    /**
     * With the longitudinal axis tilted theta nose-up from the wing's x axis (the wing then sits at an
     * incidence -theta to the airplane), the normal force n W / 2 and the chordwise force CC q S / 2 resolve on
     * the wing plane: beam shear = (n W / 2) cos theta - (CC q S / 2) sin theta (no mass), to 1e-6 relative.
     */
    @Test
    void aTiltedLongitudinalAxisResolvesTheLoadOnTheWingPlane() {
        Wing wing = LoadsFixtures.elliptic(12, 1.2, 32);
        WingAnalysis a = WingAnalysis.of(wing);
        double theta = Math.toRadians(3);
        WingStructure tilted = new WingStructure(0.25, 0.40, Optional.empty(), Optional.empty(), List.of(),
                java.util.OptionalDouble.of(theta));
        LoadsAnalysis la = LoadsAnalysis.of(a, tilted, a.fileDeflections());
        assertEquals(theta, la.axisAngle(), 0);
        double w = 6000;
        SpanwiseLoads l = la.loads(new LoadCase("c", w, 3.8, 50, 0, "given"));
        double area = wing.reference().area();
        double expected = 3.8 * w / 2 * Math.cos(theta) - l.chordCoefficient() * l.dynamicPressure() * area / 2
                * Math.sin(theta);
        assertEquals(expected, l.rootShear(), 1e-6 * expected);
        assertEquals(3.8 * w / 2, l.normalLoad(), 1e-6 * 3.8 * w / 2);
    }

    /**
     * Schrenk's approximation (O. Schrenk, "A simple approximation method for obtaining the spanwise lift
     * distribution", NACA TM 948, 1940): for an untwisted wing the span load is the mean of the planform-
     * shaped load and the elliptic load of the same lift, so the root bending of a half-wing is
     * (L/2) (4 s/(3 pi) + s (1 + 2 taper)/(3 (1 + taper))) / 2. A rule of thumb, not a solution: the check
     * asks for 5% (common practice for Schrenk's method on straight wings of moderate aspect ratio; measured
     * here: -4.0% rectangular, -1.6% taper 0.5, -1.0% taper 0.3, A 6 to 10).
     */
    @ParameterizedTest(name = "taper {0}")
    @CsvSource({"1.0", "0.5", "0.3"})
    void untwistedTaperedWingRootBendingIsNearSchrenk(double taper) {
        double weight = 8000;
        double s = 5.0;
        SpanwiseLoads l = solve(LoadsFixtures.trapezoid(2 * s, 1.6, taper, 24), weight, 40);
        double arm = 0.5 * (4 * s / (3 * Math.PI) + s * (1 + 2 * taper) / (3 * (1 + taper)));
        double schrenk = weight / 2 * arm;
        assertEquals(schrenk, l.rootBending(), 0.05 * schrenk);
    }
}
