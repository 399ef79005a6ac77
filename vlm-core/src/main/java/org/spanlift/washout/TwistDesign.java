package org.spanlift.washout;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeSet;

import org.ejml.data.DMatrixRMaj;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;
import org.spanlift.input.RefusedException;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;
import org.spanlift.lattice.Strip;
import org.spanlift.results.Coefficients;
import org.spanlift.solve.BasisSolutions;
import org.spanlift.solve.InfluenceCache;
import org.spanlift.solve.StripBasis;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.StallAnalysis;
import org.spanlift.stall.StallEstimate;
import org.spanlift.stall.StallStudy;
import org.spanlift.stall.StripLimits;

/**
 * The twist distribution of least cruise induced drag that meets stall requirements: a twist change added to
 * the wing's own, piecewise linear through K knots (zero at the root; {@link org.spanlift.geometry.RetwistedPlanform}),
 * each knot's change within bounds and the kink at each inner knot within a smoothness limit.
 *
 * <p><b>Linear in twist.</b> Twist enters the right-hand side only, so on the wing's one factorization each
 * knot's hat function has a basis solution (one back-substitution per right-half strip, {@link StripBasis}).
 * With the freestream (cos a, 0, sin a) the circulation is {@code cos a (Gx + sum_k t_k G_k + tan a Gz)}: the
 * lift, the strip cl and the Trefftz-plane drag are linear, linear and quadratic in (t, tan a), with cos a as a
 * factor.
 *
 * <p><b>Cruise.</b> Cruise is flown clean: every flap at zero (ailerons as asked). At the cruise CL, with c = cos a
 * held, the lift condition {@code c (Lx + L.t + tan a Lz) = CL}
 * gives tan a affine in t; substituted, {@code CDi = c^2 (h0 + D t)' Q (h0 + D t)}, a convex quadratic form in
 * t (Q the Trefftz-plane form of {@link LeastDragTwist}). It is strictly convex while the twist change cannot
 * be the same on every strip (for a flat wing that would be an angle-of-attack change, which the drag at a fixed
 * CL does not see): with the root fixed, so long as the first knot lies beyond the first strip. Knots on every
 * strip edge are refused.
 *
 * <p><b>Stall.</b> Strip i's section lift is {@code cl_i = cos a (a_i(t) + b_i tan a)}, a_i affine in t, b_i fixed.
 * The onset is the lowest angle at which some strip reaches its cl_max (the critical-section method of
 * {@link StallAnalysis}); which strip that is depends on t, so the problem is not one convex program. With the
 * critical strip j fixed, j reaches its limit at the angle where {@code cos a (a_j + b_j tan a) = clmax_j};
 * eliminating tan a there, the others' lift at that angle is
 * {@code cl_i = (b_i / b_j) clmax_j + cos a (a_i(t) - (b_i / b_j) a_j(t))}, affine in t with c = cos a held:
 * the basic-load difference of i and j on top of j's limit shared out in the ratio of their additional loads.
 * "j reaches first" is then {@code cl_i <= clmax_i} for every other candidate strip, the aileron margin is
 * {@code cl_i <= clmax_i - dcl} over the aileron span, and "onset inboard of y*" is a j inboard of y* with
 * every strip outboard of y* kept {@value #OUTBOARD_MARGIN} below its cl_max (so no tie puts the onset there):
 * all linear. One strictly convex quadratic program per candidate j ({@link QuadraticProgram}, Goldfarb and
 * Idnani's dual method), the best feasible one taken.
 *
 * <p><b>The held values.</b> cos a at cruise and at onset, and each strip's cl_max (read at the Reynolds number of
 * the stall speed when a weight is given), are taken from an exact analysis of the current twist and the
 * programs solved again from the new twist, until the knots' changes settle to {@value #SETTLED_RAD} rad. Every
 * twist so found is analysed exactly (the wing with the twist change, through {@link StallStudy}) and the
 * answer is the one of least cruise CDi that meets every requirement; the linear washout's answer, when its
 * changes at the knots lie within the bounds (its kinks are zero), is a candidate too, so the answer is never
 * worse in cruise than the linear washout.
 */
public final class TwistDesign {

