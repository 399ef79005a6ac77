package org.spanlift.benchmarks;

/**
 * A measuring stick, not engine code: LU factorization with partial pivoting, blocked for the cache
 * (right-looking, panels of {@link #PANEL} columns, trailing update in column tiles of {@link #TILE}), on a
 * row-major n x n array. It does the same 2/3 n^3 flops as the engine's factorization and shows, in the
 * same run, what a cache-aware loop order reaches on this machine in plain Java (one thread).
 */
final class BlockedLu {

    static final int PANEL = 48;
    static final int TILE = 256;

    private final int n;
    private final double[] lu;
    private final int[] pivot;

    private BlockedLu(int n, double[] lu, int[] pivot) {
        this.n = n;
        this.lu = lu;
        this.pivot = pivot;
    }

    /** Factorizes a copy of the row-major n x n matrix {@code a}. */
    static BlockedLu factor(double[] a, int n) {
        double[] m = a.clone();
        int[] piv = new int[n];
        for (int k0 = 0; k0 < n; k0 += PANEL) {
            int k1 = Math.min(k0 + PANEL, n);
            // 1. Panel: columns k0..k1-1, rows k0..n-1, unblocked; whole rows are swapped.
            for (int k = k0; k < k1; k++) {
                int p = k;
                double best = Math.abs(m[k * n + k]);
                for (int i = k + 1; i < n; i++) {
                    double v = Math.abs(m[i * n + k]);
                    if (v > best) {
                        best = v;
                        p = i;
                    }
                }
                piv[k] = p;
                if (p != k) {
                    swapRows(m, n, k, p);
                }
                double d = m[k * n + k];
                if (d == 0) {
                    throw new ArithmeticException("singular matrix");
                }
                double inv = 1 / d;
                int rk = k * n;
                for (int i = k + 1; i < n; i++) {
                    int ri = i * n;
                    double l = m[ri + k] * inv;
                    m[ri + k] = l;
                    for (int j = k + 1; j < k1; j++) {
                        m[ri + j] -= l * m[rk + j];
                    }
                }
            }
            if (k1 == n) {
                break;
            }
            // 2. U12 = L11^-1 A12 (unit lower triangular solve on the panel's rows).
            for (int k = k0; k < k1; k++) {
                int rk = k * n;
                for (int i = k + 1; i < k1; i++) {
                    int ri = i * n;
                    double l = m[ri + k];
                    for (int j = k1; j < n; j++) {
                        m[ri + j] -= l * m[rk + j];
                    }
                }
            }
            // 3. A22 -= L21 U12, tile by tile so that the U12 tile stays in cache.
            for (int j0 = k1; j0 < n; j0 += TILE) {
                int j1 = Math.min(j0 + TILE, n);
                for (int i = k1; i < n; i++) {
                    int ri = i * n;
                    for (int k = k0; k < k1; k++) {
                        double l = m[ri + k];
                        if (l == 0) {
                            continue;
                        }
                        int rk = k * n;
                        for (int j = j0; j < j1; j++) {
                            m[ri + j] -= l * m[rk + j];
                        }
                    }
                }
            }
        }
        return new BlockedLu(n, m, piv);
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

    /** Solves A x = b with the factors; returns x. */
    double[] solve(double[] b) {
        double[] x = b.clone();
        for (int k = 0; k < n; k++) {
            int p = pivot[k];
            if (p != k) {
                double t = x[k];
                x[k] = x[p];
                x[p] = t;
            }
        }
        for (int i = 0; i < n; i++) {
            double s = x[i];
            for (int j = 0; j < i; j++) {
                s -= lu[i * n + j] * x[j];
            }
            x[i] = s;
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = x[i];
            for (int j = i + 1; j < n; j++) {
                s -= lu[i * n + j] * x[j];
            }
            x[i] = s / lu[i * n + i];
        }
        return x;
    }
}
