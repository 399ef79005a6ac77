package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;
import org.spanlift.io.WingFileReader;
import org.spanlift.vocabulary.Need;
import org.spanlift.vocabulary.ResultKey;
import org.spanlift.vocabulary.ResultUnit;
import org.spanlift.vocabulary.Vocabulary;

/**
 * Walks the vocabulary: every key is a sweep column, and its value there equals the value the single-wing
 * command that carries it prints (solve, stall, compare), under the same key. The demo trainer has cl-max,
 * flap cl-max and drag polars, a flap and ailerons, so every key has a value to compare.
 */
class VocabularyOutputsTest {

    private static final double CL = 0.5;
    private static final String WEIGHT = "750kg";
    private static final String FLAPS = "20";
    private static final String LOAD_FACTOR = "3.8";
    private static final String LOAD_SPEED = "110kt";

    @TempDir
    static Path dir;

    private static YamlValue solve;
    private static YamlValue stall;
    private static YamlValue compare;
    private static Map<String, String> sweepRow;
    private static Wing wing;

    @BeforeAll
    static void runEveryOutput() throws IOException {
        Path wingFile = dir.resolve("w.wing.yaml");
        Files.copy(CliRun.GEOMETRIES.resolve("trainer.wing.yaml"), wingFile);
        wing = WingFileReader.read(wingFile);
        solve = json(CliRun.of("solve", wingFile.toString(), "--cl", String.valueOf(CL), "--weight", WEIGHT,
                "--format", "json"));
        stall = json(CliRun.of("stall", wingFile.toString(), "--weight", WEIGHT, "--flaps", FLAPS, "--format", "json"));
        compare = json(CliRun.of("compare", wingFile.toString(), wingFile.toString(), "--cl", String.valueOf(CL),
                "--format", "json"));

        List<String> columns = new ArrayList<>();
        Vocabulary.WING.forEach(k -> columns.add(k.key()));
        Vocabulary.POINT.forEach(k -> columns.add(k.key() + "@CL=" + CL));
        Vocabulary.ONSET.forEach(k -> columns.add(Vocabulary.CLEAN + k.key()));
        Vocabulary.ONSET.forEach(k -> columns.add(Vocabulary.FLAPS + k.key()));
        Vocabulary.MAX_LIFT.forEach(k -> columns.add(Vocabulary.MAX_CLEAN + k.key()));
        Vocabulary.MAX_LIFT.forEach(k -> columns.add(Vocabulary.MAX_FLAPS + k.key()));
        Vocabulary.STUDY.forEach(k -> columns.add(k.key()));
        for (ControlSurface c : wing.controls()) {
            Vocabulary.CONTROL.forEach(k -> columns.add(Vocabulary.CONTROLS + c.name() + "." + k.key()));
        }
        Vocabulary.LOADS.forEach(k -> columns.add(Vocabulary.LOAD_CASE + k.key()));
        StringBuilder sweep = new StringBuilder("base: w.wing.yaml\n"
                + "parameters:\n  surfaces.wing.controls.aileron.deflection: [0]\n"
                + "flight: {weight: " + WEIGHT + ", flaps: " + FLAPS + "}\n"
                + "load-case: {speed: " + LOAD_SPEED + ", load-factor: " + LOAD_FACTOR + "}\ncolumns:\n");
        columns.forEach(c -> sweep.append("  - \"").append(c).append("\"\n"));
        Path sweepFile = Files.writeString(dir.resolve("all.sweep.yaml"), sweep.toString());
        Path out = dir.resolve("all.csv");
        CliRun run = CliRun.of("sweep", sweepFile.toString(), "--output", out.toString());
        assertEquals(0, run.exitCode(), run.err());
        List<String> lines = Files.readAllLines(out, StandardCharsets.UTF_8);
        List<String> header = cells(lines.get(0));
        List<String> row = cells(lines.get(1));
        sweepRow = new HashMap<>();
        for (int i = 0; i < header.size(); i++) {
            sweepRow.put(header.get(i), row.get(i));
        }
        assertEquals("", sweepRow.get("error"), "the case ran");
    }

