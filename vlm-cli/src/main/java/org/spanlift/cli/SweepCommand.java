package org.spanlift.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.spanlift.io.SweepFileReader;
import org.spanlift.cli.sweep.Progress;
import org.spanlift.cli.sweep.Ranker;
import org.spanlift.cli.sweep.ResultsFile;
import org.spanlift.cli.sweep.RowFormat;
import org.spanlift.cli.sweep.Shard;
import org.spanlift.cli.sweep.SweepRunner;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.output.Cautions;
import org.spanlift.input.InputException;
import org.spanlift.sweep.Ranking;
import org.spanlift.sweep.ResultColumn;
import org.spanlift.sweep.Sweep;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code spanlift sweep}: a batch of wing variants from a sweep file, in parallel, streamed in case order. */
@Command(name = "sweep", mixinStandardHelpOptions = true,
        description = "Run a geometry sweep (.sweep.yaml): every case of a full grid or a Latin hypercube, one row "
                + "per case in case order, with a ranked summary beside the results.")
public final class SweepCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "FILE", description = "The sweep file (.sweep.yaml).")
    Path file;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "Results file, .csv or .jsonl (standard output, CSV, when absent). Rows are written as "
                    + "cases finish, in case order; a ranked summary and a manifest are written beside it.")
    Path output;

    @Option(names = {"-j", "--jobs"}, paramLabel = "N",
            description = "Threads to use. Default: all cores. The results do not depend on it.")
    Integer jobs;

    @Option(names = "--resume", description = "Finish an interrupted run into the same output file.")
    boolean resume;

    @Option(names = "--shard", paramLabel = "i/n",
            description = "Run only the i-th of n disjoint slices of the cases (join them with spanlift merge).")
    String shard;

    @Option(names = "--force", description = "Run a design of more than 10 000 000 cases.")
    boolean force;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        RowFormat format = RowFormat.CSV;
        if (output != null) {
            OutputOptions.requireFolder(output);
            format = RowFormat.of(output.getFileName().toString());
            if (format == null) {
                throw new InputException("--output", 0, "", "expected a .csv or .jsonl file, got " + output);
            }
        }
        int threads = jobs == null ? Runtime.getRuntime().availableProcessors() : jobs;
        if (threads < 1 || threads > 1024) {
            throw new InputException("--jobs", 0, "", "expected 1 to 1024 threads, got " + threads);
        }
        Shard slice = shard == null ? Shard.ALL : Shard.parse(shard);
        if (resume && output == null) {
            throw new InputException("--resume", 0, "", "needs --output: the file to finish");
        }
        if (!slice.whole() && output == null) {
            throw new InputException("--shard", 0, "", "needs --output: spanlift merge joins the shard files");
        }
        Sweep sweep = SweepFileReader.read(file, force);
        long n = sweep.design().count();
        long first = slice.first(n);
        long end = slice.end(n);
        List<String> names = RowFormat.columnNames(sweep);
        PrintWriter err = spec.commandLine().getErr();
        boolean terminal = System.console() != null;
        long started = System.nanoTime();
        if (output == null) {
            PrintWriter out = spec.commandLine().getOut();
            out.print(format.header(names));
            out.flush();
            Progress progress = new Progress(err, terminal, end - first, 0, System::nanoTime);
            RowFormat f = format;
            SweepRunner.Outcome o = SweepRunner.run(sweep, first, end, threads, r -> f.row(names, sweep, r), (r, row) -> {
                out.print(row);
                out.flush();
                progress.step(r.failed());
            });
            progress.finish();
            summary(err, sweep, o.cases(), o.failed(), started, threads, null, null);
            return o.failed() > 0 ? SpanliftCommand.EXIT_FAILED_CASES : 0;
        }
        ResultsFile results = ResultsFile.open(output, sweep, slice, format, resume);
        Progress progress = new Progress(err, terminal, end - first, results.next() - first, System::nanoTime);
        RowFormat f = format;
        SweepRunner.Outcome o;
        try {
            o = SweepRunner.run(sweep, results.next(), end, threads, r -> f.row(names, sweep, r), (r, row) -> {
                results.write(row);
                progress.step(r.failed());
            });
        } finally {
            results.close();
        }
        progress.finish();
        Ranking ranking = sweep.ranking().orElse(null);
        Ranker.Tally tally = Ranker.scan(output, format, names, ranking == null || !slice.whole() ? null : ranking.by(),
                ranking != null && ranking.highestFirst(), ranking == null ? 1 : ranking.keep());
        Path ranked = null;
        if (ranking != null && slice.whole()) {
            ranked = Ranker.write(output, format, names, tally.ranked());
        }
        summary(err, sweep, tally.cases(), tally.failed(), started, threads, ranked, tally);
        if (ranking != null && !slice.whole()) {
            err.println("  shard " + slice + " of the cases; join the shards with spanlift merge for the ranked summary");
        }
        err.flush();
        return tally.failed() > 0 ? SpanliftCommand.EXIT_FAILED_CASES : 0;
    }

    private void summary(PrintWriter err, Sweep sweep, long cases, long failed, long started, int threads,
            Path ranked, Ranker.Tally tally) {
        double s = (System.nanoTime() - started) / 1e9;
        err.println(String.format(Locale.ROOT, "sweep: %d cases (%s), %d failed; %.1f s on %d thread%s",
                cases, sweep.design().describe(), failed, s, threads, threads == 1 ? "" : "s"));
        if (output != null) {
            err.println("  results in " + output + " (case order)");
        }
        if (ranked != null) {
            Ranking r = sweep.ranking().orElseThrow();
            err.println("  ranked summary in " + ranked + ": best " + tally.ranked().size() + " by " + r.by() + " ("
                    + (r.highestFirst() ? "highest" : "lowest") + " first)"
                    + (sweep.constraints().isEmpty() ? "" : "; " + tally.feasible() + " of " + cases
                            + " cases meet the constraints"));
        }
        if (failed > 0) {
            err.println("  some cases failed; their rows say why (column error)");
        }
        if (sweep.columns().stream().anyMatch(ResultColumn::needsClMax)) {
            if (sweep.assumeClMax().isPresent()) {
                err.println("  NOTE: sections without cl-max data use the assumed cl_max "
                        + sweep.assumeClMax().getAsDouble() + " (column " + ResultColumn.ASSUMED_CL_MAX + ")");
            }
            err.println("  " + Cautions.SWEEP);
        }
        err.flush();
    }
}
