package org.spanlift.io;

import org.spanlift.sweep.ResultColumn;
import org.spanlift.sweep.Sweep;
import org.spanlift.sweep.SweepFixtures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.input.InputException;

class SweepFileTest {

    @TempDir
    Path dir;

    private Sweep read(String sweep, boolean force) {
        SweepFixtures.write(dir, "t.wing.yaml", SweepFixtures.TRAPEZOID);
        SweepFixtures.write(dir, "w.wing.yaml", SweepFixtures.WING);
        return SweepFileReader.read(SweepFixtures.write(dir, "s.sweep.yaml", sweep), force);
    }

    private InputException bad(String sweep) {
        return assertThrows(InputException.class, () -> read(sweep, false));
    }

    @Test
    void readsAGridWithPointsAndRanking() {
        Sweep s = read("""
                base: t.wing.yaml
                parameters:
                  surfaces.wing.trapezoid.taper: [0.5, 0.75, 1.0]
                  surfaces.wing.trapezoid.washout: {from: 0, to: 4, step: 0.5}
                points: {CL: [0.3, 0.6]}
                columns: [lift_slope_per_rad, e, controls.aileron.from_eta]
                constraints: ["CDi@CL=0.5 < 0.02"]
                rank: {by: e@CL=0.6, order: max, keep: 3}
                """, false);
        assertEquals(27, s.design().count());
        assertEquals(java.util.List.of("lift_slope_per_rad", "e@CL=0.3", "e@CL=0.6", "controls.aileron.from_eta",
                "CDi@CL=0.5"), s.columns().stream().map(ResultColumn::name).toList());
        assertEquals(3, s.ranking().orElseThrow().keep());
    }

    @Test
    void anUnknownPathNamesFileLineAndField() {
        InputException e = bad("""
                base: t.wing.yaml
                parameters:
                  surfaces.wing.trapezoid.tapper: [0.5]
                columns: [lift_slope_per_rad]
                """);
        assertEquals(3, e.line());
        assertEquals("parameters.surfaces.wing.trapezoid.tapper", e.field());
        assertTrue(e.getMessage().startsWith(dir.resolve("s.sweep.yaml") + ":3: "), e.getMessage());
        assertTrue(e.problem().contains("unknown key 'tapper'"), e.problem());
    }

    @Test
    void aZeroOrWrongSignedStepIsRefused() {
        InputException e = bad("""
                base: t.wing.yaml
                parameters:
                  surfaces.wing.trapezoid.washout: {from: 0, to: 4,
                    step: 0}
                columns: [lift_slope_per_rad]
                """);
        assertEquals(4, e.line());
        assertTrue(e.field().endsWith("washout.step") && e.problem().contains("must not be zero"), e.getMessage());
        e = bad("""
                base: t.wing.yaml
                parameters:
                  surfaces.wing.trapezoid.washout: {from: 0, to: 4, step: -0.5}
                columns: [lift_slope_per_rad]
                """);
        assertTrue(e.problem().contains("expected a positive step"), e.getMessage());
    }

    @Test
    void aHugeGridNeedsForce() {
        String sweep = """
                base: t.wing.yaml
                parameters:
                  surfaces.wing.trapezoid.washout: {from: 0, to: 4, step: 0.001}
                  surfaces.wing.trapezoid.taper: {from: 0.1, to: 1, step: 0.001}
                  surfaces.wing.trapezoid.sweep: {from: 0, to: 10, step: 1}
                design: grid
                columns: [lift_slope_per_rad]
                """;
        InputException e = bad(sweep);
        assertEquals(6, e.line());
        assertTrue(e.problem().contains("39653911 cases") && e.problem().contains("--force"), e.getMessage());
        assertEquals(39_653_911L, read(sweep, true).design().count());
    }

    @Test
    void aLatinHypercubeNeedsASeed() {
        InputException e = bad("""
                base: t.wing.yaml
                parameters:
                  surfaces.wing.trapezoid.washout: {from: 0, to: 4}
                design: {kind: latin-hypercube, cases: 50}
                columns: [lift_slope_per_rad]
                """);
        assertEquals("design.seed", e.field());
        assertTrue(e.problem().startsWith("missing key; expected"), e.getMessage());
    }

    @Test
    void stallColumnsNeedClMaxOrAnAssumption() {
        String sweep = """
                base: t.wing.yaml
                parameters:
                  surfaces.wing.trapezoid.washout: [0, 2]
                columns: [stall.eta]
                """;
        InputException e = bad(sweep);
        assertEquals("columns", e.field());
        assertTrue(e.problem().contains("cl-max") && e.problem().contains("main")
                && e.problem().contains("assume-cl-max"), e.getMessage());
        Sweep s = read(sweep + "assume-cl-max: 1.3\n", false);
        assertEquals(ResultColumn.ASSUMED_CL_MAX, s.columns().get(s.columns().size() - 1).name());
        Sweep given = read(sweep.replace("t.wing.yaml", "w.wing.yaml").replace("surfaces.wing.trapezoid.washout",
                "surfaces.wing.stations[2].twist"), false);
        assertEquals(1, given.columns().size());
    }

    @Test
    void badColumnsAndConstraintsAreRefused() {
        assertTrue(bad("""
                base: t.wing.yaml
                parameters: {surfaces.wing.trapezoid.washout: [0]}
                columns: [e]
                """).problem().contains("@CL="));
        assertTrue(bad("""
                base: t.wing.yaml
                parameters: {surfaces.wing.trapezoid.washout: [0]}
                columns: [controls.flap.from_eta]
                """).problem().contains("no control named 'flap'"));
        assertTrue(bad("""
                base: t.wing.yaml
                parameters: {surfaces.wing.trapezoid.washout: [0]}
                columns: [lift_slope_per_rad]
                constraints: ["lift_slope_per_rad = 4"]
                """).problem().contains("'A < B'"));
    }

    @Test
    void aRangeIsCountedWithBoundedWorkWhateverItsStep() {
        // 4 / 1e-999 steps: an exact count would build a thousand-digit integer; the bound is checked first.
        java.math.BigDecimal four = java.math.BigDecimal.valueOf(4);
        assertTrue(org.junit.jupiter.api.Assertions.assertTimeoutPreemptively(java.time.Duration.ofSeconds(5),
                () -> !SweepFileReader.countAtMost(java.math.BigDecimal.ZERO, four, new java.math.BigDecimal("1e-999"),
                        100)));
        assertTrue(SweepFileReader.countAtMost(java.math.BigDecimal.ZERO, four, java.math.BigDecimal.ONE, 5));
        assertTrue(!SweepFileReader.countAtMost(java.math.BigDecimal.ZERO, four, java.math.BigDecimal.ONE, 4),
                "0, 1, 2, 3, 4: five values");
    }

    @Test
    void aGridWithACoarseEnoughRangeStillReads() {
        Sweep s = read("""
                base: t.wing.yaml
                parameters:
                  surfaces.wing.trapezoid.washout: {from: -1e-12, to: 1e12, step: 1e4}
                columns: [lift_slope_per_rad]
                """, true);
        assertEquals(100_000_001L, s.design().count());
    }
}
