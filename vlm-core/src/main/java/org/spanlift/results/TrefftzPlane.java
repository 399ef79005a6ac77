package org.spanlift.results;

import java.util.List;

import org.spanlift.lattice.Strip;

/**
 * Induced drag and downwash far downstream (the Trefftz plane, normal to x), from the lattice's trailing
 * legs: each strip of circulation G leaves a two-dimensional point vortex of strength +G at its right edge
 * and -G at its left edge. The normalwash of all of them is evaluated at each strip's control-point
 * station, and
 *
 * <pre>D / q = -(1 / V^2) sum_s G_s (v . n)_s w_s</pre>
 *
 * with w_s the strip width in the Trefftz plane, G per unit speed (metres) and v per unit speed.
 */
public final class TrefftzPlane {

    private TrefftzPlane() {
    }

    /**
     * The normalwash (v . n, per unit freestream speed, positive along the strip's upward normal) at each
     * strip's control-point station. Writes {@code out} (length strips, overwritten).
     *
     * @param strips      the strips
     * @param circulation strip circulation per unit speed, m
     */
    public static void normalwash(List<Strip> strips, double[] circulation, double[] out) {
        int n = strips.size();
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
                // +g at the right edge, -g at the left edge; v = G / (2 pi r^2) (-rz, ry)
                double ry = py - other.yRight();
                double rz = pz - other.zRight();
                double r2 = ry * ry + rz * rz;
                double k1 = g / (2 * Math.PI * r2);
                vy -= k1 * rz;
                vz += k1 * ry;
                ry = py - other.yLeft();
                rz = pz - other.zLeft();
                r2 = ry * ry + rz * rz;
                double k2 = -g / (2 * Math.PI * r2);
                vy -= k2 * rz;
                vz += k2 * ry;
            }
            out[s] = vy * ny + vz * nz;
        }
    }

}
