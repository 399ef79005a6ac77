package org.spanlift.benchmarks;

import java.util.List;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.spanlift.cli.sweep.RowFormat;
import org.spanlift.cli.sweep.SweepRunner;
import org.spanlift.io.SweepFileReader;
import org.spanlift.sweep.Sweep;

/**
 * A planform sweep at the default lattice (32 x 8 per half), {@code benchmarks/planform.sweep.yaml}: 429 cases
 * of the tourer's trapezoid, taper x sweep x span, each a new geometry (assembly and factorization), with the
 * lift slope, e and CDi at CL 0.5 and the stall onset. One call runs the whole sweep through the command's
 * own runner ({@code SweepRunner}: a pool of {@code jobs} threads, rows formatted as CSV and dropped), so the
 * rate, cases per second, is 429 over the wall time per call. Steady: the JVM is warm, its start is left out
 * (the command line's timing in {@code run.sh} includes it).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = {"-Xms1g", "-Xmx1g"})
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
public class SweepBenchmark {

    @Param({"benchmarks/planform.sweep.yaml"})
    public String sweepFile;

    @Param({"1", "2"})
    public int jobs;

    private Sweep sweep;
    private List<String> names;

    @Setup
    public void setup() {
        sweep = SweepFileReader.read(TrainerBenchmark.locate(sweepFile), false);
        names = RowFormat.columnNames(sweep);
        if (run() != sweep.design().count()) {
            throw new IllegalStateException("some benchmark cases failed");
        }
    }

    /** Runs every case; returns how many succeeded. */
    @Benchmark
    public long run() {
        long[] ok = new long[1];
        SweepRunner.run(sweep, 0, sweep.design().count(), jobs, r -> RowFormat.CSV.row(names, sweep, r),
                (r, row) -> ok[0] += r.failed() ? 0 : 1);
        return ok[0];
    }
}
