package org.spanlift.loads;

import org.spanlift.solve.LiftCurve;
import org.spanlift.input.RefusedException;
import org.spanlift.structure.LoadCase;
import org.spanlift.structure.PointMass;
import org.spanlift.structure.WingStructure;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.TreeSet;
import java.util.Locale;

import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Planform;
import org.spanlift.geometry.Surface;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.Strip;
import org.spanlift.results.PanelForces;
import org.spanlift.results.ProfileDrag;
import org.spanlift.results.Solution;
import org.spanlift.solve.BasisSolutions;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.StallAnalysis;
import org.spanlift.stall.StripLimits;

/**
 * Spanwise shear, bending and torsion of the wing (the first surface) for symmetric load cases, at the
 * strip edges of its right half. The air load is the Kutta-Joukowski force of every panel (so twist, camber
 * and flap loads are in it) at the panel's bound-leg midpoint; the inertia relief is n g m along minus the
 * lift direction for the wing's distributed mass (lumped per strip at its centroid) and its point masses.
 * Moments are taken about the spar point of each station and resolved on axes along and normal to the
 * spar line in the wing plane (see the package description for the signs).
 *
 * <p>Each case's angle of attack makes the wing alone carry n W: CL_wing = n W / (q S) on the lift line of
 * the wing's own panels at the given deflections. With an aileron deflected the halves differ; the right
 * half is reported, and the left half with deflection d is the right half with -d.
 */
public final class LoadsAnalysis {

    /** Newton steps allowed to find a case's angle of attack. */
    private static final int MAX_ITERATIONS = 50;

    private static final double[] GAUSS_X = {-0.9061798459386640, -0.5384693101056831, 0.0, 0.5384693101056831,
        0.9061798459386640};
    private static final double[] GAUSS_W = {0.2369268850561891, 0.4786286704993665, 0.5688888888888889,
        0.4786286704993665, 0.2369268850561891};

    private final WingAnalysis analysis;
    private final WingStructure structure;
    private final double[] deflections;
    private final List<Strip> strips;
    private final double[] edges;
    private final double[] stripMass;
    private final double[][] massPoint;
    private final double[][] spar;
    private final double[][] sparAxis;
    private final double distributedHalfMass;
    private final LiftCurve wingLine;

    private LoadsAnalysis(WingAnalysis analysis, WingStructure structure, double[] deflections) {
        this.analysis = analysis;
        this.structure = structure;
        this.deflections = deflections.clone();
        Surface wing = analysis.wing().main();
        if (!wing.mirrored()) {
            throw new IllegalArgumentException("loads are computed per half-wing: the first surface must be mirrored");
        }
        Lattice lattice = analysis.lattice();
        List<Strip> right = new ArrayList<>();
        for (Strip s : lattice.strips()) {
            if (s.surface() == 0 && s.right()) {
                right.add(s);
            }
        }
        right.sort(Comparator.comparingDouble(Strip::yLeft));
        this.strips = List.copyOf(right);
        int n = strips.size();
        this.edges = new double[n + 1];
        for (int j = 0; j < n; j++) {
            edges[j] = strips.get(j).yLeft();
            if (j > 0 && Math.abs(strips.get(j - 1).yRight() - edges[j]) > 1e-12 * (1 + Math.abs(edges[j]))) {
                throw new IllegalStateException("the wing's strips do not join edge to edge");
            }
        }
        edges[n] = strips.get(n - 1).yRight();
        Planform p = wing.planform();

        // distributed mass per strip and its centroid
        this.stripMass = new double[n];
        this.massPoint = new double[n][];
        double[] weight = new double[n];
        double fm = structure.massCentreFraction();
        double total = 0;
        for (int j = 0; j < n; j++) {
            double[] moments = massMoments(p, edges[j], edges[j + 1], fm);
            weight[j] = moments[0];
            total += moments[0];
            massPoint[j] = moments[0] > 0
                    ? new double[] {moments[1] / moments[0], moments[2] / moments[0], moments[3] / moments[0]}
                    : new double[] {p.noseX(strips.get(j).y()) + fm * p.chord(strips.get(j).y()), strips.get(j).y(),
                        p.noseZ(strips.get(j).y())};
        }
        if (structure.table().isPresent()) {
            System.arraycopy(weight, 0, stripMass, 0, n);
            this.distributedHalfMass = total;
        } else {
            double half = structure.wingMass().orElse(0.0) / 2;
            for (int j = 0; j < n; j++) {
                stripMass[j] = total > 0 ? half * weight[j] / total : 0;
            }
            this.distributedHalfMass = half;
        }

        // spar points and axes at each station
        double fs = structure.sparFraction();
        this.spar = new double[n + 1][];
        for (int k = 0; k <= n; k++) {
            double y = edges[k];
            spar[k] = new double[] {p.noseX(y) + fs * p.chord(y), y, p.noseZ(y)};
        }
        this.sparAxis = new double[n + 1][];
        for (int k = 0; k <= n; k++) {
            int a = Math.min(k, n - 1);
            double[] es = unit(minus(spar[a + 1], spar[a]));
            double[] nw = unit(cross(new double[] {1, 0, 0}, es));
            double[] et = cross(es, nw);
            sparAxis[k] = new double[] {es[0], es[1], es[2], nw[0], nw[1], nw[2], et[0], et[1], et[2]};
        }
        this.wingLine = wingLiftLine();
    }

