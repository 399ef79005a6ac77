package org.spanlift.solve.linear;

/**
 * A square system factorized by LU with partial pivoting (P A = L U): factor once, then solve for any number
 * of right-hand sides. The quality estimate is the pivot ratio, the smallest over the largest |U_ii|: zero for
 * an exactly singular matrix, tiny for a nearly singular one; callers refuse below their own limit.
 *
 * <p>Obtain one from {@link #create(LuOptions)}. An instance is factorized once ({@link #factor}); after that
 * {@link #solve} may be called from several threads at once (it reads the factors only).
 */
public interface DenseLu {

    /**
     * Factorizes the row-major n x n matrix {@code a}. The implementation may use {@code a} as work space:
     * its contents are undefined afterwards, and the caller must not use it again. Never throws for a
     * singular matrix: {@link #pivotRatio()} says so.
     *
     * @throws IllegalStateException when this instance was factorized already
     */
    void factor(double[] a, int n);

    /** The number of unknowns (0 before {@link #factor}). */
    int size();

    /**
     * The smallest over the largest |U_ii|: 0 when a pivot is exactly zero, NaN when the matrix held a value
     * that is not finite.
     */
    double pivotRatio();

    /**
     * Solves A x = b. Writes x into {@code x} (length {@link #size()}, overwritten); {@code b} is not
     * modified and may not be the same array as {@code x}.
     */
    void solve(double[] b, double[] x);

    /** A new, unfactorized solver as the options say. */
    static DenseLu create(LuOptions options) {
        return switch (options.method()) {
            case EJML -> new EjmlLu();
            case TILED -> new TiledLu(options.threads());
        };
    }

    /** The pivot ratio of the row-major n x n upper factor held in {@code lu}. */
    static double pivotRatio(double[] lu, int n) {
        double min = Double.POSITIVE_INFINITY;
        double max = 0;
        for (int i = 0; i < n; i++) {
            double d = Math.abs(lu[i * n + i]);
            if (Double.isNaN(d)) {
                return Double.NaN;
            }
            min = Math.min(min, d);
            max = Math.max(max, d);
        }
        return max == 0 ? 0 : min / max;
    }
}
