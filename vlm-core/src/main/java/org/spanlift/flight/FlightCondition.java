package org.spanlift.flight;

import org.spanlift.input.RefusedException;
import java.util.Locale;
import java.util.OptionalDouble;

import org.spanlift.atmosphere.Airspeed;
import org.spanlift.atmosphere.AtmosphereState;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.geometry.Reference;

/**
 * A steady flight condition: weight (N), load factor, the atmosphere at a pressure altitude, and
 * optionally the equivalent airspeed (m/s). At these speeds equivalent airspeed equals the calibrated
 * airspeed an indicator shows.
 *
 * @param weight          weight, N
 * @param loadFactor      load factor n, positive
 * @param atmosphere      the atmosphere at the pressure altitude
 * @param equivalentSpeed equivalent airspeed, m/s, if given
 */
public record FlightCondition(double weight, double loadFactor, AtmosphereState atmosphere,
        OptionalDouble equivalentSpeed) {

    /** Checks that the weight and load factor are positive and finite. */
    public FlightCondition {
        if (!(weight > 0) || !Double.isFinite(weight)) {
            throw new IllegalArgumentException("the weight must be positive");
        }
        if (!(loadFactor > 0) || !Double.isFinite(loadFactor)) {
            throw new IllegalArgumentException("the load factor must be positive for a lift-limited condition");
        }
    }

    /** Sea-level standard density, kg/m^3 (U.S. Standard Atmosphere 1976). */
    public static double seaLevelDensity() {
        return StandardAtmosphere.RHO0;
    }

    /** The lift the wing must carry, n W, in newtons. */
    public double liftForce() {
        return loadFactor * weight;
    }

    /** The true airspeed in the atmosphere, m/s, when an equivalent airspeed is given. */
    public OptionalDouble trueSpeed() {
        return equivalentSpeed.isPresent()
                ? OptionalDouble.of(Airspeed.trueFromEquivalent(equivalentSpeed.getAsDouble(), atmosphere))
                : OptionalDouble.empty();
    }

    /** Dynamic pressure 0.5 rho0 Ve^2, Pa; needs the speed. */
    public double dynamicPressure() {
        double ve = equivalentSpeed.orElseThrow(() -> new IllegalStateException("no speed given"));
        return 0.5 * seaLevelDensity() * ve * ve;
    }

    /** The CL that carries n W at the given speed. */
    public double requiredLiftCoefficient(Reference reference) {
        return liftForce() / (dynamicPressure() * reference.area());
    }

    /** The equivalent airspeed (m/s) at which the wing carries n W at lift coefficient cl. */
    public double equivalentSpeedFor(double cl, Reference reference) {
        if (!(cl > 0)) {
            throw new RefusedException(String.format(Locale.ROOT, "no speed carries the weight at a wing CL "
                    + "of %.3f; a station reaches its cl_max before the wing lifts (check the twist and the "
                    + "deflections)", cl));
        }
        return Math.sqrt(2 * liftForce() / (seaLevelDensity() * reference.area() * cl));
    }
}
