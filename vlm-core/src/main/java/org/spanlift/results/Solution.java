package org.spanlift.results;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Vec3;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.Strip;

/**
 * The solved circulation of one flight condition and what follows from it: coefficients, span loads and
 * panel forces. Immutable. Circulations are per unit freestream speed (metres); the freestream is
 * V (cos alpha, 0, sin alpha).
 */
public final class Solution {

    private final Lattice lattice;
    private final Reference reference;
    private final double alpha;
    private final double[] deflections;
    private final double[] circulation;
    private final double[] stripCirculation;
    private final double[] normalwash;

    /**
     * @param alpha       angle of attack, rad
     * @param deflections control deflections, rad, in {@code Wing.controls()} order (copied)
     * @param circulation panel circulations per unit speed (copied)
     */
    public Solution(Lattice lattice, Reference reference, double alpha, double[] deflections, double[] circulation) {
        this.lattice = lattice;
        this.reference = reference;
        this.alpha = alpha;
        this.deflections = deflections.clone();
        this.circulation = circulation.clone();
        List<Strip> strips = lattice.strips();
        this.stripCirculation = new double[strips.size()];
        for (int s = 0; s < strips.size(); s++) {
            Strip st = strips.get(s);
            double g = 0;
            for (int r = 0; r < st.rows(); r++) {
                g += circulation[st.firstPanel() + r];
            }
            stripCirculation[s] = g;
        }
        this.normalwash = new double[strips.size()];
        TrefftzPlane.normalwash(lattice, stripCirculation, normalwash);
    }

    /** The angle of attack, rad. */
    public double alpha() {
        return alpha;
    }

    /** Control deflection in radians, by control index. */
    public double deflection(int control) {
        return deflections[control];
    }

    /** The lattice solved on. */
    public Lattice lattice() {
        return lattice;
    }

    /** The reference values of the coefficients. */
    public Reference reference() {
        return reference;
    }

    /** The same condition with moments taken about {@code point} (m, wing axes) instead. */
    public Solution about(Vec3 point) {
        Reference moved = new Reference(reference.area(), reference.span(), reference.chord(), point);
        return new Solution(lattice, moved, alpha, deflections, circulation);
    }

    /**
     * The normal force coefficient along body z (sum of the panels' z forces over q S), positive up; the
     * pitching moment about a point dx behind the moment point is Cm + dx CZ / c.
     */
    public double normalForce() {
        PanelForces f = panelForces();
        double fz = 0;
        for (int i = 0; i < lattice.panelCount(); i++) {
            fz += f.fz(i);
        }
        return fz / reference.area();
    }

    /** Panel circulation per unit speed, m. */
    public double circulation(int panel) {
        return circulation[panel];
    }

    /** Coefficients of the whole lattice (all surfaces). */
    public Coefficients coefficients() {
        return coefficients(-1);
    }

    /** Coefficients of one surface ({@code surface >= 0}) or of all ({@code -1}), on the wing's reference. */
    public Coefficients coefficients(int surface) {
        PanelForces f = panelForces();
        double s = reference.area();
        double fz = 0;
        double fx = 0;
        double mx = 0;
        double my = 0;
        double xm = reference.momentPoint().x();
        double ym = reference.momentPoint().y();
        double zm = reference.momentPoint().z();
        for (int i = 0; i < lattice.panelCount(); i++) {
            if (surface >= 0 && lattice.strips().get(lattice.stripOf(i)).surface() != surface) {
                continue;
            }
            fx += f.fx(i);
            fz += f.fz(i);
            double rx = f.x(i) - xm;
            double ry = f.y(i) - ym;
            double rz = f.z(i) - zm;
            mx += ry * f.fz(i) - rz * f.fy(i);
            my += rz * f.fx(i) - rx * f.fz(i);
        }
        double lift = (fz * Math.cos(alpha) - fx * Math.sin(alpha)) / s;
        double dragArea = 0;
        List<Strip> strips = lattice.strips();
        for (int k = 0; k < strips.size(); k++) {
            if (surface < 0 || strips.get(k).surface() == surface) {
                dragArea -= stripCirculation[k] * normalwash[k] * strips.get(k).width();
            }
        }
        double cdi = dragArea / s;
        return new Coefficients(lift, cdi, Coefficients.spanEfficiency(lift, cdi, reference.aspectRatio()),
                my / (s * reference.chord()), -mx / (s * reference.span()));
    }

    /** Kutta-Joukowski forces on every panel, over dynamic pressure. */
    public PanelForces panelForces() {
        int n = lattice.panelCount();
        double[] fx = new double[n];
        double[] fy = new double[n];
        double[] fz = new double[n];
        double[] x = new double[n];
        double[] y = new double[n];
        double[] z = new double[n];
        double vx = Math.cos(alpha);
        double vz = Math.sin(alpha);
        for (int i = 0; i < n; i++) {
            double lx = lattice.bx(i) - lattice.ax(i);
            double ly = lattice.by(i) - lattice.ay(i);
            double lz = lattice.bz(i) - lattice.az(i);
            double g = 2 * circulation[i];
            // V x l with V = (vx, 0, vz)
            fx[i] = g * (-vz * ly);
            fy[i] = g * (vz * lx - vx * lz);
            fz[i] = g * (vx * ly);
            x[i] = 0.5 * (lattice.ax(i) + lattice.bx(i));
            y[i] = 0.5 * (lattice.ay(i) + lattice.by(i));
            z[i] = 0.5 * (lattice.az(i) + lattice.bz(i));
        }
        return new PanelForces(fx, fy, fz, x, y, z);
    }

    /** The span load of one surface over both halves, y ascending. */
    public SpanLoad spanLoad(int surface) {
        List<Integer> order = new ArrayList<>();
        List<Strip> strips = lattice.strips();
        for (int k = 0; k < strips.size(); k++) {
            if (strips.get(k).surface() == surface) {
                order.add(k);
            }
        }
        order.sort(Comparator.comparingDouble(k -> strips.get(k).y()));
        int m = order.size();
        double[] y = new double[m];
        double[] chord = new double[m];
        double[] cl = new double[m];
        double[] clc = new double[m];
        double[] gamma = new double[m];
        double[] induced = new double[m];
        double[] left = new double[m];
        double[] right = new double[m];
        for (int i = 0; i < m; i++) {
            int k = order.get(i);
            Strip st = strips.get(k);
            y[i] = st.y();
            chord[i] = st.chord();
            gamma[i] = stripCirculation[k];
            clc[i] = 2 * gamma[i];
            cl[i] = clc[i] / st.chord();
            induced[i] = -0.5 * normalwash[k];
            left[i] = st.yLeft();
            right[i] = st.yRight();
        }
        return new SpanLoad(y, chord, cl, clc, gamma, induced, left, right);
    }

    /**
     * Each strip's induced drag over dynamic pressure, m^2, in lattice strip order: -G (v . n) w from the
     * Trefftz-plane normalwash, so the strips sum exactly to the induced drag of {@link #coefficients()} times
     * the reference area. The force acts along the freestream.
     */
    public double[] stripInducedDrag() {
        List<Strip> strips = lattice.strips();
        double[] out = new double[strips.size()];
        for (int k = 0; k < out.length; k++) {
            out[k] = -stripCirculation[k] * normalwash[k] * strips.get(k).width();
        }
        return out;
    }

    /** Strip circulations per unit speed in lattice strip order (a copy). */
    public double[] stripCirculations() {
        return Arrays.copyOf(stripCirculation, stripCirculation.length);
    }
}
