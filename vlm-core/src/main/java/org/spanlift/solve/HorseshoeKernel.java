package org.spanlift.solve;

/**
 * Biot-Savart velocity of the legs of a unit-strength horseshoe vortex (circulation 1 m^2/s): the bound leg
 * from A to B, and the semi-infinite legs along +x from A and B (a horseshoe is the leg from +infinity
 * into A, the bound leg, and the leg from B back to +infinity). {@link InfluenceSystem} and
 * {@link InducedVelocity} sum them, sharing each trailing leg between the panels that meet at its start.
 *
 * <p>Bound legs are potential line vortices; a point within the cut-off distance of one gets no velocity
 * from it, so a point on a vortex line never yields NaN.
 *
 * <p>Trailing legs have a Rankine core (W. J. M. Rankine, 1858; the Rankine vortex of vortex-dynamics texts,
 * e.g. Saffman, Vortex Dynamics, 1992, reference recalled from memory): at distance d from the leg (in the y-z plane)
 * the swirl is the potential one, (1 + cos) / (4 pi d) with cos = rx / r, for d &gt;= r_c, and solid-body rotation
 * inside the core, (1 + cos) d / (4 pi r_c^2) for d &lt; r_c, continuous at d = r_c. Outside the core the arithmetic is
 * exactly that of the potential leg, so a point never inside a core sees bit-identical velocities. The
 * core radius is the lattice's ({@code Lattice.trailingCoreSquared}); the cut-off still applies first.
 */
final class HorseshoeKernel {

    private static final double FOUR_PI = 4 * Math.PI;

    private HorseshoeKernel() {
    }

    /** Adds the velocity of the finite segment A -> B (unit circulation) at P. */
    static void segment(double ax, double ay, double az, double bx, double by, double bz, double px, double py,
            double pz, double eps, double[] out) {
        double r1x = px - ax;
        double r1y = py - ay;
        double r1z = pz - az;
        double r2x = px - bx;
        double r2y = py - by;
        double r2z = pz - bz;
        double cx = r1y * r2z - r1z * r2y;
        double cy = r1z * r2x - r1x * r2z;
        double cz = r1x * r2y - r1y * r2x;
        double c2 = cx * cx + cy * cy + cz * cz;
        double r0x = bx - ax;
        double r0y = by - ay;
        double r0z = bz - az;
        double r02 = r0x * r0x + r0y * r0y + r0z * r0z;
        double r1 = Math.sqrt(r1x * r1x + r1y * r1y + r1z * r1z);
        double r2 = Math.sqrt(r2x * r2x + r2y * r2y + r2z * r2z);
        if (c2 <= eps * eps * r02 || r1 <= eps || r2 <= eps) {
            return;
        }
        double k = ((r0x * r1x + r0y * r1y + r0z * r1z) / r1 - (r0x * r2x + r0y * r2y + r0z * r2z) / r2)
                / (FOUR_PI * c2);
        out[0] += k * cx;
        out[1] += k * cy;
        out[2] += k * cz;
    }

    /**
     * Adds the velocity of a semi-infinite leg along +x starting at Q (sense +1: from Q downstream;
     * sense -1: from downstream into Q) at P, with a Rankine core of squared radius {@code core2} (m^2; 0:
     * a potential leg).
     */
    static void trailing(double qx, double qy, double qz, double px, double py, double pz, double eps,
            double core2, double sense, double[] out) {
        double rx = px - qx;
        double ry = py - qy;
        double rz = pz - qz;
        double d2 = ry * ry + rz * rz;
        if (d2 <= eps * eps) {
            return;
        }
        double r = Math.sqrt(rx * rx + d2);
        double k = sense * (1 + rx / r) / (FOUR_PI * (d2 < core2 ? core2 : d2));
        out[1] -= k * rz;
        out[2] += k * ry;
    }
}
