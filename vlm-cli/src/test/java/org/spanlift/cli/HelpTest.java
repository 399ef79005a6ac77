package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

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
