package org.spanlift.stall;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
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
 * Where the lift through the stall first passes a section's peak follows the critical-section method, as
 * taper and washout move it (common practice: tapered wings stall outboard first, washout moves the stall
 * inboard); on a rectangular wing, whose cl is already highest at the root, washout costs maximum lift.
 */
class MaximumLiftTrendsTest {

    private static Wing wing(double taper, double washoutDeg) {
        double root = 1.5;
        double tip = taper * root;
        Station r = new Station(0, root, 0, 0, 0, "s");
        Station t = new Station(5, tip, 0.25 * (root - tip), 0, -Math.toRadians(washoutDeg), "s");
        Surface s = new Surface("wing", true, new StationPlanform(List.of(r, t)), List.of(), LatticeSpec.DEFAULT);
        Section section = Section.of("s", CamberLines.parse("NACA 2412")).withClMax(Table.constant(1.4));
        return new Wing("trend", LengthUnit.M, Wing.defaultReference(s), List.of(s), Map.of("s", section));
    }

    private record Both(StallEstimate onset, MaximumLift maximum) {
    }

    private static Both of(Wing w) {
        WingAnalysis a = WingAnalysis.of(w);
        StripLimits limits = StripLimits.of(w, a.lattice(), new double[0], OptionalDouble.empty());
        return new Both(StallAnalysis.estimate(a, new double[0], limits, 0),
                MaximumLift.of(a, new double[0], limits, 0));
    }

    @Test
    void washoutMovesTheFirstStallInboardAsTheOnsetSays() {
        double previousEta = Double.POSITIVE_INFINITY;
        for (double washout = 0; washout <= 5; washout += 1) {
            Both b = of(wing(0.4, washout));
            double eta = b.maximum().firstStall().orElseThrow().eta();
            assertEquals(b.onset().eta(), eta, 0.1, "washout " + washout + ": the coupled first stall near the onset");
            assertTrue(eta <= previousEta + 0.02, "washout " + washout + ": eta " + eta + " after " + previousEta);
            previousEta = eta;
        }
        assertTrue(previousEta < of(wing(0.4, 0)).maximum().firstStall().orElseThrow().eta() - 0.15);
    }

    @Test
    void washoutCostsARectangularWingMaximumLift() {
        double previous = Double.POSITIVE_INFINITY;
        for (double washout = 0; washout <= 4; washout += 2) {
            double lift = of(wing(1, washout)).maximum().lift();
            assertTrue(lift < previous, "washout " + washout + ": " + lift + " after " + previous);
            previous = lift;
        }
    }

    @Test
    void anUntwistedRectangularWingStallsFirstAtTheRootAndATaperedOneOutboard() {
        assertTrue(of(wing(1, 0)).maximum().firstStall().orElseThrow().eta() < 0.1);
        assertTrue(of(wing(0.4, 0)).maximum().firstStall().orElseThrow().eta() > 0.5);
    }
}