    /** The knots' changes between two rounds below which the design has settled, rad. */
    public static final double SETTLED_RAD = 1e-10;
    /** Rounds of held values at most. */
    public static final int MAX_ROUNDS = 40;
    /** The margin in cl kept by strips outboard of an onset limit, so that no tie puts the onset there. */
    public static final double OUTBOARD_MARGIN = 1e-6;
    /** The margin in cl added to an aileron margin asked, so that the exact analysis meets it after rounding. */
    static final double SAFETY = 1e-9;

    /**
     * The shape of the twist change.
     *
     * @param knots      y of the knots, m, increasing from above the root to the tip
     * @param lower      the least change at a knot, rad
     * @param upper      the largest, rad
     * @param smoothness the largest kink at an inner knot, rad: the change of the twist's slope there times the
     *                   mean knot interval (for even knots the second difference of the changes); infinite: none
     */
    public record Shape(double[] knots, double lower, double upper, double smoothness) {
        /** Copies the knots and checks that the bounds do not decrease and the smoothness is not negative. */
        public Shape {
            knots = knots.clone();
            if (!(upper >= lower) || !(smoothness >= 0)) {
                throw new IllegalArgumentException("bounds must not decrease and the smoothness limit not be negative");
            }
        }

        /** A copy of the knots' y, m. */
        @Override
        public double[] knots() {
            return knots.clone();
        }
    }

    /**
     * The answer.
     *
     * @param met        true when some twist within the shape meets every requirement
     * @param design     the wing with that twist, analysed (washout = its root twist minus tip twist, change = that
     *                   less the file's washout)
     * @param change     the twist change at each knot, rad (knot order; the root's is zero)
     * @param fromLinear true when the linear washout's answer was the best candidate
     * @param settled    true when the rounds ended by settling or because no program was feasible (false: they
     *                   ran out, {@value TwistDesign#MAX_ROUNDS} rounds, and the answer is the best twist they met)
     * @param rounds     the rounds of held values done
     * @param critical   the y of the strip whose program gave the answer (its onset station), when one did
     * @param linear     the linear washout's answer analysed as this design analyses a twist (cruise clean), if any
     * @param unwashed   the wing with zero washout (the file's twist less a linear change), analysed so
     */
    public record Result(boolean met, Optional<WashoutPoint> design, double[] change, boolean fromLinear,
            boolean settled, int rounds, OptionalDouble critical, Optional<WashoutPoint> linear,
            WashoutPoint unwashed) {
        /** Copies the changes. */
        public Result {
            change = change.clone();
        }

        /** A copy of the twist change at each knot, rad. */
        @Override
        public double[] change() {
            return change.clone();
        }
    }

    private final Wing wing;
    private final double[] deflections;
    private final double[] cruiseDeflections;
    private final List<WashoutRequirement> requirements;
    private final double cruiseCl;
    private final OptionalDouble assumedClMax;
    private final Optional<FlightCondition> condition;
    private final Shape shape;
    private final InfluenceCache cache = new InfluenceCache(1);
    private final int k;
    private final double root;
    // per lattice strip: circulation sums per unit speed for unit x (with the deflections), unit z, each knot
    private final double[] gx;
    private final double[] gz;
    private final double[][] gk;
    private final double liftX;
    private final double liftZ;
    private final double[] liftK;
    private final DMatrixRMaj q;
    // per stall strip (StripLimits order): lattice index, b_i, A_ik
    private final int[] stallStrip;
    private final double[] bStall;
    private final double[][] aStall;
    private final boolean[] candidate;
    private final boolean[] reachChecked;
    private final double[] margin;
    private final double onsetLimit;
    private final List<Strip> strips;
    private final Map<WashoutPoint, Double> cruiseAlpha = new java.util.IdentityHashMap<>();