    /** The loads of {@code analysis}'s wing with the given structure, at deflections in rad (control order). */
    public static LoadsAnalysis of(WingAnalysis analysis, WingStructure structure, double[] deflections) {
        return new LoadsAnalysis(analysis, structure, deflections);
    }

    /** The structure the loads are computed with. */
    public WingStructure structure() {
        return structure;
    }

    /** One half's distributed mass, kg. */
    public double distributedHalfMass() {
        return distributedHalfMass;
    }

    /** The mass of one half-wing with its point masses, kg. */
    public double halfWingMass() {
        return distributedHalfMass + structure.pointMassPerSide();
    }

    /** The solved wing these loads come from. */
    public WingAnalysis analysis() {
        return analysis;
    }

    /** The lift line of the wing's own panels (the first surface) at this analysis's deflections. */
    public LiftCurve liftCurve() {
        return wingLine;
    }

    /**
     * The longitudinal axis's angle above the wing file's x axis, nose-up positive, rad: the structure's, else
     * the root chord line of the wing (its twist at the root).
     */
    public double axisAngle() {
        Planform p = analysis.wing().main().planform();
        return structure.longitudinalAxis().orElse(p.twist(p.yStart()));
    }

    /**
     * The loads of one case (limit loads: no safety factor). The case's load factor is the aerodynamic force
     * normal to the longitudinal axis over the weight (14 CFR 23.321(a), text before the 2017 rewrite), so the
     * angle of attack is solved for CN = CL cos(a) + CD sin(a) = n W / (q S) with a the angle of attack of the
     * longitudinal axis and CD the wing's induced plus profile drag; the inertia relief acts along the normal
     * axis. The air load of every strip is its panels' Kutta-Joukowski force plus its induced drag (from the
     * Trefftz-plane downwash, so the strips sum to the induced drag) and its profile drag (from the section
     * polars at the case's Reynolds number, where every section gives one), along the freestream.
     *
     * @throws RefusedException when no angle in the linear range carries the case
     */
    public SpanwiseLoads loads(LoadCase c) {
        return loads(c, deflections, 1, SpanwiseLoads.Side.BOTH);
    }

