package org.spanlift.washout;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.Wing;
import org.spanlift.input.RefusedException;
import org.spanlift.results.Coefficients;
import org.spanlift.solve.InfluenceCache;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.StallStudy;

/**
 * The least linear washout (root twist minus tip twist) within bounds that meets a set of stall
 * requirements, and what it costs at a cruise CL. Twist enters the right-hand side only, so every washout
 * reuses one factorization ({@link InfluenceCache}).
 *
 * <p>The search: the washout on a grid of {@value #GRID_DEG} degree from the lower bound to the upper (the
 * trade curve), then, between the last grid washout that fails and the first that meets every requirement,
 * bisection to {@value #TOLERANCE_DEG} degree; the answer is the meeting end, so a washout smaller by the
 * tolerance fails. A requirement met at the lower bound gives the lower bound; none met on the grid gives no
 * answer and the slack of each requirement at the upper bound. The least washout on the grid: a window
 * narrower than the grid in which the requirements hold would be missed (they hold monotonically in the
 * cases of the trade: more washout moves the onset inboard and raises the aileron margin).
 */
public final class WashoutDesign {

    /** The grid of the trade curve, degrees. */
    public static final double GRID_DEG = 0.5;
    /** The search tolerance, degrees. */
    public static final double TOLERANCE_DEG = 0.01;

    private final Wing wing;
    private final double[] deflections;
    private final List<WashoutRequirement> requirements;
    private final double cruiseCl;
    private final OptionalDouble assumedClMax;
    private final Optional<FlightCondition> condition;
    private final InfluenceCache cache = new InfluenceCache(1);

    private WashoutDesign(Wing wing, double[] deflections, List<WashoutRequirement> requirements, double cruiseCl,
            OptionalDouble assumedClMax, Optional<FlightCondition> condition) {
        this.wing = wing;
        this.deflections = deflections.clone();
        this.requirements = List.copyOf(requirements);
        this.cruiseCl = cruiseCl;
        this.assumedClMax = assumedClMax;
        this.condition = condition;
    }

    /**
     * The answer.
     *
     * @param washout the least washout meeting every requirement, if any within the bounds
     * @param met     true when there is one
     * @param atUpper the wing at the upper bound (where the slacks of an unmet search are read)
     * @param trade   the wing at every grid washout, ascending
     * @param unwashed the wing at zero washout, the reference of the cruise cost
     */
    public record Result(Optional<WashoutPoint> washout, boolean met, WashoutPoint atUpper, List<WashoutPoint> trade,
            WashoutPoint unwashed) {
    }

    /**
     * Finds the least washout.
     *
     * @param deflections  control deflections, rad, control order (the stall is studied with them)
     * @param requirements at least one
     * @param cruiseCl     the CL of the cruise cost
     * @param lower        the least washout to consider, rad
     * @param upper        the largest, rad
     * @throws RefusedException without requirements, with bounds the wrong way round, or with a requirement the
     *                          wing cannot be measured against
     */
    public static Result find(Wing wing, double[] deflections, List<WashoutRequirement> requirements,
            double cruiseCl, OptionalDouble assumedClMax, Optional<FlightCondition> condition, double lower,
            double upper) {
        if (requirements.isEmpty()) {
            throw new RefusedException("give at least one stall requirement");
        }
        if (!(upper > lower)) {
            throw new RefusedException("the washout bounds must increase, got " + Math.toDegrees(lower) + " to "
                    + Math.toDegrees(upper) + " degrees");
        }
        requirements.forEach(r -> WashoutRequirement.check(wing, r));
        return new WashoutDesign(wing, deflections, requirements, cruiseCl, assumedClMax, condition)
                .search(lower, upper);
    }

    private Result search(double lower, double upper) {
        int n = (int) Math.ceil((Math.toDegrees(upper - lower) - 1e-9) / GRID_DEG);
        List<WashoutPoint> trade = new ArrayList<>();
        int first = -1;
        for (int i = 0; i <= n; i++) {
            double w = i == n ? upper : lower + Math.toRadians(i * GRID_DEG);
            WashoutPoint p = at(w);
            trade.add(p);
            if (first < 0 && meets(p)) {
                first = i;
            }
        }
        WashoutPoint unwashed = at(0);
        if (first < 0) {
            return new Result(Optional.empty(), false, trade.get(n), trade, unwashed);
        }
        if (first == 0) {
            return new Result(Optional.of(trade.get(0)), true, trade.get(n), trade, unwashed);
        }
        double lo = trade.get(first - 1).washout();
        WashoutPoint hi = trade.get(first);
        while (hi.washout() - lo > Math.toRadians(TOLERANCE_DEG)) {
            WashoutPoint mid = at(0.5 * (lo + hi.washout()));
            if (meets(mid)) {
                hi = mid;
            } else {
                lo = mid.washout();
            }
        }
        return new Result(Optional.of(hi), true, trade.get(n), trade, unwashed);
    }

    /** True when every requirement's slack is at least zero. */
    public boolean meets(WashoutPoint p) {
        return requirements.stream().allMatch(r -> r.slack(p) >= 0);
    }

    /** The wing at a total washout (rad). */
    private WashoutPoint at(double washout) {
        double change = washout - wing.main().planform().washout();
        Wing w = wing.withWashoutChange(change);
        WingAnalysis analysis = WingAnalysis.of(w, cache, deflections);
        StallStudy.Configuration c = StallStudy.configuration("washout", analysis, deflections, assumedClMax,
                condition);
        boolean needsMaximum = requirements.stream().anyMatch(WashoutRequirement::needsMaximumLift);
        double alpha = analysis.liftCurve(deflections).alphaForTarget(cruiseCl);
        Coefficients cruise = analysis.solve(alpha, deflections).coefficients();
        return new WashoutPoint(washout, change, w, c.estimate(),
                c.speed().map(s -> OptionalDouble.of(s.equivalent())).orElse(OptionalDouble.empty()),
                needsMaximum ? Optional.of(c.maximumLift()) : Optional.empty(), cruise.spanEfficiency(),
                cruise.inducedDrag());
    }
}
