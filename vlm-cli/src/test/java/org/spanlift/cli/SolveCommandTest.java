package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SolveCommandTest {

    @Test
    void jsonCarriesTheContractKeysInSi() {
        CliRun r = CliRun.of("solve", CliRun.demo("trainer.wing.yaml"), "--alpha", "0,4", "--format", "json");
        assertEquals(0, r.exitCode(), r.err());
        for (String key : List.of("\"name\"", "\"reference\"", "\"area\"", "\"span\"", "\"chord\"", "\"aspect_ratio\"",
                "\"lattice\"", "\"panels\"", "\"lift_slope_per_rad\"", "\"zero_lift_angle_deg\"", "\"units\"",
                "\"points\"", "\"alpha_deg\"", "\"CL\"", "\"CDi\"", "\"e\"", "\"Cm\"", "\"C_roll\"", "\"span_load\"",
                "\"y\"", "\"cl\"", "\"cl_c\"", "\"circulation\"", "\"induced_angle_deg\"")) {
            assertTrue(r.out().contains(key), "missing " + key);
        }
        assertTrue(r.out().contains("\"panels\": 512"), "2 halves x 32 strips x 8 rows (the default lattice)");
        assertFalse(r.out().contains("NaN"));
    }

    @Test
    void spanEfficiencyIsNullNearZeroLift() {
        // The trainer's zero-lift angle is near -1.1 deg, so CL is below 0.05 in magnitude at -1 deg.
        CliRun r = CliRun.of("solve", CliRun.demo("trainer.wing.yaml"), "--alpha", "-1", "--format", "json");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("\"e\": null"), r.out());
    }

    @Test
    void tableShowsReferenceLatticeAndOneRowPerAngle() {
        CliRun r = CliRun.of("solve", CliRun.demo("tourer.wing.yaml"), "--alpha", "-4:12:2");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("ft^2"), "tables use the file's length unit");
        assertTrue(r.out().contains("512 panels"));
        long rows = r.out().lines().filter(l -> l.matches("^-?\\d+\\.\\d\\d\\s+.*")).count();
        assertEquals(9, rows);
    }

    @Test
    void csvHasOneRowPerAngleWithSiHeaders() {
        CliRun r = CliRun.of("solve", CliRun.demo("tourer.wing.yaml"), "-a", "0,2,4", "-f", "csv");
        assertEquals(0, r.exitCode(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("alpha_deg,CL,CDi,e,Cm,C_roll", lines.get(0));
        assertEquals(4, lines.size());
    }

    @Test
    void sectionPolarsAddProfileDragAboveTheInducedDrag() {
        CliRun r = CliRun.of("solve", CliRun.demo("trainer.wing.yaml"), "-a", "4", "-f", "csv", "--weight", "750kg");
        assertEquals(0, r.exitCode(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("alpha_deg,CL,CDi,e,Cm,C_roll,CDp,CD,L_D", lines.get(0));
        String[] v = lines.get(1).split(",");
        double cdi = Double.parseDouble(v[2]);
        double cdp = Double.parseDouble(v[6]);
        double cd = Double.parseDouble(v[7]);
        assertTrue(cdp > 0.004 && cdp < 0.012, "profile drag of the demo polars, got " + cdp);
        assertEquals(cdi + cdp, cd, 1e-9);
    }

    @Test
    void targetLiftPointsLandOnTheirCl() {
        CliRun r = CliRun.of("solve", CliRun.demo("trainer.wing.yaml"), "--cl", "0.3,0.8", "-f", "csv");
        assertEquals(0, r.exitCode(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals(3, lines.size(), "only the --cl points without --alpha");
        assertEquals(0.3, Double.parseDouble(lines.get(1).split(",")[1]), 1e-9);
        assertEquals(0.8, Double.parseDouble(lines.get(2).split(",")[1]), 1e-9);
    }

    @Test
    void weightAndSpeedGiveTheRequiredLiftAndDimensionalCirculation() {
        CliRun r = CliRun.of("solve", CliRun.demo("trainer.wing.yaml"), "-a", "2", "-f", "json", "--weight", "7355N",
                "--speed", "40m/s");
        assertEquals(0, r.exitCode(), r.err());
        // CL = W / (0.5 rho0 V^2 S) with rho0 = 1.225 kg/m^3 and S = 12.1 m^2 (the trainer's projected area)
        double expected = 7355 / (0.5 * 1.225 * 40 * 40 * 12.1);
        String out = r.out();
        int at = out.indexOf("\"CL_required\": ");
        double cl = Double.parseDouble(out.substring(at + 15, out.indexOf(',', at)));
        assertEquals(expected, cl, 2e-4 * expected);
        assertTrue(out.contains("m^2/s"), "circulation is dimensional when a speed is given");
    }

    @Test
    void rightAileronDownRollsRightWingUp() {
        CliRun r = CliRun.of("solve", CliRun.demo("trainer.wing.yaml"), "-a", "2", "-f", "csv", "--deflect",
                "aileron=10");
        assertEquals(0, r.exitCode(), r.err());
        double roll = Double.parseDouble(r.out().lines().toList().get(1).split(",")[5]);
        assertTrue(roll < -0.01, "negative rolling moment (right wing up), got " + roll);
    }

    @Test
    void flapsRaiseLiftAtTheSameAngle() {
        CliRun clean = CliRun.of("solve", CliRun.demo("tourer.wing.yaml"), "-a", "2", "-f", "csv");
        CliRun flaps = CliRun.of("solve", CliRun.demo("tourer.wing.yaml"), "-a", "2", "-f", "csv", "--flaps", "20");
        double cl0 = Double.parseDouble(clean.out().lines().toList().get(1).split(",")[1]);
        double cl1 = Double.parseDouble(flaps.out().lines().toList().get(1).split(",")[1]);
        assertTrue(cl1 > cl0 + 0.2, cl0 + " -> " + cl1);
    }

    @Test
    void writesOutputAndSpanLoadFiles(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("trainer.json");
        Path loads = dir.resolve("loads.csv");
        CliRun r = CliRun.of("solve", CliRun.demo("trainer.wing.yaml"), "-a", "0,5", "--output", out.toString(),
                "--span-load", loads.toString());
        assertEquals(0, r.exitCode(), r.err());
        assertEquals("", r.out());
        assertTrue(Files.readString(out).startsWith("{"), "format from the .json extension");
        List<String> rows = Files.readAllLines(loads);
        assertEquals("alpha_deg,surface,y_m,chord_m,cl,cl_c_m,circulation_m,induced_angle_deg", rows.get(0));
        assertEquals(1 + 2 * 64, rows.size(), "two angles x 64 strips");
    }

    @Test
    void badWingFileExitsTwoWithOneLineAndNoOutputFile(@TempDir Path dir) throws IOException {
        Path bad = dir.resolve("bad.wing.yaml");
        Files.writeString(bad, "name: x\nunits: m\nsurfaces:\n  - name: wing\n    trapezoid: {span: -9, root-chord: "
                + "1}\n");
        Path out = dir.resolve("out.json");
        CliRun r = CliRun.of("solve", bad.toString(), "--output", out.toString());
        assertEquals(2, r.exitCode());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().contains("bad.wing.yaml:5: surfaces[0].trapezoid.span: must be positive"), r.err());
        assertFalse(Files.exists(out));
        assertEquals(List.of(), Files.list(dir).filter(p -> !p.equals(bad)).toList(), "no partial files left");
    }

    @Test
    void unknownControlInDeflectIsBadInput() {
        CliRun r = CliRun.of("solve", CliRun.demo("trainer.wing.yaml"), "--deflect", "elevator=5");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("no control of that name; it has flap, aileron"), r.err());
    }

    @Test
    void malformedAlphaRangeIsBadInput() {
        CliRun r = CliRun.of("solve", CliRun.demo("trainer.wing.yaml"), "--alpha", "0:10:-2");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("step"), r.err());
    }

    @Test
    void missingFileIsBadInput() {
        CliRun r = CliRun.of("solve", "no-such.wing.yaml");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().startsWith("spanlift: no-such.wing.yaml: no such file"), r.err());
    }
}
