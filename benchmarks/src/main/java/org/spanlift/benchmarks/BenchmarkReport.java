package org.spanlift.benchmarks;

import java.lang.management.ManagementFactory;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import org.openjdk.jmh.profile.GCProfiler;
import org.openjdk.jmh.results.Result;
import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.results.format.ResultFormatType;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.options.ChainedOptionsBuilder;
import org.openjdk.jmh.runner.options.CommandLineOptions;
import org.openjdk.jmh.runner.options.OptionsBuilder;

/**
 * Runs the Spanlift benchmarks through the JMH API and prints a summary of figures measured side by side
 * in the one run: the trainer sweep and its split, and at each size the assembly and factorization times,
 * the factorization's rate in GFLOP/s (2/3 n^3 flops over the measured mean time), the assembly's share and
 * the growth from one size to the next.
 *
 * <p>Arguments are JMH's own ({@code -f}, {@code -wi}, {@code -i}, {@code -p unknowns=500}, a benchmark
 * regex, ...); without a regex every benchmark of this package runs, without {@code -rff} the JSON result
 * goes to {@code benchmarks/target/jmh-result.json}, and without {@code -prof} the GC profiler is added
 * (allocation per call).
 *
 * <p>Every time is given twice: wall time per call (JMH's score) and CPU time of the benchmark thread per
 * call (see {@link CpuClock}). On a quiet machine they agree; where they do not, other processes took the
 * cores and the CPU figure is the steadier one.
 */
public final class BenchmarkReport {

    private static final String PACKAGE = "org.spanlift.benchmarks.";

    private BenchmarkReport() {
    }

    public static void main(String[] args) throws Exception {
        CommandLineOptions cmd = new CommandLineOptions(args);
        ChainedOptionsBuilder b = new OptionsBuilder().parent(cmd);
        if (cmd.getIncludes().isEmpty()) {
            b.include("^" + PACKAGE.replace(".", "\\.") + ".*Benchmark\\.");
        }
        if (!cmd.getResult().hasValue()) {
            b.result("benchmarks/target/jmh-result.json");
        }
        if (!cmd.getResultFormat().hasValue()) {
            b.resultFormat(ResultFormatType.JSON);
        }
        if (cmd.getProfilers().isEmpty()) {
            b.addProfiler(GCProfiler.class);
        }
        double loadBefore = load();
        Collection<RunResult> results = new Runner(b.build()).run();
        double loadAfter = load();
        System.out.println();
        System.out.print(summary(results, loadBefore, loadAfter));
    }

    private static double load() {
        return ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
    }

    /** One benchmark's figures. */
    record Row(String name, String unknowns, double wall, double wallError, double cpu, double allocated) {
    }

    static String summary(Collection<RunResult> results, double loadBefore, double loadAfter) {
        List<Row> rows = new ArrayList<>();
        for (RunResult r : results) {
            Result<?> p = r.getPrimaryResult();
            String name = r.getParams().getBenchmark();
            if (name.startsWith(PACKAGE)) {
                name = name.substring(PACKAGE.length());
            }
            var sec = r.getSecondaryResults();
            double cpu = Double.NaN;
            if (sec.containsKey("cpuNanos") && sec.containsKey("calls") && sec.get("calls").getScore() > 0) {
                cpu = sec.get("cpuNanos").getScore() / sec.get("calls").getScore() * 1e-9;
            }
            double alloc = sec.containsKey("gc.alloc.rate.norm") ? sec.get("gc.alloc.rate.norm").getScore()
                    : Double.NaN;
            String n = "";
            for (String key : List.of("unknowns", "lattice", "jobs")) {
                if (r.getParams().getParamsKeys().contains(key)) {
                    n = r.getParams().getParam(key);
                }
            }
            rows.add(new Row(name, n, seconds(p.getScore(), p.getScoreUnit()),
                    seconds(p.getScoreError(), p.getScoreUnit()), cpu, alloc));
        }
        StringBuilder out = new StringBuilder();
        out.append("=== Spanlift benchmark summary (one run, side by side) ===\n");
        out.append(String.format(Locale.ROOT, "machine: %d cores; load average (1 min) %.1f before, %.1f after%s%n",
                Runtime.getRuntime().availableProcessors(), loadBefore, loadAfter,
                Math.max(loadBefore, loadAfter) > Runtime.getRuntime().availableProcessors()
                        ? " -- LOADED: wall times are inflated, prefer the CPU columns" : ""));
        out.append("wall = JMH mean wall time per call (+- 99.9% error); cpu = benchmark-thread CPU time per call;\n");
        out.append("alloc = bytes allocated per call (GC profiler)\n\n");
        for (String lattice : List.of("24x6", "32x8")) {
            trainer(rows, lattice, out);
        }
        systems(rows, out);
        sweep(rows, out);
        return out.toString();
    }

