package org.spanlift.stall;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Station;
import org.spanlift.geometry.StationPlanform;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.section.CamberLines;
import org.spanlift.section.Table;
import org.spanlift.solve.WingAnalysis;

/**
 * Facts of the trade (common practice, no single source): where untwisted rectangular and tapered wings
 * stall first, what washout and flaps do, and how stall speed scales with weight and altitude.
 */
class StallTrendsTest {

    private static final double SEMI_SPAN = 5.0;
    private static final double ROOT_CHORD = 1.5;
    private static final double CL_MAX = 1.4;

    /** A straight-tapered wing with an unswept quarter-chord line, constant cl_max, optional plain flap. */
    private static Wing wing(double taper, double washoutDeg, double flapDeg) {
        double tip = taper * ROOT_CHORD;
        Station root = new Station(0, ROOT_CHORD, 0, 0, 0, "s");
        Station end = new Station(SEMI_SPAN, tip, 0.25 * (ROOT_CHORD - tip), 0, -Math.toRadians(washoutDeg), "s");
        List<ControlSurface> controls = flapDeg == 0 ? List.of()
                : List.of(new ControlSurface("flap", ControlKind.FLAP, 0, 0.6 * SEMI_SPAN, 0.25,
                        Math.toRadians(flapDeg)));
        Surface s = new Surface("wing", true, new StationPlanform(List.of(root, end)), controls, LatticeSpec.DEFAULT);
        Section section = Section.of("s", CamberLines.parse("NACA 2412")).withClMax(Table.constant(CL_MAX));
        return new Wing("trend", LengthUnit.M, Wing.defaultReference(s), List.of(s), Map.of("s", section));
    }

    private static StallEstimate onset(Wing w) {
        WingAnalysis a = WingAnalysis.of(w);
        StripLimits limits = StripLimits.of(w, a.lattice(), a.fileDeflections(), OptionalDouble.empty());
        return StallAnalysis.estimate(a, a.fileDeflections(), limits, 0);
    }

    private static StallSpeed speed(Wing w, double weight, double altitude) {
        WingAnalysis a = WingAnalysis.of(w);
        StripLimits limits = StripLimits.of(w, a.lattice(), a.fileDeflections(), OptionalDouble.empty());
        FlightCondition fc = new FlightCondition(weight, 1, StandardAtmosphere.at(altitude), OptionalDouble.empty());
        return StallSpeed.of(a, a.fileDeflections(), limits, fc);
    }

    @Test
    void untwistedRectangularWingStallsFirstAtTheRoot() {
        assertTrue(onset(wing(1, 0, 0)).eta() < 0.1);
    }

    @Test
    void untwistedWingOfTaperPointFourStallsFirstWellOutboard() {
        assertTrue(onset(wing(0.4, 0, 0)).eta() > 0.5);
    }

    @Test
    void washoutMovesStallOnsetInboardMonotonically() {
        double previous = Double.POSITIVE_INFINITY;
        for (double washout = 0; washout <= 5; washout += 1) {
            double eta = onset(wing(0.4, washout, 0)).eta();
            assertTrue(eta <= previous, "washout " + washout + ": eta " + eta + " after " + previous);
            previous = eta;
        }
        assertTrue(previous < onset(wing(0.4, 0, 0)).eta() - 0.15, "5 degrees of washout moves the onset well inboard");
    }

    @Test
    void atOnsetTheCriticalStationIsExactlyAtItsClMaxAndNoStationAbove() {
        StallEstimate e = onset(wing(0.6, 2, 0));
        double worst = e.strips().stream().mapToDouble(s -> s.clAtOnset() - s.clMax()).max().orElseThrow();
        assertEquals(0, worst, 1e-12);
    }

    @Test
    void basicPlusAdditionalLoadReproducesTheSectionLiftAtSmallAngles() {
        // cl = cl_basic + CL cl_additional is exact to first order about zero lift.
        Wing w = wing(0.5, 3, 0);
        WingAnalysis a = WingAnalysis.of(w);
        StripLimits limits = StripLimits.of(w, a.lattice(), a.fileDeflections(), OptionalDouble.empty());
        StallEstimate e = StallAnalysis.estimate(a, a.fileDeflections(), limits, 0);
        double alpha = a.liftCurve(a.fileDeflections()).zeroLiftAngle() + 1e-4;
        var solution = a.solve(alpha);
        double cl = solution.coefficients().lift();
        var load = solution.spanLoad(0);
        for (int i = 0; i < load.size(); i++) {
            StallEstimate.StripStall s = e.strips().get(i);
            assertEquals(load.cl()[i], s.clBasic() + cl * s.clAdditional(), 1e-7);
        }
    }

