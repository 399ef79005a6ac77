package org.spanlift.input.quantity;

/** Unit conversion factors to SI that are exact by definition. */
final class ExactFactors {

    /** Standard acceleration of gravity, 9.80665 m/s^2 (3rd CGPM, 1901): one kilogram-force in newtons. */
    static final double KILOGRAM_FORCE = 9.80665;
    /** International avoirdupois pound, 0.45359237 kg (international yard and pound agreement, 1959). */
    static final double POUND = 0.45359237;
    /** Pound-force: one pound under standard gravity, 0.45359237 x 9.80665 = 4.4482216152605 N. */
    static final double POUND_FORCE = 4.4482216152605;
    /** International foot, 0.3048 m (international yard and pound agreement, 1959). */
    static final double FOOT = 0.3048;
    /** International inch, 0.0254 m (international yard and pound agreement, 1959). */
    static final double INCH = 0.0254;
    /** Kilometre per hour, 1000/3600 m/s. */
    static final double KILOMETRE_PER_HOUR = 1000.0 / 3600.0;
    /** Knot: one international nautical mile (1852 m) per hour, 1852/3600 m/s. */
    static final double KNOT = 1852.0 / 3600.0;
    /** Mile per hour: one international mile (1609.344 m) per hour, 0.44704 m/s. */
    static final double MILE_PER_HOUR = 0.44704;

    private ExactFactors() {
    }
}
