package org.spanlift.geometry;

/**
 * A point or vector in the wing axes: x aft (downstream), y toward the right tip, z up. Metres when a
 * length.
 */
public record Vec3(double x, double y, double z) {

    public Vec3 plus(Vec3 o) {
        return new Vec3(x + o.x, y + o.y, z + o.z);
    }

    public Vec3 times(double s) {
        return new Vec3(x * s, y * s, z * s);
    }
}
