package org.spanlift.stall;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.input.RefusedException;

/**
 * The coupled lift curve of a wing through the stall and its maximum.
 *
 * <p>The solution curve of {@link SectionCoupling} is traced by pseudo-arclength continuation (Keller, 1977)
 * in the corrections and the angle of attack together, from the linear zero-lift angle (rounded down to a
 * whole degree): a secant predictor, then the corrector on the hyperplane normal to it, the arclength step
 * {@value #STEP_DEG} degree at most, halved on failure down to {@value #MIN_STEP}, grown after easy steps; where even
 * that fails (a branch point, where the corrector's system is singular) the trace leaps two or four longest steps
 * ahead. A strip that passes its section peak can make the curve fold: the angle of attack turns back, along an
 * unstable stretch, and turns forward again with that strip stalled. The trace follows it round. Folds show
 * as changes of sign of the Jacobian's determinant; points with the sign of the linear start are stable.
 *
 * <p>A wing whose angle of attack is raised slowly follows the stable points whose angle exceeds that of every
 * stable point before them ({@link #upward()}): at a fold it jumps, at the same angle, to the next stable
 * stretch (more of the span stalled). The maximum lift is the highest CL of that path, refined by
 * golden-section search to {@value #REFINE_DEG} degree when it lies inside a stable stretch; when it lies at a
 * fold the stall there is abrupt (the lift drops as the path jumps), and the fold is located to the same
 * tolerance by bisection along the trace. Where unstable points exist, two or more
 * solutions exist at the same angle ({@link #multipleSolutions()}): the lift there depends on how the angle
 * was reached. The trace stops {@value #PAST_DEG} degrees past the maximum, where a tabulated section curve
 * ends, where more than {@value #DEEP_STALL_SPAN} of the span is {@value #DEEP_STALL_DEG} degrees past its section
 * peak, {@value #SPAN_DEG} degrees above the start, after {@value #MAX_POINTS} points, or when a step fails
 * at the smallest length. No unconverged point carries a number.
 */
public final class LiftBranch {

    static final double STEP_DEG = 0.25;
    static final double MIN_STEP = 1e-6;
    static final double PAST_DEG = 4;
    static final double SPAN_DEG = 40;
    static final double REFINE_DEG = 0.005;
    static final int MAX_POINTS = 3000;
    /**
     * How far past its section peak a strip's effective angle may go on the trace, degrees. Beyond it the
     * post-stall section data (measured or modelled) are least certain and the strip-wise coupling has
     * solutions that no wing reaches (a narrow strip answers its own correction weakly, so it can sit at any
     * angle); the project's choice, well past where a wing's maximum lift lies.
     */
    static final double DEEP_STALL_DEG = 10;
    /** The share of the span in deep stall that ends the trace. */
    static final double DEEP_STALL_SPAN = 0.05;
    /** The largest change of a strip's correction per change of angle along a branch, off the trace. */
    static final double JUMP = 20;

    private final SectionCoupling coupling;
    private final List<CoupledPoint> trace;
    private final List<CoupledPoint> upward;
    private final CoupledPoint maximum;
    private final boolean peak;
    private final End end;

    /** How the trace ended. */
    public enum End {
        /** It ran past the maximum as far as asked. */
        PAST_MAXIMUM,
        /** A step failed at the smallest length. */
        STALLED_STEP,
        /** A tabulated section curve ended. */
        CURVE_ENDS,
        /**
         * More than {@value LiftBranch#DEEP_STALL_SPAN} of the span went more than
         * {@value LiftBranch#DEEP_STALL_DEG} degrees past its section peak.
         */
        DEEP_STALL,
        /** The angle range or the number of points ended. */
        RANGE
    }

    private LiftBranch(SectionCoupling coupling, List<CoupledPoint> trace, List<CoupledPoint> upward,
            CoupledPoint maximum, boolean peak, End end) {
        this.coupling = coupling;
        this.trace = List.copyOf(trace);
        this.upward = List.copyOf(upward);
        this.maximum = maximum;
        this.peak = peak;
        this.end = end;
    }

