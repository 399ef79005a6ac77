package org.spanlift.validation.liftingline;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** The solver's own Gaussian elimination with partial pivoting (checked against hand-computed systems). */
class DenseLinearSolverTest {

    @Test
    void solvesASystemThatNeedsRowExchanges() {
        // Zero leading pivot: fails without pivoting. Solution (1, 2, 3) by construction.
        double[][] a = {{0.0, 2.0, 1.0}, {1.0, 1.0, 1.0}, {2.0, 0.0, 5.0}};
        double[] x = {1.0, 2.0, 3.0};
        double[] b = new double[3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                b[i] += a[i][j] * x[j];
            }
        }
        DenseLinearSolver solver = new DenseLinearSolver(a);
        assertArrayEquals(x, solver.solve(b), 1e-14);
        // The factorization is reusable and leaves the input matrix untouched.
        assertArrayEquals(new double[] {0.0, 2.0, 1.0}, a[0], 0.0);
        assertArrayEquals(new double[] {2.0, 4.0, 10.0}, solver.solve(new double[] {18.0, 16.0, 54.0}), 1e-14);
    }

    @Test
    void refusesASingularMatrix() {
        double[][] singular = {{1.0, 2.0}, {2.0, 4.0}};
        assertThrows(IllegalArgumentException.class, () -> new DenseLinearSolver(singular));
        assertThrows(IllegalArgumentException.class, () -> new DenseLinearSolver(new double[][] {{1.0, Double.NaN}, {0.0, 1.0}}));
    }
}
