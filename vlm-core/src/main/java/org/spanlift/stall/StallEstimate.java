package org.spanlift.stall;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.solve.LiftCurve;

/**
 * Stall onset of the wing by the critical-section method in linear theory: the lowest CL at which some
 * strip of the wing (the first surface; other surfaces are never stall candidates) reaches its cl_max. Angles in
 * radians, lengths in metres.
 *
 * @param lift                 CL at stall onset: the wing's, or where the wing file has other surfaces, the
 *                             configuration's (wing and other surfaces, untrimmed, at the deflections given);
 *                             the stall speeds rest on it
 * @param wingLift             the wing's own CL at stall onset (the first surface's lift on the reference
 *                             area, from the solution at the onset); equal to {@code lift} for a wing alone
 * @param alpha                angle of attack at stall onset
 * @param y                    spanwise station where stall starts (the right-hand one of a symmetric pair)
 * @param eta                  that station over the semi-span
 * @param section              the section nearest to it
 * @param aileronMargin        the least cl_max - cl over the aileron span at onset, and where; absent
 *                             without ailerons
 * @param halfSpanLift         the wing CL at which half the span has reached cl_max (linear theory, an
 *                             indication of how the stall spreads); absent if it never does
 * @param strips               every strip of the wing, y ascending
 * @param assumedClMax         true when some section's cl_max was assumed rather than given
 * @param defaultFlapIncrement true when a flapped strip used the handbook default cl_max increment
 * @param besideControlEnd     the end of a deflected control of the wing on an edge of the onset strip, if
 *                             any. Linear theory concentrates a deflected control's lift in a peak at
 *                             its ends, narrower than the chord; an onset found there falls as the strips
 *                             are refined and says more about the control's end than about the wing
 * @param line                 the wing's lift line on which the onset lies: linear theory with the flaps and
 *                             ailerons at their handbook lift
 * @param pointedTipFrom       where strips of a chord under {@link StallAnalysis#POINTED_TIP_CHORD} of the mean
 *                             aerodynamic chord begin (|y|, toward a tip ending in a point): they are left out
 *                             of the onset; absent when there are none
 */
public record StallEstimate(double lift, double wingLift, double alpha, double y, double eta, String section,
        Optional<AileronMargin> aileronMargin, OptionalDouble halfSpanLift, List<StripStall> strips,
        boolean assumedClMax, boolean defaultFlapIncrement, Optional<ControlEnd> besideControlEnd, LiftCurve line,
        OptionalDouble pointedTipFrom) {

    /** Copies the strips. */
    public StallEstimate {
        strips = List.copyOf(strips);
    }

    /** The strip where stall starts (the right-hand one of a symmetric pair). */
    public StripStall onsetStrip() {
        return strips.stream().filter(s -> Math.abs(s.y() - y) < 1e-12).findFirst()
                .orElseThrow(() -> new IllegalStateException("the onset station is not a strip"));
    }

    /**
     * A side edge of a control beside the onset strip.
     *
     * @param control        the control's name
     * @param y              the y of that end (as in the wing file)
     * @param firstOnControl the lowest wing CL at which a strip within the control's span reaches cl_max,
     *                       and that strip's y; unlike the onset beside the end, it settles as the lattice is
     *                       refined. Absent if none does
     */
    public record ControlEnd(String control, double y, Optional<Reach> firstOnControl) {
    }

    /**
     * A wing CL at which a strip reaches its cl_max, and the strip's y (the right-hand one).
     *
     * @param lift the wing CL
     * @param y    the strip's y (the right-hand one), m
     */
    public record Reach(double lift, double y) {
    }

    /**
     * The smallest margin to cl_max over the aileron span.
     *
     * @param dcl the smallest cl_max - cl over the aileron span
     * @param y   where it is, m
     */
    public record AileronMargin(double dcl, double y) {
    }

    /**
     * One strip at stall onset.
     *
     * @param y             the strip's spanwise station, m
     * @param eta           |y| over the semi-span
     * @param chord         its chord, m
     * @param section       its section's name
     * @param reynolds      its Reynolds number (0 when unknown)
     * @param clMax         its section cl_max
     * @param clAtOnset     its section cl at the wing's stall onset
     * @param clBasic       section cl at zero wing lift (the basic load)
     * @param clAdditional  section cl per unit wing CL (the additional load), at zero lift
     * @param sectionAngle  the effective section angle of attack at onset, alpha_0 + cl / a0 with the
     *                      section's lift slope and zero-lift angle, rad
     * @param liftToReach   the wing CL at which this strip reaches cl_max (linear theory); absent if never
     */
    public record StripStall(double y, double eta, double chord, String section, double reynolds, double clMax,
            double clAtOnset, double clBasic, double clAdditional, double sectionAngle, OptionalDouble liftToReach) {
    }
}