    private TwistDesign(Wing wing, double[] deflections, List<WashoutRequirement> requirements, double cruiseCl,
            OptionalDouble assumedClMax, Optional<FlightCondition> condition, Shape shape) {
        this.wing = wing;
        this.deflections = deflections.clone();
        this.cruiseDeflections = StallStudy.cleanDeflections(wing, deflections);
        this.requirements = List.copyOf(requirements);
        this.cruiseCl = cruiseCl;
        this.assumedClMax = assumedClMax;
        this.condition = condition;
        this.shape = shape;
        double[] knots = shape.knots();
        this.k = knots.length;
        this.root = wing.main().planform().yStart();
        WingAnalysis analysis = WingAnalysis.of(wing, cache, deflections);
        Lattice lattice = analysis.lattice();
        List<Strip> strips = lattice.strips();
        this.strips = strips;
        List<Integer> right = new ArrayList<>();
        for (int s = 0; s < strips.size(); s++) {
            if (strips.get(s).surface() == 0 && strips.get(s).right()) {
                right.add(s);
            }
        }
        StripBasis basis = analysis.stripBasis(right, true);
        int panels = lattice.panelCount();
        double[][] knotPanels = new double[k][panels];
        for (int u = 0; u < right.size(); u++) {
            double y = strips.get(right.get(u)).y();
            for (int j = 0; j < k; j++) {
                double phi = org.spanlift.geometry.RetwistedPlanform.shape(knots, root, j, y);
                if (phi != 0) {
                    for (int p = 0; p < panels; p++) {
                        knotPanels[j][p] += phi * basis.circulation(u, p);
                    }
                }
            }
        }
        BasisSolutions b = analysis.basis();
        int n = strips.size();
        gx = new double[n];
        gz = new double[n];
        gk = new double[k][n];
        double area = wing.reference().area();
        double lx = 0;
        double lz = 0;
        liftK = new double[k];
        for (int s = 0; s < n; s++) {
            Strip st = strips.get(s);
            for (int r = 0; r < st.rows(); r++) {
                int p = st.firstPanel() + r;
                double ly = 2 * (lattice.by(p) - lattice.ay(p)) / area;
                double x = b.alongX(p, cruiseDeflections);
                gx[s] += x;
                gz[s] += b.alongZ(p);
                lx += x * ly;
                lz += b.alongZ(p) * ly;
                for (int j = 0; j < k; j++) {
                    gk[j][s] += knotPanels[j][p];
                    liftK[j] += knotPanels[j][p] * ly;
                }
            }
        }
        liftX = lx;
        liftZ = lz;
        q = LeastDragTwist.dragForm(lattice, area);
        StripLimits limits = StripLimits.of(wing, lattice, this.deflections, assumedClMax);
        List<Integer> ids = limits.strips();
        boolean symmetric = symmetricDeflections(wing, this.deflections);
        double tipChord = StallAnalysis.POINTED_TIP_CHORD * wing.main().meanAerodynamicChord();
        double limit = Double.POSITIVE_INFINITY;
        double dcl = Double.NEGATIVE_INFINITY;
        for (WashoutRequirement r : requirements) {
            if (r instanceof WashoutRequirement.OnsetInboard o) {
                ControlSurface c = wing.control(o.control()).orElseThrow();
                limit = Math.min(limit, c.from() - o.clearance());
            } else if (r instanceof WashoutRequirement.AileronMargin a) {
                dcl = Math.max(dcl, a.dcl());
            }
        }
        onsetLimit = limit;
        List<Integer> kept = new ArrayList<>();
        for (int i = 0; i < ids.size(); i++) {
            Strip st = strips.get(ids.get(i));
            if (!symmetric || st.right()) {
                kept.add(ids.get(i));
            }
        }
        int m = kept.size();
        stallStrip = new int[m];
        bStall = new double[m];
        aStall = new double[m][k];
        candidate = new boolean[m];
        reachChecked = new boolean[m];
        margin = new double[m];
        for (int i = 0; i < m; i++) {
            Strip st = strips.get(kept.get(i));
            stallStrip[i] = kept.get(i);
            double z = 0;
            for (int r = 0; r < st.rows(); r++) {
                int p = st.firstPanel() + r;
                z += b.alongZ(p);
                for (int j = 0; j < k; j++) {
                    aStall[i][j] += 2 * knotPanels[j][p] / st.chord();
                }
            }
            bStall[i] = 2 * z / st.chord();
            double y = Math.abs(st.y());
            boolean pointed = st.chord() < tipChord;
            reachChecked[i] = !pointed;
            candidate[i] = !pointed && bStall[i] > 0 && y <= limit;
            margin[i] = y > limit ? OUTBOARD_MARGIN : 0;
            if (dcl > Double.NEGATIVE_INFINITY && onAileron(wing, y)) {
                margin[i] = Math.max(margin[i], dcl + SAFETY);
                reachChecked[i] = true;
            }
        }
    }

