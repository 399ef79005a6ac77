package org.spanlift.validation.nonlinear;

/**
 * The nonlinear lifting-line iteration did not converge at this angle of attack.
 *
 * @param alpha angle of attack of the root chord [rad]
 * @param reason why: the iteration limit, a step that no damping could make reduce the residual, a
 *     singular Jacobian, or an effective angle outside a section's data
 * @param iterations Newton iterations done
 */
public record NonlinearFailure(double alpha, String reason, int iterations) implements NonlinearPoint {

    @Override
    public boolean converged() {
        return false;
    }
}
