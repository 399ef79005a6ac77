package org.spanlift.geometry;

/**
 * A point or vector in the wing axes: x aft (downstream), y toward the right tip, z up. Metres when a
 * length.
 *
 * @param x the component along x (aft)
 * @param y the component along y (toward the right tip)
 * @param z the component along z (up)
 */
public record Vec3(double x, double y, double z) {

    /** The sum of this and {@code o}. */
    public Vec3 plus(Vec3 o) {
        return new Vec3(x + o.x, y + o.y, z + o.z);
    }

    /** This scaled by {@code s}. */
    public Vec3 times(double s) {
        return new Vec3(x * s, y * s, z * s);
    }
}
