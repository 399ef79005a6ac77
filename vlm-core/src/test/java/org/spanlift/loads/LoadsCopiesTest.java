package org.spanlift.loads;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.spanlift.structure.LoadCase;
import org.spanlift.structure.MassTable;

/** Load values hand out copies: a caller writing into an array it was given changes nothing. */
class LoadsCopiesTest {

    private static final LoadCase CASE = new LoadCase("c", 6000, 3, 50, 0, "given");

    private static SpanwiseLoads loads(double scale) {
        double[] y = {0, 1, 2};
        double[] v = {3 * scale, 2 * scale, 0};
        return new SpanwiseLoads(CASE, 0.1, 1.2, 0.02, 1.19, 0.1, 0, 1500, y, v, v, v, v, v, 9000, 1,
                SpanwiseLoads.Side.BOTH);
    }

    @Test
    void writingIntoTheArraysOfSpanwiseLoadsLeavesThemUnchanged() {
        SpanwiseLoads l = loads(1);
        for (double[] a : List.of(l.y(), l.shear(), l.bending(), l.torsion(), l.chordShear(), l.chordBending())) {
            Arrays.fill(a, -1);
        }
        assertArrayEquals(new double[] {0, 1, 2}, l.y(), 0.0);
        assertArrayEquals(new double[] {3, 2, 0}, l.shear(), 0.0);
        assertArrayEquals(new double[] {3, 2, 0}, l.chordBending(), 0.0);
        assertEquals(3, l.rootShear(), 0.0);
    }

    @Test
    void spanwiseLoadsKeepTheirOwnCopyOfTheArraysTheyWereBuiltFrom() {
        double[] y = {0, 1};
        double[] v = {5, 1};
        SpanwiseLoads l = new SpanwiseLoads(CASE, 0.1, 1.2, 0.02, 1.19, 0.1, 0, 1500, y, v, v, v, v, v, 9000, 1,
                SpanwiseLoads.Side.BOTH);
        y[1] = 4;
        v[0] = 0;
        assertArrayEquals(new double[] {0, 1}, l.y(), 0.0);
        assertEquals(5, l.rootBending(), 0.0);
    }

    @Test
    void writingIntoTheArraysOfTheGoverningCasesLeavesThemUnchanged() {
        Governing g = Governing.of(List.of(loads(1), loads(-2)));
        for (double[] a : List.of(g.y(), g.shear().max(), g.shear().min(), g.bending().max(), g.torsion().min())) {
            Arrays.fill(a, 99);
        }
        Arrays.fill(g.shear().maxCase(), 5);
        Arrays.fill(g.shear().minCase(), 5);
        assertArrayEquals(new double[] {0, 1, 2}, g.y(), 0.0);
        assertArrayEquals(new double[] {3, 2, 0}, g.shear().max(), 0.0);
        assertArrayEquals(new double[] {-6, -4, 0}, g.shear().min(), 0.0);
        assertArrayEquals(new int[] {0, 0, 0}, g.shear().maxCase());
        assertArrayEquals(new int[] {1, 1, 0}, g.shear().minCase());
    }

    @Test
    void writingIntoTheArraysOfAMassTableLeavesItUnchanged() {
        double[] y = {0, 2};
        double[] perSpan = {10, 4};
        MassTable t = new MassTable(y, perSpan);
        perSpan[0] = 0;
        Arrays.fill(t.perSpan(), 0);
        Arrays.fill(t.y(), 1);
        assertArrayEquals(new double[] {10, 4}, t.perSpan(), 0.0);
        assertArrayEquals(new double[] {0, 2}, t.y(), 0.0);
        assertEquals(7, t.at(1), 0.0);
    }
}
