package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every JSON output is byte-identical from one Java process to the next: nothing in it depends on an
 * iteration order that varies between runs (such as the salted order of {@code Map.of} and {@code Set.of}).
 */
class JsonAcrossRunsTest {

    @TempDir
    Path dir;

    @Test
    void everyJsonOutputIsTheSameInTwoFreshProcesses() throws Exception {
        String trainer = CliRun.demo("trainer.wing.yaml");
        List<List<String>> commands = List.of(
                List.of("solve", trainer, "--weight", "750kg", "--speed", "90kt", "--format", "json"),
                List.of("stall", trainer, "--weight", "750kg", "--flaps", "20", "--format", "json"),
                List.of("loads", trainer, "--cases", CliRun.demo("trainer.cases.yaml"), "--format", "json"),
                List.of("loads", trainer, "--envelope", CliRun.demo("trainer.envelope.yaml"), "--format", "json"),
                List.of("compare", trainer, CliRun.demo("tourer.wing.yaml"), "--weight", "750kg", "--assume-cl-max",
                        "--format", "json"),
                List.of("washout", trainer, "--aileron-margin", "0.1", "--weight", "750kg", "--format", "json"),
                List.of("washout", trainer, "--aileron-margin", "0.1", "--weight", "750kg", "--twist-stations", "4",
                        "--format", "json"));
        for (List<String> command : commands) {
            byte[] first = run(command, "a");
            // a salted order differs from one process to the next by chance: three runs make a miss unlikely
            for (String tag : List.of("b", "c")) {
                assertArrayEquals(first, run(command, tag), "processes differ: " + command);
            }
        }
    }

    /** Runs the command in a new Java process and returns its output file's bytes. */
    private byte[] run(List<String> command, String tag) throws IOException, InterruptedException {
        Path out = dir.resolve(command.get(0) + "-" + tag + ".json");
        List<String> args = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-XX:TieredStopAtLevel=1", "-Djava.awt.headless=true", "-cp", System.getProperty("java.class.path"),
                SpanliftCommand.class.getName()));
        args.addAll(command);
        args.addAll(List.of("--output", out.toString()));
        Process p = new ProcessBuilder(args).redirectErrorStream(true)
                .redirectOutput(dir.resolve(tag + ".log").toFile())
                .start();
        assertEquals(0, p.waitFor(), () -> command + ": " + read(dir.resolve(tag + ".log")));
        return Files.readAllBytes(out);
    }

    private static String read(Path p) {
        try {
            return Files.readString(p);
        } catch (IOException e) {
            return "(no log)";
        }
    }
}
