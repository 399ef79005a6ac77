package org.spanlift.washout;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeSet;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Planform;
import org.spanlift.geometry.RetwistedPlanform;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Station;
import org.spanlift.geometry.StationPlanform;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.Wing;
import org.spanlift.input.RefusedException;
import org.spanlift.lattice.Strip;
import org.spanlift.section.CamberLines;
import org.spanlift.section.Table;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.StallEstimate;
import org.spanlift.stall.StallStudy;

/**
 * The twist distribution: a round trip through the stall analysis with the twist written as station twists, never
 * worse in cruise than the linear washout (a feasible point of its programs), one station giving the linear
 * washout, and without stall requirements the lattice's least-drag twist (Munk's minimum-induced-drag theorem,
 * NACA Report 121, 1921; {@link LeastDragTwist}) as the bounds loosen.
 */
class TwistDesignTest {

    private static final double TEN_DEG = Math.toRadians(10);

    private static Wing wing(double taper) {
        Trapezoid t = new Trapezoid(10, 1.6, taper, 0, 0, 0, 0, "s", 0, 0);
        List<ControlSurface> controls = List.of(new ControlSurface("aileron", ControlKind.AILERON, 3.0, 4.7, 0.25, 0));
        Surface s = new Surface("wing", true, t.planform(), controls, LatticeSpec.DEFAULT);
        Section section = Section.of("s", CamberLines.parse("NACA 2412")).withClMax(Table.constant(1.4));
        return new Wing("twist", LengthUnit.M, Wing.defaultReference(s), List.of(s), Map.of("s", section));
    }

    private static TwistDesign.Shape shape(Wing w, int stations, double smoothnessDeg) {
        return new TwistDesign.Shape(TwistDesign.evenKnots(w, stations), -TEN_DEG, TEN_DEG,
                Math.toRadians(smoothnessDeg));
    }

    private static WashoutPoint linear(Wing w, List<WashoutRequirement> r) {
        return WashoutDesign.find(w, new double[1], r, 0.5, OptionalDouble.empty(), Optional.empty(), 0, TEN_DEG)
                .washout().orElseThrow();
    }

    private static TwistDesign.Result design(Wing w, List<WashoutRequirement> r, TwistDesign.Shape shape,
            Optional<WashoutPoint> linear) {
        return TwistDesign.find(w, new double[1], r, 0.5, OptionalDouble.empty(), Optional.empty(), shape, linear);
    }

    /** The wing with stations at the root, the file's stations and the knots, each with its twist changed. */
    private static Wing asStations(Wing w, double[] knots, double[] change) {
        StationPlanform p = (StationPlanform) w.main().planform();
        TreeSet<Double> ys = new TreeSet<>(p.stationYs());
        for (double y : knots) {
            ys.add(y);
        }
        RetwistedPlanform changed = new RetwistedPlanform(p, knots, change);
        List<Station> stations = new ArrayList<>();
        for (double y : ys) {
            stations.add(new Station(y, p.chord(y), p.noseX(y), p.noseZ(y), changed.twist(y), "s"));
        }
        Surface s = w.main();
        Surface out = new Surface(s.name(), true, new StationPlanform(stations), s.controls(), s.lattice());
        return new Wing(w.name(), w.displayUnit(), w.reference(), List.of(out), w.sections());
    }

    private static StallEstimate onset(Wing w) {
        return StallStudy.configuration("check", WingAnalysis.of(w), new double[1], OptionalDouble.empty(),
                Optional.empty()).estimate();
    }

