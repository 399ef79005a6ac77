package org.spanlift.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.spanlift.input.RefusedException;

/**
 * The tabulated K' and effectiveness ratio are recalled, not read (see {@link PlainFlap}); these tests pin
 * what has a reason of its own: Glauert's closed form, the handbook statement that a 25% plain flap at
 * 30 degrees delivers about half its thin-airfoil lift, the read cl_max value, the definitions, and the
 * physical ordering of the curves.
 */
class PlainFlapTest {

    private static final double[] CHORDS = {0.10, 0.12, 0.15, 0.2, 0.25, 0.3, 0.35, 0.4, 0.45, 0.5};

    private static double rad(double deg) {
        return Math.toRadians(deg);
    }

    /** A flat plate with its aft part E turned down by the (small) angle delta, slope -delta: linear theory. */
    private static CamberLine hingedPlate(double e, double delta) {
        double hinge = 1 - e;
        return new CamberLine() {
            @Override
            public double z(double x) {
                return x <= hinge ? 0 : -delta * (x - hinge);
            }

            @Override
            public double slope(double x) {
                return x <= hinge ? 0 : -delta;
            }

            @Override
            public String designation() {
                return "hinged plate";
            }

            @Override
            public double[] breakpoints() {
                return new double[] {hinge};
            }
        };
    }

    @Test
    void tauOfAQuarterChordFlapMatchesGlauertsClosedForm() {
        // E = 0.25: cos theta_h = -1/2, theta_h = 2 pi/3, tau = 1 - (2 pi/3 - sqrt(3)/2)/pi = 1/3 + sqrt(3)/(2 pi)
        // = 0.608998 (evaluated by hand).
        double expected = 1.0 / 3.0 + Math.sqrt(3) / (2 * Math.PI);
        assertEquals(expected, PlainFlap.of(0.25).thinAirfoilEffectiveness(), 1e-15);
        assertEquals(0.608998, expected, 1e-6);
        // Half chord: theta_h = pi/2, tau = 1/2 + 1/pi.
        assertEquals(0.5 + 1 / Math.PI, PlainFlap.of(0.5).thinAirfoilEffectiveness(), 1e-15);
        // The ends: no flap does nothing, an all-moving plate turns its zero-lift angle one for one.
        assertEquals(0.0, PlainFlap.glauertTau(0.0), 1e-15);
        assertEquals(1.0, PlainFlap.glauertTau(1.0), 1e-15);
    }

    @Test
    void tauAgreesWithTheThinAirfoilQuadratureOfAHingedPlate() {
        // Independent route: the zero-lift angle of the hinged plate's mean line by ThinAirfoil's quadrature.
        double delta = 1e-3;
        for (double e : CHORDS) {
            double alphaL0 = ThinAirfoil.zeroLiftAngle(hingedPlate(e, delta));
            assertEquals(PlainFlap.glauertTau(e), -alphaL0 / delta, 1e-9, "E = " + e);
        }
    }

    @Test
    void largeDeflectionFactorIsOneAtZeroDeflection() {
        for (double e : CHORDS) {
            assertEquals(1.0, PlainFlap.of(e).largeDeflectionFactor(0.0), 0.0, "E = " + e);
        }
    }

    @Test
    void largeDeflectionFactorNeverRisesWithDeflectionAndFallsClearlyByThirtyDegrees() {
        for (double e : CHORDS) {
            PlainFlap flap = PlainFlap.of(e);
            double previous = flap.largeDeflectionFactor(0.0);
            for (double deg = 0.5; deg <= 60.0; deg += 0.5) {
                double k = flap.largeDeflectionFactor(rad(deg));
                assertTrue(k <= previous + 1e-15, "E = " + e + " at " + deg + " deg");
                assertTrue(k > 0, "E = " + e + " at " + deg + " deg");
                previous = k;
            }
            // Separation from the flap: by 30 degrees every flap delivers well under its small-angle lift.
            assertTrue(flap.largeDeflectionFactor(rad(30)) < 0.85, "E = " + e);
        }
    }

