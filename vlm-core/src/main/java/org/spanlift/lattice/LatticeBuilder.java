package org.spanlift.lattice;

import org.spanlift.input.RefusedException;
import java.util.ArrayList;
import java.util.List;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.Planform;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.SectionBlend;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;

/**
 * Builds the {@link Lattice} of a wing, following the rules of the design notes: strip edges from the
 * spacing law with forced cuts at control ends (and stations, unless the surface has more station
 * intervals than half its strips), chordwise rows from their own law with the hinge moved onto the nearest
 * row edge, bound legs on the panel quarter-chord lines, control points at three-quarter chord at the
 * strip's midpoint in the spacing variable.
 */
public final class LatticeBuilder {

    /** A point closer than this fraction of a panel's smaller dimension to its vortex lines feels nothing. */
    public static final double CUTOFF_FRACTION = 1e-6;

    private LatticeBuilder() {
    }

    /** The lattice of a whole wing. */
    public static Lattice build(Wing wing) {
        boolean mirrored = wing.symmetric();
        List<ControlSurface> allControls = wing.controls();
        Panels right = new Panels();
        for (int s = 0; s < wing.surfaces().size(); s++) {
            addSurface(wing, s, allControls, right);
        }
        if (!mirrored) {
            // Unmirrored wing: expand mirrored surfaces into explicit left halves, solve all at once.
            Panels all = new Panels();
            for (int s = 0; s < wing.surfaces().size(); s++) {
                Surface surface = wing.surfaces().get(s);
                Panels one = new Panels();
                addSurface(wing, s, allControls, one);
                if (surface.mirrored()) {
                    all.appendMirror(one, allControls);
                }
                all.append(one);
            }
            return all.toLattice(all.size(), false);
        }
        Panels both = new Panels();
        both.append(right);
        both.appendMirror(right, allControls);
        return both.toLattice(right.size(), true);
    }

    private static void addSurface(Wing wing, int surfaceIndex, List<ControlSurface> allControls, Panels out) {
        Surface surface = wing.surfaces().get(surfaceIndex);
        Planform shape = surface.planform();
        LatticeSpec spec = surface.lattice();
        List<Double> cuts = new ArrayList<>();
        for (ControlSurface c : surface.controls()) {
            cuts.add(c.from());
            cuts.add(c.to());
        }
        List<Double> stations = shape.stationYs();
        if (stations.size() - 1 <= spec.strips() / 2) {
            cuts.addAll(stations);
        }
        SpanwiseCuts.Edges edges = SpanwiseCuts.place(shape.yStart(), shape.yEnd(), spec.strips(),
                spec.stripSpacing(), surface.mirrored(), cuts);
        int rows = spec.rows();
        double[] rowLaw = new double[rows + 1];
        for (int r = 0; r <= rows; r++) {
            rowLaw[r] = spec.rowSpacing().full((double) r / rows);
        }
        for (int k = 0; k < spec.strips(); k++) {
            double y0 = edges.edges()[k];
            double y1 = edges.edges()[k + 1];
            double yc = edges.controls()[k];
            ControlSurface control = controlAt(surface, 0.5 * (y0 + y1));
            double[] rowEdges = rowLaw.clone();
            int hingeRow = rows;
            if (control != null) {
                hingeRow = nearestInterior(rowEdges, control.hingeFraction());
                rowEdges[hingeRow] = hingeEdge(control.hingeFraction(), rowEdges[hingeRow - 1], rowEdges[hingeRow + 1]);
            }
            int controlIndex = control == null ? -1 : allControls.indexOf(control);
            out.addStrip(surfaceIndex, shape, wing, y0, y1, yc, rowEdges, hingeRow, controlIndex);
        }
    }

    private static ControlSurface controlAt(Surface surface, double y) {
        for (ControlSurface c : surface.controls()) {
            if (y > c.from() && y < c.to()) {
                return c;
            }
        }
        return null;
    }

    /**
     * The row edge for a hinge at chord fraction h, between the edges before and after it: placed so that the
     * bound leg of the first deflected row (a quarter of that row aft of its leading edge) lies on the hinge
     * line, where the deflected vorticity of a plain flap begins. Putting the row edge on the hinge itself
     * would leave the discrete hinge a quarter row aft and the flap's effectiveness short at first order in
     * the row count. Falls back to h when the row ahead would vanish.
     */
    static double hingeEdge(double h, double before, double after) {
        double edge = (h - 0.25 * after) / 0.75;
        return edge > before + 1e-9 ? edge : h;
    }

    private static int nearestInterior(double[] edges, double x) {
        int best = 1;
        for (int r = 1; r < edges.length - 1; r++) {
            if (Math.abs(edges[r] - x) < Math.abs(edges[best] - x)) {
                best = r;
            }
        }
        return best;
    }

    /** Growing panel arrays. */
    private static final class Panels {
        final List<double[]> rows = new ArrayList<>();   // per panel: a(3) b(3) c(3) n(3) eps cutoff
        final List<int[]> tags = new ArrayList<>();      // per panel: strip, control
        final List<Double> signs = new ArrayList<>();
        final List<Strip> strips = new ArrayList<>();

        int size() {
            return rows.size();
        }

