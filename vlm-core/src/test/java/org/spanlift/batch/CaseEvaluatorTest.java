package org.spanlift.batch;

import org.spanlift.solve.LiftCurve;
import org.spanlift.io.SweepFileReader;
import org.spanlift.sweep.Sweep;
import org.spanlift.sweep.SweepFixtures;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.flight.FlightCondition;
import org.spanlift.stall.StallSpeed;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;
import org.spanlift.input.YamlValue;
import org.spanlift.results.Coefficients;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.StallAnalysis;
import org.spanlift.stall.StallEstimate;
import org.spanlift.stall.StripLimits;

/** The sweep's evaluator against the engine's own entry points, case by case. */
class CaseEvaluatorTest {

    @TempDir
    Path dir;

    // CHECKSTYLE.OFF: LineLength
    private static final String COLUMNS = """
            columns: [lift_slope_per_rad, zero_lift_angle_deg, e@CL=0.5, CDi@CL=0.5, alpha_deg@CL=0.5, CL@alpha=4,
              C_roll@alpha=4, stall.CL, stall.eta, stall.alpha_deg, stall.aileron_margin.dcl, stall.half_span_CL,
              stall_flaps.CL, stall_flaps.beside_control_end.control, flap_increment_CL, stall_speed.clean_eas, stall_speed.flaps_tas,
              controls.aileron.from_eta]
            """;
    // CHECKSTYLE.ON: LineLength

    private Sweep sweep(String parameters) {
        SweepFixtures.write(dir, "w.wing.yaml", SweepFixtures.WING);
        return SweepFileReader.read(SweepFixtures.write(dir, "s.sweep.yaml", "base: w.wing.yaml\nparameters:\n"
                + parameters
                + "flight: {weight: 9000N, altitude: 1500m, flaps: 25}\n" + COLUMNS), false);
    }

    private static Wing wingOf(Sweep s, long index) {
        YamlValue tree = s.baseTree();
        String[] v = s.design().values(index);
        for (int p = 0; p < v.length; p++) {
            tree = s.parameters().get(p).path().apply(tree, v[p]);
        }
        return WingFileReader.fromTree(tree, s.basePath().toString());
    }

    private static double value(Sweep s, CaseResult r, String column) {
        return (Double) cell(s, r, column);
    }

    private static Object cell(Sweep s, CaseResult r, String column) {
        for (int i = 0; i < s.columns().size(); i++) {
            if (s.columns().get(i).name().equals(column)) {
                return r.results()[i];
            }
        }
        throw new AssertionError("no column " + column);
    }

    @Test
    void agreesWithTheEngineEntryPoints() {
        Sweep s = sweep("""
                  surfaces.wing.stations[1].chord: [1.1, 1.4]
                  surfaces.wing.stations[2].twist: [-3, 0]
                """);
        CaseEvaluator ev = new CaseEvaluator(s);
        FlightCondition fc = s.condition().orElseThrow();
        for (long i = 0; i < s.design().count(); i++) {
            CaseResult r = ev.evaluate(i);
            assertNull(r.error());
            Wing wing = wingOf(s, i);
            WingAnalysis a = WingAnalysis.of(wing);
            double[] d = a.fileDeflections();
            LiftCurve line = a.liftCurve(d);
            assertEquals(line.slope(), value(s, r, "lift_slope_per_rad"), 1e-12 * line.slope());
            assertEquals(Math.toDegrees(line.zeroLiftAngle()), value(s, r, "zero_lift_angle_deg"), 1e-10);
            Coefficients c = a.solve(line.alphaFor(0.5), d).coefficients();
            assertEquals(c.spanEfficiency().getAsDouble(), value(s, r, "e@CL=0.5"), 1e-12);
            assertEquals(c.inducedDrag(), value(s, r, "CDi@CL=0.5"), 1e-14);
            assertEquals(Math.toDegrees(line.alphaFor(0.5)), value(s, r, "alpha_deg@CL=0.5"), 1e-10);
            Coefficients c4 = a.solve(Math.toRadians(4), d).coefficients();
            assertEquals(c4.lift(), value(s, r, "CL@alpha=4"), 1e-12);
            assertEquals(c4.rollingMoment(), value(s, r, "C_roll@alpha=4"), 1e-12);

            double[] clean = d.clone();
            double[] flaps = d.clone();
            for (int k = 0; k < d.length; k++) {
                if (wing.controls().get(k).kind() == ControlKind.FLAP) {
                    clean[k] = 0;
                    flaps[k] = Math.toRadians(25);
                }
            }
            StallSpeed sc = StallSpeed.of(a, clean, StripLimits.of(wing, a.lattice(), clean, OptionalDouble.empty()),
                    fc);
            StallSpeed sf = StallSpeed.of(a, flaps, StripLimits.of(wing, a.lattice(), flaps, OptionalDouble.empty()),
                    fc);
            StallEstimate e = sc.estimate();
            assertEquals(e.lift(), value(s, r, "stall.CL"), 1e-12);
            assertEquals(e.eta(), value(s, r, "stall.eta"), 1e-12);
            assertEquals(Math.toDegrees(e.alpha()), value(s, r, "stall.alpha_deg"), 1e-10);
            assertEquals(e.aileronMargin().orElseThrow().dcl(), value(s, r, "stall.aileron_margin.dcl"), 1e-12);
            assertEquals(e.halfSpanLift().getAsDouble(), value(s, r, "stall.half_span_CL"), 1e-12);
            assertEquals(sf.estimate().lift(), value(s, r, "stall_flaps.CL"), 1e-12);
            assertEquals(sf.estimate().besideControlEnd().map(StallEstimate.ControlEnd::control).orElse(null),
                    cell(s, r, "stall_flaps.beside_control_end.control"));
            assertEquals(sf.estimate().lift() - e.lift(), value(s, r, "flap_increment_CL"), 1e-12);
            assertEquals(sc.equivalent(), value(s, r, "stall_speed.clean_eas"), 1e-10);
            assertEquals(sf.trueSpeed(), value(s, r, "stall_speed.flaps_tas"), 1e-10);
            assertEquals(3.0 / 5.0, value(s, r, "controls.aileron.from_eta"), 1e-15);
            StallEstimate plain = StallAnalysis.estimate(a, clean, StripLimits.of(wing, a.lattice(), clean,
                    OptionalDouble.empty()), 0);
            assertTrue(plain.lift() > 0);
        }
    }

