package org.spanlift.stall;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.decomposition.lu.LUDecompositionAlt_DDRM;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.Strip;
import org.spanlift.results.Solution;
import org.spanlift.solve.BasisSolutions;
import org.spanlift.solve.StripBasis;
import org.spanlift.solve.LiftCurve;
import org.spanlift.solve.WingAnalysis;

/**
 * The lattice coupled with the strips' section lift curves (a viscous-inviscid coupling in the manner of
 * Sivells and Neely, NACA TN 1269, 1947, and of the decambering approach of Mukherjee and Gopalarathnam,
 * J. Aircraft 43(3), 2006): each wing strip i gets an incidence correction d_i, entering the right-hand side
 * as the panel incidence does, so that its lattice lift equals its section curve at its effective angle of
 * attack,
 *
 * <pre>
 *   cl_i(d) = A_i cos a + B_i sin a + cos a sum_j K_ij d_j       (the lattice, by superposition)
 *   alpha_i = alpha_0,i + cl_i / (2 pi) - d_i                     (the strip's effective angle of attack)
 *   R_i     = cl_i - f_i(alpha_i) + S_i(d) = 0,
 *   S_i(d)  = s 2 pi c_i^2 sum_j (d_i - d_j) / (h_i |y_i - y_j|)   (j the strips beside strip i)
 * </pre>
 *
 * alpha_0,i the strip's zero-lift angle in the lattice's thin-airfoil form ({@link StripCurves}). The
 * effective angle is the angle at which the strip's own two-dimensional thin-airfoil line gives its lattice
 * lift, less the correction; so with that line as the section curve every d_i is zero and the coupled
 * solution is the linear one. K comes from {@link StripBasis}, one back-substitution per strip on the
 * wing's factorization; each Newton step then costs a product with K and a small dense solve.
 *
 * <p>S is a spanwise smoothing of the corrections' departure from those of the straight-line problem (every
 * curve replaced by its straight part, a linear system; the d_j in S stand for that departure), a second
 * difference scaled by the local chord squared (h_i the strip's width, s = {@value #SMOOTHING}). Without it the coupled
 * problem is ill-posed past a section's peak: a strip's lift answers its own correction less the narrower the strip, so
 * once one strip passes its peak it can run away alone, the curve folds there and the maximum falls as the strips are
 * refined. The smoothing ties each correction to its neighbours over about a chord, so a stalled region is
 * at least that wide whatever the strips; the maximum then converges with the strips
 * (validation/CONVERGENCE.md). While every strip is on the straight part of its curve it adds nothing (the
 * corrections are then the straight-line ones, steps at a flap's end included), and with each strip's
 * thin-airfoil line as its curve the linear solution is unchanged. The
 * approach is that of an artificial viscosity added to the nonlinear lifting-line equation to keep its
 * post-stall solutions smooth along the span (J.-J. Chattot, in his work on the nonlinear lifting line with
 * viscous section data, about 2004; recalled from memory); the form and the weight here are the project's.
 *
 * <p>Newton's method with a backtracking line search on the largest residual; converged when every |R_i| is
 * at most {@value #TOLERANCE}. A symmetric condition of a mirrored wing solves the right half's strips with
 * mirrored corrections; an aileron's deflection makes every strip an unknown. Strips inboard of the fuselage
 * side stay linear. Immutable; {@link #solve} keeps its work arrays to itself.
 */
public final class SectionCoupling {

    /** The largest residual |cl_i - f_i(alpha_i)| of a converged solution. */
    public static final double TOLERANCE = 1e-10;
    private static final int MAX_ITERATIONS = 60;
    /**
     * The weight of the spanwise smoothing of the corrections (see the class notes), the project's choice:
     * it stiffens a pattern of corrections of spanwise wavelength two chords by about 6 per radian, more than
     * the steepest fall of a section curve past its peak, and one of eight chords by 0.4 only.
     */
    static final double SMOOTHING = 0.1;
    /**
     * The smallest length of the smoothing, over the wing's mean aerodynamic chord: toward a pointed tip the
     * chord goes to zero, and so would the smoothing, leaving the tip strips free to run away alone.
     */
    static final double MIN_LENGTH = 0.5;
    private static final double TWO_PI = 2 * Math.PI;

