package org.spanlift.lattice;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The discretized wing: panels, each carrying a horseshoe vortex, grouped in spanwise strips. Arrays are
 * stored flat (structure of arrays) for the influence loops; accessors never expose them for writing.
 *
 * <p>Frame: wing axes (x aft, y right, z up), metres. Each horseshoe runs from +infinity along +x to
 * the bound-leg end A, along the bound leg from A to B (A at the smaller y, so a positive circulation
 * lifts), and from B back to +infinity along +x. The chordwise unit vector of every panel is exactly +x:
 * the lattice lies on the flat, untwisted surface with its dihedral; twist, camber and deflections enter
 * only through the panel incidence.
 *
 * <p>Order: when every surface is mirrored, panels {@code 0..H-1} are the right halves (y &gt;= 0) and
 * panel {@code H + i} is the mirror image of panel {@code i}; otherwise {@code H} equals the panel count
 * and there are no images. Strips follow the same rule.
 */
public final class Lattice {

    private final double[] a;       // bound-leg start, xyz per panel
    private final double[] b;       // bound-leg end
    private final double[] control; // control point
    private final double[] normal;  // unit normal
    private final double[] incidence;
    private final double[] cutoff;
    private final int[] stripOf;
    private final int[] controlOf;
    private final double[] controlSign;
    private final List<Strip> strips;
    private final int half;
    private final boolean mirrored;
    private final double[] trailing;   // unique trailing-leg start points, xyz
    private final double[] trailingCutoff;
    private final double[] trailingCore2;
    private final int[] aPoint;        // index of panel's A among the trailing points
    private final int[] bPoint;

    Lattice(double[] a, double[] b, double[] control, double[] normal, double[] incidence, double[] cutoff,
            int[] stripOf, int[] controlOf, double[] controlSign, List<Strip> strips, int half,
            boolean mirrored) {
        this.a = a;
        this.b = b;
        this.control = control;
        this.normal = normal;
        this.incidence = incidence;
        this.cutoff = cutoff;
        this.stripOf = stripOf;
        this.controlOf = controlOf;
        this.controlSign = controlSign;
        this.strips = List.copyOf(strips);
        this.half = half;
        this.mirrored = mirrored;
        int n = stripOf.length;
        this.aPoint = new int[n];
        this.bPoint = new int[n];
        Map<Vec, Integer> index = new HashMap<>();
        List<Vec> points = new ArrayList<>();
        List<Double> cut = new ArrayList<>();
        for (int p = 0; p < n; p++) {
            aPoint[p] = pointIndex(new Vec(a[3 * p], a[3 * p + 1], a[3 * p + 2]), cutoff[p], index, points, cut);
            bPoint[p] = pointIndex(new Vec(b[3 * p], b[3 * p + 1], b[3 * p + 2]), cutoff[p], index, points, cut);
        }
        this.trailing = new double[3 * points.size()];
        this.trailingCutoff = new double[points.size()];
        for (int k = 0; k < points.size(); k++) {
            trailing[3 * k] = points.get(k).x();
            trailing[3 * k + 1] = points.get(k).y();
            trailing[3 * k + 2] = points.get(k).z();
            trailingCutoff[k] = cut.get(k);
        }
        this.trailingCore2 = coresSquared();
    }

