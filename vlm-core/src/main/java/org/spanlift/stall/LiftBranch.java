package org.spanlift.stall;

import java.util.ArrayList;
import java.util.Locale;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.input.RefusedException;

/**
 * The coupled lift curve of a wing through the stall, traced by continuation in angle of attack, and its
 * maximum. The trace starts at the linear zero-lift angle (rounded down to a whole degree) and climbs in
 * {@value #STEP_DEG}-degree steps, each solve starting from the last converged corrections; a step that
 * fails is halved down to {@value #MIN_STEP_DEG} degree, and when it still fails the branch ends there
 * (a fold: beyond it the solution jumps to another branch). It stops {@value #PAST_DEG} degrees past the
 * maximum, at a branch end, where a tabulated section curve ends, or {@value #SPAN_DEG} degrees above the
 * start. The maximum is then refined by golden-section search between its neighbours to
 * {@value #REFINE_DEG} degree, each solve continued from the point below.
 *
 * <p>Multiple solutions: the trace is repeated downward from its last point; where the two traces differ
 * in CL by more than {@value #DIFFERENT} at the same angle, two solutions exist there (the downward one
 * has more strips past their peak), and a change of sign of the Jacobian's determinant along the upward
 * branch marks a fold or a branch point. Both are reported; no unconverged point carries a number.
 */
public final class LiftBranch {

    static final double STEP_DEG = 0.25;
    static final double MIN_STEP_DEG = 0.01;
    static final double PAST_DEG = 4;
    static final double SPAN_DEG = 40;
    static final double REFINE_DEG = 0.005;
    static final double DIFFERENT = 1e-6;

    private final SectionCoupling coupling;
    private final List<CoupledPoint> upward;
    private final List<CoupledPoint> downward;
    private final CoupledPoint maximum;
    private final boolean peak;
    private final End end;
    private final OptionalDouble jacobianSignChange;

    /** How the upward trace ended. */
    public enum End {
        /** It ran past the maximum as far as asked. */
        PAST_MAXIMUM,
        /** Newton's method found no solution beyond the last point (a fold). */
        FOLD,
        /** A tabulated section curve ended. */
        CURVE_ENDS,
        /** The angle range ended without a maximum. */
        RANGE
    }

    private LiftBranch(SectionCoupling coupling, List<CoupledPoint> upward, List<CoupledPoint> downward,
            CoupledPoint maximum, boolean peak, End end, OptionalDouble jacobianSignChange) {
        this.coupling = coupling;
        this.upward = List.copyOf(upward);
        this.downward = List.copyOf(downward);
        this.maximum = maximum;
        this.peak = peak;
        this.end = end;
        this.jacobianSignChange = jacobianSignChange;
    }

    /** Traces the branch of the given coupling. */
    public static LiftBranch trace(SectionCoupling coupling, double zeroLiftAngle) {
        double step = Math.toRadians(STEP_DEG);
        double start = Math.toRadians(Math.floor(Math.toDegrees(zeroLiftAngle)));
        double last = start + Math.toRadians(SPAN_DEG);
        List<CoupledPoint> up = new ArrayList<>();
        CoupledPoint p = coupling.solve(start, new double[coupling.size()]);
        if (!p.converged()) {
            throw new RefusedException(String.format(Locale.ROOT, "the lattice coupled with the section lift "
                    + "curves has no solution at the wing's zero-lift angle (%.1f degrees): some strip is already "
                    + "past its section peak there; check the section curves and the deflections",
                    Math.toDegrees(start)));
        }
        up.add(p);
        int best = 0;
        End end = End.RANGE;
        int n = 1;
        while (true) {
            double target = start + n * step;
            if (target > last + 1e-12) {
                break;
            }
            CoupledPoint prev = up.get(up.size() - 1);
            CoupledPoint next = coupling.solve(target, prev.corrections());
            double h = target - prev.alpha();
            while (!next.converged() && next.status() == CoupledPoint.Status.NOT_CONVERGED
                    && h > Math.toRadians(MIN_STEP_DEG)) {
                h /= 2;
                CoupledPoint mid = coupling.solve(prev.alpha() + h, prev.corrections());
                if (mid.converged()) {
                    up.add(mid);
                    prev = mid;
                    h = target - prev.alpha();
                    next = coupling.solve(target, prev.corrections());
                }
            }
            if (!next.converged()) {
                end = next.status() == CoupledPoint.Status.CURVE_ENDS ? End.CURVE_ENDS : End.FOLD;
                break;
            }
            up.add(next);
            best = indexOfMaximum(up);
            if (next.lift() < up.get(best).lift()
                    && next.alpha() >= up.get(best).alpha() + Math.toRadians(PAST_DEG) - 1e-12) {
                end = End.PAST_MAXIMUM;
                break;
            }
            n++;
        }
        int stableEnd = up.size();
        for (int i = 1; i < up.size(); i++) {
            if (up.get(i).stableJacobian() != up.get(0).stableJacobian()) {
                stableEnd = i;
                break;
            }
        }
        OptionalDouble signChange = stableEnd < up.size() ? OptionalDouble.of(up.get(stableEnd).alpha())
                : OptionalDouble.empty();
        List<CoupledPoint> stable = up.subList(0, stableEnd);
        best = indexOfMaximum(stable);
        CoupledPoint maximum = stable.get(best);
        boolean peak = false;
        if (best > 0) {
            double hi = best + 1 < up.size() ? up.get(best + 1).alpha() : maximum.alpha() + step;
            maximum = refine(coupling, new ArrayList<>(stable), up.get(best - 1).alpha(), hi, maximum);
            for (int i = best + 1; i < stableEnd; i++) {
                peak |= stable.get(i).lift() < maximum.lift();
            }
        }
        List<CoupledPoint> down = new ArrayList<>();
        CoupledPoint from = up.get(up.size() - 1);
        for (int i = up.size() - 2; i >= 0; i--) {
            CoupledPoint q = coupling.solve(up.get(i).alpha(), from.corrections());
            if (!q.converged()) {
                break;
            }
            down.add(q);
            from = q;
            if (Math.abs(q.lift() - up.get(i).lift()) <= 1e-9 && up.get(i).alpha() < maximum.alpha()) {
                break;
            }
        }
        return new LiftBranch(coupling, up, down, maximum, peak, end, signChange);
    }

