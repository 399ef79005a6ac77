package org.spanlift.atmosphere;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Checks against U.S. Standard Atmosphere, 1976 (NOAA, NASA, USAF; U.S. Government Printing Office,
 * Washington, D.C., 1976), Table I (temperature, pressure, density; SI part) and its speed of sound
 * and dynamic viscosity columns.
 *
 * <p>Tolerance: every printed value is compared within one unit of its last printed digit (half a unit
 * for the table's rounding, the same again for its own arithmetic). The table prints temperature to
 * 0.001 K and the other quantities to 5 significant figures, so the tolerance is at most 1e-4 relative.
 */
class StandardAtmosphereTest {

    /**
     * Rows at round geometric altitudes Z, as the table lists them beside the geopotential altitude
     * H; the model is entered at H = r0 Z / (r0 + Z). Values recalled from memory of the table, not
     * re-read from a copy of it; the rows at 1000, 3000 and 5000 m agree, to the fewer digits printed
     * there, with the standard-atmosphere table in Kutz (ed.), Mechanical Engineers' Handbook,
     * vol. 4, Table 6.
     */
    @ParameterizedTest(name = "Z = {0} m")
    @CsvSource({
        // Z [m], T [K], P [Pa], rho [kg/m^3], a [m/s], mu [Pa s]
        "0,     288.150, 1.01325E+05, 1.2250E+00, 340.29, 1.7894E-05",
        "1000,  281.651, 8.9876E+04,  1.1117E+00, 336.43, 1.7579E-05",
        "3000,  268.659, 7.0121E+04,  9.0925E-01, 328.58, 1.6938E-05",
        "5000,  255.676, 5.4048E+04,  7.3643E-01, 320.55, 1.6282E-05",
        "11000, 216.774, 2.2700E+04,  3.6480E-01, 295.15, 1.4223E-05",
        "20000, 216.650, 5.5293E+03,  8.8910E-02, 295.07, 1.4216E-05",
    })
    void matchesTableRowsAtGeometricAltitudes(double geometric, String temperature, String pressure,
            String density, String speedOfSound, String viscosity) {
        AtmosphereState air = StandardAtmosphere.at(StandardAtmosphere.geopotentialFromGeometric(geometric));
        assertTabulated(temperature, air.temperature(), "temperature");
        assertTabulated(pressure, air.pressure(), "pressure");
        assertTabulated(density, air.density(), "density");
        assertTabulated(speedOfSound, air.speedOfSound(), "speed of sound");
        assertTabulated(viscosity, air.dynamicViscosity(), "dynamic viscosity");
    }

    /**
     * The layer bases at round geopotential altitudes H, the model's defining points. Pressures are
     * the published layer-base pressures of the 1976 model; densities recalled from memory of Table I.
     */
    @ParameterizedTest(name = "H = {0} m")
    @CsvSource({
        // H [m], T [K], P [Pa], rho [kg/m^3]
        "0,     288.150, 1.01325E+05, 1.2250E+00",
        "11000, 216.650, 2.2632E+04,  3.6392E-01",
        "20000, 216.650, 5.4749E+03,  8.8035E-02",
        "32000, 228.650, 8.6802E+02,  1.3225E-02",
        "47000, 270.650, 1.1091E+02,  1.4275E-03",
    })
    void matchesLayerBasesAtGeopotentialAltitudes(double geopotential, String temperature, String pressure,
            String density) {
        AtmosphereState air = StandardAtmosphere.at(geopotential);
        assertTabulated(temperature, air.temperature(), "temperature");
        assertTabulated(pressure, air.pressure(), "pressure");
        assertTabulated(density, air.density(), "density");
    }

    @ParameterizedTest
    @CsvSource({"-2000, 301.15", "1000, 281.65", "3000, 268.65", "5000, 255.65", "15000, 216.65",
        "26000, 222.65", "40000, 251.05"})
    void temperatureIsLinearInGeopotentialAltitudeWithTheLayerLapseRates(double geopotential, double expected) {
        assertEquals(expected, StandardAtmosphere.at(geopotential).temperature(), 1e-9);
    }

    @Test
    void seaLevelDensityAndKinematicViscosityMatchTheTable() {
        // Table I, sea level: rho0 = 1.2250 kg/m^3; kinematic viscosity 1.4607E-05 m^2/s (recalled from memory).
        assertTabulated("1.2250", StandardAtmosphere.RHO0, "rho0");
        AtmosphereState air = StandardAtmosphere.at(0.0);
        assertTabulated("1.4607E-05", air.kinematicViscosity(), "kinematic viscosity");
        assertEquals(1.0, air.densityRatio(), 1e-15);
    }

    @ParameterizedTest
    @ValueSource(doubles = {-2000.0, 0.0, 3000.0, 11000.0, 30000.0, 47000.0})
    void kinematicViscosityIsDynamicOverDensity(double geopotential) {
        AtmosphereState air = StandardAtmosphere.at(geopotential, 7.0);
        assertEquals(air.dynamicViscosity() / air.density(), air.kinematicViscosity(), 0.0);
        assertEquals(air.density() / StandardAtmosphere.RHO0, air.densityRatio(), 0.0);
    }

    @ParameterizedTest
    @ValueSource(doubles = {11000.0, 20000.0, 32000.0})
    void pressureAndTemperatureAreContinuousAcrossLayerBases(double base) {
        AtmosphereState below = StandardAtmosphere.at(Math.nextDown(base));
        AtmosphereState above = StandardAtmosphere.at(Math.nextUp(base));
        assertEquals(below.pressure(), above.pressure(), 1e-12 * below.pressure());
        assertEquals(below.temperature(), above.temperature(), 1e-9);
    }

    @Test
    void hotDayAtSeaLevelKeepsPressureAndLowersDensityByTheTemperatureRatio() {
        AtmosphereState standard = StandardAtmosphere.at(0.0);
        AtmosphereState hot = StandardAtmosphere.at(0.0, 15.0);
        assertEquals(101325.0, hot.pressure(), 0.0);
        assertEquals(303.15, hot.temperature(), 1e-12);
        assertEquals(standard.density() * 288.15 / 303.15, hot.density(), 1e-15);
        assertEquals(288.15 / 303.15, hot.densityRatio(), 1e-15);
    }

    @Test
    void offsetAtAltitudeKeepsStandardPressureAndUsesTheOffsetTemperatureThroughout() {
        AtmosphereState standard = StandardAtmosphere.at(3000.0);
        AtmosphereState cold = StandardAtmosphere.at(3000.0, -20.0);
        double temperature = 248.65;
        assertEquals(standard.pressure(), cold.pressure(), 0.0);
        assertEquals(temperature, cold.temperature(), 1e-12);
        assertEquals(standard.pressure() / (StandardAtmosphere.GAS_CONSTANT * temperature), cold.density(), 1e-15);
        assertEquals(Math.sqrt(1.4 * StandardAtmosphere.GAS_CONSTANT * temperature), cold.speedOfSound(), 1e-12);
        assertEquals(1.458e-6 * Math.pow(temperature, 1.5) / (temperature + 110.4), cold.dynamicViscosity(), 1e-20);
    }

    @Test
    void specificGasConstantIsUniversalOverMolarMass() {
        // 8314.32 J/(kmol K) / 28.9644 kg/kmol = 287.0531 J/(kg K).
        assertEquals(287.0531, StandardAtmosphere.GAS_CONSTANT, 5e-5);
    }

    @Test
    void tabulatedGeopotentialAltitudesFollowFromGeometricOnes() {
        // Table I lists H = 10981 m beside Z = 11000 m and H = 19937 m beside Z = 20000 m (to 1 m).
        assertEquals(10981.0, StandardAtmosphere.geopotentialFromGeometric(11000.0), 1.0);
        assertEquals(19937.0, StandardAtmosphere.geopotentialFromGeometric(20000.0), 1.0);
    }

    @ParameterizedTest
    @ValueSource(doubles = {-2000.0, 0.0, 1234.5, 11000.0, 47000.0})
    void geometricAndGeopotentialConversionsAreInverse(double geopotential) {
        double geometric = StandardAtmosphere.geometricFromGeopotential(geopotential);
        assertTrue(geometric >= geopotential, "Z - H = H^2 / (r0 - H) is never negative");
        assertEquals(geopotential, StandardAtmosphere.geopotentialFromGeometric(geometric), 1e-9);
    }

    @ParameterizedTest
    @ValueSource(doubles = {-2000.0001, 47000.0001, -1e6, 1e6, Double.NaN, Double.POSITIVE_INFINITY})
    void altitudeOutsideTheModelIsRefusedWithTheValidRange(double altitude) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> StandardAtmosphere.at(altitude));
        assertTrue(e.getMessage().startsWith(
                "pressure altitude must be between -2000 m and 47000 m (geopotential), got "), e.getMessage());
        assertFalse(e.getMessage().contains("\n"));
    }

    @Test
    void rangeMessageQuotesTheAltitudeGiven() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> StandardAtmosphere.at(50000.0));
        assertEquals("pressure altitude must be between -2000 m and 47000 m (geopotential), got 50000 m",
                e.getMessage());
    }

    @ParameterizedTest
    @ValueSource(doubles = {-216.65, -300.0, Double.NaN, Double.NEGATIVE_INFINITY})
    void offsetLeavingNoPositiveTemperatureIsRefused(double offset) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> StandardAtmosphere.at(11000.0, offset));
        assertTrue(e.getMessage().startsWith("ISA offset must be finite and leave a positive temperature"
                + " (standard 216.65 K at 11000 m), got "), e.getMessage());
    }

    @ParameterizedTest
    @ValueSource(doubles = {-6356766.0, Double.NaN})
    void geometricAltitudeAtOrBelowTheEarthCentreIsRefused(double geometric) {
        assertThrows(IllegalArgumentException.class, () -> StandardAtmosphere.geopotentialFromGeometric(geometric));
    }

    @ParameterizedTest
    @ValueSource(doubles = {6356766.0, Double.POSITIVE_INFINITY})
    void geopotentialAltitudeAtOrBeyondTheEarthRadiusIsRefused(double geopotential) {
        assertThrows(IllegalArgumentException.class, () -> StandardAtmosphere.geometricFromGeopotential(geopotential));
    }

    @Test
    void stateRefusesNonPositiveDensity() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new AtmosphereState(0.0, 288.15, 101325.0, 0.0, 340.0, 1.8e-5, 1.5e-5, 1.0));
        assertEquals("density must be positive and finite, got 0.0", e.getMessage());
    }

    @Test
    void stateRefusesNonFiniteAltitude() {
        assertThrows(IllegalArgumentException.class,
                () -> new AtmosphereState(Double.NaN, 288.15, 101325.0, 1.2, 340.0, 1.8e-5, 1.5e-5, 1.0));
    }

    private static void assertTabulated(String printed, double actual, String what) {
        BigDecimal value = new BigDecimal(printed);
        assertEquals(value.doubleValue(), actual, value.ulp().doubleValue(), what + " against printed " + printed);
    }
}
