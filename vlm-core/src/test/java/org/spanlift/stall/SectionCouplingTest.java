package org.spanlift.stall;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Station;
import org.spanlift.geometry.StationPlanform;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.results.Solution;
import org.spanlift.section.CamberLines;
import org.spanlift.section.Table;
import org.spanlift.solve.WingAnalysis;

class SectionCouplingTest {

    /** A tapered, swept, twisted, cambered wing with a flap and an aileron. */
    private static Wing wing(double flapDeg, double aileronDeg, int strips) {
        Station root = new Station(0, 1.6, 0, 0, Math.toRadians(1), "root");
        Station tip = new Station(5, 0.8, 0.6, 0.3, Math.toRadians(-2), "tip");
        List<ControlSurface> controls = List.of(
                new ControlSurface("flap", ControlKind.FLAP, 0.4, 2.8, 0.25, Math.toRadians(flapDeg)),
                new ControlSurface("aileron", ControlKind.AILERON, 3.0, 4.7, 0.22, Math.toRadians(aileronDeg)));
        Surface s = new Surface("wing", true, new StationPlanform(List.of(root, tip)), controls,
                new LatticeSpec(strips, 8, Spacing.COSINE, Spacing.COSINE));
        Section r = Section.of("root", CamberLines.parse("NACA 4415")).withClMax(Table.constant(1.5));
        Section t = Section.of("tip", CamberLines.parse("NACA 2412")).withClMax(Table.constant(1.3));
        return new Wing("coupling", LengthUnit.M, Wing.defaultReference(s), List.of(s), Map.of("root", r, "tip", t));
    }

    private static SectionCoupling coupling(WingAnalysis a, boolean thinLines) {
        double[] d = a.fileDeflections();
        StripLimits limits = StripLimits.of(a.wing(), a.lattice(), d, OptionalDouble.empty());
        StripCurves curves = StripCurves.of(a.wing(), a.lattice(), d, limits, 0);
        return SectionCoupling.of(a, d, thinLines ? curves.thinAirfoilLines() : curves);
    }

    @Test
    void thinAirfoilLinesGiveTheLinearSolutionSymmetricAndWithAnAileron() {
        for (double aileron : new double[] {0, 8}) {
            WingAnalysis a = WingAnalysis.of(wing(25, aileron, 24));
            SectionCoupling c = coupling(a, true);
            assertEquals(aileron == 0, c.symmetric());
            for (double deg : new double[] {-4, 3, 12, 25}) {
                double alpha = Math.toRadians(deg);
                double[] start = new double[c.size()];
                java.util.Arrays.fill(start, 0.01);
                CoupledPoint p = c.solve(alpha, start);
                assertTrue(p.converged());
                for (double corr : p.corrections()) {
                    assertEquals(0, corr, 1e-12);
                }
                Solution linear = a.solve(alpha, a.fileDeflections());
                Solution coupled = c.solution(p);
                assertEquals(linear.coefficients().lift(), p.lift(), 1e-12);
                for (int i = 0; i < a.lattice().panelCount(); i++) {
                    assertEquals(linear.circulation(i), coupled.circulation(i),
                            1e-9 * Math.abs(linear.circulation(i)) + 1e-14);
                }
            }
        }
    }

    @Test
    void stripLiftEqualsTheSectionCurveAtTheEffectiveAngleWhenConverged() {
        WingAnalysis a = WingAnalysis.of(wing(0, 0, 24));
        SectionCoupling c = coupling(a, false);
        CoupledPoint p = c.solve(Math.toRadians(10), new double[c.size()]);
        assertTrue(p.converged());
        Solution s = c.solution(p);
        for (int i = 0; i < c.size(); i++) {
            org.spanlift.results.SpanLoad load = s.spanLoad(0);
            int at = java.util.Arrays.binarySearch(load.y(), c.strip(i).y());
            double fromLattice = load.cl()[at];
            assertEquals(fromLattice, p.cl(i), 1e-12);
            assertEquals(c.curves().curve(c.wingIndex(i)).lift(p.sectionAngle(i)), p.cl(i), SectionCoupling.TOLERANCE);
        }
    }

    @Test
    void aSectionBelowItsPeakEverywhereLiftsLessThanLinearTheoryNearTheStall() {
        WingAnalysis a = WingAnalysis.of(wing(0, 0, 24));
        SectionCoupling c = coupling(a, false);
        double alpha = Math.toRadians(12);
        CoupledPoint p = c.solve(alpha, new double[c.size()]);
        assertTrue(p.converged());
        assertTrue(p.lift() < a.liftCurve(a.fileDeflections()).lift(alpha));
        CoupledPoint low = c.solve(Math.toRadians(1), new double[c.size()]);
        assertEquals(a.liftCurve(a.fileDeflections()).lift(Math.toRadians(1)), low.lift(), 1e-9,
                "on the straight part of every curve the 2 pi sections agree with linear theory");
    }

    @Test
    void theMaximumIsLocatedWithinATenthOfADegree() {
        WingAnalysis a = WingAnalysis.of(wing(0, 0, 24));
        SectionCoupling c = coupling(a, false);
        LiftBranch branch = LiftBranch.trace(c, a.liftCurve(a.fileDeflections()).zeroLiftAngle());
        CoupledPoint top = branch.maximum();
        for (CoupledPoint p : branch.upward()) {
            assertTrue(p.lift() <= top.lift() + 1e-12);
        }
        for (double off : new double[] {-0.1, 0.1}) {
            CoupledPoint near = c.solve(top.alpha() + Math.toRadians(off), top.corrections());
            if (near.converged() && near.stableJacobian() == top.stableJacobian()) {
                assertTrue(near.lift() <= top.lift() + 1e-9, "a point 0.1 degree away lifts more");
            }
        }
        assertFalse(branch.upward().isEmpty());
    }
}
