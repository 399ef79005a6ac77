package org.spanlift.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.batch.CaseEvaluator;
import org.spanlift.batch.CaseResult;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.io.StructureReader;
import org.spanlift.io.SweepFileReader;
import org.spanlift.io.WingFileReader;
import org.spanlift.loads.LoadsAnalysis;
import org.spanlift.loads.SpanwiseLoads;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.structure.LoadCase;

/** The loads.* columns of a sweep: one load case's root loads per case, as the loads analysis gives them. */
class LoadCaseColumnsTest {

    @TempDir
    Path dir;

    /** A metre wing with a structure section (invented masses). */
    private static final String WING = """
            name: Test wing with a structure
            units: m
            surfaces:
              - name: wing
                section: main
                trapezoid: {span: 10.0, root-chord: 1.6, taper: 0.5, washout: 2}
                controls:
                  - {name: aileron, kind: aileron, from: 3.2, to: 4.8, chord-fraction: 0.24}
                lattice: {strips: 12, rows: 4}
            sections:
              main: {camber: NACA 4415, cl-max: 1.4}
            structure: {mass: 80kg, point-masses: [{name: tank, mass: 30kg, y: 1.5, chord-fraction: 0.3}]}
            """;

    private static final String SWEEP = """
            base: w.wing.yaml
            parameters:
              surfaces.wing.trapezoid.washout: [0, 3]
              surfaces.wing.trapezoid.taper: [0.5, 1]
            flight: {weight: 9000N, altitude: 1000m}
            load-case: {speed: 70m/s, load-factor: 3.8}
            columns: [loads.root.shear, loads.root.bending, loads.CL, lift_slope_per_rad]
            """;

    private Sweep read(String sweep) {
        SweepFixtures.write(dir, "w.wing.yaml", WING);
        return SweepFileReader.read(SweepFixtures.write(dir, "s.sweep.yaml", sweep), false);
    }

    @Test
    void theLoadsColumnsAreTheLoadsAnalysisOfEachCasesWingWithTheBaseStructure() {
        Sweep s = read(SWEEP);
        LoadCase lc = s.loadCase().orElseThrow();
        assertEquals(9000, lc.weight());
        assertEquals(3.8, lc.loadFactor());
        assertEquals(70, lc.equivalentSpeed());
        assertEquals(1000, lc.altitude());
        CaseEvaluator ev = new CaseEvaluator(s);
        for (int i = 0; i < 4; i++) {
            CaseResult r = ev.evaluate(i);
            assertNull(r.error(), r.error());
            var tree = s.caseTree(r.values(), r.derived());
            Wing wing = WingFileReader.fromTree(tree, s.basePath().toString());
            double[] clean = new double[wing.controls().size()];
            SpanwiseLoads expected = LoadsAnalysis.of(WingAnalysis.of(wing), StructureReader.fromTree(tree,
                    s.basePath().toString(), wing), clean).loads(lc);
            assertEquals(expected.rootShear(), (Double) r.results()[0], 1e-9 * Math.abs(expected.rootShear()));
            assertEquals(expected.rootBending(), (Double) r.results()[1], 1e-9 * Math.abs(expected.rootBending()));
            assertEquals(expected.liftCoefficient(), (Double) r.results()[2], 1e-12);
        }
    }

    @Test
    void aCaseBeyondTheStallOnsetFailsItsRowAsLoadsRefusesIt() {
        Sweep s = read(SWEEP.replace("speed: 70m/s", "speed: 55m/s"));
        CaseResult r = new CaseEvaluator(s).evaluate(0);
        assertTrue(r.error().startsWith("the load case needs a wing CL of "), r.error());
        assertTrue(r.error().contains("above the stall onset") && r.error().contains("cannot be flown at that speed"),
                r.error());
    }

    @Test
    void loadsColumnsNeedALoadCaseAWeightAndAStructureAndALoadCaseNeedsThem() {
        InputException noCase = assertThrows(InputException.class,
                () -> read(SWEEP.replace("load-case: {speed: 70m/s, load-factor: 3.8}\n", "")));
        assertEquals("columns", noCase.field());
        assertTrue(noCase.problem().startsWith("loads.* columns need a load case"), noCase.getMessage());

        InputException noWeight = assertThrows(InputException.class,
                () -> read(SWEEP.replace("flight: {weight: 9000N, altitude: 1000m}\n", "")));
        assertEquals("load-case", noWeight.field());
        assertTrue(noWeight.problem().startsWith("a load case needs the aircraft's weight"), noWeight.getMessage());

        InputException unused = assertThrows(InputException.class,
                () -> read(SWEEP.replace("loads.root.shear, loads.root.bending, loads.CL, ", "")));
        assertEquals("load-case", unused.field());
        assertTrue(unused.problem().startsWith("a load case serves the loads.* columns"), unused.getMessage());

        InputException unknown = assertThrows(InputException.class,
                () -> read(SWEEP.replace("loads.CL", "loads.root.twist")));
        assertTrue(unknown.problem().startsWith("unknown load-case result 'root.twist'"), unknown.getMessage());

        SweepFixtures.write(dir, "w.wing.yaml", WING.replace(
                "structure: {mass: 80kg, point-masses: [{name: tank, mass: 30kg, y: 1.5, chord-fraction: 0.3}]}\n",
                ""));
        InputException noStructure = assertThrows(InputException.class, () -> SweepFileReader.read(
                SweepFixtures.write(dir, "s.sweep.yaml", SWEEP.replace("  surfaces.wing.trapezoid.washout: [0, 3]\n",
                        "")),
                false));
        assertEquals("columns", noStructure.field());
        assertTrue(noStructure.problem().startsWith("loads.* columns need a structure section"),
                noStructure.getMessage());
    }

    @Test
    void aConstantAreaStudyAsksTheSameNormalForceCoefficientInEveryCase() {
        Sweep s = read(SWEEP.replace("  surfaces.wing.trapezoid.washout: [0, 3]\n", "")
                .replace("loads.CL", "loads.CN")
                .replace("columns:", "names: {taper: surfaces.wing.trapezoid.taper}\nconstants: {area: 12}\n"
                        + "derived:\n  surfaces.wing.trapezoid.root-chord: 2 * area / (10 * (1 + taper))\ncolumns:"));
        LoadCase lc = s.loadCase().orElseThrow();
        double cn = lc.loadFactor() * lc.weight() / (lc.dynamicPressure() * 12);
        CaseEvaluator ev = new CaseEvaluator(s);
        for (int i = 0; i < 2; i++) {
            CaseResult r = ev.evaluate(i);
            assertNull(r.error(), r.error());
            assertEquals(cn, (Double) r.results()[2], 1e-12 * cn);
        }
    }
}
