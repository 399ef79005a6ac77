package org.spanlift.structure;

/**
 * One flight load case: the aircraft's weight and load factor at an equivalent airspeed. The wing carries
 * the whole normal force, n W, so its CN = n W / (q S) with q = rho0 Ve^2 / 2. A case may be unsymmetrical
 * (see {@link Asymmetry}): the two halves then carry different loads.
 *
 * @param name            a label for the outputs
 * @param weight          aircraft weight, N (positive)
 * @param loadFactor      load factor n: the aerodynamic force normal to the longitudinal axis over the
 *                        weight (negative for push-overs and down gusts)
 * @param equivalentSpeed equivalent airspeed, m/s (positive)
 * @param altitude        pressure altitude, m (standard atmosphere); the loads at a given equivalent
 *                        airspeed do not depend on it, an envelope's gust load factors do
 * @param origin          where the case comes from: "given", or the envelope point it stands for
 * @param asymmetry       how the halves differ, for an unsymmetrical (rolling) case
 */
public record LoadCase(String name, double weight, double loadFactor, double equivalentSpeed, double altitude,
        String origin, java.util.Optional<Asymmetry> asymmetry) {

    /**
     * How the halves of an unsymmetrical case differ, as the user gives it (the fractions and deflections the
     * applicable standard asks for; none is assumed).
     *
     * @param aileron   the right aileron's deflection, rad, trailing edge down (the left one deflects the other
     *                  way), at the case's load factor
     * @param otherSide the left half's share of the right half's air load (0 to 1), the inertia unchanged
     */
    public record Asymmetry(java.util.OptionalDouble aileron, java.util.OptionalDouble otherSide) {

        /** Checks that exactly one of the two is given, and a share lies from 0 to 1. */
        public Asymmetry {
            if (aileron.isPresent() == otherSide.isPresent()) {
                throw new IllegalArgumentException("an unsymmetrical case has either an aileron deflection or a share");
            }
            if (otherSide.isPresent() && !(otherSide.getAsDouble() >= 0 && otherSide.getAsDouble() <= 1)) {
                throw new IllegalArgumentException("the other side's share must be from 0 to 1");
            }
        }
    }

    /** A symmetric case. */
    public LoadCase(String name, double weight, double loadFactor, double equivalentSpeed, double altitude,
            String origin) {
        this(name, weight, loadFactor, equivalentSpeed, altitude, origin, java.util.Optional.empty());
    }

    /** Sea-level standard density rho0, kg/m^3. */
    public static final double RHO0 = org.spanlift.atmosphere.StandardAtmosphere.RHO0;

    /** Checks that the weight and speed are positive and finite and the load factor finite. */
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