    @Test
    void widerFlapsLoseEffectivenessSooner() {
        // The charts' ordering: at a given deflection K' is lower the wider the flap.
        for (double deg = 5; deg <= 60; deg += 5) {
            double previous = Double.POSITIVE_INFINITY;
            for (double e : CHORDS) {
                double k = PlainFlap.of(e).largeDeflectionFactor(rad(deg));
                assertTrue(k <= previous + 1e-15, "E = " + e + " at " + deg + " deg");
                previous = k;
            }
        }
    }

    @Test
    void quarterChordFlapAtThirtyDegreesDeliversAboutHalfItsThinAirfoilLift() {
        // Handbook values (USAF DATCOM 6.1.1.1, product of figures 6.1.1.1-39b and -40; Roskam, Airplane Design
        // Part VI; recalled, not read): for a 25% plain flap at 30 degrees the ratio times K' is near 0.5.
        PlainFlap flap = PlainFlap.of(0.25);
        assertEquals(0.5, flap.liftEffectiveness(rad(30)), 0.05);
        // The small-deflection ratio of a 25% flap lies between 0.8 and 0.9 (same sources, same caveat).
        assertTrue(flap.effectivenessRatio() >= 0.8 && flap.effectivenessRatio() <= 0.9);
    }

    @Test
    void zeroLiftShiftIsTauTimesTheDeliveredFractionAndNegativeForTrailingEdgeDown() {
        for (double e : CHORDS) {
            PlainFlap flap = PlainFlap.of(e);
            for (double deg : new double[] {1, 12.5, 30, 47, 60}) {
                double d = rad(deg);
                double shift = flap.zeroLiftShift(d);
                assertTrue(shift < 0, "E = " + e + " at " + deg + " deg");
                assertEquals(-flap.thinAirfoilEffectiveness() * flap.liftEffectiveness(d) * d, shift, 1e-15);
                // The section lift increment is the lift slope 2 pi times minus the shift.
                assertEquals(-2 * Math.PI * shift, flap.liftIncrement(d), 1e-12);
                // And never more than thin-airfoil theory gives.
                assertTrue(flap.liftIncrement(d) < 2 * Math.PI * flap.thinAirfoilEffectiveness() * d);
            }
            assertEquals(0.0, flap.zeroLiftShift(0.0), 0.0);
        }
    }

    @Test
    void smallDeflectionsKeepOnlyTheEffectivenessRatio() {
        // Where K' is still 1 (a narrow flap below 10 degrees), d alpha_L0/d delta = -tau * ratio exactly; for
        // wider flaps it tends there as the deflection goes to zero.
        PlainFlap narrow = PlainFlap.of(0.15);
        double d = rad(5);
        assertEquals(-narrow.thinAirfoilEffectiveness() * narrow.effectivenessRatio(), narrow.zeroLiftShift(d) / d,
                1e-15);
        PlainFlap wide = PlainFlap.of(0.4);
        double tiny = rad(1e-4);
        assertEquals(-wide.thinAirfoilEffectiveness() * wide.effectivenessRatio(), wide.zeroLiftShift(tiny) / tiny,
                1e-5);
    }

    @Test
    void effectivenessRatioRisesWithFlapChordAndCanBeGivenForTheSection() {
        double previous = 0;
        for (double e : CHORDS) {
            double r = PlainFlap.of(e).effectivenessRatio();
            assertTrue(r > previous && r < 1, "E = " + e);
            previous = r;
        }
        PlainFlap measured = PlainFlap.of(0.25, 0.95);
        assertEquals(0.95, measured.effectivenessRatio(), 0.0);
        assertTrue(measured.effectivenessRatioGiven());
        assertFalse(PlainFlap.of(0.25).effectivenessRatioGiven());
        assertEquals(0.95 * measured.largeDeflectionFactor(rad(20)), measured.liftEffectiveness(rad(20)), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> PlainFlap.of(0.25, 0.0));
        assertThrows(IllegalArgumentException.class, () -> PlainFlap.of(0.25, Double.NaN));
    }