    /**
     * The loads of a case on each half: one entry for a symmetric case; the right and then the left half for
     * an unsymmetrical one. With an aileron deflection the angle of attack carries the whole normal force
     * with the ailerons deflected (antisymmetric, so the lift curve is the symmetric one) and the left half is
     * the mirror of the right with the deflection reversed; with a share, the left half carries that share of
     * the right half's air load and its full inertia.
     */
    public List<SpanwiseLoads> halves(LoadCase c) {
        if (c.asymmetry().isEmpty()) {
            return List.of(loads(c));
        }
        LoadCase.Asymmetry a = c.asymmetry().get();
        if (a.otherSide().isPresent()) {
            return List.of(loads(c, deflections, 1, SpanwiseLoads.Side.RIGHT),
                    loads(c, deflections, a.otherSide().getAsDouble(), SpanwiseLoads.Side.LEFT));
        }
        double[] right = deflections.clone();
        double[] left = deflections.clone();
        List<ControlSurface> controls = analysis.wing().controls();
        boolean any = false;
        for (int k = 0; k < controls.size(); k++) {
            if (controls.get(k).kind() == ControlKind.AILERON) {
                right[k] = a.aileron().getAsDouble();
                left[k] = -a.aileron().getAsDouble();
                any = true;
            }
        }
        if (!any) {
            throw new RefusedException("load case '" + c.name() + "' deflects the ailerons, but the wing has none");
        }
        return List.of(loads(c, right, 1, SpanwiseLoads.Side.RIGHT), loads(c, left, 1, SpanwiseLoads.Side.LEFT));
    }

    private SpanwiseLoads loads(LoadCase c, double[] deflections, double airShare, SpanwiseLoads.Side side) {
        double area = analysis.wing().reference().area();
        double q = c.dynamicPressure();
        double target = c.liftCoefficient(area);
        double theta = axisAngle();
        double reynoldsPerMetre = c.reynoldsPerMetre();
        double alpha;
        try {
            alpha = wingLine.alphaFor(target);
        } catch (RefusedException e) {
            throw beyondRange(c, target);
        }
        Aero aero = aero(alpha, reynoldsPerMetre, deflections);
        for (int k = 0; k < MAX_ITERATIONS
                && Math.abs(aero.normal(theta) - target) > 1e-13 * Math.max(1, Math.abs(target)); k++) {
            double h = 1e-6;
            double slope = (aero(alpha + h, reynoldsPerMetre, deflections).normal(theta)
                    - aero(alpha - h, reynoldsPerMetre, deflections).normal(theta)) / (2 * h);
            double next = alpha - (aero.normal(theta) - target) / slope;
            if (!Double.isFinite(next) || Math.abs(next) > Math.toRadians(LiftCurve.MAX_TARGET_ALPHA_DEG)) {
                throw beyondRange(c, target);
            }
            alpha = next;
            aero = aero(alpha, reynoldsPerMetre, deflections);
        }
        if (!(Math.abs(aero.normal(theta) - target) <= 1e-9 * Math.max(1, Math.abs(target)))) {
            throw beyondRange(c, target);
        }
        Solution s = aero.solution();
        PanelForces pf = s.panelForces();
        double[] drag = {Math.cos(alpha), 0, Math.sin(alpha)};
        double[] normal = {Math.sin(theta), 0, Math.cos(theta)};
        double ng = c.loadFactor() * StandardAtmosphere.G0;
        Lattice lattice = analysis.lattice();
        Planform p = analysis.wing().main().planform();
        int n = strips.size();
        double[][] force = new double[n + 1][3];
        double[][] moment = new double[n + 1][3];
        for (int j = n - 1; j >= 0; j--) {
            Strip st = strips.get(j);
            double[] f = force[j];
            double[] g = moment[j];
            for (int r = 0; r < st.rows(); r++) {
                int i = st.firstPanel() + r;
                double[] fi = {airShare * q * pf.fx(i), airShare * q * pf.fy(i), airShare * q * pf.fz(i)};
                add(f, g, new double[] {pf.x(i), pf.y(i), pf.z(i)}, fi);
            }
            int k = lattice.stripOf(st.firstPanel());
            double d = airShare * q * (aero.induced()[k] + aero.profile()[k]);
            double ym = 0.5 * (st.yLeft() + st.yRight());
            add(f, g, new double[] {p.noseX(ym) + 0.25 * p.chord(ym), ym, p.noseZ(ym)},
                    new double[] {d * drag[0], d * drag[1], d * drag[2]});
            double w = -ng * stripMass[j];
            add(f, g, massPoint[j], new double[] {w * normal[0], w * normal[1], w * normal[2]});
            for (int a = 0; a < 3; a++) {
                f[a] += force[j + 1][a];
                g[a] += moment[j + 1][a];
            }
        }
        double[] shear = new double[n + 1];
        double[] bending = new double[n + 1];
        double[] torsion = new double[n + 1];
        double[] chordShear = new double[n + 1];
        double[] chordBending = new double[n + 1];
        double normalLoad = 0;
        for (int k = 0; k <= n; k++) {
            double[] f = force[k].clone();
            double[] g = moment[k].clone();
            for (PointMass pm : structure.pointMasses()) {
                if (pm.y() > edges[k]) {
                    double w = -ng * pm.mass();
                    add(f, g, new double[] {pm.x(), pm.y(), p.noseZ(pm.y())},
                            new double[] {w * normal[0], w * normal[1], w * normal[2]});
                }
            }
            double[] m = minus(g, cross(spar[k], f));
            double[] ax = sparAxis[k];
            double[] es = {ax[0], ax[1], ax[2]};
            double[] nw = {ax[3], ax[4], ax[5]};
            double[] et = {ax[6], ax[7], ax[8]};
            shear[k] = dot(f, nw);
            chordShear[k] = dot(f, et);
            bending[k] = dot(m, et);
            torsion[k] = dot(m, es);
            chordBending[k] = -dot(m, nw);
            if (k == 0) {
                normalLoad = dot(f, normal);
            }
        }
        double a = alpha + theta;
        double cl = aero.lift();
        double cd = aero.drag();
        return new SpanwiseLoads(c, alpha, cl, cd, cl * Math.cos(a) + cd * Math.sin(a),
                cd * Math.cos(a) - cl * Math.sin(a),
                theta, q, edges, shear, bending, torsion, chordShear, chordBending, normalLoad, 1, side);
    }

