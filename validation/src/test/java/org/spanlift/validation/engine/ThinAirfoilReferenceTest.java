package org.spanlift.validation.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The thin-airfoil reference values the engine checks use, checked against their closed forms. */
class ThinAirfoilReferenceTest {

    @Test
    void naca2412ZeroLiftAngleByQuadratureMatchesClosedForm() {
        // Closed form derived in ThinAirfoil; Simpson on smooth pieces is good to ~1e-13 rad.
        double quadrature = ThinAirfoil.naca4ZeroLiftAngle(0.02, 0.4);
        assertEquals(ThinAirfoil.naca4ZeroLiftAngleClosedForm(0.02, 0.4), quadrature, 1e-10);
        // Anderson, Fundamentals of Aerodynamics, thin-airfoil worked example for the NACA 2412:
        // -2.077 degrees (recalled from memory); printed to 3 decimals, so half a unit of the last digit.
        assertEquals(-2.077, Math.toDegrees(quadrature), 0.0005);
    }

    @Test
    void quarterChordFlapEffectiveness() {
        // Glauert (ARC R&M 1095, 1927): tau = 0.609 for a 25% chord plain flap (theta_h = 120 deg).
        double closed = ThinAirfoil.flapEffectiveness(0.25);
        assertEquals(closed, ThinAirfoil.flapEffectivenessByQuadrature(0.25), 1e-10);
        assertEquals(1 - (2 * Math.PI / 3 - Math.sqrt(3) / 2) / Math.PI, closed, 1e-15);
        assertEquals(0.609, closed, 0.0005);
    }
}
