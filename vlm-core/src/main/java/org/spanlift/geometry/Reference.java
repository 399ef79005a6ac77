package org.spanlift.geometry;

/**
 * Reference values for coefficients: area (m^2), span (m), chord (m) and the moment point (m, wing
 * axes).
 */
public record Reference(double area, double span, double chord, Vec3 momentPoint) {

    public double aspectRatio() {
        return span * span / area;
    }
}
