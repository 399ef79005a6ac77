package org.spanlift.benchmarks;

import java.nio.file.Files;
import java.nio.file.Path;
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
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.Spacing;
import org.spanlift.results.Solution;
import org.spanlift.solve.WingAnalysis;

/**
 * The demo trainer wing at 24 strips x 6 rows per half (144 unknowns in its symmetric system) and at the default
 * lattice, 32 x 8 (256 unknowns; {@code lattice} sets it), solved over the nine angles of attack of
 * {@code spanlift solve}'s
 * default list (-4 to 12 degrees in steps of 2), coefficients included. The file is read once, in setup.
 *
 * <ul>
 * <li>{@link #sweep}: the whole job, {@code WingAnalysis.of(wing)} (lattice, assembly and factorization of
 * the symmetric system, basis solves; the ailerons stay at zero, so the antisymmetric system is not built) and
 * then nine solves with their coefficients;</li>
 * <li>{@link #analysis}: {@code WingAnalysis.of(wing)} alone;</li>
 * <li>{@link #solves}: the nine solves and coefficients alone, on an analysis built in setup.</li>
 * </ul>
 * The last two split the first, measured in the same run.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(value = 1, jvmArgsAppend = {"-Xms1g", "-Xmx1g"})
@Warmup(iterations = 4, time = 1)
@Measurement(iterations = 5, time = 1)
public class TrainerBenchmark {

    /** Strips x rows per half, cosine both ways: 24x6 (the first speed aim's) and 32x8 (the default lattice). */
    @Param({"24x6", "32x8"})
    public String lattice;

    /** Angles of attack of the sweep, degrees: the default list of {@code spanlift solve}. */
    static final double[] ALPHAS_DEG = {-4, -2, 0, 2, 4, 6, 8, 10, 12};

    /** The wing file, relative to the repository root (or to {@code benchmarks/}). */
    @Param({"geometries/trainer.wing.yaml"})
    public String wingFile;

    private Wing wing;
    private WingAnalysis built;
    private double[] alphas;

    @Setup
    public void setup() {
        String[] sr = lattice.split("x");
        wing = WingFileReader.read(locate(wingFile)).withLattice(new LatticeSpec(Integer.parseInt(sr[0]),
                Integer.parseInt(sr[1]), Spacing.COSINE, Spacing.COSINE));
        built = WingAnalysis.of(wing);
        alphas = new double[ALPHAS_DEG.length];
        for (int i = 0; i < alphas.length; i++) {
            alphas[i] = Math.toRadians(ALPHAS_DEG[i]);
        }
        double check = sweepOf(built, alphas);
        if (!Double.isFinite(check)) {
            throw new IllegalStateException("the trainer sweep gave a non-finite result");
        }
    }

    @Benchmark
    public double sweep(CpuClock clock) {
        clock.count();
        return sweepOf(WingAnalysis.of(wing), alphas);
    }

    @Benchmark
    public WingAnalysis analysis(CpuClock clock) {
        clock.count();
        return WingAnalysis.of(wing);
    }

    @Benchmark
    public double solves(CpuClock clock) {
        clock.count();
        return sweepOf(built, alphas);
    }

    /** Nine solves with their coefficients; returns a sum of them all so that none is dead code. */
    static double sweepOf(WingAnalysis analysis, double[] alphas) {
        double sum = 0;
        for (double a : alphas) {
            Solution s = analysis.solve(a);
            var c = s.coefficients();
            sum += c.lift() + c.inducedDrag() + c.pitchingMoment() + c.rollingMoment()
                    + c.spanEfficiency().orElse(0);
        }
        return sum;
    }

    /** Finds the wing file from the repository root or from the benchmarks module directory. */
    static Path locate(String file) {
        Path p = Path.of(file);
        if (Files.isRegularFile(p) || p.isAbsolute()) {
            return p;
        }
        Path up = Path.of("..").resolve(file);
        return Files.isRegularFile(up) ? up : p;
    }
}