    private final WingAnalysis analysis;
    private final double[] deflections;
    private final StripCurves curves;
    private final StripBasis basis;
    private final int[] wingIndex;
    private final double[] a;
    private final double[] b;
    private final double[][] k;
    private final int[][] neighbours;
    private final double[][] smoothing;
    private final double[] liftPerCorrection;
    /** The wing's lift line without corrections (Kutta-Joukowski, freestream only). */
    private final LiftCurve wingLift;

    private SectionCoupling(WingAnalysis analysis, double[] deflections, StripCurves curves) {
        this.analysis = analysis;
        this.deflections = deflections.clone();
        this.curves = curves;
        Lattice lattice = analysis.lattice();
        Wing wing = analysis.wing();
        boolean symmetric = lattice.mirrored() && !antisymmetricDeflection(wing, deflections);
        List<Integer> ids = curves.limits().strips();
        List<Integer> unknowns = new ArrayList<>();
        List<Integer> index = new ArrayList<>();
        for (int i = 0; i < ids.size(); i++) {
            if (!symmetric || lattice.strips().get(ids.get(i)).right()) {
                unknowns.add(ids.get(i));
                index.add(i);
            }
        }
        this.basis = analysis.stripBasis(unknowns, symmetric);
        int m = unknowns.size();
        this.wingIndex = index.stream().mapToInt(Integer::intValue).toArray();
        this.a = new double[m];
        this.b = new double[m];
        this.k = new double[m][m];
        this.liftPerCorrection = new double[m];
        this.neighbours = new int[m][];
        this.smoothing = new double[m][];
        spanwiseSmoothing(lattice, unknowns);
        BasisSolutions linear = analysis.basis();
        for (int i = 0; i < m; i++) {
            Strip st = lattice.strips().get(unknowns.get(i));
            double gx = 0;
            double gz = 0;
            for (int r = 0; r < st.rows(); r++) {
                int p = st.firstPanel() + r;
                gx += linear.alongX(p, deflections);
                gz += linear.alongZ(p);
            }
            a[i] = 2 * gx / st.chord();
            b[i] = 2 * gz / st.chord();
            for (int j = 0; j < m; j++) {
                double g = 0;
                for (int r = 0; r < st.rows(); r++) {
                    g += basis.circulation(j, st.firstPanel() + r);
                }
                k[i][j] = 2 * g / st.chord();
            }
        }
        double area = wing.reference().area();
        boolean[] onWing = new boolean[lattice.panelCount()];
        double liftX = 0;
        double liftZ = 0;
        for (int p = 0; p < lattice.panelCount(); p++) {
            onWing[p] = lattice.strips().get(lattice.stripOf(p)).surface() == 0;
            if (onWing[p]) {
                double ly = lattice.by(p) - lattice.ay(p);
                liftX += 2 * linear.alongX(p, deflections) * ly;
                liftZ += 2 * linear.alongZ(p) * ly;
            }
        }
        // as WingAnalysis.liftCurve sums the whole lattice, so that a wing alone gets the same bits
        this.wingLift = new LiftCurve(Math.hypot(liftX, liftZ) / area, Math.atan2(-liftX, liftZ));
        for (int j = 0; j < m; j++) {
            double sum = 0;
            for (int p = 0; p < lattice.panelCount(); p++) {
                if (onWing[p]) {
                    sum += 2 * basis.circulation(j, p) * (lattice.by(p) - lattice.ay(p));
                }
            }
            liftPerCorrection[j] = sum / area;
        }
    }

