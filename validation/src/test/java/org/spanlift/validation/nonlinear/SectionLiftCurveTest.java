package org.spanlift.validation.nonlinear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The section lift curves. Sources: the straight line is thin-airfoil theory's cl = 2 pi (alpha - alpha0)
 * (H. Glauert, The Elements of Aerofoil and Airscrew Theory, 1926, chapter VII); the post-stall branch is
 * the lift equation of L. A. Viterna and R. D. Corrigan (NASA CP-2230, 1982), CL = (CD_max / 2) sin 2a +
 * K_L cos^2 a / sin a with K_L = (CL_s - CD_max sin a_s cos a_s) sin a_s / cos^2 a_s and CD_max = 1.11 +
 * 0.018 AR, AR = 50 for a section (quoted from memory; the paper could not be read through the search
 * tool). The parabolic cap and the blend into the post-stall branch are this project's construction; they
 * are checked for what they are meant to be: continuous, with a continuous slope, and peaking at cl_max.
 */
class SectionLiftCurveTest {

    private static final double DEG = Math.PI / 180.0;

    @Test
    void theStraightLineIsThinAirfoilTheoryAndNeverPeaksInsideItsDomain() {
        SectionLiftCurve line = SectionLiftCurve.linear(2.0 * Math.PI, -2.0 * DEG);
        assertEquals(2.0 * Math.PI * 7.0 * DEG, line.cl(5.0 * DEG), 1e-15);
        assertEquals(2.0 * Math.PI, line.slope(-40.0 * DEG), 0.0);
        assertFalse(line.isPastPeak(90.0 * DEG), "the line peaks at the end of its domain");
        assertThrows(IllegalArgumentException.class, () -> line.cl(91.0 * DEG));
    }

    @Test
    void viternaAndCorriganMaximumDragCoefficientForASection() {
        assertEquals(2.01, SectionLiftCurve.VITERNA_CD_MAX_2D, 1e-15);
    }

    @Test
    void theSyntheticCurvePeaksAtClMaxWhereTheStraightLineWouldPlusHalfTheCap() {
        double a0 = 6.0;
        double alpha0 = -2.0 * DEG;
        double clMax = 1.5;
        double cap = 4.0 * DEG;
        SectionLiftCurve c = SectionLiftCurve.synthetic(a0, alpha0, clMax, cap);
        double peak = alpha0 + clMax / a0 + cap / 2.0;
        assertEquals(peak, c.peakAngle(), 1e-15);
        assertEquals(clMax, c.clMax(), 0.0);
        assertEquals(clMax, c.cl(peak), 1e-15);
        // On the straight part below the cap.
        assertEquals(a0 * (5.0 * DEG - alpha0), c.cl(5.0 * DEG), 1e-14);
        // Below the peak cl stays under cl_max; above it, too; at 90 degrees Viterna's lift is zero.
        for (double deg = -10.0; deg <= 90.0; deg += 0.25) {
            assertTrue(c.cl(deg * DEG) <= clMax + 1e-15, "cl at " + deg + " deg");
            assertEquals(deg * DEG > peak, c.isPastPeak(deg * DEG));
        }
        assertEquals(0.0, c.cl(90.0 * DEG), 1e-12);
    }

    @Test
    void beyondTheBlendTheCurveIsViternaAndCorriganWithClMaxAtTheStall() {
        double a0 = 6.0;
        double alpha0 = -2.0 * DEG;
        double clMax = 1.5;
        double cap = 4.0 * DEG;
        SectionLiftCurve c = SectionLiftCurve.synthetic(a0, alpha0, clMax, cap);
        double as = c.peakAngle();
        double cdMax = 1.11 + 0.018 * 50.0;
        double kl = (clMax - cdMax * Math.sin(as) * Math.cos(as)) * Math.sin(as) / (Math.cos(as) * Math.cos(as));
        for (double deg : new double[] {30.0, 45.0, 60.0, 80.0}) {
            double a = deg * DEG;
            double expected = cdMax / 2.0 * Math.sin(2.0 * a) + kl * Math.cos(a) * Math.cos(a) / Math.sin(a);
            assertEquals(expected, c.cl(a), 1e-13, "cl at " + deg + " deg");
        }
    }

