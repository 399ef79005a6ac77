package org.spanlift.spark;

import java.io.IOException;
import java.io.Serializable;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.concurrent.ConcurrentHashMap;
import java.util.stream.Stream;

import org.spanlift.batch.CaseResult;
import org.spanlift.cli.options.InputFiles;
import org.spanlift.io.SweepFileReader;
import org.spanlift.sweep.Parameter;
import org.spanlift.sweep.Sweep;

/**
 * What an executor needs to rebuild a sweep exactly as the driver read it: the sweep file's path as given, the
 * driver's working folder, and the text of every file the sweep reads (the sweep file, its base wing file, the
 * files the base wing's sections name, and the files a swept {@code camber-file} or lift-curve {@code file}
 * names), each under its absolute path on the driver. Plain strings and bytes only: no engine type crosses
 * the wire.
 *
 * <p>On an executor, {@link #open} writes the files once per JVM into a private folder that mirrors the
 * driver's paths (the driver's {@code /a/b/wing.yaml} at {@code TMP/a/b/wing.yaml}), reads the sweep there with
 * {@link SweepFileReader} (so each task builds its own {@code CaseEvaluator} from the same text), and checks
 * that its fingerprint is the driver's. Relative paths keep their meaning because the sweep file is read through
 * the mirrored working folder. A case's error message names files by the executor's paths; {@link
 * Opened#restore} gives them back their driver's spelling, so a row is byte for byte the local runner's.
 */
public final class SweepBundle implements Serializable {

    private static final long serialVersionUID = 1L;

    /** Largest file shipped: the readers refuse anything larger. */
    static final long MAX_FILE_BYTES = 16L * 1024 * 1024;

    private static final Map<String, Opened> OPENED = new ConcurrentHashMap<>();

    private final String run;
    private final String sweepFile;
    private final String basePath;
    private final String workingFolder;
    private final boolean force;
    private final String fingerprint;
    private final LinkedHashMap<String, byte[]> files;

    private SweepBundle(String sweepFile, String basePath, String workingFolder, boolean force, String fingerprint,
            LinkedHashMap<String, byte[]> files) {
        this.run = UUID.randomUUID().toString();
        this.sweepFile = sweepFile;
        this.basePath = basePath;
        this.workingFolder = workingFolder;
        this.force = force;
        this.fingerprint = fingerprint;
        this.files = files;
    }

    /**
     * The bundle of a sweep the driver has read from {@code sweepFile}.
     *
     * @param force as given to {@link SweepFileReader#read}
     */
    public static SweepBundle of(Path sweepFile, Sweep sweep, boolean force) {
        List<Path> paths = new ArrayList<>();
        paths.add(sweepFile);
        paths.add(sweep.basePath());
        paths.addAll(InputFiles.sectionFiles(sweep.baseTree(), sweep.basePath()));
        Path baseFolder = sweep.basePath().toAbsolutePath().getParent();
        for (Parameter p : sweep.parameters()) {
            if (p.isRange() || p.isVariable() || !namesFile(p.key())) {
                continue;
            }
            for (long i = 0; i < p.gridCount(); i++) {
                try {
                    paths.add(baseFolder.resolve(p.gridValue(i)));
                } catch (InvalidPathException e) {
                    // the case's row says what is wrong with it
                }
            }
        }
        LinkedHashMap<String, byte[]> files = new LinkedHashMap<>();
        for (Path p : paths) {
            Path abs = p.toAbsolutePath().normalize();
            String key = abs.toString();
            if (files.containsKey(key) || !Files.isRegularFile(abs)) {
                continue;
            }
            try {
                if (Files.size(abs) <= MAX_FILE_BYTES) {
                    files.put(key, Files.readAllBytes(abs));
                }
            } catch (IOException e) {
                // left out: the executor's reader then reports the file as the driver's would
            }
        }
        return new SweepBundle(sweepFile.toString(), sweep.basePath().toString(),
                Path.of("").toAbsolutePath().toString(), force, sweep.fingerprint(), files);
    }

    private static boolean namesFile(String path) {
        return path.endsWith(".camber-file") || path.endsWith(".file");
    }

    /** How many files the executors get. */
    public int fileCount() {
        return files.size();
    }

    /** The files' total size in bytes. */
    public long bytes() {
        return files.values().stream().mapToLong(b -> b.length).sum();
    }

    /** The sweep rebuilt on this JVM (once per JVM and run; every task of the run shares it). */
    public Opened open() {
        return OPENED.computeIfAbsent(run, r -> materialize());
    }

    private Opened materialize() {
        try {
            Path root = Files.createTempDirectory("spanlift-spark-").toAbsolutePath();
            Runtime.getRuntime().addShutdownHook(new Thread(() -> delete(root)));
            for (Map.Entry<String, byte[]> f : files.entrySet()) {
                Path target = mirror(root, f.getKey());
                Files.createDirectories(target.getParent());
                Files.write(target, f.getValue());
            }
            Path work = mirror(root, workingFolder);
            Files.createDirectories(work);
            Path given = Path.of(sweepFile);
            Path local = given.isAbsolute() ? mirror(root, sweepFile) : work.resolve(given);
            Sweep sweep = SweepFileReader.read(local, force);
            if (!sweep.fingerprint().equals(fingerprint)) {
                throw new IllegalStateException("the sweep read on this executor differs from the driver's");
            }
            return new Opened(sweep, local.toString(), sweepFile, sweep.basePath().toString(), basePath,
                    root.toString());
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the sweep's files on this executor", e);
        }
    }

    /** A driver's absolute path under {@code root}. */
    private static Path mirror(Path root, String absolute) {
        Path p = Path.of(absolute);
        Path inside = p.getRoot() == null ? p : p.getRoot().relativize(p);
        Path target = root.resolve(inside.toString()).normalize();
        if (!target.startsWith(root)) {
            throw new IllegalStateException("a path outside the executor's folder: " + absolute);
        }
        return target;
    }

    private static void delete(Path root) {
        try (Stream<Path> walk = Files.walk(root)) {
            walk.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // a temporary folder left behind
        }
    }

    /**
     * A sweep rebuilt on an executor, with what turns its file names back into the driver's.
     *
     * @param sweep the sweep, read from the executor's copies
     */
    public record Opened(Sweep sweep, String localSweep, String driverSweep, String localBase, String driverBase,
            String root) {

        /** The result with file names in its error message as the driver spells them. */
        public CaseResult restore(CaseResult r) {
            if (r.error() == null) {
                return r;
            }
            String m = r.error().replace(localSweep, driverSweep).replace(localBase, driverBase).replace(root, "");
            return new CaseResult(r.index(), r.id(), r.values(), r.derived(), r.results(), r.feasible(), m);
        }
    }
}