    /**
     * The neighbours of each unknown along the span (strips whose edges touch, across a control's end too:
     * there the smoothing also spreads linear theory's concentrated lift at the end over about a chord,
     * without which the strip beside the end ran away alone and the maximum did not settle; in a symmetric
     * system the innermost strip's mirror image carries the same correction and adds nothing) and the weights
     * {@value #SMOOTHING} 2 pi c_i^2 / (h_i d_ij), h_i the strip's width and d_ij the distance between
     * control points: a second difference of the corrections over the span, scaled by the local chord
     * squared.
     */
    private void spanwiseSmoothing(Lattice lattice, List<Integer> unknowns) {
        int m = unknowns.size();
        double tol = 1e-9 * analysis.wing().reference().span();
        for (int i = 0; i < m; i++) {
            Strip si = lattice.strips().get(unknowns.get(i));
            List<Integer> found = new ArrayList<>();
            for (int j = 0; j < m; j++) {
                Strip sj = lattice.strips().get(unknowns.get(j));
                boolean touch = Math.abs(si.yRight() - sj.yLeft()) <= tol || Math.abs(si.yLeft() - sj.yRight()) <= tol;
                if (j != i && touch) {
                    found.add(j);
                }
            }
            neighbours[i] = found.stream().mapToInt(Integer::intValue).toArray();
            smoothing[i] = new double[neighbours[i].length];
            for (int n = 0; n < neighbours[i].length; n++) {
                Strip sj = lattice.strips().get(unknowns.get(neighbours[i][n]));
                double length = Math.max(si.chord(), MIN_LENGTH * analysis.wing().main().meanAerodynamicChord());
                smoothing[i][n] = SMOOTHING * TWO_PI * length * length / (si.width() * Math.abs(sj.y() - si.y()));
            }
        }
    }

    /** The smoothing term of unknown i at corrections x. */
    private double smoothed(int i, double[] x) {
        double sum = 0;
        for (int n = 0; n < neighbours[i].length; n++) {
            sum += smoothing[i][n] * (x[i] - x[neighbours[i][n]]);
        }
        return sum;
    }

    /**
     * The coupling of the wing at the given deflections (rad, control order) with the given strip curves.
     */
    public static SectionCoupling of(WingAnalysis analysis, double[] deflections, StripCurves curves) {
        return new SectionCoupling(analysis, deflections, curves);
    }

    private static boolean antisymmetricDeflection(Wing wing, double[] deflections) {
        for (int c = 0; c < deflections.length; c++) {
            if (deflections[c] != 0 && wing.controls().get(c).kind() == ControlKind.AILERON) {
                return true;
            }
        }
        return false;
    }

    /** Number of unknowns (strips with their own correction). */
    public int size() {
        return a.length;
    }

    /** The strip curves. */
    public StripCurves curves() {
        return curves;
    }

    /** The index into {@link StripLimits#strips()} of unknown i. */
    public int wingIndex(int i) {
        return wingIndex[i];
    }

    /** True when unknown i's chord is below {@link #MIN_LENGTH} of the mean aerodynamic chord. */
    public boolean narrow(int i) {
        return strip(i).chord() < MIN_LENGTH * analysis.wing().main().meanAerodynamicChord();
    }

    /** The lattice strip of unknown i. */
    public Strip strip(int i) {
        return analysis.lattice().strips().get(basis.strips().get(i));
    }

    /** True when each unknown stands for a right-half strip and its mirror image. */
    public boolean symmetric() {
        return basis.symmetric();
    }

    /** The deflections, rad, control order (a copy). */
    public double[] deflections() {
        return deflections.clone();
    }

    /**
     * Solves the coupled condition at angle of attack alpha (rad), starting from the given corrections (rad,
     * one per unknown; zeros for the linear solution).
     */
    public CoupledPoint solve(double alpha, double[] start) {
        return newton(start, alpha, null, 0);
    }

    /**
     * Solves for the corrections and the angle of attack together on the hyperplane through the predicted
     * point (xPredicted, alphaPredicted) normal to the direction (tx, ta): the corrector of pseudo-arclength
     * continuation (H. B. Keller, "Numerical solution of bifurcation and nonlinear eigenvalue problems",
     * 1977), which passes folds where the angle of attack turns back.
     */
    CoupledPoint correct(double[] xPredicted, double alphaPredicted, double[] tx, double ta) {
        return newton(xPredicted, alphaPredicted, tx, ta);
    }

