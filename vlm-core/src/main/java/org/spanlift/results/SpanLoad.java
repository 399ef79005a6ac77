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

    public int size() {
        return y.length;
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    @Override
    public double[] chord() {
        return chord.clone();
    }

    @Override
    public double[] cl() {
        return cl.clone();
    }

    @Override
    public double[] clc() {
        return clc.clone();
    }

    @Override
    public double[] circulation() {
        return circulation.clone();
    }

    @Override
    public double[] inducedAngle() {
        return inducedAngle.clone();
    }

    @Override
    public double[] yLeft() {
        return yLeft.clone();
    }

    @Override
    public double[] yRight() {
        return yRight.clone();
    }
}
