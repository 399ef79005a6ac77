package org.spanlift.cli.options;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.cli.CliRun;
import org.spanlift.cli.sweep.Runs;

/**
 * Where an output goes: a FIFO or a device is streamed into and never replaced, a folder is refused, a
 * symbolic link is written through to its target (the link stays), every output is checked before any is
 * written, temporary files stay beside their target with short names, and a full disk is the
 * environment's error (exit 2), not a bug.
 */
class OutputTargetTest {

    @TempDir
    Path dir;

    private final ExecutorService readers = Executors.newCachedThreadPool(r -> {
        Thread t = new Thread(r, "fifo-reader");
        t.setDaemon(true);
        return t;
    });

    @AfterEach
    void stopReaders() {
        readers.shutdownNow();
    }

    private static final String WING = CliRun.demo("rectangular.wing.yaml");

    private Path fifo(String name) throws InterruptedException {
        Path p = dir.resolve(name);
        int exit;
        try {
            exit = new ProcessBuilder("mkfifo", p.toString()).redirectErrorStream(true).start().waitFor();
        } catch (IOException e) {
            exit = -1;
        }
        assumeTrue(exit == 0, "mkfifo is not available here");
        return p;
    }

    private static boolean isFifoOrDevice(Path p) throws IOException {
        BasicFileAttributes a = Files.readAttributes(p, BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
        return a.isOther();
    }

    private Set<String> namesIn(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).collect(Collectors.toSet());
        }
    }

    private static void refusedInOneLine(CliRun r, String text) {
        assertEquals(2, r.exitCode(), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().contains(text), r.err());
    }

    @Test
    void aFifoIsStreamedIntoAndStaysAFifo() throws Exception {
        Path fifo = fifo("points");
        Future<byte[]> read = readers.submit(() -> Files.readAllBytes(fifo));
        CliRun r = CliRun.of("solve", WING, "--alpha", "0,4", "--format", "csv", "--output", fifo.toString());
        assertEquals(0, r.exitCode(), r.err());
        String expected = CliRun.of("solve", WING, "--alpha", "0,4", "--format", "csv").out();
        assertEquals(expected, new String(read.get(30, TimeUnit.SECONDS), StandardCharsets.UTF_8));
        assertTrue(isFifoOrDevice(fifo), "the FIFO was not replaced by a file");
        assertEquals(Set.of("points"), namesIn(dir));
    }

    @Test
    void aSweepStreamsItsRowsIntoAFifoWithoutAManifest() throws Exception {
        Path sweep = Runs.scenario(dir, Runs.SWEEP);
        Path fifo = fifo("rows.csv");
        Future<byte[]> read = readers.submit(() -> Files.readAllBytes(fifo));
        CliRun r = CliRun.of("sweep", sweep.toString(), "--output", fifo.toString(), "--jobs", "2");
        assertEquals(0, r.exitCode(), r.err());
        String expected = CliRun.of("sweep", sweep.toString(), "--jobs", "2").out();
        assertEquals(expected, new String(read.get(60, TimeUnit.SECONDS), StandardCharsets.UTF_8));
        assertTrue(isFifoOrDevice(fifo));
        assertEquals(Set.of("rows.csv", "s.sweep.yaml", "w.wing.yaml"), namesIn(dir));
        CliRun resume = CliRun.of("sweep", sweep.toString(), "--output", fifo.toString(), "--resume");
        refusedInOneLine(resume, "--resume: needs a results file to finish");
    }

    @Test
    void aFolderIsRefusedByEveryKindOfWriter() throws IOException {
        Path folder = Files.createDirectory(dir.resolve("out.csv"));
        refusedInOneLine(CliRun.of("solve", WING, "--output", folder.toString()), "--output: " + folder
                + " is a folder");
        refusedInOneLine(CliRun.of("solve", WING, "--span-load", folder.toString()), "--span-load: " + folder
                + " is a folder");
        Path sweep = Runs.scenario(dir, Runs.SWEEP);
        refusedInOneLine(CliRun.of("sweep", sweep.toString(), "--output", folder.toString()), "is a folder");
        refusedInOneLine(CliRun.of("merge", "a.csv", "--output", folder.toString()), "is a folder");
        assertTrue(Files.isDirectory(folder));
        try (Stream<Path> s = Files.list(folder)) {
            assertEquals(0, s.count());
        }
    }

    @Test
    void aSymbolicLinkIsWrittenThroughAndStaysALink() throws IOException {
        Path store = Files.createDirectory(dir.resolve("store"));
        Path target = Files.writeString(store.resolve("target.csv"), "old\n");
        Path link = Files.createSymbolicLink(dir.resolve("out.csv"), Path.of("store", "target.csv"));
        CliRun r = CliRun.of("solve", WING, "--alpha", "2", "--output", link.toString());
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(Files.isSymbolicLink(link));
        assertEquals(Path.of("store", "target.csv"), Files.readSymbolicLink(link));
        assertEquals(CliRun.of("solve", WING, "--alpha", "2", "--format", "csv").out(), Runs.read(target));
        assertEquals(Set.of("target.csv"), namesIn(store), "the temporary file was beside the target");

        Path dangling = Files.createSymbolicLink(dir.resolve("new.csv"), Path.of("store", "new-target.csv"));
        assertEquals(0, CliRun.of("solve", WING, "--alpha", "2", "--output", dangling.toString()).exitCode());
        assertEquals(Runs.read(target), Runs.read(store.resolve("new-target.csv")));
        assertTrue(Files.isSymbolicLink(dangling));
    }

    @Test
    void aSweepThroughALinkKeepsItsManifestBesideTheTargetAndResumesThroughEither() throws IOException {
        Path sweep = Runs.scenario(dir, Runs.SWEEP);
        Path store = Files.createDirectory(dir.resolve("store"));
        Path link = Files.createSymbolicLink(dir.resolve("link.csv"), store.resolve("results.csv"));
        CliRun r = CliRun.of("sweep", sweep.toString(), "--output", link.toString());
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(Files.isSymbolicLink(link));
        assertEquals(Set.of("results.csv", "results.csv.manifest.json", "results.ranked.csv"), namesIn(store));
        assertEquals(Set.of("link.csv", "store", "s.sweep.yaml", "w.wing.yaml"), namesIn(dir));
        Path whole = dir.resolve("whole.csv");
        assertEquals(0, CliRun.of("sweep", sweep.toString(), "--output", whole.toString()).exitCode());
        assertEquals(Runs.read(whole), Runs.read(link));
        String text = Runs.read(link);
        Files.writeString(store.resolve("results.csv"), text.substring(0, text.length() / 2));
        CliRun viaLink = CliRun.of("sweep", sweep.toString(), "--output", link.toString(), "--resume");
        assertEquals(0, viaLink.exitCode(), viaLink.err());
        assertEquals(text, Runs.read(link));
        CliRun viaTarget = CliRun.of("sweep", sweep.toString(), "--output", store.resolve("results.csv").toString(),
                "--resume");
        assertEquals(0, viaTarget.exitCode(), viaTarget.err());
        assertEquals(text, Runs.read(link));
    }

    @Test
    void everyOutputIsCheckedBeforeAnyIsWritten() throws IOException {
        Path points = dir.resolve("points.csv");
        CliRun r = CliRun.of("solve", WING, "--output", points.toString(), "--span-load",
                dir.resolve("nope").resolve("s.csv").toString());
        refusedInOneLine(r, "--span-load: the folder " + dir.resolve("nope") + " of ");
        assertFalse(Files.exists(points));

        Path sweep = Runs.scenario(dir, Runs.SWEEP);
        Path nowhere = Files.createSymbolicLink(dir.resolve("r.csv"), dir.resolve("missing").resolve("r.csv"));
        CliRun s = CliRun.of("sweep", sweep.toString(), "--output", nowhere.toString());
        refusedInOneLine(s, "the folder " + dir.resolve("missing"));
        assertEquals(Set.of("r.csv", "s.sweep.yaml", "w.wing.yaml"), namesIn(dir), "no stray manifest");
    }

    @Test
    void aNameNearTheLimitGetsAShortTemporaryNameAndALongerOneIsRefused() throws IOException {
        String name = "x".repeat(251) + ".csv";
        Path out = dir.resolve(name);
        CliRun r = CliRun.of("solve", WING, "--alpha", "2", "--output", out.toString());
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(Set.of(name), namesIn(dir));
        Path tooLong = dir.resolve("y".repeat(252) + ".csv");
        refusedInOneLine(CliRun.of("solve", WING, "--output", tooLong.toString()),
                "bytes long; expected a name of at most 255");

        Path sweep = Runs.scenario(dir, Runs.SWEEP);
        CliRun s = CliRun.of("sweep", sweep.toString(), "--output", dir.resolve("z".repeat(245) + ".csv").toString());
        refusedInOneLine(s, "the manifest of --output: the file name ");
        assertEquals(Set.of(name, "s.sweep.yaml", "w.wing.yaml"), namesIn(dir));
    }

    @Test
    void aPngNeedsNoTemporaryFolder() throws IOException {
        Path cache = Files.createDirectory(dir.resolve("cache"));
        boolean used = ImageIO.getUseCache();
        File before = ImageIO.getCacheDirectory();
        try {
            ImageIO.setUseCache(true);
            ImageIO.setCacheDirectory(cache.toFile());
            Files.delete(cache);
            Path png = dir.resolve("planform.png");
            CliRun r = CliRun.of("plot", WING, "--what", "planform", "--output", png.toString());
            assertEquals(0, r.exitCode(), r.err());
            byte[] head = new byte[8];
            System.arraycopy(Files.readAllBytes(png), 0, head, 0, 8);
            assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'}, head);
            assertEquals(Set.of("planform.png"), namesIn(dir));
        } finally {
            ImageIO.setCacheDirectory(before);
            ImageIO.setUseCache(used);
        }
    }

    @Test
    void aFullDiskIsTheEnvironmentsErrorInOneLine() throws Exception {
        Path full = Path.of("/dev/full");
        assumeTrue(Files.exists(full) && isFifoOrDevice(full), "no /dev/full here");
        CliRun solve = CliRun.of("solve", WING, "--output", full.toString());
        refusedInOneLine(solve, "--output: cannot write /dev/full (");
        Path sweep = Runs.scenario(dir, Runs.SWEEP);
        Path rows = Files.createSymbolicLink(dir.resolve("rows.csv"), full);
        CliRun s = CliRun.of("sweep", sweep.toString(), "--output", rows.toString());
        refusedInOneLine(s, "--output: cannot write " + rows + " (");
        assertFalse(s.err().contains("internal error"), s.err());
        assertTrue(isFifoOrDevice(full), "/dev/full is still the device");
        assertTrue(Files.isSymbolicLink(rows));
        assertEquals(List.of(), List.copyOf(namesIn(dir).stream().filter(n -> n.contains("manifest")).toList()));
    }
}
