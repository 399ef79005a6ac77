package org.spanlift.geometry;

/**
 * A point or vector in the wing axes: x aft (downstream), y toward the right tip, z up. Metres when a
 * length.
 */
public record Vec3(double x, double y, double z) {

    public Vec3 plus(Vec3 o) {
        return new Vec3(x + o.x, y + o.y, z + o.z);
    }

    public Vec3 minus(Vec3 o) {
        return new Vec3(x - o.x, y - o.y, z - o.z);
    }

    public Vec3 times(double s) {
        return new Vec3(x * s, y * s, z * s);
    }

    public double dot(Vec3 o) {
        return x * o.x + y * o.y + z * o.z;
    }

    public Vec3 cross(Vec3 o) {
        return new Vec3(y * o.z - z * o.y, z * o.x - x * o.z, x * o.y - y * o.x);
    }

    public double norm() {
        return Math.sqrt(dot(this));
    }

    /** The mirror image in the plane y = 0. */
    public Vec3 mirrored() {
        return new Vec3(x, -y, z);
    }
}
