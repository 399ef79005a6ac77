package org.spanlift.solve.linear;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.decomposition.lu.LUDecompositionAlt_DDRM;
import org.ejml.dense.row.linsol.lu.LinearSolverLu_DDRM;
import org.junit.jupiter.api.Test;

/**
 * What every {@link DenseLu} must do, run once per implementation (a subclass names the options): solve
 * random systems to the backward error of partial pivoting, pivot where the first entry is zero, report
 * singular and badly conditioned matrices through the pivot ratio, solve the engine's lattice systems as
 * EJML's LU does to 1e-12 relative, leave the right-hand side alone, and solve from two threads at once.
 */
abstract class DenseLuContractTest {

    private static final double EPS = Math.ulp(1.0);
    /**
     * Normwise backward error allowed, in units of n eps: partial pivoting's bound is a modest multiple of n
     * eps times the growth factor, which stays small on random matrices (Golub and Van Loan, 4th ed., 3.4.6).
     */
    private static final double BACKWARD_ERROR_PER_N_EPS = 10;
    /** Agreement with EJML's LU on the lattice systems (the contract). */
    private static final double LATTICE_AGREEMENT = 1e-12;

    /** The options of the implementation under test. */
    abstract LuOptions options();

    private DenseLu factor(double[] a, int n) {
        DenseLu lu = DenseLu.create(options());
        lu.factor(a.clone(), n);
        return lu;
    }

    @Test
    void solvesRandomSystemsToTheBackwardErrorOfPartialPivoting() {
        Random random = new Random(18);
        for (int n : new int[] {1, 2, 3, 7, 31, 32, 33, 65, 130, 257}) {
            double[] a = new double[n * n];
            for (int i = 0; i < a.length; i++) {
                a[i] = random.nextGaussian();
            }
            double[] b = new double[n];
            for (int i = 0; i < n; i++) {
                b[i] = random.nextGaussian();
            }
            DenseLu lu = factor(a, n);
            assertEquals(n, lu.size());
            assertTrue(lu.pivotRatio() > 0 && lu.pivotRatio() <= 1, "pivot ratio " + lu.pivotRatio());
            double[] x = new double[n];
            lu.solve(b, x);
            double error = backwardError(a, n, x, b);
            assertTrue(error <= BACKWARD_ERROR_PER_N_EPS * n * EPS, "n = " + n + ": backward error " + error);
        }
    }

    @Test
    void pivotsWhereTheLeadingEntryIsZero() {
        double[] a = {0, 2, 1, 1, 1, 1, 2, 0, 5};
        DenseLu lu = factor(a, 3);
        double[] x = new double[3];
        lu.solve(new double[] {2 + 3, 1 + 1 + 3, 2 + 15}, x);
        assertArrayEquals(new double[] {1, 1, 3}, x, 4 * EPS * 5);
    }

    @Test
    void reportsSingularMatricesByAPivotRatioOfZeroOrNearly() {
        assertEquals(0, factor(new double[9], 3).pivotRatio());
        Random random = new Random(7);
        int n = 40;
        double[] a = new double[n * n];
        for (int i = 0; i < a.length; i++) {
            a[i] = random.nextGaussian();
        }
        System.arraycopy(a, 3 * n, a, 17 * n, n); // two equal rows
        assertTrue(factor(a, n).pivotRatio() < 1e-14, "equal rows: " + factor(a, n).pivotRatio());
        for (int i = 0; i < n; i++) {
            a[i * n + 5] = 2 * a[i * n + 9]; // and two proportional columns
        }
        assertTrue(factor(a, n).pivotRatio() < 1e-14);
    }

    @Test
    void reportsAValueThatIsNotFiniteAsAPivotRatioOfNaN() {
        double[] a = {1, 2, 3, Double.NaN};
        assertTrue(Double.isNaN(factor(a, 2).pivotRatio()));
    }

