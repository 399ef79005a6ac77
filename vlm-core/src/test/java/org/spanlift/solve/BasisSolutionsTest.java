package org.spanlift.solve;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;
import org.spanlift.section.CamberLines;

/** The basis solutions, an aileron's solved only when a deflection first asks for it. */
class BasisSolutionsTest {

    private static final double DEG = Math.PI / 180;

    private static Wing wing() {
        List<ControlSurface> controls = List.of(new ControlSurface("flap", ControlKind.FLAP, 0.4, 2.2, 0.25, 0),
                new ControlSurface("aileron", ControlKind.AILERON, 2.5, 4.2, 0.25, 0));
        Surface s = new Trapezoid(9, 1.4, 0.5, 10 * DEG, 4 * DEG, 0, 2 * DEG, "s", 0, 0).surface("wing", controls,
                new LatticeSpec(12, 4, Spacing.COSINE, Spacing.COSINE));
        return new Wing("w", LengthUnit.M, Wing.defaultReference(s), List.of(s),
                Map.of("s", Section.of("s", CamberLines.parse("NACA 2412"))));
    }

    @Test
    void anAileronSolvedLateFromTwoThreadsAtOnceAgreesWithTheFullSpanSystem() throws Exception {
        Wing wing = wing();
        WingAnalysis halves = WingAnalysis.of(wing);
        double[] deflections = {10 * DEG, 7 * DEG};
        Callable<double[]> circulation = () -> {
            double[] g = new double[halves.lattice().panelCount()];
            halves.basis().combine(6 * DEG, deflections, g);
            return g;
        };
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            Future<double[]> first = pool.submit(circulation);
            Future<double[]> second = pool.submit(circulation);
            double[] a = first.get();
            assertArrayEquals(a, second.get(), "both threads see the one solution");
            double[] full = new double[a.length];
            WingAnalysis.of(wing, false).basis().combine(6 * DEG, deflections, full);
            for (int i = 0; i < a.length; i++) {
                assertEquals(full[i], a[i], 1e-12 * (1 + Math.abs(full[i])), "panel " + i);
            }
        } finally {
            pool.shutdown();
        }
    }

    @Test
    void theAntisymmetricSystemIsBuiltOnlyWhenAnAileronIsDeflected() {
        Wing wing = wing();
        Lattice lattice = LatticeBuilder.build(wing);
        InfluenceCache.Systems systems = new InfluenceCache(1).systems(lattice);
        boolean[] both = {true, true};
        BasisSolutions basis = BasisSolutions.solve(lattice, wing.controls(), systems, true, both);
        double[] g = new double[lattice.panelCount()];
        basis.combine(6 * DEG, new double[] {20 * DEG, 0}, g);
        assertFalse(systems.hasAntisymmetric(), "a flap and an undeflected aileron need the symmetric system only");
        basis.combine(6 * DEG, new double[] {0, 5 * DEG}, g);
        assertTrue(systems.hasAntisymmetric(), "an aileron deflection builds it");

        // a sweep's analysis whose deflections include an aileron's builds both at once, from one pass
        InfluenceCache cache = new InfluenceCache(1);
        WingAnalysis.of(wing, cache, new double[] {0, 5 * DEG});
        assertTrue(cache.systems(lattice).hasAntisymmetric());
        InfluenceCache flapsOnly = new InfluenceCache(1);
        WingAnalysis.of(wing, flapsOnly, new double[] {20 * DEG, 0});
        assertFalse(flapsOnly.systems(lattice).hasAntisymmetric());
    }

    @Test
    void anUndeflectedAileronAddsNothingAndReadsAsItsSolution() {
        WingAnalysis analysis = WingAnalysis.of(wing());
        BasisSolutions basis = analysis.basis();
        double[] plain = new double[analysis.lattice().panelCount()];
        basis.combine(4 * DEG, new double[] {0, 0}, plain);
        for (int i = 0; i < plain.length; i++) {
            assertEquals(Math.cos(4 * DEG) * basis.alongX(i) + Math.sin(4 * DEG) * basis.alongZ(i), plain[i], 0.0);
        }
        // read without a deflection, the aileron's solution is antisymmetric: equal and opposite on the halves
        int half = analysis.lattice().halfCount();
        double sum = 0;
        for (int i = 0; i < half; i++) {
            assertEquals(-basis.control(1, i), basis.control(1, i + half), 0.0);
            sum += Math.abs(basis.control(1, i));
        }
        assertTrue(sum > 0, "the aileron's basis was solved when read");
    }
}
