package org.spanlift.section;

import java.util.function.DoubleUnaryOperator;

/**
 * Adaptive Gauss-Legendre quadrature: each interval is integrated with the 16-point rule, and again as
 * two halves; where the two differ by more than the tolerance share of the interval, the halves are
 * refined in turn. Callers split the range at known kinks so that every piece is smooth.
 */
final class Quadrature {

    private static final int ORDER = 16;
    private static final double[] NODE = new double[ORDER];
    private static final double[] WEIGHT = new double[ORDER];
    private static final int MAX_DEPTH = 40;

    static {
        // Nodes and weights on [-1, 1] by Newton iteration on the Legendre polynomial P_16.
        for (int i = 0; i < ORDER; i++) {
            double x = Math.cos(Math.PI * (i + 0.75) / (ORDER + 0.5));
            double dp = 0.0;
            for (int iter = 0; iter < 100; iter++) {
                double p0 = 1.0;
                double p1 = x;
                for (int k = 2; k <= ORDER; k++) {
                    double p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
                    p0 = p1;
                    p1 = p2;
                }
                dp = ORDER * (x * p1 - p0) / (x * x - 1.0);
                double dx = p1 / dp;
                x -= dx;
                if (Math.abs(dx) < 1e-16) {
                    break;
                }
            }
            NODE[i] = x;
            WEIGHT[i] = 2.0 / ((1.0 - x * x) * dp * dp);
        }
    }

    private Quadrature() {
    }

    /** Gauss-Legendre 16-point rule on [a, b]. */
    static double rule(DoubleUnaryOperator f, double a, double b) {
        double mid = 0.5 * (a + b);
        double half = 0.5 * (b - a);
        double sum = 0.0;
        for (int i = 0; i < ORDER; i++) {
            sum += WEIGHT[i] * f.applyAsDouble(mid + half * NODE[i]);
        }
        return sum * half;
    }

    /**
     * Integral of f over [a, b], split at the given interior points (which must lie in (a, b), sorted),
     * to an absolute tolerance {@code tol}.
     */
    static double integrate(DoubleUnaryOperator f, double a, double b, double[] splits, double tol) {
        double total = 0.0;
        double lo = a;
        int pieces = splits.length + 1;
        for (int k = 0; k < pieces; k++) {
            double hi = k < splits.length ? splits[k] : b;
            if (hi > lo) {
                total += adapt(f, lo, hi, rule(f, lo, hi), tol * (hi - lo) / (b - a), 0);
            }
            lo = hi;
        }
        return total;
    }

    private static double adapt(DoubleUnaryOperator f, double a, double b, double whole, double tol, int depth) {
        double mid = 0.5 * (a + b);
        double left = rule(f, a, mid);
        double right = rule(f, mid, b);
        double halves = left + right;
        if (Math.abs(halves - whole) <= tol || depth >= MAX_DEPTH) {
            return halves;
        }
        return adapt(f, a, mid, left, 0.5 * tol, depth + 1) + adapt(f, mid, b, right, 0.5 * tol, depth + 1);
    }
}
