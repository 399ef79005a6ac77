package org.spanlift.validation.liftingline;

/**
 * The result of Prandtl's lifting-line equation for one wing at one angle of attack, solved with Glauert's
 * Fourier series Gamma(theta) = 2 b V sum A_n sin(n theta), n odd, eta = 2y/b = cos theta.
 *
 * <p>Angles are radians, lengths metres; coefficients use the wing's reference area S and aspect ratio
 * A = b^2/S. The angle of attack is that of the root-chord reference line (twist measured from it).
 * Span-efficiency quantities follow the project convention: where |CL| &lt; {@link #EFFICIENCY_MIN_CL}
 * (with washout e tends to 0, not 1, near zero lift) {@code spanEfficiency} and
 * {@code inducedDragFactor} are {@code null}, never NaN.
 *
 * <p>The span-load arrays share one index: the collocation stations, ordered from the root (eta = 0)
 * toward the tip (the outermost station lies short of the tip, where the load vanishes).
 * They are copied on the way in and out.
 *
 * @param alpha angle of attack of the root chord [rad]
 * @param liftCoefficient CL = pi A A_1
 * @param inducedDragCoefficient CDi = pi A sum n A_n^2
 * @param spanEfficiency e = CL^2 / (pi A CDi) = 1/(1 + delta), or null where |CL| &lt; 0.05
 * @param inducedDragFactor Glauert's delta = sum over n &gt;= 3 of n (A_n/A_1)^2, or null where |CL| &lt; 0.05
 * @param additionalInducedDragFactor delta of the additional load alone (the load per unit angle of
 *     attack, twist and section zero-lift angles removed); for an untwisted wing of one section it equals
 *     {@code inducedDragFactor} at every lift; always defined
 * @param liftSlope dCL/dalpha at zero lift [1/rad] (CL is exactly linear in alpha here)
 * @param liftSlopeFactor Glauert's tau, from a = a0 / (1 + (a0/(pi A))(1 + tau)); null unless the section
 *     lift slope a0 is the same at every station
 * @param zeroLiftAngle angle of attack of the root chord at which CL = 0 [rad]
 * @param fourierCoefficients A_1, A_3, A_5, ... at this angle of attack (non-dimensional)
 * @param eta stations 2y/b
 * @param chordTimesSectionLift c * cl [m] at the stations (= 2 Gamma / V)
 * @param sectionLift section lift coefficient cl at the stations
 * @param circulation Gamma / (V b) at the stations
 */
public record LiftingLineSolution(
        double alpha,
        double liftCoefficient,
        double inducedDragCoefficient,
        Double spanEfficiency,
        Double inducedDragFactor,
        double additionalInducedDragFactor,
        double liftSlope,
        Double liftSlopeFactor,
        double zeroLiftAngle,
        double[] fourierCoefficients,
        double[] eta,
        double[] chordTimesSectionLift,
        double[] sectionLift,
        double[] circulation) {

    /** Smallest |CL| at which the span efficiency and Glauert's delta are reported. */
    public static final double EFFICIENCY_MIN_CL = 0.05;

    /**
     * Copies the arrays and checks that every number is finite and that the span-load arrays agree in
     * length.
     *
     * @throws IllegalArgumentException otherwise
     */
    public LiftingLineSolution {
        requireFinite(alpha, "alpha");
        requireFinite(liftCoefficient, "lift coefficient");
        requireFinite(inducedDragCoefficient, "induced drag coefficient");
        if (spanEfficiency != null) {
            requireFinite(spanEfficiency, "span efficiency");
        }
        if (inducedDragFactor != null) {
            requireFinite(inducedDragFactor, "induced drag factor");
        }
        requireFinite(additionalInducedDragFactor, "additional induced drag factor");
        requireFinite(liftSlope, "lift slope");
        if (liftSlopeFactor != null) {
            requireFinite(liftSlopeFactor, "lift slope factor");
        }
        requireFinite(zeroLiftAngle, "zero-lift angle");
        fourierCoefficients = copyFinite(fourierCoefficients, "Fourier coefficients");
        eta = copyFinite(eta, "eta");
        chordTimesSectionLift = copyFinite(chordTimesSectionLift, "c*cl");
        sectionLift = copyFinite(sectionLift, "cl");
        circulation = copyFinite(circulation, "circulation");
        int n = eta.length;
        if (chordTimesSectionLift.length != n || sectionLift.length != n || circulation.length != n) {
            throw new IllegalArgumentException("span-load arrays differ in length");
        }
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

    /** c * cl [m] at the stations (a copy). */
    @Override
    public double[] chordTimesSectionLift() {
        return chordTimesSectionLift.clone();
    }

    /** Section cl at the stations (a copy). */
    @Override
    public double[] sectionLift() {
        return sectionLift.clone();
    }

    /** Gamma / (V b) at the stations (a copy). */
    @Override
    public double[] circulation() {
        return circulation.clone();
    }

    private static void requireFinite(double v, String what) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " is not finite: " + v);
        }
    }

    private static double[] copyFinite(double[] values, String what) {
        if (values == null) {
            throw new IllegalArgumentException(what + " missing");
        }
        double[] copy = values.clone();
        for (double v : copy) {
            requireFinite(v, what);
        }
        return copy;
    }
}