    @Test
    void theDistributionWrittenAsStationTwistsMeetsEveryRequirementInTheStallAnalysis() {
        Wing w = wing(0.4);
        List<WashoutRequirement> r = List.of(new WashoutRequirement.AileronMargin(0.1),
                new WashoutRequirement.OnsetInboard("aileron", 0.2));
        for (int stations : new int[] {3, 4, 6}) {
            TwistDesign.Shape shape = shape(w, stations, 0.5);
            TwistDesign.Result d = design(w, r, shape, Optional.empty());
            assertTrue(d.met() && d.settled(), stations + " stations");
            Wing written = asStations(w, shape.knots(), d.change());
            List<Strip> a1 = WingAnalysis.of(written).lattice().strips();
            List<Strip> a0 = WingAnalysis.of(w).lattice().strips();
            for (int i = 0; i < a0.size(); i++) {
                assertEquals(a0.get(i).yLeft(), a1.get(i).yLeft(), 1e-12,
                        "stations on strip edges leave the strips as they are, " + i);
                assertEquals(a0.get(i).y(), a1.get(i).y(), 1e-12, "stations on strip edges leave the strips as they "
                        + "are, " + i);
            }
            StallEstimate e = onset(written);
            assertTrue(e.aileronMargin().orElseThrow().dcl() >= 0.1 - 1e-6, "margin " + e.aileronMargin());
            assertTrue(e.y() <= 3.0 - 0.2 + 1e-6, "onset at " + e.y());
            assertEquals(d.design().orElseThrow().onset().lift(), e.lift(), 1e-9);
        }
    }

    @Test
    void theAnswerMeetsTheMarginAsItsBoundAndSmoothnessAllow() {
        Wing w = wing(0.4);
        TwistDesign.Shape shape = shape(w, 4, 0.5);
        TwistDesign.Result d = design(w, List.of(new WashoutRequirement.AileronMargin(0.1)), shape, Optional.empty());
        double[] t = d.change();
        double[] knots = shape.knots();
        double h = knots[knots.length - 1] / knots.length;
        for (int j = 0; j < t.length; j++) {
            assertTrue(Math.abs(t[j]) <= TEN_DEG + 1e-12);
            if (j + 1 < t.length) {
                double left = j == 0 ? 0 : knots[j - 1];
                double before = j == 0 ? 0 : t[j - 1];
                double kink = h * ((t[j + 1] - t[j]) / (knots[j + 1] - knots[j]) - (t[j] - before) / (knots[j] - left));
                assertTrue(Math.abs(kink) <= Math.toRadians(0.5) + 1e-12, "kink " + Math.toDegrees(kink));
            }
        }
        // the margin is what limits it: the answer holds it with equality, as the cheapest twist should
        assertEquals(0.1, d.design().orElseThrow().onset().aileronMargin().orElseThrow().dcl(), 1e-6);
    }

    @Test
    void theDistributionIsNeverWorseInCruiseThanTheLinearWashoutWhichIsAFeasiblePoint() {
        Wing w = wing(0.4);
        for (double margin : new double[] {0.05, 0.1, 0.15}) {
            List<WashoutRequirement> r = List.of(new WashoutRequirement.AileronMargin(margin));
            WashoutPoint lin = linear(w, r);
            for (int stations : new int[] {2, 4, 6}) {
                TwistDesign.Shape shape = shape(w, stations, 0.5);
                double[] knots = shape.knots();
                // the linear washout at the knots: within the bounds, no kink, so a point of every program
                for (double y : knots) {
                    double change = -lin.change() * y / knots[knots.length - 1];
                    assertTrue(Math.abs(change) <= TEN_DEG);
                }
                TwistDesign.Result alone = design(w, r, shape, Optional.empty());
                assertTrue(alone.design().orElseThrow().cruiseDrag() <= lin.cruiseDrag(),
                        "the programs alone: margin " + margin + ", " + stations + " stations");
                TwistDesign.Result with = design(w, r, shape, Optional.of(lin));
                assertTrue(with.design().orElseThrow().cruiseDrag() <= lin.cruiseDrag());
                // from the linear washout or from the file's twist, the rounds settle on one twist (to SETTLED_RAD)
                assertEquals(alone.design().orElseThrow().cruiseDrag(), with.design().orElseThrow().cruiseDrag(),
                        1e-9 * lin.cruiseDrag());
            }
        }
    }

    @Test
    void oneStationAtTheTipIsTheLinearWashoutWithinTheSearchTolerance() {
        Wing w = wing(0.4);
        List<WashoutRequirement> r = List.of(new WashoutRequirement.AileronMargin(0.1));
        WashoutPoint lin = linear(w, r);
        TwistDesign.Result d = design(w, r, shape(w, 1, 0.5), Optional.empty());
        double washout = d.design().orElseThrow().washout();
        assertTrue(washout <= lin.washout() && washout > lin.washout() - Math.toRadians(WashoutDesign.TOLERANCE_DEG),
                Math.toDegrees(washout) + " against " + Math.toDegrees(lin.washout()));
    }

