package org.spanlift.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

class ThinAirfoilTest {

    private static double deg(double rad) {
        return Math.toDegrees(rad);
    }

    @Test
    void naca2412MatchesTheTextbookThinAirfoilValues() {
        // Thin-airfoil theory for the NACA 2412: alpha_L0 = -2.08 deg and cm_c/4 = -0.053, recalled from memory
        // (the worked example in Anderson, Fundamentals of Aerodynamics). Quoted to the digits given.
        CamberLine line = CamberLines.parse("NACA 2412");
        assertEquals(-2.08, deg(ThinAirfoil.zeroLiftAngle(line)), 0.005);
        assertEquals(-0.053, ThinAirfoil.quarterChordMoment(line), 0.0005);
    }

    @Test
    void quadratureAgreesWithTheClosedFormForFourDigitLines() {
        // Closed form derived in ThinAirfoil.zeroLiftAngleClosedForm; required agreement 1e-9 rad.
        for (String spec : new String[] {"NACA 2412", "NACA 4412", "NACA 4415", "NACA 6409", "NACA 1408",
                "NACA 2312", "NACA 9112", "NACA 5912", "NACA 2212", "NACA 0012"}) {
            NacaFourDigit line = (NacaFourDigit) CamberLines.parse(spec);
            assertEquals(ThinAirfoil.zeroLiftAngleClosedForm(line), ThinAirfoil.zeroLiftAngle(line), 1e-9, spec);
        }
    }

    @Test
    void closedFormOfTheNaca2412() {
        // Evaluated by hand from the closed form (theta_p = acos 0.2): alpha_L0 = -0.0362550 rad = -2.07724 deg.
        NacaFourDigit line = (NacaFourDigit) CamberLines.parse("NACA 2412");
        assertEquals(-2.07724, deg(ThinAirfoil.zeroLiftAngleClosedForm(line)), 1e-5);
    }

    @Test
    void parabolicArcHasTheExactClassicalResults() {
        // NACA M5xx: p = 0.5 makes z = 4 m x (1 - x), slope = 4 m cos(theta). Then (derived, Glauert's series):
        // A1 = 4m, all other A_n = 0, alpha_i = 0, alpha_L0 = -2m, cm_c/4 = -pi m, cl_i = 4 pi m.
        for (int digit = 1; digit <= 9; digit++) {
            CamberLine line = new NacaFourDigit(digit, 5, 12);
            double m = digit / 100.0;
            ThinAirfoil.Result r = ThinAirfoil.analyse(line);
            assertEquals(-2 * m, r.zeroLiftAngle(), 1e-13);
            assertEquals(-Math.PI * m, r.quarterChordMoment(), 1e-13);
            assertEquals(0.0, r.idealAngle().getAsDouble(), 1e-13);
            assertEquals(4 * Math.PI * m, r.idealLiftCoefficient().getAsDouble(), 1e-13);
        }
    }

    @Test
    void flatPlateHasNoCamberEffects() {
        ThinAirfoil.Result r = ThinAirfoil.analyse(FlatPlate.INSTANCE);
        assertEquals(0.0, r.zeroLiftAngle(), 0.0);
        assertEquals(0.0, r.quarterChordMoment(), 0.0);
        assertEquals(0.0, r.idealLiftCoefficient().getAsDouble(), 0.0);
    }

    @Test
    void line230HasTheDesignLiftCoefficientOfItsDesignation() {
        // Abbott and von Doenhoff (1959), section 6.4: k1 of the 230 line chosen for a design (ideal) lift
        // coefficient of 0.3. The table gives r and k1 to 4-5 figures, so cl_i agrees to a few 1e-4;
        // measured 0.30004.
        CamberLine line = CamberLines.parse("NACA 23012");
        assertEquals(0.3, ThinAirfoil.idealLiftCoefficient(line).getAsDouble(), 3e-4);
        assertEquals(0.3, ThinAirfoil.idealLiftCoefficient(CamberLines.parse("NACA 24012")).getAsDouble(), 3e-4);
        assertEquals(0.3, ThinAirfoil.idealLiftCoefficient(CamberLines.parse("NACA 25012")).getAsDouble(), 3e-4);
    }