    /** Traces the solution curve of the given coupling from the wing's linear zero-lift angle (rad). */
    public static LiftBranch trace(SectionCoupling coupling, double zeroLiftAngle) {
        double start = Math.toRadians(Math.floor(Math.toDegrees(zeroLiftAngle)));
        double last = start + Math.toRadians(SPAN_DEG);
        CoupledPoint p = coupling.solve(start, new double[coupling.size()]);
        if (!p.converged()) {
            throw new RefusedException(String.format(Locale.ROOT, "the lattice coupled with the section lift "
                    + "curves has no solution at the wing's zero-lift angle (%.1f degrees): some strip is already "
                    + "past its section peak there; check the section curves and the deflections",
                    Math.toDegrees(start)));
        }
        boolean stable = p.stableJacobian();
        double[] t = firstDirection(coupling, p);
        double maxStep = Math.toRadians(STEP_DEG);
        double ds = maxStep;
        List<CoupledPoint> trace = new ArrayList<>(List.of(p));
        List<CoupledPoint> up = new ArrayList<>(List.of(p));
        End end = End.RANGE;
        while (trace.size() < MAX_POINTS) {
            double[] x = p.corrections();
            int m = x.length;
            double[] predicted = new double[m];
            for (int i = 0; i < m; i++) {
                predicted[i] = x[i] + ds * t[i];
            }
            double[] tx = Arrays.copyOf(t, m);
            CoupledPoint q = coupling.correct(predicted, p.alpha() + ds * t[m], tx, t[m]);
            if (!q.converged() || distance(p, q) > 3 * ds) {
                ds /= 2;
                if (ds >= MIN_STEP) {
                    continue;
                }
                q = leap(coupling, p, t, maxStep);
                if (q == null) {
                    end = nearCurveEnd(coupling, p) ? End.CURVE_ENDS : End.STALLED_STEP;
                    break;
                }
                ds = maxStep;
            }
            if (deepStall(coupling, q)) {
                end = End.DEEP_STALL;
                break;
            }
            t = secant(p, q);
            if (q.iterations() <= 3) {
                ds = Math.min(maxStep, 1.5 * ds);
            }
            trace.add(q);
            p = q;
            if (q.stableJacobian() == stable && q.alpha() > up.get(up.size() - 1).alpha()) {
                up.add(q);
            }
            CoupledPoint best = up.get(indexOfMaximum(up));
            if (q.alpha() > last || q.alpha() < start - Math.toRadians(SPAN_DEG)) {
                break;
            }
            if (up.get(up.size() - 1).lift() < best.lift()
                    && up.get(up.size() - 1).alpha() >= best.alpha() + Math.toRadians(PAST_DEG)) {
                end = End.PAST_MAXIMUM;
                break;
            }
        }
        int best = indexOfMaximum(up);
        CoupledPoint maximum = up.get(best);
        boolean smooth = best > 0 && best + 1 < up.size() && adjacentOnTrace(trace, up.get(best), up.get(best + 1))
                && adjacentOnTrace(trace, up.get(best - 1), up.get(best));
        if (smooth) {
            List<CoupledPoint> known = new ArrayList<>(up.subList(best - 1, best + 1));
            maximum = refine(coupling, known, up.get(best - 1).alpha(), up.get(best + 1).alpha(), maximum);
        } else {
            int at = trace.indexOf(maximum);
            if (at >= 0 && at + 1 < trace.size() && trace.get(at + 1).stableJacobian() != stable) {
                maximum = refineFold(coupling, maximum, trace.get(at + 1));
            }
        }
        boolean peak = false;
        for (int i = best + 1; i < up.size(); i++) {
            peak |= up.get(i).lift() < maximum.lift();
        }
        return new LiftBranch(coupling, trace, up, maximum, peak && smooth, end);
    }

    /**
     * The last stable point before a fold, between a stable point and the unstable one after it on the
     * trace: the corrector from the stable end halfway along the secant, kept as the new stable end or the
     * new unstable end by its Jacobian's sign, until the two lie within {@value #REFINE_DEG} degree.
     */
    private static CoupledPoint refineFold(SectionCoupling coupling, CoupledPoint stable, CoupledPoint unstable) {
        CoupledPoint a = stable;
        CoupledPoint b = unstable;
        for (int k = 0; k < 40 && Math.abs(b.alpha() - a.alpha()) > Math.toRadians(REFINE_DEG); k++) {
            double ds = distance(a, b) / 2;
            double[] t = secant(a, b);
            double[] x = a.corrections();
            int m = x.length;
            double[] predicted = new double[m];
            for (int i = 0; i < m; i++) {
                predicted[i] = x[i] + ds * t[i];
            }
            CoupledPoint q = coupling.correct(predicted, a.alpha() + ds * t[m], Arrays.copyOf(t, m), t[m]);
            if (!q.converged()) {
                break;
            }
            if (q.stableJacobian() == stable.stableJacobian()) {
                a = q;
            } else {
                b = q;
            }
        }
        return a.lift() > stable.lift() ? a : stable;
    }