    /**
     * Newton's method with a backtracking line search on the largest residual. With tx null, alpha is fixed;
     * otherwise alpha is an unknown too and the equation tx . (x - x0) + ta (alpha - alpha0) = 0 is added,
     * (x0, alpha0) the start.
     */
    private CoupledPoint newton(double[] start, double alphaStart, double[] tx, double ta) {
        int m = size();
        boolean bordered = tx != null;
        int n = bordered ? m + 1 : m;
        double[] x = start.clone();
        double alpha = alphaStart;
        double[] cl = new double[m];
        double[] angle = new double[m];
        double[] r = new double[m];
        double[] reference = straightCorrections(alpha, null);
        double norm = residual(alpha, x, cl, angle, r, reference);
        if (Double.isNaN(norm)) {
            return CoupledPoint.failed(alpha, CoupledPoint.Status.CURVE_ENDS, x);
        }
        DMatrixRMaj jac = new DMatrixRMaj(n, n);
        DMatrixRMaj square = new DMatrixRMaj(m, m);
        DMatrixRMaj step = new DMatrixRMaj(n, 1);
        LUDecompositionAlt_DDRM lu = new LUDecompositionAlt_DDRM();
        double[] trial = new double[m];
        double[] tcl = new double[m];
        double[] tangle = new double[m];
        double[] tr = new double[m];
        double constraint = 0;
        for (int it = 0; it <= MAX_ITERATIONS; it++) {
            jacobian(alpha, Math.cos(alpha), angle, square);
            if (Math.max(norm, Math.abs(constraint)) <= TOLERANCE) {
                boolean positive = lu.decompose(square) && lu.computeDeterminant().real > 0;
                return new CoupledPoint(alpha, CoupledPoint.Status.CONVERGED, lift(alpha, x), x, cl, angle,
                        positive, it);
            }
            if (bordered) {
                double[] ra = alphaDerivative(alpha, x, angle);
                for (int i = 0; i < m; i++) {
                    System.arraycopy(square.data, i * m, jac.data, i * n, m);
                    jac.data[i * n + m] = ra[i];
                    jac.data[m * n + i] = tx[i];
                }
                jac.data[m * n + m] = ta;
            } else {
                jac.setTo(square);
            }
            if (!lu.decompose(jac)) {
                return CoupledPoint.failed(alpha, CoupledPoint.Status.NOT_CONVERGED, x);
            }
            for (int i = 0; i < m; i++) {
                step.data[i] = -r[i];
            }
            if (bordered) {
                step.data[m] = -constraint;
            }
            if (!solveInPlace(lu, step)) {
                return CoupledPoint.failed(alpha, CoupledPoint.Status.NOT_CONVERGED, x);
            }
            double before = Math.max(norm, Math.abs(constraint));
            double lambda = 1;
            while (true) {
                for (int i = 0; i < m; i++) {
                    trial[i] = x[i] + lambda * step.data[i];
                }
                double ta2 = bordered ? alpha + lambda * step.data[m] : alpha;
                double[] tref = bordered ? straightCorrections(ta2, null) : reference;
                double tn = residual(ta2, trial, tcl, tangle, tr, tref);
                double tg = bordered ? hyperplane(trial, ta2, start, alphaStart, tx, ta) : 0;
                double after = Math.max(tn, Math.abs(tg));
                if (!Double.isNaN(tn) && after < (1 - 1e-4 * lambda) * before) {
                    System.arraycopy(trial, 0, x, 0, m);
                    System.arraycopy(tcl, 0, cl, 0, m);
                    System.arraycopy(tangle, 0, angle, 0, m);
                    System.arraycopy(tr, 0, r, 0, m);
                    alpha = ta2;
                    reference = tref;
                    norm = tn;
                    constraint = tg;
                    break;
                }
                lambda /= 2;
                if (lambda < 1.0 / 1024) {
                    return CoupledPoint.failed(alpha, Double.isNaN(tn) ? CoupledPoint.Status.CURVE_ENDS
                            : CoupledPoint.Status.NOT_CONVERGED, x);
                }
            }
        }
        return CoupledPoint.failed(alpha, CoupledPoint.Status.NOT_CONVERGED, x);
    }

