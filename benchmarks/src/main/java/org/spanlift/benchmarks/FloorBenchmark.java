package org.spanlift.benchmarks;

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
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;

/**
 * The floor under the assembly of {@link SystemBenchmark}'s symmetric system: its square roots and divisions
 * alone. For each of the n rows the assembly takes two square roots and two divisions per trailing point of
 * the lattice (the distance to the point, the leg's cosine term) and three divisions per bound leg (both
 * halves); these are the operations the vector unit is slowest at, so the assembly cannot take less than they
 * take at the machine's throughput. {@link #sqrtDivide} runs exactly those counts in loops over arrays of the
 * same lengths, which the JIT vectorizes, and nothing else.
 *
 * <p>The report divides the assembly's time by this floor: how far the assembly is from the machine's limit
 * for the way it is written (another formulation, with fewer roots or divisions, would have a lower floor).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = {"-Xms1g", "-Xmx1g"})
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
public class FloorBenchmark {

    @Param({"256"})
    public int unknowns;

    private int rows;
    private double[] x;
    private double[] y;
    private double[] out;
    private double[] u;
    private double[] v;
    private double[] w;

    @Setup
    public void setup() {
        Lattice lattice = LatticeBuilder.build(SystemBenchmark.wing(unknowns));
        rows = lattice.halfCount();
        int points = lattice.trailingPointCount();
        int panels = lattice.panelCount();
        x = new double[points];
        y = new double[points];
        out = new double[points];
        u = new double[panels];
        v = new double[panels];
        w = new double[panels];
        for (int k = 0; k < points; k++) {
            x[k] = 1.0 + 0.001 * k;
            y[k] = 2.0 + 0.002 * k;
        }
        for (int j = 0; j < panels; j++) {
            u[j] = 1.0 + 0.003 * j;
            v[j] = 3.0 + 0.001 * j;
        }
    }

    /** Per row: two square roots and two divisions per trailing point, three divisions per bound leg. */
    @Benchmark
    public double sqrtDivide(CpuClock clock) {
        clock.count();
        double sum = 0;
        for (int i = 0; i < rows; i++) {
            double p = 1e-6 * i;
            for (int k = 0; k < out.length; k++) {
                out[k] = (x[k] + p) / Math.sqrt(y[k] + p);
            }
            for (int k = 0; k < out.length; k++) {
                out[k] += (y[k] + p) / Math.sqrt(x[k] + p);
            }
            for (int j = 0; j < w.length; j++) {
                w[j] = (u[j] + p) / v[j];
            }
            for (int j = 0; j < w.length; j++) {
                w[j] += v[j] / (u[j] + p);
            }
            for (int j = 0; j < w.length; j++) {
                w[j] = w[j] / (v[j] + p);
            }
            sum += out[i % out.length] + w[i % w.length];
        }
        return sum;
    }
}