    private static boolean onAileron(Wing wing, double y) {
        for (ControlSurface c : wing.main().controls()) {
            if (c.kind() == ControlKind.AILERON && y > c.from() && y < c.to()) {
                return true;
            }
        }
        return false;
    }

    private static boolean symmetricDeflections(Wing wing, double[] deflections) {
        List<ControlSurface> controls = wing.controls();
        for (int c = 0; c < controls.size(); c++) {
            if (controls.get(c).kind() == ControlKind.AILERON && deflections[c] != 0) {
                return false;
            }
        }
        return true;
    }

    /**
     * Knots at even fractions k / count of the semi-span (k = 1..count), each moved onto the nearest strip edge
     * of the wing's lattice (so that stations written there leave the lattice as it is), the last at the tip.
     *
     * @throws RefusedException when two fall on one edge (too many knots for the strips) or the wing is not
     *                          mirrored
     */
    public static double[] evenKnots(Wing wing, int count) {
        if (!wing.symmetric()) {
            throw new RefusedException("a twist distribution needs a mirrored wing");
        }
        if (count < 1) {
            throw new RefusedException("give at least one twist station");
        }
        Lattice lattice = LatticeBuilder.build(wing);
        TreeSet<Double> edges = new TreeSet<>();
        for (Strip st : lattice.strips()) {
            if (st.surface() == 0 && st.right()) {
                edges.add(st.yLeft());
                edges.add(st.yRight());
            }
        }
        double y0 = wing.main().planform().yStart();
        double y1 = wing.main().planform().yEnd();
        double[] knots = new double[count];
        for (int j = 1; j <= count; j++) {
            double target = y0 + (y1 - y0) * j / count;
            Double below = edges.floor(target);
            Double above = edges.ceiling(target);
            double near = below == null ? above : above == null ? below
                    : target - below <= above - target ? below : above;
            knots[j - 1] = j == count ? y1 : near;
            if (!(knots[j - 1] > (j == 1 ? y0 : knots[j - 2]))) {
                throw new RefusedException(count + " twist stations need more strips: two fall on one strip "
                        + "edge of the "
                        + (edges.size() - 1) + " strips of the half-wing");
            }
        }
        return knots;
    }

    /**
     * Finds the twist.
     *
     * @param deflections  control deflections, rad, control order (the stall is studied with them; the cruise
     *                     with the flaps at zero)
     * @param requirements stall onset inboard of a control and the aileron margin at onset; none: cruise alone
     * @param cruiseCl     the CL of the cruise drag
     * @param linear       the linear washout's answer for the same requirements, if any (a candidate)
     * @throws RefusedException for a requirement that is not linear in twist (ailerons below their peak at the
     *                          maximum lift), a wing that is not mirrored, or a requirement the wing cannot be
     *                          measured against
     */
    public static Result find(Wing wing, double[] deflections, List<WashoutRequirement> requirements, double cruiseCl,
            OptionalDouble assumedClMax, Optional<FlightCondition> condition, Shape shape,
            Optional<WashoutPoint> linear) {
        if (!wing.symmetric()) {
            throw new RefusedException("a twist distribution needs a mirrored wing");
        }
        for (WashoutRequirement r : requirements) {
            if (r.needsMaximumLift()) {
                throw new RefusedException("a twist distribution takes the onset requirements only (onset inboard of a "
                        + "control, aileron margin): the lift at the maximum is not linear in twist");
            }
            WashoutRequirement.check(wing, r);
        }
        return new TwistDesign(wing, deflections, requirements, cruiseCl, assumedClMax, condition, shape)
                .search(linear);
    }

    /** The wing with a twist change at the knots (rad), analysed. */
    WashoutPoint at(double[] change) {
        Wing w = wing.withTwistChange(shape.knots(), change);
        WingAnalysis analysis = WingAnalysis.of(w, cache, deflections);
        StallStudy.Configuration c = StallStudy.configuration("twist", analysis, deflections, assumedClMax, condition);
        double alpha = analysis.liftCurve(cruiseDeflections).alphaForTarget(cruiseCl);
        Coefficients cruise = analysis.solve(alpha, cruiseDeflections).coefficients();
        double washout = w.main().planform().washout();
        WashoutPoint p = new WashoutPoint(washout, washout - wing.main().planform().washout(), w, c.estimate(),
                c.speed().map(s -> OptionalDouble.of(s.equivalent())).orElse(OptionalDouble.empty()), Optional.empty(),
                cruise.spanEfficiency(), cruise.inducedDrag());
        cruiseAlpha.put(p, alpha);
        return p;
    }