    private static int indexOfMaximum(List<CoupledPoint> points) {
        int best = 0;
        for (int i = 1; i < points.size(); i++) {
            if (points.get(i).lift() > points.get(best).lift()) {
                best = i;
            }
        }
        return best;
    }

    /**
     * Golden-section search for the highest CL between lo and hi on the branch of the given points: each
     * solve continues from the nearest point below it (else the nearest above) and counts only when it
     * converges with the branch's sign of the Jacobian's determinant.
     */
    private static CoupledPoint refine(SectionCoupling coupling, List<CoupledPoint> known, double lo, double hi,
            CoupledPoint best) {
        boolean sign = known.get(0).stableJacobian();
        double g = (Math.sqrt(5) - 1) / 2;
        double tol = Math.toRadians(REFINE_DEG);
        CoupledPoint top = best;
        while (hi - lo > tol) {
            double c = hi - g * (hi - lo);
            double d = lo + g * (hi - lo);
            double fc = onBranch(coupling, known, c, sign);
            double fd = onBranch(coupling, known, d, sign);
            if (fc >= fd) {
                hi = d;
            } else {
                lo = c;
            }
        }
        for (CoupledPoint p : known) {
            if (p.lift() > top.lift()) {
                top = p;
            }
        }
        return top;
    }

    private static double onBranch(SectionCoupling coupling, List<CoupledPoint> known, double alpha, boolean sign) {
        CoupledPoint start = known.get(0);
        for (CoupledPoint p : known) {
            if (p.alpha() <= alpha && p.alpha() >= start.alpha()) {
                start = p;
            }
        }
        CoupledPoint q = coupling.solve(alpha, start.corrections());
        if (q.converged() && q.stableJacobian() == sign) {
            known.add(q);
            return q.lift();
        }
        return Double.NEGATIVE_INFINITY;
    }

    public SectionCoupling coupling() {
        return coupling;
    }

    /** The upward trace, converged points only, alpha ascending. */
    public List<CoupledPoint> upward() {
        return upward;
    }

    /** The downward trace from the upward trace's last point, converged points only, alpha descending. */
    public List<CoupledPoint> downward() {
        return downward;
    }

    /**
     * The point of highest CL on the upward trace before the Jacobian's determinant first changes sign
     * (refined).
     */
    public CoupledPoint maximum() {
        return maximum;
    }

    /** How the upward trace ended. */
    public End end() {
        return end;
    }

    /**
     * True when the maximum is a true maximum of the branch (the CL falls beyond it before the Jacobian's
     * determinant changes sign), false when the branch ends at or just after its highest point (a fold, a
     * branch point or a curve's end) and the highest converged point on it is all that can be said.
     */
    public boolean maximumIsPeak() {
        return peak;
    }

    /** The first angle of the upward trace where the Jacobian's determinant changed sign, rad. */
    public OptionalDouble jacobianSignChange() {
        return jacobianSignChange;
    }

    /**
     * The range of angles (rad) where the downward trace found a second solution, different from the
     * upward one, if any: [lowest, highest].
     */
    public Optional<double[]> multipleSolutions() {
        double lo = Double.NaN;
        double hi = Double.NaN;
        for (CoupledPoint q : downward) {
            for (CoupledPoint u : upward) {
                if (Math.abs(u.alpha() - q.alpha()) < 1e-12 && Math.abs(u.lift() - q.lift()) > DIFFERENT) {
                    lo = Double.isNaN(lo) ? q.alpha() : Math.min(lo, q.alpha());
                    hi = Double.isNaN(hi) ? q.alpha() : Math.max(hi, q.alpha());
                }
            }
        }
        return Double.isNaN(lo) ? Optional.empty() : Optional.of(new double[] {lo, hi});
    }
}
