package org.spanlift.spark;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The sweep through Spark against the local runner, byte for byte: the results file, its manifest and the
 * ranked summary; with failing cases (their messages name files as the local run does), with a killed task
 * attempt that Spark retries, and resumed after an interruption.
 */
class SparkSweepTest {

    /** The example sweep, seen from the module's folder (a path with a leading "..": mirrored on the executors). */
    private static final String EXAMPLE = Path.of("..", "geometries", "tourer-washout-taper.sweep.yaml").toString();

    @Test
    void theExampleSweepGivesTheLocalRunnersFilesByteForByte(@TempDir Path dir) throws IOException {
        Path local = Files.createDirectory(dir.resolve("local")).resolve("results.csv");
        Path spark = Files.createDirectory(dir.resolve("spark")).resolve("results.csv");
        TestSpark.Run l = TestSpark.local("sweep", EXAMPLE, "--output", local.toString(), "--progress", "none");
        TestSpark.Run s = TestSpark.spark(null, "sweep", EXAMPLE, "--output", spark.toString(), "--progress", "none");
        assertEquals(0, l.exitCode(), l.err());
        assertEquals(0, s.exitCode(), s.err());
        assertEquals(64, Files.readAllLines(local).size(), "a header and 63 cases");
        sameFiles(local.getParent(), spark.getParent(), "results.csv", "results.ranked.csv",
                "results.csv.manifest.json");
        assertTrue(s.err().startsWith("sweep: 63 cases (full grid 7 x 9), 0 failed; 63 run in "), s.err());
    }

    @Test
    void failingCasesRecordTheirErrorsAsLocallyInJsonLines() throws IOException {
        // A relative path, as a user types it: the rows' messages name the sweep and section files as given.
        Path dir = Files.createDirectories(Path.of("target", "spark-tests", "failing"));
        Path sweep = smallSweep(dir);
        Path local = dir.resolve("local");
        Path spark = dir.resolve("spark");
        Files.createDirectories(local);
        Files.createDirectories(spark);
        TestSpark.Run l = TestSpark.local("sweep", sweep.toString(), "--output", local.resolve("r.jsonl").toString(),
                "--progress", "none");
        TestSpark.Run s = TestSpark.spark(null, "sweep", sweep.toString(), "--output",
                spark.resolve("r.jsonl").toString(),
                "--progress", "none", "--cases-per-task", "2");
        assertEquals(1, l.exitCode(), l.err());
        assertEquals(1, s.exitCode(), s.err());
        sameFiles(local, spark, "r.jsonl", "r.ranked.jsonl", "r.jsonl.manifest.json");
        String rows = Files.readString(spark.resolve("r.jsonl"));
        assertEquals(9, rows.lines().count());
        // k = 0 divides by zero (located in the sweep file); missing.dat is not there; bad.dat is malformed
        assertTrue(rows.contains("\"error\":\"" + sweep + ":"), rows);
        assertTrue(rows.contains(dir.toAbsolutePath().resolve("missing.dat").toString()), rows);
        assertTrue(rows.contains("bad.dat:3"), rows);
        assertFalse(rows.contains("spanlift-spark-"), "no executor folder in a message: " + rows);
        assertEquals(2, rows.lines().filter(r -> r.endsWith("\"error\":null}")).count(), rows);
    }

    static final AtomicInteger KILLED = new AtomicInteger();

    @Test
    void aKilledTaskAttemptIsRetriedAndChangesNothing(@TempDir Path dir) throws IOException {
        Path sweep = smallSweep(dir);
        Path local = Files.createDirectory(dir.resolve("local")).resolve("r.csv");
        Path spark = Files.createDirectory(dir.resolve("spark")).resolve("r.csv");
        TestSpark.Run l = TestSpark.local("sweep", sweep.toString(), "--output", local.toString(), "--progress",
                "none");
        KILLED.set(0);
        // The first attempt of the task holding cases 4 and 5 dies after case 5's work, as if its executor were lost.
        CaseTask.TaskFault fault = (index, attempt) -> {
            if (index == 5 && attempt == 0) {
                KILLED.incrementAndGet();
                throw new IllegalStateException("injected: the executor is lost");
            }
        };
        TestSpark.Run s = TestSpark.spark(fault, "sweep", sweep.toString(), "--output", spark.toString(),
                "--progress", "none", "--cases-per-task", "2");
        assertEquals(1, KILLED.get(), "the fault killed one attempt");
        assertEquals(l.exitCode(), s.exitCode(), s.err());
        sameFiles(local.getParent(), spark.getParent(), "r.csv", "r.ranked.csv", "r.csv.manifest.json");
    }