    @Test
    void solvesABadlyConditionedMatrixStablyAndSaysItIsBad() {
        int n = 10; // Hilbert's matrix: condition number about 1.6e13
        double[] a = new double[n * n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                a[i * n + j] = 1.0 / (i + j + 1);
            }
        }
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = 1;
        }
        DenseLu lu = factor(a, n);
        assertTrue(lu.pivotRatio() > 0 && lu.pivotRatio() < 1e-9, "pivot ratio " + lu.pivotRatio());
        double[] x = new double[n];
        lu.solve(b, x);
        double error = backwardError(a, n, x, b);
        assertTrue(error <= BACKWARD_ERROR_PER_N_EPS * n * EPS, "backward error " + error);
    }

    @Test
    void solvesTheLatticeSystemsAsEjmlDoes() {
        for (LatticeMatrices.Case c : LatticeMatrices.all()) {
            double[] x = new double[c.n()];
            factor(c.a(), c.n()).solve(c.b(), x);
            double[] reference = ejml(c.a(), c.n(), c.b());
            double norm = 0;
            double diff = 0;
            for (int i = 0; i < c.n(); i++) {
                norm = Math.max(norm, Math.abs(reference[i]));
                diff = Math.max(diff, Math.abs(x[i] - reference[i]));
            }
            assertTrue(norm > 0 && diff <= LATTICE_AGREEMENT * norm, c.name() + ": " + diff + " over " + norm);
        }
    }

    @Test
    void leavesTheRightHandSideAloneAndAnswersTheSameTwice() {
        LatticeMatrices.Case c = LatticeMatrices.all().get(0);
        DenseLu lu = factor(c.a(), c.n());
        double[] b = c.b().clone();
        double[] x1 = new double[c.n()];
        double[] x2 = new double[c.n()];
        lu.solve(b, x1);
        lu.solve(b, x2);
        assertArrayEquals(c.b(), b, 0);
        assertArrayEquals(x1, x2, 0);
    }

    @Test
    void solvesFromTwoThreadsAtOnce() throws Exception {
        LatticeMatrices.Case c = LatticeMatrices.all().get(0);
        DenseLu lu = factor(c.a(), c.n());
        double[] expected = new double[c.n()];
        lu.solve(c.b(), expected);
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            Future<?>[] futures = new Future<?>[2];
            for (int t = 0; t < 2; t++) {
                futures[t] = pool.submit(() -> {
                    double[] x = new double[c.n()];
                    for (int k = 0; k < 200; k++) {
                        lu.solve(c.b(), x);
                        assertArrayEquals(expected, x, 0);
                    }
                    return null;
                });
            }
            for (Future<?> f : futures) {
                f.get();
            }
        } finally {
            pool.shutdown();
        }
    }

    @Test
    void isFactorizedOnceAndOnlyThenSolves() {
        DenseLu lu = DenseLu.create(options());
        assertThrows(IllegalStateException.class, () -> lu.solve(new double[1], new double[1]));
        lu.factor(new double[] {2}, 1);
        assertThrows(IllegalStateException.class, () -> lu.factor(new double[] {2}, 1));
        assertThrows(IllegalArgumentException.class, () -> DenseLu.create(options()).factor(new double[3], 2));
    }

    /** ||A x - b||_inf / (||A||_inf ||x||_inf + ||b||_inf). */
    static double backwardError(double[] a, int n, double[] x, double[] b) {
        double residual = 0;
        double normA = 0;
        double normX = 0;
        double normB = 0;
        for (int i = 0; i < n; i++) {
            double s = -b[i];
            double row = 0;
            for (int j = 0; j < n; j++) {
                s += a[i * n + j] * x[j];
                row += Math.abs(a[i * n + j]);
            }
            residual = Math.max(residual, Math.abs(s));
            normA = Math.max(normA, row);
            normX = Math.max(normX, Math.abs(x[i]));
            normB = Math.max(normB, Math.abs(b[i]));
        }
        return residual / (normA * normX + normB);
    }

    /** The reference: EJML's LU used directly. */
    static double[] ejml(double[] a, int n, double[] b) {
        LinearSolverLu_DDRM solver = new LinearSolverLu_DDRM(new LUDecompositionAlt_DDRM());
        solver.setA(new DMatrixRMaj(n, n, true, a));
        DMatrixRMaj x = new DMatrixRMaj(n, 1);
        solver.solve(new DMatrixRMaj(n, 1, true, b), x);
        return x.data;
    }
}
