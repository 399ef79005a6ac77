package org.spanlift.validation.liftingline;

/**
 * LU factorization with partial (row) pivoting of a small dense square matrix, written here so that the
 * lifting-line check shares no linear-algebra code with the vortex-lattice engine.
 *
 * <p>The matrix is factorized once in the constructor; {@link #solve(double[])} then costs O(n^2) per
 * right-hand side. Public so that the nonlinear lifting-line check ({@code validation.nonlinear}) uses the
 * same routine for its Newton steps.
 */
public final class DenseLinearSolver {

    /** Relative pivot size below which the matrix is treated as singular. */
    private static final double SINGULAR_PIVOT = 1e-14;

    private final int n;
    private final double[][] lu;
    private final int[] permutation;
    private final int determinantSign;

    /**
     * Factorizes a copy of {@code matrix} (left untouched).
     *
     * @throws IllegalArgumentException if the matrix is not square, holds a non-finite entry, or is
     *     singular to working precision
     */
    public DenseLinearSolver(double[][] matrix) {
        n = matrix.length;
        if (n == 0) {
            throw new IllegalArgumentException("empty matrix");
        }
        lu = new double[n][];
        double scale = 0.0;
        for (int i = 0; i < n; i++) {
            if (matrix[i].length != n) {
                throw new IllegalArgumentException("matrix is not square: row " + i + " has "
                        + matrix[i].length + " entries, expected " + n);
            }
            lu[i] = matrix[i].clone();
            for (double v : lu[i]) {
                if (!Double.isFinite(v)) {
                    throw new IllegalArgumentException("matrix entry is not finite in row " + i);
                }
                scale = Math.max(scale, Math.abs(v));
            }
        }
        if (scale == 0.0) {
            throw new IllegalArgumentException("matrix is zero");
        }
        permutation = new int[n];
        for (int i = 0; i < n; i++) {
            permutation[i] = i;
        }
        int sign = 1;
        for (int col = 0; col < n; col++) {
            int pivotRow = col;
            double pivotAbs = Math.abs(lu[col][col]);
            for (int row = col + 1; row < n; row++) {
                double a = Math.abs(lu[row][col]);
                if (a > pivotAbs) {
                    pivotAbs = a;
                    pivotRow = row;
                }
            }
            if (pivotAbs <= SINGULAR_PIVOT * scale) {
                throw new IllegalArgumentException("matrix is singular to working precision (column " + col + ")");
            }
            if (pivotRow != col) {
                double[] t = lu[col];
                lu[col] = lu[pivotRow];
                lu[pivotRow] = t;
                int p = permutation[col];
                permutation[col] = permutation[pivotRow];
                permutation[pivotRow] = p;
                sign = -sign;
            }
            double pivot = lu[col][col];
            if (pivot < 0.0) {
                sign = -sign;
            }
            for (int row = col + 1; row < n; row++) {
                double factor = lu[row][col] / pivot;
                lu[row][col] = factor;
                if (factor != 0.0) {
                    double[] r = lu[row];
                    double[] p = lu[col];
                    for (int k = col + 1; k < n; k++) {
                        r[k] -= factor * p[k];
                    }
                }
            }
        }
        determinantSign = sign;
    }

    /**
     * The sign of the matrix's determinant, +1 or -1 (the product of the pivots' signs and the parity of the
     * row exchanges); a matrix singular to working precision was refused by the constructor.
     */
    public int determinantSign() {
        return determinantSign;
    }

    /**
     * Solves {@code A x = rhs} for x.
     *
     * @throws IllegalArgumentException if {@code rhs} has the wrong length or a non-finite entry
     */
    public double[] solve(double[] rhs) {
        if (rhs.length != n) {
            throw new IllegalArgumentException("right-hand side has " + rhs.length + " entries, expected " + n);
        }
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            double v = rhs[permutation[i]];
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("right-hand side entry is not finite");
            }
            x[i] = v;
        }
        for (int i = 1; i < n; i++) {
            double s = x[i];
            double[] r = lu[i];
            for (int k = 0; k < i; k++) {
                s -= r[k] * x[k];
            }
            x[i] = s;
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = x[i];
            double[] r = lu[i];
            for (int k = i + 1; k < n; k++) {
                s -= r[k] * x[k];
            }
            x[i] = s / r[i];
        }
        return x;
    }
}
