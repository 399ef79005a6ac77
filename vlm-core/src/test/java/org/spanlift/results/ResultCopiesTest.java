package org.spanlift.results;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.Wing;
import org.spanlift.section.CamberLines;
import org.spanlift.solve.WingAnalysis;

/** Result values hand out copies: a caller writing into an array it was given changes nothing. */
class ResultCopiesTest {

    private static final Solution SOLUTION;

    static {
        Surface s = new Trapezoid(8, 1.2, 0.5, 0, 0, 0, 0, "flat", 0, 0).surface("wing", List.of(),
                new LatticeSpec(8, 2, Spacing.COSINE, Spacing.COSINE));
        Wing wing = new Wing("copies", LengthUnit.M, Wing.defaultReference(s), List.of(s),
                Map.of("flat", Section.of("flat", CamberLines.parse("flat"))));
        SOLUTION = WingAnalysis.of(wing).solve(Math.toRadians(4));
    }

    private static void scribble(double[] a) {
        java.util.Arrays.fill(a, -123.0);
    }

    @Test
    void writingIntoTheArraysOfASpanLoadLeavesItUnchanged() {
        SpanLoad load = SOLUTION.spanLoad(0);
        double[] cl = load.cl();
        double[] y = load.y();
        for (double[] a : List.of(load.y(), load.chord(), load.cl(), load.clc(), load.circulation(),
                load.inducedAngle(), load.yLeft(), load.yRight())) {
            scribble(a);
        }
        assertArrayEquals(cl, load.cl(), 0.0);
        assertArrayEquals(y, load.y(), 0.0);
        assertArrayEquals(SOLUTION.spanLoad(0).clc(), load.clc(), 0.0);
        assertArrayEquals(SOLUTION.spanLoad(0).yRight(), load.yRight(), 0.0);
    }

    @Test
    void aSpanLoadKeepsItsOwnCopyOfTheArraysItWasBuiltFrom() {
        double[] y = {-0.5, 0.5};
        double[] one = {1, 1};
        SpanLoad load = new SpanLoad(y, one, one, one, one, one, new double[] {-1, 0}, new double[] {0, 1});
        y[0] = 7;
        one[1] = 7;
        assertArrayEquals(new double[] {-0.5, 0.5}, load.y(), 0.0);
        assertArrayEquals(new double[] {1, 1}, load.cl(), 0.0);
        assertArrayEquals(new double[] {1, 1}, load.circulation(), 0.0);
        assertEquals(2, load.size());
    }

    @Test
    void writingIntoTheArraysOfPanelForcesLeavesThemUnchanged() {
        PanelForces f = SOLUTION.panelForces();
        double[] fz = f.fz();
        double lift = SOLUTION.coefficients().lift();
        for (double[] a : List.of(f.fx(), f.fy(), f.fz(), f.x(), f.y(), f.z())) {
            scribble(a);
        }
        assertArrayEquals(fz, f.fz(), 0.0);
        assertArrayEquals(SOLUTION.panelForces().x(), f.x(), 0.0);
        for (int i = 0; i < fz.length; i++) {
            assertEquals(fz[i], f.fz(i), 0.0);
        }
        assertEquals(lift, SOLUTION.coefficients().lift(), 0.0);
    }

    @Test
    void panelForcesKeepTheirOwnCopyOfTheArraysTheyWereBuiltFrom() {
        double[] fz = {2, 3};
        double[] zero = {0, 0};
        PanelForces f = new PanelForces(zero, zero, fz, zero, zero, zero);
        fz[0] = -1;
        zero[1] = 9;
        assertEquals(2, f.fz(0), 0.0);
        assertArrayEquals(new double[] {0, 0}, f.x(), 0.0);
    }
}
