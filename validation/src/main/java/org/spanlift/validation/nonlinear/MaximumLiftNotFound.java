package org.spanlift.validation.nonlinear;

import java.util.List;

/**
 * No maximum lift: the continuation failed, or CL still rose at the end of the sweep.
 *
 * @param reason why
 * @param branch the converged solutions reached, in increasing angle of attack
 */
public record MaximumLiftNotFound(String reason, List<NonlinearSolution> branch) implements MaximumLiftSearch {

    /** Copies the list. */
    public MaximumLiftNotFound {
        branch = List.copyOf(branch);
    }

    @Override
    public boolean found() {
        return false;
    }
}