    private static double hyperplane(double[] x, double alpha, double[] x0, double alpha0, double[] tx, double ta) {
        double g = ta * (alpha - alpha0);
        for (int i = 0; i < x.length; i++) {
            g += tx[i] * (x[i] - x0[i]);
        }
        return g;
    }

    /** d R_i / d alpha at fixed corrections: d cl_i / d alpha (1 - f_i' / (2 pi)). */
    private double[] alphaDerivative(double alpha, double[] x, double[] angle) {
        int m = size();
        double c = Math.cos(alpha);
        double s = Math.sin(alpha);
        double[] out = new double[m];
        for (int i = 0; i < m; i++) {
            double d = -a[i] * s + b[i] * c;
            for (int j = 0; j < m; j++) {
                d -= s * k[i][j] * x[j];
            }
            out[i] = d * (1 - curves.curve(wingIndex[i]).slope(angle[i]) / TWO_PI);
        }
        double[] rate = new double[m];
        straightCorrections(alpha, rate);
        for (int i = 0; i < m; i++) {
            out[i] -= smoothed(i, rate);
        }
        return out;
    }

    /**
     * The corrections of the straight-line problem at alpha: every strip's curve replaced by its straight
     * part, f_i = a_i (alpha_i - alpha_L0,i) ({@link StripCurves#lineSlope}, {@link StripCurves#lineZeroLift}),
     * a linear system, (1 - a_i / (2 pi)) (cl0_i + cos(alpha) sum_j K_ij x_j) + a_i x_i = a_i (alpha_0,i -
     * alpha_L0,i). The smoothing acts on the corrections' departure from these, so that it does nothing while
     * every strip is on its straight part (where the corrections may step, at a flap's end, say). When
     * {@code rate} is given it receives their derivative with alpha.
     */
    private double[] straightCorrections(double alpha, double[] rate) {
        int m = size();
        double c = Math.cos(alpha);
        double s = Math.sin(alpha);
        DMatrixRMaj matrix = new DMatrixRMaj(m, m);
        double[] rhs = new double[m];
        for (int i = 0; i < m; i++) {
            int w = wingIndex[i];
            double slope = curves.lineSlope(w);
            double keep = 1 - slope / TWO_PI;
            for (int j = 0; j < m; j++) {
                matrix.data[i * m + j] = keep * c * k[i][j];
            }
            matrix.data[i * m + i] += slope;
            rhs[i] = slope * (curves.latticeZeroLift(w) - curves.lineZeroLift(w)) - keep * (a[i] * c + b[i] * s);
        }
        LUDecompositionAlt_DDRM lu = new LUDecompositionAlt_DDRM();
        if (!lu.decompose(matrix)) {
            throw new IllegalStateException("the straight-line coupling is singular");
        }
        lu._solveVectorInternal(rhs);
        if (rate != null) {
            double[] d = new double[m];
            for (int i = 0; i < m; i++) {
                double keep = 1 - curves.lineSlope(wingIndex[i]) / TWO_PI;
                double sum = 0;
                for (int j = 0; j < m; j++) {
                    sum += k[i][j] * rhs[j];
                }
                d[i] = -keep * (-a[i] * s + b[i] * c) + keep * s * sum;
            }
            lu._solveVectorInternal(d);
            System.arraycopy(d, 0, rate, 0, m);
        }
        return rhs;
    }

