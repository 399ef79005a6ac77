package org.spanlift.validation.nonlinear;

import java.util.ArrayList;
import java.util.List;
import org.spanlift.validation.liftingline.DenseLinearSolver;
import org.spanlift.validation.liftingline.LiftingLineWing;

/**
 * Prandtl's lifting-line equation with nonlinear section lift curves, for straight wings under symmetric
 * loading: at each station the circulation must give the section lift that the section's curve gives at
 * its effective angle,
 * <pre>
 *   c cl = 2 Gamma / V = c cl(alpha + eps - alpha_i),     alpha_i = sum_n n A_n sin(n theta) / sin(theta),
 * </pre>
 * with Glauert's series Gamma = 2 b V sum A_n sin(n theta), n odd, eta = 2y/b = cos theta. This is the
 * condition of Sivells and Neely (J. C. Sivells and R. H. Neely, "Method for calculating wing
 * characteristics by lifting-line theory using nonlinear section lift data", NACA TN 1269, 1947; NACA
 * Report 865), who satisfied it at stations along the span by successive approximation, with Multhopp's
 * multipliers for the induced angle. Here it is collocated at the linear solver's stations
 * theta_k = k pi / (2N), k = 1..N, as the residuals
 * <pre>
 *   R_k(A) = sin(theta_k) sum_n A_n sin(n theta_k) - (c_k sin(theta_k) / (4 b)) cl_k(alpha_eff,k)
 * </pre>
 * which, for a straight section line cl = a0 (alpha - alpha0), are exactly the rows of the linear solver's
 * system. They are solved by Newton's method on the N coefficients, with the Jacobian
 * <pre>
 *   dR_k/dA_n = sin(n theta_k) (sin(theta_k) + n mu'_k),     mu'_k = c_k cl'_k(alpha_eff,k) / (4 b),
 * </pre>
 * the step halved until the residual's Euclidean norm falls by Armijo's condition (L. Armijo, Pacific
 * Journal of Mathematics 16, 1966; constant 1e-4); where even 1/256 of the step does not, a
 * Levenberg-Marquardt step (K. Levenberg, Quarterly of Applied Mathematics 2, 1944; D. W. Marquardt, SIAM
 * Journal 11, 1963) is tried instead. Convergence: every residual below {@link #TOLERANCE} times
 * max_k c_k sin(theta_k) / (4 b) times max(1, max |cl|). An iteration that does not get there returns a
 * {@link NonlinearFailure}, which carries no lift.
 *
 * <p>Past a section's peak cl' is negative, and the Jacobian shows what follows: the harmonic n at a
 * station loses its stiffness sin(theta) + n mu' once cl' &lt; -4 b sin(theta) / (n c). The more terms, the
 * smaller the negative slope at which that happens, so beyond the first stall the discretized equation
 * has folds and several solutions close together, more of them as terms are added (measured: see the
 * tests). The solver reports this rather than hides it: the index of each solution, the end of a branch
 * at a fold, the solutions found continuing upward and downward ({@link #sweep}).
 *
 * <p>Continuation in the angle of attack: each angle starts from the previous solution moved along the
 * branch's tangent dA/dalpha = J^-1 (c sin(theta) cl' / (4 b)); the step is halved when Newton fails or
 * its corrector moves the coefficients more than a quarter of the predictor's move (a jump to another
 * branch).
 *
 * <p>This check shares no code with the vortex-lattice engine; it uses the linear solver's wing
 * description and its Gaussian elimination ({@link DenseLinearSolver}). Instances are immutable.
 */
public final class NonlinearLiftingLineSolver {

    /**
     * Default number of odd Fourier terms (and stations on the half span). A maximum inside the branch is
     * converged to 1e-5 in CL at 32 terms on the wings of the convergence test; more terms add
     * near-singular harmonics past the peak (class comment) and cost time without changing it.
     */
    public static final int DEFAULT_TERMS = 32;

    /** Largest number of terms accepted (each Newton step factorizes a dense N x N Jacobian). */
    public static final int MAX_TERMS = 1024;

    /** Convergence tolerance on the residuals, relative (see the class comment). */
    public static final double TOLERANCE = 1e-12;

    /** Largest number of Newton iterations at one angle of attack. */
    public static final int MAX_ITERATIONS = 60;

