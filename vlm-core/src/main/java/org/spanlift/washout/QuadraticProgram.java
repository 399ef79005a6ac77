package org.spanlift.washout;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A small dense strictly convex quadratic program: minimise {@code 1/2 x'Gx + a'x} subject to
 * {@code C x >= b} (one row of C per constraint), G symmetric positive definite. Solved by the dual
 * active-set method of Goldfarb and Idnani ("A numerically stable dual method for solving strictly convex
 * quadratic programs", Math. Programming 27, 1983): start from the unconstrained minimum, which is
 * dual feasible, and add violated constraints one at a time, each by a step in the primal and the dual
 * variables along which the dual objective rises, dropping an active constraint whose multiplier would turn
 * negative; a constraint that cannot be made to hold by any step shows the program infeasible. The active
 * constraints stay linearly independent (a constraint dependent on them is taken in by dual steps alone), so
 * the small systems below stay regular.
 *
 * <p>The paper updates a factorization of the active set; with a handful of variables this class forms the
 * operators again at every step from Cholesky factors of G and of the active constraints' Gram matrix in the
 * metric of G's inverse, which is simpler and as exact at these sizes. Stateless.
 */
public final class QuadraticProgram {

    /** A violation smaller than this fraction of the constraint's scale counts as met. */
    static final double FEASIBILITY = 1e-12;

    private QuadraticProgram() {
    }

    /**
     * The answer.
     *
     * @param feasible    false when no x meets every constraint (x, value and the multipliers are then those
     *                    of the last step, not an answer)
     * @param x           the minimiser
     * @param value       the objective there
     * @param active      the indices of the active constraints
     * @param multipliers their multipliers, at least zero, in {@code active}'s order
     */
    public record Solution(boolean feasible, double[] x, double value, int[] active, double[] multipliers) {
        /** Copies the arrays. */
        public Solution {
            x = x.clone();
            active = active.clone();
            multipliers = multipliers.clone();
        }

        /** A copy of the minimiser. */
        @Override
        public double[] x() {
            return x.clone();
        }

        /** A copy of the indices of the active constraints. */
        @Override
        public int[] active() {
            return active.clone();
        }

        /** A copy of the active constraints' multipliers, in {@code active}'s order. */
        @Override
        public double[] multipliers() {
            return multipliers.clone();
        }
    }

    /**
     * Solves the program.
     *
     * @param g the Hessian, n x n, symmetric positive definite
     * @param a the linear term, n
     * @param c the constraints' rows, m x n
     * @param b the constraints' right-hand sides, m
     * @throws IllegalArgumentException when G is not positive definite or the sizes disagree
     */
    public static Solution solve(double[][] g, double[] a, double[][] c, double[] b) {
        int n = a.length;
        int m = b.length;
        if (g.length != n || c.length != m) {
            throw new IllegalArgumentException("sizes disagree");
        }
        for (double[] row : c) {
            if (row.length != n) {
                throw new IllegalArgumentException("a constraint row has the wrong length");
            }
        }
        double[][] lg = cholesky(g);
        if (lg == null) {
            throw new IllegalArgumentException("the Hessian is not positive definite");
        }
        double[] x = solveCholesky(lg, a);
        for (int i = 0; i < n; i++) {
            x[i] = -x[i];
        }
        double[][] ginvRows = new double[m][];
        double[] norm = new double[m];
        for (int i = 0; i < m; i++) {
            ginvRows[i] = solveCholesky(lg, c[i]);
            norm[i] = Math.sqrt(dot(c[i], c[i]));
        }
        List<Integer> active = new ArrayList<>();
        List<Double> u = new ArrayList<>();
        boolean[] isActive = new boolean[m];
        int limit = 50 * (m + n) + 100;
        for (int iteration = 0; iteration < limit; iteration++) {
            int p = -1;
            double worst = 0;
            double xNorm = Math.sqrt(dot(x, x));
            for (int i = 0; i < m; i++) {
                if (isActive[i]) {
                    continue;
                }
                double s = dot(c[i], x) - b[i];
                double scale = FEASIBILITY * (1 + Math.abs(b[i]) + norm[i] * xNorm);
                if (s < -scale && (norm[i] == 0 || s / norm[i] < worst)) {
                    worst = norm[i] == 0 ? Double.NEGATIVE_INFINITY : s / norm[i];
                    p = i;
                }
            }
            if (p < 0) {
                return answer(true, g, a, x, active, u);
            }
            List<Double> uPlus = new ArrayList<>(u);
            uPlus.add(0.0);
            while (true) {
                int q = active.size();
                // r = (N' G^-1 N)^-1 N' G^-1 n_p, z = G^-1 n_p - G^-1 N r
                double[] r = new double[q];
                double[] z = ginvRows[p].clone();
                if (q > 0) {
                    double[][] gram = new double[q][q];
                    double[] rhs = new double[q];
                    for (int i = 0; i < q; i++) {
                        for (int j = 0; j < q; j++) {
                            gram[i][j] = dot(c[active.get(i)], ginvRows[active.get(j)]);
                        }
                        rhs[i] = dot(c[active.get(i)], ginvRows[p]);
                    }
                    double[][] lq = cholesky(gram);
                    if (lq == null) {
                        throw new IllegalStateException("the active constraints became dependent");
                    }
                    r = solveCholesky(lq, rhs);
                    for (int i = 0; i < q; i++) {
                        double[] col = ginvRows[active.get(i)];
                        for (int k = 0; k < n; k++) {
                            z[k] -= r[i] * col[k];
                        }
                    }
                }
                double t1 = Double.POSITIVE_INFINITY;
                int drop = -1;
                for (int i = 0; i < q; i++) {
                    if (r[i] > 0) {
                        double ratio = uPlus.get(i) / r[i];
                        if (ratio < t1) {
                            t1 = ratio;
                            drop = i;
                        }
                    }
                }
                double zn = dot(z, c[p]);
                double full = dot(ginvRows[p], c[p]);
                double s = dot(c[p], x) - b[p];
                double t2 = zn > 1e-12 * full ? -s / zn : Double.POSITIVE_INFINITY;
                if (t1 == Double.POSITIVE_INFINITY && t2 == Double.POSITIVE_INFINITY) {
                    return answer(false, g, a, x, active, u);
                }
                double t = Math.min(t1, t2);
                if (t2 != Double.POSITIVE_INFINITY) {
                    for (int k = 0; k < n; k++) {
                        x[k] += t * z[k];
                    }
                }
                for (int i = 0; i < q; i++) {
                    uPlus.set(i, uPlus.get(i) - t * r[i]);
                }
                uPlus.set(q, uPlus.get(q) + t);
                if (t2 <= t1) {
                    active.add(p);
                    isActive[p] = true;
                    u = uPlus;
                    break;
                }
                isActive[active.get(drop)] = false;
                active.remove(drop);
                uPlus.remove(drop);
            }
        }
        throw new IllegalStateException("the quadratic program did not finish in " + limit + " steps");
    }

    private static Solution answer(boolean feasible, double[][] g, double[] a, double[] x, List<Integer> active,
            List<Double> u) {
        double value = dot(a, x);
        for (int i = 0; i < x.length; i++) {
            value += 0.5 * x[i] * dot(g[i], x);
        }
        int[] act = active.stream().mapToInt(Integer::intValue).toArray();
        double[] mult = u.stream().mapToDouble(Double::doubleValue).toArray();
        return new Solution(feasible, x, value, act, feasible ? mult : Arrays.copyOf(mult, act.length));
    }

    private static double dot(double[] p, double[] q) {
        double s = 0;
        for (int i = 0; i < p.length; i++) {
            s += p[i] * q[i];
        }
        return s;
    }

    /** The lower Cholesky factor of a symmetric matrix, or null when it is not positive definite. */
    private static double[][] cholesky(double[][] m) {
        int n = m.length;
        double[][] l = new double[n][n];
        double largest = 0;
        for (int i = 0; i < n; i++) {
            largest = Math.max(largest, Math.abs(m[i][i]));
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j <= i; j++) {
                double s = m[i][j];
                for (int k = 0; k < j; k++) {
                    s -= l[i][k] * l[j][k];
                }
                if (i == j) {
                    if (!(s > 1e-14 * largest)) {
                        return null;
                    }
                    l[i][i] = Math.sqrt(s);
                } else {
                    l[i][j] = s / l[j][j];
                }
            }
        }
        return l;
    }

    private static double[] solveCholesky(double[][] l, double[] v) {
        int n = v.length;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double s = v[i];
            for (int k = 0; k < i; k++) {
                s -= l[i][k] * y[k];
            }
            y[i] = s / l[i][i];
        }
        double[] x = new double[n];
        for (int i = n - 1; i >= 0; i--) {
            double s = y[i];
            for (int k = i + 1; k < n; k++) {
                s -= l[k][i] * x[k];
            }
            x[i] = s / l[i][i];
        }
        return x;
    }
}
