package org.spanlift.stall;

import java.util.List;
import java.util.OptionalDouble;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;
import org.spanlift.section.PlainFlap;

/**
 * The deflections at which linear theory gives the wing's flaps and ailerons the lift of the handbook
 * plain-flap correction ({@link PlainFlap#liftEffectiveness}): each such control's deflection times its
 * effectiveness at that deflection, where the handbook data cover its chord fraction and deflection
 * (otherwise the deflection as given, the inviscid lift). The linear stall onset uses them, so that it
 * agrees with the straight part of the lift through the stall; solve and loads keep the inviscid lift.
 */
public final class FlapLift {

    private FlapLift() {
    }

    /** The lifting deflections, rad, control order, for the given ones. */
    public static double[] deflections(Wing wing, double[] deflections) {
        double[] out = deflections.clone();
        List<ControlSurface> controls = wing.controls();
        for (int c = 0; c < controls.size(); c++) {
            ControlSurface cs = controls.get(c);
            if (out[c] != 0 && covered(wing, cs, Math.abs(out[c]))) {
                out[c] *= PlainFlap.of(cs.chordFraction()).liftEffectiveness(Math.abs(out[c]));
            }
        }
        return out;
    }

    /**
     * The handbook values of one deflected flap or aileron (deflection in rad; the increments for a
     * deflection down of that size; absent values where the handbook data do not cover the control).
     *
     * @param control            the control's name
     * @param chordFraction      its chord over the local chord
     * @param deflection         its deflection, rad (the right one's for an aileron)
     * @param tau                Glauert's thin-airfoil effectiveness
     * @param effectivenessRatio the small-deflection effectiveness ratio (absent beyond the data)
     * @param largeDeflection    the large-deflection factor K' (absent beyond the data)
     * @param liftIncrement      the section lift increment, 2 pi tau x ratio x K' x deflection (beyond the data
     *                           the inviscid 2 pi tau x deflection)
     * @param clMaxIncrement     the section cl_max increment of the handbook correlation
     * @param covered            true when the handbook data cover the chord fraction and the deflection
     */
    public record Values(String control, double chordFraction, double deflection, double tau,
            OptionalDouble effectivenessRatio, OptionalDouble largeDeflection, double liftIncrement,
            double clMaxIncrement, boolean covered) {
    }

    /** The handbook values of each deflected flap and aileron of the wing, control order. */
    public static List<Values> values(Wing wing, double[] deflections) {
        List<Values> out = new java.util.ArrayList<>();
        List<ControlSurface> controls = wing.controls();
        for (int c = 0; c < controls.size(); c++) {
            ControlSurface cs = controls.get(c);
            double size = Math.abs(deflections[c]);
            if (size == 0 || (cs.kind() != ControlKind.FLAP && cs.kind() != ControlKind.AILERON)
                    || !wing.main().controls().contains(cs)) {
                continue;
            }
            double tau = PlainFlap.glauertTau(cs.chordFraction());
            if (covered(wing, cs, size)) {
                PlainFlap f = PlainFlap.of(cs.chordFraction());
                out.add(new Values(cs.name(), cs.chordFraction(), deflections[c], tau,
                        OptionalDouble.of(f.effectivenessRatio()), OptionalDouble.of(f.largeDeflectionFactor(size)),
                        f.liftIncrement(size), f.clMaxIncrement(size), true));
            } else {
                out.add(new Values(cs.name(), cs.chordFraction(), deflections[c], tau, OptionalDouble.empty(),
                        OptionalDouble.empty(), 2 * Math.PI * tau * size,
                        StripLimits.defaultIncrement(cs.chordFraction(), size), false));
            }
        }
        return out;
    }

    /** True when the handbook correction applies to the control at that deflection size. */
    static boolean covered(Wing wing, ControlSurface control, double size) {
        return (control.kind() == ControlKind.FLAP || control.kind() == ControlKind.AILERON)
                && wing.main().controls().contains(control) && PlainFlap.coversChordFraction(control.chordFraction())
                && PlainFlap.of(control.chordFraction()).covers(size);
    }
}