    /**
     * The squared Rankine core radius of every trailing leg: (w/2)^2, w the smallest width (in the y-z
     * plane) of the strips whose panels share the leg, and never more than the squared y-z distance from
     * the leg to any control point of those strips' surfaces (that bound acts where a forced cut line makes
     * the widths jump, and at the tip of cosine strips, whose last control point, at its midpoint in angle,
     * lies nearer the tip than half its width). So no control point of a leg's own surface lies inside its
     * core.
     */
    private double[] coresSquared() {
        int count = trailingCutoff.length;
        double[] core2 = new double[count];
        Arrays.fill(core2, Double.POSITIVE_INFINITY);
        int surfaces = 0;
        for (Strip st : strips) {
            surfaces = Math.max(surfaces, st.surface() + 1);
        }
        boolean[] onSurface = new boolean[count * surfaces]; // [k * surfaces + s]: a leg of point k is on surface s
        int[] panelsOn = new int[surfaces];
        for (int p = 0; p < stripOf.length; p++) {
            Strip st = strips.get(stripOf[p]);
            double half = 0.5 * st.width();
            core2[aPoint[p]] = Math.min(core2[aPoint[p]], half * half);
            core2[bPoint[p]] = Math.min(core2[bPoint[p]], half * half);
            onSurface[aPoint[p] * surfaces + st.surface()] = true;
            onSurface[bPoint[p] * surfaces + st.surface()] = true;
            panelsOn[st.surface()]++;
        }
        // Each surface's control points (y, z), a repeat of the one before dropped: the rows of a strip share
        // theirs. The bound is a minimum, so repeats left in would not change it, only cost time.
        double[][] controlsOn = new double[surfaces][];
        int[] used = new int[surfaces];
        for (int s = 0; s < surfaces; s++) {
            controlsOn[s] = new double[2 * panelsOn[s]];
        }
        for (int p = 0; p < stripOf.length; p++) {
            int s = strips.get(stripOf[p]).surface();
            double y = control[3 * p + 1];
            double z = control[3 * p + 2];
            double[] yz = controlsOn[s];
            int m = used[s];
            if (m == 0 || yz[m - 2] != y || yz[m - 1] != z) {
                yz[m] = y;
                yz[m + 1] = z;
                used[s] = m + 2;
            }
        }
        for (int k = 0; k < count; k++) {
            double qy = trailing[3 * k + 1];
            double qz = trailing[3 * k + 2];
            for (int s = 0; s < surfaces; s++) {
                if (!onSurface[k * surfaces + s]) {
                    continue;
                }
                double[] yz = controlsOn[s];
                for (int i = 0; i < used[s]; i += 2) {
                    // the kernel's own arithmetic for the distance, so the bound holds exactly
                    double ry = yz[i] - qy;
                    double rz = yz[i + 1] - qz;
                    core2[k] = Math.min(core2[k], ry * ry + rz * rz);
                }
            }
        }
        return core2;
    }

    /** A point compared by exact coordinates. */
    private record Vec(double x, double y, double z) {
    }

    private static int pointIndex(Vec v, double cutoff, Map<Vec, Integer> index, List<Vec> points,
            List<Double> cut) {
        Integer k = index.get(v);
        if (k == null) {
            k = points.size();
            index.put(v, k);
            points.add(v);
            cut.add(cutoff);
        } else {
            cut.set(k, Math.min(cut.get(k), cutoff));
        }
        return k;
    }

    /**
     * Number of distinct trailing-leg start points: adjacent panels of a row share the point where one's
     * bound leg ends and the next one's begins, and so share that trailing leg.
     */
    public int trailingPointCount() {
        return trailingCutoff.length;
    }

    /** Index of the trailing point at the start A of panel p's bound leg. */
    public int trailingPointA(int p) {
        return aPoint[p];
    }

    /** Index of the trailing point at the end B of panel p's bound leg. */
    public int trailingPointB(int p) {
        return bPoint[p];
    }

    /** The x of trailing point k, m. */
    public double trailingX(int k) {
        return trailing[3 * k];
    }

    /** The y of trailing point k, m. */
    public double trailingY(int k) {
        return trailing[3 * k + 1];
    }

    /** The z of trailing point k, m. */
    public double trailingZ(int k) {
        return trailing[3 * k + 2];
    }

    /** The cut-off of a trailing point: the smallest of those of the panels sharing it. */
    public double trailingCutoff(int k) {
        return trailingCutoff[k];
    }

    /**
     * The squared radius of the Rankine core of trailing leg k, m^2: half the smallest y-z width of the
     * strips meeting at the leg, bounded so that no control point of the leg's own surface lies inside
     * the core. Points of other surfaces (a tail in a wing's wake) may.
     */
    public double trailingCoreSquared(int k) {
        return trailingCore2[k];
    }

