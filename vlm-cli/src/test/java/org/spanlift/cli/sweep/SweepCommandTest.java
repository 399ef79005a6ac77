package org.spanlift.cli.sweep;

import org.spanlift.cli.CliRun;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SweepCommandTest {

    @TempDir
    Path dir;

    private CliRun sweep(String... args) {
        return Runs.of(args);
    }

    @Test
    void theFileIsTheSameWhateverTheThreadCount() {
        Path s = Runs.scenario(dir, Runs.SWEEP);
        for (String ext : List.of(".csv", ".jsonl")) {
            Path one = dir.resolve("one" + ext);
            Path three = dir.resolve("three" + ext);
            assertEquals(0, sweep("sweep", s.toString(), "-o", one.toString(), "--jobs", "1").exitCode());
            CliRun r = sweep("sweep", s.toString(), "-o", three.toString(), "--jobs", "3");
            assertEquals(0, r.exitCode(), r.err());
            assertEquals(Runs.read(one), Runs.read(three));
            assertEquals(Runs.read(Ranker.pathFor(one, RowFormat.of(ext))), Runs.read(Ranker.pathFor(three,
                    RowFormat.of(ext))));
            List<String> lines = Runs.read(one).lines().toList();
            assertEquals(42 + (ext.equals(".csv") ? 1 : 0), lines.size());
            assertTrue(r.err().contains("42 cases") && r.err().contains("0 failed"), r.err());
        }
        String ranked = Runs.read(dir.resolve("one.ranked.csv"));
        List<String> rows = ranked.lines().toList();
        assertTrue(rows.get(0).startsWith("rank,case,id,surfaces.wing.trapezoid.taper,"), rows.get(0));
        assertEquals(5, rows.size());
        double previous = Double.POSITIVE_INFINITY;
        List<String> header = List.of(rows.get(0).split(","));
        int e = header.indexOf("e@CL=0.5");
        int feasible = header.indexOf("feasible");
        for (String row : rows.subList(1, rows.size())) {
            String[] cells = row.split(",", -1);
            double v = Double.parseDouble(cells[e]);
            assertTrue(v <= previous);
            assertEquals("true", cells[feasible]);
            previous = v;
        }
    }

    @Test
    void rowsStayInCaseOrderWithStableIds() {
        Path s = Runs.scenario(dir, Runs.SWEEP);
        Path out = dir.resolve("r.jsonl");
        assertEquals(0, sweep("sweep", s.toString(), "-o", out.toString()).exitCode());
        List<String> lines = Runs.read(out).lines().toList();
        for (int i = 0; i < lines.size(); i++) {
            assertTrue(lines.get(i).startsWith("{\"case\":" + i + ",\"id\":\""), lines.get(i));
        }
        assertTrue(lines.get(8)
                .contains("\"surfaces.wing.trapezoid.taper\":0.6,\"surfaces.wing.trapezoid.washout\":0.5,"),
                lines.get(8));
        Path reordered = Runs.write(dir, "o.sweep.yaml", Runs.SWEEP.replace("{from: 0, to: 3, step: 0.5}", "[0.5, 0]"));
        Path other = dir.resolve("o.jsonl");
        assertEquals(0, sweep("sweep", reordered.toString(), "-o", other.toString()).exitCode());
        String id = lines.get(8).substring(17, 17 + 16);
        assertTrue(Runs.read(other).lines().toList().get(2).contains(id), "the same values give the same id");
    }

    @Test
    void shardsMergeIntoTheSameFileAsOneRun() {
        Path s = Runs.scenario(dir, Runs.SWEEP);
        Path whole = dir.resolve("whole.csv");
        assertEquals(0, sweep("sweep", s.toString(), "-o", whole.toString()).exitCode());
        String[] shards = new String[3];
        for (int i = 1; i <= 3; i++) {
            Path p = dir.resolve("part" + i + ".csv");
            shards[3 - i] = p.toString();
            CliRun r = sweep("sweep", s.toString(), "-o", p.toString(), "--shard", i + "/3", "--jobs", "2");
            assertEquals(0, r.exitCode(), r.err());
        }
        Path merged = dir.resolve("merged.csv");
        CliRun m = sweep("merge", shards[0], shards[1], shards[2], "--output", merged.toString());
        assertEquals(0, m.exitCode(), m.err());
        assertEquals(Runs.read(whole), Runs.read(merged));
        assertEquals(Runs.read(dir.resolve("whole.ranked.csv")), Runs.read(dir.resolve("merged.ranked.csv")));

        Path incomplete = dir.resolve("two.csv");
        CliRun missing = sweep("merge", shards[0], shards[2], "--output", incomplete.toString());
        assertEquals(2, missing.exitCode());
        assertTrue(missing.err().contains("a shard of 3 is missing"), missing.err());
        assertFalse(Files.exists(incomplete));
    }

    @Test
    void resumeDropsAPartialRowAndFinishesTheRun() throws IOException {
        Path s = Runs.scenario(dir, Runs.SWEEP);
        Path whole = dir.resolve("whole.csv");
        assertEquals(0, sweep("sweep", s.toString(), "-o", whole.toString()).exitCode());
        String full = Runs.read(whole);
        Path cut = dir.resolve("cut.csv");
        assertEquals(0, sweep("sweep", s.toString(), "-o", cut.toString()).exitCode());
        int at = full.indexOf('\n', full.length() / 2) + 25;
        try (FileChannel ch = FileChannel.open(cut, StandardOpenOption.WRITE)) {
            ch.truncate(at);
        }
        CliRun r = sweep("sweep", s.toString(), "-o", cut.toString(), "--resume", "--jobs", "2");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(full, Runs.read(cut));
        CliRun again = sweep("sweep", s.toString(), "-o", cut.toString(), "--resume");
        assertEquals(0, again.exitCode());
        assertEquals(full, Runs.read(cut));

        Path changed = Runs.write(dir, "s.sweep.yaml", Runs.SWEEP.replace("keep: 4", "keep: 3"));
        CliRun refused = sweep("sweep", changed.toString(), "-o", cut.toString(), "--resume");
        assertEquals(2, refused.exitCode());
        assertTrue(refused.err().contains("manifest differs"), refused.err());
        assertEquals(full, Runs.read(cut));
    }

    @Test
    void failedCasesAreRecordedAndGiveExitCodeOne() {
        Path s = Runs.scenario(dir, Runs.SWEEP.replace("{from: 0.5, to: 1.0, step: 0.1}", "[0.5, 11, 1.0]"));
        Path out = dir.resolve("f.csv");
        CliRun r = sweep("sweep", s.toString(), "-o", out.toString());
        assertEquals(1, r.exitCode(), r.err());
        assertTrue(r.err().contains("21 cases") && r.err().contains("7 failed"), r.err());
        List<String> lines = Runs.read(out).lines().toList();
        assertEquals(22, lines.size());
        assertTrue(lines.get(8).endsWith(",\"w.wing.yaml:6: surfaces[0].trapezoid.taper: must be from 0 to 10, got "
                + "11\""),
                lines.get(8));
        assertTrue(lines.get(15).endsWith(","), "the case after the failures has no error: " + lines.get(15));
    }

    @Test
    void badInputIsOneLineWithExitCodeTwoAndWritesNothing() {
        Path out = dir.resolve("never.csv");
        String[][] cases = {
            {"surfaces.wing.trapezoid.taper: {from: 0.5, to: 1.0, step: 0.1}", "surfaces.wing.trapezoid.tapper: [0.5]",
                "s.sweep.yaml:3: parameters.surfaces.wing.trapezoid.tapper: unknown key 'tapper'"},
            {"{from: 0, to: 3, step: 0.5}", "{from: 0, to: 3, step: 0}",
                "s.sweep.yaml:4: parameters.surfaces.wing.trapezoid.washout.step: the step must not be zero"},
            {"{from: 0, to: 3, step: 0.5}", "{from: 0, to: 3, step: -0.5}",
                "parameters.surfaces.wing.trapezoid.washout.step: the step must lead from 0 to 3"},
            {"flight:", "design: {kind: latin-hypercube, cases: 20}\nflight:",
                    "s.sweep.yaml:5: design.seed: missing key; expected a whole number"},
            {"{from: 0, to: 3, step: 0.5}", "{from: 0, to: 3, step: 0.0000001}\ndesign: grid",
                "s.sweep.yaml:5: design: the full grid has 180000006 cases, more than 10000000; use --force"},
        };
        for (String[] c : cases) {
            Path s = Runs.scenario(dir, Runs.SWEEP.replace(c[0], c[1]));
            CliRun r = sweep("sweep", s.toString(), "-o", out.toString());
            assertEquals(2, r.exitCode(), r.err());
            assertEquals(1, r.err().lines().count(), r.err());
            assertTrue(r.err().contains(c[2]), r.err());
            assertFalse(Files.exists(out));
            assertFalse(Files.exists(Manifest.pathFor(out)));
        }
        Runs.scenario(dir, Runs.SWEEP);
        Runs.write(dir, "w.wing.yaml", Runs.WING.replace(", cl-max: 1.45", ""));
        CliRun r = sweep("sweep", dir.resolve("s.sweep.yaml").toString(), "-o", out.toString());
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("columns: stall columns need section cl-max data")
                && r.err().contains("assume-cl-max"), r.err());
        assertFalse(Files.exists(out));
    }

    @Test
    void withoutAnOutputTheRowsGoToStandardOutput() {
        Path s = Runs.scenario(dir, Runs.SWEEP);
        CliRun r = sweep("sweep", s.toString(), "--jobs", "2");
        assertEquals(0, r.exitCode(), r.err());
        Path file = dir.resolve("f.csv");
        assertEquals(0, sweep("sweep", s.toString(), "-o", file.toString()).exitCode());
        assertEquals(Runs.read(file), r.out());
    }
}