    @Test
    void withoutStallRequirementsTheTwistTendsToTheLeastDragTwistAsTheBoundsLoosen() {
        Wing w = wing(0.4);
        WingAnalysis a = WingAnalysis.of(w);
        TreeSet<Double> edges = new TreeSet<>();
        for (Strip st : a.lattice().strips()) {
            if (st.right()) {
                edges.add(st.yLeft());
                edges.add(st.yRight());
            }
        }
        edges.remove(0.0);
        edges.remove(edges.first()); // a knot on the first strip edge would let every strip's twist change alike
        double[] knots = edges.stream().mapToDouble(Double::doubleValue).toArray();
        LeastDragTwist least = LeastDragTwist.of(a, new double[1], 0.5);
        double best = least.solution().coefficients().inducedDrag();
        double previous = Double.POSITIVE_INFINITY;
        TwistDesign.Result loosest = null;
        for (double bound : new double[] {0.25, 0.5, 1, 30}) {
            TwistDesign.Shape shape = new TwistDesign.Shape(knots, -Math.toRadians(bound), Math.toRadians(bound),
                    Double.POSITIVE_INFINITY);
            loosest = design(w, List.of(), shape, Optional.empty());
            double cdi = loosest.design().orElseThrow().cruiseDrag();
            assertTrue(cdi < previous && cdi >= best * (1 - 1e-9), bound + " deg: " + cdi);
            previous = cdi;
        }
        // the loosest: the least drag itself (the lattice's Munk optimum, e = 1 to the lattice's accuracy) and the
        // same twist but for a uniform part, which only moves the angle of attack
        assertEquals(best, previous, 1e-7 * best);
        RetwistedPlanform p = (RetwistedPlanform) loosest.design().orElseThrow().wing().main().planform();
        double[] y = least.y();
        double[] twist = least.twist();
        double offset = p.changeAt(y[y.length / 2]) - twist[y.length / 2];
        for (int i = 0; i < y.length; i++) {
            assertEquals(offset, p.changeAt(y[i]) - twist[i], 1e-4, "y = " + y[i]);
        }
    }

    @Test
    void theLiftAtTheMaximumIsRefusedAsARequirementOfADistribution() {
        Wing w = wing(0.4);
        assertThrows(RefusedException.class, () -> design(w, List.of(new WashoutRequirement.AileronsBelowPeak()),
                shape(w, 4, 0.5), Optional.empty()));
    }

    @Test
    void anImpossibleMarginWithinTightBoundsIsNotMet() {
        Wing w = wing(0.4);
        TwistDesign.Shape shape = new TwistDesign.Shape(TwistDesign.evenKnots(w, 4), -Math.toRadians(1),
                Math.toRadians(1), Math.toRadians(0.5));
        TwistDesign.Result d = design(w, List.of(new WashoutRequirement.AileronMargin(0.15)), shape, Optional.empty());
        assertFalse(d.met());
        assertTrue(d.design().isEmpty());
    }

    @Test
    void aTwistChangeKeepsTheLatticeAndChangesOnlyTheStripIncidences() {
        Wing w = wing(0.4);
        double[] knots = TwistDesign.evenKnots(w, 4);
        Wing changed = w.withTwistChange(knots, new double[] {0.01, -0.02, 0.03, -0.04});
        assertTrue(WingAnalysis.of(changed).lattice().sameGeometry(WingAnalysis.of(w).lattice()));
        Planform p = changed.main().planform();
        assertEquals(w.main().planform().twist(0), p.twist(0), 0);
        assertEquals(w.main().planform().twist(5) - 0.04, p.twist(5), 1e-15);
        assertEquals(0.03 - 0.5 * 0.07, ((RetwistedPlanform) p).changeAt(0.5 * (knots[2] + knots[3])), 1e-12);
    }
}