    @Test
    void everyWingKeyInTheSweepEqualsSolveOrCompare() {
        for (ResultKey<?> k : Vocabulary.WING) {
            YamlValue printed = at(solve, k.key());
            if (printed == null) {
                printed = at(at(compare, "wings"), "0." + k.key(), true);
            }
            assertNotNull(printed, k.key() + " is in solve or compare");
            same(k, printed, sweepRow.get(k.key()));
        }
    }

    @Test
    void everyPointKeyInTheSweepEqualsSolveAtTheSameCl() {
        YamlValue point = at(solve, "points.0");
        for (ResultKey<?> k : Vocabulary.POINT) {
            same(k, at(point, k.key()), sweepRow.get(k.key() + "@CL=" + CL));
        }
    }

    @Test
    void everyOnsetKeyInTheSweepEqualsStallCleanAndFlapped() {
        for (ResultKey<?> k : Vocabulary.ONSET) {
            // a surface's own share is written only where there are several; a wing alone's is the whole's
            String printedKey = k.needs(Need.SURFACES) ? "CL" : k.key();
            assertEquals(k.needs(Need.SURFACES), at(stall, "stall." + k.key()) == null, k.key());
            same(k, at(stall, "stall." + printedKey), sweepRow.get(Vocabulary.CLEAN + k.key()));
            same(k, at(stall, "stall_flaps." + printedKey), sweepRow.get(Vocabulary.FLAPS + k.key()));
        }
    }

    @Test
    void everyOnsetKeyOfSeveralSurfacesInTheSweepEqualsStallWithATail() throws IOException {
        Path tailFile = dir.resolve("t.wing.yaml");
        Files.copy(CliRun.GEOMETRIES.resolve("trainer-tail.wing.yaml"), tailFile);
        YamlValue printed = json(CliRun.of("stall", tailFile.toString(), "--weight", WEIGHT, "--flaps", FLAPS,
                "--format", "json"));
        List<ResultKey<?>> keys = new ArrayList<>();
        Vocabulary.ONSET.stream().filter(k -> k.needs(Need.SURFACES)).forEach(keys::add);
        List<ResultKey<?>> maxKeys = new ArrayList<>();
        Vocabulary.MAX_LIFT.stream().filter(k -> k.needs(Need.SURFACES)).forEach(maxKeys::add);
        assertFalse(keys.isEmpty());
        assertFalse(maxKeys.isEmpty());
        StringBuilder sweep = new StringBuilder("base: t.wing.yaml\n"
                + "parameters:\n  surfaces.wing.controls.aileron.deflection: [0]\n"
                + "flight: {weight: " + WEIGHT + ", flaps: " + FLAPS + "}\ncolumns:\n");
        for (ResultKey<?> k : keys) {
            sweep.append("  - \"").append(Vocabulary.CLEAN).append(k.key()).append("\"\n");
            sweep.append("  - \"").append(Vocabulary.FLAPS).append(k.key()).append("\"\n");
        }
        for (ResultKey<?> k : maxKeys) {
            sweep.append("  - \"").append(Vocabulary.MAX_CLEAN).append(k.key()).append("\"\n");
            sweep.append("  - \"").append(Vocabulary.MAX_FLAPS).append(k.key()).append("\"\n");
        }
        Path sweepFile = Files.writeString(dir.resolve("tail.sweep.yaml"), sweep.toString());
        Path out = dir.resolve("tail.csv");
        CliRun run = CliRun.of("sweep", sweepFile.toString(), "--output", out.toString());
        assertEquals(0, run.exitCode(), run.err());
        List<String> lines = Files.readAllLines(out, StandardCharsets.UTF_8);
        List<String> header = cells(lines.get(0));
        List<String> row = cells(lines.get(1));
        assertEquals("", row.get(header.indexOf("error")), "the case ran");
        for (ResultKey<?> k : keys) {
            same(k, at(printed, "stall." + k.key()), row.get(header.indexOf(Vocabulary.CLEAN + k.key())));
            same(k, at(printed, "stall_flaps." + k.key()), row.get(header.indexOf(Vocabulary.FLAPS + k.key())));
        }
        for (ResultKey<?> k : maxKeys) {
            same(k, at(printed, "max_lift." + k.key()), row.get(header.indexOf(Vocabulary.MAX_CLEAN + k.key())));
            same(k, at(printed, "max_lift_flaps." + k.key()),
                    row.get(header.indexOf(Vocabulary.MAX_FLAPS + k.key())));
        }
    }

