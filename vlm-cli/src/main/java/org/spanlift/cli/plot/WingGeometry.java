package org.spanlift.cli.plot;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Planform;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.Strip;

/**
 * The top view of a wing in metres, wing axes projected on the x-y plane: each surface's outline from its
 * planform functions, and every lattice panel as a quadrilateral rebuilt from the lattice itself (bound
 * legs lie on the panels' quarter-chord lines, so the chordwise panel edges follow from them).
 */
public final class WingGeometry {

    /** Points along each half of an outline between defining stations (curved planforms need many). */
    private static final int SAMPLES = 160;

    /**
     * The closed outline of one surface (both halves when mirrored): leading edge from the left tip to the
     * right tip, then the trailing edge back.
     *
     * @param ys the y of each vertex, m
     * @param xs the x of each vertex, m (aft positive)
     */
    public record Outline(int surface, String name, double[] ys, double[] xs) {
    }

    /**
     * One panel seen from above: corners in order leading-left, leading-right, trailing-right,
     * trailing-left.
     *
     * @param control index of the control it belongs to (in {@code Wing.controls()} order), or -1
     * @param kind    that control's kind, or null
     */
    public record Panel(int surface, int strip, int control, ControlKind kind, double[] ys, double[] xs) {
    }

    private WingGeometry() {
    }

    public static List<Outline> outlines(Wing wing) {
        List<Outline> out = new ArrayList<>();
        for (int s = 0; s < wing.surfaces().size(); s++) {
            out.add(outline(s, wing.surfaces().get(s)));
        }
        return out;
    }

    static Outline outline(int index, Surface surface) {
        Planform p = surface.planform();
        TreeSet<Double> stations = new TreeSet<>(p.stationYs());
        stations.add(p.yStart());
        stations.add(p.yEnd());
        for (ControlSurface c : surface.controls()) {
            stations.add(c.from());
            stations.add(c.to());
        }
        for (int i = 0; i <= SAMPLES; i++) {
            double u = (double) i / SAMPLES;
            // denser toward the ends, where curved tips turn fastest
            stations.add(p.yStart() + (p.yEnd() - p.yStart()) * 0.5 * (1 - Math.cos(Math.PI * u)));
        }
        List<Double> half = new ArrayList<>(stations);
        List<Double> ys = new ArrayList<>();
        List<Double> xs = new ArrayList<>();
        List<Double> trailingYs = new ArrayList<>();
        List<Double> trailingXs = new ArrayList<>();
        if (surface.mirrored()) {
            for (int i = half.size() - 1; i >= 0; i--) {
                double y = half.get(i);
                if (y == 0 && p.yStart() == 0) {
                    continue; // the root is added once, from the right half
                }
                ys.add(-y);
                xs.add(p.noseX(y));
            }
        }
        for (double y : half) {
            ys.add(y);
            xs.add(p.noseX(y));
        }
        for (int i = ys.size() - 1; i >= 0; i--) {
            double y = ys.get(i);
            double local = surface.mirrored() ? Math.abs(y) : y;
            trailingYs.add(y);
            trailingXs.add(p.noseX(local) + p.chord(local));
        }
        ys.addAll(trailingYs);
        xs.addAll(trailingXs);
        return new Outline(index, surface.name(), toArray(ys), toArray(xs));
    }

    /** Every panel of the lattice, both halves, in lattice order. */
    public static List<Panel> panels(Wing wing, Lattice lattice) {
        List<ControlSurface> controls = wing.controls();
        List<Panel> out = new ArrayList<>();
        List<Strip> strips = lattice.strips();
        for (int k = 0; k < strips.size(); k++) {
            Strip st = strips.get(k);
            Surface surface = wing.surfaces().get(st.surface());
            Planform p = surface.planform();
            double yl = st.yLeft();
            double yr = st.yRight();
            double leadLeft = p.noseX(surface.mirrored() ? Math.abs(yl) : yl);
            double leadRight = p.noseX(surface.mirrored() ? Math.abs(yr) : yr);
            for (int r = 0; r < st.rows(); r++) {
                int i = st.firstPanel() + r;
                boolean aLeft = lattice.ay(i) <= lattice.by(i);
                double qLeft = aLeft ? lattice.ax(i) : lattice.bx(i);
                double qRight = aLeft ? lattice.bx(i) : lattice.ax(i);
                // the bound leg is a quarter of the way down the panel: trailing = leading + 4 (bound - leading)
                double trailLeft = leadLeft + 4 * (qLeft - leadLeft);
                double trailRight = leadRight + 4 * (qRight - leadRight);
                int control = lattice.controlOf(i);
                ControlKind kind = control < 0 ? null : controls.get(control).kind();
                out.add(new Panel(st.surface(), k, control, kind, new double[] {yl, yr, yr, yl},
                        new double[] {leadLeft, leadRight, trailRight, trailLeft}));
                leadLeft = trailLeft;
                leadRight = trailRight;
            }
        }
        return out;
    }

    private static double[] toArray(List<Double> list) {
        double[] a = new double[list.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = list.get(i);
        }
        return a;
    }
}