    private boolean meets(WashoutPoint p) {
        return requirements.stream().allMatch(r -> r.slack(p) >= 0);
    }

    private Result search(Optional<WashoutPoint> linear) {
        double[] linearChange = null;
        if (linear.isPresent()) {
            linearChange = linearAt(linear.get().change());
            boolean within = true;
            for (int j = 0; j < k; j++) {
                within &= linearChange[j] >= shape.lower() && linearChange[j] <= shape.upper();
            }
            if (!within) {
                linearChange = null;
            }
        }
        double[] t = linearChange != null ? linearChange.clone() : new double[k];
        WashoutPoint best = null;
        double[] bestChange = null;
        boolean fromLinear = false;
        OptionalDouble critical = OptionalDouble.empty();
        Optional<WashoutPoint> linearPoint = linear.map(l -> at(linearAt(l.change())));
        if (linearChange != null && meets(linearPoint.orElseThrow())) {
            best = linearPoint.get();
            bestChange = linearChange.clone();
            fromLinear = true;
        }
        WashoutPoint unwashed = at(linearAt(-wing.main().planform().washout()));
        boolean settled = false;
        int rounds = 0;
        WashoutPoint current = at(t);
        while (rounds < MAX_ROUNDS) {
            rounds++;
            Optional<double[]> next = round(t, current);
            if (next.isEmpty()) {
                settled = true;
                break;
            }
            double[] tn = next.get();
            double step = 0;
            for (int j = 0; j < k; j++) {
                step = Math.max(step, Math.abs(tn[j] - t[j]));
            }
            t = tn;
            current = at(t);
            if (meets(current) && (best == null || current.cruiseDrag() < best.cruiseDrag())) {
                best = current;
                bestChange = t.clone();
                fromLinear = false;
                critical = OptionalDouble.of(current.onset().y());
            }
            if (step < SETTLED_RAD) {
                settled = true;
                break;
            }
        }
        return new Result(best != null, Optional.ofNullable(best), bestChange != null ? bestChange : new double[k],
                fromLinear, settled, rounds, fromLinear ? OptionalDouble.empty() : critical, linearPoint, unwashed);
    }

    /** A linear washout change (rad) as changes at the knots: exact, the change being linear in y. */
    private double[] linearAt(double washoutChange) {
        double[] knots = shape.knots();
        double span = wing.main().planform().yEnd() - root;
        double[] t = new double[k];
        for (int j = 0; j < k; j++) {
            t[j] = -washoutChange * (knots[j] - root) / span;
        }
        return t;
    }

