package org.spanlift.stall;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.atmosphere.Airspeed;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;
import org.spanlift.input.RefusedException;
import org.spanlift.results.Coefficients;
import org.spanlift.solve.WingAnalysis;

/**
 * The wing's maximum lift from its section lift curves (the lattice coupled with them, {@link SectionCoupling},
 * traced through the stall, {@link LiftBranch}), how the stall spreads on the way there, and whether the
 * aileron stations are still below their section peak at the maximum. Angles in radians, lengths in metres.
 *
 * @param lift                 the highest CL of the branch (whole lattice)
 * @param alpha                its angle of attack
 * @param peak                 true when the lift rounds over at the maximum; false when it breaks off there (a
 *                             fold) or the traced curve ended there ({@link LiftBranch#maximumIsPeak})
 * @param end                  how the traced curve ended
 * @param stalledSpanFraction  the share of the wing's span (outboard of the fuselage side) past its section
 *                             peak at the maximum
 * @param firstStall           where and when the first strip passes its section peak on the branch
 * @param aileron              the aileron stations at the maximum, when the wing has ailerons
 * @param synthetic            true when some strip's section curve was synthetic (built from cl_max)
 * @param handbookFlap         true when some deflected strip's curve follows the handbook plain-flap correction
 * @param inviscidFlap         true when some deflected control lies outside the handbook data, so its strips
 *                             carry the inviscid flap lift
 * @param multipleSolutions    the range of angles [from, to] where a second solution was found, if any
 * @param strips               every strip with its own correction at the maximum, y ascending, with its cl at
 *                             the last angle of the path ({@code beyondAlpha})
 * @param beyondAlpha          the last angle of attack of the path of a rising angle (past the maximum unless
 *                             the curve ended there), rad
 * @param curve                the coupled lift curve on that path, alpha ascending
 * @param speed                the stall speed at this maximum, with a flight condition
 * @param configurationLift    the whole configuration's CL at the wing's maximum (every surface, untrimmed;
 *                             equal to {@code lift} for a wing alone): the CL the stall speed rests on
 */