    @Test
    void everyMaximumLiftKeyInTheSweepEqualsStallCleanAndFlapped() {
        for (ResultKey<?> k : Vocabulary.MAX_LIFT) {
            // the configuration's CL is written only where there are several surfaces; a wing alone's is its CL
            String printedKey = k.needs(Need.SURFACES) ? "CL" : k.key();
            assertEquals(k.needs(Need.SURFACES), at(stall, "max_lift." + k.key()) == null, k.key());
            same(k, at(stall, "max_lift." + printedKey), sweepRow.get(Vocabulary.MAX_CLEAN + k.key()));
            same(k, at(stall, "max_lift_flaps." + printedKey), sweepRow.get(Vocabulary.MAX_FLAPS + k.key()));
        }
    }

    @Test
    void everyStudyKeyInTheSweepEqualsStall() {
        for (ResultKey<?> k : Vocabulary.STUDY) {
            String cell = sweepRow.get(k.key());
            if (k.key().equals("assumed_cl_max")) {
                boolean either = text(at(stall, "stall.assumed_cl_max")).equals("true")
                        || text(at(stall, "stall_flaps.assumed_cl_max")).equals("true");
                assertEquals(String.valueOf(either), cell, k.key());
            } else {
                same(k, at(stall, k.key()), cell);
            }
        }
    }

    @Test
    void everyControlKeyInTheSweepEqualsTheWingFile() {
        double semi = wing.main().planform().yEnd();
        for (ControlSurface c : wing.controls()) {
            String p = Vocabulary.CONTROLS + c.name() + ".";
            assertEquals(c.from(), number(sweepRow.get(p + "from")), 1e-12);
            assertEquals(c.to(), number(sweepRow.get(p + "to")), 1e-12);
            assertEquals(c.from() / semi, number(sweepRow.get(p + "from_eta")), 1e-12);
            assertEquals(c.to() / semi, number(sweepRow.get(p + "to_eta")), 1e-12);
            assertEquals(c.chordFraction(), number(sweepRow.get(p + "chord_fraction")), 1e-12);
            assertEquals(Math.toDegrees(c.deflection()), number(sweepRow.get(p + "deflection_deg")), 1e-12);
        }
        assertEquals(Vocabulary.CONTROL.size(), 6, "each control key is checked above");
    }

    @Test
    void everyLoadKeyInTheSweepEqualsLoadsInTheSameCase() {
        String wingFile = dir.resolve("w.wing.yaml").toString();
        YamlValue loads = json(CliRun.of("loads", wingFile, "--weight", WEIGHT, "--load-factor", LOAD_FACTOR,
                "--speed", LOAD_SPEED, "--format", "json"));
        YamlValue firstCase = at(loads, "cases.0");
        for (ResultKey<?> k : Vocabulary.LOADS) {
            same(k, at(firstCase, k.key()), sweepRow.get(Vocabulary.LOAD_CASE + k.key()));
        }
    }

    @Test
    void everyLoadKeyIsInTheLoadsOutputAndCompareAgrees() {
        String wingFile = dir.resolve("w.wing.yaml").toString();
        String[] loadCase = {"--weight", WEIGHT, "--load-factor", LOAD_FACTOR, "--speed", LOAD_SPEED};
        YamlValue loads = json(CliRun.of("loads", wingFile, loadCase[0], loadCase[1], loadCase[2], loadCase[3],
                loadCase[4], loadCase[5], "--format", "json"));
        YamlValue both = json(CliRun.of("compare", wingFile, wingFile, loadCase[0], loadCase[1], loadCase[2],
                loadCase[3], loadCase[4], loadCase[5], "--format", "json"));
        YamlValue firstCase = at(loads, "cases.0");
        for (ResultKey<?> k : Vocabulary.LOADS) {
            YamlValue printed = at(firstCase, k.key());
            assertNotNull(printed, k.key() + " is in the loads output");
            YamlValue compared = at(at(both, "wings"), "0." + Vocabulary.LOAD_CASE + k.key(), true);
            if (compared != null) {
                assertEquals(Double.parseDouble(text(printed)), Double.parseDouble(text(compared)), 0, k.key());
            }
        }
    }

