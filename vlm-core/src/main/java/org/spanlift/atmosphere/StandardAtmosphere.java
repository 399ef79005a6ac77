package org.spanlift.atmosphere;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * The U.S. Standard Atmosphere 1976 from {@value #MIN_ALTITUDE} m to {@value #MAX_ALTITUDE} m
 * geopotential altitude: four layers with linear temperature in geopotential altitude, bases at
 * 0, 11, 20, 32 and 47 km, lapse rates -6.5, 0, +1.0 and +2.8 K/km (the first layer is extended
 * below sea level with its own lapse rate). Layer base temperatures and pressures are computed from
 * the model's constants by the hydrostatic equation, not tabulated.
 *
 * <p>Pressure altitude is geopotential altitude in the standard atmosphere. With a temperature
 * offset (ISA offset), pressure still follows the pressure altitude as standard, the temperature is
 * the standard one plus the offset, and density follows from the gas law.
 */
public final class StandardAtmosphere {

    /** Standard acceleration of gravity, g0 [m/s^2]. */
    public static final double G0 = 9.80665;
    /** Universal gas constant of the 1976 model, R* [J/(mol K)]. */
    public static final double UNIVERSAL_GAS_CONSTANT = 8.31432;
    /** Sea-level mean molar mass of air, M0 [kg/mol] (28.9644 kg/kmol). */
    public static final double MOLAR_MASS = 28.9644e-3;
    /** Specific gas constant of air, R = R* / M0 [J/(kg K)]. */
    public static final double GAS_CONSTANT = UNIVERSAL_GAS_CONSTANT / MOLAR_MASS;
    /** Ratio of specific heats, gamma [-]. */
    public static final double GAMMA = 1.4;
    /** Sea-level standard temperature, T0 [K]. */
    public static final double T0 = 288.15;
    /** Sea-level standard pressure, P0 [Pa]. */
    public static final double P0 = 101325.0;
    /** Sea-level standard density, rho0 = P0 / (R T0) [kg/m^3]. */
    public static final double RHO0 = P0 / (GAS_CONSTANT * T0);
    /** Effective earth radius for the geopotential altitude, r0 [m]. */
    public static final double EARTH_RADIUS = 6356766.0;
    /** Sutherland's constant beta [kg/(m s K^0.5)]. */
    public static final double SUTHERLAND_BETA = 1.458e-6;
    /** Sutherland's temperature S [K]. */
    public static final double SUTHERLAND_TEMPERATURE = 110.4;
    /** Lowest pressure altitude served [m, geopotential]. */
    public static final double MIN_ALTITUDE = -2000.0;
    /** Highest pressure altitude served [m, geopotential]. */
    public static final double MAX_ALTITUDE = 47000.0;

    /** Layer base geopotential altitudes [m]; the last entry is the top of the last layer. */
    private static final double[] BASE_ALTITUDE = {0.0, 11000.0, 20000.0, 32000.0, 47000.0};
    /** Temperature gradient of each layer [K/m]. */
    private static final double[] LAPSE_RATE = {-6.5e-3, 0.0, 1.0e-3, 2.8e-3};
    private static final double[] BASE_TEMPERATURE = new double[BASE_ALTITUDE.length];
    private static final double[] BASE_PRESSURE = new double[BASE_ALTITUDE.length];

    static {
        BASE_TEMPERATURE[0] = T0;
        BASE_PRESSURE[0] = P0;
        for (int i = 0; i < LAPSE_RATE.length; i++) {
            double top = BASE_ALTITUDE[i + 1];
            BASE_TEMPERATURE[i + 1] = layerTemperature(i, top);
            BASE_PRESSURE[i + 1] = layerPressure(i, top);
        }
    }

    private StandardAtmosphere() {
    }

    /**
     * The standard atmosphere at a pressure altitude.
     *
     * @param pressureAltitudeMetres pressure (geopotential) altitude [m]
     * @return the state of the air
     * @throws IllegalArgumentException outside {@value #MIN_ALTITUDE} m to {@value #MAX_ALTITUDE} m
     */
    public static AtmosphereState at(double pressureAltitudeMetres) {
        return at(pressureAltitudeMetres, 0.0);
    }

    /**
     * The atmosphere at a pressure altitude with a temperature offset from standard.
     *
     * @param pressureAltitudeMetres pressure (geopotential) altitude [m]
     * @param isaOffsetKelvin temperature minus the standard temperature at that altitude [K]
     * @return the state of the air
     * @throws IllegalArgumentException outside {@value #MIN_ALTITUDE} m to {@value #MAX_ALTITUDE} m,
     *     or for an offset that is not finite or leaves no positive temperature
     */
    public static AtmosphereState at(double pressureAltitudeMetres, double isaOffsetKelvin) {
        double h = pressureAltitudeMetres;
        if (!(h >= MIN_ALTITUDE && h <= MAX_ALTITUDE)) {
            throw new IllegalArgumentException("pressure altitude must be between " + plain(MIN_ALTITUDE)
                    + " m and " + plain(MAX_ALTITUDE) + " m (geopotential), got " + plain(h) + " m");
        }
        int layer = layerOf(h);
        double standardTemperature = layerTemperature(layer, h);
        double temperature = standardTemperature + isaOffsetKelvin;
        if (!Double.isFinite(isaOffsetKelvin) || !(temperature > 0.0)) {
            throw new IllegalArgumentException("ISA offset must be finite and leave a positive temperature"
                    + " (standard " + plain(standardTemperature) + " K at " + plain(h) + " m), got "
                    + plain(isaOffsetKelvin) + " K");
        }
        double pressure = layerPressure(layer, h);
        double density = pressure / (GAS_CONSTANT * temperature);
        double speedOfSound = Math.sqrt(GAMMA * GAS_CONSTANT * temperature);
        double viscosity = SUTHERLAND_BETA * Math.pow(temperature, 1.5) / (temperature + SUTHERLAND_TEMPERATURE);
        return new AtmosphereState(h, temperature, pressure, density, speedOfSound, viscosity,
                viscosity / density, density / RHO0);
    }

    /**
     * Geopotential altitude H = r0 Z / (r0 + Z) from geometric altitude Z.
     *
     * @param geometricMetres geometric altitude above mean sea level [m], above -r0
     * @return geopotential altitude [m]
     */
    public static double geopotentialFromGeometric(double geometricMetres) {
        if (!(geometricMetres > -EARTH_RADIUS) || !Double.isFinite(geometricMetres)) {
            throw new IllegalArgumentException("geometric altitude must be finite and above -"
                    + plain(EARTH_RADIUS) + " m, got " + plain(geometricMetres) + " m");
        }
        return EARTH_RADIUS * geometricMetres / (EARTH_RADIUS + geometricMetres);
    }

    /**
     * Geometric altitude Z = r0 H / (r0 - H) from geopotential altitude H.
     *
     * @param geopotentialMetres geopotential altitude [m], below r0
     * @return geometric altitude above mean sea level [m]
     */
    public static double geometricFromGeopotential(double geopotentialMetres) {
        if (!(geopotentialMetres < EARTH_RADIUS) || !Double.isFinite(geopotentialMetres)) {
            throw new IllegalArgumentException("geopotential altitude must be finite and below "
                    + plain(EARTH_RADIUS) + " m, got " + plain(geopotentialMetres) + " m");
        }
        return EARTH_RADIUS * geopotentialMetres / (EARTH_RADIUS - geopotentialMetres);
    }

    private static int layerOf(double h) {
        int layer = 0;
        while (layer < LAPSE_RATE.length - 1 && h > BASE_ALTITUDE[layer + 1]) {
            layer++;
        }
        return layer;
    }

    private static double layerTemperature(int layer, double h) {
        return BASE_TEMPERATURE[layer] + LAPSE_RATE[layer] * (h - BASE_ALTITUDE[layer]);
    }

    /** Hydrostatic pressure within a layer, from its base values. */
    private static double layerPressure(int layer, double h) {
        double baseTemperature = BASE_TEMPERATURE[layer];
        double lapse = LAPSE_RATE[layer];
        double dh = h - BASE_ALTITUDE[layer];
        if (lapse == 0.0) {
            return BASE_PRESSURE[layer] * Math.exp(-G0 * dh / (GAS_CONSTANT * baseTemperature));
        }
        double ratio = baseTemperature / (baseTemperature + lapse * dh);
        return BASE_PRESSURE[layer] * Math.pow(ratio, G0 / (GAS_CONSTANT * lapse));
    }

    /** A value for a message: at most 10 significant digits, no exponent. */
    private static String plain(double value) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        return new BigDecimal(value).round(new MathContext(10)).stripTrailingZeros().toPlainString();
    }
}