    /** Smallest damping factor tried on a Newton step before a Levenberg-Marquardt step is tried instead. */
    private static final double MIN_DAMPING = 1.0 / 256.0;

    /** The sweep's continuation step is halved at most this many times (to 1/64 of its grid step). */
    private static final int MAX_STEP_HALVINGS = 6;

    /** Step of the search for CL_max once a station nears its peak [rad]: 0.02 degree. */
    public static final double FINE_STEP = Math.toRadians(0.02);

    /**
     * A corrector that moves the coefficients more than this fraction of the predictor's move is taken for
     * a possible jump to another branch, and the step is halved (on a smooth branch the tangent predictor's
     * error shrinks as the square of the step, so small steps always pass).
     */
    private static final double JUMP_RATIO = 0.25;

    private final int terms;

    /** A solver with {@link #DEFAULT_TERMS} terms. */
    public NonlinearLiftingLineSolver() {
        this(DEFAULT_TERMS);
    }

    /**
     * @param terms number of odd Fourier terms, 1 to {@link #MAX_TERMS}
     */
    public NonlinearLiftingLineSolver(int terms) {
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
     * Solves at one angle of attack, starting from zero circulation (the first Newton step is then the
     * linear solution with each section's slope at alpha + eps).
     *
     * @param alpha angle of attack of the root chord [rad]
     */
    public NonlinearPoint solve(NonlinearWing wing, double alpha) {
        Problem p = new Problem(wing, terms);
        return p.newton(requireAngle(alpha), new double[terms]).point();
    }

    /**
     * Solves at one angle of attack starting from another solution's coefficients (of this solver's
     * number of terms).
     */
    public NonlinearPoint solve(NonlinearWing wing, double alpha, NonlinearSolution start) {
        double[] a = start.fourierCoefficients();
        if (a.length != terms) {
            throw new IllegalArgumentException("start has " + a.length + " terms, this solver " + terms);
        }
        Problem p = new Problem(wing, terms);
        return p.newton(requireAngle(alpha), a).point();
    }

    /**
     * Finds the largest CL on the branch that continues the attached-flow solution upward in angle of
     * attack. From {@code fromAlpha} the branch is followed in steps of {@code step} while no station is
     * past its section's peak (and the step converges); from the last such point on, in steps of
     * {@link #FINE_STEP} (halved at most three times where Newton fails or lands far from the prediction),
     * until CL falls (a maximum inside the branch, bracketed by the points around the best one, at most
     * 0.04 degree apart) or the branch ends: no solution continues it, at the smallest step (a fold, past
     * which the lift jumps to another branch, or a failure of the iteration). The first station to pass
     * its peak is found on the fine steps (to 0.02 degree).
     *
     * @param fromAlpha first angle of attack [rad], where the sweep starts from zero circulation (below
     *     any section's peak)
     * @param step coarse step [rad], positive
     * @param toAlpha the search gives up, without a maximum, if CL still rises here [rad]
     */
    public MaximumLiftSearch maximumLift(NonlinearWing wing, double fromAlpha, double step, double toAlpha) {
        requireAngle(fromAlpha);
        requireAngle(toAlpha);
        if (!(step > 0.0) || !(toAlpha > fromAlpha + step)) {
            throw new IllegalArgumentException("need a positive step and an end above the start plus one step");
        }
        Problem p = new Problem(wing, terms);
        List<Converged> branch = new ArrayList<>();
        Outcome first = p.newton(fromAlpha, new double[terms]);
        if (first.converged == null) {
            return new MaximumLiftNotFound("no solution at the first angle: " + first.failure.reason(), List.of());
        }
        if (first.converged.solution.stationsPastPeak() > 0) {
            return new MaximumLiftNotFound("a station is past its peak at the first angle; start lower",
                    List.of(first.converged.solution));
        }
        // Coarse steps while every station is below its peak.
        branch.add(first.converged);
        Converged lastClean = first.converged;
        while (lastClean.alpha < toAlpha) {
            Step s = p.step(lastClean, Math.min(step, toAlpha - lastClean.alpha), step / 8.0);
            if (s.next == null || s.next.solution.stationsPastPeak() > 0) {
                break; // the fine steps take over from the last clean point
            }
            lastClean = s.next;
            branch.add(lastClean);
        }
        // Fine steps from the last point with no station past its peak.
        Converged current = lastClean;
        Converged best = lastClean;
        Converged firstStalled = null;
        String end = null;
        Converged beforeBest = null; // CL rises while every station is below its peak: lastClean bounds the maximum
        Converged afterBest = null;
        while (afterBest == null) {
            if (current.alpha >= toAlpha) {
                return new MaximumLiftNotFound("CL still rises at " + Math.toDegrees(toAlpha) + " deg",
                        solutions(branch));
            }
            Step s = p.step(current, Math.min(FINE_STEP, toAlpha - current.alpha), FINE_STEP / 8.0);
            if (s.next == null) {
                end = s.end;
                break;
            }
            Converged next = s.next;
            branch.add(next);
            if (firstStalled == null && next.solution.stationsPastPeak() > 0) {
                firstStalled = next;
            }
            if (next.cl() >= best.cl()) {
                beforeBest = current;
                best = next;
            } else if (best == current) {
                afterBest = next;
            }
            current = next;
        }
        if (firstStalled == null && end != null) {
            return new MaximumLiftNotFound("the branch ends before any station passes its peak: " + end,
                    solutions(branch));
        }
        double low = beforeBest != null ? beforeBest.alpha : best.alpha;
        double high = afterBest != null ? afterBest.alpha : best.alpha + FINE_STEP / 8.0;
        Double firstStallAlpha = firstStalled == null ? null : firstStalled.alpha;
        Double firstStallEta = firstStalled == null ? null : p.mostPastPeakEta(firstStalled);
        Double firstStallLift = firstStalled == null ? null : firstStalled.cl();
        return new MaximumLift(best.cl(), best.alpha, low, high, afterBest == null ? end : null, best.solution,
                firstStallAlpha, firstStallEta, firstStallLift, solutions(branch), terms);
    }

    /**
     * Solves on a grid of angles twice: continuing upward from zero circulation at {@code fromAlpha}, and
     * downward from zero circulation at {@code toAlpha}. Between grid angles the step is halved (down to
     * 1/64 of the grid step) on a failure or a suspected jump; a jump that persists at the smallest step
     * is followed (the lift jumps there). After a failure the next angle starts again: upward from zero
     * circulation, downward from the upward solution at that angle if there is one. Where both directions
     * converge to different solutions, the equation has several solutions at that angle (hysteresis
     * between branches, or the close solutions past the peak that the class comment describes).
     *
     * @param step grid spacing [rad], positive; the grid runs from fromAlpha to toAlpha
     */
    public LiftSweep sweep(NonlinearWing wing, double fromAlpha, double toAlpha, double step) {
        requireAngle(fromAlpha);
        requireAngle(toAlpha);
        if (!(step > 0.0) || !(toAlpha > fromAlpha)) {
            throw new IllegalArgumentException("need a positive step and an end above the start");
        }
        int count = (int) Math.floor((toAlpha - fromAlpha) / step + 1e-9) + 1;
        if (count > 1000) {
            throw new IllegalArgumentException("at most 1000 angles in a sweep, got " + count);
        }
        double[] grid = new double[count];
        for (int i = 0; i < count; i++) {
            grid[i] = fromAlpha + i * step;
        }
        grid[count - 1] = Math.min(grid[count - 1], toAlpha);
        Problem p = new Problem(wing, terms);
        NonlinearPoint[] up = p.continuation(grid, step, false, null);
        NonlinearPoint[] down = p.continuation(grid, step, true, up);
        List<LiftSweep.Row> rows = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            rows.add(new LiftSweep.Row(grid[i], up[i], down[i], distinct(up[i], down[i])));
        }
        return new LiftSweep(rows, terms);
    }

    /** Two converged solutions differ when some coefficient differs by more than 1e-8 of the largest. */
    private static boolean distinct(NonlinearPoint x, NonlinearPoint y) {
        if (!(x instanceof NonlinearSolution s) || !(y instanceof NonlinearSolution t)) {
            return false;
        }
        double[] a = s.fourierCoefficients();
        double[] b = t.fourierCoefficients();
        double scale = 0.0;
        double diff = 0.0;
        for (int j = 0; j < a.length; j++) {
            scale = Math.max(scale, Math.max(Math.abs(a[j]), Math.abs(b[j])));
            diff = Math.max(diff, Math.abs(a[j] - b[j]));
        }
        return diff > 1e-8 * scale;
    }

    private static List<NonlinearSolution> solutions(List<Converged> branch) {
        List<NonlinearSolution> list = new ArrayList<>();
        for (Converged c : branch) {
            list.add(c.solution);
        }
        return List.copyOf(list);
    }

    private static double requireAngle(double alpha) {
        if (!Double.isFinite(alpha) || Math.abs(alpha) > Math.PI / 2.0) {
            throw new IllegalArgumentException("angle of attack must be a finite angle within 90 degrees, got "
                    + alpha + " rad");
        }
        return alpha;
    }

    /** A converged point with its coefficients and the branch tangent dA/dalpha (null if J is singular). */
    private record Converged(double alpha, double[] a, double[] tangent, NonlinearSolution solution) {
        double cl() {
            return solution.liftCoefficient();
        }
    }

    /** Newton's result: exactly one of the two is set. */
    private record Outcome(Converged converged, NonlinearFailure failure) {
        NonlinearPoint point() {
            return converged != null ? converged.solution : failure;
        }
    }

    /** One continuation step's converged point, or (null) why the branch ends there. */
    private record Step(Converged next, String end) {
    }

    /** A march's last converged point, or why it stopped. */
    private record March(Converged last, String failure) {
    }

    /** The discretized wing: everything that does not depend on the angle of attack or the coefficients. */
    private static final class Problem {
        final int n;
        final double aspectRatio;
        final double[] sinTheta;
        final double[] twist;
        final double[] q;
        final double[][] sines;
        final double[][] induced;
        final SectionLiftCurve[] curves;
        final double[] etaStation;
        final double[] share;
        final double residualScale;
        final int referenceSign;

        Problem(NonlinearWing wing, int n) {
            LiftingLineWing planform = wing.planform();
            this.n = n;
            this.aspectRatio = planform.aspectRatio();
            double b = planform.span();
            sinTheta = new double[n];
            twist = new double[n];
            q = new double[n];
            sines = new double[n][n];
            induced = new double[n][n];
            curves = new SectionLiftCurve[n];
            etaStation = new double[n];
            share = new double[n];
            double h = Math.PI / (2.0 * n);
            double scale = 0.0;
            double[][] reference = new double[n][n];
            for (int k = 0; k < n; k++) {
                double th = (k + 1) * h;
                double eta = k == n - 1 ? 0.0 : Math.cos(th);
                double s = Math.sin(th);
                double c = planform.chord().applyAsDouble(eta);
                if (!(c > 0.0) || !Double.isFinite(c)) {
                    throw new IllegalArgumentException("chord must be positive and finite at the stations, got " + c
                            + " m at eta = " + eta);
                }
                double eps = planform.twist().applyAsDouble(eta);
                if (!Double.isFinite(eps)) {
                    throw new IllegalArgumentException("twist at eta = " + eta + " is not finite (" + eps + ")");
                }
                SectionLiftCurve curve = wing.section().apply(eta);
                if (curve == null) {
                    throw new IllegalArgumentException("no section lift curve at eta = " + eta);
                }
                sinTheta[k] = s;
                twist[k] = eps;
                q[k] = c * s / (4.0 * b);
                curves[k] = curve;
                etaStation[k] = eta;
                scale = Math.max(scale, q[k]);
                for (int j = 0; j < n; j++) {
                    int order = 2 * j + 1;
                    double sn = Math.sin(order * th);
                    sines[k][j] = sn;
                    induced[k][j] = order * sn / s;
                    reference[k][j] = s * sn;
                }
                // Each station stands for the theta interval half-way to its neighbours; the first out to the tip.
                double lo = k == 0 ? 0.0 : th - 0.5 * h;
                double hi = k == n - 1 ? Math.PI / 2.0 : th + 0.5 * h;
                share[k] = Math.cos(lo) - Math.cos(hi);
            }
            residualScale = scale;
            referenceSign = new DenseLinearSolver(reference).determinantSign();
        }

        /** Effective angles at alpha for coefficients a; null if one falls outside its section's data. */
        double[] effectiveAngles(double alpha, double[] a, double[] inducedOut) {
            double[] ae = new double[n];
            for (int k = 0; k < n; k++) {
                double sum = 0.0;
                double[] row = induced[k];
                for (int j = 0; j < n; j++) {
                    sum += row[j] * a[j];
                }
                if (inducedOut != null) {
                    inducedOut[k] = sum;
                }
                double e = alpha + twist[k] - sum;
                if (!curves[k].covers(e)) {
                    return null;
                }
                ae[k] = e;
            }
            return ae;
        }

        /** Residuals at coefficients a whose effective angles are ae. */
        double[] residual(double[] a, double[] ae) {
            double[] r = new double[n];
            for (int k = 0; k < n; k++) {
                double sum = 0.0;
                double[] row = sines[k];
                for (int j = 0; j < n; j++) {
                    sum += row[j] * a[j];
                }
                r[k] = sinTheta[k] * sum - q[k] * curves[k].cl(ae[k]);
            }
            return r;
        }

        double[][] jacobian(double[] ae) {
            double[][] jac = new double[n][n];
            for (int k = 0; k < n; k++) {
                double s = sinTheta[k];
                double m = q[k] * curves[k].slope(ae[k]) / s;
                for (int j = 0; j < n; j++) {
                    jac[k][j] = sines[k][j] * (s + (2 * j + 1) * m);
                }
            }
            return jac;
        }

        double tolerance(double[] ae) {
            double clScale = 1.0;
            for (int k = 0; k < n; k++) {
                clScale = Math.max(clScale, Math.abs(curves[k].cl(ae[k])));
            }
            return TOLERANCE * residualScale * clScale;
        }

        Outcome newton(double alpha, double[] start) {
            double[] a = start.clone();
            double[] ae = effectiveAngles(alpha, a, null);
            if (ae == null) {
                return fail(alpha, "the starting circulation puts a station outside its section data", 0);
            }
            double[] r = residual(a, ae);
            for (int it = 0; it <= MAX_ITERATIONS; it++) {
                double tol = tolerance(ae);
                if (maxAbs(r) <= tol) {
                    return new Outcome(finish(alpha, a, ae, it, maxAbs(r) / tol * TOLERANCE), null);
                }
                if (it == MAX_ITERATIONS) {
                    break;
                }
                double[][] jac = jacobian(ae);
                double norm = norm2(r);
                double[] accepted = null;
                try {
                    double[] step = new DenseLinearSolver(jac).solve(r);
                    for (double lambda = 1.0; lambda >= MIN_DAMPING && accepted == null; lambda *= 0.5) {
                        accepted = tryStep(alpha, a, step, lambda, (1.0 - 1e-4 * lambda) * norm);
                    }
                } catch (IllegalArgumentException singular) {
                    accepted = null;
                }
                if (accepted == null) {
                    accepted = levenbergMarquardtStep(alpha, a, r, jac, norm);
                }
                if (accepted == null) {
                    return fail(alpha, "neither a damped Newton step nor a Levenberg-Marquardt step reduces the "
                            + "residual (iteration " + it + ", residual " + maxAbs(r) / tol * TOLERANCE
                            + " relative)", it);
                }
                a = accepted;
                ae = effectiveAngles(alpha, a, null);
                r = residual(a, ae);
            }
            return fail(alpha, "no convergence in " + MAX_ITERATIONS + " iterations (residual "
                    + maxAbs(r) / tolerance(ae) * TOLERANCE + " relative)", MAX_ITERATIONS);
        }

        /** a - lambda * step if its residual norm is at most {@code bound} (and every station in its data). */
        private double[] tryStep(double alpha, double[] a, double[] step, double lambda, double bound) {
            double[] trial = new double[n];
            for (int j = 0; j < n; j++) {
                trial[j] = a[j] - lambda * step[j];
            }
            double[] trialAe = effectiveAngles(alpha, trial, null);
            if (trialAe == null || !(norm2(residual(trial, trialAe)) < bound)) {
                return null;
            }
            return trial;
        }

        /**
         * Where the Newton step fails (a Jacobian near singular past a section's peak), a step of
         * Levenberg-Marquardt, (J^T J + mu I) step = J^T R, always a descent direction for |R|^2; mu starts at
         * 1e-6 of the largest diagonal entry of J^T J and grows tenfold until the residual falls.
         */
        private double[] levenbergMarquardtStep(double alpha, double[] a, double[] r, double[][] jac, double norm) {
            double[][] normal = new double[n][n];
            double[] g = new double[n];
            double diag = 0.0;
            for (int i = 0; i < n; i++) {
                for (int j = i; j < n; j++) {
                    double sum = 0.0;
                    for (int k = 0; k < n; k++) {
                        sum += jac[k][i] * jac[k][j];
                    }
                    normal[i][j] = sum;
                    normal[j][i] = sum;
                }
                double gi = 0.0;
                for (int k = 0; k < n; k++) {
                    gi += jac[k][i] * r[k];
                }
                g[i] = gi;
                diag = Math.max(diag, normal[i][i]);
            }
            for (double mu = 1e-6 * diag; mu <= 1e6 * diag; mu *= 10.0) {
                double[][] m = new double[n][];
                for (int i = 0; i < n; i++) {
                    m[i] = normal[i].clone();
                    m[i][i] += mu;
                }
                double[] step;
                try {
                    step = new DenseLinearSolver(m).solve(g);
                } catch (IllegalArgumentException singular) {
                    continue;
                }
                double[] trial = tryStep(alpha, a, step, 1.0, norm);
                if (trial != null) {
                    return trial;
                }
            }
            return null;
        }

        private static Outcome fail(double alpha, String reason, int iterations) {
            return new Outcome(null, new NonlinearFailure(alpha, reason, iterations));
        }

        /** Builds the solution (root first) with the index and the branch tangent from the final Jacobian. */
        Converged finish(double alpha, double[] a, double[] ae, int iterations, double residual) {
            double[] inducedAngle = new double[n];
            effectiveAngles(alpha, a, inducedAngle);
            int index;
            double[] tangent = null;
            try {
                DenseLinearSolver lu = new DenseLinearSolver(jacobian(ae));
                index = lu.determinantSign() * referenceSign;
                double[] dr = new double[n];
                for (int k = 0; k < n; k++) {
                    dr[k] = q[k] * curves[k].slope(ae[k]);
                }
                tangent = lu.solve(dr);
            } catch (IllegalArgumentException singular) {
                index = 0;
            }
            double cl = Math.PI * aspectRatio * a[0];
            double sumNA2 = 0.0;
            for (int j = 0; j < n; j++) {
                sumNA2 += (2 * j + 1) * a[j] * a[j];
            }
            double cdi = Math.PI * aspectRatio * sumNA2;
            double[] eta = new double[n];
            double[] sectionCl = new double[n];
            double[] effective = new double[n];
            double[] inducedOut = new double[n];
            boolean[] past = new boolean[n];
            double stalled = 0.0;
            for (int i = 0; i < n; i++) {
                int k = n - 1 - i;
                eta[i] = etaStation[k];
                double sum = 0.0;
                for (int j = 0; j < n; j++) {
                    sum += sines[k][j] * a[j];
                }
                sectionCl[i] = sum * sinTheta[k] / q[k];
                effective[i] = ae[k];
                inducedOut[i] = inducedAngle[k];
                past[i] = curves[k].isPastPeak(ae[k]);
                if (past[i]) {
                    stalled += share[k];
                }
            }
            Double slope = tangent == null ? null : Math.PI * aspectRatio * tangent[0];
            NonlinearSolution solution = new NonlinearSolution(alpha, cl, cdi, slope, a, eta, sectionCl, effective,
                    inducedOut, past, stalled, index, iterations, residual);
            return new Converged(alpha, a.clone(), tangent, solution);
        }

        /**
         * One continuation step upward by h from a converged point, halved down to {@code minStep} on a
         * failure or a suspected jump; never accepts a jump (the branch ends there instead).
         */
        Step step(Converged from, double h, double minStep) {
            String why = null;
            for (double s = h; s >= minStep * 0.999999; s /= 2.0) {
                double next = from.alpha + s;
                double[] predictor = predict(from, next);
                Outcome o = newton(next, predictor);
                if (o.converged == null) {
                    why = "no solution at " + Math.toDegrees(next) + " deg continuing from "
                            + Math.toDegrees(from.alpha) + " deg: " + o.failure.reason();
                } else if (jumped(from, predictor, o.converged)) {
                    why = "the solution at " + Math.toDegrees(next) + " deg lies far from the continuation of the "
                            + "branch at " + Math.toDegrees(from.alpha) + " deg (another branch)";
                } else {
                    return new Step(o.converged, null);
                }
            }
            return new Step(null, why);
        }

        double[] predict(Converged from, double alpha) {
            double[] predictor = from.a.clone();
            if (from.tangent != null) {
                for (int j = 0; j < n; j++) {
                    predictor[j] += (alpha - from.alpha) * from.tangent[j];
                }
            }
            return predictor;
        }

        /**
         * Whether the corrector moved the coefficients more than JUMP_RATIO of the predictor's move, or of
         * |dalpha| max|A| (per radian) where the branch's tangent is small (near a maximum of the lift).
         */
        boolean jumped(Converged from, double[] predictor, Converged to) {
            double predicted = 0.0;
            double corrected = 0.0;
            double size = 0.0;
            for (int j = 0; j < n; j++) {
                predicted = Math.max(predicted, Math.abs(predictor[j] - from.a[j]));
                corrected = Math.max(corrected, Math.abs(to.a[j] - predictor[j]));
                size = Math.max(size, Math.abs(from.a[j]));
            }
            double move = Math.max(predicted, Math.abs(to.alpha - from.alpha) * size);
            return corrected > JUMP_RATIO * move + 1e-9 * size + 1e-15;
        }

        /**
         * Continues from a converged point to the target angle in steps of at most {@code step}, halving the
         * step on a failure or a suspected jump; every converged point is put into {@code branch}.
         */
        March march(Converged from, double target, double step) {
            Converged current = from;
            double h = Math.min(step, Math.abs(target - from.alpha));
            double minStep = step / (1 << MAX_STEP_HALVINGS);
            double direction = Math.signum(target - from.alpha);
            while (Math.abs(target - current.alpha) > 0.0) {
                double remaining = Math.abs(target - current.alpha);
                double next = h >= remaining ? target : current.alpha + direction * h;
                double[] predictor = predict(current, next);
                Outcome o = newton(next, predictor);
                boolean jump = o.converged != null && jumped(current, predictor, o.converged);
                boolean canHalve = Math.min(h, remaining) > minStep * 1.000001;
                if ((o.converged == null || jump) && canHalve) {
                    h = Math.min(h, remaining) / 2.0;
                    continue;
                }
                if (o.converged == null) {
                    return new March(null, "no solution at " + Math.toDegrees(next) + " deg with the continuation "
                            + "step cut to " + Math.toDegrees(minStep) + " deg: " + o.failure.reason());
                }
                current = o.converged;
                h = Math.min(step, 2.0 * h);
            }
            return new March(current, null);
        }

        /**
         * Continuation over a grid, upward or (reversed) downward: the first angle starts from zero
         * circulation, the angle after a failure from the other direction's solution there if it has one
         * (else from zero circulation); the others continue from the previous angle's solution.
         */
        NonlinearPoint[] continuation(double[] grid, double step, boolean downward, NonlinearPoint[] other) {
            int count = grid.length;
            NonlinearPoint[] out = new NonlinearPoint[count];
            Converged current = null;
            for (int s = 0; s < count; s++) {
                int i = downward ? count - 1 - s : s;
                if (current == null) {
                    double[] start = other != null && other[i] instanceof NonlinearSolution o
                            ? o.fourierCoefficients() : new double[n];
                    Outcome o = newton(grid[i], start);
                    out[i] = o.point();
                    current = o.converged;
                    continue;
                }
                March m = march(current, grid[i], step);
                if (m.failure != null) {
                    out[i] = new NonlinearFailure(grid[i], m.failure, 0);
                    current = null;
                } else {
                    current = m.last;
                    out[i] = current.solution;
                }
            }
            return out;
        }

        /** eta of the station furthest past its peak (in effective angle). */
        double mostPastPeakEta(Converged c) {
            double[] ae = c.solution.effectiveAngle();
            double best = Double.NEGATIVE_INFINITY;
            double eta = Double.NaN;
            for (int i = 0; i < n; i++) {
                int k = n - 1 - i;
                double margin = ae[i] - curves[k].peakAngle();
                if (margin > best) {
                    best = margin;
                    eta = etaStation[k];
                }
            }
            return eta;
        }
    }

    private static double maxAbs(double[] v) {
        double m = 0.0;
        for (double x : v) {
            m = Math.max(m, Math.abs(x));
        }
        return m;
    }

    private static double norm2(double[] v) {
        double s = 0.0;
        for (double x : v) {
            s += x * x;
        }
        return Math.sqrt(s);
    }
}
