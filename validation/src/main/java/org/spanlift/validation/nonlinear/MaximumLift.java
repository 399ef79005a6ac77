package org.spanlift.validation.nonlinear;

import java.util.List;

/**
 * The largest CL on the branch that continues the attached-flow solution upward in angle of attack.
 * Angles in radians.
 *
 * <p>Two kinds: a maximum inside the branch ({@code endOfBranch} null), with a converged solution of lower
 * CL on each side, {@code bracketLow} and {@code bracketHigh}; or CL still rising where the branch ends
 * ({@code endOfBranch} says why): no solution continues the branch at the smallest step, because the branch
 * turns back at a fold (the lift then jumps to another branch: an abrupt stall) or because the iteration
 * failed there. In the second case clMax is the last converged CL, a lower bound of the branch's maximum
 * should the failure be the iteration's.
 *
 * @param clMax the largest CL on the branch
 * @param alphaAtClMax the angle of attack where it was found
 * @param bracketLow the preceding point of the branch
 * @param bracketHigh the following point (a maximum inside the branch), or the angle at which the branch
 *     was found to end; at most 0.04 degree from bracketLow
 * @param endOfBranch why the branch ends just above the maximum, or null for a maximum inside the branch
 * @param atMaximum the solution at alphaAtClMax
 * @param firstStallAlpha the first angle of the fine steps at which a station is past its section's peak,
 *     or null if the branch ended before
 * @param firstStallEta eta of the station furthest past its peak there (null as above)
 * @param firstStallLift CL there (null as above)
 * @param branch every converged solution of the branch, in increasing angle of attack
 * @param terms number of Fourier terms
 */
public record MaximumLift(
        double clMax,
        double alphaAtClMax,
        double bracketLow,
        double bracketHigh,
        String endOfBranch,
        NonlinearSolution atMaximum,
        Double firstStallAlpha,
        Double firstStallEta,
        Double firstStallLift,
        List<NonlinearSolution> branch,
        int terms) implements MaximumLiftSearch {

    /** Copies the list. */
    public MaximumLift {
        branch = List.copyOf(branch);
    }

    @Override
    public boolean found() {
        return true;
    }

    /** Whether the maximum lies inside the branch (CL converged lower on both sides). */
    public boolean insideBranch() {
        return endOfBranch == null;
    }
}
