package org.spanlift.flight;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.spanlift.input.RefusedException;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Vec3;

class FlightConditionTest {

    private static final Reference WING = new Reference(12.0, 10.0, 1.2, new Vec3(0, 0, 0));

    /** Level flight: n W = (1/2) rho0 V_e^2 S CL (the definition of equivalent airspeed, common practice). */
    @Test
    void equivalentSpeedCarriesTheWeightAtThatLiftCoefficient() {
        FlightCondition fc = new FlightCondition(7000, 1, StandardAtmosphere.at(1500), OptionalDouble.empty());
        double ve = fc.equivalentSpeedFor(1.3, WING);
        assertEquals(7000, 0.5 * StandardAtmosphere.RHO0 * ve * ve * WING.area() * 1.3, 1e-9);
    }

    @Test
    void aStallOnsetBeforeTheWingLiftsHasNoSpeedAndSaysWhy() {
        FlightCondition fc = new FlightCondition(7000, 1, StandardAtmosphere.at(0), OptionalDouble.empty());
        RefusedException e = assertThrows(RefusedException.class,
                () -> fc.equivalentSpeedFor(-0.024, WING));
        assertTrue(e.getMessage().contains("a wing CL of -0.024"), e.getMessage());
        assertTrue(e.getMessage().contains("before the wing lifts"), e.getMessage());
    }
}
