package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.solve.LiftCurve;
import org.spanlift.cli.plot.SvgSupport;
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;
import org.spanlift.results.Coefficients;
import org.spanlift.solve.WingAnalysis;
import org.w3c.dom.Document;

class CompareCommandTest {

    private static final List<String> WINGS = List.of("trainer.wing.yaml", "tourer.wing.yaml", "sailplane.wing.yaml");

    @TempDir
    Path dir;

    private static String[] args(String... extra) {
        String[] a = new String[1 + WINGS.size() + extra.length];
        a[0] = "compare";
        for (int i = 0; i < WINGS.size(); i++) {
            a[1 + i] = CliRun.demo(WINGS.get(i));
        }
        System.arraycopy(extra, 0, a, 1 + WINGS.size(), extra.length);
        return a;
    }

    /** The CSV as quantity -> cells after the unit column. */
    private static Map<String, String[]> csv(String text) {
        Map<String, String[]> rows = new HashMap<>();
        text.lines().skip(1).forEach(line -> {
            String[] cells = line.split(",", -1);
            String[] values = new String[cells.length - 2];
            System.arraycopy(cells, 2, values, 0, values.length);
            rows.put(cells[0], values);
        });
        return rows;
    }

    @Test
    void tableValuesMatchDirectEngineResults() {
        CliRun r = CliRun.of(args("--format", "csv", "--cl", "0.6"));
        assertEquals(0, r.exitCode(), r.err());
        Map<String, String[]> rows = csv(r.out());
        double[] base = new double[9];
        for (int i = 0; i < WINGS.size(); i++) {
            Wing wing = WingFileReader.read(Path.of(CliRun.demo(WINGS.get(i))));
            WingAnalysis a = WingAnalysis.of(wing);
            LiftCurve line = a.liftCurve(a.fileDeflections());
            double alpha = line.alphaFor(0.6);
            Coefficients c = a.solve(alpha).coefficients();
            assertEquals(0.6, c.lift(), 1e-9, "solved at the common CL");
            double[] expected = {wing.reference().area(), wing.reference().span(), wing.reference().aspectRatio(),
                wing.main().meanAerodynamicChord(), line.slope(), Math.toDegrees(line.zeroLiftAngle()),
                Math.toDegrees(alpha), c.spanEfficiency().getAsDouble(), c.inducedDrag()};
            String[] keys = {"reference.area", "reference.span", "reference.aspect_ratio", "mean_aerodynamic_chord",
                "lift_slope_per_rad", "zero_lift_angle_deg", "alpha_deg@CL=0.6", "e@CL=0.6", "CDi@CL=0.6"};
            for (int k = 0; k < keys.length; k++) {
                double got = Double.parseDouble(rows.get(keys[k])[i]);
                assertEquals(expected[k], got, 1e-8 * Math.max(1, Math.abs(expected[k])), keys[k] + " of "
                        + WINGS.get(i));
                if (i == 0) {
                    base[k] = expected[k];
                } else {
                    double diff = Double.parseDouble(rows.get(keys[k])[WINGS.size() + i - 1]);
                    assertEquals(expected[k] - base[k], diff, 1e-8 * Math.max(1, Math.abs(expected[k])),
                            "difference " + keys[k]);
                }
            }
        }
    }

    @Test
    void tableAndJsonNameEveryWing() {
        CliRun t = CliRun.of(args());
        assertEquals(0, t.exitCode(), t.err());
        assertTrue(t.out().contains("Two-seat trainer") && t.out().contains("Club sailplane"));
        assertTrue(t.out().contains("B-A") && t.out().contains("C-A"));
        CliRun j = CliRun.of(args("--format", "json"));
        assertEquals(0, j.exitCode(), j.err());
        assertTrue(j.out().contains("\"common_CL\": 0.5"));
        assertTrue(j.out().contains("\"differences\""));
    }

    @Test
    void htmlPageHasOverlaysAndTable() throws Exception {
        Path out = dir.resolve("compare.html");
        CliRun r = CliRun.of(args("--output", out.toString()));
        assertEquals(0, r.exitCode(), r.err());
        Document doc = SvgSupport.parse(Files.readString(out));
        assertEquals(3, SvgSupport.all(doc, "svg").size());
        assertEquals(1, SvgSupport.all(doc, "table").size());
        for (var caption : SvgSupport.all(doc, "figcaption")) {
            assertTrue(caption.getTextContent().contains("Drawn for every wing: no control deflected."),
                    caption.getTextContent());
        }
        assertTrue(Files.readString(out).contains("they do not certify it"));
    }

    @Test
    void badInputExitsTwo() {
        CliRun one = CliRun.of("compare", CliRun.demo("trainer.wing.yaml"));
        assertEquals(2, one.exitCode());
        CliRun cl = CliRun.of(args("--cl", "0.01"));
        assertEquals(2, cl.exitCode());
        assertEquals(1, cl.err().lines().count(), cl.err());
    }
}
