package org.spanlift.cli.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.cli.CliRun;
import org.spanlift.cli.SpanliftCommand;

/**
 * Two runs writing one results file at once: the second is refused with one line (exit 2) and the first
 * one's rows stay whole. {@code X.csv} and {@code X.jsonl} keep a manifest each.
 */
class ConcurrentRunsTest {

    @TempDir
    Path dir;

    /** Long enough on one thread that the child is still writing when the second run starts. */
    private static final String LONG_SWEEP = """
            base: w.wing.yaml
            parameters:
              surfaces.wing.trapezoid.taper: {from: 0.3, to: 1.0, step: 0.01}
              surfaces.wing.trapezoid.washout: {from: 0, to: 4, step: 0.25}
              surfaces.wing.trapezoid.sweep: [0, 1, 2, 3, 4, 5, 6, 7]
            columns: [lift_slope_per_rad, e@CL=0.5, stall.CL]
            """;

    @Test
    void aSecondSweepIntoTheSameOutputIsRefusedWhileTheFirstRuns() throws Exception {
        Path sweep = Runs.scenario(dir, LONG_SWEEP);
        Runs.write(dir, "w.wing.yaml", Runs.WING.replace("lattice: {strips: 10, rows: 3}",
                "lattice: {strips: 32, rows: 8}"));
        Path out = dir.resolve("x.csv");
        String javaBin = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder pb = new ProcessBuilder(javaBin, "-cp", System.getProperty("java.class.path"),
                SpanliftCommand.class.getName(), "sweep", sweep.toString(), "-o", out.toString(), "--jobs", "1");
        pb.redirectErrorStream(true);
        pb.redirectOutput(dir.resolve("child.log").toFile());
        Process child = pb.start();
        CliRun second;
        long before;
        try {
            while (child.isAlive() && Runs.newlines(out) < 3) {
                Thread.sleep(20);
            }
            assertTrue(child.isAlive(), "the first run is still writing: " + Runs.read(dir.resolve("child.log")));
            before = Runs.newlines(out);
            second = Runs.of("sweep", sweep.toString(), "-o", out.toString(), "--jobs", "1");
            assertTrue(child.isAlive(), "the first run was still writing during the second");
        } finally {
            child.destroyForcibly();
            child.waitFor();
        }
        assertEquals(2, second.exitCode(), second.err());
        assertEquals(1, second.err().lines().count(), second.err());
        assertTrue(second.err().startsWith("spanlift: --output: " + out + " is being written by another spanlift run"),
                second.err());
        assertTrue(Runs.newlines(out) >= before, "the refused run did not cut the first run's rows");
        String text = Runs.read(out);
        List<String> lines = text.lines().toList();
        assertTrue(lines.get(0).startsWith("case,id,"), lines.get(0));
        long complete = Runs.newlines(out) - 1;
        for (int i = 1; i <= complete; i++) {
            assertTrue(lines.get(i).startsWith((i - 1) + ","), "row " + i + " is the first run's: " + lines.get(i));
        }
    }

    @Test
    void mergeRefusesAnOutputAnotherRunHoldsAndLeavesItAlone() throws IOException {
        Path sweep = Runs.scenario(dir, Runs.SWEEP);
        for (int i = 1; i <= 2; i++) {
            assertEquals(0, Runs.of("sweep", sweep.toString(), "-o", dir.resolve("p" + i + ".csv").toString(),
                    "--shard", i + "/2").exitCode());
        }
        Path out = Runs.write(dir, "held.csv", "a run's rows\n");
        try (FileChannel ch = FileChannel.open(out, StandardOpenOption.WRITE); FileLock lock = ch.lock()) {
            CliRun r = Runs.of("merge", dir.resolve("p1.csv").toString(), dir.resolve("p2.csv").toString(),
                    "--output", out.toString());
            assertEquals(2, r.exitCode(), r.err());
            assertTrue(r.err().contains("is being written by another spanlift run"), r.err());
            assertTrue(lock.isValid());
        }
        assertEquals("a run's rows\n", Runs.read(out));
        assertFalse(Files.exists(Manifest.pathFor(out)));
    }

    @Test
    void csvAndJsonLinesOfOneNameKeepAManifestEach() {
        Path sweep = Runs.scenario(dir, Runs.SWEEP);
        Path csv = dir.resolve("x.csv");
        Path jsonl = dir.resolve("x.jsonl");
        assertEquals(0, Runs.of("sweep", sweep.toString(), "-o", csv.toString(), "--shard", "1/2").exitCode());
        assertEquals(0, Runs.of("sweep", sweep.toString(), "-o", jsonl.toString(), "--shard", "2/2").exitCode());
        assertNotEquals(Manifest.pathFor(csv), Manifest.pathFor(jsonl));
        assertTrue(Runs.read(Manifest.pathFor(csv)).contains("\"format\": \"csv\""));
        assertTrue(Runs.read(Manifest.pathFor(jsonl)).contains("\"format\": \"jsonl\""));
        CliRun again = Runs.of("sweep", sweep.toString(), "-o", csv.toString(), "--shard", "1/2", "--resume");
        assertEquals(0, again.exitCode(), again.err());
        CliRun other = Runs.of("sweep", sweep.toString(), "-o", jsonl.toString(), "--shard", "2/2", "--resume");
        assertEquals(0, other.exitCode(), other.err());
    }
}
