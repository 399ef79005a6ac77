package org.spanlift.results;

/**
 * The span load of one surface, one entry per strip, y ascending over both halves. Lengths in metres,
 * angles in radians. Immutable: the arrays are copied on the way in and every accessor returns a copy.
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

    /** Checks that the arrays share one length and copies them. */
    public SpanLoad {
        int n = y.length;
        if (chord.length != n || cl.length != n || clc.length != n || circulation.length != n
                || inducedAngle.length != n || yLeft.length != n || yRight.length != n) {
            throw new IllegalArgumentException("span-load arrays differ in length");
        }
        y = y.clone();
        chord = chord.clone();
        cl = cl.clone();
        clc = clc.clone();
        circulation = circulation.clone();
        inducedAngle = inducedAngle.clone();
        yLeft = yLeft.clone();
        yRight = yRight.clone();
    }

    /** The number of strips. */
    public int size() {
        return y.length;
    }

    /** A copy of the spanwise stations of the strips' control points, m. */
    @Override
    public double[] y() {
        return y.clone();
    }

    /** A copy of the local chords, m. */
    @Override
    public double[] chord() {
        return chord.clone();
    }

    /** A copy of the section lift coefficients 2 Gamma / (V c). */
    @Override
    public double[] cl() {
        return cl.clone();
    }

    /** A copy of c * cl = 2 Gamma / V, m. */
    @Override
    public double[] clc() {
        return clc.clone();
    }

    /** A copy of Gamma / V, m. */
    @Override
    public double[] circulation() {
        return circulation.clone();
    }

    /** A copy of the local induced angles, rad (positive where the downwash lowers the angle). */
    @Override
    public double[] inducedAngle() {
        return inducedAngle.clone();
    }

    /** A copy of the strips' left edges, m. */
    @Override
    public double[] yLeft() {
        return yLeft.clone();
    }

    /** A copy of the strips' right edges, m. */
    @Override
    public double[] yRight() {
        return yRight.clone();
    }
}
