package org.spanlift.stall;

/**
 * One solution of {@link SectionCoupling} at an angle of attack, or the reason there is none. Only a
 * converged point carries a lift; an unconverged one is never reported as a result.
 *
 * @param alpha          angle of attack, rad
 * @param status         converged, or why not
 * @param lift           the wing's (first surface's) CL on the reference area; for a wing alone the whole
 *                       lattice's (NaN unless converged)
 * @param corrections    incidence correction per unknown, rad (the last iterate when not converged)
 * @param cl             section cl per unknown
 * @param sectionAngles  effective section angle of attack per unknown, rad
 * @param stableJacobian true when the Jacobian's determinant is positive, as on the linear branch; a change
 *                       of sign along a branch marks a fold or a branch point (another solution nearby)
 * @param iterations     Newton steps taken
 */
public record CoupledPoint(double alpha, Status status, double lift, double[] corrections, double[] cl,
        double[] sectionAngles, boolean stableJacobian, int iterations) {

    /** How a solve ended. */
    public enum Status {
        /** Every residual within {@link SectionCoupling#TOLERANCE}. */
        CONVERGED,
        /** Newton's method did not converge (past a fold of the branch, typically). */
        NOT_CONVERGED,
        /** Some strip's effective angle passed the end of its tabulated section curve. */
        CURVE_ENDS
    }

    /** Copies the arrays. */
    public CoupledPoint {
        corrections = corrections.clone();
        cl = cl.clone();
        sectionAngles = sectionAngles.clone();
    }

    static CoupledPoint failed(double alpha, Status status, double[] last) {
        return new CoupledPoint(alpha, status, Double.NaN, last, new double[0], new double[0], false, 0);
    }

    /** True when the solve converged. */
    public boolean converged() {
        return status == Status.CONVERGED;
    }

    /** A copy of the incidence corrections per unknown, rad. */
    @Override
    public double[] corrections() {
        return corrections.clone();
    }

    /** A copy of the section cl per unknown. */
    @Override
    public double[] cl() {
        return cl.clone();
    }

    /** A copy of the effective section angles of attack per unknown, rad. */
    @Override
    public double[] sectionAngles() {
        return sectionAngles.clone();
    }

    /** Section cl of unknown i. */
    public double cl(int i) {
        return cl[i];
    }

    /** Effective section angle of unknown i, rad. */
    public double sectionAngle(int i) {
        return sectionAngles[i];
    }
}
