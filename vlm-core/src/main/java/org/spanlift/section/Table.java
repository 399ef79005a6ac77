package org.spanlift.section;

import java.util.Arrays;

/**
 * A function given at increasing abscissae, linear between them and constant beyond the ends (no
 * extrapolation). Immutable.
 */
public final class Table {

    private final double[] x;
    private final double[] y;

    /**
     * @throws IllegalArgumentException unless the lengths match, there is at least one point and x strictly
     *                                  increases
     */
    public Table(double[] x, double[] y) {
        if (x.length != y.length || x.length == 0) {
            throw new IllegalArgumentException("a table needs as many values as abscissae, at least one");
        }
        for (int i = 1; i < x.length; i++) {
            if (!(x[i] > x[i - 1])) {
                throw new IllegalArgumentException("the abscissae must increase strictly");
            }
        }
        this.x = x.clone();
        this.y = y.clone();
    }

    /** A table of one value everywhere. */
    public static Table constant(double value) {
        return new Table(new double[] {0}, new double[] {value});
    }

    /** The value at t: linear between the abscissae, the end value beyond them. */
    public double at(double t) {
        if (t <= x[0]) {
            return y[0];
        }
        int n = x.length;
        if (t >= x[n - 1]) {
            return y[n - 1];
        }
        int i = Arrays.binarySearch(x, t);
        if (i >= 0) {
            return y[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double w = (t - x[lo]) / (x[hi] - x[lo]);
        return (1 - w) * y[lo] + w * y[hi];
    }

    /** Number of points. */
    public int size() {
        return x.length;
    }

    /** Abscissa of point i. */
    public double x(int i) {
        return x[i];
    }

    /** Value at point i. */
    public double y(int i) {
        return y[i];
    }
}
