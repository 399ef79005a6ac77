package org.spanlift.geometry;

/**
 * The travel of a control: its least and greatest deflection, rad, positive trailing edge down (an elevator's
 * least deflection is its trailing-edge-up stop).
 *
 * @param least    the least deflection, rad
 * @param greatest the greatest deflection, rad
 */
public record DeflectionLimits(double least, double greatest) {

    /** Checks that both limits are finite and the least is below the greatest. */
    public DeflectionLimits {
        if (!(least < greatest) || !Double.isFinite(least) || !Double.isFinite(greatest)) {
            throw new IllegalArgumentException("deflection limits need the least below the greatest, got " + least
                    + " and " + greatest + " rad");
        }
    }

    /** True when {@code deflection} (rad) lies within the travel, ends included to {@code tolerance}. */
    public boolean contains(double deflection, double tolerance) {
        return deflection >= least - tolerance && deflection <= greatest + tolerance;
    }
}
