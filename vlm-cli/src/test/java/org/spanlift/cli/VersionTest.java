package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;

/** {@code spanlift --version}: the version from the pom and the commit the build recorded. */
class VersionTest {

    @Test
    void printsTheVersionTheCommitAndTheRuntime() {
        CliRun r = CliRun.of("--version");
        assertEquals(0, r.exitCode(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals(3, lines.size(), r.out());
        assertEquals("spanlift " + System.getProperty("spanlift.test.version"), lines.get(0));
        assertTrue(lines.get(1).matches("commit ([0-9a-f]{12}(-dirty)?|unknown)"), lines.get(1));
        assertTrue(lines.get(2).startsWith("java " + System.getProperty("java.version") + " "), lines.get(2));
        assertEquals("", r.err());
    }

    @Test
    void theShortOptionToo() {
        assertEquals(CliRun.of("--version").out(), CliRun.of("-V").out());
    }

    /** Built in a git checkout, the commit is the checkout's HEAD (whose sources the build compiled). */
    @Test
    void theCommitIsTheCheckoutsHead() throws Exception {
        Optional<String> head = gitHead();
        String commit = VersionProvider.commit();
        if (head.isEmpty()) {
            return;                                        // not a checkout, or no git: nothing to compare
        }
        assertTrue(commit.equals(head.get()) || commit.equals(head.get() + "-dirty"), commit + " vs " + head.get());
    }

    private static Optional<String> gitHead() throws IOException, InterruptedException {
        if (!Files.exists(Path.of("..", ".git"))) {
            return Optional.empty();
        }
        Process git;
        try {
            git = new ProcessBuilder("git", "rev-parse", "--short=12", "HEAD")
                    .redirectError(ProcessBuilder.Redirect.DISCARD)
                    .start();
        } catch (IOException noGit) {
            return Optional.empty();
        }
        String out = new String(git.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        if (!git.waitFor(60, TimeUnit.SECONDS) || git.exitValue() != 0) {
            return Optional.empty();
        }
        return Optional.of(out);
    }
}
