package org.spanlift.structure;

/**
 * A concentrated mass on the right half-wing, mirrored on the left (so the aircraft carries it twice), such
 * as the fuel in a wing tank.
 *
 * @param name a label for the outputs
 * @param mass the mass on one side, kg (not negative)
 * @param x    its chordwise position in wing axes (x aft), m
 * @param y    its spanwise position, m, between the root (exclusive) and the tip
 */
public record PointMass(String name, double mass, double x, double y) {

    /** Checks that the mass is finite and not negative and the position finite. */
    public PointMass {
        if (!(mass >= 0) || !Double.isFinite(mass)) {
            throw new IllegalArgumentException("a point mass must not be negative");
        }
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("a point mass needs a finite position");
        }
    }
}