    private static void trainer(List<Row> rows, String lattice, StringBuilder out) {
        Optional<Row> sweep = find(rows, "TrainerBenchmark.sweep", lattice);
        Optional<Row> analysis = find(rows, "TrainerBenchmark.analysis", lattice);
        Optional<Row> solves = find(rows, "TrainerBenchmark.solves", lattice);
        if (sweep.isEmpty() && analysis.isEmpty() && solves.isEmpty()) {
            return;
        }
        String[] sr = lattice.split("x");
        out.append(String.format(Locale.ROOT, "Trainer wing, %s per half (%d unknowns per system), 9 alphas with "
                + "coefficients%n",
                lattice.replace("x", " x "), Integer.parseInt(sr[0]) * Integer.parseInt(sr[1])));
        out.append(String.format(Locale.ROOT, "  %-34s %12s %10s %10s %12s %9s%n", "benchmark", "wall ms", "+-",
                "cpu ms", "alloc kB", "cpu share"));
        double total = sweep.map(Row::cpu).orElse(Double.NaN);
        for (Optional<Row> o : List.of(sweep, analysis, solves)) {
            o.ifPresent(r -> out.append(String.format(Locale.ROOT, "  %-34s %s %s %s %s %s%%%n",
                    label(r.name()), num(r.wall() * 1e3, 3, 12), num(r.wallError() * 1e3, 3, 10),
                    num(r.cpu() * 1e3, 3, 10), num(r.allocated() / 1024, 1, 12), num(100 * r.cpu() / total, 0, 8))));
        }
        sweep.ifPresent(r -> out.append(String.format(Locale.ROOT, "  target: under 5 ms warm -> %s (wall %.2f ms, cpu "
                + "%.2f ms)%n",
                r.wall() < 5e-3 ? "met" : (r.cpu() < 5e-3 ? "met on CPU time, not on wall time" : "NOT met"),
                r.wall() * 1e3, r.cpu() * 1e3)));
        out.append('\n');
    }

    /** Benchmarks of the system table, in column order. */
    private static final List<String> SYSTEM_COLUMNS = List.of("assemble", "luEjml", "luTiled1", "luTiled2", "system1",
            "system2");

    private static void systems(List<Row> rows, StringBuilder out) {
        Map<Integer, Row[]> bySize = new TreeMap<>();
        for (Row r : rows) {
            if (!r.name().startsWith("SystemBenchmark.")) {
                continue;
            }
            int column = SYSTEM_COLUMNS.indexOf(r.name().substring("SystemBenchmark.".length()));
            if (column >= 0) {
                bySize.computeIfAbsent(Integer.parseInt(r.unknowns()), k -> new Row[SYSTEM_COLUMNS.size()])[column] = r;
            }
        }
        if (bySize.isEmpty()) {
            return;
        }
        out.append("Symmetric half-span system (trapezoid wing): assembly, LU by each implementation, the whole "
                + "system\n");
        out.append("  LU: ms wall and GFLOP/s = (2/3 n^3) / wall time; tiled 1 and 2 = the engine's LU on one and two "
                + "threads\n");
        out.append("  (bit-identical to EJML's); system = InfluenceSystem.of (assembly + LU) with the tiled LU, 1 and "
                + "2 threads\n");
        out.append(String.format(Locale.ROOT, "  %5s | %-19s | %-14s | %-14s | %-14s | %-6s %-6s | %-17s%n", "n",
                "assembly ms wall/cpu", "EJML LU", "tiled LU 1 thr", "tiled LU 2 thr", "EJML/", "EJML/",
                "system ms 1 / 2"));
        out.append(String.format(Locale.ROOT, "  %5s | %-19s | %-14s | %-14s | %-14s | %-6s %-6s | %-17s%n", "",
                "", "ms     GF/s", "ms     GF/s", "ms     GF/s", "tiled1", "tiled2", "thr (wall)"));
        for (Map.Entry<Integer, Row[]> e : bySize.entrySet()) {
            int n = e.getKey();
            Row[] s = e.getValue();
            double flops = 2.0 / 3.0 * n * (double) n * n;
            out.append(String.format(Locale.ROOT, "  %5d | %s | %s | %s | %s | %s %s | %s%n", n,
                    s[0] == null ? pad("-", 19) : String.format(Locale.ROOT, "%8.2f %8.2f  ", s[0].wall() * 1e3,
                            s[0].cpu() * 1e3),
                    lu(s[1], flops), lu(s[2], flops), lu(s[3], flops), times(s[1], s[2]), times(s[1], s[3]),
                    s[4] == null || s[5] == null ? "-" : String.format(Locale.ROOT, "%8.2f %8.2f", s[4].wall() * 1e3,
                            s[5].wall() * 1e3)));
        }
        out.append("  (OpenBLAS's LU on the same sizes, when Python with SciPy is present, follows from run.sh)\n\n");
    }

