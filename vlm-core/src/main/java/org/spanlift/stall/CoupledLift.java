package org.spanlift.stall;

import java.util.List;
import java.util.Optional;

import org.spanlift.results.Solution;
import org.spanlift.solve.WingAnalysis;

/**
 * The wing's lift through the stall from its section lift curves at one set of deflections and one
 * Reynolds number per metre: the lattice coupled with the curves ({@link SectionCoupling}), its curve traced
 * through the stall ({@link LiftBranch}), any angle of attack on the path of a slowly rising angle, and the
 * maximum lift.
 *
 * <pre>
 * CoupledLift lift = CoupledLift.of(analysis, deflections, limits, 0);
 * double clMax = lift.maximum().lift();
 * Optional&lt;CoupledLift.Point&gt; at14 = lift.at(Math.toRadians(14));
 * </pre>
 */
public final class CoupledLift {

    private final WingAnalysis analysis;
    private final LiftBranch branch;

    private CoupledLift(WingAnalysis analysis, LiftBranch branch) {
        this.analysis = analysis;
        this.branch = branch;
    }

    /**
     * A point of the curve: the lattice solution and the share of the span past its section peak.
     *
     * @param solution            the lattice solution
     * @param stalledSpanFraction the share of the span past its section peak
     */
    public record Point(Solution solution, double stalledSpanFraction) {
    }

    /**
     * Traces the wing's lift at the given deflections (rad, control order).
     *
     * @param reynoldsPerMetre rho V / mu (true speed), or 0 to read curves and tables at their lowest Reynolds
     *                         number
     */
    public static CoupledLift of(WingAnalysis analysis, double[] deflections, StripLimits limits,
            double reynoldsPerMetre) {
        StripCurves curves = StripCurves.of(analysis.wing(), analysis.lattice(), deflections, limits,
                reynoldsPerMetre);
        SectionCoupling coupling = SectionCoupling.of(analysis, deflections, curves);
        return new CoupledLift(analysis, LiftBranch.trace(coupling, analysis.liftCurve(deflections).zeroLiftAngle()));
    }

    /** The maximum lift, how the stall spreads on the way there, and the curve (no stall speed). */
    public MaximumLift maximum() {
        return MaximumLift.from(analysis, branch);
    }

    /** The lattice solution at the maximum lift (incidence corrections included). */
    public Solution maximumSolution() {
        return branch.coupling().solution(branch.maximum());
    }

    /** The traced curve. */
    public LiftBranch branch() {
        return branch;
    }

    /**
     * The point at angle of attack alpha (rad) on the path of a slowly rising angle, continued from the
     * nearest point traced; absent beyond the end of the trace or where the solve leaves the path (there the
     * lift depends on how the angle was reached).
     */
    public Optional<Point> at(double alpha) {
        List<CoupledPoint> up = branch.upward();
        CoupledPoint last = up.get(up.size() - 1);
        if (alpha > last.alpha() + 1e-12) {
            return Optional.empty();
        }
        CoupledPoint near = up.get(0);
        for (CoupledPoint p : up) {
            if (Math.abs(p.alpha() - alpha) < Math.abs(near.alpha() - alpha)) {
                near = p;
            }
        }
        SectionCoupling c = branch.coupling();
        CoupledPoint q = c.solve(alpha, near.corrections());
        if (!q.converged() || q.stableJacobian() != near.stableJacobian()
                || LiftBranch.jumped(near, q)) {
            return Optional.empty();
        }
        return Optional.of(new Point(c.solution(q), MaximumLift.stalledFraction(c, q)));
    }
}
