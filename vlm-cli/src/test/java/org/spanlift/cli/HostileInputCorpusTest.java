package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every file of the hostile-input corpus (vlm-core's test resources {@code bad-wings}, {@code bad-cases},
 * {@code bad-envelopes}, {@code bad-sweeps}, {@code bad-coordinates} and {@code bad-lift-curves}) is refused by
 * the command line: run as the wing file of {@code solve}, {@code stall} and {@code loads}, and as what it is (a
 * cases or envelope file of {@code loads}, a sweep file, the coordinate file or the lift-curve file of a wing's
 * section), each run ends with exit code 2,
 * exactly one line on standard error and no output file, well within a time limit. Why each file is refused is
 * pinned by vlm-core's {@code BadWingFileTest} and {@code HostileFilesTest}.
 */
class HostileInputCorpusTest {

    private static final Path RESOURCES = Path.of("..", "vlm-core", "src", "test", "resources");
    private static final List<String> FOLDERS = List.of("bad-wings", "bad-cases", "bad-envelopes", "bad-sweeps",
            "bad-coordinates", "bad-lift-curves");
    /** Generous: a refusal takes milliseconds, the runs with the demo wing a second or so. */
    private static final Duration LIMIT = Duration.ofSeconds(20);
    private static final String TRAINER = CliRun.demo("trainer.wing.yaml");

    static Stream<Path> corpus() throws IOException {
        List<Path> files = new ArrayList<>();
        for (String folder : FOLDERS) {
            try (Stream<Path> s = Files.list(RESOURCES.resolve(folder))) {
                s.filter(Files::isRegularFile).sorted().forEach(files::add);
            }
        }
        return files.stream();
    }

    @Test
    void theCorpusIsWellPastOneHundredFiles() throws IOException {
        assertTrue(corpus().count() >= 150, "files: " + corpus().count());
    }

    /** The command lines that must refuse the file, each writing (were it to succeed) into {@code out}. */
    private static List<String[]> runs(Path file, Path out, Path work) throws IOException {
        String folder = file.getParent().getFileName().toString();
        List<String[]> runs = new ArrayList<>();
        List<String> wings = new ArrayList<>(List.of(file.toString()));
        if (folder.equals("bad-coordinates")) {
            Path wing = work.resolve("section-from-" + file.getFileName() + ".wing.yaml");
            Files.writeString(wing, "units: m\nsurfaces:\n  - name: wing\n    section: main\n"
                    + "    trapezoid: {span: 9, root-chord: 1.2}\nsections:\n  main: {camber-file: \""
                    + file.toAbsolutePath().normalize() + "\", cl-max: 1.4}\n");
            wings.add(wing.toString());
        }
        if (folder.equals("bad-lift-curves")) {
            Path wing = work.resolve("lift-curve-from-" + file.getFileName() + ".wing.yaml");
            Files.writeString(wing, "units: m\nsurfaces:\n  - name: wing\n    section: main\n"
                    + "    trapezoid: {span: 9, root-chord: 1.2}\nsections:\n  main: {lift-curve: {file: \""
                    + file.toAbsolutePath().normalize() + "\"}}\n");
            wings.add(wing.toString());
        }
        for (String wing : wings) {
            runs.add(new String[] {"solve", wing, "--output", out.resolve("solve.json").toString()});
            runs.add(new String[] {"stall", wing, "--weight", "750kg", "--assume-cl-max", "--output",
                out.resolve("stall.json").toString()});
            runs.add(new String[] {"loads", wing, "--weight", "750kg", "--load-factor", "3.8", "--speed", "102kt",
                "--output", out.resolve("loads.csv").toString()});
            runs.add(new String[] {"balance", wing, "--cg", "25%mac", "--weight", "750kg", "--assume-cl-max",
                "--output", out.resolve("balance.txt").toString()});
        }
        switch (folder) {
            case "bad-cases" -> runs.add(new String[] {"loads", TRAINER, "--cases", file.toString(), "--output",
                out.resolve("cases.csv").toString()});
            case "bad-envelopes" -> runs.add(new String[] {"loads", TRAINER, "--envelope", file.toString(), "--output",
                out.resolve("envelope.csv").toString()});
            case "bad-sweeps" -> runs.add(new String[] {"sweep", file.toString(), "-j", "1", "--output",
                out.resolve("sweep.csv").toString()});
            default -> {
            }
        }
        return runs;
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("corpus")
    void everyCommandRefusesTheFileInOneLineWithoutWritingOutput(Path file, @TempDir Path dir) throws IOException {
        Path out = Files.createDirectory(dir.resolve("out"));
        List<String[]> runs = runs(file, out, dir);
        assertTimeoutPreemptively(LIMIT, () -> {
            for (String[] args : runs) {
                String command = String.join(" ", args);
                CliRun r = CliRun.of(args);
                assertEquals(SpanliftCommand.EXIT_BAD_INPUT, r.exitCode(), command + ": " + r.err());
                assertEquals(1, r.err().lines().count(), command + ": " + r.err());
                assertTrue(r.err().startsWith("spanlift: "), command + ": " + r.err());
                assertEquals("", r.out(), command);
                try (Stream<Path> written = Files.list(out)) {
                    assertEquals(List.of(), written.toList(), command + " left a file behind");
                }
            }
        }, () -> file + " took more than " + LIMIT.toSeconds() + " s");
    }
}
