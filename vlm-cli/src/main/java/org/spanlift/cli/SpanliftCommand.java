package org.spanlift.cli;

import java.io.PrintWriter;

import org.spanlift.cli.options.OffersFormats;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.input.InputException;
import org.spanlift.input.RefusedException;
import org.spanlift.solve.SingularSystemException;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code spanlift} command: vortex-lattice analysis of light-aircraft wings. */
@Command(name = "spanlift", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Vortex-lattice wing analysis: span load, lift slope, induced drag and span efficiency.",
        subcommands = {SolveCommand.class, StallCommand.class, LoadsCommand.class, SweepCommand.class,
                MergeCommand.class, PlotCommand.class, ReportCommand.class, CompareCommand.class,
                ValidateCommand.class},
        footer = {"", "Exit codes: 0 success; 1 the run finished but some case failed; 2 bad input, usage, or an"
                + " environment the run cannot proceed in (a full disk); 3 internal error."})
public final class SpanliftCommand implements Runnable {

    /** Exit code for a run that finished with failed cases. */
    public static final int EXIT_FAILED_CASES = 1;
    /** Exit code for bad input, usage, or an environment the run cannot proceed in (a full disk). */
    public static final int EXIT_BAD_INPUT = 2;
    /** Exit code for an internal error (a bug: please report it). */
    public static final int EXIT_INTERNAL = 3;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "a command is required (see --help)");
    }

    /** A configured command line (used by {@link #main} and by tests). */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new SpanliftCommand());
        for (CommandLine sub : cl.getSubcommands().values()) {
            if (sub.getCommand() instanceof OffersFormats command) {
                OutputOptions.describeFormats(sub.getCommandSpec(), command.formats());
            }
        }
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setExecutionExceptionHandler((e, line, parse) -> {
            PrintWriter err = line.getErr();
            if (e instanceof InputException) {
                err.println("spanlift: " + e.getMessage());
                return EXIT_BAD_INPUT;
            }
            if (e instanceof SingularSystemException) {
                err.println("spanlift: cannot solve this geometry: " + e.getMessage());
                return EXIT_BAD_INPUT;
            }
            if (e instanceof RefusedException) {
                err.println("spanlift: " + e.getMessage());
                return EXIT_BAD_INPUT;
            }
            err.println("spanlift: internal error (" + e.getClass().getSimpleName()
                    + (e.getMessage() == null ? "" : ": " + e.getMessage()) + "); please report it");
            return EXIT_INTERNAL;
        });
        cl.setParameterExceptionHandler((e, args) -> {
            PrintWriter err = e.getCommandLine().getErr();
            err.println("spanlift: " + e.getMessage().lines().findFirst().orElse("bad usage"));
            err.println("Try '" + e.getCommandLine().getCommandSpec().qualifiedName() + " --help'.");
            return EXIT_BAD_INPUT;
        });
        return cl;
    }

    public static void main(String[] args) {
        System.setProperty("java.awt.headless", "true");
        System.exit(commandLine().execute(args));
    }
}
