package org.spanlift.atmosphere;

/**
 * The air at one pressure altitude and temperature offset.
 *
 * @param pressureAltitude pressure altitude, which is geopotential altitude in the standard atmosphere [m]
 * @param temperature static temperature [K]
 * @param pressure static pressure [Pa]
 * @param density density [kg/m^3]
 * @param speedOfSound speed of sound [m/s]
 * @param dynamicViscosity dynamic viscosity [Pa s]
 * @param kinematicViscosity kinematic viscosity [m^2/s]
 * @param densityRatio density over the standard sea-level density, sigma [-]
 */
public record AtmosphereState(
        double pressureAltitude,
        double temperature,
        double pressure,
        double density,
        double speedOfSound,
        double dynamicViscosity,
        double kinematicViscosity,
        double densityRatio) {

    /** Refuses non-finite values, and non-positive values for everything but the altitude. */
    public AtmosphereState {
        requireFinite("pressure altitude", pressureAltitude);
        requirePositive("temperature", temperature);
        requirePositive("pressure", pressure);
        requirePositive("density", density);
        requirePositive("speed of sound", speedOfSound);
        requirePositive("dynamic viscosity", dynamicViscosity);
        requirePositive("kinematic viscosity", kinematicViscosity);
        requirePositive("density ratio", densityRatio);
    }

    private static void requireFinite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite, got " + value);
        }
    }

    private static void requirePositive(String name, double value) {
        if (!(value > 0.0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be positive and finite, got " + value);
        }
    }
}
