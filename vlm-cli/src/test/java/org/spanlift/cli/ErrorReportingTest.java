package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * Every failure reaches the user as one line on standard error with the right exit code: bad options and
 * values out of their physical range (2), usage (2), refusals of the engine naming the input file (2), and an
 * error of the Java runtime such as running out of memory (3).
 */
class ErrorReportingTest {

    private static final String TRAINER = CliRun.demo("trainer.wing.yaml");

    /** A command that fails as the runtime does when memory runs out. */
    @Command(name = "exhaust")
    static final class Exhaust implements Callable<Integer> {
        @Override
        public Integer call() {
            throw new OutOfMemoryError("Java heap space");
        }
    }

    private static void refused(CliRun r, String... fragments) {
        assertEquals(2, r.exitCode(), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().startsWith("spanlift: "), r.err());
        assertEquals("", r.out());
        for (String f : fragments) {
            assertTrue(r.err().contains(f), "[" + f + "] in: " + r.err());
        }
    }

    @Test
    void runningOutOfMemoryIsOneLineWithExitCodeThree() {
        CommandLine cl = SpanliftCommand.commandLine();
        cl.addSubcommand("exhaust", new Exhaust());
        StringWriter err = new StringWriter();
        cl.setErr(new PrintWriter(err));
        cl.setOut(new PrintWriter(new StringWriter()));
        int code = cl.execute("exhaust");
        assertEquals(SpanliftCommand.EXIT_INTERNAL, code);
        assertEquals("spanlift: internal error: ran out of memory (Java heap space); please report it, with the input "
                + "that caused it\n", err.toString().replace(System.lineSeparator(), "\n"));
    }

    @Test
    void usageErrorIsOneLineThatPointsAtHelp() {
        CliRun missing = CliRun.of("solve");
        refused(missing, "Missing required parameter: 'FILE' (see 'spanlift solve --help')");
        CliRun unknown = CliRun.of("stall", TRAINER, "--bogus");
        refused(unknown, "Unknown option: '--bogus' (see 'spanlift stall --help')");
        refused(CliRun.of(), "spanlift: a command is required (see 'spanlift --help')");
    }

    @Test
    void refusalOfTheEngineNamesTheWingFile(@TempDir Path dir) throws IOException {
        // cl_max 4 everywhere on a wing of aspect ratio 2: no station reaches it on the rising branch.
        Path wing = Files.writeString(dir.resolve("high.wing.yaml"), """
                units: m
                surfaces:
                  - name: wing
                    section: s
                    trapezoid: {span: 2, root-chord: 1}
                sections:
                  s: {cl-max: 4}
                """);
        refused(CliRun.of("stall", wing.toString()), wing + ": no station reaches its cl_max in linear theory");
    }

    @ParameterizedTest(name = "{0} {1}")
    // CHECKSTYLE.OFF: LineLength
    @CsvSource(delimiter = '|', value = {
        "--speed       | 1e160m/s  | --speed: a speed must be from 0.1 m/s to 1000 m/s",
        "--true-speed  | 1e-300kt  | --true-speed: a speed must be from 0.1 m/s to 1000 m/s",
        "--weight      | 1e307kg   | --weight: a weight must be from 0.01 N to 1e7 N",
        "--altitude    | 1e200m    | --altitude: a pressure altitude must be from -2000 m to 47000 m (geopotential, the standard atmosphere's range), got 1e200 m",
        "--isa-offset  | 1000000K  | --isa-offset: a temperature offset from the standard atmosphere must be from -100 K to 100 K",
        "--isa-offset  | -400K     | --isa-offset: a temperature offset",
        "--load-factor | 0x1p1     | --load-factor: expected a decimal number (such as 1.25 or 3e-2), got \"0x1p1\"",
        "--load-factor | 2d        | --load-factor: expected a decimal number",
        "--load-factor | 1e-99999  | --load-factor: expected a decimal number (such as 1.25 or 3e-2) with an exponent of at most 3 digits",
    })
    // CHECKSTYLE.ON: LineLength
    void flightValuesOutsideTheirRangeAreRefusedUnderTheirOption(String option, String value, String fragment) {
        Map<String, String> options = new LinkedHashMap<>(Map.of("--weight", "750kg", "--speed", "102kt",
                "--load-factor", "3.8"));
        if (option.equals("--true-speed")) {
            options.remove("--speed");
        }
        options.put(option, value);
        // solve takes every flight option (loads refuses --isa-offset: its cases are on a standard day)
        List<String> args = new ArrayList<>(List.of("solve", TRAINER));
        options.forEach((k, v) -> args.addAll(List.of(k, v)));
        refused(CliRun.of(args.toArray(String[]::new)), fragment);
    }

    @Test
    void hugeNumbersAreShownShort() {
        CliRun r = CliRun.of("solve", TRAINER, "--weight", "750kg", "--altitude", "1" + "0".repeat(39) + "m");
        refused(r, "--altitude");
        assertTrue(r.err().length() < 200, r.err());
        assertFalse(r.err().contains("0".repeat(30)), r.err());
    }

    @Test
    void wingMassBeyondAnyAircraftIsRefused() {
        refused(CliRun.of("loads", TRAINER, "--weight", "750kg", "--speed", "102kt", "--load-factor", "3.8",
                "--wing-mass", "1e307kg"), "--wing-mass: a mass must be from 0 kg to 1e6 kg");
        refused(CliRun.of("loads", TRAINER, "--weight", "750kg", "--speed", "102kt", "--load-factor", "3.8",
                "--wing-mass", "-5kg"), "--wing-mass: a mass must be from 0 kg");
    }

    @Test
    void angleListsAreCountedBeforeTheyAreMade() {
        refused(CliRun.of("solve", TRAINER, "--alpha", "0:4:1e-300"), "--alpha: at most 1000 angles");
        refused(CliRun.of("solve", TRAINER, "--alpha", "0,".repeat(1000) + "0"),
                "--alpha: at most 1000 angles, got 1001");
        refused(CliRun.of("solve", TRAINER, "--alpha", "0x1p1"), "--alpha: expected degrees");
        refused(CliRun.of("solve", TRAINER, "--flaps", "1e-99999"), "--flaps: expected a flap deflection in degrees");
    }

    @Test
    void devicesThatNeverEndAreRefusedAtTheSizeLimit() {
        for (String device : new String[] {"/dev/zero", "/dev/urandom"}) {
            if (Files.exists(Path.of(device))) {
                refused(CliRun.of("solve", device), device + ":", "the file goes on past 16 MiB");
            }
        }
    }
}