    @Test
    void aTaskThatKeepsFailingEndsTheRunInOneLineWithWholeRowsThatEitherRunnerResumes(@TempDir Path dir)
            throws IOException {
        Path sweep = smallSweep(dir);
        Path local = Files.createDirectory(dir.resolve("local")).resolve("r.csv");
        Path spark = Files.createDirectory(dir.resolve("spark")).resolve("r.csv");
        TestSpark.local("sweep", sweep.toString(), "--output", local.toString(), "--progress", "none");
        CaseTask.TaskFault always = (index, attempt) -> {
            if (index == 6) {
                throw new IllegalStateException("injected: every attempt fails");
            }
        };
        TestSpark.Run broken = TestSpark.spark(always, "sweep", sweep.toString(), "--output", spark.toString(),
                "--progress", "none", "--cases-per-task", "2");
        assertEquals(2, broken.exitCode(), broken.err());
        assertEquals(1, broken.err().lines().count(), broken.err());
        assertTrue(broken.err().startsWith("spanlift-spark: " + spark + ": Spark gave up on a task"), broken.err());
        String partial = Files.readString(spark);
        String whole = Files.readString(local);
        assertTrue(whole.startsWith(partial) && partial.length() < whole.length(), partial);
        // cut the last row in half, as a kill during a write would
        byte[] cut = partial.substring(0, partial.length() - 7).getBytes(StandardCharsets.UTF_8);
        Files.write(spark, cut);
        // the files are the local runner's, so spanlift sweep --resume finishes them as well
        Path other = Files.createDirectory(dir.resolve("other")).resolve("r.csv");
        Files.write(other, cut);
        Files.copy(spark.resolveSibling("r.csv.manifest.json"), other.resolveSibling("r.csv.manifest.json"));
        TestSpark.Run locally = TestSpark.local("sweep", sweep.toString(), "--output", other.toString(), "--progress",
                "none", "--resume");
        assertEquals(1, locally.exitCode(), locally.err());
        sameFiles(local.getParent(), other.getParent(), "r.csv", "r.ranked.csv", "r.csv.manifest.json");
        TestSpark.Run resumed = TestSpark.spark(null, "sweep", sweep.toString(), "--output", spark.toString(),
                "--progress", "none", "--cases-per-task", "2", "--resume");
        assertEquals(1, resumed.exitCode(), resumed.err());
        sameFiles(local.getParent(), spark.getParent(), "r.csv", "r.ranked.csv", "r.csv.manifest.json");
    }

    @Test
    void badInputIsOneLineBeforeSparkAndWritesNothing(@TempDir Path dir) throws IOException {
        Path sweep = smallSweep(dir);
        Files.writeString(sweep, Files.readString(sweep).replace("lift_slope_per_rad", "lift_slope_per_radian"));
        Path out = dir.resolve("r.csv");
        TestSpark.Run r = TestSpark.spark(null, "sweep", sweep.toString(), "--output", out.toString());
        assertEquals(2, r.exitCode(), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().startsWith("spanlift-spark: " + sweep + ":"), r.err());
        assertFalse(Files.exists(out));
        assertFalse(Files.exists(dir.resolve("r.csv.manifest.json")));

        TestSpark.Run zero = TestSpark.spark(null, "sweep", EXAMPLE, "--output", out.toString(), "--cases-per-task",
                "0");
        assertEquals(2, zero.exitCode(), zero.err());
        assertEquals("spanlift-spark: --cases-per-task: expected 1 to 100000 cases, got 0", zero.err().strip());
        assertFalse(Files.exists(out));

        TestSpark.Run device = TestSpark.spark(null, "sweep", EXAMPLE, "--output", "/dev/null");
        assertEquals(2, device.exitCode(), device.err());
        assertEquals("spanlift-spark: --output: expected a results file; /dev/null is a device or FIFO (spanlift sweep "
                + "streams into those)", device.err().strip());

        TestSpark.Run cluster = TestSpark.spark(null, "sweep", EXAMPLE, "--output", out.toString(), "--master",
                "spark://head:7077");
        assertEquals(2, cluster.exitCode(), cluster.err());
        assertEquals("spanlift-spark: --master: expected local, local[N], local[*] or local[N,F], got "
                + "'spark://head:7077'; "
                + "for a cluster, run the application jar with spark-submit --master spark://head:7077",
                cluster.err().strip());
        assertFalse(Files.exists(out));
    }

    /**
     * Nine cases over a swept section file (good, missing, malformed) and a study variable k whose derived
     * root chord 2.4 / k cannot be computed at k = 0: two cases succeed, seven fail in their rows.
     */
    static Path smallSweep(Path dir) throws IOException {
        Files.writeString(dir.resolve("section.dat"), "section\n1.0 0.0\n0.8 0.02\n0.6 0.035\n0.4 0.04\n0.2 0.035\n"
                + "0.05 0.02\n0.0 0.0\n0.05 -0.01\n0.2 -0.015\n0.4 -0.015\n0.6 -0.012\n0.8 -0.006\n1.0 0.0\n");
        Files.writeString(dir.resolve("bad.dat"), "my section\n1.0 0.0\n0.5 zero\n");
        Files.writeString(dir.resolve("w.wing.yaml"), String.join("\n", "units: m", "surfaces:", "  - name: wing",
                "    section: a", "    trapezoid: {span: 9, root-chord: 1.2}", "sections:",
                "  a: {camber-file: section.dat}", ""));
        return Files.writeString(dir.resolve("s.sweep.yaml"), String.join("\n", "base: w.wing.yaml", "parameters:",
                "  sections.a.camber-file: [section.dat, missing.dat, bad.dat]", "  k: [0, 1, 2]",
                "constants: {c: 2.4}", "derived:", "  surfaces.wing.trapezoid.root-chord: c / k",
                "columns: [lift_slope_per_rad, e@CL=0.3, CDi@CL=0.3]", "rank: {by: e@CL=0.3, order: max, keep: 3}",
                ""));
    }

    private static void sameFiles(Path localDir, Path sparkDir, String... names) throws IOException {
        Path l = Files.isDirectory(localDir) ? localDir : localDir.getParent();
        Path s = Files.isDirectory(sparkDir) ? sparkDir : sparkDir.getParent();
        for (String name : List.of(names)) {
            byte[] expected = Files.readAllBytes(l.resolve(name));
            assertTrue(expected.length > 0, name);
            assertArrayEquals(expected, Files.readAllBytes(s.resolve(name)), name + " differs from the local run's");
        }
    }
}
