package org.spanlift.solve.linear;

import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;

/**
 * LU with partial pivoting, blocked for the cache and spread over threads, with EJML's arithmetic exactly:
 * its factors, pivots and solutions are bit-identical to {@link EjmlLu}'s, whatever the thread count.
 *
 * <p><b>Why identical.</b> EJML's {@code LUDecompositionAlt_DDRM} (Crout's order, as in JAMA) forms each entry
 * as {@code a_ij - s_ij}, where {@code s_ij} sums the products {@code l_ik u_kj}, k = 0, 1, ..., min(i, j) - 1,
 * in that order, starting from 0; an entry below the diagonal is then divided by the pivot. This class keeps
 * {@code s_ij} as an accumulator in the factor's storage and adds the products in the same order, k
 * ascending, a block of k at a time (right-looking: panel, row block, trailing update), and subtracts it from
 * the original entry when the entry is due. Java never fuses a multiply and an add, and the order of the
 * additions of every entry is fixed by k alone, so the tiling, the loop order within a tile and the split of
 * rows between threads change nothing in the result. Rows are swapped whole, in the original as in the
 * accumulators, at the same steps as EJML swaps them; ties in the pivot search go to the first row.
 *
 * <p><b>How.</b> Panels of {@link #PANEL} columns are factorized column by column (right-looking inside the
 * panel); the panel's rows of U right of it follow by a forward substitution; the trailing accumulators take
 * the panel's products in one pass, {@link #TILE} columns at a time from a copy of the panel's U rows, four k
 * at a time for two rows at a time (a loop the JIT vectorizes: every array in it is indexed alike). The trailing
 * update's rows are split between the calling thread and the common fork-join pool when the options allow more than one
 * thread and the block is large enough to pay for it.
 *
 * <p>Memory: the factor (n^2 doubles) besides the matrix given, which serves as the original entries and
 * is overwritten (rows swapped), and work space of three panels of {@link #PANEL} x n doubles. Golub and Van Loan,
 * Matrix Computations, 4th ed., sections 3.2 and 3.4 (block LU, partial pivoting).
 */
public final class TiledLu implements DenseLu {

    /** Columns per panel. */
    static final int PANEL = 32;
    /** Columns of the trailing matrix per packed tile of U. */
    static final int TILE = 128;
    /** Rows of a trailing update below which it stays on one thread. */
    static final int PARALLEL_ROWS = 128;

    private final int threads;
    private int n;
    private double[] lu;
    private int[] indx;
    private double ratio = Double.NaN;

