package org.spanlift.cli.build;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.cli.SpanliftCommand;
import org.spanlift.cli.VersionProvider;

/** The completion script and man pages that the build ships in the release archive. */
class GenerateDocsTest {

    @TempDir
    Path dir;

    @Test
    void oneManPagePerCommandAndACompletionScriptThatKnowsThemAll() throws Exception {
        List<Path> written = GenerateDocs.write(dir);
        Set<String> commands = SpanliftCommand.commandLine().getSubcommands().keySet();

        Set<String> pages = new TreeSet<>();
        try (var files = Files.list(dir.resolve("man"))) {
            files.forEach(p -> pages.add(p.getFileName().toString()));
        }
        Set<String> expected = new TreeSet<>(Set.of("spanlift.adoc"));
        commands.forEach(c -> expected.add("spanlift-" + c + ".adoc"));
        assertEquals(expected, pages);
        assertEquals(pages.size() + 1, written.size());

        String solve = Files.readString(dir.resolve("man/spanlift-solve.adoc"), StandardCharsets.UTF_8);
        assertTrue(solve.contains(":mansource: spanlift " + VersionProvider.version()), solve);
        assertTrue(solve.contains("= spanlift-solve(1)"), solve);
        // the command's own --format help, as the program prints it
        assertTrue(solve.contains("Output format: table, json, csv."), solve);

        String completion = Files.readString(dir.resolve("bin/spanlift_completion"), StandardCharsets.UTF_8);
        assertTrue(completion.startsWith("#!/usr/bin/env bash"), completion.lines().findFirst().orElse(""));
        for (String c : commands) {
            assertTrue(completion.contains(c), "the completion script lacks " + c);
        }
        assertTrue(completion.contains("--span-load"), "the completion script lacks solve's options");
    }

    @Test
    void theSameCommandsGiveTheSameFiles() throws Exception {
        GenerateDocs.write(dir.resolve("a"));
        GenerateDocs.write(dir.resolve("b"));
        for (String f : List.of("bin/spanlift_completion", "man/spanlift.adoc", "man/spanlift-loads.adoc")) {
            assertEquals(-1L, Files.mismatch(dir.resolve("a").resolve(f), dir.resolve("b").resolve(f)), f);
        }
    }
}
