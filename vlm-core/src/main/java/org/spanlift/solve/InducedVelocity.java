package org.spanlift.solve;

import org.spanlift.geometry.Vec3;
import org.spanlift.lattice.Lattice;
import org.spanlift.results.Solution;

/**
 * The velocity that a solved lattice's horseshoe vortices induce at any point, per unit freestream speed
 * (dimensionless), both halves, with the kernel of the influence system ({@link HorseshoeKernel}: cut-off on
 * the bound legs, Rankine cores on the trailing legs, which run along +x). Frame: wing axes, x aft, y toward
 * the right tip, z up, metres. Immutable.
 *
 * <p>Downwash angle: with the freestream V (cos alpha, 0, sin alpha) and the induced velocity v per unit
 * speed, the local flow in the x-z plane makes the angle theta = atan2(sin alpha + v_z, cos alpha + v_x)
 * with the x axis, and the downwash angle is epsilon = alpha - theta (rad, positive when the flow is turned
 * down). To first order in v, epsilon = v_x sin alpha - v_z cos alpha = -(v . n), n = (-sin alpha, 0, cos alpha)
 * the upward normal to the freestream. The side velocity v_y does not enter.
 */
public final class InducedVelocity {

    private final Lattice lattice;
    private final double[] circulation;
    private final double[] legStrength;

    /**
     * @param lattice     the lattice
     * @param circulation panel circulations per unit speed, m, every panel (copied)
     */
    public InducedVelocity(Lattice lattice, double[] circulation) {
        if (circulation.length != lattice.panelCount()) {
            throw new IllegalArgumentException("expected " + lattice.panelCount() + " circulations, got "
                    + circulation.length);
        }
        this.lattice = lattice;
        this.circulation = circulation.clone();
        // a horseshoe is -(leg from A) + bound leg + (leg from B); each shared leg carries the net strength
        this.legStrength = new double[lattice.trailingPointCount()];
        for (int j = 0; j < circulation.length; j++) {
            legStrength[lattice.trailingPointB(j)] += circulation[j];
            legStrength[lattice.trailingPointA(j)] -= circulation[j];
        }
    }

    /** The field of a solution's circulation. */
    public static InducedVelocity of(Solution solution) {
        Lattice lattice = solution.lattice();
        double[] g = new double[lattice.panelCount()];
        for (int j = 0; j < g.length; j++) {
            g[j] = solution.circulation(j);
        }
        return new InducedVelocity(lattice, g);
    }

    /** Writes the induced velocity per unit speed at (x, y, z) (m) into {@code out[0..2]} (overwritten). */
    public void at(double x, double y, double z, double[] out) {
        out[0] = 0;
        out[1] = 0;
        out[2] = 0;
        double[] v = new double[3];
        for (int j = 0; j < circulation.length; j++) {
            double g = circulation[j];
            if (g == 0) {
                continue;
            }
            v[0] = 0;
            v[1] = 0;
            v[2] = 0;
            HorseshoeKernel.segment(lattice.ax(j), lattice.ay(j), lattice.az(j), lattice.bx(j), lattice.by(j),
                    lattice.bz(j), x, y, z, lattice.cutoff(j), v);
            out[0] += g * v[0];
            out[1] += g * v[1];
            out[2] += g * v[2];
        }
        for (int k = 0; k < legStrength.length; k++) {
            if (legStrength[k] != 0) {
                HorseshoeKernel.trailing(lattice.trailingX(k), lattice.trailingY(k), lattice.trailingZ(k), x, y, z,
                        lattice.trailingCutoff(k), lattice.trailingCoreSquared(k), legStrength[k], out);
            }
        }
    }

    /** The induced velocity per unit speed at a point (m). */
    public Vec3 at(Vec3 point) {
        double[] v = new double[3];
        at(point.x(), point.y(), point.z(), v);
        return new Vec3(v[0], v[1], v[2]);
    }

    /**
     * The downwash angle epsilon = alpha - atan2(sin alpha + v_z, cos alpha + v_x) at a point (m), rad;
     * {@code alpha} (rad) must be the angle of attack this circulation was solved at.
     */
    public double downwashAngle(double x, double y, double z, double alpha) {
        double[] v = new double[3];
        at(x, y, z, v);
        return downwashAngle(alpha, v[0], v[2]);
    }

    /** epsilon = alpha - atan2(sin alpha + vz, cos alpha + vx), rad, from the induced velocity per unit speed. */
    public static double downwashAngle(double alpha, double vx, double vz) {
        return alpha - Math.atan2(Math.sin(alpha) + vz, Math.cos(alpha) + vx);
    }
}
