package org.spanlift.validation.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.Wing;
import org.spanlift.results.SpanLoad;
import org.spanlift.section.CamberLines;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.washout.LeastDragTwist;

/**
 * Munk's minimum-induced-drag theorem (M. M. Munk, "The minimum induced drag of aerofoils", NACA Report 121,
 * 1921): of all span loads of a planar wing at a given lift, the elliptic one has the least induced drag, e =
 * 1. The least-drag twist the engine finds for an untwisted planform must give that load: c cl proportional
 * to sqrt(1 - eta^2) (held to 1% of its peak inboard of 90% of the semi-span, where the strips resolve it),
 * and e = 1: the optimum of the lattice's own Trefftz-plane sum is its discrete elliptic load (measured e =
 * 1.00000 for tapers 1, 0.5 and 0.3, with root-to-tip washouts of 3.04, 1.41 and 0.47 degrees at CL 0.5 on
 * this aspect ratio of 5 to 6.7; held to 1e-4).
 */
class LeastDragTwistTest {

    private static Wing wing(double taper) {
        Trapezoid t = new Trapezoid(10, 2.0, taper, 0, 0, 0, 0, "s", 0, 0);
        Surface s = new Surface("wing", true, t.planform(), List.of(), LatticeSpec.DEFAULT);
        return new Wing("munk", LengthUnit.M, Wing.defaultReference(s), List.of(s),
                Map.of("s", Section.of("s", CamberLines.parse("flat"))));
    }

    @ParameterizedTest(name = "taper {0}")
    @ValueSource(doubles = {1.0, 0.5, 0.3})
    void theLeastDragTwistGivesTheEllipticLoad(double taper) {
        WingAnalysis a = WingAnalysis.of(wing(taper));
        LeastDragTwist t = LeastDragTwist.of(a, new double[0], 0.5);
        assertEquals(0.5, t.solution().coefficients().lift(), 1e-9, "the CL is kept");
        double e = t.solution().coefficients().spanEfficiency().orElseThrow();
        assertEquals(1.0, e, 1e-4, "e at the least-drag twist");
        double untwisted = a.solve(t.alpha()).coefficients().spanEfficiency().orElseThrow();
        assertTrue(e >= untwisted, "no worse than the untwisted wing: " + e + " against " + untwisted);
        SpanLoad load = t.solution().spanLoad(0);
        double semi = 5;
        double[] y = load.y();
        double[] clc = load.clc();
        int root = 0;
        for (int i = 0; i < y.length; i++) {
            if (Math.abs(y[i]) < Math.abs(y[root])) {
                root = i;
            }
        }
        double peak = clc[root] / Math.sqrt(1 - Math.pow(y[root] / semi, 2));
        for (int i = 0; i < y.length; i++) {
            double eta = Math.abs(y[i]) / semi;
            if (eta <= 0.9) {
                assertEquals(peak * Math.sqrt(1 - eta * eta), clc[i], 0.01 * peak, "c cl at eta " + eta);
            }
        }
    }
}