    private RefusedException beyondRange(LoadCase c, double target) {
        return new RefusedException("load case '" + c.name() + "' needs CN " + String.format(Locale.ROOT, "%.3f",
                target) + ", beyond the wing's linear range; check its weight, load factor and speed");
    }

    /**
     * The wing's normal-force coefficient about the longitudinal axis at angle of attack {@code alpha} (rad), with
     * the profile drag read at {@code reynoldsPerMetre}: the stall line of an envelope at the stall-onset angle.
     */
    public double normalCoefficient(double alpha, double reynoldsPerMetre) {
        return aero(alpha, reynoldsPerMetre, deflections).normal(axisAngle());
    }

    /** The wing's (first surface's) aerodynamics at one angle: its solution, CL, CD and per-strip drag areas. */
    private record Aero(Solution solution, double lift, double drag, double[] induced, double[] profile) {

        /** CN about a longitudinal axis {@code theta} above x. */
        double normal(double theta) {
            double a = solution.alpha() + theta;
            return lift * Math.cos(a) + drag * Math.sin(a);
        }
    }

    private Aero aero(double alpha, double reynoldsPerMetre, double[] deflections) {
        Solution s = analysis.solve(alpha, deflections);
        double[] induced = s.stripInducedDrag();
        double[] profile = ProfileDrag.stripDragAreas(s, analysis.wing(), reynoldsPerMetre);
        List<Strip> all = analysis.lattice().strips();
        double dragArea = 0;
        for (int k = 0; k < all.size(); k++) {
            if (all.get(k).surface() == 0) {
                dragArea += induced[k] + profile[k];
            }
        }
        double area = analysis.wing().reference().area();
        return new Aero(s, s.coefficients(0).lift(), dragArea / area, induced, profile);
    }