    /**
     * The curve and its slope are continuous at the joints (start of the cap, peak, end of the blend,
     * checked 1e-9 rad either side: cl may differ there by the slope times 2e-9, the slope by its
     * derivative, under 100 per radian squared, times 2e-9), and the slope is the derivative of cl (central
     * differences with a step of 1e-6 rad, whose truncation error here is below 1e-8 per radian).
     */
    @Test
    void theSyntheticCurveIsSmoothEnoughForNewtonsMethod() {
        double a0 = 6.0;
        double alpha0 = -2.0 * DEG;
        double clMax = 1.5;
        double cap = 4.0 * DEG;
        SectionLiftCurve c = SectionLiftCurve.synthetic(a0, alpha0, clMax, cap);
        double peak = c.peakAngle();
        double j = 1e-9;
        for (double joint : new double[] {peak - cap, peak, peak + cap}) {
            assertEquals(c.cl(joint - j), c.cl(joint + j), 2e-8, "cl continuous at " + joint / DEG + " deg");
            assertEquals(c.slope(joint - j), c.slope(joint + j), 1e-6, "slope continuous at " + joint / DEG + " deg");
        }
        double e = 1e-6;
        for (double deg = -5.0; deg < 89.0; deg += 0.37) {
            double a = deg * DEG;
            double fd = (c.cl(a + e) - c.cl(a - e)) / (2.0 * e);
            assertEquals(fd, c.slope(a), 1e-6, "slope at " + deg + " deg");
        }
        assertEquals(0.0, c.slope(peak - 1e-9), 1e-6, "zero slope at the peak");
        assertTrue(c.slope(peak + 6.0 * DEG) < 0.0, "falling past the peak");
    }

    @Test
    void aTableIsJoinedByStraightLinesAndPeaksAtItsLargestPoint() {
        SectionLiftCurve t = SectionLiftCurve.tableDegrees(
                new double[] {-10.0, 0.0, 10.0, 14.0, 18.0}, new double[] {-0.9, 0.2, 1.2, 1.4, 1.0});
        assertEquals(0.7, t.cl(5.0 * DEG), 1e-12);
        assertEquals(1.3, t.cl(12.0 * DEG), 1e-12);
        assertEquals(1.0 / (10.0 * DEG), t.slope(5.0 * DEG), 1e-9);
        assertEquals(-0.4 / (4.0 * DEG), t.slope(16.0 * DEG), 1e-9);
        assertEquals(-0.4 / (4.0 * DEG), t.slope(18.0 * DEG), 1e-9, "the last point takes its segment's slope");
        assertEquals(1.4, t.clMax(), 0.0);
        assertEquals(14.0 * DEG, t.peakAngle(), 1e-15);
        assertTrue(t.isPastPeak(14.5 * DEG));
        assertThrows(IllegalArgumentException.class, () -> t.cl(18.5 * DEG), "no extrapolation");
        assertFalse(t.covers(-10.5 * DEG));
    }

    @Test
    void badInputIsRefused() {
        assertThrows(IllegalArgumentException.class,
                () -> SectionLiftCurve.tableDegrees(new double[] {0.0, 0.0}, new double[] {0.0, 1.0}));
        assertThrows(IllegalArgumentException.class,
                () -> SectionLiftCurve.tableDegrees(new double[] {0.0, 10.0}, new double[] {0.0}));
        assertThrows(IllegalArgumentException.class,
                () -> SectionLiftCurve.tableDegrees(new double[] {0.0, 100.0}, new double[] {0.0, 1.0}));
        assertThrows(IllegalArgumentException.class,
                () -> SectionLiftCurve.tableDegrees(new double[] {0.0, 10.0}, new double[] {0.0, Double.NaN}));
        assertThrows(IllegalArgumentException.class, () -> SectionLiftCurve.linear(0.0, 0.0));
        assertThrows(IllegalArgumentException.class, () -> SectionLiftCurve.synthetic(6.0, 0.0, -1.0, 0.0));
        assertThrows(IllegalArgumentException.class, () -> SectionLiftCurve.synthetic(6.0, 0.0, 1.5, 1.0),
                "a cap wider than 2 cl_max / a0 would start below zero lift");
        assertThrows(IllegalArgumentException.class, () -> SectionLiftCurve.synthetic(6.0, -20.0 * DEG, 0.5, 0.0),
                "the post-stall equation needs a positive stall angle");
    }
}
