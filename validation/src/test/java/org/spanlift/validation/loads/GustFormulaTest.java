package org.spanlift.validation.loads;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.loads.GustFormula;

/**
 * The gust load factor of 14 CFR Part 23, section 23.341(c) (pre-2017 text, amendment 23-48, 1996), also
 * CS-23.341: n = 1 + K_g rho0 U_de V a / (2 W/S), K_g = 0.88 mu_g / (5.3 + mu_g),
 * mu_g = 2 (W/S) / (rho c a g); after K. G. Pratt, NACA TN 2964 (1953).
 *
 * <p>No published worked example with all its inputs was found in the sources searched, so the example
 * below was computed by hand (with a calculator) from the formula; the second check evaluates the formula
 * in the English-unit form printed in 23.341(c), which is an independent check of the SI unit handling.
 */
class GustFormulaTest {

    /*
     * Hand computation (invented aeroplane): W = 1100 kg x 9.80665 m/s^2 = 10787.31 N, S = 14.0 m^2,
     * W/S = 770.5225 N/m^2; mean geometric chord c = 1.4 m; wing lift slope a = 5.0 per rad; sea level,
     * rho = rho0 = 1.225 kg/m^3; U_de = 15.24 m/s (50 ft/s); V = 60 m/s EAS.
     *   mu_g = 2 x 770.5225 / (1.225 x 1.4 x 5.0 x 9.80665) = 1541.045 / 84.0920 = 18.3257
     *   K_g  = 0.88 x 18.3257 / (5.3 + 18.3257) = 16.1266 / 23.6257 = 0.68259
     *   dn   = 0.68259 x 1.225 x 15.24 x 60 x 5.0 / (2 x 770.5225) = 3823.0 / 1541.045 = 2.4808
     *   n    = 1 + 2.4808 = 3.4808 (up gust), 1 - 2.4808 = -1.4808 (down gust)
     * Tolerances: the hand values are rounded to 5 significant figures, so 1e-4 relative.
     */
    @Test
    void handWorkedExampleAtSeaLevel() {
        double w = 1100 * StandardAtmosphere.G0;
        GustFormula.GustLoad g = GustFormula.of(w / 14.0, 1.4, 5.0, StandardAtmosphere.RHO0, 15.24, 60.0);
        assertEquals(18.3257, g.massRatio(), 1e-4 * 18.3257, "mu_g");
        assertEquals(0.68259, g.alleviation(), 1e-4 * 0.68259, "K_g");
        assertEquals(2.4808, g.increment(), 1e-4 * 2.4808, "dn");
    }

    /**
     * 23.341(c) prints n = 1 + K_g U_de V a / (498 (W/S)) with U_de in ft/s, V in knots EAS, W/S in lb/ft^2,
     * and mu_g = 2 (W/S) / (rho c a g) in slug/ft^3, ft and ft/s^2. The constant 498 is 2 / (rho0 x 1.6878
     * ft/s per knot) rounded (the exact value is 498.54), so the two forms agree to 0.11%; the tolerance
     * on the increment is 0.15%, the mass ratio must agree to 1e-9 (exact conversion factors).
     */
    @Test
    void agreesWithThePublishedEnglishUnitForm() {
        double lbf = 4.4482216152605;
        double ft = 0.3048;
        double knot = 1852.0 / 3600.0;
        double slugPerCubicFoot = 14.59390293720636 / (ft * ft * ft);
        double[][] cases = {{1100, 14.0, 1.4, 5.0, 0, 15.24, 60.0}, {650, 10.5, 1.25, 4.6, 3000, 7.62, 75.0},
            {1600, 16.2, 1.5, 5.3, 6000, 15.24, 70.0}};
        for (double[] c : cases) {
            double w = c[0] * StandardAtmosphere.G0;
            double ws = w / c[1];
            double rho = StandardAtmosphere.at(c[4], 0).density();
            GustFormula.GustLoad si = GustFormula.of(ws, c[2], c[3], rho, c[5], c[6]);

            double wsE = ws * ft * ft / lbf;
            double muE = 2 * wsE / (rho / slugPerCubicFoot * (c[2] / ft) * c[3] * (StandardAtmosphere.G0 / ft));
            double kgE = 0.88 * muE / (5.3 + muE);
            double dnE = kgE * (c[5] / ft) * (c[6] / knot) * c[3] / (498 * wsE);
            assertEquals(muE, si.massRatio(), 1e-9 * muE, "mu_g");
            assertEquals(dnE, si.increment(), 1.5e-3 * dnE, "increment");
        }
    }
}
