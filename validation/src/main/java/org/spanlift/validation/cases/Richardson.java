package org.spanlift.validation.cases;

import java.util.OptionalDouble;

/**
 * Richardson extrapolation from the last three results of a refinement sequence in which each lattice is
 * twice as dense as the one before. The observed order p follows from the ratio of successive differences;
 * the extrapolated value is f3 + (f3 - f2) / (2^p - 1). Only a sequence that converges monotonically (both
 * differences of one sign, the later smaller) is extrapolated.
 */
public final class Richardson {

    /** Refinement ratio between successive lattices. */
    public static final double RATIO = 2;

    private Richardson() {
    }

    /** The observed order of the last three values, or empty when they do not converge monotonically. */
    public static OptionalDouble order(double[] f) {
        if (f.length < 3) {
            return OptionalDouble.empty();
        }
        int n = f.length;
        double d1 = f[n - 2] - f[n - 3];
        double d2 = f[n - 1] - f[n - 2];
        if (d1 == 0 || d2 == 0 || Math.signum(d1) != Math.signum(d2) || Math.abs(d2) >= Math.abs(d1)) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(Math.log(d1 / d2) / Math.log(RATIO));
    }

    /** The extrapolated value for the given order. */
    public static double extrapolate(double[] f, double order) {
        int n = f.length;
        return f[n - 1] + (f[n - 1] - f[n - 2]) / (Math.pow(RATIO, order) - 1);
    }
}