    @Test
    void forwardLines210And220DepartFromTheNominalDesignLift() {
        // Measured here, not published: with the tabulated constants of Abbott and von Doenhoff section 6.4 the
        // ideal lift coefficient of the 210 line is 0.30840 and of the 220 line 0.30188 (not 0.3). The same
        // values came from an independent adaptive quadrature (scipy.integrate.quad, split at r) run while
        // developing. Pinned to 1e-5 so a change of constants or quadrature shows.
        assertEquals(0.30840, ThinAirfoil.idealLiftCoefficient(CamberLines.parse("NACA 21012")).getAsDouble(), 1e-5);
        assertEquals(0.30188, ThinAirfoil.idealLiftCoefficient(CamberLines.parse("NACA 22012")).getAsDouble(), 1e-5);
    }

    @Test
    void line230ZeroLiftAngleAndMoment() {
        // Derived, not published: thin-airfoil integrals of the tabulated 230 line (Abbott and von Doenhoff section
        // 6.4 constants), evaluated independently with scipy.integrate.quad split at r (tolerance 1e-14) while
        // developing: alpha_L0 = -1.0935866686 deg, cm_c/4 = -0.0128356645, alpha_i = 1.6424710 deg. The brief's
        // expectation "around -1.1 deg" agrees. Agreement required: 1e-9 rad, 1e-9 in cm.
        CamberLine line = CamberLines.parse("NACA 23012");
        ThinAirfoil.Result r = ThinAirfoil.analyse(line);
        assertEquals(Math.toRadians(-1.0935866685928144), r.zeroLiftAngle(), 1e-9);
        assertEquals(-0.012835664520068863, r.quarterChordMoment(), 1e-9);
        assertEquals(Math.toRadians(1.6424710418714576), r.idealAngle().getAsDouble(), 1e-9);
        // Consistency of thin-airfoil theory: cl = 2 pi (alpha_i - alpha_L0) at the ideal angle.
        assertEquals(r.idealLiftCoefficient().getAsDouble(),
                2 * Math.PI * (r.idealAngle().getAsDouble() - r.zeroLiftAngle()), 1e-12);
    }

    @Test
    void otherFamilyMembersAgainstAnIndependentQuadrature() {
        // Derived with scipy.integrate.quad as above (degrees): 210 -0.6256943268, 220 -0.8822964065,
        // 240 -1.2916119940, 250 -1.4828065936.
        String[] specs = {"NACA 21012", "NACA 22012", "NACA 24012", "NACA 25012"};
        double[] expected = {-0.6256943267539447, -0.8822964064987134, -1.2916119940130097, -1.482806593586618};
        for (int i = 0; i < specs.length; i++) {
            assertEquals(Math.toRadians(expected[i]), ThinAirfoil.zeroLiftAngle(CamberLines.parse(specs[i])), 1e-9,
                    specs[i]);
        }
    }

    @Test
    void idealQuantitiesAreAbsentWhereTheSlopeIsUnboundedAtTheNose() {
        CamberLine unbounded = new CamberLine() {
            @Override
            public double z(double x) {
                return 0.01 * Math.sqrt(x) * (1 - x);
            }

            @Override
            public double slope(double x) {
                return 0.01 * (0.5 / Math.sqrt(x) - 1.5 * Math.sqrt(x));
            }

            @Override
            public String designation() {
                return "test";
            }

            @Override
            public boolean slopeBoundedAtLeadingEdge() {
                return false;
            }
        };
        assertFalse(ThinAirfoil.idealAngle(unbounded).isPresent());
        assertFalse(ThinAirfoil.idealLiftCoefficient(unbounded).isPresent());
    }
}
