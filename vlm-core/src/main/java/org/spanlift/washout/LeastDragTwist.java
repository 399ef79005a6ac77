package org.spanlift.washout;

import java.util.ArrayList;
import java.util.List;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.Strip;
import org.spanlift.results.Solution;
import org.spanlift.solve.StripBasis;
import org.spanlift.solve.WingAnalysis;

/**
 * The twist of the wing's strips (a change of each strip's incidence, rad) that gives the least induced drag
 * at a lift coefficient, at the angle of attack where the untwisted change would give it: the lattice's own
 * optimum (Munk's minimum-induced-drag theorem says it is the elliptic load, e = 1, for a planar wing in
 * continuous theory; NACA Report 121, 1921). The induced drag is a quadratic form in the strip circulations
 * (the Trefftz plane, {@code D/q = -sum_s G_s w_s width_s}, w linear in G), the circulations are linear in
 * the strip incidences ({@link StripBasis}), and the CL is linear in them, so the optimum solves one linear
 * system (the conditions of a minimum with one equality). A mirrored wing is twisted symmetrically.
 *
 * @param lift        the CL asked
 * @param alpha       the angle of attack kept, rad
 * @param twist       the incidence change of each right-half (or every) wing strip, rad, in {@link #y} order
 * @param y           the strips' control-point y, m, ascending
 * @param solution    the lattice solution with that twist
 */
public record LeastDragTwist(double lift, double alpha, double[] twist, double[] y, Solution solution) {

    /** Copies the arrays. */
    public LeastDragTwist {
        twist = twist.clone();
        y = y.clone();
    }

    /** The least-induced-drag twist of the wing's first surface at the given CL and deflections (rad). */
    public static LeastDragTwist of(WingAnalysis analysis, double[] deflections, double cl) {
        Lattice lattice = analysis.lattice();
        List<Strip> strips = lattice.strips();
        boolean symmetric = lattice.mirrored();
        List<Integer> wing = new ArrayList<>();
        for (int k = 0; k < strips.size(); k++) {
            Strip st = strips.get(k);
            if (st.surface() == 0 && (!symmetric || st.right())) {
                wing.add(k);
            }
        }
        wing.sort((p, q) -> Double.compare(strips.get(p).y(), strips.get(q).y()));
        StripBasis basis = analysis.stripBasis(wing, symmetric);
        double alpha = analysis.liftCurve(deflections).alphaFor(cl);
        double c = Math.cos(alpha);
        int m = wing.size();
        int n = strips.size();
        double area = analysis.wing().reference().area();
        // strip circulations: base, and per unit incidence of each unknown (with cos alpha)
        Solution base = analysis.solve(alpha, deflections);
        double[] g0 = stripCirculation(lattice, base::circulation);
        double[][] g = new double[m][];
        double[] liftPer = new double[m];
        for (int j = 0; j < m; j++) {
            int unknown = j;
            g[j] = stripCirculation(lattice, p -> c * basis.circulation(unknown, p));
            double sum = 0;
            for (int p = 0; p < lattice.panelCount(); p++) {
                sum += 2 * c * basis.circulation(j, p) * (lattice.by(p) - lattice.ay(p));
            }
            liftPer[j] = sum / area;
        }
        DMatrixRMaj q = dragForm(lattice, area);
        // minimise (g0 + G t)' Q (g0 + G t) subject to liftPer . t = 0 (the CL stays that of the base)
        DMatrixRMaj gm = new DMatrixRMaj(n, m);
        for (int j = 0; j < m; j++) {
            for (int s = 0; s < n; s++) {
                gm.set(s, j, g[j][s]);
            }
        }
        DMatrixRMaj qg = new DMatrixRMaj(n, m);
        CommonOps_DDRM.mult(q, gm, qg);
        DMatrixRMaj h = new DMatrixRMaj(m, m);
        CommonOps_DDRM.multTransA(gm, qg, h);
        DMatrixRMaj g0v = new DMatrixRMaj(n, 1, true, g0);
        DMatrixRMaj qg0 = new DMatrixRMaj(n, 1);
        CommonOps_DDRM.mult(q, g0v, qg0);
        DMatrixRMaj kkt = new DMatrixRMaj(m + 1, m + 1);
        DMatrixRMaj rhs = new DMatrixRMaj(m + 1, 1);
        for (int i = 0; i < m; i++) {
            for (int j = 0; j < m; j++) {
                kkt.set(i, j, 2 * h.get(i, j));
            }
            kkt.set(i, m, liftPer[i]);
            kkt.set(m, i, liftPer[i]);
            double b = 0;
            for (int s = 0; s < n; s++) {
                b += gm.get(s, i) * qg0.get(s, 0);
            }
            rhs.set(i, 0, -2 * b);
        }
        DMatrixRMaj sol = new DMatrixRMaj(m + 1, 1);
        if (!CommonOps_DDRM.solve(kkt, rhs, sol)) {
            throw new IllegalStateException("the least-drag conditions are singular");
        }
        double[] t = new double[m];
        double[] y = new double[m];
        for (int j = 0; j < m; j++) {
            t[j] = sol.get(j, 0);
            y[j] = strips.get(wing.get(j)).y();
        }
        double[] circulation = new double[lattice.panelCount()];
        analysis.basis().combine(alpha, deflections, circulation);
        basis.addTo(alpha, t, circulation);
        Solution twisted = new Solution(lattice, analysis.wing().reference(), alpha, deflections, circulation);
        return new LeastDragTwist(cl, alpha, t, y, twisted);
    }

    private interface PanelValue {
        double of(int panel);
    }

    private static double[] stripCirculation(Lattice lattice, PanelValue value) {
        List<Strip> strips = lattice.strips();
        double[] out = new double[strips.size()];
        for (int s = 0; s < strips.size(); s++) {
            Strip st = strips.get(s);
            for (int r = 0; r < st.rows(); r++) {
                out[s] += value.of(st.firstPanel() + r);
            }
        }
        return out;
    }

    /**
     * The symmetric matrix Q with CDi = G' Q G for strip circulations G (per unit speed): the Trefftz-plane
     * sum, each strip's normalwash linear in G, evaluated column by column.
     */
    static DMatrixRMaj dragForm(Lattice lattice, double area) {
        List<Strip> strips = lattice.strips();
        int n = strips.size();
        DMatrixRMaj w = new DMatrixRMaj(n, n);
        double[] unit = new double[n];
        double[] out = new double[n];
        for (int k = 0; k < n; k++) {
            unit[k] = 1;
            org.spanlift.results.TrefftzPlane.normalwash(lattice, unit, out);
            unit[k] = 0;
            for (int s = 0; s < n; s++) {
                w.set(s, k, out[s]);
            }
        }
        DMatrixRMaj q = new DMatrixRMaj(n, n);
        for (int s = 0; s < n; s++) {
            for (int k = 0; k < n; k++) {
                double a = -strips.get(s).width() * w.get(s, k);
                double b = -strips.get(k).width() * w.get(k, s);
                q.set(s, k, 0.5 * (a + b) / area);
            }
        }
        return q;
    }
}