    @Test
    void measuredLiftSlopeSetsTheSectionAngleAtOnsetButNotTheLattice() {
        // alpha_section = alpha_0 + cl / a0 (thin-airfoil form with a measured a0; common practice)
        Wing base = wing(0.6, 2, 0);
        Section thin = base.sections().get("s");
        Section measured = new Section("s", thin.camber(), 0, Math.toDegrees(0.1), thin.clMax(),
                thin.flapClMaxIncrement(), thin.dragPolar(), thin.measuredZeroLiftAngle());
        Wing w = new Wing(base.name(), base.displayUnit(), base.reference(), base.surfaces(), Map.of("s", measured));
        StallEstimate a = onset(base);
        StallEstimate b = onset(w);
        assertEquals(a.lift(), b.lift(), 1e-12, "the lattice does not use the section lift slope");
        double alpha0 = org.spanlift.section.ThinAirfoil.zeroLiftAngle(thin.camber());
        StallEstimate.StripStall critical = b.strips().stream().filter(s -> s.y() == b.y()).findFirst().orElseThrow();
        assertEquals(alpha0 + CL_MAX / Math.toDegrees(0.1), critical.sectionAngle(), 1e-12);
        StallEstimate.StripStall thinCritical = a.strips().stream().filter(s -> s.y() == a.y()).findFirst()
                .orElseThrow();
        assertEquals(alpha0 + CL_MAX / (2 * Math.PI), thinCritical.sectionAngle(), 1e-12);
    }

    @Test
    void flapsLowerTheStallSpeed() {
        double clean = speed(wing(0.6, 2, 0), 8000, 0).equivalent();
        double flapped = speed(wing(0.6, 2, 20), 8000, 0).equivalent();
        assertTrue(flapped < clean, clean + " -> " + flapped);
    }

    @Test
    void stallSpeedGrowsWithTheSquareRootOfWeight() {
        Wing w = wing(0.6, 2, 0);
        double v1 = speed(w, 6000, 0).equivalent();
        double v2 = speed(w, 4 * 6000, 0).equivalent();
        assertEquals(2.0, v2 / v1, 1e-9);
    }

    @Test
    void withConstantClMaxEquivalentStallSpeedIsTheSameAtAltitudeAndTrueSpeedGrowsAsOneOverRootSigma() {
        Wing w = wing(0.6, 2, 0);
        StallSpeed low = speed(w, 8000, 0);
        StallSpeed high = speed(w, 8000, 3000);
        assertEquals(low.equivalent(), high.equivalent(), 1e-9 * low.equivalent());
        double sigma = StandardAtmosphere.at(3000).densityRatio();
        assertEquals(low.trueSpeed() / Math.sqrt(sigma), high.trueSpeed(), 1e-9 * high.trueSpeed());
    }

    @Test
    void reynoldsNumbersAndStallSpeedAgreeAfterIteration() {
        Wing base = wing(0.6, 2, 0);
        Section s = base.sections().get("s").withClMax(new Table(new double[] {1e6, 6e6}, new double[] {1.2, 1.6}));
        Wing w = new Wing(base.name(), base.displayUnit(), base.reference(), base.surfaces(), Map.of("s", s));
        StallSpeed v = speed(w, 8000, 1000);
        double nu = StandardAtmosphere.at(1000).kinematicViscosity();
        for (StallEstimate.StripStall strip : v.estimate().strips()) {
            assertEquals(v.trueSpeed() * strip.chord() / nu, strip.reynolds(), 1e-6 * strip.reynolds());
        }
    }

    @Test
    void sectionsWithoutClMaxAreRefusedUnlessAssumed() {
        Wing base = wing(1, 0, 0);
        Wing w = new Wing(base.name(), base.displayUnit(), base.reference(), base.surfaces(),
                Map.of("s", Section.of("s", CamberLines.parse("NACA 2412"))));
        WingAnalysis a = WingAnalysis.of(w);
        MissingSectionDataException e = org.junit.jupiter.api.Assertions.assertThrows(MissingSectionDataException.class,
                () -> StripLimits.of(w, a.lattice(), a.fileDeflections(), OptionalDouble.empty()));
        assertTrue(e.getMessage().contains("section s gives no cl-max"), e.getMessage());
        assertTrue(StripLimits.of(w, a.lattice(), a.fileDeflections(), OptionalDouble.of(1.2)).assumed());
    }
}
