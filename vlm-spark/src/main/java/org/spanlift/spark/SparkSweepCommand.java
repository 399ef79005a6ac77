package org.spanlift.spark;

import java.io.PrintWriter;
import java.io.Writer;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.regex.Pattern;

import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.sql.SparkSession;
import org.spanlift.cli.SpanliftCommand;
import org.spanlift.cli.options.InputFiles;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.options.OutputTarget;
import org.spanlift.cli.sweep.Manifest;
import org.spanlift.cli.sweep.Progress;
import org.spanlift.cli.sweep.ProgressMode;
import org.spanlift.cli.sweep.Ranker;
import org.spanlift.cli.sweep.ResultsFile;
import org.spanlift.cli.sweep.RowFormat;
import org.spanlift.cli.sweep.Shard;
import org.spanlift.cli.sweep.SweepNotes;
import org.spanlift.input.InputException;
import org.spanlift.io.SweepFileReader;
import org.spanlift.sweep.Ranking;
import org.spanlift.sweep.Sweep;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code spanlift-spark sweep}: the cases of a sweep file run as Spark tasks, written by the local runner's
 * writer ({@link ResultsFile}, {@link RowFormat}, {@link Ranker}, {@link Manifest}) into one results file in
 * case order with its manifest and ranked summary, byte for byte what {@code spanlift sweep} writes. The
 * input is read and the outputs checked on the driver before Spark starts, so bad input is one line and exit
 * code 2 without a cluster.
 */
@Command(name = "sweep", mixinStandardHelpOptions = true,
        description = "Run a geometry sweep (.sweep.yaml) on Apache Spark: the same results file, manifest and "
                + "ranked summary as spanlift sweep, in case order.")
public final class SparkSweepCommand implements Callable<Integer> {

    /** The master when none is given here or by spark-submit. */
    public static final String DEFAULT_MASTER = "local[*]";

    private static final Pattern LOCAL = Pattern.compile(
            "local(\\[(\\*|[1-9]\\d{0,3})(,[1-9]\\d{0,2})?])?");