        void addStrip(int surfaceIndex, Planform shape, Wing wing, double y0, double y1, double yc,
                double[] rowEdges, int hingeRow, int controlIndex) {
            double c0 = shape.chord(y0);
            double c1 = shape.chord(y1);
            double x0 = shape.noseX(y0);
            double x1 = shape.noseX(y1);
            double z0 = shape.noseZ(y0);
            double z1 = shape.noseZ(y1);
            double f = (yc - y0) / (y1 - y0);
            double cc = (1 - f) * c0 + f * c1;
            double xc = (1 - f) * x0 + f * x1;
            double zc = (1 - f) * z0 + f * z1;
            if (!(cc > 0)) {
                throw new RefusedException("zero chord at a control point, y = " + yc + " m");
            }
            // normal: t = +x, spanwise edge s = (0, dy, dz); n = t x s normalised, pointing up
            double dy = y1 - y0;
            double dz = z1 - z0;
            double len = Math.hypot(dy, dz);
            double ny = -dz / len;
            double nz = dy / len;
            double twist = shape.twist(yc);
            SectionBlend blend = shape.section(yc);
            Section inner = wing.sections().get(blend.inner());
            Section outer = wing.sections().get(blend.outer());
            double w = blend.weight();
            double correction = (1 - w) * inner.incidenceCorrection() + w * outer.incidenceCorrection();
            int strip = strips.size();
            int first = rows.size();
            int rowCount = rowEdges.length - 1;
            for (int r = 0; r < rowCount; r++) {
                double r0 = rowEdges[r];
                double r1 = rowEdges[r + 1];
                double q = r0 + 0.25 * (r1 - r0);
                double xcp = r0 + 0.75 * (r1 - r0);
                double slope = (1 - w) * inner.camber().slope(xcp) + w * outer.camber().slope(xcp);
                double[] p = new double[14];
                p[0] = x0 + q * c0;
                p[1] = y0;
                p[2] = z0;
                p[3] = x1 + q * c1;
                p[4] = y1;
                p[5] = z1;
                p[6] = xc + xcp * cc;
                p[7] = yc;
                p[8] = zc;
                p[9] = 0;
                p[10] = ny;
                p[11] = nz;
                p[12] = twist + correction - slope;
                p[13] = CUTOFF_FRACTION * Math.min(len, (r1 - r0) * Math.max(c0, c1));
                rows.add(p);
                boolean onControl = controlIndex >= 0 && r >= hingeRow;
                tags.add(new int[] {strip, onControl ? controlIndex : -1});
                signs.add(onControl ? 1.0 : 0.0);
            }
            strips.add(new Strip(surfaceIndex, first, rowCount, y0, z0, y1, z1, yc, cc, true));
        }

        void append(Panels other) {
            int stripOffset = strips.size();
            int panelOffset = rows.size();
            rows.addAll(other.rows);
            for (int[] t : other.tags) {
                tags.add(new int[] {t[0] + stripOffset, t[1]});
            }
            signs.addAll(other.signs);
            for (Strip s : other.strips) {
                strips.add(new Strip(s.surface(), s.firstPanel() + panelOffset, s.rows(), s.yLeft(), s.zLeft(),
                        s.yRight(), s.zRight(), s.y(), s.chord(), s.right()));
            }
        }

        /** Appends the mirror images (y -> -y) of the other panels; the bound leg keeps running toward +y. */
        void appendMirror(Panels other, List<ControlSurface> controls) {
            int stripOffset = strips.size();
            int panelOffset = rows.size();
            for (int i = 0; i < other.rows.size(); i++) {
                double[] p = other.rows.get(i);
                double[] m = p.clone();
                m[0] = p[3];
                m[1] = -p[4];
                m[2] = p[5];
                m[3] = p[0];
                m[4] = -p[1];
                m[5] = p[2];
                m[7] = -p[7];
                m[10] = -p[10];
                rows.add(m);
                int[] t = other.tags.get(i);
                tags.add(new int[] {t[0] + stripOffset, t[1]});
                boolean aileron = t[1] >= 0 && controls.get(t[1]).kind() == ControlKind.AILERON;
                signs.add(aileron ? -other.signs.get(i) : other.signs.get(i));
            }
            for (Strip s : other.strips) {
                strips.add(new Strip(s.surface(), s.firstPanel() + panelOffset, s.rows(), -s.yRight(), s.zRight(),
                        -s.yLeft(), s.zLeft(), -s.y(), s.chord(), false));
            }
        }

        Lattice toLattice(int half, boolean mirrored) {
            int n = rows.size();
            double[] a = new double[3 * n];
            double[] b = new double[3 * n];
            double[] c = new double[3 * n];
            double[] nn = new double[3 * n];
            double[] eps = new double[n];
            double[] cut = new double[n];
            int[] strip = new int[n];
            int[] ctrl = new int[n];
            double[] sign = new double[n];
            for (int i = 0; i < n; i++) {
                double[] p = rows.get(i);
                System.arraycopy(p, 0, a, 3 * i, 3);
                System.arraycopy(p, 3, b, 3 * i, 3);
                System.arraycopy(p, 6, c, 3 * i, 3);
                System.arraycopy(p, 9, nn, 3 * i, 3);
                eps[i] = p[12];
                cut[i] = p[13];
                strip[i] = tags.get(i)[0];
                ctrl[i] = tags.get(i)[1];
                sign[i] = signs.get(i);
            }
            return new Lattice(a, b, c, nn, eps, cut, strip, ctrl, sign, strips, half, mirrored);
        }
    }
}
