package org.spanlift.stall;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

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
import org.spanlift.section.Table;
import org.spanlift.solve.WingAnalysis;

/**
 * Tips that end in a point: linear theory's section lift grows without bound toward them, so an onset on the
 * outermost strip fell with every refinement (taper 0: 0.626, 0.557, 0.496 at 32, 64, 128 strips). The onset
 * leaves out strips of a chord under 5% of the mean aerodynamic chord, and the lift through the stall keeps
 * them, limited by their curves; both settle with the strips.
 */
class PointedTipTest {

    private static final int[] STRIPS = {32, 64, 128};

    private static Wing wing(List<Station> stations, int strips) {
        Surface s = new Surface("w", true, new StationPlanform(stations), List.of(),
                new LatticeSpec(strips, 8, Spacing.COSINE, Spacing.COSINE));
        Section section = Section.of("s", CamberLines.parse("NACA 2412")).withClMax(Table.constant(1.4));
        return new Wing("tip", LengthUnit.M, Wing.defaultReference(s), List.of(s), Map.of("s", section));
    }

    /** A straight-tapered wing, semi-span 5 m, root chord 2 m, unswept quarter-chord line. */
    private static List<Station> trapezoid(double taper) {
        return List.of(new Station(0, 2, 0, 0, 0, "s"), new Station(5, 2 * taper, 0.5 * (1 - taper), 0, 0, "s"));
    }

    /** A rectangular wing of chord 1.6 m whose last 0.8 m round off in a quarter ellipse to a point. */
    private static List<Station> roundedToAPoint() {
        List<Station> st = new ArrayList<>(List.of(new Station(0, 1.6, 0, 0, 0, "s")));
        for (int k = 0; k <= 8; k++) {
            double t = Math.PI / 2 * k / 8;
            double y = 4.2 + 0.8 * Math.sin(t);
            double chord = k == 8 ? 0 : 1.6 * Math.cos(t);
            st.add(new Station(y, chord, 0.4 - 0.25 * chord, 0, 0, "s"));
        }
        return st;
    }

    private static double[] onsets(List<Station> stations) {
        double[] out = new double[STRIPS.length];
        for (int k = 0; k < STRIPS.length; k++) {
            Wing w = wing(stations, STRIPS[k]);
            WingAnalysis a = WingAnalysis.of(w);
            out[k] = StallAnalysis.estimate(a, new double[0], StripLimits.of(w, a.lattice(), new double[0],
                    OptionalDouble.empty()), 0).lift();
        }
        return out;
    }

    private static double[] maxima(List<Station> stations) {
        double[] out = new double[STRIPS.length];
        for (int k = 0; k < STRIPS.length; k++) {
            Wing w = wing(stations, STRIPS[k]);
            WingAnalysis a = WingAnalysis.of(w);
            MaximumLift m = MaximumLift.of(a, new double[0], StripLimits.of(w, a.lattice(), new double[0],
                    OptionalDouble.empty()), 0);
            assertTrue(m.peak(), STRIPS[k] + " strips: the lift rounds over at the maximum");
            out[k] = m.lift();
        }
        return out;
    }

    private static void settles(double[] values, double tolerance, String what) {
        for (double v : values) {
            assertEquals(values[values.length - 1], v, tolerance * v, what + " at 32, 64, 128 strips: "
                    + java.util.Arrays.toString(values));
        }
    }

    @Test
    void theOnsetOfATaperZeroWingSettlesAndSaysWhichStripsItLeftOut() {
        settles(onsets(trapezoid(0)), 0.02, "onset CL");
        Wing w = wing(trapezoid(0), 64);
        WingAnalysis a = WingAnalysis.of(w);
        StallEstimate e = StallAnalysis.estimate(a, new double[0], StripLimits.of(w, a.lattice(), new double[0],
                OptionalDouble.empty()), 0);
        assertTrue(e.pointedTipFrom().isPresent());
        assertTrue(e.y() < e.pointedTipFrom().getAsDouble(), "the onset lies inboard of the strips left out");
    }

    @Test
    void theOnsetOfATipRoundedToAPointSettles() {
        settles(onsets(roundedToAPoint()), 0.02, "onset CL");
    }

    @Test
    void aBluntTipOfAFewPercentOfTheChordLeavesNothingOut() {
        settles(onsets(trapezoid(0.05)), 1e-3, "onset CL");
        Wing w = wing(trapezoid(0.05), 64);
        WingAnalysis a = WingAnalysis.of(w);
        assertTrue(StallAnalysis.estimate(a, new double[0], StripLimits.of(w, a.lattice(), new double[0],
                OptionalDouble.empty()), 0).pointedTipFrom().isEmpty());
    }

    @Test
    void theMaximumLiftOfPointedTipsSettles() {
        settles(maxima(trapezoid(0)), 1e-3, "CL_max, taper 0");
        settles(maxima(roundedToAPoint()), 1e-3, "CL_max, rounded to a point");
    }
}