    /**
     * A step over a point where even the shortest steps fail (a branch point, where the bordered system is
     * singular): the corrector from two and four times the longest step ahead; null when neither converges.
     */
    private static CoupledPoint leap(SectionCoupling coupling, CoupledPoint p, double[] t, double maxStep) {
        double[] x = p.corrections();
        int m = x.length;
        for (double ds : new double[] {2 * maxStep, 4 * maxStep}) {
            double[] predicted = new double[m];
            for (int i = 0; i < m; i++) {
                predicted[i] = x[i] + ds * t[i];
            }
            CoupledPoint q = coupling.correct(predicted, p.alpha() + ds * t[m], Arrays.copyOf(t, m), t[m]);
            if (q.converged() && distance(p, q) <= 3 * ds) {
                return q;
            }
        }
        return null;
    }

    /**
     * True when more than {@value #DEEP_STALL_SPAN} of the span (by strip width) is more than
     * {@value #DEEP_STALL_DEG} degrees past its section peak; strips of a chord below
     * {@link SectionCoupling#MIN_LENGTH} of the mean aerodynamic chord (toward a pointed tip, where linear
     * theory's section lift grows without bound) do not count. A narrow strip alone (beside a flap's end,
     * under the end's concentrated lift) does not end the curve.
     */
    private static boolean deepStall(SectionCoupling coupling, CoupledPoint p) {
        double total = 0;
        double deep = 0;
        for (int i = 0; i < coupling.size(); i++) {
            double width = coupling.strip(i).width();
            total += width;
            double over = p.sectionAngle(i) - coupling.curves().curve(coupling.wingIndex(i)).peakAngle();
            if (!coupling.narrow(i) && over > Math.toRadians(DEEP_STALL_DEG)) {
                deep += width;
            }
        }
        return deep > DEEP_STALL_SPAN * total;
    }

    /** True when some strip's effective angle is within one degree of the end of its section curve. */
    private static boolean nearCurveEnd(SectionCoupling coupling, CoupledPoint p) {
        for (int i = 0; i < coupling.size(); i++) {
            if (p.sectionAngle(i) > coupling.curves().curve(coupling.wingIndex(i)).lastAngle() - Math.toRadians(1)) {
                return true;
            }
        }
        return false;
    }

    /** The unit tangent at the start, oriented toward increasing angle of attack. */
    private static double[] firstDirection(SectionCoupling coupling, CoupledPoint p) {
        int m = coupling.size();
        double[] v = coupling.tangent(p).orElseThrow(() -> new RefusedException(
                "the coupled solution is singular at the wing's zero-lift angle; check the section curves"));
        double[] t = new double[m + 1];
        double norm = 1;
        for (int i = 0; i < m; i++) {
            t[i] = v[i];
            norm += v[i] * v[i];
        }
        t[m] = 1;
        norm = Math.sqrt(norm);
        for (int i = 0; i <= m; i++) {
            t[i] /= norm;
        }
        return t;
    }

    /** The unit secant from p to q in (corrections, alpha). */
    private static double[] secant(CoupledPoint p, CoupledPoint q) {
        double[] a = p.corrections();
        double[] b = q.corrections();
        int m = a.length;
        double[] t = new double[m + 1];
        for (int i = 0; i < m; i++) {
            t[i] = b[i] - a[i];
        }
        t[m] = q.alpha() - p.alpha();
        double d = distance(p, q);
        for (int i = 0; i <= m; i++) {
            t[i] /= d;
        }
        return t;
    }

    private static double distance(CoupledPoint p, CoupledPoint q) {
        double[] a = p.corrections();
        double[] b = q.corrections();
        double sum = (q.alpha() - p.alpha()) * (q.alpha() - p.alpha());
        for (int i = 0; i < a.length; i++) {
            sum += (b[i] - a[i]) * (b[i] - a[i]);
        }
        return Math.sqrt(sum);
    }

