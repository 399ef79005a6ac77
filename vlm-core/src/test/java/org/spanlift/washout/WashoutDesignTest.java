package org.spanlift.washout;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.section.CamberLines;
import org.spanlift.section.Table;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.StallEstimate;
import org.spanlift.stall.StallStudy;

/**
 * The least washout: a round trip through the stall analysis, and facts of the trade (common practice): an
 * untwisted rectangular wing needs none to stall inboard of its ailerons, a wing of taper 0.4 needs some for
 * an aileron margin of 0.1, and more margin needs more washout.
 */
class WashoutDesignTest {

    private static final double TEN_DEG = Math.toRadians(10);

    private static Wing wing(double taper) {
        Trapezoid t = new Trapezoid(10, 1.6, taper, 0, 0, 0, 0, "s", 0, 0);
        List<ControlSurface> controls = List.of(new ControlSurface("aileron", ControlKind.AILERON, 3.0, 4.7, 0.25, 0));
        Surface s = new Surface("wing", true, t.planform(), controls, LatticeSpec.DEFAULT);
        Section section = Section.of("s", CamberLines.parse("NACA 2412")).withClMax(Table.constant(1.4));
        return new Wing("washout", LengthUnit.M, Wing.defaultReference(s), List.of(s), Map.of("s", section));
    }

    private static WashoutDesign.Result find(Wing w, WashoutRequirement... r) {
        return WashoutDesign.find(w, new double[1], List.of(r), 0.5, OptionalDouble.empty(), Optional.empty(), 0,
                TEN_DEG);
    }

    private static StallEstimate onset(Wing w) {
        WingAnalysis a = WingAnalysis.of(w);
        return StallStudy.configuration("check", a, new double[1], OptionalDouble.empty(), Optional.empty()).estimate();
    }

    @Test
    void theWashoutFoundMeetsTheMarginInTheStallAnalysisAndOneATenthOfAToleranceLessDoesNot() {
        Wing w = wing(0.4);
        WashoutDesign.Result r = find(w, new WashoutRequirement.AileronMargin(0.1));
        assertTrue(r.met());
        double washout = r.washout().orElseThrow().washout();
        double found = onset(w.withWashoutChange(washout)).aileronMargin().orElseThrow().dcl();
        assertTrue(found >= 0.1 - 1e-6, "margin " + found + " at " + Math.toDegrees(washout) + " degrees");
        double less = onset(w.withWashoutChange(washout - Math.toRadians(WashoutDesign.TOLERANCE_DEG)))
                .aileronMargin().orElseThrow().dcl();
        assertTrue(less < 0.1, "a washout smaller by the tolerance misses it: " + less);
    }

    @Test
    void anUntwistedRectangularWingNeedsNoWashoutToStallInboardOfItsAilerons() {
        WashoutDesign.Result r = find(wing(1), new WashoutRequirement.OnsetInboard("aileron", 0));
        assertTrue(r.met());
        assertEquals(0, r.washout().orElseThrow().washout(), 0);
    }

    @Test
    void aTaperPointFourWingNeedsWashoutForAMarginAndMoreMarginNeedsMore() {
        double previous = 0;
        for (double margin : new double[] {0.05, 0.1, 0.15}) {
            WashoutDesign.Result r = find(wing(0.4), new WashoutRequirement.AileronMargin(margin));
            double washout = r.washout().orElseThrow().washout();
            assertTrue(washout > previous, "margin " + margin + ": " + Math.toDegrees(washout) + " degrees");
            previous = washout;
        }
    }

    @Test
    void anUnreachableRequirementSaysByHowMuchItFails() {
        WashoutDesign.Result r = find(wing(0.4), new WashoutRequirement.AileronMargin(1.5));
        assertFalse(r.met());
        assertTrue(r.washout().isEmpty());
        assertTrue(new WashoutRequirement.AileronMargin(1.5).slack(r.atUpper()) < 0);
        assertEquals(21, r.trade().size(), "0 to 10 degrees by half a degree");
    }
}