    /**
     * The squared Rankine core radius of the trailing leg at one edge of a strip, m^2, as the Trefftz plane
     * sees it: the smallest of the cores of the strip's legs there (one per row; the legs of an edge share
     * its y-z point, and their cores differ only where a neighbouring strip shares some of them and not
     * others, as beside a control's end, where its rows are cut differently).
     *
     * @param strip index in {@link #strips()}
     * @param right the right edge (larger y, the bound legs' ends B), else the left edge (A)
     */
    public double stripEdgeCoreSquared(int strip, boolean right) {
        Strip st = strips.get(strip);
        double core2 = Double.POSITIVE_INFINITY;
        for (int r = 0; r < st.rows(); r++) {
            int p = st.firstPanel() + r;
            core2 = Math.min(core2, trailingCore2[right ? bPoint[p] : aPoint[p]]);
        }
        return core2;
    }

    /**
     * True when the other lattice has the same panels, control points, normals, cut-offs and symmetry, so
     * that its influence systems are this one's (incidence and control membership may differ: they enter
     * the right-hand sides only).
     */
    public boolean sameGeometry(Lattice other) {
        return other == this || (half == other.half && mirrored == other.mirrored
                && Arrays.equals(a, other.a) && Arrays.equals(b, other.b)
                && Arrays.equals(control, other.control) && Arrays.equals(normal, other.normal)
                && Arrays.equals(cutoff, other.cutoff));
    }

    /** Number of panels on the whole surface, both halves. */
    public int panelCount() {
        return stripOf.length;
    }

    /**
     * Number of panels that carry independent unknowns under symmetry: the right halves when mirrored,
     * all panels otherwise.
     */
    public int halfCount() {
        return half;
    }

    /** True when panel {@code i + halfCount()} is the mirror image of panel {@code i}. */
    public boolean mirrored() {
        return mirrored;
    }

    /** The spanwise strips, in strip-index order. */
    public List<Strip> strips() {
        return strips;
    }

    /** Index in {@link #strips()} of the strip the panel belongs to. */
    public int stripOf(int panel) {
        return stripOf[panel];
    }

    /** Index of the control (in {@code Wing.controls()} order) the panel belongs to, or -1. */
    public int controlOf(int panel) {
        return controlOf[panel];
    }

    /**
     * The sign of the panel's deflection per unit control deflection: +1, or -1 on the left half of an
     * aileron; 0 when the panel is on no control.
     */
    public double controlSign(int panel) {
        return controlSign[panel];
    }

    /**
     * The panel's incidence in radians from twist, camber slope and section correction (not control
     * deflection): the eps of the boundary condition.
     */
    public double incidence(int panel) {
        return incidence[panel];
    }

    /** Distance below which a point counts as on one of this panel's vortex lines, m. */
    public double cutoff(int panel) {
        return cutoff[panel];
    }

    /** The x of the start A of panel p's bound leg, m. */
    public double ax(int p) {
        return a[3 * p];
    }

    /** The y of the start A of panel p's bound leg, m. */
    public double ay(int p) {
        return a[3 * p + 1];
    }

    /** The z of the start A of panel p's bound leg, m. */
    public double az(int p) {
        return a[3 * p + 2];
    }

    /** The x of the end B of panel p's bound leg, m. */
    public double bx(int p) {
        return b[3 * p];
    }

    /** The y of the end B of panel p's bound leg, m. */
    public double by(int p) {
        return b[3 * p + 1];
    }

    /** The z of the end B of panel p's bound leg, m. */
    public double bz(int p) {
        return b[3 * p + 2];
    }

    /** The x of panel p's control point (three-quarter chord), m. */
    public double cx(int p) {
        return control[3 * p];
    }

    /** The y of panel p's control point, m. */
    public double cy(int p) {
        return control[3 * p + 1];
    }

    /** The z of panel p's control point, m. */
    public double cz(int p) {
        return control[3 * p + 2];
    }

    /** The x component of panel p's unit normal (pointing up). */
    public double nx(int p) {
        return normal[3 * p];
    }

    /** The y component of panel p's unit normal. */
    public double ny(int p) {
        return normal[3 * p + 1];
    }

    /** The z component of panel p's unit normal. */
    public double nz(int p) {
        return normal[3 * p + 2];
    }
}