    private static boolean adjacentOnTrace(List<CoupledPoint> trace, CoupledPoint a, CoupledPoint b) {
        int i = trace.indexOf(a);
        return i >= 0 && i + 1 < trace.size() && trace.get(i + 1) == b;
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
     * Golden-section search for the highest CL between lo and hi on one stable stretch: each solve continues
     * from the nearest known point below it and counts only when it converges without a jump.
     */
    private static CoupledPoint refine(SectionCoupling coupling, List<CoupledPoint> known, double lo, double hi,
            CoupledPoint best) {
        double g = (Math.sqrt(5) - 1) / 2;
        double tol = Math.toRadians(REFINE_DEG);
        while (hi - lo > tol) {
            double c = hi - g * (hi - lo);
            double d = lo + g * (hi - lo);
            double fc = onBranch(coupling, known, c);
            double fd = onBranch(coupling, known, d);
            if (fc >= fd) {
                hi = d;
            } else {
                lo = c;
            }
        }
        CoupledPoint top = best;
        for (CoupledPoint p : known) {
            if (p.lift() > top.lift()) {
                top = p;
            }
        }
        return top;
    }

    private static double onBranch(SectionCoupling coupling, List<CoupledPoint> known, double alpha) {
        CoupledPoint start = known.get(0);
        for (CoupledPoint p : known) {
            if (p.alpha() <= alpha && p.alpha() >= start.alpha()) {
                start = p;
            }
        }
        CoupledPoint q = coupling.solve(alpha, start.corrections());
        if (!q.converged() || q.stableJacobian() != start.stableJacobian() || jumped(start, q)) {
            return Double.NEGATIVE_INFINITY;
        }
        known.add(q);
        return q.lift();
    }

    /**
     * True when some strip's correction moved by more than {@value #JUMP} times the change of angle between
     * the two points: the solve left the branch of the first.
     */
    static boolean jumped(CoupledPoint from, CoupledPoint to) {
        double allowed = JUMP * Math.abs(to.alpha() - from.alpha()) + 1e-12;
        double[] a = to.corrections();
        double[] b = from.corrections();
        for (int i = 0; i < a.length; i++) {
            if (Math.abs(a[i] - b[i]) > allowed) {
                return true;
            }
        }
        return false;
    }

    /** The coupling of the lattice with the section lift curves the branch was traced on. */
    public SectionCoupling coupling() {
        return coupling;
    }

    /** Every point of the trace, in the order traced (the angle of attack turns back at folds). */
    public List<CoupledPoint> trace() {
        return trace;
    }

    /**
     * The path of a slowly rising angle of attack: the stable points whose angle exceeds that of every stable
     * point before them, alpha ascending.
     */
    public List<CoupledPoint> upward() {
        return upward;
    }

    /** The point of highest CL on the upward path (refined inside a stable stretch). */
    public CoupledPoint maximum() {
        return maximum;
    }

    /** How the trace ended. */
    public End end() {
        return end;
    }

    /**
     * True when the lift rounds over at the maximum (it lies inside a stable stretch and the path's lift
     * falls beyond it); false when the maximum is at a fold, where a station stalls abruptly and the path
     * jumps to a stretch of lower lift, or when the trace ended there.
     */
    public boolean maximumIsPeak() {
        return peak;
    }

    /** The first angle of the trace where the Jacobian's determinant changed sign (a fold), rad. */
    public OptionalDouble jacobianSignChange() {
        for (CoupledPoint q : trace) {
            if (q.stableJacobian() != trace.get(0).stableJacobian()) {
                return OptionalDouble.of(q.alpha());
            }
        }
        return OptionalDouble.empty();
    }

    /**
     * The range of angles (rad) over which the trace found unstable solutions, where two or more solutions
     * exist at the same angle: [lowest, highest]; absent when none.
     */
    public Optional<double[]> multipleSolutions() {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        boolean stable = trace.get(0).stableJacobian();
        for (CoupledPoint q : trace) {
            if (q.stableJacobian() != stable) {
                lo = Math.min(lo, q.alpha());
                hi = Math.max(hi, q.alpha());
            }
        }
        return lo > hi ? Optional.empty() : Optional.of(new double[] {lo, hi});
    }
}
