package org.spanlift.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.spanlift.io.SweepFileReader;
import org.spanlift.cli.sweep.Manifest;
import org.spanlift.cli.sweep.Progress;
import org.spanlift.cli.sweep.ProgressMode;
import org.spanlift.cli.sweep.Ranker;
import org.spanlift.cli.sweep.ResultsFile;
import org.spanlift.cli.sweep.RowFormat;
import org.spanlift.cli.sweep.Shard;
import org.spanlift.cli.sweep.SweepNotes;
import org.spanlift.cli.sweep.SweepRunner;
import org.spanlift.cli.options.InputFiles;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.options.OutputTarget;
import org.spanlift.input.InputException;
import org.spanlift.sweep.Ranking;
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

    @Option(names = "--progress", paramLabel = "MODE", defaultValue = "auto",
            description = "Progress on standard error: auto (a bar when standard error is a terminal, else a line "
                    + "every ten seconds), bar, lines or none. Default: ${DEFAULT-VALUE}.")
    ProgressMode progressMode;

    @Option(names = "--force", description = "Run a design of more than 10 000 000 cases.")
    boolean force;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        RowFormat format = RowFormat.CSV;
        OutputTarget target = null;
        if (output != null) {
            target = OutputTarget.resolve("--output", output);
            format = RowFormat.of(output.getFileName().toString());
            if (format == null && target.kind() == OutputTarget.Kind.STREAM) {
                format = RowFormat.CSV;
            }
            if (format == null) {
                throw new InputException("--output", 0, "", "expected a .csv or .jsonl file, got " + output);
            }
        }
        boolean toFile = target != null && target.kind() == OutputTarget.Kind.FILE;
        int threads = jobs == null ? Runtime.getRuntime().availableProcessors() : jobs;
        if (threads < 1 || threads > 1024) {
            throw new InputException("--jobs", 0, "", "expected 1 to 1024 threads, got " + threads);
        }
        Shard slice = shard == null ? Shard.ALL : Shard.parse(shard);
        if (resume && !toFile) {
            throw new InputException("--resume", 0, "", output == null ? "needs --output: the file to finish"
                    : "needs a results file to finish; " + output + " is a device or FIFO");
        }
        if (!slice.whole() && !toFile) {
            throw new InputException("--shard", 0, "", output == null
                    ? "needs --output: spanlift merge joins the shard files"
                    : "needs a results file for spanlift merge to join; " + output + " is a device or FIFO");
        }
        Sweep sweep = SweepFileReader.read(file, force);
        List<Path> inputs = new ArrayList<>(List.of(file, sweep.basePath()));
        inputs.addAll(InputFiles.sectionFiles(sweep.baseTree(), sweep.basePath()));
        List<OutputOptions.Named> outputs = new ArrayList<>(List.of(OutputOptions.also("--output", output)));
        if (toFile) {
            outputs.add(OutputOptions.also("the manifest of --output", Manifest.pathFor(target.base())));
            outputs.add(OutputOptions.also("the ranked summary of --output", Ranker.pathFor(target.base(), format)));
        }
        OutputOptions.checkAll(inputs, outputs);
        long n = sweep.design().count();
        long first = slice.first(n);
        long end = slice.end(n);
        List<String> names = RowFormat.columnNames(sweep);
        PrintWriter err = spec.commandLine().getErr();
        boolean terminal = progressMode.bar();
        long started = System.nanoTime();
        RowFormat f = format;
        if (!toFile) {
            return stream(target, sweep, f, names, first, end, threads, err, terminal, started);
        }
        Ranking ranking = sweep.ranking().orElse(null);
        Ranker tally = new Ranker(names, ranking == null || !slice.whole() ? null : ranking.by(),
                ranking != null && ranking.highestFirst(), ranking == null ? 1 : ranking.keep());
        Path ranked = null;
        try (ResultsFile results = ResultsFile.open(target, sweep, slice, format, resume, tally)) {
            Progress progress = new Progress(progressErr(err), terminal, end - first, results.next() - first,
                    System::nanoTime);
            SweepRunner.run(sweep, results.next(), end, threads, r -> f.row(names, sweep, r), (r, row) -> {
                results.write(row);
                String line = row.substring(0, row.length() - 1);
                tally.add(f.parse(names, line), line, output.toString(), 0);
                progress.step(r.failed());
            });
            progress.finish();
            if (ranking != null && slice.whole()) {
                ranked = Ranker.write(target.base(), format, names, tally.tally().ranked());
            }
        }
        Ranker.Tally counts = tally.tally();
        summary(err, sweep, counts.cases(), counts.failed(), started, threads, ranked, counts);
        if (ranking != null && !slice.whole()) {
            err.println("  shard " + slice + " of the cases; join the shards with spanlift merge for the ranked "
                    + "summary");
        }
        err.flush();
        return counts.failed() > 0 ? SpanliftCommand.EXIT_FAILED_CASES : 0;
    }

    /** Rows streamed to standard output or into a device or FIFO: no manifest, no ranked summary. */
    private Integer stream(OutputTarget target, Sweep sweep, RowFormat f, List<String> names, long first, long end,
            int threads, PrintWriter err, boolean terminal, long started) {
        Progress progress = new Progress(progressErr(err), terminal, end - first, 0, System::nanoTime);
        SweepRunner.Outcome o;
        if (target == null) {
            PrintWriter out = spec.commandLine().getOut();
            String header = f.header(names);
            if (header != null) {
                out.print(header);
                out.flush();
            }
            o = SweepRunner.run(sweep, first, end, threads, r -> f.row(names, sweep, r), (r, row) -> {
                out.print(row);
                out.flush();
                progress.step(r.failed());
            });
        } else {
            try (OutputStream out = Files.newOutputStream(target.file(), StandardOpenOption.WRITE,
                    StandardOpenOption.APPEND)) {
                String header = f.header(names);
                if (header != null) {
                    out.write(header.getBytes(StandardCharsets.UTF_8));
                    out.flush();
                }
                o = SweepRunner.run(sweep, first, end, threads, r -> f.row(names, sweep, r), (r, row) -> {
                    try {
                        out.write(row.getBytes(StandardCharsets.UTF_8));
                        out.flush();
                    } catch (IOException e) {
                        throw OutputTarget.cannotWrite(target.option(), target.given(), e);
                    }
                    progress.step(r.failed());
                });
            } catch (IOException e) {
                throw OutputTarget.cannotWrite(target.option(), target.given(), e);
            }
        }
        progress.finish();
        summary(err, sweep, o.cases(), o.failed(), started, threads, null, null);
        return o.failed() > 0 ? SpanliftCommand.EXIT_FAILED_CASES : 0;
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
        SweepNotes.print(err, sweep, failed);
    }

    /** Where progress goes: standard error, or nowhere with {@code --progress none}. */
    private PrintWriter progressErr(PrintWriter err) {
        return progressMode == ProgressMode.NONE ? new PrintWriter(java.io.Writer.nullWriter()) : err;
    }
}
