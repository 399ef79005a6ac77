package org.spanlift.stall;

import java.util.ArrayList;
import java.util.List;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.decomposition.lu.LUDecompositionAlt_DDRM;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.Strip;
import org.spanlift.results.Solution;
import org.spanlift.solve.BasisSolutions;
import org.spanlift.solve.StripBasis;
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
 *   R_i     = cl_i - f_i(alpha_i) = 0,
 * </pre>
 *
 * alpha_0,i the strip's zero-lift angle in the lattice's thin-airfoil form ({@link StripCurves}). The
 * effective angle is the angle at which the strip's own two-dimensional thin-airfoil line gives its lattice
 * lift, less the correction; so with that line as the section curve every d_i is zero and the coupled
 * solution is the linear one. K comes from {@link StripBasis}, one back-substitution per strip on the
 * wing's factorization; each Newton step then costs a product with K and a small dense solve.
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
    private static final double TWO_PI = 2 * Math.PI;

    private final WingAnalysis analysis;
    private final double[] deflections;
    private final StripCurves curves;
    private final StripBasis basis;
    private final int[] wingIndex;
    private final double[] a;
    private final double[] b;
    private final double[][] k;
    private final double[] liftPerCorrection;

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
        for (int j = 0; j < m; j++) {
            double sum = 0;
            for (int p = 0; p < lattice.panelCount(); p++) {
                sum += 2 * basis.circulation(j, p) * (lattice.by(p) - lattice.ay(p));
            }
            liftPerCorrection[j] = sum / area;
        }
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
        int m = size();
        double[] x = start.clone();
        double[] cl = new double[m];
        double[] angle = new double[m];
        double[] r = new double[m];
        double norm = residual(alpha, x, cl, angle, r);
        if (Double.isNaN(norm)) {
            return CoupledPoint.failed(alpha, CoupledPoint.Status.CURVE_ENDS, x);
        }
        DMatrixRMaj jac = new DMatrixRMaj(m, m);
        DMatrixRMaj step = new DMatrixRMaj(m, 1);
        LUDecompositionAlt_DDRM lu = new LUDecompositionAlt_DDRM();
        double[] trial = new double[m];
        double[] tcl = new double[m];
        double[] tangle = new double[m];
        double[] tr = new double[m];
        double c = Math.cos(alpha);
        for (int it = 0; it <= MAX_ITERATIONS; it++) {
            jacobian(alpha, c, angle, jac);
            if (norm <= TOLERANCE) {
                boolean positive = lu.decompose(jac) && lu.computeDeterminant().real > 0;
                return new CoupledPoint(alpha, CoupledPoint.Status.CONVERGED, lift(alpha, x), x, cl, angle,
                        positive, it);
            }
            if (!lu.decompose(jac)) {
                return CoupledPoint.failed(alpha, CoupledPoint.Status.NOT_CONVERGED, x);
            }
            for (int i = 0; i < m; i++) {
                step.data[i] = -r[i];
            }
            if (!solveInPlace(lu, step)) {
                return CoupledPoint.failed(alpha, CoupledPoint.Status.NOT_CONVERGED, x);
            }
            double lambda = 1;
            while (true) {
                for (int i = 0; i < m; i++) {
                    trial[i] = x[i] + lambda * step.data[i];
                }
                double tn = residual(alpha, trial, tcl, tangle, tr);
                if (!Double.isNaN(tn) && tn < (1 - 1e-4 * lambda) * norm) {
                    System.arraycopy(trial, 0, x, 0, m);
                    System.arraycopy(tcl, 0, cl, 0, m);
                    System.arraycopy(tangle, 0, angle, 0, m);
                    System.arraycopy(tr, 0, r, 0, m);
                    norm = tn;
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
    private double residual(double alpha, double[] x, double[] cl, double[] angle, double[] r) {
        int m = size();
        double c = Math.cos(alpha);
        double s = Math.sin(alpha);
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
            r[i] = v - f.lift(angle[i]);
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
        }
    }

    /** The whole lattice's CL at alpha with corrections x. */
    private double lift(double alpha, double[] x) {
        double cl = analysis.liftCurve(deflections).lift(alpha);
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