    @Test
    void everyKeyIsDeclaredOnceWithAUnitLabelAndDescription() {
        List<List<? extends ResultKey<?>>> groups = List.of(Vocabulary.WING, Vocabulary.POINT, Vocabulary.ONSET,
                Vocabulary.MAX_LIFT, Vocabulary.STUDY, Vocabulary.LOADS, Vocabulary.CONTROL, Vocabulary.SURFACE,
                Vocabulary.BALANCE, Vocabulary.TRIM);
        for (List<? extends ResultKey<?>> g : groups) {
            assertEquals(g.size(), g.stream().map(ResultKey::key).distinct().count(), "keys unique in a group");
            for (ResultKey<?> k : g) {
                assertFalse(k.label().isBlank(), k.key());
                assertFalse(k.description().isBlank(), k.key());
                assertTrue(k.key().matches("[A-Za-z_][A-Za-z0-9_.]*"), k.key());
            }
        }
    }

    /** The printed value and the sweep's cell agree: numbers to 1e-12 relative, flags and names exactly. */
    private static void same(ResultKey<?> k, YamlValue printed, String cell) {
        assertNotNull(printed, k.key() + " is printed");
        assertNotNull(cell, k.key() + " is a sweep column");
        String p = text(printed);
        if (p.equals("null")) {
            assertEquals("", cell, k.key() + " absent in both");
        } else if (k.unit().numeric()) {
            double expected = Double.parseDouble(p);
            assertEquals(expected, number(cell), 1e-12 * Math.max(1, Math.abs(expected)), k.key());
        } else if (k.unit() == ResultUnit.FLAG) {
            assertEquals(p, cell, k.key());
        } else {
            assertEquals(p, cell.replace("\"", ""), k.key());
        }
    }

    private static double number(String cell) {
        return Double.parseDouble(cell);
    }

    private static String text(YamlValue v) {
        if (v instanceof YamlValue.Scalar s) {
            return s.plain() && s.text().isEmpty() ? "null" : s.text();
        }
        return v.toString();
    }

    private static YamlValue json(CliRun run) {
        assertEquals(0, run.exitCode(), run.err());
        return YamlParser.parse(run.out(), "output.json");
    }

    private static YamlValue at(YamlValue root, String dotted) {
        return at(root, dotted, false);
    }

    /** The value at a dotted path; with {@code flatLeaf}, the rest after the first step is one flat key. */
    private static YamlValue at(YamlValue root, String dotted, boolean flatLeaf) {
        if (root == null) {
            return null;
        }
        List<String> steps = new ArrayList<>();
        if (flatLeaf) {
            int dot = dotted.indexOf('.');
            steps.add(dotted.substring(0, dot));
            steps.add(dotted.substring(dot + 1));
        } else {
            steps.addAll(List.of(dotted.split("\\.")));
        }
        YamlValue v = root;
        for (String s : steps) {
            if (v instanceof YamlValue.Scalar absent && text(absent).equals("null")) {
                return v; // a whole absent object: every key below it is absent
            }
            if (v instanceof YamlValue.Mapping m) {
                v = m.get(s).orElse(null);
            } else if (v instanceof YamlValue.Sequence q && s.matches("\\d+")) {
                v = q.items().get(Integer.parseInt(s));
            } else {
                return null;
            }
            if (v == null) {
                return null;
            }
        }
        return v;
    }

    private static List<String> cells(String line) {
        List<String> out = new ArrayList<>();
        StringBuilder b = new StringBuilder();
        boolean quoted = false;
        for (char c : line.toCharArray()) {
            if (c == '"') {
                quoted = !quoted;
            } else if (c == ',' && !quoted) {
                out.add(b.toString());
                b.setLength(0);
            } else {
                b.append(c);
            }
        }
        out.add(b.toString());
        return out;
    }
}
