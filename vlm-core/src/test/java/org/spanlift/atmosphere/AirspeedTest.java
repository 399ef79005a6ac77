package org.spanlift.atmosphere;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class AirspeedTest {

    @Test
    void trueAndEquivalentAirspeedAreEqualInStandardSeaLevelAir() {
        AtmosphereState air = StandardAtmosphere.at(0.0);
        assertEquals(40.0, Airspeed.trueFromEquivalent(40.0, air), 1e-13);
        assertEquals(40.0, Airspeed.equivalentFromTrue(40.0, air), 1e-13);
    }

    @Test
    void trueAirspeedIsEquivalentOverRootSigma() {
        AtmosphereState air = StandardAtmosphere.at(3000.0, 10.0);
        double sigma = air.densityRatio();
        assertEquals(40.0 / Math.sqrt(sigma), Airspeed.trueFromEquivalent(40.0, air), 0.0);
        assertEquals(40.0 * Math.sqrt(sigma), Airspeed.equivalentFromTrue(40.0, air), 0.0);
    }

    @Test
    void trueAirspeedExceedsEquivalentAloftByRootOfTheTabulatedDensityRatio() {
        // U.S. Standard Atmosphere 1976, Table I, Z = 5000 m: rho = 7.3643E-01 against 1.2250E+00 at sea level
        // (recalled from memory); 5 significant figures on each density, so 1e-4 relative on the speed.
        AtmosphereState air = StandardAtmosphere.at(StandardAtmosphere.geopotentialFromGeometric(5000.0));
        double expected = 50.0 * Math.sqrt(1.2250 / 0.73643);
        assertEquals(expected, Airspeed.trueFromEquivalent(50.0, air), expected * 1e-4);
    }

    @Test
    void conversionsAreInverse() {
        AtmosphereState air = StandardAtmosphere.at(9000.0, -5.0);
        assertEquals(61.7, Airspeed.equivalentFromTrue(Airspeed.trueFromEquivalent(61.7, air), air), 1e-12);
    }

    @Test
    void reynoldsNumberIsSpeedTimesLengthOverKinematicViscosity() {
        AtmosphereState air = StandardAtmosphere.at(0.0);
        // nu0 = 1.4607E-05 m^2/s, so 50 m/s on a 1.2 m chord gives 4.1076e6.
        assertEquals(4.1076e6, Airspeed.reynolds(50.0, 1.2, air), 1e2);
        assertEquals(50.0 * 1.2 / air.kinematicViscosity(), Airspeed.reynolds(50.0, 1.2, air), 0.0);
    }

    @Test
    void nonFiniteSpeedIsRefused() {
        AtmosphereState air = StandardAtmosphere.at(0.0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Airspeed.trueFromEquivalent(Double.NaN, air));
        assertEquals("equivalent airspeed must be finite, got NaN", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Airspeed.reynolds(50.0, Double.POSITIVE_INFINITY, air));
    }
}
