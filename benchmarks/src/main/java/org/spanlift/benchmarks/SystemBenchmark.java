package org.spanlift.benchmarks;

import java.util.concurrent.TimeUnit;

import org.ejml.data.DMatrixRMaj;
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
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;
import org.spanlift.solve.InfluenceSystem;
import org.spanlift.solve.Symmetry;
import org.spanlift.solve.linear.DenseLu;
import org.spanlift.solve.linear.LuOptions;

/**
 * The symmetric half-span system (the one {@code WingAnalysis} solves for alpha and flaps) at a given number
 * of unknowns: assembly alone, factorization alone by each implementation behind the solver seam, and the
 * whole system as the engine builds it.
 *
 * <p>The wing is a tapered, swept trapezoid with dihedral and washout, no controls, cosine-spaced strips of
 * 8 rows (256, 512 unknowns) or 10 rows (1000, 2000), so the lattice has exactly {@code unknowns} panels per
 * half (256: the default lattice's 32 x 8).
 *
 * <ul>
 * <li>{@link #assemble}: {@code InfluenceSystem.assemble(lattice, SYMMETRIC)}, one thread, n^2 entries, each
 * two horseshoes (the panel and its mirror image);</li>
 * <li>{@link #luEjml}, {@link #luTiled1}, {@link #luTiled2}: {@code DenseLu} with EJML's LU, the tiled LU on
 * one thread and on two (about 2/3 n^3 flops each; the input is copied, since a factorization may overwrite
 * it, and the copy is timed with it);</li>
 * <li>{@link #system1}, {@link #system2}: {@code InfluenceSystem.of(lattice, SYMMETRIC, options)} with the
 * tiled LU on one thread and on two: assembly and factorization, both split between the threads in the
 * second.</li>
 * </ul>
 * Every LU is checked in setup to give EJML's solution bit for bit. With two threads the benchmark thread's
 * CPU time leaves out the other thread's: read their wall times.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = {"-Xms1g", "-Xmx1g"})
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
public class SystemBenchmark {

    static final LuOptions EJML = new LuOptions(LuOptions.Method.EJML, 1);
    static final LuOptions TILED_1 = new LuOptions(LuOptions.Method.TILED, 1);
    static final LuOptions TILED_2 = new LuOptions(LuOptions.Method.TILED, 2);

    @Param({"256", "512", "1000", "2000"})
    public int unknowns;

    private Lattice lattice;
    private DMatrixRMaj matrix;

    @Setup
    public void setup() {
        lattice = LatticeBuilder.build(wing(unknowns));
        if (lattice.halfCount() != unknowns) {
            throw new IllegalStateException("lattice has " + lattice.halfCount() + " unknowns, not " + unknowns);
        }
        matrix = InfluenceSystem.assemble(lattice, Symmetry.SYMMETRIC);
        double[] b = new double[unknowns];
        for (int i = 0; i < unknowns; i++) {
            b[i] = -lattice.nz(i);
        }
        double[] reference = solve(EJML, b);
        for (LuOptions o : new LuOptions[] {TILED_1, TILED_2}) {
            if (!java.util.Arrays.equals(reference, solve(o, b))) {
                throw new IllegalStateException(o + " does not give EJML's solution bit for bit");
            }
        }
    }

    private double[] solve(LuOptions options, double[] b) {
        DenseLu lu = DenseLu.create(options);
        lu.factor(matrix.data.clone(), unknowns);
        double[] x = new double[unknowns];
        lu.solve(b, x);
        return x;
    }

    @Benchmark
    public DMatrixRMaj assemble(CpuClock clock) {
        clock.count();
        return InfluenceSystem.assemble(lattice, Symmetry.SYMMETRIC);
    }

    @Benchmark
    public DenseLu luEjml(CpuClock clock) {
        return factor(EJML, clock);
    }

    @Benchmark
    public DenseLu luTiled1(CpuClock clock) {
        return factor(TILED_1, clock);
    }

    @Benchmark
    public DenseLu luTiled2(CpuClock clock) {
        return factor(TILED_2, clock);
    }

    @Benchmark
    public InfluenceSystem system1(CpuClock clock) {
        clock.count();
        return InfluenceSystem.of(lattice, Symmetry.SYMMETRIC, TILED_1);
    }

    @Benchmark
    public InfluenceSystem system2(CpuClock clock) {
        clock.count();
        return InfluenceSystem.of(lattice, Symmetry.SYMMETRIC, TILED_2);
    }

    private DenseLu factor(LuOptions options, CpuClock clock) {
        clock.count();
        DenseLu lu = DenseLu.create(options);
        lu.factor(matrix.data.clone(), unknowns);
        if (!(lu.pivotRatio() > 0)) {
            throw new IllegalStateException("singular benchmark matrix");
        }
        return lu;
    }

    /** A trapezoid wing with {@code unknowns} panels per half: 8 rows below 1000 unknowns, else 10. */
    static Wing wing(int unknowns) {
        int rows = unknowns < 1000 ? 8 : 10;
        if (unknowns % rows != 0) {
            throw new IllegalArgumentException("unknowns must be a multiple of " + rows + ", got " + unknowns);
        }
        String yaml = """
                name: Benchmark trapezoid
                units: m
                surfaces:
                  - name: wing
                    trapezoid: {span: 10.0, root-chord: 1.6, taper: 0.5, sweep: 5, dihedral: 3, washout: 2}
                    lattice: {strips: %d, rows: %d, strip-spacing: cosine, row-spacing: uniform}
                """.formatted(unknowns / rows, rows);
        return WingFileReader.parse(yaml, "benchmark-" + unknowns + ".wing.yaml");
    }
}
