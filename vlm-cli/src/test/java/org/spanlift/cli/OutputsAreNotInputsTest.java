package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.cli.sweep.Runs;

/**
 * No output may be one of the command's inputs (by name, through a symbolic link or a hard link), nor the
 * same file as another output: each is refused in one line with exit code 2, and every input is left as it
 * was.
 */
class OutputsAreNotInputsTest {

    @TempDir
    Path dir;

    private Path copy(String demo) throws IOException {
        return Files.copy(CliRun.GEOMETRIES.resolve(demo), dir.resolve(demo), StandardCopyOption.REPLACE_EXISTING);
    }

    private static void refused(CliRun r, String option, Path output) {
        assertEquals(2, r.exitCode(), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().startsWith("spanlift: " + option + ": " + output + " is "), r.err());
    }

    private static void unchanged(Path file, byte[] before) throws IOException {
        assertArrayEquals(before, Files.readAllBytes(file), file + " was changed");
    }

    @Test
    void everyCommandRefusesToWriteOverItsInput() throws IOException {
        Path wing = copy("trainer.wing.yaml");
        Path other = copy("rectangular.wing.yaml");
        Path cases = copy("trainer.cases.yaml");
        byte[] w = Files.readAllBytes(wing);
        byte[] c = Files.readAllBytes(cases);
        String[][] runs = {
            {"solve", wing.toString(), "--output", wing.toString()},
            {"stall", wing.toString(), "--assume-cl-max", "--output", wing.toString()},
            {"loads", wing.toString(), "--cases", cases.toString(), "--format", "csv", "--output", cases.toString()},
            {"loads", wing.toString(), "--cases", cases.toString(), "--format", "json", "--output", wing.toString()},
            {"compare", other.toString(), wing.toString(), "--format", "table", "--output", wing.toString()},
        };
        for (String[] run : runs) {
            CliRun r = CliRun.of(run);
            refused(r, "--output", Path.of(run[run.length - 1]));
            assertTrue(r.err().contains("writing it would destroy that input"), r.err());
            unchanged(wing, w);
            unchanged(cases, c);
        }
        Path svg = Files.createLink(dir.resolve("alias.svg"), wing);
        refused(CliRun.of("plot", wing.toString(), "--what", "planform", "--output", svg.toString()), "--output", svg);
        Path html = Files.createSymbolicLink(dir.resolve("alias.html"), wing);
        refused(CliRun.of("report", wing.toString(), "--assume-cl-max", "--output", html.toString()), "--output", html);
        unchanged(wing, w);
        assertTrue(Files.isSymbolicLink(html));
    }

    @Test
    void aCoordinateFileTheWingReadsIsAnInputToo() throws IOException {
        Path coordinates = Files.writeString(dir.resolve("section.dat"), "section\n1.0 0.0\n0.5 0.04\n0.0 0.0\n"
                + "0.5 -0.02\n1.0 0.0\n");
        Path wing = Files.writeString(dir.resolve("w.wing.yaml"), String.join("\n", "units: m", "surfaces:",
                "  - name: wing", "    section: a", "    trapezoid: {span: 9, root-chord: 1.2}", "sections:",
                "  a: {camber-file: section.dat}", ""));
        byte[] before = Files.readAllBytes(coordinates);
        refused(CliRun.of("solve", wing.toString(), "--output", coordinates.toString()), "--output", coordinates);
        unchanged(coordinates, before);
    }

    @Test
    void aLiftCurveFileTheWingReadsIsAnInputToo() throws IOException {
        String curve = "alpha_deg,cl\n-4,-0.2\n-2,0\n0,0.2\n2,0.4\n4,0.55\n6,0.5\n";
        Path clean = Files.writeString(dir.resolve("clean.csv"), curve);
        Path flap = Files.writeString(dir.resolve("flap.csv"), curve.replace("4,0.55", "4,0.7"));
        Path wing = Files.writeString(dir.resolve("w.wing.yaml"), String.join("\n", "units: m", "surfaces:",
                "  - name: wing", "    section: a", "    trapezoid: {span: 9, root-chord: 1.2}", "sections:",
                "  a:", "    lift-curve: {file: clean.csv}", "    flap-lift-curves: [{deflection: 20, file: flap.csv}]",
                ""));
        for (Path input : new Path[] {clean, flap}) {
            byte[] before = Files.readAllBytes(input);
            refused(CliRun.of("solve", wing.toString(), "--output", input.toString()), "--output", input);
            unchanged(input, before);
        }
    }

    @Test
    void twoOutputsOfOneRunMustBeTwoFiles() {
        String wing = CliRun.demo("rectangular.wing.yaml");
        Path points = dir.resolve("o.csv");
        refused(CliRun.of("solve", wing, "--output", points.toString(), "--span-load", points.toString()),
                "--span-load", points);
        Path same = dir.resolve(".").resolve("o.csv");
        refused(CliRun.of("solve", wing, "--output", points.toString(), "--span-load", same.toString()), "--span-load",
                same);
        assertFalse(Files.exists(points));
    }

    @Test
    void aSweepRefusesAnOutputThatIsItsSweepFileOrBaseWing() throws IOException {
        Path sweep = Runs.scenario(dir, Runs.SWEEP);
        Path base = dir.resolve("w.wing.yaml");
        byte[] s = Files.readAllBytes(sweep);
        byte[] b = Files.readAllBytes(base);
        Path hard = Files.createLink(dir.resolve("sweep.csv"), sweep);
        refused(Runs.of("sweep", sweep.toString(), "--output", hard.toString()), "--output", hard);
        Path soft = Files.createSymbolicLink(dir.resolve("base.jsonl"), base);
        refused(Runs.of("sweep", sweep.toString(), "--output", soft.toString()), "--output", soft);
        Path results = dir.resolve("r.csv");
        Path manifest = Files.createSymbolicLink(dir.resolve("r.csv.manifest.json"), base);
        CliRun r = Runs.of("sweep", sweep.toString(), "--output", results.toString());
        assertEquals(2, r.exitCode(), r.err());
        assertTrue(r.err().startsWith("spanlift: the manifest of --output: " + manifest + " is the input file"),
                r.err());
        unchanged(sweep, s);
        unchanged(base, b);
        assertFalse(Files.exists(results));
    }

    @Test
    void mergeRefusesToWriteOverAShard() throws IOException {
        Path sweep = Runs.scenario(dir, Runs.SWEEP);
        Path[] parts = {dir.resolve("s1.csv"), dir.resolve("s2.csv")};
        for (int i = 0; i < 2; i++) {
            assertEquals(0, Runs.of("sweep", sweep.toString(), "-o", parts[i].toString(), "--shard", (i + 1) + "/2")
                    .exitCode());
        }
        byte[] first = Files.readAllBytes(parts[0]);
        byte[] manifest = Files.readAllBytes(dir.resolve("s1.csv.manifest.json"));
        refused(Runs.of("merge", parts[0].toString(), parts[1].toString(), "--output", parts[0].toString()), "--output",
                parts[0]);
        unchanged(parts[0], first);
        unchanged(dir.resolve("s1.csv.manifest.json"), manifest);
    }
}
