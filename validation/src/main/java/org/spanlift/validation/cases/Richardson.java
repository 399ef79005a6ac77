package org.spanlift.validation.cases;

import java.util.OptionalDouble;

/**
 * Richardson extrapolation from the last three results of a refinement sequence in which each lattice is
 * twice as dense as the one before. The observed order p follows from the ratio of successive differences;
 * the extrapolated value is f3 + (f3 - f2) / (2^p - 1). Only a sequence that converges monotonically (both
 * differences of one sign, the later smaller) has an order, and only one whose order lies between
 * {@link #MIN_ORDER} and {@link #MAX_ORDER} is extrapolated: outside that range the results are not yet in
 * the asymptotic range, and a small p would multiply the last difference many times over (common practice
 * in grid-convergence studies).
 */
public final class Richardson {

    /** Refinement ratio between successive lattices. */
    public static final double RATIO = 2;
    /** Smallest observed order that is extrapolated (2^p - 1 = 0.41: the last difference times 2.4). */
    public static final double MIN_ORDER = 0.5;
    /** Largest observed order that is extrapolated. */
    public static final double MAX_ORDER = 4;

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

    /** The extrapolated value, or empty when the sequence has no order or one outside the trusted range. */
    public static OptionalDouble extrapolated(double[] f) {
        OptionalDouble p = order(f);
        if (p.isEmpty() || p.getAsDouble() < MIN_ORDER || p.getAsDouble() > MAX_ORDER) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(extrapolate(f, p.getAsDouble()));
    }

    /** The extrapolated value for the given order. */
    public static double extrapolate(double[] f, double order) {
        int n = f.length;
        return f[n - 1] + (f[n - 1] - f[n - 2]) / (Math.pow(RATIO, order) - 1);
    }
}
