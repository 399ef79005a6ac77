package org.spanlift.section;

import java.util.Arrays;

/**
 * Interpolating cubic spline y(t) through strictly increasing knots, clamped at both ends with the end
 * derivative of the cubic through the four end points (fourth-order accurate end slopes, unlike the
 * natural end condition's zero curvature). Beyond the end knots the end cubic is continued.
 */
public final class CubicSpline {

    private final double[] t;
    private final double[] y;
    private final double[] d;   // first derivative at each knot

    /** The spline through (t[i], y[i]): at least four knots, t strictly increasing (arrays copied). */
    public CubicSpline(double[] t, double[] y) {
        int n = t.length;
        if (n < 4 || y.length != n) {
            throw new IllegalArgumentException("a spline needs at least 4 knots");
        }
        for (int i = 1; i < n; i++) {
            if (!(t[i] > t[i - 1])) {
                throw new IllegalArgumentException("spline knots must increase strictly");
            }
        }
        this.t = t.clone();
        this.y = y.clone();
        this.d = solveDerivatives(this.t, this.y);
    }

    private static double endDerivative(double[] t, double[] y, int i0, int step) {
        // Derivative at t[i0] of the Lagrange cubic through four consecutive points starting at i0.
        double x0 = t[i0];
        double sum = 0.0;
        for (int j = 0; j < 4; j++) {
            int ij = i0 + j * step;
            double denom = 1.0;
            for (int k = 0; k < 4; k++) {
                if (k != j) {
                    denom *= t[ij] - t[i0 + k * step];
                }
            }
            // d/dx prod_{k != j}(x - t_k) at x0
            double deriv = 0.0;
            for (int a = 0; a < 4; a++) {
                if (a == j) {
                    continue;
                }
                double prod = 1.0;
                for (int k = 0; k < 4; k++) {
                    if (k != j && k != a) {
                        prod *= x0 - t[i0 + k * step];
                    }
                }
                deriv += prod;
            }
            sum += y[ij] * deriv / denom;
        }
        return sum;
    }

    private static double[] solveDerivatives(double[] t, double[] y) {
        int n = t.length;
        double[] d = new double[n];
        d[0] = endDerivative(t, y, 0, 1);
        d[n - 1] = endDerivative(t, y, n - 1, -1);
        if (n == 2) {
            return d;
        }
        // Continuity of the second derivative at interior knots:
        // h_i d_{i-1} + 2 (h_{i-1} + h_i) d_i + h_{i-1} d_{i+1}
        //   = 3 (h_i s_{i-1} + h_{i-1} s_i), h_i = t_{i+1} - t_i, s_i = (y_{i+1} - y_i) / h_i.
        int m = n - 2;
        double[] a = new double[m];
        double[] b = new double[m];
        double[] c = new double[m];
        double[] r = new double[m];
        for (int i = 1; i <= m; i++) {
            double hPrev = t[i] - t[i - 1];
            double h = t[i + 1] - t[i];
            double sPrev = (y[i] - y[i - 1]) / hPrev;
            double s = (y[i + 1] - y[i]) / h;
            a[i - 1] = h;
            b[i - 1] = 2.0 * (hPrev + h);
            c[i - 1] = hPrev;
            r[i - 1] = 3.0 * (h * sPrev + hPrev * s);
        }
        r[0] -= a[0] * d[0];
        r[m - 1] -= c[m - 1] * d[n - 1];
        // Thomas algorithm (diagonally dominant).
        for (int i = 1; i < m; i++) {
            double w = a[i] / b[i - 1];
            b[i] -= w * c[i - 1];
            r[i] -= w * r[i - 1];
        }
        d[m] = r[m - 1] / b[m - 1];
        for (int i = m - 2; i >= 0; i--) {
            d[i + 1] = (r[i] - c[i] * d[i + 2]) / b[i];
        }
        return d;
    }

    private int interval(double x) {
        int i = Arrays.binarySearch(t, x);
        if (i < 0) {
            i = -i - 2;
        }
        return Math.max(0, Math.min(t.length - 2, i));
    }

    /** The spline's value at x (the end cubic continued beyond the end knots). */
    public double value(double x) {
        int i = interval(x);
        double h = t[i + 1] - t[i];
        double u = (x - t[i]) / h;
        double h00 = (1 + 2 * u) * (1 - u) * (1 - u);
        double h10 = u * (1 - u) * (1 - u);
        double h01 = u * u * (3 - 2 * u);
        double h11 = u * u * (u - 1);
        return h00 * y[i] + h10 * h * d[i] + h01 * y[i + 1] + h11 * h * d[i + 1];
    }

    /** The spline's derivative dy/dt at x. */
    public double derivative(double x) {
        int i = interval(x);
        double h = t[i + 1] - t[i];
        double u = (x - t[i]) / h;
        double dh00 = 6 * u * (u - 1);
        double dh10 = (1 - u) * (1 - 3 * u);
        double dh01 = -dh00;
        double dh11 = u * (3 * u - 2);
        return (dh00 * y[i] + dh01 * y[i + 1]) / h + dh10 * d[i] + dh11 * d[i + 1];
    }

    double[] knots() {
        return t.clone();
    }
}
