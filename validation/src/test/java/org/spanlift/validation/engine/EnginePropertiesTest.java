package org.spanlift.validation.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.stream.LongStream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Lattice;
import org.spanlift.results.Coefficients;
import org.spanlift.results.SpanLoad;
import org.spanlift.results.Solution;
import org.spanlift.solve.InfluenceSystem;
import org.spanlift.solve.Symmetry;
import org.spanlift.solve.WingAnalysis;

/**
 * Properties every solution must have, over 200 seeded random wings each (common practice: invariances of
 * the linear potential-flow model and of its discretization). The wings are small (6-10 strips x 2-4 rows,
 * at most 104 unknowns), and every property holds exactly but for rounding: measured, all of them also
 * hold at 1e-13, and the symmetric load only just fails at 1e-14. The tolerances 1e-9 and 1e-12 stand far
 * above that and far below any modelling error, so only a real defect (a sign, a missed image, a length
 * that does not scale, a term left out of a right-hand side) can fail them.
 */
class EnginePropertiesTest {

    /** Coefficients of order 0.01-1: 1e-9 absolute (relative to max(1, |value|)). */
    private static final double COEFFICIENT_TOLERANCE = 1e-9;

    static LongStream seeds() {
        return LongStream.range(1000, 1200);
    }

    private static void assertSameCoefficients(Coefficients expected, Coefficients actual, String what) {
        assertClose(expected.lift(), actual.lift(), what + ": CL");
        assertClose(expected.inducedDrag(), actual.inducedDrag(), what + ": CDi");
        assertClose(expected.pitchingMoment(), actual.pitchingMoment(), what + ": Cm");
        assertClose(expected.rollingMoment(), actual.rollingMoment(), what + ": C_roll");
    }

    private static void assertClose(double expected, double actual, String what) {
        assertEquals(expected, actual, COEFFICIENT_TOLERANCE * Math.max(1, Math.abs(expected)), what);
    }

    private static double maxAbs(double[] v) {
        double m = 0;
        for (double x : v) {
            m = Math.max(m, Math.abs(x));
        }
        return m;
    }

    private static double[] circulations(Solution s) {
        double[] g = new double[s.lattice().panelCount()];
        for (int i = 0; i < g.length; i++) {
            g[i] = s.circulation(i);
        }
        return g;
    }

    private static void assertSameCirculations(double[] expected, double[] actual, double relative, String what) {
        double scale = maxAbs(expected);
        assertTrue(scale > 0, what + ": no circulation");
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i], actual[i], relative * scale, what + ": panel " + i);
        }
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void mirroredWingHasSymmetricSpanLoadAndAileronsAnAntisymmetricOne(long seed) {
        RandomWing random = RandomWing.draw(seed);
        Wing wing = random.wing();
        // The full system: nothing imposes the symmetry, it has to come out of the solve.
        WingAnalysis full = WingAnalysis.of(wing, false);
        double[] symmetric = random.symmetricDeflections();
        Solution s = full.solve(random.alpha(), symmetric);
        Solution withAileron = full.solve(random.alpha(), random.deflections());
        for (int surface = 0; surface < wing.surfaces().size(); surface++) {
            SpanLoad load = s.spanLoad(surface);
            SpanLoad rolled = withAileron.spanLoad(surface);
            int m = load.size();
            double peak = maxAbs(load.clc());
            for (int i = 0; i < m; i++) {
                int j = m - 1 - i;
                assertEquals(-load.y()[j], load.y()[i], 1e-12 * wing.reference().span(), "station " + i);
                // Relative 1e-12 of the peak: the LU rounding measured near 1e-14.
                assertEquals(load.clc()[j], load.clc()[i], 1e-12 * peak, "seed " + seed + ", strip " + i);
                // The aileron's own part of the load (with minus without) is antisymmetric.
                double di = rolled.clc()[i] - load.clc()[i];
                double dj = rolled.clc()[j] - load.clc()[j];
                assertEquals(-dj, di, 1e-12 * Math.max(peak, maxAbs(rolled.clc())),
                        "seed " + seed + ", aileron strip " + i);
            }
        }
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void scalingEveryLengthLeavesCoefficientsUnchanged(long seed) {
        RandomWing random = RandomWing.draw(seed);
        double k = Math.exp(new Random(seed).nextDouble() * Math.log(1e4)) * 0.01; // 0.01 .. 100
        Reference reference = random.wing().reference();
        Coefficients original = WingAnalysis.of(random.wing(reference))
                .solve(random.alpha(), random.deflections()).coefficients();
        Coefficients scaled = WingAnalysis.of(random.scaled(k).wing(RandomWing.scaled(reference, k)))
                .solve(random.alpha(), random.deflections()).coefficients();
        assertSameCoefficients(original, scaled, "seed " + seed + ", k = " + k);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void translatingWingAndMomentPointLeavesCoefficientsUnchanged(long seed) {
        RandomWing random = RandomWing.draw(seed);
        Random r = new Random(seed);
        double dx = -20 + 40 * r.nextDouble();
        double dz = -20 + 40 * r.nextDouble();
        Reference reference = random.wing().reference();
        Coefficients original = WingAnalysis.of(random.wing(reference))
                .solve(random.alpha(), random.deflections()).coefficients();
        Coefficients moved = WingAnalysis.of(random.translated(dx, dz).wing(RandomWing.translated(reference, dx, dz)))
                .solve(random.alpha(), random.deflections()).coefficients();
        assertSameCoefficients(original, moved, "seed " + seed + ", dx = " + dx + ", dz = " + dz);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void superpositionOfBasisSolutionsEqualsADirectSolve(long seed) {
        RandomWing random = RandomWing.draw(seed);
        Wing wing = random.wing();
        WingAnalysis analysis = WingAnalysis.of(wing, false);
        Lattice lattice = analysis.lattice();
        double alpha = random.alpha();
        double[] deflections = random.deflections();
        // The boundary condition of the design notes written out for this one condition:
        // rhs = -V.n - eps (V.t), t = +x, eps = incidence + sign * deflection on control panels.
        double vx = Math.cos(alpha);
        double vz = Math.sin(alpha);
        int n = lattice.panelCount();
        double[] rhs = new double[n];
        for (int i = 0; i < n; i++) {
            double eps = lattice.incidence(i);
            int c = lattice.controlOf(i);
            if (c >= 0) {
                eps += lattice.controlSign(i) * deflections[c];
            }
            rhs[i] = -(vx * lattice.nx(i) + vz * lattice.nz(i)) - eps * vx;
        }
        double[] direct = new double[n];
        InfluenceSystem.of(lattice, Symmetry.FULL).solve(rhs, direct);
        Solution combined = analysis.solve(alpha, deflections);
        assertSameCirculations(direct, circulations(combined), 1e-9, "seed " + seed);
        Coefficients expected = new Solution(lattice, wing.reference(), alpha, deflections, direct).coefficients();
        assertSameCoefficients(expected, combined.coefficients(), "seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void halfSpanImageSolveEqualsFullSpanSolve(long seed) {
        RandomWing random = RandomWing.draw(seed);
        Wing wing = random.wing();
        Solution half = WingAnalysis.of(wing).solve(random.alpha(), random.deflections());
        Solution full = WingAnalysis.of(wing, false).solve(random.alpha(), random.deflections());
        assertSameCirculations(circulations(full), circulations(half), 1e-9, "seed " + seed);
        assertSameCoefficients(full.coefficients(), half.coefficients(), "seed " + seed);
    }
}
