package org.spanlift.spark;

import java.io.PrintWriter;

import org.spanlift.cli.SpanliftCommand;
import org.spanlift.cli.VersionProvider;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * {@code spanlift-spark}: Spanlift's batch runs on Apache Spark. Run by the {@code ./spanlift-spark} launcher
 * (an embedded local master) or by {@code spark-submit} with the module's application jar.
 */
@Command(name = "spanlift-spark", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Spanlift's sweeps on Apache Spark: the same sweep file and results file as spanlift sweep.",
        subcommands = SparkSweepCommand.class,
        footer = {"", "Exit codes: 0 success; 1 the run finished but some case failed; 2 bad input, usage, an "
                + "environment the run cannot proceed in, or a task Spark gave up on; 3 internal error."})
public final class SpanliftSparkCommand implements Runnable {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "a command is required");
    }

    /** The configured command line (used by {@link #main} and by tests). */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new SpanliftSparkCommand());
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        return SpanliftCommand.handleErrors(cl, "spanlift-spark");
    }

    public static void main(String[] args) {
        int code;
        try {
            code = commandLine().execute(args);
        } catch (Error e) {
            code = SpanliftCommand.internalError(e, new PrintWriter(System.err, true), "spanlift-spark: ");
        }
        System.exit(code);
    }
}