    private static void sweep(List<Row> rows, StringBuilder out) {
        Optional<Row> one = find(rows, "SweepBenchmark.run", "1");
        Optional<Row> two = find(rows, "SweepBenchmark.run", "2");
        if (one.isEmpty() && two.isEmpty()) {
            return;
        }
        out.append("Planform sweep, default lattice 32 x 8 (benchmarks/planform.sweep.yaml, 429 cases, each a new "
                + "geometry),\n");
        out.append("  steady (warm JVM), through the sweep command's runner\n");
        for (Optional<Row> o : List.of(one, two)) {
            o.ifPresent(r -> out.append(String.format(Locale.ROOT, "  --jobs %s: %8.1f ms per sweep, %6.0f cases/s%n",
                    r.unknowns(), r.wall() * 1e3, 429 / r.wall())));
        }
        if (one.isPresent() && two.isPresent() && two.get().wall() > 0.8 * one.get().wall()) {
            out.append("  NOTE: two jobs were hardly faster than one: the second core was not all there (another"
                    + " process or the host); the split below then counts its idle time in \"the rest\"\n");
        }
        two.ifPresent(r -> caseParts(rows, r, out));
        out.append('\n');
    }

    /**
     * Where a case goes, in core milliseconds: with two jobs each case runs on one thread, so a case costs
     * jobs x wall / 429 core ms, jobs = 2 or the processors if fewer (an upper bound: a core may idle at the
     * end, or be taken by the host). The assembly and the LU are the one-thread figures at 256 unknowns (the
     * sweep's lattice); the rest is the difference.
     */
    private static void caseParts(List<Row> rows, Row two, StringBuilder out) {
        Optional<Row> assembly = find(rows, "SystemBenchmark.assemble", "256");
        Optional<Row> lu = find(rows, "SystemBenchmark.luTiled1", "256");
        Optional<Row> floor = find(rows, "FloorBenchmark.sqrtDivide", "256");
        if (assembly.isEmpty() || lu.isEmpty()) {
            return;
        }
        double cores = Math.min(2, Runtime.getRuntime().availableProcessors());
        double caseMs = cores * two.wall() / 429 * 1e3;
        double assemblyMs = assembly.get().wall() * 1e3;
        double luMs = lu.get().wall() * 1e3;
        double restMs = caseMs - assemblyMs - luMs;
        out.append(String.format(Locale.ROOT, "  where a case goes (--jobs 2, each case on one thread): %.2f core ms "
                + "= %.0f jobs x wall / 429%n", caseMs, cores));
        out.append(String.format(Locale.ROOT, "    assembly %.2f ms (%.0f%%)%s%n", assemblyMs,
                100 * assemblyMs / caseMs,
                floor.map(f -> String.format(Locale.ROOT, "; its square roots and divisions alone take %.2f ms on "
                        + "this machine (FloorBenchmark): %.1fx that floor", f.wall() * 1e3,
                        assembly.get().wall() / f.wall())).orElse("")));
        out.append(String.format(Locale.ROOT, "    LU, tiled on one thread, %.2f ms (%.0f%%); its limit, OpenBLAS's LU "
                + "at n = 256, follows from run.sh%n", luMs, 100 * luMs / caseMs));
        out.append(String.format(Locale.ROOT, "    the rest %.2f ms (%.0f%%): the case's wing tree, lattice, strip "
                + "limits, basis solves, Trefftz plane, row; no arithmetic floor%n", restMs, 100 * restMs / caseMs));
    }

    private static String lu(Row r, double flops) {
        if (r == null) {
            return pad("-", 14);
        }
        return String.format(Locale.ROOT, "%7.2f %6.2f", r.wall() * 1e3, flops / r.wall() * 1e-9);
    }

    private static String times(Row a, Row b) {
        return a == null || b == null ? pad("-", 6) : String.format(Locale.ROOT, "%5.1fx", a.wall() / b.wall());
    }

    private static String pad(String s, int w) {
        return String.format("%-" + w + "s", s);
    }

    /** A number right-aligned in a column, or "-" where there is none (a single iteration has no error). */
    private static String num(double v, int decimals, int width) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%" + width + "." + decimals + "f", v)
                : String.format("%" + width + "s", "-");
    }

    private static String label(String name) {
        return switch (name) {
            case "TrainerBenchmark.sweep" -> "whole: of(wing) + 9 x solve+coeffs";
            case "TrainerBenchmark.analysis" -> "  of(wing) alone";
            case "TrainerBenchmark.solves" -> "  9 x solve+coeffs alone";
            default -> name;
        };
    }

    private static Optional<Row> find(List<Row> rows, String name, String unknowns) {
        return rows.stream().filter(r -> r.name().equals(name) && r.unknowns().equals(unknowns)).findFirst();
    }

    /** A score in JMH's unit (such as "ms/op") in seconds. */
    static double seconds(double score, String unit) {
        String u = unit.endsWith("/op") ? unit.substring(0, unit.length() - 3) : unit;
        return switch (u) {
            case "ns" -> score * 1e-9;
            case "us" -> score * 1e-6;
            case "ms" -> score * 1e-3;
            case "s" -> score;
            case "min" -> score * 60;
            default -> throw new IllegalArgumentException("unexpected unit " + unit);
        };
    }
}
