package org.spanlift.validation.nonlinear;

import java.util.List;

/**
 * The outcome of a search for the maximum lift coefficient: a {@link MaximumLift} found between converged
 * solutions on both sides, or a {@link MaximumLiftNotFound} that carries no CL_max.
 */
public sealed interface MaximumLiftSearch permits MaximumLift, MaximumLiftNotFound {

    /** The converged solutions of the upward branch, in increasing angle of attack. */
    List<NonlinearSolution> branch();

    /** Whether a maximum was found. */
    boolean found();
}
