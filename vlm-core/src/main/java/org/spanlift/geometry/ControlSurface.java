package org.spanlift.geometry;

import java.util.Optional;

/**
 * A plain trailing-edge control: spanwise from y = from to y = to (metres, on the described half), with
 * its chord a fixed fraction of the local chord. The deflection is in radians, positive trailing edge
 * down; for an aileron it is the right one's. The limits, when given, are its travel.
 *
 * @param name          the control's name
 * @param kind          flap, aileron or elevator
 * @param from          spanwise start y, m
 * @param to            spanwise end y, m
 * @param chordFraction its chord over the local chord
 * @param deflection    rad, positive trailing edge down (the right aileron's)
 * @param limits        its travel, if given
 */
public record ControlSurface(String name, ControlKind kind, double from, double to, double chordFraction,
        double deflection, Optional<DeflectionLimits> limits) {

    /** A control without stated limits. */
    public ControlSurface(String name, ControlKind kind, double from, double to, double chordFraction,
            double deflection) {
        this(name, kind, from, to, chordFraction, deflection, Optional.empty());
    }

    /** The hinge line as a fraction of the local chord from the leading edge. */
    public double hingeFraction() {
        return 1 - chordFraction;
    }
}
