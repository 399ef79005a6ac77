package org.spanlift.validation.nonlinear;

import java.util.List;

/**
 * The nonlinear lifting-line equation on a grid of angles, continued upward from the lowest angle and
 * downward from the highest (each started from zero circulation).
 *
 * @param rows one per angle, in increasing angle
 * @param terms number of Fourier terms
 */
public record LiftSweep(List<Row> rows, int terms) {

    /** Copies the list. */
    public LiftSweep {
        rows = List.copyOf(rows);
    }

    /**
     * One angle of the grid.
     *
     * @param alpha angle of attack of the root chord [rad]
     * @param upward the point reached continuing upward
     * @param downward the point reached continuing downward
     * @param multiple whether both converged to different solutions (some Fourier coefficient differs by
     *     more than 1e-8 of the largest)
     */
    public record Row(double alpha, NonlinearPoint upward, NonlinearPoint downward, boolean multiple) {
    }

    /** Whether two different solutions were found at some angle. */
    public boolean anyMultiple() {
        return rows.stream().anyMatch(Row::multiple);
    }
}
