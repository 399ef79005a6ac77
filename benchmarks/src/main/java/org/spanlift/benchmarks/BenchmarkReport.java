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
            double alloc = sec.containsKey("gc.alloc.rate.norm") ? sec.get("gc.alloc.rate.norm").getScore() : Double.NaN;
            String n = r.getParams().getParamsKeys().contains("unknowns") ? r.getParams().getParam("unknowns") : "";
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
        trainer(rows, out);
        systems(rows, out);
        return out.toString();
    }

    private static void trainer(List<Row> rows, StringBuilder out) {
        Optional<Row> sweep = find(rows, "TrainerBenchmark.sweep", "");
        Optional<Row> analysis = find(rows, "TrainerBenchmark.analysis", "");
        Optional<Row> solves = find(rows, "TrainerBenchmark.solves", "");
        if (sweep.isEmpty() && analysis.isEmpty() && solves.isEmpty()) {
            return;
        }
        out.append("Trainer wing, 24 x 6 per half (144 unknowns per system), 9 alphas with coefficients\n");
        out.append(String.format(Locale.ROOT, "  %-34s %12s %10s %10s %12s %9s%n", "benchmark", "wall ms", "+-", "cpu ms",
                "alloc kB", "cpu share"));
        double total = sweep.map(Row::cpu).orElse(Double.NaN);
        for (Optional<Row> o : List.of(sweep, analysis, solves)) {
            o.ifPresent(r -> out.append(String.format(Locale.ROOT, "  %-34s %s %s %s %s %s%%%n",
                    label(r.name()), num(r.wall() * 1e3, 3, 12), num(r.wallError() * 1e3, 3, 10),
                    num(r.cpu() * 1e3, 3, 10), num(r.allocated() / 1024, 1, 12), num(100 * r.cpu() / total, 0, 8))));
        }
        sweep.ifPresent(r -> out.append(String.format(Locale.ROOT, "  target: under 5 ms warm -> %s (wall %.2f ms, cpu %.2f ms)%n",
                r.wall() < 5e-3 ? "met" : (r.cpu() < 5e-3 ? "met on CPU time, not on wall time" : "NOT met"),
                r.wall() * 1e3, r.cpu() * 1e3)));
        out.append('\n');
    }

    private static void systems(List<Row> rows, StringBuilder out) {
        Map<Integer, Row[]> bySize = new TreeMap<>();
        for (Row r : rows) {
            if (!r.name().startsWith("SystemBenchmark.")) {
                continue;
            }
            Row[] slot = bySize.computeIfAbsent(Integer.parseInt(r.unknowns()), k -> new Row[3]);
            switch (r.name()) {
                case "SystemBenchmark.assemble" -> slot[0] = r;
                case "SystemBenchmark.factorize" -> slot[1] = r;
                default -> slot[2] = r;
            }
        }
        if (bySize.isEmpty()) {
            return;
        }
        out.append("Symmetric half-span system: assembly and LU factorization (trapezoid wing, 10 rows)\n");
        out.append("  GFLOP/s = (2/3 n^3) / time; share = assembly / (assembly + engine LU);\n");
        out.append("  blocked = the cache-blocked reference LU in this module (not engine code)\n");
        out.append(String.format(Locale.ROOT, "  %6s | %-30s | %-30s | %-30s | %-13s | %s%n", "n",
                "assembly ms (wall/cpu) ns/eval", "engine LU ms (wall/cpu) GF/s", "blocked LU ms (wall/cpu) GF/s",
                "share w/c", "engine/blocked cpu"));
        for (Map.Entry<Integer, Row[]> e : bySize.entrySet()) {
            int n = e.getKey();
            Row[] s = e.getValue();
            double flops = 2.0 / 3.0 * n * (double) n * n;
            double evals = 2.0 * n * n;
            out.append(String.format(Locale.ROOT, "  %6d | %s | %s | %s | %s | %s%n", n,
                    s[0] == null ? pad("-", 30) : String.format(Locale.ROOT, "%8.1f %8.1f %12.0f", s[0].wall() * 1e3,
                            s[0].cpu() * 1e3, s[0].cpu() / evals * 1e9),
                    lu(s[1], flops), lu(s[2], flops),
                    s[0] == null || s[1] == null ? pad("-", 13) : String.format(Locale.ROOT, "%5.1f%% %5.1f%%",
                            100 * s[0].wall() / (s[0].wall() + s[1].wall()), 100 * s[0].cpu() / (s[0].cpu() + s[1].cpu())),
                    s[1] == null || s[2] == null ? "-" : String.format(Locale.ROOT, "%.2fx", s[1].cpu() / s[2].cpu())));
        }
        out.append("  growth from the previous size (cpu time; ideal: assembly (n2/n1)^2, LU (n2/n1)^3)\n");
        Row[] prev = null;
        int prevN = 0;
        for (Map.Entry<Integer, Row[]> e : bySize.entrySet()) {
            Row[] s = e.getValue();
            if (prev != null) {
                double f = (double) e.getKey() / prevN;
                out.append(String.format(Locale.ROOT, "  %5d -> %-5d  assembly %s (ideal %.1f)  engine LU %s  blocked LU %s (ideal %.1f)%n",
                        prevN, e.getKey(), ratio(s[0], prev[0]), f * f, ratio(s[1], prev[1]), ratio(s[2], prev[2]),
                        f * f * f));
            }
            prev = s;
            prevN = e.getKey();
        }
    }

    private static String lu(Row r, double flops) {
        if (r == null) {
            return pad("-", 30);
        }
        return String.format(Locale.ROOT, "%8.1f %8.1f %5.2f/%5.2f", r.wall() * 1e3, r.cpu() * 1e3, flops / r.wall() * 1e-9,
                flops / r.cpu() * 1e-9);
    }

    private static String ratio(Row a, Row b) {
        return a == null || b == null ? "  -  " : String.format(Locale.ROOT, "%5.2f", a.cpu() / b.cpu());
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
            case "TrainerBenchmark.sweep" -> "sweep: of(wing) + 9 x solve+coeffs";
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
