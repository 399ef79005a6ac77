package org.spanlift.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class NacaMeanLinesTest {

    private static double centralDifference(CamberLine line, double x) {
        double h = 1e-6;
        return (line.z(x + h) - line.z(x - h)) / (2 * h);
    }

    @Test
    void fourDigitLineHasItsMaximumCamberAtItsStatedPosition() {
        // NACA Report 460 (Jacobs, Ward and Pinkerton 1933): first digit = max camber in per cent, second = its
        // position in tenths; the equations give z(p) = m, dz/dx(p) = 0, z(0) = z(1) = 0.
        NacaFourDigit line = new NacaFourDigit(2, 4, 12);
        assertEquals(0.02, line.z(0.4), 1e-15);
        assertEquals(0.0, line.slope(0.4), 1e-15);
        assertEquals(0.0, line.z(0.0), 1e-15);
        assertEquals(0.0, line.z(1.0), 1e-15);
        assertEquals("NACA 2412", line.designation());
        assertEquals(0.12, line.thickness(), 1e-15);
    }

    @Test
    void fourDigitSlopeIsTheDerivativeOfTheOrdinate() {
        // Consistency of the two analytic expressions (derived): central difference error O(h^2) ~ 1e-12.
        for (String spec : new String[] {"NACA 2412", "NACA 4415", "NACA 6409", "NACA 1310", "NACA 9912"}) {
            CamberLine line = CamberLines.parse(spec);
            for (double x = 0.013; x < 0.99; x += 0.017) {
                assertEquals(centralDifference(line, x), line.slope(x), 1e-8, spec + " at x = " + x);
            }
        }
    }

    @Test
    void symmetricFourDigitSectionIsFlat() {
        // NACA 00xx: zero camber (Report 460), the same mean line as the flat plate.
        CamberLine line = CamberLines.parse("NACA 0012");
        for (double x = 0.0; x <= 1.0; x += 0.05) {
            assertEquals(0.0, line.z(x), 0.0);
            assertEquals(0.0, line.slope(x), 0.0);
        }
        assertEquals(0, line.breakpoints().length);
        assertEquals("NACA 0012", line.designation());
    }

    @Test
    void fiveDigitLinesHaveTheirMaximumCamberAtTheNominalPosition() {
        // Abbott and von Doenhoff (1959), section 6.4, table of mean-line constants: r chosen to put the maximum
        // camber at 0.05, 0.10, 0.15, 0.20, 0.25 chord. The maximum of the cubic is at r (1 - sqrt(r/3)) (derived);
        // with r tabulated to 3-4 figures the position agrees to 1e-3 chord.
        for (int digit = 1; digit <= 5; digit++) {
            NacaFiveDigit line = new NacaFiveDigit(digit, 12);
            double r = line.r();
            double xMax = r * (1.0 - Math.sqrt(r / 3.0));
            assertEquals(0.0, line.slope(xMax), 1e-12);
            assertEquals(digit / 20.0, xMax, 1e-3, line.designation());
            assertEquals(line.nominalMaxCamberPosition(), digit / 20.0, 0.0);
        }
    }

    @Test
    void fiveDigitLineIsSmoothAtTheJointAndClosesAtBothEnds() {
        // Report 537 equations: z(0) = z(1) = 0; slope and its derivative continuous at x = r (derived).
        for (int digit = 1; digit <= 5; digit++) {
            NacaFiveDigit line = new NacaFiveDigit(digit, 12);
            double r = line.r();
            assertEquals(0.0, line.z(0.0), 1e-15);
            assertEquals(0.0, line.z(1.0), 1e-15);
            assertEquals(line.slope(r - 1e-12), line.slope(r), 1e-9);
            assertEquals(line.z(r - 1e-12), line.z(r), 1e-10);
            for (double x = 0.003; x < 0.99; x += 0.011) {
                assertEquals(centralDifference(line, x), line.slope(x), 1e-7, line.designation() + " at x = " + x);
            }
        }
    }

    @Test
    void line230UsesTheTabulatedConstants() {
        // Abbott and von Doenhoff (1959), section 6.4, table of mean-line constants: 230 line r = 0.2025, k1 = 15.957.
        NacaFiveDigit line = (NacaFiveDigit) CamberLines.parse("NACA 23012");
        assertEquals(0.2025, line.r(), 0.0);
        assertEquals(15.957, line.k1(), 0.0);
        assertEquals(230, line.meanLineNumber());
        assertEquals("NACA 23012", line.designation());
        assertEquals(0.3, line.designLiftCoefficient(), 0.0);
        // Maximum camber of the 23012 about 1.84 per cent (derived from the constants: z at r(1 - sqrt(r/3))).
        double xMax = line.r() * (1.0 - Math.sqrt(line.r() / 3.0));
        assertTrue(Math.abs(line.z(xMax) - 0.01837) < 5e-5, "max camber " + line.z(xMax));
    }
}
