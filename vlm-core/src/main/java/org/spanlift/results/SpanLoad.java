package org.spanlift.results;

/**
 * The span load of one surface, one entry per strip, y ascending over both halves. Lengths in metres,
 * angles in radians.
 *
 * @param y             spanwise station of the strip's control points
 * @param chord         local chord there
 * @param cl            section lift coefficient 2 Gamma / (V c)
 * @param clc           c * cl = 2 Gamma / V
 * @param circulation   Gamma / V
 * @param inducedAngle  local induced angle (half the Trefftz-plane downwash angle; positive where the
 *                      downwash lowers the section's effective angle of attack)
 * @param yLeft         left edge of each strip
 * @param yRight        right edge of each strip
 */
public record SpanLoad(double[] y, double[] chord, double[] cl, double[] clc, double[] circulation,
        double[] inducedAngle, double[] yLeft, double[] yRight) {

    public int size() {
        return y.length;
    }
}
