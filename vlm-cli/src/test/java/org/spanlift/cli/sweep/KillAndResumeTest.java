package org.spanlift.cli.sweep;

import org.spanlift.cli.CliRun;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.cli.SpanliftCommand;

/**
 * Kills a real sweep process part-way (a child JVM running the command line), resumes it, and compares the
 * result with an uninterrupted run byte for byte.
 */
class KillAndResumeTest {

    @TempDir
    Path dir;

    private static final String LONG_SWEEP = """
            base: w.wing.yaml
            parameters:
              surfaces.wing.trapezoid.taper: {from: 0.3, to: 1.0, step: 0.01}
              surfaces.wing.trapezoid.washout: {from: 0, to: 4, step: 0.25}
              surfaces.wing.trapezoid.sweep: [0, 3]
            flight: {weight: 8500N}
            columns: [lift_slope_per_rad, e@CL=0.5, stall.CL, stall.eta, stall_speed.clean_eas]
            rank: {by: stall.CL, order: max, keep: 10}
            """;

    @Test
    void aKilledSweepResumesToTheSameBytes() throws Exception {
        Path sweep = Runs.scenario(dir, LONG_SWEEP);
        Path killed = dir.resolve("killed.csv");
        String javaBin = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder pb = new ProcessBuilder(javaBin, "-cp", System.getProperty("java.class.path"),
                SpanliftCommand.class.getName(), "sweep", sweep.toString(), "-o", killed.toString(), "--jobs", "2");
        pb.redirectErrorStream(true);
        pb.redirectOutput(dir.resolve("child.log").toFile());
        Process child = pb.start();
        try {
            while (child.isAlive() && Runs.newlines(killed) < 200) {
                Thread.sleep(20);
            }
        } finally {
            child.destroyForcibly();
            child.waitFor();
        }
        long before = Runs.newlines(killed);
        assertTrue(before >= 1, "the child wrote its header: " + Runs.read(dir.resolve("child.log")));
        Files.write(killed, "1234,0123456789ab".getBytes(StandardCharsets.UTF_8), StandardOpenOption.APPEND);

        CliRun resumed = Runs.of("sweep", sweep.toString(), "-o", killed.toString(), "--resume", "--jobs", "1");
        assertEquals(0, resumed.exitCode(), resumed.err());
        Path whole = dir.resolve("whole.csv");
        CliRun uninterrupted = Runs.of("sweep", sweep.toString(), "-o", whole.toString(), "--jobs", "2");
        assertEquals(0, uninterrupted.exitCode(), uninterrupted.err());
        byte[] expected = Files.readAllBytes(whole);
        byte[] actual = Files.readAllBytes(killed);
        assertEquals(expected.length, actual.length);
        assertTrue(java.util.Arrays.equals(expected, actual));
        assertEquals(Runs.read(dir.resolve("whole.ranked.csv")), Runs.read(dir.resolve("killed.ranked.csv")));
        List<String> lines = Runs.read(whole).lines().toList();
        assertEquals(71 * 17 * 2 + 1, lines.size());
    }
}
