package org.spanlift.validation.liftingline;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
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
        assertThrows(IllegalArgumentException.class, () -> new DenseLinearSolver(new double[][] {{1.0, Double.NaN},
                {0.0, 1.0}}));
    }

    /**
     * The determinant's sign, against determinants computed by hand (cofactor expansion): one row exchange
     * and positive pivots, no exchange and one negative pivot, and both.
     */
    @Test
    void givesTheSignOfTheDeterminant() {
        // det = 0*(5-0) - 2*(5-2) + 1*(0-2) = -8, reached through a row exchange.
        assertEquals(-1, new DenseLinearSolver(new double[][] {{0.0, 2.0, 1.0}, {1.0, 1.0, 1.0}, {2.0, 0.0, 5.0}})
                .determinantSign());
        // det = 3*(-2) = -6 with no exchange (3 is the larger entry of the first column).
        assertEquals(-1, new DenseLinearSolver(new double[][] {{3.0, 1.0}, {0.0, -2.0}}).determinantSign());
        // det = (1)(4) - (2)(3) = -2: one exchange, pivots 3 and 2 - 4/3 = 2/3, both positive.
        assertEquals(-1, new DenseLinearSolver(new double[][] {{1.0, 2.0}, {3.0, 4.0}}).determinantSign());
        // det = (-1)(-4) - (2)(3) = -2, and (-1)(4) - (-2)(3) = 2 below.
        assertEquals(-1, new DenseLinearSolver(new double[][] {{-1.0, 2.0}, {3.0, -4.0}}).determinantSign());
        assertEquals(1, new DenseLinearSolver(new double[][] {{-1.0, -2.0}, {3.0, 4.0}}).determinantSign());
        assertEquals(1, new DenseLinearSolver(new double[][] {{2.0, 0.0}, {0.0, 5.0}}).determinantSign());
    }
}
