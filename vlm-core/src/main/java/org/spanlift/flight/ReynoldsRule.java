package org.spanlift.flight;

import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.atmosphere.Airspeed;
import org.spanlift.atmosphere.AtmosphereState;
import org.spanlift.geometry.Reference;

/**
 * The Reynolds number per metre of chord (rho V / mu at the true speed, 1/m) at which the section polars are
 * read for a point of wing lift coefficient CL: at the speed given, else at the level-flight speed of that CL
 * for the weight given (n W = q S CL), else 0, which reads every polar at its lowest Reynolds number.
 */
@FunctionalInterface
public interface ReynoldsRule {

    /** Reynolds number per metre of chord, 1/m, for a point of wing lift coefficient {@code cl}. */
    double perMetre(double cl);

    /** The rule of the flight condition and speed given (either may be absent). */
    static ReynoldsRule of(Reference reference, AtmosphereState atmosphere, OptionalDouble equivalentSpeed,
            Optional<FlightCondition> condition) {
        double nu = atmosphere.kinematicViscosity();
        if (equivalentSpeed.isPresent()) {
            double perMetre = Airspeed.trueFromEquivalent(equivalentSpeed.getAsDouble(), atmosphere) / nu;
            return cl -> perMetre;
        }
        if (condition.isPresent()) {
            FlightCondition fc = condition.get();
            return cl -> cl > 0 ? Airspeed.trueFromEquivalent(fc.equivalentSpeedFor(cl, reference), atmosphere) / nu
                    : 0;
        }
        return cl -> 0;
    }

    /** Every polar at its lowest Reynolds number. */
    static ReynoldsRule lowest() {
        return cl -> 0;
    }
}
