package org.spanlift.stall;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Station;
import org.spanlift.geometry.StationPlanform;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.section.CamberLines;
import org.spanlift.section.MeasuredLiftCurve;
import org.spanlift.section.Table;
import org.spanlift.solve.WingAnalysis;

/** The traced lift curve through the stall: convergence, spread, and folds followed round. */
class LiftBranchTest {

    /** An untwisted rectangular wing of aspect ratio 8 with a flat mean line. */
    private static Wing rectangular(int strips, Optional<MeasuredLiftCurve> curve) {
        Station root = new Station(0, 1.25, 0, 0, 0, "s");
        Station tip = new Station(5, 1.25, 0, 0, 0, "s");
        Surface s = new Surface("wing", true, new StationPlanform(List.of(root, tip)), List.of(),
                new LatticeSpec(strips, 8, Spacing.COSINE, Spacing.COSINE));
        Section section = new Section("s", CamberLines.parse("flat"), 0, Section.THIN_AIRFOIL_SLOPE,
                Optional.of(Table.constant(1.4)), Optional.empty(), Optional.empty(), OptionalDouble.of(0), curve,
                new TreeMap<>());
        return new Wing("rect", LengthUnit.M, Wing.defaultReference(s), List.of(s), Map.of("s", section));
    }

    private static LiftBranch branch(Wing w) {
        WingAnalysis a = WingAnalysis.of(w);
        double[] d = a.fileDeflections();
        StripLimits limits = StripLimits.of(w, a.lattice(), d, OptionalDouble.empty());
        StripCurves curves = StripCurves.of(w, a.lattice(), d, limits, 0);
        return LiftBranch.trace(SectionCoupling.of(a, d, curves), a.liftCurve(d).zeroLiftAngle());
    }

    @Test
    void theMaximumLiftSettlesWithTheStrips() {
        double coarse = branch(rectangular(16, Optional.empty())).maximum().lift();
        double fine = branch(rectangular(64, Optional.empty())).maximum().lift();
        assertEquals(coarse, fine, 1e-3 * fine, "16 and 64 strips per half agree to 0.1%");
    }

    @Test
    void theStallSpreadsOverManyStripsBeforeTheMaximumAndTheLiftRoundsOver() {
        Wing w = rectangular(64, Optional.empty());
        WingAnalysis a = WingAnalysis.of(w);
        MaximumLift m = MaximumLift.of(a, new double[0], StripLimits.of(w, a.lattice(), new double[0],
                OptionalDouble.empty()), 0);
        assertTrue(m.peak(), "the lift rounds over");
        assertTrue(m.stalledSpanFraction() > 0.2, "a fifth of the span or more is past its peak at the maximum: "
                + m.stalledSpanFraction());
    }

    @Test
    void anAbruptSectionStallFoldsTheCurveAndTheTraceFollowsItRound() {
        double[] deg = {-6, 0, 6, 10, 12, 13, 14, 15, 16, 20, 30};
        double[] cl = {-0.63, 0, 0.63, 1.03, 1.2, 1.27, 1.3, 0.8, 0.78, 0.8, 0.9};
        double[] alpha = new double[deg.length];
        for (int i = 0; i < deg.length; i++) {
            alpha[i] = Math.toRadians(deg[i]);
        }
        LiftBranch b = branch(rectangular(32, Optional.of(MeasuredLiftCurve.of(alpha, cl))));
        List<CoupledPoint> trace = b.trace();
        boolean turnsBack = false;
        for (int i = 1; i < trace.size(); i++) {
            turnsBack |= trace.get(i).alpha() < trace.get(i - 1).alpha();
        }
        assertTrue(turnsBack, "the angle of attack turns back along the trace");
        assertTrue(b.multipleSolutions().isPresent(), "two solutions exist at some angles");
        assertTrue(b.jacobianSignChange().isPresent());
        List<CoupledPoint> up = b.upward();
        for (int i = 1; i < up.size(); i++) {
            assertTrue(up.get(i).alpha() > up.get(i - 1).alpha());
            assertEquals(up.get(0).stableJacobian(), up.get(i).stableJacobian());
        }
        assertFalse(b.maximumIsPeak(), "the maximum is at a fold: the lift breaks off");
        CoupledPoint on = b.maximum();
        double reach = 0;
        while (reach < 1) {
            CoupledPoint next = b.coupling().solve(on.alpha() + Math.toRadians(0.01), on.corrections());
            if (!next.converged() || next.stableJacobian() != on.stableJacobian() || LiftBranch.jumped(on, next)) {
                break;
            }
            on = next;
            reach += 0.01;
        }
        assertTrue(reach < 0.1, "the branch of the maximum ends within 0.1 degree of it (the fold): " + reach);
    }
}