public record MaximumLift(double lift, double alpha, boolean peak, LiftBranch.End end, double stalledSpanFraction,
        Optional<FirstStall> firstStall, Optional<AileronState> aileron, boolean synthetic, boolean handbookFlap,
        boolean inviscidFlap, Optional<double[]> multipleSolutions, List<StripState> strips, double beyondAlpha,
        List<CurvePoint> curve, Optional<Speed> speed, double configurationLift) {

    /** Relative change of the stall speed below which the Reynolds-number iteration stops. */
    public static final double SPEED_TOLERANCE = 1e-7;
    private static final int MAX_ITERATIONS = 50;

    /** Copies the lists and arrays. */
    public MaximumLift {
        strips = List.copyOf(strips);
        curve = List.copyOf(curve);
        multipleSolutions = multipleSolutions.map(double[]::clone);
    }

    /**
     * The first strip past its peak on the branch: its y (right-hand), eta, and the wing's alpha and CL.
     *
     * @param y     the strip's y (right-hand), m
     * @param eta   y over the semi-span
     * @param alpha the wing's angle of attack there, rad
     * @param lift  the wing's CL there
     */
    public record FirstStall(double y, double eta, double alpha, double lift) {
    }

    /**
     * The aileron stations at the maximum.
     *
     * @param belowPeak true when every aileron strip is below its section peak
     * @param margin    the least (section peak cl - cl) over the aileron strips
     * @param y         where that least margin is
     */
    public record AileronState(boolean belowPeak, double margin, double y) {
    }

    /**
     * One strip at the maximum: cl, its section curve's peak, the effective angle and the peak's angle (rad);
     * the wing's angle of attack at which it passed its peak on the path, if it did; its cl at the path's last
     * angle.
     *
     * @param y            the strip's y, m
     * @param eta          |y| over the semi-span
     * @param cl           its section cl
     * @param peakCl       its section curve's peak cl
     * @param sectionAngle its effective section angle of attack, rad
     * @param peakAngle    the peak's angle, rad
     * @param stallAlpha   the wing's angle of attack at which it passed its peak, rad, if it did
     * @param clBeyond     its cl at the path's last angle
     */
    public record StripState(double y, double eta, double cl, double peakCl, double sectionAngle, double peakAngle,
            OptionalDouble stallAlpha, double clBeyond) {
        /** True when the strip's effective angle is past its section curve's peak. */
        public boolean pastPeak() {
            return sectionAngle > peakAngle;
        }
    }

    /**
     * One converged point of the coupled lift curve.
     *
     * @param alpha               angle of attack, rad
     * @param lift                CL
     * @param inducedDrag         induced drag coefficient
     * @param pitchingMoment      pitching-moment coefficient, positive nose-up
     * @param stalledSpanFraction the share of the span past its section peak
     */
    public record CurvePoint(double alpha, double lift, double inducedDrag, double pitchingMoment,
            double stalledSpanFraction) {
    }

    /**
     * The stall speed at the maximum lift, with the Reynolds numbers iterated together with it.
     *
     * @param equivalent equivalent airspeed, m/s
     * @param trueSpeed  true airspeed, m/s
     */
    public record Speed(double equivalent, double trueSpeed) {
    }

    /**
     * The maximum lift at the given deflections (rad, control order).
     *
     * @param reynoldsPerMetre rho V / mu (true speed), or 0 to read tables at their lowest Reynolds number
     */
    public static MaximumLift of(WingAnalysis analysis, double[] deflections, StripLimits limits,
            double reynoldsPerMetre) {
        return CoupledLift.of(analysis, deflections, limits, reynoldsPerMetre).maximum();
    }

    /**
     * The maximum lift and the stall speed it gives in a flight condition, the strips' Reynolds numbers
     * iterated with the speed until it changes by less than {@value #SPEED_TOLERANCE} of itself.
     */
    public static MaximumLift atStall(WingAnalysis analysis, double[] deflections, StripLimits limits,
            FlightCondition condition) {
        double nu = condition.atmosphere().kinematicViscosity();
        double vt = 30;
        for (int k = 1; k <= MAX_ITERATIONS; k++) {
            MaximumLift m = of(analysis, deflections, limits, vt / nu);
            double ve = condition.equivalentSpeedFor(m.configurationLift(), analysis.wing().reference());
            double next = Airspeed.trueFromEquivalent(ve, condition.atmosphere());
            if (Math.abs(next - vt) <= SPEED_TOLERANCE * next) {
                MaximumLift settled = of(analysis, deflections, limits, next / nu);
                double veSettled = condition.equivalentSpeedFor(settled.configurationLift(),
                        analysis.wing().reference());
                Speed speed = new Speed(veSettled, Airspeed.trueFromEquivalent(veSettled, condition.atmosphere()));
                return settled.withSpeed(speed);
            }
            vt = next;
        }
        throw new RefusedException("the stall speed at maximum lift and the Reynolds numbers did not settle; "
                + "check the section data against Reynolds number");
    }

    private MaximumLift withSpeed(Speed s) {
        return new MaximumLift(lift, alpha, peak, end, stalledSpanFraction, firstStall, aileron, synthetic,
                handbookFlap, inviscidFlap, multipleSolutions, strips, beyondAlpha, curve, Optional.of(s),
                configurationLift);
    }

    static MaximumLift from(WingAnalysis analysis, LiftBranch branch) {
        SectionCoupling c = branch.coupling();
        CoupledPoint top = branch.maximum();
        Wing wing = analysis.wing();
        double semi = wing.main().mirrored() ? wing.main().planform().yEnd()
                : 0.5 * (wing.main().planform().yEnd() - wing.main().planform().yStart());
        List<StripState> states = new ArrayList<>();
        List<CoupledPoint> path = branch.upward();
        CoupledPoint beyond = path.get(path.size() - 1);
        for (int i = 0; i < c.size(); i++) {
            SectionCurve f = c.curves().curve(c.wingIndex(i));
            double y = c.strip(i).y();
            states.add(new StripState(y, Math.abs(y) / semi, top.cl(i), f.peakLift(), top.sectionAngle(i),
                    f.peakAngle(), stallAlpha(path, i, f.peakAngle()), beyond.cl(i)));
        }
        states.sort(Comparator.comparingDouble(StripState::y));
        List<CurvePoint> curve = new ArrayList<>();
        for (CoupledPoint p : branch.upward()) {
            Coefficients co = c.solution(p).coefficients();
            curve.add(new CurvePoint(p.alpha(), p.lift(), co.inducedDrag(), co.pitchingMoment(),
                    stalledFraction(c, p)));
        }
        return new MaximumLift(top.lift(), top.alpha(), branch.maximumIsPeak(), branch.end(),
                stalledFraction(c, top), firstStall(c, branch, semi, wing.main().meanAerodynamicChord()),
                aileron(wing, c, top), c.curves().synthetic(), c.curves().handbookFlap(), c.curves().inviscidFlap(),
                branch.multipleSolutions(), states, beyond.alpha(), curve, Optional.empty(),
                wing.surfaces().size() == 1 ? top.lift() : c.solution(top).coefficients().lift());
    }

    /**
     * The angle of attack at which unknown i's effective angle first passes its peak angle on the path,
     * linear between the two points around it; absent if it never does.
     */
    private static OptionalDouble stallAlpha(List<CoupledPoint> path, int i, double peakAngle) {
        for (int k = 1; k < path.size(); k++) {
            double before = path.get(k - 1).sectionAngle(i) - peakAngle;
            double after = path.get(k).sectionAngle(i) - peakAngle;
            if (before <= 0 && after > 0) {
                double t = -before / (after - before);
                return OptionalDouble.of(path.get(k - 1).alpha() + t * (path.get(k).alpha() - path.get(k - 1).alpha()));
            }
        }
        return OptionalDouble.empty();
    }

    /** The share of the span (by strip width) past its section peak. */
    static double stalledFraction(SectionCoupling c, CoupledPoint p) {
        double total = 0;
        double past = 0;
        for (int i = 0; i < c.size(); i++) {
            double w = c.strip(i).width();
            total += w;
            if (c.pastPeak(p, i)) {
                past += w;
            }
        }
        return past / total;
    }

    /**
     * The first strip past its peak on the upward path, leaving out strips near a pointed tip as the linear
     * onset does ({@link StallAnalysis#POINTED_TIP_CHORD}).
     */
    private static Optional<FirstStall> firstStall(SectionCoupling c, LiftBranch branch, double semi, double mac) {
        for (CoupledPoint p : branch.upward()) {
            int first = -1;
            double most = 0;
            for (int i = 0; i < c.size(); i++) {
                double over = p.sectionAngle(i) - c.curves().curve(c.wingIndex(i)).peakAngle();
                boolean pointedTip = c.strip(i).chord() < StallAnalysis.POINTED_TIP_CHORD * mac;
                if (over > 0 && !pointedTip && (first < 0 || over > most)) {
                    first = i;
                    most = over;
                }
            }
            if (first >= 0) {
                double y = Math.abs(c.strip(first).y());
                return Optional.of(new FirstStall(y, y / semi, p.alpha(), p.lift()));
            }
        }
        return Optional.empty();
    }

    private static Optional<AileronState> aileron(Wing wing, SectionCoupling c, CoupledPoint top) {
        AileronState best = null;
        boolean below = true;
        for (ControlSurface cs : wing.main().controls()) {
            if (cs.kind() != ControlKind.AILERON) {
                continue;
            }
            for (int i = 0; i < c.size(); i++) {
                double y = Math.abs(c.strip(i).y());
                if (y > cs.from() && y < cs.to()) {
                    below &= !c.pastPeak(top, i);
                    double margin = c.curves().curve(c.wingIndex(i)).peakLift() - top.cl(i);
                    if (best == null || margin < best.margin()) {
                        best = new AileronState(true, margin, y);
                    }
                }
            }
        }
        return best == null ? Optional.empty() : Optional.of(new AileronState(below, best.margin(), best.y()));
    }
}
