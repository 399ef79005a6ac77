package org.spanlift.results;

import java.util.List;

import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.Strip;

/**
 * Induced drag and downwash far downstream (the Trefftz plane, normal to x), from the lattice's trailing
 * legs: each strip of circulation G leaves a two-dimensional vortex of strength +G at its right edge and
 * -G at its left edge. The normalwash of all of them is evaluated at each strip's control-point station,
 * and
 *
 * <pre>D / q = -(1 / V^2) sum_s G_s (v . n)_s w_s</pre>
 *
 * with w_s the strip width in the Trefftz plane, G per unit speed (metres) and v per unit speed.
 *
 * <p>Each vortex has the Rankine core of its trailing legs (W. J. M. Rankine, 1858, as vortex-dynamics texts
 * give it; the two-dimensional form, far downstream, of the law of {@code HorseshoeKernel.trailing}). At
 * distance d (m) from the vortex in the y-z plane, a vortex of circulation G (per unit freestream speed,
 * so in metres; positive with its vorticity along +x, turning +y toward +z: anticlockwise seen from behind,
 * as a lifting wing's right tip vortex) induces the swirl
 *
 * <pre>
 *   v = G / (2 pi d)          for d &gt;= r_c   (the potential vortex)
 *   v = G d / (2 pi r_c^2)    for d &lt;  r_c   (solid-body rotation inside the core)
 * </pre>
 *
 * (dimensionless, per unit freestream speed), directed along (-r_z, r_y) / d, r = station - vortex (m);
 * the two meet at d = r_c. So inboard of a positive right-edge vortex the normalwash of a flat strip is
 * negative (downwash), and the drag D / q comes out in m^2, positive for a lifting wing. The core
 * radius r_c is the lattice's, per edge ({@link Lattice#stripEdgeCoreSquared}): half the smallest width of
 * the strips meeting there, bounded so that no station of the edge's own surface lies inside. So the core
 * acts only where a station of another surface comes near the edge (a tail at the wing's wake height). The
 * bound makes a station of the vortex's own surface never strictly inside, so for those pairs the distance
 * test is not made (a station's coordinates here are not bit for bit the control point's, and rounding must
 * not tip one over the bound): a wing of one surface gets exactly the sum of potential vortices.
 */
public final class TrefftzPlane {

    private TrefftzPlane() {
    }

    /**
     * The normalwash (v . n, per unit freestream speed, positive along the strip's upward normal) at each
     * strip's control-point station. Writes {@code out} (length strips, overwritten).
     *
     * @param lattice     the lattice, for its strips and the cores of their edges
     * @param circulation strip circulation per unit speed, m, in the lattice's strip order
     */
    public static void normalwash(Lattice lattice, double[] circulation, double[] out) {
        List<Strip> strips = lattice.strips();
        int n = strips.size();
        double[] coreRight = new double[n];
        double[] coreLeft = new double[n];
        for (int k = 0; k < n; k++) {
            coreRight[k] = lattice.stripEdgeCoreSquared(k, true);
            coreLeft[k] = lattice.stripEdgeCoreSquared(k, false);
        }
        for (int s = 0; s < n; s++) {
            Strip st = strips.get(s);
            double f = (st.y() - st.yLeft()) / (st.yRight() - st.yLeft());
            double py = st.yLeft() + f * (st.yRight() - st.yLeft());
            double pz = st.zLeft() + f * (st.zRight() - st.zLeft());
            double w = st.width();
            double ny = -(st.zRight() - st.zLeft()) / w;
            double nz = (st.yRight() - st.yLeft()) / w;
            double vy = 0;
            double vz = 0;
            for (int k = 0; k < n; k++) {
                double g = circulation[k];
                if (g == 0) {
                    continue;
                }
                Strip other = strips.get(k);
                boolean own = other.surface() == st.surface();
                // +g at the right edge, -g at the left edge; v = G / (2 pi max(r^2, r_c^2)) (-rz, ry)
                double ry = py - other.yRight();
                double rz = pz - other.zRight();
                double r2 = ry * ry + rz * rz;
                double k1 = g / (2 * Math.PI * (own || r2 >= coreRight[k] ? r2 : coreRight[k]));
                vy -= k1 * rz;
                vz += k1 * ry;
                ry = py - other.yLeft();
                rz = pz - other.zLeft();
                r2 = ry * ry + rz * rz;
                double k2 = -g / (2 * Math.PI * (own || r2 >= coreLeft[k] ? r2 : coreLeft[k]));
                vy -= k2 * rz;
                vz += k2 * ry;
            }
            out[s] = vy * ny + vz * nz;
        }
    }

}