    /**
     * One round: the programs of every candidate critical strip with cos a and cl_max held at the exact analysis
     * of the current twist; the best feasible twist, or empty when none is.
     */
    private Optional<double[]> round(double[] t, WashoutPoint p) {
        double cc = Math.cos(cruiseAlpha.get(p));
        // cruise: tan a = (CL / cc - liftX - liftK.t) / liftZ; H = h0 + D t
        int n = gx.length;
        double[] h0 = new double[n];
        double[][] d = new double[k][n];
        double base = (cruiseCl / cc - liftX) / liftZ;
        for (int s = 0; s < n; s++) {
            h0[s] = gx[s] + base * gz[s];
            for (int j = 0; j < k; j++) {
                d[j][s] = gk[j][s] - liftK[j] / liftZ * gz[s];
            }
        }
        double[][] qd = new double[k][n];
        double[] qh = new double[n];
        for (int s = 0; s < n; s++) {
            for (int r = 0; r < n; r++) {
                double qsr = q.get(s, r);
                qh[s] += qsr * h0[r];
                for (int j = 0; j < k; j++) {
                    qd[j][s] += qsr * d[j][r];
                }
            }
        }
        double[][] g = new double[k][k];
        double[] a = new double[k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                g[i][j] = 2 * cc * cc * dot(d[i], qd[j]);
            }
            a[i] = 2 * cc * cc * dot(d[i], qh);
        }
        // stall: each strip's cl_max and a_i at t = 0, from the exact analysis of t
        StallEstimate est = p.onset();
        Map<Double, StallEstimate.StripStall> byY = new HashMap<>();
        for (StallEstimate.StripStall s : est.strips()) {
            byY.put(s.y(), s);
        }
        double cs = Math.cos(est.alpha());
        double ts = Math.tan(est.alpha());
        int m = stallStrip.length;
        double[] clMax = new double[m];
        double[] a0 = new double[m];
        for (int i = 0; i < m; i++) {
            StallEstimate.StripStall s = byY.get(strips.get(stallStrip[i]).y());
            if (s == null) {
                throw new IllegalStateException("a stall strip is missing from the onset");
            }
            clMax[i] = s.clMax();
            a0[i] = s.clAtOnset() / cs - bStall[i] * ts - dot(aStall[i], t);
        }
        List<double[]> fixedRows = new ArrayList<>();
        List<Double> fixedRhs = new ArrayList<>();
        double[] knots = shape.knots();
        for (int j = 0; j < k; j++) {
            double[] lo = new double[k];
            lo[j] = 1;
            fixedRows.add(lo);
            fixedRhs.add(shape.lower());
            double[] hi = new double[k];
            hi[j] = -1;
            fixedRows.add(hi);
            fixedRhs.add(-shape.upper());
        }
        if (Double.isFinite(shape.smoothness())) {
            double h = (knots[k - 1] - root) / k;
            for (int j = 0; j + 1 < k; j++) {
                double yl = j == 0 ? root : knots[j - 1];
                double[] row = new double[k];
                double right = h / (knots[j + 1] - knots[j]);
                double left = h / (knots[j] - yl);
                row[j + 1] += right;
                row[j] -= right + left;
                if (j > 0) {
                    row[j - 1] += left;
                }
                fixedRows.add(row);
                fixedRhs.add(-shape.smoothness());
                double[] neg = new double[k];
                for (int i = 0; i < k; i++) {
                    neg[i] = -row[i];
                }
                fixedRows.add(neg);
                fixedRhs.add(-shape.smoothness());
            }
        }
        double bestValue = Double.POSITIVE_INFINITY;
        double[] bestX = null;
        for (int c = -1; c < m; c++) {
            if (c < 0 ? !requirements.isEmpty() : requirements.isEmpty() || !candidate[c]) {
                continue;
            }
            List<double[]> rows = new ArrayList<>(fixedRows);
            List<Double> rhs = new ArrayList<>(fixedRhs);
            for (int i = 0; c >= 0 && i < m; i++) {
                if (i == c || (!reachChecked[i] && margin[i] == 0)) {
                    continue;
                }
                double ratio = bStall[i] / bStall[c];
                double[] row = new double[k];
                double norm = 0;
                for (int j = 0; j < k; j++) {
                    row[j] = -cs * (aStall[i][j] - ratio * aStall[c][j]);
                    norm += row[j] * row[j];
                }
                double bound = ratio * clMax[c] + cs * (a0[i] - ratio * a0[c]) - (clMax[i] - margin[i]);
                if (Math.sqrt(norm) < 1e-12 && bound <= 1e-12) {
                    continue;
                }
                rows.add(row);
                rhs.add(bound);
            }
            QuadraticProgram.Solution s;
            try {
                s = QuadraticProgram.solve(g, a, rows.toArray(new double[0][]),
                        rhs.stream().mapToDouble(Double::doubleValue).toArray());
            } catch (IllegalArgumentException e) {
                throw new RefusedException("these twist stations can change every strip's incidence alike, which "
                        + "the cruise drag does not see (a station on the first strip edge); use fewer stations");
            }
            if (s.feasible() && s.value() < bestValue) {
                bestValue = s.value();
                bestX = s.x();
            }
        }
        return Optional.ofNullable(bestX);
    }

    private static double dot(double[] p, double[] q) {
        double s = 0;
        for (int i = 0; i < p.length; i++) {
            s += p[i] * q[i];
        }
        return s;
    }

    @Override
    public String toString() {
        return "TwistDesign" + Arrays.toString(shape.knots());
    }
}
