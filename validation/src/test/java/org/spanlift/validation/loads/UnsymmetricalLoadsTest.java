package org.spanlift.validation.loads;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;
import org.spanlift.lattice.Strip;
import org.spanlift.loads.LoadsAnalysis;
import org.spanlift.loads.SpanwiseLoads;
import org.spanlift.results.Solution;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.structure.LoadCase;
import org.spanlift.structure.WingStructure;

/**
 * Unsymmetrical (rolling) load cases: the halves carry different loads, and statics ties them to the whole
 * wing (Newton's laws for the wing as a free body; common practice for any loads calculation). The fractions
 * and deflections are the user's, as the standards leave them to the applicable rule (for example the
 * unsymmetrical flight conditions of 14 CFR 23.349, text before the 2017 rewrite).
 */
class UnsymmetricalLoadsTest {

    /** A flat, untwisted, unswept wing with ailerons, its longitudinal axis along its chord. */
    private static final Wing WING = WingFileReader.parse("""
            name: rolling
            units: m
            surfaces:
              - name: wing
                trapezoid: {span: 10, root-chord: 1.5, taper: 0.6}
                controls:
                  - {name: aileron, kind: aileron, from: 3.0, to: 4.8, chord-fraction: 0.25}
                lattice: {strips: 24, rows: 6}
            """, "rolling.wing.yaml");

    private static final WingStructure MASSLESS = new WingStructure(0.25, 0.40, Optional.empty(), Optional.empty(),
            List.of());

    private static final double W = 8000;

    /**
     * With the ailerons deflected, the two halves' root shears add up to the symmetric case's two halves (the
     * whole normal force is n W either way, the antisymmetric deflection adding none), to 1e-9 relative; and
     * the difference of the root bending moments is the rolling moment about the root (y_root = 0):
     * M_R - M_L = -(C_roll q S b + the drag's rolling moment), C_roll positive right wing down (so a right
     * half carrying more bends up more and rolls the left wing down), to 1e-9 relative. The drag's rolling
     * moment, sin(alpha) times the sum of y D over the strips, is part of the air load the halves carry and
     * not of the Kutta-Joukowski C_roll; it is computed here from the solution's strip drags.
     */
    @Test
    void aileronHalvesAddUpToTheSymmetricCaseAndDifferByTheRollingMoment() {
        WingAnalysis a = WingAnalysis.of(WING);
        LoadsAnalysis la = LoadsAnalysis.of(a, MASSLESS, a.fileDeflections());
        double aileron = Math.toRadians(12);
        LoadCase symmetric = new LoadCase("sym", W, 2.53, 60, 0, "given");
        LoadCase rolling = new LoadCase("roll", W, 2.53, 60, 0, "given",
                Optional.of(new LoadCase.Asymmetry(OptionalDouble.of(aileron), OptionalDouble.empty())));
        SpanwiseLoads sym = la.loads(symmetric);
        List<SpanwiseLoads> halves = la.halves(rolling);
        assertEquals(2, halves.size());
        SpanwiseLoads right = halves.get(0);
        SpanwiseLoads left = halves.get(1);
        assertEquals(SpanwiseLoads.Side.RIGHT, right.side());
        assertEquals(SpanwiseLoads.Side.LEFT, left.side());
        assertEquals(right.alpha(), left.alpha(), 1e-12, "one flight condition");
        assertEquals(2 * sym.rootShear(), right.rootShear() + left.rootShear(), 1e-9 * 2 * sym.rootShear());
        assertTrue(right.rootBending() > left.rootBending(), "the right aileron down lifts the right half more");

        Solution s = a.solve(right.alpha(), new double[] {aileron});
        double q = right.dynamicPressure();
        double area = WING.reference().area();
        double span = WING.reference().span();
        double[] drag = s.stripInducedDrag();
        List<Strip> strips = a.lattice().strips();
        double dragRoll = 0;
        for (int k = 0; k < strips.size(); k++) {
            Strip st = strips.get(k);
            dragRoll += 0.5 * (st.yLeft() + st.yRight()) * drag[k] * q * Math.sin(right.alpha());
        }
        double rolling0 = s.coefficients().rollingMoment() * q * area * span;
        double expected = -(rolling0 - dragRoll);
        double difference = right.rootBending() - left.rootBending();
        assertEquals(expected, difference, 1e-9 * Math.abs(difference));
    }

    /**
     * The share form: the left half carries the given share of the right half's air load (its inertia in
     * full), so on a massless wing its loads are the right half's times the share, station by station.
     */
    @Test
    void shareFormScalesTheOtherHalf() {
        WingAnalysis a = WingAnalysis.of(WING);
        LoadsAnalysis la = LoadsAnalysis.of(a, MASSLESS, a.fileDeflections());
        LoadCase c = new LoadCase("share", W, 3.8, 60, 0, "given",
                Optional.of(new LoadCase.Asymmetry(OptionalDouble.empty(), OptionalDouble.of(0.7))));
        List<SpanwiseLoads> halves = la.halves(c);
        double[] r = halves.get(0).bending();
        double[] l = halves.get(1).bending();
        for (int k = 0; k < r.length; k++) {
            assertEquals(0.7 * r[k], l[k], 1e-9 * Math.abs(r[0]), "station " + k);
        }
        assertEquals(la.loads(new LoadCase("sym", W, 3.8, 60, 0, "given")).rootShear(), halves.get(0).rootShear(),
                1e-9 * halves.get(0).rootShear(), "the right half carries the full air load");
    }
}
