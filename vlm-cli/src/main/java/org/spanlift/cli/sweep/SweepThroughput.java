package org.spanlift.cli.sweep;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Arrays;

import org.spanlift.io.SweepFileReader;
import org.spanlift.sweep.Sweep;

/**
 * A JMH-free measurement of sweep throughput, cases per second, on an invented trapezoid wing with a
 * lattice of 24 x 6 per half, each case giving the lift slope, e at CL 0.5 and the stall onset: (a)
 * planform varying (taper and span: a new factorization per case), (b) only twist varying (washout: one
 * factorization, new right-hand sides), each at 1 and 2 threads. Rows are formatted as for a file and
 * dropped. Every thread count is warmed up before any is measured (measuring one thread first, straight
 * after a single warm-up, had credited two threads with more than twice the rate). Run with {@code java -cp
 * vlm-cli/target/spanlift.jar org.spanlift.cli.sweep.SweepThroughput} (optional arguments: seconds per measurement,
 * thread counts). Figures are for comparison side by side in one run on one machine.
 */
public final class SweepThroughput {

    private static final String WING = """
            name: Throughput wing (invented)
            units: m
            surfaces:
              - name: wing
                section: main
                trapezoid: {span: 10.4, root-chord: 1.7, taper: 0.5, dihedral: 4, washout: 2}
                controls:
                  - {name: flap, kind: flap, from: 0.5, to: 2.8, chord-fraction: 0.25}
                  - {name: aileron, kind: aileron, from: 3.1, to: 4.9, chord-fraction: 0.24}
                lattice: {strips: 24, rows: 6}
            sections:
              main: {camber: NACA 4415, cl-max: 1.45}
            """;

    private static final String PLANFORM = """
            base: w.wing.yaml
            parameters:
              surfaces.wing.trapezoid.taper: {from: 0.3, to: 1.0, step: 0.001}
              surfaces.wing.trapezoid.span: {from: 10.0, to: 12.0, step: 0.01}
            columns: [lift_slope_per_rad, e@CL=0.5, stall.CL, stall.eta]
            """;

    private static final String TWIST = """
            base: w.wing.yaml
            parameters:
              surfaces.wing.trapezoid.washout: {from: -5, to: 5, step: 0.00001}
            columns: [lift_slope_per_rad, e@CL=0.5, stall.CL, stall.eta]
            """;

    private SweepThroughput() {
    }

    public static void main(String[] args) throws IOException {
        double seconds = args.length > 0 ? Double.parseDouble(args[0]) : 10;
        List<Integer> jobs = args.length > 1 ? Arrays.stream(args).skip(1).map(Integer::valueOf).toList()
                : List.of(1, 2);
        Path dir = Files.createTempDirectory("spanlift-throughput");
        try {
            Files.writeString(dir.resolve("w.wing.yaml"), WING, StandardCharsets.UTF_8);
            Sweep planform = SweepFileReader.read(write(dir, "p.sweep.yaml", PLANFORM), false);
            Sweep twist = SweepFileReader.read(write(dir, "t.sweep.yaml", TWIST), false);
            System.out.printf(Locale.ROOT, "sweep throughput, lattice 24 x 6 per half, %d cores available, %.0f s per "
                    + "figure%n",
                    Runtime.getRuntime().availableProcessors(), seconds);
            for (Sweep s : List.of(planform, twist)) {
                for (int j : jobs) {
                    measure(s, j, Math.min(3, seconds));
                }
                double base = 0;
                for (int j : jobs) {
                    double rate = measure(s, j, seconds);
                    if (base == 0) {
                        base = rate;
                    }
                    System.out.printf(Locale.ROOT, "  %-16s --jobs %d: %8.0f cases/s  (x%.2f)%n",
                            s == planform ? "planform varies" : "twist only", j, rate, rate / base);
                }
            }
        } finally {
            for (String f : List.of("w.wing.yaml", "p.sweep.yaml", "t.sweep.yaml")) {
                Files.deleteIfExists(dir.resolve(f));
            }
            Files.deleteIfExists(dir);
        }
    }

    private static Path write(Path dir, String name, String text) {
        try {
            return Files.writeString(dir.resolve(name), text, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Runs batches of cases until the time is up; returns cases per second. */
    private static double measure(Sweep s, int jobs, double seconds) {
        List<String> names = RowFormat.columnNames(s);
        long[] sink = new long[1];
        long start = System.nanoTime();
        long cases = 0;
        long first = 0;
        long batch = 200L * jobs;
        while (System.nanoTime() - start < seconds * 1e9) {
            long end = Math.min(s.design().count(), first + batch);
            SweepRunner.Outcome o = SweepRunner.run(s, first, end, jobs,
                    r -> RowFormat.CSV.row(names, s, r), (r, row) -> sink[0] += row.length());
            if (o.failed() > 0) {
                throw new IllegalStateException(o.failed() + " cases failed in the measurement");
            }
            cases += o.cases();
            first = end % s.design().count();
        }
        return cases / ((System.nanoTime() - start) / 1e9);
    }
}
