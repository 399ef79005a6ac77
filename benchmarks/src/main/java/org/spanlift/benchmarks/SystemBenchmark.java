package org.spanlift.benchmarks;

import java.util.concurrent.TimeUnit;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.decomposition.lu.LUDecompositionAlt_DDRM;
import org.ejml.dense.row.linsol.lu.LinearSolverLu_DDRM;
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
import org.openjdk.jmh.infra.BenchmarkParams;
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;
import org.spanlift.solve.InfluenceSystem;
import org.spanlift.solve.Symmetry;

/**
 * Influence assembly alone and LU factorization alone, for a given number of unknowns of the half-span
 * symmetric system (the system {@code WingAnalysis} solves for alpha and flaps).
 *
 * <p>The wing is a tapered, swept trapezoid with dihedral and washout, no controls, 10 chordwise rows and
 * unknowns / 10 cosine-spaced strips per half, so the lattice has exactly {@code unknowns} panels per half.
 *
 * <ul>
 * <li>{@link #assemble}: {@code InfluenceSystem.assemble(lattice, SYMMETRIC)}, n^2 entries, each two
 * horseshoe evaluations (the panel and its mirror image);</li>
 * <li>{@link #factorize}: the factorization {@code InfluenceSystem} performs on that matrix, EJML's
 * {@code LinearSolverLu_DDRM} over {@code LUDecompositionAlt_DDRM} (LU with partial pivoting, about
 * 2/3 n^3 flops), a new solver per call as in the engine. The input matrix is copied, not modified.</li>
 * <li>{@link #factorizeBlocked}: a measuring stick, not engine code: {@link BlockedLu}, the same
 * factorization blocked for the cache, checked in setup against the engine's solution.</li>
 * </ul>
 *
 * At 2000 unknowns one factorization takes seconds, so an iteration is a single call there: the counts
 * are kept small to hold a full run within a few minutes.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = {"-Xms1g", "-Xmx1g"})
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
public class SystemBenchmark {

    /** Chordwise rows per strip of the benchmark wing. */
    static final int ROWS = 10;

    @Param({"500", "1000", "2000"})
    public int unknowns;

    private Lattice lattice;
    private DMatrixRMaj matrix;

    @Setup
    public void setup(BenchmarkParams params) {
        lattice = LatticeBuilder.build(wing(unknowns));
        if (lattice.halfCount() != unknowns) {
            throw new IllegalStateException("lattice has " + lattice.halfCount() + " unknowns, not " + unknowns);
        }
        matrix = InfluenceSystem.assemble(lattice, Symmetry.SYMMETRIC);
        if (new LinearSolverLu_DDRM(new LUDecompositionAlt_DDRM()).modifiesA()) {
            throw new IllegalStateException("the factorization modifies its input; the benchmark needs a copy");
        }
        if (params.getBenchmark().endsWith(".factorizeBlocked")) {
            checkBlocked();
        }
    }

    @Benchmark
    public DMatrixRMaj assemble(CpuClock clock) {
        clock.count();
        return InfluenceSystem.assemble(lattice, Symmetry.SYMMETRIC);
    }

    @Benchmark
    public LinearSolverLu_DDRM factorize(CpuClock clock) {
        clock.count();
        LinearSolverLu_DDRM solver = new LinearSolverLu_DDRM(new LUDecompositionAlt_DDRM());
        if (!solver.setA(matrix)) {
            throw new IllegalStateException("singular benchmark matrix");
        }
        return solver;
    }

    @Benchmark
    public Object factorizeBlocked(CpuClock clock) {
        clock.count();
        return BlockedLu.factor(matrix.data, unknowns);
    }

    /** The reference factorization must solve the system as well as the engine's does. */
    private void checkBlocked() {
        int n = unknowns;
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = -lattice.nz(i);
        }
        double[] x = BlockedLu.factor(matrix.data, n).solve(b);
        LinearSolverLu_DDRM engine = new LinearSolverLu_DDRM(new LUDecompositionAlt_DDRM());
        engine.setA(matrix);
        DMatrixRMaj y = new DMatrixRMaj(n, 1);
        engine.solve(new DMatrixRMaj(n, 1, true, b), y);
        double diff = 0;
        double norm = 0;
        for (int i = 0; i < n; i++) {
            diff = Math.max(diff, Math.abs(x[i] - y.data[i]));
            norm = Math.max(norm, Math.abs(y.data[i]));
        }
        if (!(diff <= 1e-9 * norm)) {
            throw new IllegalStateException("blocked LU disagrees with the engine's: " + diff + " over " + norm);
        }
    }

    /** A trapezoid wing with {@code unknowns} panels per half: unknowns / 10 strips of 10 rows. */
    static Wing wing(int unknowns) {
        if (unknowns % ROWS != 0) {
            throw new IllegalArgumentException("unknowns must be a multiple of " + ROWS + ", got " + unknowns);
        }
        String yaml = """
                name: Benchmark trapezoid
                units: m
                surfaces:
                  - name: wing
                    trapezoid: {span: 10.0, root-chord: 1.6, taper: 0.5, sweep: 5, dihedral: 3, washout: 2}
                    lattice: {strips: %d, rows: %d, strip-spacing: cosine, row-spacing: uniform}
                """.formatted(unknowns / ROWS, ROWS);
        return WingFileReader.parse(yaml, "benchmark-" + unknowns + ".wing.yaml");
    }
}
