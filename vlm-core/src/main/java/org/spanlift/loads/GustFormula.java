package org.spanlift.loads;

import org.spanlift.atmosphere.StandardAtmosphere;

/**
 * The gust load factor of the airworthiness standards for light aeroplanes: Pratt's formula with its gust
 * alleviation factor, as published in 14 CFR Part 23, section 23.341(c) (the pre-2017 text, amendment
 * 23-48 of 1996) and in EASA CS-23.341:
 *
 * <pre>
 * n   = 1 +/- K_g rho0 U_de V a / (2 W/S)
 * K_g = 0.88 mu_g / (5.3 + mu_g)        (gust alleviation factor)
 * mu_g = 2 (W/S) / (rho c a g)          (aeroplane mass ratio)
 * </pre>
 *
 * with U_de the derived gust velocity and V the equivalent airspeed, rho0 the sea-level density, rho the
 * density at the altitude considered, c the mean geometric chord, a the lift-curve slope per radian (the
 * wing's, when the gust load is applied to the wing alone) and W/S the wing loading. Part 23 prints it in
 * English units as n = 1 + K_g U_de V a / (498 (W/S)) with V in knots, U_de in ft/s and W/S in lb/ft^2;
 * here it is evaluated in SI. The formula follows K. G. Pratt, "A revised formula for the calculation of
 * gust loads", NACA TN 2964, 1953.
 */
public final class GustFormula {

    private GustFormula() {
    }

    /**
     * The gust load of one speed and gust velocity.
     *
     * @param massRatio   mu_g
     * @param alleviation K_g
     * @param increment   K_g rho0 U_de V a / (2 W/S): the load factor is 1 plus (up gust) or minus (down
     *                    gust) this
     */
    public record GustLoad(double massRatio, double alleviation, double increment) {
    }

    /**
     * @param wingLoading     W/S, N/m^2
     * @param meanChord       mean geometric chord S/b, m
     * @param liftSlope       lift-curve slope a, per radian
     * @param density         air density at the altitude considered, kg/m^3
     * @param gustVelocity    derived gust velocity U_de (equivalent), m/s
     * @param equivalentSpeed equivalent airspeed V, m/s
     */
    public static GustLoad of(double wingLoading, double meanChord, double liftSlope, double density,
            double gustVelocity, double equivalentSpeed) {
        if (!(wingLoading > 0) || !(meanChord > 0) || !(liftSlope > 0) || !(density > 0) || !(gustVelocity >= 0)
                || !(equivalentSpeed > 0)) {
            throw new IllegalArgumentException("the gust formula needs positive wing loading, chord, lift slope, "
                    + "density and speed");
        }
        double mu = 2 * wingLoading / (density * meanChord * liftSlope * StandardAtmosphere.G0);
        double kg = 0.88 * mu / (5.3 + mu);
        double dn = kg * StandardAtmosphere.RHO0 * gustVelocity * equivalentSpeed * liftSlope / (2 * wingLoading);
        return new GustLoad(mu, kg, dn);
    }
}
