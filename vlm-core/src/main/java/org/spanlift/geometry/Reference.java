package org.spanlift.geometry;

/**
 * Reference values for coefficients: area (m^2), span (m), chord (m) and the moment point (m, wing
 * axes).
 *
 * @param area        reference area, m^2
 * @param span        reference span, m
 * @param chord       reference chord, m
 * @param momentPoint the point moments are taken about, m, wing axes
 */
public record Reference(double area, double span, double chord, Vec3 momentPoint) {

    /** The aspect ratio span^2 / area. */
    public double aspectRatio() {
        return span * span / area;
    }
}
