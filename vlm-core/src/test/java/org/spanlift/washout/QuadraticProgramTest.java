package org.spanlift.washout;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * The dual active-set solver against programs of known solution, and the optimality conditions (KKT:
 * stationarity, primal and dual feasibility, complementarity) on seeded random programs, which for a strictly
 * convex program make the answer the global minimum.
 */
class QuadraticProgramTest {

    private static final double TOL = 1e-10;

    @Test
    void anUnconstrainedMinimumThatMeetsTheConstraintsIsTheAnswerWithNoneActive() {
        QuadraticProgram.Solution s = QuadraticProgram.solve(new double[][] {{1, 0}, {0, 1}}, new double[] {-1, -1},
                new double[][] {{1, 1}}, new double[] {0});
        assertTrue(s.feasible());
        assertArrayEquals(new double[] {1, 1}, s.x(), TOL);
        assertEquals(0, s.active().length);
        assertEquals(-1, s.value(), TOL);
    }

    @Test
    void theTextbookTwoVariableProgramEndsAtItsKnownVertex() {
        // min (x1 - 1)^2 + (x2 - 2.5)^2 over five half-planes: the minimum (1.4, 1.7) lies on the first
        // (Nocedal and Wright, Numerical Optimization, 2nd ed., 2006, Example 16.4; the constant 7.25 dropped)
        double[][] c = {{1, -2}, {-1, -2}, {-1, 2}, {1, 0}, {0, 1}};
        double[] b = {-2, -6, -2, 0, 0};
        QuadraticProgram.Solution s = QuadraticProgram.solve(new double[][] {{2, 0}, {0, 2}}, new double[] {-2, -5},
                c, b);
        assertTrue(s.feasible());
        assertArrayEquals(new double[] {1.4, 1.7}, s.x(), TOL);
        assertArrayEquals(new int[] {0}, s.active());
        assertEquals(0.8, s.multipliers()[0], TOL);
        kkt(new double[][] {{2, 0}, {0, 2}}, new double[] {-2, -5}, c, b, s);
    }

    @Test
    void contradictoryConstraintsAreReportedInfeasible() {
        QuadraticProgram.Solution s = QuadraticProgram.solve(new double[][] {{1}}, new double[] {0},
                new double[][] {{1}, {-1}}, new double[] {1, 0});
        assertFalse(s.feasible());
    }

    @Test
    void repeatedAndProportionalConstraintsStillGiveTheMinimum() {
        double[][] c = {{1, 1}, {1, 1}, {2, 2}, {1, 0}};
        double[] b = {1, 1, 2, 0.8};
        double[][] g = {{1, 0}, {0, 1}};
        double[] a = {0, 0};
        QuadraticProgram.Solution s = QuadraticProgram.solve(g, a, c, b);
        assertTrue(s.feasible());
        assertArrayEquals(new double[] {0.8, 0.2}, s.x(), TOL);
        kkt(g, a, c, b, s);
    }

    @Test
    void aHessianThatIsNotPositiveDefiniteIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> QuadraticProgram.solve(new double[][] {{1, 0}, {0, 0}},
                new double[] {0, 0}, new double[0][], new double[0]));
    }

    @Test
    void seededRandomProgramsMeetTheOptimalityConditionsAndBeatAKnownFeasiblePoint() {
        Random random = new Random(20261202L);
        for (int trial = 0; trial < 400; trial++) {
            int n = 1 + random.nextInt(8);
            int m = random.nextInt(40);
            double[][] root = new double[n][n];
            for (double[] row : root) {
                for (int j = 0; j < n; j++) {
                    row[j] = random.nextGaussian();
                }
            }
            double[][] g = new double[n][n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    for (int k = 0; k < n; k++) {
                        g[i][j] += root[k][i] * root[k][j];
                    }
                }
                g[i][i] += 0.1;
            }
            double[] a = new double[n];
            double[] x0 = new double[n];
            for (int i = 0; i < n; i++) {
                a[i] = 5 * random.nextGaussian();
                x0[i] = random.nextGaussian();
            }
            double[][] c = new double[m][n];
            double[] b = new double[m];
            for (int i = 0; i < m; i++) {
                for (int j = 0; j < n; j++) {
                    c[i][j] = random.nextGaussian();
                }
                // x0 meets every constraint; some hold with equality there
                b[i] = dot(c[i], x0) - (random.nextInt(4) == 0 ? 0 : random.nextDouble());
            }
            QuadraticProgram.Solution s = QuadraticProgram.solve(g, a, c, b);
            assertTrue(s.feasible(), "trial " + trial);
            kkt(g, a, c, b, s);
            double at0 = dot(a, x0);
            for (int i = 0; i < n; i++) {
                at0 += 0.5 * x0[i] * dot(g[i], x0);
            }
            assertTrue(s.value() <= at0 + 1e-9 * (1 + Math.abs(at0)), "trial " + trial);
        }
    }

    /** Stationarity G x + a = sum u_i c_i over the active set, u >= 0, every constraint met, active ones tight. */
    private static void kkt(double[][] g, double[] a, double[][] c, double[] b, QuadraticProgram.Solution s) {
        double[] x = s.x();
        int n = x.length;
        double[] residual = new double[n];
        double scale = 1;
        for (int i = 0; i < n; i++) {
            residual[i] = dot(g[i], x) + a[i];
            scale = Math.max(scale, Math.abs(residual[i]));
        }
        int[] active = s.active();
        double[] u = s.multipliers();
        for (int k = 0; k < active.length; k++) {
            assertTrue(u[k] >= -1e-9 * scale, "multiplier " + u[k]);
            for (int i = 0; i < n; i++) {
                residual[i] -= u[k] * c[active[k]][i];
            }
            double tight = dot(c[active[k]], x) - b[active[k]];
            assertEquals(0, tight, 1e-8 * (1 + Math.abs(b[active[k]])), "active constraint " + active[k]);
        }
        for (int i = 0; i < n; i++) {
            assertEquals(0, residual[i], 1e-8 * scale, "stationarity");
        }
        for (int i = 0; i < b.length; i++) {
            assertTrue(dot(c[i], x) - b[i] >= -1e-9 * (1 + Math.abs(b[i])), "constraint " + i);
        }
    }

    private static double dot(double[] p, double[] q) {
        double s = 0;
        for (int i = 0; i < p.length; i++) {
            s += p[i] * q[i];
        }
        return s;
    }
}
