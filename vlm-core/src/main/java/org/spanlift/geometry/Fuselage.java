package org.spanlift.geometry;

/**
 * The fuselage as the empirical pitching-moment estimate sees it: its length and greatest width, m, and the x of
 * its nose, m (wing-file axes, x aft).
 *
 * @param length length, m
 * @param width  greatest width, m
 * @param noseX  x of the nose, m
 */
public record Fuselage(double length, double width, double noseX) {

    /** Checks that the length and width are positive and the nose x finite. */
    public Fuselage {
        if (!(length > 0) || !(width > 0) || !Double.isFinite(length) || !Double.isFinite(width)
                || !Double.isFinite(noseX)) {
            throw new IllegalArgumentException("a fuselage needs a positive length and width and a finite nose x");
        }
    }
}
