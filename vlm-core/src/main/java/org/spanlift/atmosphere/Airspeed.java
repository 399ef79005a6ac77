package org.spanlift.atmosphere;

/**
 * Conversions between equivalent and true airspeed, and the Reynolds number, in a given atmosphere.
 * Equivalent airspeed is the true airspeed times sqrt(sigma), sigma = rho / rho0.
 */
public final class Airspeed {

    private Airspeed() {
    }

    /**
     * True airspeed from equivalent airspeed.
     *
     * @param equivalentSpeed equivalent airspeed [m/s]
     * @param state the air
     * @return true airspeed EAS / sqrt(sigma) [m/s]
     */
    public static double trueFromEquivalent(double equivalentSpeed, AtmosphereState state) {
        return requireFinite("equivalent airspeed", equivalentSpeed) / Math.sqrt(state.densityRatio());
    }

    /**
     * Equivalent airspeed from true airspeed.
     *
     * @param trueSpeed true airspeed [m/s]
     * @param state the air
     * @return equivalent airspeed TAS * sqrt(sigma) [m/s]
     */
    public static double equivalentFromTrue(double trueSpeed, AtmosphereState state) {
        return requireFinite("true airspeed", trueSpeed) * Math.sqrt(state.densityRatio());
    }

    /**
     * Reynolds number V L / nu.
     *
     * @param trueSpeed true airspeed [m/s]
     * @param length reference length, such as a chord [m]
     * @param state the air
     * @return the Reynolds number [-]
     */
    public static double reynolds(double trueSpeed, double length, AtmosphereState state) {
        return requireFinite("true airspeed", trueSpeed) * requireFinite("length", length)
                / state.kinematicViscosity();
    }

    private static double requireFinite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite, got " + value);
        }
        return value;
    }

    /** A speed in knots (international nautical miles, 1852 m, per hour) from m/s. */
    public static double knots(double metresPerSecond) {
        return metresPerSecond * 3600 / 1852;
    }
}
