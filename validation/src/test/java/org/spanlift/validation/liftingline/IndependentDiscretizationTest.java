package org.spanlift.validation.liftingline;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Cross-checks the Fourier-series solution against a second, unrelated discretization of the same
 * Prandtl lifting-line equation, written in this test only: the line carries M piecewise-constant
 * circulation intervals (cosine spacing in the full span, control points at the angular midpoints) whose
 * trailing vortices induce the downwash w_i = sum_j (Gamma_j / (4 pi)) (1/(y_i - y_j) - 1/(y_i - y_{j+1})) (positive
 * down); each section obeys Gamma = (1/2) V c a0 (alpha - w/V). Lift and induced drag are the sums of
 * rho V Gamma dy and rho w Gamma dy.
 *
 * <p>Tolerance: measured while writing this test, doubling M from 800 changes the discrete delta by less
 * than 2e-7 and tau by less than 4e-6 (the discrete scheme converges at about first order in M, so its
 * error at M = 800 is of the same size); 1e-5 absolute covers that with a margin, and is far below the
 * differences between the planforms checked (delta spans 0.005 to 0.07 over the cases below).
 */
class IndependentDiscretizationTest {

    private static final int INTERVALS = 800;
    private static final double TOL = 1e-5;

    @ParameterizedTest(name = "A = {0}, taper = {1}")
    @CsvSource({"8, 1.0", "6, 1.0", "4, 0.35", "8, 0.8", "10, 0.5"})
    void seriesSolutionMatchesDiscreteVortexSolutionOfTheSameEquation(double aspectRatio, double taper) {
        double rootChord = 1.0;
        double span = aspectRatio * rootChord * (1.0 + taper) / 2.0;
        double a0 = LiftingLineWing.THIN_AIRFOIL_LIFT_SLOPE;
        LiftingLineSolution series = new LiftingLineSolver()
                .solve(LiftingLineWing.trapezoidal(span, rootChord, taper, a0), 0.1);

        double[] discrete = discreteFactors(span, rootChord, taper, a0, aspectRatio);
        assertEquals(discrete[0], series.additionalInducedDragFactor(), TOL, "delta");
        assertEquals(discrete[1], series.liftSlopeFactor(), TOL, "tau");
    }

    /** Returns {delta, tau} from the discrete-vortex solution at unit angle of attack and unit speed. */
    private static double[] discreteFactors(double span, double rootChord, double taper, double a0,
            double aspectRatio) {
        int m = INTERVALS;
        double[] nodes = new double[m + 1];
        for (int j = 0; j <= m; j++) {
            nodes[j] = -0.5 * span * Math.cos(Math.PI * j / m);
        }
        double[] yc = new double[m];
        double[] chord = new double[m];
        for (int i = 0; i < m; i++) {
            double th = Math.PI * (i + 0.5) / m;
            yc[i] = -0.5 * span * Math.cos(th);
            chord[i] = rootChord * (1.0 - (1.0 - taper) * Math.abs(2.0 * yc[i] / span));
        }
        double[][] downwash = new double[m][m];
        double[][] system = new double[m][m];
        double[] rhs = new double[m];
        for (int i = 0; i < m; i++) {
            for (int j = 0; j < m; j++) {
                downwash[i][j] = (1.0 / (4.0 * Math.PI))
                        * (1.0 / (yc[i] - nodes[j]) - 1.0 / (yc[i] - nodes[j + 1]));
                system[i][j] = 0.5 * chord[i] * a0 * downwash[i][j] + (i == j ? 1.0 : 0.0);
            }
            rhs[i] = 0.5 * chord[i] * a0;
        }
        double[] gamma = new DenseLinearSolver(system).solve(rhs);
        double area = span * rootChord * (1.0 + taper) / 2.0;
        double lift = 0.0;
        double drag = 0.0;
        for (int i = 0; i < m; i++) {
            double w = 0.0;
            for (int j = 0; j < m; j++) {
                w += downwash[i][j] * gamma[j];
            }
            double dy = nodes[i + 1] - nodes[i];
            lift += gamma[i] * dy;
            drag += gamma[i] * w * dy;
        }
        double cl = 2.0 * lift / area;
        double cdi = 2.0 * drag / area;
        double delta = Math.PI * aspectRatio * cdi / (cl * cl) - 1.0;
        double tau = (a0 / cl - 1.0) * Math.PI * aspectRatio / a0 - 1.0;
        return new double[] {delta, tau};
    }
}
