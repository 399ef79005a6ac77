package org.spanlift.cli.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.cli.CliRun;

/**
 * A case whose results are not finite (a reference area of 1e-300) fails in its own row, the sweep goes on
 * with exit code 1, and an interrupted run of it resumes to the same file.
 */
class NonFiniteCaseTest {

    @TempDir
    Path dir;

    @Test
    void theDegenerateCaseRecordsItsErrorAndTheSweepGoesOn() {
        Runs.write(dir, "w.wing.yaml", Runs.WING);
        Path sweep = Runs.resource(dir, "tiny-area.sweep.yaml");
        Path out = dir.resolve("r.csv");
        CliRun r = Runs.of("sweep", sweep.toString(), "-o", out.toString(), "--jobs", "2");
        assertEquals(1, r.exitCode(), r.err());
        assertTrue(r.err().contains("3 cases") && r.err().contains("1 failed"), r.err());
        assertFalse(r.err().contains("internal error"), r.err());
        List<String> lines = Runs.read(out).lines().toList();
        assertEquals(4, lines.size());
        List<String> names = List.of(lines.get(0).split(","));
        Map<String, String> degenerate = RowFormat.CSV.parse(names, lines.get(2));
        assertEquals("1e-300", degenerate.get("reference.area"));
        assertNotNull(degenerate.get("error"));
        // the physical range of an area refuses it as input, in its own row
        assertTrue(degenerate.get("error").contains("expected an area"), degenerate.get("error"));
        assertNull(degenerate.get("lift_slope_per_rad"));
        for (int row : new int[] {1, 3}) {
            Map<String, String> ok = RowFormat.CSV.parse(names, lines.get(row));
            assertNull(ok.get("error"), lines.get(row));
            assertTrue(Double.isFinite(Double.parseDouble(ok.get("e@CL=0.5"))), lines.get(row));
        }
        List<String> ranked = Runs.read(dir.resolve("r.ranked.csv")).lines().toList();
        assertEquals(3, ranked.size(), "the two cases that have results are ranked");
        assertTrue(ranked.get(1).startsWith("1,2,") && ranked.get(2).startsWith("2,0,"), String.join("\n", ranked));
    }

    @Test
    void aRunCutAfterTheDegenerateCaseResumesToTheSameFile() throws IOException {
        Runs.write(dir, "w.wing.yaml", Runs.WING);
        Path sweep = Runs.resource(dir, "tiny-area.sweep.yaml");
        Path whole = dir.resolve("whole.jsonl");
        assertEquals(1, Runs.of("sweep", sweep.toString(), "-o", whole.toString()).exitCode());
        String full = Runs.read(whole);
        Path cut = dir.resolve("cut.jsonl");
        assertEquals(1, Runs.of("sweep", sweep.toString(), "-o", cut.toString()).exitCode());
        int third = full.indexOf("{\"case\":2,");
        try (FileChannel ch = FileChannel.open(cut, StandardOpenOption.WRITE)) {
            ch.truncate(third + 10);
        }
        CliRun resumed = Runs.of("sweep", sweep.toString(), "-o", cut.toString(), "--resume");
        assertEquals(1, resumed.exitCode(), resumed.err());
        assertEquals(full, Runs.read(cut));
        assertEquals(Runs.read(dir.resolve("whole.ranked.jsonl")), Runs.read(dir.resolve("cut.ranked.jsonl")));
    }
}
