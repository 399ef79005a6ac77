package org.spanlift.validation.liftingline;

/**
 * Prandtl's lifting-line equation for a straight wing under symmetric loading, solved by Glauert's method:
 * the circulation is the odd sine series Gamma(theta) = 2 b V sum_{n odd} A_n sin(n theta), with
 * eta = 2y/b = cos theta, and the equation
 * <pre>
 *   sum_n A_n sin(n theta) (n mu + sin theta) = mu (alpha + eps - alpha0) sin theta,   mu = a0 c / (4 b)
 * </pre>
 * is collocated at theta_k = k pi / (2N), k = 1..N (from next to the tip to the root), for N odd terms
 * A_1, A_3, ..., A_{2N-1}. Results: CL = pi A A_1, CDi = pi A sum n A_n^2, delta = sum_{n&gt;=3} n (A_n/A_1)^2.
 *
 * <p>Because the equation is linear, the system is factorized once and solved for two right-hand sides:
 * the unit angle of attack (mu sin theta) and the twist and section zero-lift part
 * (mu (eps - alpha0) sin theta). The lift slope and the wing's zero-lift angle follow exactly from these.
 *
 * <p>This solver is an independent check on the vortex-lattice engine and shares no code with it,
 * including the linear-algebra routine (a Gaussian elimination with partial pivoting of its own).
 * Instances are immutable and thread-safe.
 */
public final class LiftingLineSolver {

    /**
     * Default number of odd Fourier terms (and collocation stations on the half span). Measured: a
     * straight-tapered planform (or linear washout) has a kink in chord (or twist) at the root, in eta =
     * cos theta, and the collocated series then converges at second order in the number of terms; at
     * 1024 terms CL and e of such wings change by a few 1e-7 (relative) when the count is doubled. The
     * rectangular wing converges at fourth order and the elliptic wing is exact with one term.
     */
    public static final int DEFAULT_TERMS = 1024;

    /** Largest number of terms accepted (the dense system grows as the square, its solve as the cube). */
    public static final int MAX_TERMS = 4096;

    private final int terms;

    /** A solver with {@link #DEFAULT_TERMS} terms. */
    public LiftingLineSolver() {
        this(DEFAULT_TERMS);
    }

    /**
     * @param terms number of odd Fourier terms, 1 to {@link #MAX_TERMS}
     * @throws IllegalArgumentException otherwise
     */
    public LiftingLineSolver(int terms) {
        if (terms < 1 || terms > MAX_TERMS) {
            throw new IllegalArgumentException("number of Fourier terms must be between 1 and " + MAX_TERMS
                    + ", got " + terms);
        }
        this.terms = terms;
    }

    /** Number of odd Fourier terms used. */
    public int terms() {
        return terms;
    }

