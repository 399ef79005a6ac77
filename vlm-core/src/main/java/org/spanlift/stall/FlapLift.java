package org.spanlift.stall;

import java.util.List;

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
final class FlapLift {

    private FlapLift() {
    }

    /** The lifting deflections, rad, control order, for the given ones. */
    static double[] deflections(Wing wing, double[] deflections) {
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

    /** True when the handbook correction applies to the control at that deflection size. */
    static boolean covered(Wing wing, ControlSurface control, double size) {
        return (control.kind() == ControlKind.FLAP || control.kind() == ControlKind.AILERON)
                && wing.main().controls().contains(control) && PlainFlap.coversChordFraction(control.chordFraction())
                && PlainFlap.of(control.chordFraction()).covers(size);
    }
}
