package org.spanlift.washout;

import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.geometry.Wing;
import org.spanlift.stall.MaximumLift;
import org.spanlift.stall.StallEstimate;

/**
 * The wing at one washout. Angles in radians.
 *
 * @param washout       root twist minus tip twist
 * @param change        the change to the file's washout
 * @param wing          the wing with that washout
 * @param onset         the stall onset (critical-section method)
 * @param stallSpeed    the stall speed at the onset, equivalent airspeed, m/s, with a weight
 * @param maximum       the maximum lift, where a requirement needed it
 * @param cruiseE       span efficiency at the cruise CL
 * @param cruiseDrag    induced drag coefficient at the cruise CL
 */
public record WashoutPoint(double washout, double change, Wing wing, StallEstimate onset, OptionalDouble stallSpeed,
        Optional<MaximumLift> maximum, OptionalDouble cruiseE, double cruiseDrag) {
}
