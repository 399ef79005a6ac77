package org.spanlift.structure;

/**
 * One symmetric flight load case: the aircraft's weight and load factor at an equivalent airspeed. The
 * wing carries all the lift, n W, so its CL = n W / (q S) with q = rho0 Ve^2 / 2.
 *
 * @param name            a label for the outputs
 * @param weight          aircraft weight, N (positive)
 * @param loadFactor      load factor n, lift over weight along the lift direction (negative for
 *                        push-overs and down gusts)
 * @param equivalentSpeed equivalent airspeed, m/s (positive)
 * @param altitude        pressure altitude, m (standard atmosphere); the loads at a given equivalent
 *                        airspeed do not depend on it, an envelope's gust load factors do
 * @param origin          where the case comes from: "given", or the envelope point it stands for
 */
public record LoadCase(String name, double weight, double loadFactor, double equivalentSpeed, double altitude,
        String origin) {

    /** Sea-level standard density rho0, kg/m^3. */
    public static final double RHO0 = org.spanlift.atmosphere.StandardAtmosphere.RHO0;

    public LoadCase {
        if (!(weight > 0) || !Double.isFinite(weight)) {
            throw new IllegalArgumentException("a load case needs a positive weight");
        }
        if (!Double.isFinite(loadFactor)) {
            throw new IllegalArgumentException("a load case needs a finite load factor");
        }
        if (!(equivalentSpeed > 0) || !Double.isFinite(equivalentSpeed)) {
            throw new IllegalArgumentException("a load case needs a positive speed");
        }
    }

    /** Dynamic pressure rho0 Ve^2 / 2, Pa. */
    public double dynamicPressure() {
        return 0.5 * RHO0 * equivalentSpeed * equivalentSpeed;
    }

    /** The wing lift coefficient that carries n W on the reference area {@code area}. */
    /** rho V / mu at the case's true speed and pressure altitude (standard day), 1/m, for the section data. */
    public double reynoldsPerMetre() {
        org.spanlift.atmosphere.AtmosphereState air = org.spanlift.atmosphere.StandardAtmosphere.at(altitude, 0);
        return org.spanlift.atmosphere.Airspeed.trueFromEquivalent(equivalentSpeed, air) / air.kinematicViscosity();
    }

    /** n W / (q S): the normal-force coefficient the case needs on reference area {@code area}, m^2. */
    public double liftCoefficient(double area) {
        return loadFactor * weight / (dynamicPressure() * area);
    }
}