    @Test
    void twistOnlyCasesReuseOneFactorizationAndGiveTheSameNumbers() {
        Sweep s = sweep("""
                  surfaces.wing.stations[2].twist: {from: -4, to: 0, step: 1}
                  surfaces.wing.controls.aileron.deflection: [0, 5]
                """);
        CaseEvaluator shared = new CaseEvaluator(s);
        for (long i = 0; i < s.design().count(); i++) {
            CaseResult reused = shared.evaluate(i);
            CaseResult fresh = new CaseEvaluator(s).evaluate(i);
            assertNull(reused.error());
            assertArrayEquals(fresh.results(), reused.results(), "case " + i);
        }
        assertEquals(1, shared.factorizations());
        assertEquals(s.design().count() - 1, shared.reuses());
    }

    @Test
    void aFailingCaseRecordsItsErrorAndTheNextOneRuns() {
        Sweep s = sweep("""
                  surfaces.wing.controls.flap.chord-fraction: [1.5, 0.3]
                """);
        CaseEvaluator ev = new CaseEvaluator(s);
        CaseResult bad = ev.evaluate(0);
        assertTrue(bad.failed());
        assertTrue(bad.error().startsWith("w.wing.yaml:"), bad.error());
        assertTrue(bad.error().contains("chord-fraction") && bad.error().contains("between 0 and 1"), bad.error());
        assertTrue(java.util.Arrays.stream(bad.results()).allMatch(o -> o == null));
        CaseResult good = ev.evaluate(1);
        assertNull(good.error());
    }

    @Test
    void aDegenerateCaseFailsInItsOwnRowAndTheNextOneRuns() {
        Sweep s = sweep("""
                  reference.area: [100, 1e-300, 50]
                """);
        CaseEvaluator ev = new CaseEvaluator(s);
        CaseResult before = ev.evaluate(0);
        assertNull(before.error());
        CaseResult degenerate = ev.evaluate(1);
        assertTrue(degenerate.failed());
        // refused as input (the physical range of an area), before any result could be non-finite
        assertTrue(degenerate.error().contains("reference.area") && degenerate.error().contains("expected an area"),
                degenerate.error());
        assertTrue(java.util.Arrays.stream(degenerate.results()).allMatch(o -> o == null));
        assertNull(degenerate.feasible());
        CaseResult after = ev.evaluate(2);
        assertNull(after.error());
        assertEquals(2 * value(s, before, "lift_slope_per_rad"), value(s, after, "lift_slope_per_rad"), 1e-12,
                "half the reference area doubles the coefficients' slope");
        for (Object o : after.results()) {
            assertTrue(!(o instanceof Double d) || Double.isFinite(d), String.valueOf(o));
        }
    }
}
