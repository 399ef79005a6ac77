package org.spanlift.validation.nonlinear;

/**
 * The outcome of the nonlinear lifting-line equation at one angle of attack: a converged
 * {@link NonlinearSolution}, or a {@link NonlinearFailure} that carries no lift at all, so that an
 * unconverged iterate can never be read as an answer.
 */
public sealed interface NonlinearPoint permits NonlinearSolution, NonlinearFailure {

    /** Angle of attack of the root chord [rad]. */
    double alpha();

    /** Whether the iteration converged. */
    boolean converged();
}
