package org.spanlift.lattice;

/**
 * One spanwise strip of panels, from its left edge (smaller y) to its right edge. Edge points are the
 * leading-edge points (y, z) where the trailing legs start in the Trefftz plane. Metres.
 *
 * @param surface     index of the surface in the wing
 * @param firstPanel  index of the strip's leading panel; its rows follow consecutively
 * @param rows        number of chordwise panels
 * @param yLeft       y of the left edge
 * @param zLeft       z of the left edge
 * @param yRight      y of the right edge
 * @param zRight      z of the right edge
 * @param y           y of the strip's control points (the midpoint in the spacing variable)
 * @param chord       local chord at y
 * @param right       true on the right half of a mirrored surface and on unmirrored surfaces
 */
public record Strip(int surface, int firstPanel, int rows, double yLeft, double zLeft, double yRight,
        double zRight, double y, double chord, boolean right) {

    /** Width of the strip in the plane normal to x, m. */
    public double width() {
        return Math.hypot(yRight - yLeft, zRight - zLeft);
    }
}
