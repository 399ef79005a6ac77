package org.spanlift.geometry;

/**
 * A plain trailing-edge control: spanwise from y = from to y = to (metres, on the described half), with
 * its chord a fixed fraction of the local chord. The deflection is in radians, positive trailing edge
 * down; for an aileron it is the right one's.
 */
public record ControlSurface(String name, ControlKind kind, double from, double to, double chordFraction,
        double deflection) {

    /** The hinge line as a fraction of the local chord from the leading edge. */
    public double hingeFraction() {
        return 1 - chordFraction;
    }
}