    @Parameters(index = "0", paramLabel = "FILE", description = "The sweep file (.sweep.yaml).")
    Path file;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", required = true,
            description = "Results file, .csv or .jsonl, written on the driver in case order; a ranked summary and "
                    + "a manifest are written beside it.")
    Path output;

    @Option(names = "--resume", description = "Finish an interrupted run into the same output file.")
    boolean resume;

    @Option(names = "--force", description = "Run a design of more than 10 000 000 cases.")
    boolean force;

    @Option(names = "--master", paramLabel = "URL",
            description = "A local Spark master when not run by spark-submit: local, local[N], local[*] or local[N,F] "
                    + "(F tries per task). Default: " + DEFAULT_MASTER
                    + ", on the loopback address, without the web UI. "
                    + "For a cluster, use spark-submit with its --master.")
    String master;

    @Option(names = "--cases-per-task", paramLabel = "N",
            description = "Cases in one Spark task (1 to 100000). Default: about eight tasks per core, "
                    + SparkSweepRunner.MIN_CASES_PER_TASK + " to " + SparkSweepRunner.MAX_CASES_PER_TASK
                    + " cases each. The results do not depend on it.")
    Integer casesPerTask;

    @Option(names = "--progress", paramLabel = "MODE", defaultValue = "auto",
            description = "Progress on standard error: auto, bar, lines or none. Default: ${DEFAULT-VALUE}.")
    ProgressMode progressMode;

    @Spec
    CommandSpec spec;

    /** A fault injected into the tasks (tests only). */
    CaseTask.TaskFault fault;

    @Override
    public Integer call() {
        OutputTarget target = OutputTarget.resolve("--output", output);
        if (target.kind() != OutputTarget.Kind.FILE) {
            throw new InputException("--output", 0, "", "expected a results file; " + output
                    + " is a device or FIFO (spanlift sweep streams into those)");
        }
        RowFormat format = RowFormat.of(output.getFileName().toString());
        if (format == null) {
            throw new InputException("--output", 0, "", "expected a .csv or .jsonl file, got " + output);
        }
        if (casesPerTask != null && (casesPerTask < 1 || casesPerTask > 100_000)) {
            throw new InputException("--cases-per-task", 0, "", "expected 1 to 100000 cases, got " + casesPerTask);
        }
        boolean submitted = System.getProperty("spark.master") != null;
        if (submitted && master != null) {
            throw new InputException("--master", 0, "", "spark-submit has set the master (" + System.getProperty(
                    "spark.master") + "); give it to spark-submit only");
        }
        if (master != null && !LOCAL.matcher(master).matches()) {
            throw new InputException("--master", 0, "", "expected local, local[N], local[*] or local[N,F], got '"
                    + master + "'; for a cluster, run the application jar with spark-submit --master " + master);
        }
        Sweep sweep = SweepFileReader.read(file, force);
        List<Path> inputs = new ArrayList<>(List.of(file, sweep.basePath()));
        inputs.addAll(InputFiles.sectionFiles(sweep.baseTree(), sweep.basePath()));
        OutputOptions.checkAll(inputs, List.of(OutputOptions.also("--output", output),
                OutputOptions.also("the manifest of --output", Manifest.pathFor(target.base())),
                OutputOptions.also("the ranked summary of --output", Ranker.pathFor(target.base(), format))));
        SweepBundle bundle = SweepBundle.of(file, sweep, force);
        List<String> names = RowFormat.columnNames(sweep);
        PrintWriter err = spec.commandLine().getErr();
        long started = System.nanoTime();
        Ranking ranking = sweep.ranking().orElse(null);
        Ranker tally = new Ranker(names, ranking == null ? null : ranking.by(), ranking != null
                && ranking.highestFirst(),
                ranking == null ? 1 : ranking.keep());
        long end = sweep.design().count();
        Path ranked = null;
        String where;
        long ready;
        SparkSweepRunner.Outcome outcome;
        int perTask;
        try (ResultsFile results = ResultsFile.open(target, sweep, Shard.ALL, format, resume, tally);
                Session session = Session.start(master, "spanlift sweep " + file.getFileName())) {
            JavaSparkContext jsc = session.context();
            ready = System.nanoTime();
            where = jsc.master();
            perTask = casesPerTask != null ? casesPerTask
                    : SparkSweepRunner.casesPerTask(end - results.next(), jsc.defaultParallelism());
            Progress progress = new Progress(progressMode == ProgressMode.NONE
                    ? new PrintWriter(Writer.nullWriter()) : err, progressMode.bar(), end, results.next(),
                    System::nanoTime);
            RowFormat f = format;
            outcome = SparkSweepRunner.run(jsc, bundle, format, results.next(), end, perTask, fault, row -> {
                results.write(row);
                String line = row.substring(0, row.length() - 1);
                Map<String, String> cells = f.parse(names, line);
                tally.add(cells, line, output.toString(), 0);
                progress.step(cells.get("error") != null);
            });
            progress.finish();
            if (ranking != null) {
                ranked = Ranker.write(target.base(), format, names, tally.tally().ranked());
            }
        } catch (SparkSweepRunner.ClusterFailure e) {
            throw new InputException(output.toString(), 0, "", "Spark gave up on a task after its retries ("
                    + e.getMessage()
                    + "); the rows written so far are whole: run again with --resume to finish");
        }
        Ranker.Tally counts = tally.tally();
        long now = System.nanoTime();
        err.println(String.format(Locale.ROOT, "sweep: %d cases (%s), %d failed; %d run in %.1f s on Spark (%s, %d "
                + "task%s of up to %d cases) after %.1f s to start it", counts.cases(), sweep.design().describe(),
                counts.failed(), outcome.cases(), (now - ready) / 1e9, where, outcome.tasks(),
                outcome.tasks() == 1 ? "" : "s", perTask, (ready - started) / 1e9));
        err.println(String.format(Locale.ROOT, "  tasks ran %.1f s (%.1f s on a processor); the driver wrote the rows "
                + "in "
                + "%.2f s", outcome.taskSeconds(), outcome.taskCpuSeconds(), outcome.sinkSeconds()));
        err.println("  results in " + output + " (case order)");
        if (ranked != null) {
            err.println("  ranked summary in " + ranked + ": best " + counts.ranked().size() + " by " + ranking.by()
                    + " ("
                    + (ranking.highestFirst() ? "highest" : "lowest") + " first)"
                    + (sweep.constraints().isEmpty() ? "" : "; " + counts.feasible() + " of " + counts.cases()
                            + " cases meet the constraints"));
        }
        SweepNotes.print(err, sweep, counts.failed());
        return counts.failed() > 0 ? SpanliftCommand.EXIT_FAILED_CASES : 0;
    }

    /**
     * The Spark session of a run: the one already running in this JVM (left running), else a new one (stopped
     * at the end): the master spark-submit set, else {@code --master}, else {@link #DEFAULT_MASTER}; a local
     * master binds to the loopback address and has no web UI.
     */
    record Session(SparkSession spark, boolean owned) implements AutoCloseable {

        static Session start(String master, String name) {
            SparkSession running = SparkSession.getDefaultSession().getOrElse(() -> null);
            if (running != null) {
                return new Session(running, false);
            }
            SparkSession.Builder b = SparkSession.builder().appName(name);
            String chosen = System.getProperty("spark.master");
            if (chosen == null) {
                chosen = master == null ? DEFAULT_MASTER : master;
                b.master(chosen);
            }
            if (chosen.startsWith("local")) {
                b.config("spark.driver.bindAddress", System.getProperty("spark.driver.bindAddress", "127.0.0.1"));
                b.config("spark.driver.host", System.getProperty("spark.driver.host", "127.0.0.1"));
                b.config("spark.ui.enabled", System.getProperty("spark.ui.enabled", "false"));
            }
            return new Session(b.getOrCreate(), true);
        }

        JavaSparkContext context() {
            return JavaSparkContext.fromSparkContext(spark.sparkContext());
        }

        @Override
        public void close() {
            if (owned) {
                spark.stop();
            }
        }
    }
}
