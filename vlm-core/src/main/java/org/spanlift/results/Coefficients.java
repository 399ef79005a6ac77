package org.spanlift.results;

import java.util.OptionalDouble;

/**
 * Force and moment coefficients of one flight condition, on the wing's reference values. Moments are in
 * the flight-mechanics sense: pitching moment positive nose-up (on q S c), rolling moment positive right
 * wing down (on q S b).
 *
 * @param lift            CL, normal to the freestream in the x-z plane
 * @param inducedDrag     CDi from the Trefftz plane
 * @param spanEfficiency  e = CL^2 / (pi A CDi); empty where |CL| &lt; 0.05 or CDi is not positive
 * @param pitchingMoment  Cm about the moment point
 * @param rollingMoment   C_roll about the x axis through the moment point
 */
public record Coefficients(double lift, double inducedDrag, OptionalDouble spanEfficiency, double pitchingMoment,
        double rollingMoment) {

    /** Smallest |CL| for which the span efficiency is reported. */
    public static final double SPAN_EFFICIENCY_MIN_LIFT = 0.05;

    static OptionalDouble spanEfficiency(double cl, double cdi, double aspectRatio) {
        if (Math.abs(cl) < SPAN_EFFICIENCY_MIN_LIFT || !(cdi > 0)) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(cl * cl / (Math.PI * aspectRatio * cdi));
    }
}
