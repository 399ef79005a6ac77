package org.spanlift.solve;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.spanlift.io.WingFileReader;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;

/**
 * The influence matrix laid out for the loop is, bit for bit, the one the horseshoe kernel gives entry by
 * entry (each trailing leg once per control point, as the engine always summed it), and it does not depend
 * on how many threads built its rows. Lattices: the demo trainer (a mirrored wing with controls), the trainer
 * with its tail (two surfaces; the tail in the wing's wake, where the Rankine cores act), the sailplane.
 */
class InfluenceRowsTest {

    private static List<Lattice> lattices() {
        return List.of(lattice("trainer"), lattice("trainer-tail"), lattice("sailplane"));
    }

    private static Lattice lattice(String name) {
        return LatticeBuilder.build(WingFileReader.read(Path.of("../geometries/" + name + ".wing.yaml")));
    }

    @Test
    void matchesTheKernelEntryByEntryBitForBit() {
        for (Lattice lattice : lattices()) {
            int n = lattice.panelCount();
            double[] expected = new double[n * n];
            for (int i = 0; i < n; i++) {
                kernelRow(lattice, i, expected, i * n);
            }
            double[] built = InfluenceSystem.assemble(lattice, Symmetry.FULL, 1);
            assertTrue(Arrays.equals(expected, built), "full matrix of " + n + " panels differs from the kernel's");
        }
    }

    @Test
    void isTheSameWhateverTheThreadCount() {
        for (Lattice lattice : lattices()) {
            for (Symmetry s : Symmetry.values()) {
                if (s != Symmetry.FULL && !lattice.mirrored()) {
                    continue;
                }
                double[] one = InfluenceSystem.assemble(lattice, s, 1);
                for (int threads : new int[] {2, 3}) {
                    assertTrue(Arrays.equals(one, InfluenceSystem.assemble(lattice, s, threads)),
                            s + " with " + threads + " threads");
                }
            }
        }
    }

    @Test
    void theLatticesAreLargeEnoughToSplitTheRows() {
        assertTrue(lattices().stream().anyMatch(l -> l.panelCount() >= 2 * InfluenceRows.PARALLEL_ROWS),
                "one lattice must reach the split for the thread-count check to mean anything");
    }

    /** Row i the plain way: every trailing point's leg, then every bound leg, through the kernel. */
    private static void kernelRow(Lattice lattice, int i, double[] out, int offset) {
        double px = lattice.cx(i);
        double py = lattice.cy(i);
        double pz = lattice.cz(i);
        double[] trailing = new double[lattice.trailingPointCount()];
        for (int k = 0; k < trailing.length; k++) {
            double[] v = new double[3];
            HorseshoeKernel.trailing(lattice.trailingX(k), lattice.trailingY(k), lattice.trailingZ(k), px, py, pz,
                    lattice.trailingCutoff(k), lattice.trailingCoreSquared(k), 1, v);
            trailing[k] = v[1] * lattice.ny(i) + v[2] * lattice.nz(i);
        }
        for (int j = 0; j < lattice.panelCount(); j++) {
            double[] v = new double[3];
            HorseshoeKernel.segment(lattice.ax(j), lattice.ay(j), lattice.az(j), lattice.bx(j), lattice.by(j),
                    lattice.bz(j), px, py, pz, lattice.cutoff(j), v);
            out[offset + j] = v[0] * lattice.nx(i) + v[1] * lattice.ny(i) + v[2] * lattice.nz(i)
                    + trailing[lattice.trailingPointB(j)] - trailing[lattice.trailingPointA(j)];
        }
    }
}
