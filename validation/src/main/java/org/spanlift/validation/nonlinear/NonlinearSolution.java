package org.spanlift.validation.nonlinear;

/**
 * A converged solution of the nonlinear lifting-line equation at one angle of attack.
 *
 * <p>The circulation is Glauert's series Gamma = 2 b V sum A_n sin(n theta), n odd, eta = 2y/b =
 * cos theta, as in the linear solver; CL = pi A A_1 and CDi = pi A sum n A_n^2 hold whatever the section
 * data (they depend on the circulation alone). Angles are radians.
 *
 * <p>The station arrays share one index, the collocation stations from the root (eta = 0) toward the tip;
 * they are copied on the way in and out.
 *
 * <p>{@code index} is the sign of the Jacobian's determinant at the solution relative to its sign with
 * every section slope zero (the plain collocation matrix of the sine series). With positive slopes the
 * Jacobian is the linear solver's matrix, and the index is +1 (the tests check it on the wings they use).
 * -1 means the solution lies on a branch that has
 * crossed an odd number of folds or bifurcations, so other solutions exist close by (a sign, not a
 * count); +1 does not prove the solution unique. 0 means the Jacobian is singular to working precision
 * at the solution. Past a section's peak the index changes with the number of terms (the solver's class
 * comment says why).
 *
 * @param alpha angle of attack of the root chord [rad]
 * @param liftCoefficient CL = pi A A_1
 * @param inducedDragCoefficient CDi = pi A sum n A_n^2
 * @param liftSlope dCL/dalpha along this branch at this point [1/rad], or null where the Jacobian is singular
 * @param fourierCoefficients A_1, A_3, ...
 * @param eta stations 2y/b, root to tip
 * @param sectionLift section cl at the stations (= 2 Gamma / (V c), which the section curve gives at the
 *     effective angle to the convergence tolerance)
 * @param effectiveAngle alpha_eff = alpha + twist - induced angle at the stations
 * @param inducedAngle induced angle at the stations, positive when it lowers the effective angle
 * @param pastPeak whether each station's effective angle lies beyond its section curve's peak
 * @param stalledSpanFraction the share of the half span whose stations are past their peak: each station
 *     stands for the theta interval half-way to its neighbours (the outermost one out to the tip)
 * @param index +1, -1 or 0 (above)
 * @param iterations Newton iterations taken
 * @param residual largest residual left, relative to the residuals' scale (at most
 *     {@link NonlinearLiftingLineSolver#TOLERANCE})
 */
public record NonlinearSolution(
        double alpha,
        double liftCoefficient,
        double inducedDragCoefficient,
        Double liftSlope,
        double[] fourierCoefficients,
        double[] eta,
        double[] sectionLift,
        double[] effectiveAngle,
        double[] inducedAngle,
        boolean[] pastPeak,
        double stalledSpanFraction,
        int index,
        int iterations,
        double residual) implements NonlinearPoint {

    /** Copies the arrays and checks that they agree in length and hold finite numbers. */
    public NonlinearSolution {
        fourierCoefficients = finiteCopy(fourierCoefficients, "Fourier coefficients");
        eta = finiteCopy(eta, "eta");
        sectionLift = finiteCopy(sectionLift, "cl");
        effectiveAngle = finiteCopy(effectiveAngle, "effective angle");
        inducedAngle = finiteCopy(inducedAngle, "induced angle");
        pastPeak = pastPeak.clone();
        int n = eta.length;
        if (sectionLift.length != n || effectiveAngle.length != n || inducedAngle.length != n
                || pastPeak.length != n || fourierCoefficients.length != n) {
            throw new IllegalArgumentException("station arrays differ in length");
        }
        if (!Double.isFinite(liftCoefficient) || !Double.isFinite(inducedDragCoefficient)
                || (liftSlope != null && !Double.isFinite(liftSlope))) {
            throw new IllegalArgumentException("a wing coefficient is not finite");
        }
    }

    @Override
    public boolean converged() {
        return true;
    }

    /** Number of stations past their section's peak. */
    public int stationsPastPeak() {
        int count = 0;
        for (boolean p : pastPeak) {
            if (p) {
                count++;
            }
        }
        return count;
    }

    /** A_1, A_3, ... (a copy). */
    @Override
    public double[] fourierCoefficients() {
        return fourierCoefficients.clone();
    }

    /** Stations 2y/b, root to tip (a copy). */
    @Override
    public double[] eta() {
        return eta.clone();
    }

    /** Section cl at the stations (a copy). */
    @Override
    public double[] sectionLift() {
        return sectionLift.clone();
    }

    /** Effective angles at the stations [rad] (a copy). */
    @Override
    public double[] effectiveAngle() {
        return effectiveAngle.clone();
    }

    /** Induced angles at the stations [rad] (a copy). */
    @Override
    public double[] inducedAngle() {
        return inducedAngle.clone();
    }

    /** Whether each station is past its peak (a copy). */
    @Override
    public boolean[] pastPeak() {
        return pastPeak.clone();
    }

    private static double[] finiteCopy(double[] values, String what) {
        if (values == null) {
            throw new IllegalArgumentException(what + " missing");
        }
        double[] copy = values.clone();
        for (double v : copy) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException(what + " not finite: " + v);
            }
        }
        return copy;
    }
}
