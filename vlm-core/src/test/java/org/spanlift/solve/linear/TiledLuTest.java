package org.spanlift.solve.linear;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.decomposition.lu.LUDecompositionAlt_DDRM;
import org.ejml.dense.row.linsol.lu.LinearSolverLu_DDRM;
import org.junit.jupiter.api.Test;

/**
 * The tiled LU gives EJML's factors, pivots and solutions bit for bit, whatever the thread count and however
 * the size falls against the panel and tile widths: on random matrices, on matrices of small integers (ties
 * in the pivot search, exact zeros), on a singular one, and on the engine's lattice systems.
 */
class TiledLuTest {

    private static final int[] THREADS = {1, 2, 3, 4};

    @Test
    void matchesEjmlBitForBitOnRandomMatrices() {
        Random random = new Random(1018);
        int[] sizes = {1, 2, 5, 31, 32, 33, 64, 127, 128, 129, 130, 200, 257, 300};
        // The largest sizes split the trailing update between threads for several panels.
        assertTrue(sizes[sizes.length - 1] >= TiledLu.PARALLEL_ROWS + 4 * TiledLu.PANEL);
        for (int n : sizes) {
            double[] a = new double[n * n];
            for (int i = 0; i < a.length; i++) {
                a[i] = random.nextDouble() - 0.5;
            }
            check("random " + n, a, n, random);
        }
    }

    @Test
    void matchesEjmlBitForBitWithTiesAndZeros() {
        Random random = new Random(5);
        for (int n : new int[] {3, 40, 150}) {
            double[] a = new double[n * n];
            for (int i = 0; i < a.length; i++) {
                a[i] = random.nextInt(5) - 2; // many equal candidates for a pivot, many exact zeros
            }
            check("integers " + n, a, n, random);
        }
        int n = 70;
        double[] singular = new double[n * n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                singular[i * n + j] = j == 13 ? 0 : random.nextGaussian(); // a zero column: a zero pivot
            }
        }
        check("zero column", singular, n, random);
    }

    @Test
    void matchesEjmlBitForBitOnTheLatticeSystems() {
        for (LatticeMatrices.Case c : LatticeMatrices.all()) {
            check(c.name(), c.a(), c.n(), new Random(c.n()));
        }
    }

    private static void check(String name, double[] a, int n, Random random) {
        LinearSolverLu_DDRM ejml = new LinearSolverLu_DDRM(new LUDecompositionAlt_DDRM());
        ejml.setA(new DMatrixRMaj(n, n, true, a));
        double[] factors = ejml.getDecomposition().getLU().data;
        int[] pivots = ejml.getDecomposition().getIndx();
        List<double[]> rhs = new ArrayList<>();
        double[] leadingZeros = new double[n];
        for (int i = n / 2; i < n; i++) {
            leadingZeros[i] = random.nextGaussian(); // the forward substitution skips leading zeros
        }
        rhs.add(leadingZeros);
        double[] dense = new double[n];
        for (int i = 0; i < n; i++) {
            dense[i] = random.nextGaussian();
        }
        rhs.add(dense);
        for (int threads : THREADS) {
            TiledLu tiled = new TiledLu(threads);
            tiled.factor(a.clone(), n);
            String what = name + ", " + threads + " threads";
            assertTrue(Arrays.equals(factors, tiled.factors()), what + ": factors differ");
            assertArrayEquals(Arrays.copyOf(pivots, n), tiled.pivots(), what + ": pivots differ");
            for (double[] b : rhs) {
                DMatrixRMaj x = new DMatrixRMaj(n, 1);
                ejml.solve(new DMatrixRMaj(n, 1, true, b), x);
                double[] y = new double[n];
                tiled.solve(b, y);
                assertTrue(Arrays.equals(x.data, y), what + ": solutions differ");
            }
        }
    }
}