    @Test
    void clMaxIncrementIsTheHandbookValueAtTheReferenceFlap() {
        // Read: delta cl_max = 0.9 for a plain flap (Arnedo, Fundamentals of Aerospace Engineering, table 3.1,
        // after Franchini et al.); taken at 60 degrees and 25% chord as StripLimits does.
        assertEquals(0.9, PlainFlap.of(0.25).clMaxIncrement(rad(60)), 1e-12);
        assertEquals(0.0, PlainFlap.of(0.25).clMaxIncrement(0.0), 0.0);
    }

    @Test
    void clMaxIncrementGrowsWithDeflectionAndStaysBelowTheLiftIncrement() {
        // A plain flap lowers the stall angle, so cl_max rises by less than the lift at a fixed angle.
        for (double e : CHORDS) {
            PlainFlap flap = PlainFlap.of(e);
            double previous = 0;
            for (double deg = 2; deg <= 60; deg += 2) {
                double inc = flap.clMaxIncrement(rad(deg));
                assertTrue(inc > previous, "E = " + e + " at " + deg + " deg");
                assertTrue(inc < flap.liftIncrement(rad(deg)), "E = " + e + " at " + deg + " deg");
                previous = inc;
            }
        }
        // A narrower flap gains less.
        assertTrue(PlainFlap.of(0.15).clMaxIncrement(rad(60)) < PlainFlap.of(0.25).clMaxIncrement(rad(60)));
    }

    @Test
    void interpolationInChordFractionLiesBetweenTheTabulatedRows() {
        double d = rad(35);
        double k = PlainFlap.of(0.35).largeDeflectionFactor(d);
        double k30 = PlainFlap.of(0.30).largeDeflectionFactor(d);
        double k40 = PlainFlap.of(0.40).largeDeflectionFactor(d);
        assertEquals(0.5 * (k30 + k40), k, 1e-15);
    }

    @Test
    void deflectionsOutsideTheDataAreRefusedNotClamped() {
        PlainFlap flap = PlainFlap.of(0.25);
        assertTrue(flap.covers(0.0));
        assertTrue(flap.covers(rad(60)));
        assertFalse(flap.covers(rad(61)));
        assertFalse(flap.covers(rad(-5)));
        assertThrows(RefusedException.class, () -> flap.largeDeflectionFactor(rad(61)));
        assertThrows(RefusedException.class, () -> flap.zeroLiftShift(rad(-5)));
        assertThrows(RefusedException.class, () -> flap.clMaxIncrement(rad(75)));
        assertThrows(IllegalArgumentException.class, () -> flap.liftEffectiveness(Double.NaN));
        RefusedException refusal = assertThrows(RefusedException.class, () -> flap.liftIncrement(rad(70)));
        assertTrue(refusal.getMessage().contains(PlainFlap.range()), refusal.getMessage());
    }

    @Test
    void chordFractionsOutsideTheDataAreRefused() {
        assertTrue(PlainFlap.coversChordFraction(0.10));
        assertTrue(PlainFlap.coversChordFraction(0.50));
        assertFalse(PlainFlap.coversChordFraction(0.05));
        assertFalse(PlainFlap.coversChordFraction(0.6));
        assertThrows(RefusedException.class, () -> PlainFlap.of(0.05));
        assertThrows(RefusedException.class, () -> PlainFlap.of(0.6));
        assertThrows(IllegalArgumentException.class, () -> PlainFlap.of(Double.NaN));
        // Glauert's tau itself holds for any chord fraction, below the tables too.
        double tau05 = PlainFlap.glauertTau(0.05);
        assertTrue(tau05 > 0 && tau05 < PlainFlap.glauertTau(0.10), "tau(0.05) = " + tau05);
        assertThrows(IllegalArgumentException.class, () -> PlainFlap.glauertTau(1.5));
    }

    @Test
    void sourceNamesTheHandbookAndSaysTheValuesAreRecalled() {
        String source = PlainFlap.source();
        assertTrue(source.contains("DATCOM 6.1.1.1"), source);
        assertTrue(source.contains("recalled"), source);
    }
}