    /**
     * Solves the wing at one angle of attack.
     *
     * @param wing the wing
     * @param alpha angle of attack of the root-chord reference line [rad]
     * @return the solution (no NaN anywhere)
     * @throws IllegalArgumentException if alpha is not finite, or the wing's functions give a non-positive
     *     chord away from the tip, a non-positive section lift slope, or a non-finite value at a station
     */
    public LiftingLineSolution solve(LiftingLineWing wing, double alpha) {
        if (wing == null) {
            throw new IllegalArgumentException("wing missing");
        }
        if (!Double.isFinite(alpha)) {
            throw new IllegalArgumentException("angle of attack must be a finite angle in radians, got " + alpha);
        }
        final int n = terms;
        final double b = wing.span();
        final double aspectRatio = wing.aspectRatio();

        double[] theta = new double[n];
        double[] eta = new double[n];
        double[] chord = new double[n];
        double[] mu = new double[n];
        double[] rhsAlpha = new double[n];
        double[] rhsTwist = new double[n];
        double[][] matrix = new double[n][n];
        double firstSlope = Double.NaN;
        boolean uniformSlope = true;

        for (int k = 0; k < n; k++) {
            // Station k runs from the tip side (theta small) to the root (theta = pi/2).
            double th = (k + 1) * Math.PI / (2.0 * n);
            double e = k == n - 1 ? 0.0 : Math.cos(th);
            theta[k] = th;
            eta[k] = e;
            double c = wing.chord().applyAsDouble(e);
            LiftingLineWing.checkChord(e, c);
            double a0 = wing.sectionLiftSlope().applyAsDouble(e);
            if (!(a0 > 0.0) || !Double.isFinite(a0)) {
                throw new IllegalArgumentException("section lift slope must be positive and finite, got " + a0
                        + " per radian at eta = " + e);
            }
            if (k == 0) {
                firstSlope = a0;
            } else if (Math.abs(a0 - firstSlope) > 1e-12 * firstSlope) {
                uniformSlope = false;
            }
            double eps = wing.twist().applyAsDouble(e);
            double alpha0 = wing.zeroLiftAngle().applyAsDouble(e);
            if (!Double.isFinite(eps)) {
                throw new IllegalArgumentException("twist at eta = " + e + " is not finite (" + eps + ")");
            }
            if (!Double.isFinite(alpha0)) {
                throw new IllegalArgumentException("section zero-lift angle at eta = " + e + " is not finite ("
                        + alpha0 + ")");
            }
            chord[k] = c;
            double m = a0 * c / (4.0 * b);
            mu[k] = m;
            double s = Math.sin(th);
            rhsAlpha[k] = m * s;
            rhsTwist[k] = m * (eps - alpha0) * s;
            for (int j = 0; j < n; j++) {
                int order = 2 * j + 1;
                matrix[k][j] = Math.sin(order * th) * (order * m + s);
            }
        }

        DenseLinearSolver system = new DenseLinearSolver(matrix);
        double[] unitAlpha = system.solve(rhsAlpha);
        double[] twistPart = system.solve(rhsTwist);

        double a1Alpha = unitAlpha[0];
        if (!(a1Alpha > 0.0)) {
            throw new IllegalArgumentException("lift per unit angle of attack is not positive (A_1 = " + a1Alpha
                    + "); the wing cannot be solved");
        }
        double liftSlope = Math.PI * aspectRatio * a1Alpha;
        double zeroLiftAngle = -twistPart[0] / a1Alpha;

        double[] coefficients = new double[n];
        for (int j = 0; j < n; j++) {
            coefficients[j] = alpha * unitAlpha[j] + twistPart[j];
        }
        double cl = Math.PI * aspectRatio * coefficients[0];
        double sumNA2 = 0.0;
        for (int j = 0; j < n; j++) {
            sumNA2 += (2 * j + 1) * coefficients[j] * coefficients[j];
        }
        double cdi = Math.PI * aspectRatio * sumNA2;

        Double efficiency = null;
        Double delta = null;
        if (Math.abs(cl) >= LiftingLineSolution.EFFICIENCY_MIN_CL) {
            double d = higherTermsRatio(coefficients);
            delta = d;
            efficiency = 1.0 / (1.0 + d);
        }
        double additionalDelta = higherTermsRatio(unitAlpha);

        Double tau = null;
        if (uniformSlope) {
            double a0 = firstSlope;
            tau = (a0 / liftSlope - 1.0) * Math.PI * aspectRatio / a0 - 1.0;
        }

        // Span load, root first.
        double[] etaOut = new double[n];
        double[] ccl = new double[n];
        double[] sectionCl = new double[n];
        double[] gamma = new double[n];
        for (int k = 0; k < n; k++) {
            int src = n - 1 - k;
            double sum = 0.0;
            for (int j = 0; j < n; j++) {
                sum += coefficients[j] * Math.sin((2 * j + 1) * theta[src]);
            }
            etaOut[k] = eta[src];
            gamma[k] = 2.0 * sum;
            ccl[k] = 4.0 * b * sum;
            sectionCl[k] = ccl[k] / chord[src];
        }

        return new LiftingLineSolution(alpha, cl, cdi, efficiency, delta, additionalDelta, liftSlope, tau,
                zeroLiftAngle, coefficients, etaOut, ccl, sectionCl, gamma);
    }

    /** sum over n &gt;= 3 of n (A_n / A_1)^2; the caller guarantees A_1 is not zero. */
    private static double higherTermsRatio(double[] a) {
        double a1 = a[0];
        double sum = 0.0;
        for (int j = 1; j < a.length; j++) {
            double r = a[j] / a1;
            sum += (2 * j + 1) * r * r;
        }
        return sum;
    }
}