    TiledLu(int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException("at least one thread, got " + threads);
        }
        this.threads = threads;
    }

    @Override
    public void factor(double[] a, int size) {
        if (lu != null) {
            throw new IllegalStateException("this solver is factorized already");
        }
        if (a.length != size * size) {
            throw new IllegalArgumentException("the matrix holds " + a.length + " values, not " + size + " x " + size);
        }
        double[] f = new double[size * size];
        int[] piv = new int[size];
        decompose(a, f, piv, size, threads);
        n = size;
        lu = f;
        indx = piv;
        ratio = DenseLu.pivotRatio(f, size);
    }

    /** The row-major factors (L below the diagonal, unit diagonal implied; U on and above it), for tests. */
    double[] factors() {
        return lu;
    }

    /** The pivot of each step: at step j rows j and {@code pivots()[j]} were swapped (for tests). */
    int[] pivots() {
        return indx;
    }

    @Override
    public int size() {
        return n;
    }

    @Override
    public double pivotRatio() {
        return ratio;
    }

    /**
     * Solves A x = b in EJML's order (forward substitution from the first nonzero entry, then backward), so
     * the solution is EJML's bit for bit.
     */
    @Override
    public void solve(double[] b, double[] x) {
        if (lu == null) {
            throw new IllegalStateException("factor the matrix first");
        }
        if (b == x) {
            throw new IllegalArgumentException("b and x must be different arrays");
        }
        double[] f = lu;
        int size = n;
        System.arraycopy(b, 0, x, 0, size);
        int ii = 0;
        for (int i = 0; i < size; i++) {
            int ip = indx[i];
            double sum = x[ip];
            x[ip] = x[i];
            if (ii != 0) {
                int index = i * size + ii - 1;
                for (int j = ii - 1; j < i; j++) {
                    sum -= f[index++] * x[j];
                }
            } else if (sum != 0.0) {
                ii = i + 1;
            }
            x[i] = sum;
        }
        for (int i = size - 1; i >= 0; i--) {
            double sum = x[i];
            int index = i * size + i + 1;
            for (int j = i + 1; j < size; j++) {
                sum -= f[index++] * x[j];
            }
            x[i] = sum / f[i * size + i];
        }
    }

    /**
     * Factorizes: {@code a} holds the original entries (rows swapped as the factorization goes), {@code f}
     * (zeros on entry) the accumulators and then the factors, {@code piv} the pivot of each step.
     */
    static void decompose(double[] a, double[] f, int[] piv, int n, int threads) {
        Work work = new Work(n);
        for (int start = 0; start < n; start += PANEL) {
            int k0 = start;
            int k1 = Math.min(k0 + PANEL, n);
            panel(a, f, piv, n, k0, k1, work);
            if (k1 == n) {
                break;
            }
            rowBlock(a, f, n, k0, k1, work);
            int rows = n - k1;
            if (threads > 1 && rows >= PARALLEL_ROWS) {
                int parts = Math.min(threads, rows / (PARALLEL_ROWS / 2));
                ForkJoinTask<?>[] tasks = new ForkJoinTask<?>[parts - 1];
                for (int t = 1; t < parts; t++) {
                    int from = k1 + (int) ((long) rows * t / parts);
                    int to = k1 + (int) ((long) rows * (t + 1) / parts);
                    tasks[t - 1] = ForkJoinPool.commonPool().submit(
                            () -> trailing(f, n, k0, k1, from, to, new Work()));
                }
                trailing(f, n, k0, k1, k1, k1 + rows / parts, work);
                for (ForkJoinTask<?> task : tasks) {
                    task.join();
                }
            } else {
                trailing(f, n, k0, k1, k1, n, work);
            }
        }
    }

    /**
     * Columns k0..k1-1, every row from k0 down: pivot search, row swaps, multipliers, the panel's own update.
     * The panel is worked on as column copies ({@code work.colA} the original entries, {@code work.colF} the
     * accumulators and factors), so that its loops run down a column with every array indexed alike.
     */
    private static void panel(double[] a, double[] f, int[] piv, int n, int k0, int k1, Work work) {
        int nb = k1 - k0;
        int m = n - k0;
        double[][] colA = work.colA;
        double[][] colF = work.colF;
        for (int r = 0; r < m; r++) {
            int base = (k0 + r) * n + k0;
            for (int c = 0; c < nb; c++) {
                colA[c][r] = a[base + c];
                colF[c][r] = f[base + c];
            }
        }
        for (int c = 0; c < nb; c++) {
            double[] ac = colA[c];
            double[] fc = colF[c];
            for (int r = c; r < m; r++) {
                fc[r] = ac[r] - fc[r];
            }
            int p = c;
            double max = Math.abs(fc[c]);
            for (int r = c + 1; r < m; r++) {
                double v = Math.abs(fc[r]);
                if (v > max) {
                    p = r;
                    max = v;
                }
            }
            if (p != c) {
                swapRows(a, n, k0 + p, k0 + c);
                swapRows(f, n, k0 + p, k0 + c);
                for (int d = 0; d < nb; d++) {
                    swap(colA[d], p, c);
                    swap(colF[d], p, c);
                }
            }
            piv[k0 + c] = k0 + p;
            double pivot = fc[c];
            if (pivot != 0) {
                for (int r = c + 1; r < m; r++) {
                    fc[r] /= pivot;
                }
            }
            // Row c of U within the panel is due now; the rows below take its products.
            for (int d = c + 1; d < nb; d++) {
                double[] fd = colF[d];
                double u = colA[d][c] - fd[c];
                fd[c] = u;
                for (int r = c + 1; r < m; r++) {
                    fd[r] = fd[r] + fc[r] * u;
                }
            }
        }
        for (int r = 0; r < m; r++) {
            int base = (k0 + r) * n + k0;
            for (int c = 0; c < nb; c++) {
                f[base + c] = colF[c][r];
            }
        }
    }

    /**
     * Rows k0..k1-1 of U right of the panel: the products with the panel's L (k ascending), then the
     * subtraction from the original entries; worked on as row copies in {@code work.rows}.
     */
    private static void rowBlock(double[] a, double[] f, int n, int k0, int k1, Work work) {
        int w = n - k1;
        double[][] rows = work.rows;
        double[] orig = work.orig;
        for (int i = k0; i < k1; i++) {
            int ri = i * n;
            double[] t = rows[i - k0];
            System.arraycopy(f, ri + k1, t, 0, w);
            int k = k0;
            for (; k + 3 < i; k += 4) {
                double l0 = f[ri + k];
                double l1 = f[ri + k + 1];
                double l2 = f[ri + k + 2];
                double l3 = f[ri + k + 3];
                double[] u0 = rows[k - k0];
                double[] u1 = rows[k + 1 - k0];
                double[] u2 = rows[k + 2 - k0];
                double[] u3 = rows[k + 3 - k0];
                for (int j = 0; j < w; j++) {
                    t[j] = t[j] + l0 * u0[j] + l1 * u1[j] + l2 * u2[j] + l3 * u3[j];
                }
            }
            for (; k < i; k++) {
                double l = f[ri + k];
                double[] u = rows[k - k0];
                for (int j = 0; j < w; j++) {
                    t[j] = t[j] + l * u[j];
                }
            }
            System.arraycopy(a, ri + k1, orig, 0, w);
            for (int j = 0; j < w; j++) {
                t[j] = orig[j] - t[j];
            }
            System.arraycopy(t, 0, f, ri + k1, w);
        }
    }

    /**
     * Rows r0..r1-1 of the trailing accumulators take the panel's products, k = k0..k1-1 in order, for every
     * column from k1. {@code work} is this thread's work space.
     */
    static void trailing(double[] f, int n, int k0, int k1, int r0, int r1, Work work) {
        int nk = k1 - k0;
        double[][] u = work.u;
        double[] t0 = work.t0;
        double[] t1 = work.t1;
        for (int j0 = k1; j0 < n; j0 += TILE) {
            int w = Math.min(TILE, n - j0);
            for (int k = 0; k < nk; k++) {
                System.arraycopy(f, (k0 + k) * n + j0, u[k], 0, w);
            }
            int i = r0;
            for (; i + 1 < r1; i += 2) {
                int l0 = i * n + k0;
                int l1 = l0 + n;
                int c0 = i * n + j0;
                int c1 = c0 + n;
                System.arraycopy(f, c0, t0, 0, w);
                System.arraycopy(f, c1, t1, 0, w);
                int k = 0;
                for (; k + 3 < nk; k += 4) {
                    fourProducts(t0, t1, f[l0 + k], f[l0 + k + 1], f[l0 + k + 2], f[l0 + k + 3], f[l1 + k],
                            f[l1 + k + 1], f[l1 + k + 2], f[l1 + k + 3], u[k], u[k + 1], u[k + 2], u[k + 3], w);
                }
                for (; k < nk; k++) {
                    oneProduct(t0, t1, f[l0 + k], f[l1 + k], u[k], w);
                }
                System.arraycopy(t0, 0, f, c0, w);
                System.arraycopy(t1, 0, f, c1, w);
            }
            if (i < r1) {
                int l0 = i * n + k0;
                int c0 = i * n + j0;
                System.arraycopy(f, c0, t0, 0, w);
                for (int k = 0; k < nk; k++) {
                    double a = f[l0 + k];
                    double[] v = u[k];
                    for (int j = 0; j < w; j++) {
                        t0[j] = t0[j] + a * v[j];
                    }
                }
                System.arraycopy(t0, 0, f, c0, w);
            }
        }
    }

    /**
     * Two accumulator rows take four products each, added left to right (k ascending). Every array is indexed
     * by j alone, which is what lets the JIT vectorize the loop (it cannot rule out overlap between offsets
     * into one array).
     */
    private static void fourProducts(double[] t0, double[] t1, double a0, double a1, double a2, double a3,
            double b0, double b1, double b2, double b3, double[] u0, double[] u1, double[] u2, double[] u3, int w) {
        for (int j = 0; j < w; j++) {
            double v0 = u0[j];
            double v1 = u1[j];
            double v2 = u2[j];
            double v3 = u3[j];
            t0[j] = t0[j] + a0 * v0 + a1 * v1 + a2 * v2 + a3 * v3;
            t1[j] = t1[j] + b0 * v0 + b1 * v1 + b2 * v2 + b3 * v3;
        }
    }

    private static void oneProduct(double[] t0, double[] t1, double a0, double b0, double[] u0, int w) {
        for (int j = 0; j < w; j++) {
            double v0 = u0[j];
            t0[j] = t0[j] + a0 * v0;
            t1[j] = t1[j] + b0 * v0;
        }
    }

    /**
     * One thread's work space: for {@link #trailing} the U rows of a tile and two accumulator rows; for the
     * calling thread also the panel's column copies and the row block's rows (n long).
     */
    static final class Work {
        final double[][] u = new double[PANEL][TILE];
        final double[] t0 = new double[TILE];
        final double[] t1 = new double[TILE];
        final double[][] colA;
        final double[][] colF;
        final double[][] rows;
        final double[] orig;

        Work(int n) {
            colA = new double[PANEL][n];
            colF = new double[PANEL][n];
            rows = new double[PANEL][n];
            orig = new double[n];
        }

        /** Work space for the trailing update alone. */
        Work() {
            colA = null;
            colF = null;
            rows = null;
            orig = null;
        }
    }

    private static void swap(double[] v, int i, int j) {
        double t = v[i];
        v[i] = v[j];
        v[j] = t;
    }

    private static void swapRows(double[] m, int n, int r, int s) {
        int a = r * n;
        int b = s * n;
        for (int j = 0; j < n; j++) {
            double t = m[a + j];
            m[a + j] = m[b + j];
            m[b + j] = t;
        }
    }
}
