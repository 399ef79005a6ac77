package org.spanlift.section;

/**
 * A camber (mean) line of a wing section.
 *
 * <p>Coordinates are in chords: x is the chord fraction, 0 at the leading edge and 1 at the trailing edge;
 * z is the mean-line ordinate above the chord line. Lines are defined for 0 &lt;= x &lt;= 1; analytic lines do
 * not check the argument (so that {@link #slope(double)} stays cheap), and what they return outside that
 * range is unspecified.
 *
 * <p>Implementations are immutable and thread-safe.
 */
public interface CamberLine {

    /** Mean-line ordinate at chord fraction {@code x}, in chords. */
    double z(double x);

    /** Mean-line slope dz/dx at chord fraction {@code x}. */
    double slope(double x);

    /** Designation, e.g. {@code flat}, {@code NACA 2412}, {@code NACA 23012}, or a coordinate file's name. */
    String designation();

    /**
     * Chord fractions strictly between 0 and 1 where the slope or one of its derivatives jumps (the
     * slope kink of the NACA four-digit line at its maximum camber, the joint of the five-digit line, the
     * knots of a spline). Quadratures split their interval there. The default is none.
     *
     * @return a fresh, sorted array
     */
    default double[] breakpoints() {
        return new double[0];
    }

    /**
     * Whether the slope stays bounded at the leading edge. Where it does not (a mean line extracted from
     * coordinates, whose slope grows like 1/sqrt(x) near the nose), thin-airfoil quantities that weight the
     * slope without a vanishing factor there (the ideal angle and its lift coefficient) are undefined.
     */
    default boolean slopeBoundedAtLeadingEdge() {
        return true;
    }
}