    /**
     * The wing's stall-onset CL at the case's Reynolds number and this analysis's deflections (critical-
     * section method): the most lift the case may ask for.
     */
    public double stallOnsetLift(LoadCase c, StripLimits limits) {
        return StallAnalysis.estimate(analysis, deflections, limits, c.reynoldsPerMetre()).lift();
    }

    /**
     * True when the case needs more wing lift than the stall onset gives: a positive load factor with a CL
     * above {@code onsetLift} (beyond round-off), so it cannot be flown at that speed.
     */
    public static boolean beyondStall(SpanwiseLoads l, double onsetLift) {
        return l.loadCase().loadFactor() > 0 && l.liftCoefficient() > onsetLift * (1 + 1e-9);
    }

    /** The loads of every case, in order, each unsymmetrical case as its right and then its left half. */
    public List<SpanwiseLoads> loads(List<LoadCase> cases) {
        List<SpanwiseLoads> out = new ArrayList<>();
        cases.forEach(c -> out.addAll(halves(c)));
        return out;
    }

    private LiftCurve wingLiftLine() {
        Lattice lattice = analysis.lattice();
        BasisSolutions basis = analysis.basis();
        double x = 0;
        double z = 0;
        for (int i = 0; i < lattice.panelCount(); i++) {
            if (lattice.strips().get(lattice.stripOf(i)).surface() != 0) {
                continue;
            }
            double ly = lattice.by(i) - lattice.ay(i);
            double gx = basis.alongX(i);
            for (int c = 0; c < deflections.length; c++) {
                if (deflections[c] != 0) {
                    gx += deflections[c] * basis.control(c, i);
                }
            }
            x += 2 * gx * ly;
            z += 2 * basis.alongZ(i) * ly;
        }
        double area = analysis.wing().reference().area();
        return new LiftCurve(Math.hypot(x, z) / area, Math.atan2(-x, z));
    }

    /**
     * The integrals over [a, b] of the mass density w(y) (chord, or the table's mass per span), and of
     * w times the mass centre's x, times y, times z: {int w, int w x, int w y, int w z}. Five-point
     * Gauss-Legendre on each piece between the planform's stations and the table's rows, exact for the
     * piecewise-polynomial planforms of degree up to nine.
     */
    private double[] massMoments(Planform p, double a, double b, double fm) {
        TreeSet<Double> cuts = new TreeSet<>();
        cuts.add(a);
        cuts.add(b);
        for (double y : p.stationYs()) {
            if (y > a && y < b) {
                cuts.add(y);
            }
        }
        structure.table().ifPresent(t -> {
            for (double y : t.y()) {
                if (y > a && y < b) {
                    cuts.add(y);
                }
            }
        });
        double[] out = new double[4];
        Double lo = null;
        for (double hi : cuts) {
            if (lo != null) {
                double mid = 0.5 * (lo + hi);
                double half = 0.5 * (hi - lo);
                for (int g = 0; g < GAUSS_X.length; g++) {
                    double y = mid + half * GAUSS_X[g];
                    double c = p.chord(y);
                    double w = structure.table().map(t -> t.at(y)).orElse(c) * GAUSS_W[g] * half;
                    out[0] += w;
                    out[1] += w * (p.noseX(y) + fm * c);
                    out[2] += w * y;
                    out[3] += w * p.noseZ(y);
                }
            }
            lo = hi;
        }
        return out;
    }

    private static void add(double[] f, double[] g, double[] r, double[] fi) {
        for (int a = 0; a < 3; a++) {
            f[a] += fi[a];
        }
        double[] rxf = cross(r, fi);
        for (int a = 0; a < 3; a++) {
            g[a] += rxf[a];
        }
    }

    private static double[] cross(double[] a, double[] b) {
        return new double[] {a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]};
    }

    private static double[] minus(double[] a, double[] b) {
        return new double[] {a[0] - b[0], a[1] - b[1], a[2] - b[2]};
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    private static double[] unit(double[] a) {
        double l = Math.sqrt(dot(a, a));
        return new double[] {a[0] / l, a[1] / l, a[2] / l};
    }
}
