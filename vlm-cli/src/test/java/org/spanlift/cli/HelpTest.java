package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import picocli.CommandLine;

class HelpTest {

    @Test
    void everyCommandHasHelp() {
        CommandLine root = SpanliftCommand.commandLine();
        assertHelp();
        for (String name : root.getSubcommands().keySet()) {
            assertHelp(name);
        }
    }

    private static void assertHelp(String... command) {
        String[] args = new String[command.length + 1];
        System.arraycopy(command, 0, args, 0, command.length);
        args[command.length] = "--help";
        CliRun r = CliRun.of(args);
        assertEquals(0, r.exitCode(), String.join(" ", args));
        assertTrue(r.out().contains("Usage:"), r.out());
    }

    /** The help of --format lists what the command writes, and a format outside that list is refused. */
    @ParameterizedTest(name = "{0}")
    // CHECKSTYLE.OFF: LineLength
    @CsvSource(delimiter = '|', value = {
        "solve    | Output format: table, json, csv. Default: from the output file's extension, else table. | html  | W",
        "stall    | Output format: table, json. Default: from the output file's extension, else table.      | csv   | W",
        "loads    | Output format: table, json, csv. Default: from the output file's extension, else table. | svg   | W",
        "plot     | Output format: svg, png. Default: from the output file's extension, else svg.          | table | W --what lift",
        "report   | Output format: html only.                                                               | json  | W",
        "compare  | Output format: table, json, csv, html. Default: from the output file's extension, else table. | png | W W",
        "validate | Output format: table, json. Default: from the output file's extension, else table.      | csv   | --case 2d-lift-slope",
    })
    // CHECKSTYLE.ON: LineLength
    void formatHelpListsOnlyTheCommandsFormats(String command, String help, String refused, String rest) {
        CommandLine.Model.OptionSpec option = SpanliftCommand.commandLine().getSubcommands().get(command)
                .getCommandSpec().findOption("--format");
        assertEquals(help, String.join(" ", option.description()));
        List<String> args = new ArrayList<>(List.of(command, "--format", refused));
        for (String word : rest.split(" ")) {
            args.add(word.equals("W") ? CliRun.demo("trainer.wing.yaml") : word);
        }
        CliRun r = CliRun.of(args.toArray(String[]::new));
        assertEquals(2, r.exitCode(), r.err());
        assertTrue(r.err().contains("this command writes"), r.err());
    }

    /** main builds the command named first alone (start-up); it is the same command as in the full line. */
    @Test
    void aCommandNamedFirstIsBuiltAloneAndIsTheSameCommand() {
        CommandLine full = SpanliftCommand.commandLine();
        for (var e : full.getSubcommands().entrySet()) {
            CommandLine alone = SpanliftCommand.commandLine(e.getKey(), "--help");
            assertEquals(List.of(e.getKey()), List.copyOf(alone.getSubcommands().keySet()));
            assertEquals(e.getValue().getUsageMessage(), alone.getSubcommands().get(e.getKey()).getUsageMessage(),
                    e.getKey());
        }
        assertEquals(full.getSubcommands().keySet(), SpanliftCommand.commandLine("--help").getSubcommands().keySet());
        assertEquals(full.getSubcommands().keySet(), SpanliftCommand.commandLine("slove").getSubcommands().keySet());
        CliRun version = CliRun.of("--version");
        assertEquals(0, version.exitCode());
        StringWriter fullVersion = new StringWriter();
        full.setOut(new PrintWriter(fullVersion));
        assertEquals(0, full.execute("--version"));
        assertEquals(fullVersion.toString(), version.out());
    }

    @Test
    void noCommandIsAUsageError() {
        CliRun r = CliRun.of();
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("a command is required"), r.err());
    }

    @Test
    void unknownOptionIsAUsageError() {
        CliRun r = CliRun.of("solve", "--colour", "x");
        assertEquals(2, r.exitCode());
    }
}
