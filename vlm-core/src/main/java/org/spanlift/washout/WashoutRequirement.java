package org.spanlift.washout;

import java.util.Locale;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;
import org.spanlift.input.RefusedException;

/**
 * A stall requirement a washout must meet. Each gives a slack at a washout: zero or more when it is met,
 * negative by how much it fails, in its own unit.
 */
public sealed interface WashoutRequirement {

    /** The slack at a point: at least zero when met. */
    double slack(WashoutPoint p);

    /** The requirement's key in outputs. */
    String key();

    /** The unit of the slack, for outputs. */
    String unit();

    /** A short statement of the requirement. */
    String describe();

    /** True when the requirement needs the maximum lift (it traces the lift through the stall). */
    default boolean needsMaximumLift() {
        return false;
    }

    /**
     * Stall onset inboard of a control's inner end by at least a clearance: slack = inner end - clearance -
     * |y| of the onset station, m.
     *
     * @param control   the control's name
     * @param clearance the clearance, m
     */
    record OnsetInboard(String control, double clearance) implements WashoutRequirement {
        @Override
        public double slack(WashoutPoint p) {
            ControlSurface c = p.wing().control(control).orElseThrow();
            return c.from() - clearance - p.onset().y();
        }

        @Override
        public String key() {
            return "onset_inboard_of_" + control;
        }

        @Override
        public String unit() {
            return "m";
        }

        @Override
        public String describe() {
            return String.format(Locale.ROOT, "stall onset inboard of the %s's inner end%s", control,
                    clearance > 0 ? String.format(Locale.ROOT, " by %.3f m", clearance) : "");
        }
    }

    /**
     * The least section margin (cl_max - cl) over the aileron span at stall onset at least {@code dcl}: slack
     * = margin - dcl.
     *
     * @param dcl the least margin required
     */
    record AileronMargin(double dcl) implements WashoutRequirement {
        @Override
        public double slack(WashoutPoint p) {
            return p.onset().aileronMargin().orElseThrow().dcl() - dcl;
        }

        @Override
        public String key() {
            return "aileron_margin";
        }

        @Override
        public String unit() {
            return "cl";
        }

        @Override
        public String describe() {
            return String.format(Locale.ROOT, "aileron section margin at stall onset of at least %.3f", dcl);
        }
    }

    /**
     * Every aileron station below its section cl peak at the wing's maximum lift: slack = the least (peak cl -
     * cl) over the aileron span there.
     */
    record AileronsBelowPeak() implements WashoutRequirement {
        @Override
        public double slack(WashoutPoint p) {
            var a = p.maximum().orElseThrow().aileron().orElseThrow();
            return a.belowPeak() ? Math.max(a.margin(), 0) : Math.min(a.margin(), -1e-12);
        }

        @Override
        public String key() {
            return "ailerons_below_peak_at_maximum";
        }

        @Override
        public String unit() {
            return "cl";
        }

        @Override
        public String describe() {
            return "aileron stations below their section cl peak at the maximum lift";
        }

        @Override
        public boolean needsMaximumLift() {
            return true;
        }
    }

    /**
     * Refuses a requirement the wing cannot be measured against: a control it lacks, or aileron requirements
     * on a wing without ailerons on its first surface.
     */
    static void check(Wing wing, WashoutRequirement r) {
        boolean ailerons = wing.main().controls().stream().anyMatch(c -> c.kind() == ControlKind.AILERON);
        if (r instanceof OnsetInboard o && wing.main().controls().stream()
                .noneMatch(c -> c.name().equals(o.control()))) {
            throw new RefusedException("the wing has no control named '" + o.control() + "' on its first surface");
        }
        if (!(r instanceof OnsetInboard) && !ailerons) {
            throw new RefusedException("an aileron requirement needs an aileron on the wing's first surface");
        }
    }
}
