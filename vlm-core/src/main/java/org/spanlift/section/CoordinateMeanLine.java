package org.spanlift.section;

import java.util.Arrays;

/**
 * A mean line extracted from airfoil surface coordinates (see {@code org.spanlift.io.CoordinateFileReader}).
 *
 * <p>After normalisation to unit chord (leading edge at 0, trailing edge at 1), each surface is
 * interpolated by a clamped cubic spline in the variable s = sqrt(x), in which a round nose is smooth
 * (y grows like sqrt(x) there). The mean line is the midpoint of the two surfaces at the same x:
 * z(x) = (y_upper(x) + y_lower(x)) / 2, and its slope is the analytic derivative of the two splines,
 * dz/dx = (dz/ds) / (2 s), so it is smooth between knots and continuous with a continuous derivative at them.
 *
 * <p>Caveat: sections are built with the thickness laid normal to the mean line, so the upper and lower
 * points of one mean-line station lie at different x. The midpoint of the surfaces at the same x therefore
 * misses the true mean line by roughly y_t * (dy_t/dx) * sin(theta) (y_t the half thickness, theta the mean-line
 * angle): small over most of the chord, but growing toward the leading edge, where the midpoint line also
 * turns steeply (its slope is unbounded like 1/sqrt(x)). The leading edge taken here (the point of the contour
 * farthest forward along the chord line) may also differ from the design leading edge of a section whose mean
 * line is steep at the nose, which inclines the chord line slightly. Thin-airfoil quantities that weight the
 * nose strongly (the ideal angle) are reported as undefined for this line; the zero-lift angle and moment
 * weight the nose lightly and are well defined.
 *
 * <p>At x = 0 exactly, {@link #slope(double)} returns the mean slope over the first spline interval, a finite
 * stand-in for the unbounded limit. Arguments outside [0, 1] are clamped.
 */
public final class CoordinateMeanLine implements CamberLine {

    private final String designation;
    private final CubicSpline upper;
    private final CubicSpline lower;
    private final double[] breakpoints;
    private final double firstKnotX;
    private final double chordInFileUnits;
    private final double chordAngle;
    private final double leadingEdgeX;
    private final double leadingEdgeY;

    /**
     * A mean line from the upper and lower surfaces' splines (y against s = sqrt(x), unit chord), with the
     * chord length, chord-line angle and leading edge found in the file (its units and coordinates).
     */
    public CoordinateMeanLine(String designation, CubicSpline upper, CubicSpline lower,
                       double chordInFileUnits, double chordAngle, double leadingEdgeX, double leadingEdgeY) {
        this.leadingEdgeX = leadingEdgeX;
        this.leadingEdgeY = leadingEdgeY;
        this.designation = designation;
        this.upper = upper;
        this.lower = lower;
        this.chordInFileUnits = chordInFileUnits;
        this.chordAngle = chordAngle;
        double[] su = upper.knots();
        double[] sl = lower.knots();
        double[] all = new double[su.length + sl.length];
        int n = 0;
        for (double s : su) {
            all[n++] = s * s;
        }
        for (double s : sl) {
            all[n++] = s * s;
        }
        Arrays.sort(all);
        double[] inner = new double[all.length];
        int k = 0;
        for (double x : all) {
            if (x > 1e-12 && x < 1.0 - 1e-12 && (k == 0 || x > inner[k - 1])) {
                inner[k++] = x;
            }
        }
        this.breakpoints = Arrays.copyOf(inner, k);
        this.firstKnotX = k > 0 ? inner[0] : 1.0;
    }

    @Override
    public double z(double x) {
        double s = Math.sqrt(clamp(x));
        return 0.5 * (upper.value(s) + lower.value(s));
    }

    @Override
    public double slope(double x) {
        double xc = clamp(x);
        if (xc <= 0.0) {
            return (z(firstKnotX) - z(0.0)) / firstKnotX;
        }
        double s = Math.sqrt(xc);
        return 0.25 * (upper.derivative(s) + lower.derivative(s)) / s;
    }

    /** Chord length in the file's units, before normalisation. */
    public double chordInFileUnits() {
        return chordInFileUnits;
    }

    /**
     * Inclination of the file's chord line, radians, positive when the leading edge lies above the trailing
     * edge (nose up); the coordinates were rotated by its negative.
     */
    public double chordAngleInFile() {
        return chordAngle;
    }

    /** x of the leading edge taken, in the file's coordinates. */
    public double leadingEdgeXInFile() {
        return leadingEdgeX;
    }

    /** y of the leading edge taken, in the file's coordinates. */
    public double leadingEdgeYInFile() {
        return leadingEdgeY;
    }

    @Override
    public double[] breakpoints() {
        return breakpoints.clone();
    }

    @Override
    public boolean slopeBoundedAtLeadingEdge() {
        return false;
    }

    @Override
    public String designation() {
        return designation;
    }

    @Override
    public String toString() {
        return designation;
    }

    private static double clamp(double x) {
        return x < 0.0 ? 0.0 : Math.min(x, 1.0);
    }
}