    /**
     * The tangent (dx/d alpha) of the solution curve at a converged point, from J dx = -dR/d alpha; absent
     * where J is singular (at a fold).
     */
    Optional<double[]> tangent(CoupledPoint p) {
        int m = size();
        DMatrixRMaj jac = new DMatrixRMaj(m, m);
        jacobian(p.alpha(), Math.cos(p.alpha()), p.sectionAngles(), jac);
        LUDecompositionAlt_DDRM lu = new LUDecompositionAlt_DDRM();
        if (!lu.decompose(jac)) {
            return Optional.empty();
        }
        double[] ra = alphaDerivative(p.alpha(), p.corrections(), p.sectionAngles());
        DMatrixRMaj v = new DMatrixRMaj(m, 1);
        for (int i = 0; i < m; i++) {
            v.data[i] = -ra[i];
        }
        return solveInPlace(lu, v) ? Optional.of(v.data) : Optional.empty();
    }

    private static boolean solveInPlace(LUDecompositionAlt_DDRM lu, DMatrixRMaj rhs) {
        double[] v = rhs.data;
        lu._solveVectorInternal(v);
        for (double d : v) {
            if (!Double.isFinite(d)) {
                return false;
            }
        }
        return true;
    }

    /**
     * Fills cl, the effective angles and the residuals at corrections x; returns the largest |residual|, or
     * NaN when some strip's effective angle is beyond the end of its curve.
     */
    private double residual(double alpha, double[] x, double[] cl, double[] angle, double[] r, double[] reference) {
        int m = size();
        double c = Math.cos(alpha);
        double s = Math.sin(alpha);
        double[] deviation = x.clone();
        for (int i = 0; i < m; i++) {
            deviation[i] -= reference[i];
        }
        double norm = 0;
        for (int i = 0; i < m; i++) {
            double v = a[i] * c + b[i] * s;
            double[] ki = k[i];
            for (int j = 0; j < m; j++) {
                v += c * ki[j] * x[j];
            }
            cl[i] = v;
            int w = wingIndex[i];
            angle[i] = curves.latticeZeroLift(w) + v / TWO_PI - x[i];
            SectionCurve f = curves.curve(w);
            if (angle[i] > f.lastAngle()) {
                return Double.NaN;
            }
            r[i] = v - f.lift(angle[i]) + smoothed(i, deviation);
            norm = Math.max(norm, Math.abs(r[i]));
        }
        return norm;
    }

    private void jacobian(double alpha, double c, double[] angle, DMatrixRMaj jac) {
        int m = size();
        for (int i = 0; i < m; i++) {
            double fp = curves.curve(wingIndex[i]).slope(angle[i]);
            double scale = (1 - fp / TWO_PI) * c;
            for (int j = 0; j < m; j++) {
                jac.data[i * m + j] = scale * k[i][j];
            }
            jac.data[i * m + i] += fp;
            for (int n = 0; n < neighbours[i].length; n++) {
                jac.data[i * m + i] += smoothing[i][n];
                jac.data[i * m + neighbours[i][n]] -= smoothing[i][n];
            }
        }
    }

    /**
     * The wing's CL (the first surface's lift on the reference area; for a wing alone the whole lattice's) at alpha
     * with corrections x: what the trace through the stall follows and maximizes. The other surfaces' lift is
     * linear and would otherwise carry the configuration's CL on past the wing's own maximum.
     */
    private double lift(double alpha, double[] x) {
        double cl = wingLift.lift(alpha);
        double c = Math.cos(alpha);
        for (int j = 0; j < x.length; j++) {
            cl += c * liftPerCorrection[j] * x[j];
        }
        return cl;
    }

    /** The lattice solution of a converged point: circulations with the corrections added. */
    public Solution solution(CoupledPoint point) {
        if (point.status() != CoupledPoint.Status.CONVERGED) {
            throw new IllegalArgumentException("an unconverged point has no solution");
        }
        Lattice lattice = analysis.lattice();
        double[] g = new double[lattice.panelCount()];
        analysis.basis().combine(point.alpha(), deflections, g);
        basis.addTo(point.alpha(), point.corrections(), g);
        return new Solution(lattice, analysis.wing().reference(), point.alpha(), deflections, g);
    }

    /** True when unknown i is past the first peak of its section curve at the point. */
    public boolean pastPeak(CoupledPoint point, int i) {
        return point.sectionAngle(i) > curves.curve(wingIndex[i]).peakAngle();
    }
}
