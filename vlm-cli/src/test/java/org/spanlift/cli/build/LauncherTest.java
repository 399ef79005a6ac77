package org.spanlift.cli.build;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.DisabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/**
 * The Unix launcher of the release archive ({@code src/dist/bin/spanlift}), run by {@code sh} in an archive
 * layout with a stand-in Java that prints its arguments: how it finds Java, refuses one older than 17 in one line,
 * and what it passes on. (The archive check runs it with the real jar and Java after packaging.)
 */
@DisabledOnOs(OS.WINDOWS)
class LauncherTest {

    private static final Path LAUNCHER = Path.of("src", "dist", "bin", "spanlift");

    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
    }

    /** An unpacked archive: bin/spanlift and lib/spanlift.jar (the jar's content does not matter here). */
    private Path archive() throws IOException {
        Path home = dir.resolve("spanlift-home");
        Files.createDirectories(home.resolve("bin"));
        Files.createDirectories(home.resolve("lib"));
        Path launcher = home.resolve("bin").resolve("spanlift");
        Files.copy(LAUNCHER, launcher);
        Files.setPosixFilePermissions(launcher, PosixFilePermissions.fromString("rwxr-xr-x"));
        Files.writeString(home.resolve("lib").resolve("spanlift.jar"), "stand-in");
        return home;
    }

    /**
     * A Java home whose bin/java prints each argument on a line (and, asked for its version, the given one), with a
     * release file when {@code release} is not null.
     */
    private Path javaHome(String name, String release, String reported) throws IOException {
        Path home = dir.resolve(name);
        Files.createDirectories(home.resolve("bin"));
        Path java = home.resolve("bin").resolve("java");
        Files.writeString(java, "#!/bin/sh\n"
                + "if [ \"$1\" = -version ]; then echo 'openjdk version \"" + reported
                + "\" 2020-01-01' >&2; exit 0; fi\n"
                + "for a in \"$@\"; do echo \"$a\"; done\n");
        Files.setPosixFilePermissions(java, PosixFilePermissions.fromString("rwxr-xr-x"));
        if (release != null) {
            Files.writeString(home.resolve("release"), "IMPLEMENTOR=\"Test\"\nJAVA_VERSION=\"" + release + "\"\n");
        }
        return home;
    }

    /** A PATH holding only the tools the launcher uses besides Java. */
    private Path toolsWithoutJava() throws IOException {
        Path bin = dir.resolve("tools");
        Files.createDirectories(bin);
        for (String tool : List.of("dirname", "sed", "readlink", "head")) {
            Path wrapper = bin.resolve(tool);                  // not a link: the temp folder keeps its files inside
            Files.writeString(wrapper, "#!/bin/sh\nexec '" + which(tool) + "' \"$@\"\n");
            Files.setPosixFilePermissions(wrapper, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
        return bin;
    }

    private static Path which(String tool) {
        for (String entry : System.getenv("PATH").split(":")) {
            Path p = Path.of(entry, tool);
            if (Files.isExecutable(p)) {
                return p.toAbsolutePath();
            }
        }
        throw new AssertionError(tool + " is not on PATH");
    }

    private Run run(Path launcher, Map<String, String> env, String... args) throws Exception {
        List<String> command = new ArrayList<>(List.of(launcher.toString()));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command).directory(dir.toFile());
        Map<String, String> environment = pb.environment();
        environment.remove("JAVA_HOME");
        environment.remove("JAVA_OPTS");
        for (Map.Entry<String, String> e : env.entrySet()) {
            if (e.getValue() == null) {
                environment.remove(e.getKey());
            } else {
                environment.put(e.getKey(), e.getValue());
            }
        }
        Path out = dir.resolve("out.txt");
        Path err = dir.resolve("err.txt");
        Process p = pb.redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "the launcher did not finish");
        return new Run(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                Files.readString(err, StandardCharsets.UTF_8));
    }

    private static Map<String, String> env(String... pairs) {
        Map<String, String> m = new HashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            m.put(pairs[i], pairs[i + 1]);
        }
        return m;
    }

    @Test
    void runsTheJarWithJavaFromJavaHome() throws Exception {
        Path home = archive();
        Path java = javaHome("jdk17", "17.0.2", "17.0.2");
        Run r = run(home.resolve("bin/spanlift"), env("JAVA_HOME", java.toString()), "solve", "wing file.yaml");
        assertEquals(0, r.code(), r.err());
        List<String> args = r.out().lines().toList();
        String jar = home.toRealPath().resolve("lib/spanlift.jar").toString();
        assertEquals(List.of("-jar", jar, "solve", "wing file.yaml"), args.subList(args.size() - 4, args.size()));
        assertTrue(args.contains("-Djava.awt.headless=true"), r.out());
        assertTrue(args.contains("-XX:TieredStopAtLevel=1"), r.out());
        assertEquals("", r.err());
    }

    @Test
    void longRunsKeepTheFullCompilerAndJavaOptsGoFirst() throws Exception {
        Path home = archive();
        Path java = javaHome("jdk21", "21.0.1", "21.0.1");
        Run r = run(home.resolve("bin/spanlift"), env("JAVA_HOME", java.toString(), "JAVA_OPTS", "-Xmx2g -Dx=1"),
                "sweep", "s.sweep.yaml");
        assertEquals(0, r.code(), r.err());
        List<String> args = r.out().lines().toList();
        assertFalse(args.contains("-XX:TieredStopAtLevel=1"), r.out());
        assertEquals(List.of("-Xmx2g", "-Dx=1"), args.subList(0, 2));
    }

    @Test
    void findsJavaOnThePathAndThroughALinkToTheLauncher() throws Exception {
        Path home = archive();
        Path java = javaHome("jdk17", "17.0.2", "17.0.2");
        Path tools = toolsWithoutJava();
        Path link = dir.resolve("links").resolve("spanlift");
        Files.createDirectories(link.getParent());
        Files.createSymbolicLink(link, home.resolve("bin/spanlift"));
        Run r = run(link, env("PATH", java.resolve("bin") + ":" + tools), "stall", "w.yaml");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains(home.toRealPath().resolve("lib/spanlift.jar").toString()), r.out());
    }

    @Test
    void refusesJavaOlderThan17InOneLine() throws Exception {
        Path home = archive();
        for (String[] version : new String[][] {{"11.0.2", "Java 11.0.2"}, {"1.8.0_292", "Java 1.8.0_292"}}) {
            Path java = javaHome("old" + version[0], version[0], version[0]);
            Run r = run(home.resolve("bin/spanlift"), env("JAVA_HOME", java.toString()), "solve", "w.yaml");
            assertEquals(2, r.code(), r.err());
            assertEquals("", r.out());
            assertEquals(1, r.err().lines().count(), r.err());
            assertTrue(r.err().startsWith("spanlift: needs Java 17 or later, but "), r.err());
            assertTrue(r.err().contains(version[1]), r.err());
        }
    }

    @Test
    void asksJavaItsVersionWhenThereIsNoReleaseFile() throws Exception {
        Path home = archive();
        Run old = run(home.resolve("bin/spanlift"), env("JAVA_HOME", javaHome("old", null, "11.0.2").toString()), "x");
        assertEquals(2, old.code(), old.err());
        assertTrue(old.err().contains("Java 11.0.2"), old.err());
        Run ok = run(home.resolve("bin/spanlift"), env("JAVA_HOME", javaHome("new", null, "17.0.9").toString()), "x");
        assertEquals(0, ok.code(), ok.err());
    }

    @Test
    void noJavaIsOneLine() throws Exception {
        Path home = archive();
        Run r = run(home.resolve("bin/spanlift"), env("PATH", toolsWithoutJava().toString()), "solve", "w.yaml");
        assertEquals(2, r.code());
        assertEquals("spanlift: no Java found; install a Java 17 or later runtime, or set JAVA_HOME to one\n", r.err());

        Run wrongHome = run(home.resolve("bin/spanlift"), env("JAVA_HOME", dir.resolve("nowhere").toString()), "x");
        assertEquals(2, wrongHome.code());
        assertEquals(1, wrongHome.err().lines().count(), wrongHome.err());
        assertTrue(wrongHome.err().contains("has no bin/java"), wrongHome.err());
    }

    @Test
    void aMissingJarIsOneLine() throws Exception {
        Path home = archive();
        Files.delete(home.resolve("lib/spanlift.jar"));
        Run r = run(home.resolve("bin/spanlift"), env("JAVA_HOME", javaHome("jdk", "17", "17").toString()), "x");
        assertEquals(2, r.code());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().contains("lib/spanlift.jar is missing"), r.err());
    }
}
