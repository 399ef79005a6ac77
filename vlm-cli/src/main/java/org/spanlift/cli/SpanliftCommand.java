package org.spanlift.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

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
        footer = {"", "Exit codes: 0 success; 1 the run finished but some case failed; 2 bad input, usage, or an"
                + " environment the run cannot proceed in (a full disk); 3 internal error."})
public final class SpanliftCommand implements Runnable {

    /** Exit code for a run that finished with failed cases. */
    public static final int EXIT_FAILED_CASES = 1;
    /** Exit code for bad input, usage, or an environment the run cannot proceed in (a full disk). */
    public static final int EXIT_BAD_INPUT = 2;
    /** Exit code for an internal error (a bug: please report it). */
    public static final int EXIT_INTERNAL = 3;

    /** The commands, in the order the help lists them. */
    private static final List<Class<?>> COMMANDS = List.of(SolveCommand.class, StallCommand.class,
            LoadsCommand.class, SweepCommand.class, MergeCommand.class, PlotCommand.class, ReportCommand.class,
            CompareCommand.class, ValidateCommand.class, WashoutCommand.class, BalanceCommand.class);

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "a command is required");
    }

    /** The configured command line with every command (the help, the documentation, tests). */
    public static CommandLine commandLine() {
        return configured(COMMANDS);
    }

    /**
     * The command line {@link #main} runs {@code args} with: when they start with a command's name, one holding
     * that command alone, so that picocli builds the model of one command instead of all of them (a third of a
     * short run's wall time went there); for {@code --version} alone, one without commands; otherwise
     * {@link #commandLine()}. Either parses and runs the command the same way.
     */
    public static CommandLine commandLine(String... args) {
        if (args.length == 1 && (args[0].equals("--version") || args[0].equals("-V"))) {
            return configured(List.of()); // the version needs no command
        }
        if (args.length > 0) {
            for (Class<?> command : COMMANDS) {
                if (command.getAnnotation(Command.class).name().equals(args[0])) {
                    return configured(List.of(command));
                }
            }
        }
        return commandLine();
    }

    private static CommandLine configured(List<Class<?>> commands) {
        CommandLine cl = new CommandLine(new SpanliftCommand());
        for (Class<?> command : commands) {
            cl.addSubcommand(command);
        }
        for (CommandLine sub : cl.getSubcommands().values()) {
            if (sub.getCommand() instanceof OffersFormats command) {
                OutputOptions.describeFormats(sub.getCommandSpec(), command.formats());
            }
        }
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        return handleErrors(cl, "spanlift");
    }

    /**
     * Installs this command line's error handling on {@code cl} (also the Spark launcher's): bad input and usage
     * in one line prefixed with {@code program} and exit code 2, anything else one line and exit code 3.
     */
    public static CommandLine handleErrors(CommandLine cl, String program) {
        String prefix = program + ": ";
        cl.setExecutionExceptionHandler((e, line, parse) -> {
            PrintWriter err = line.getErr();
            if (e instanceof InputException) {
                err.println(prefix + e.getMessage());
                return EXIT_BAD_INPUT;
            }
            if (e instanceof SingularSystemException) {
                err.println(prefix + inputFile(parse) + "cannot solve this geometry: " + e.getMessage());
                return EXIT_BAD_INPUT;
            }
            if (e instanceof RefusedException) {
                err.println(prefix + inputFile(parse) + e.getMessage());
                return EXIT_BAD_INPUT;
            }
            if (e.getCause() instanceof Error error) {
                return internalError(error, err, prefix);
            }
            return internalError(e, err, prefix);
        });
        cl.setParameterExceptionHandler((e, args) -> {
            PrintWriter err = e.getCommandLine().getErr();
            err.println(InputException.oneLine(prefix + e.getMessage().lines().findFirst().orElse("bad usage")
                    + " (see '" + e.getCommandLine().getCommandSpec().qualifiedName() + " --help')"));
            return EXIT_BAD_INPUT;
        });
        // picocli hands only Exceptions to the handler above; an Error (out of memory, say) would escape with
        // a stack trace. Caught here, it ends the run like any other bug: one line, exit code 3.
        CommandLine.IExecutionStrategy run = new CommandLine.RunLast();
        cl.setExecutionStrategy(parse -> {
            try {
                return run.execute(parse);
            } catch (Error e) {
                return internalError(e, parse.commandSpec().commandLine().getErr(), prefix);
            }
        });
        return cl;
    }

    /**
     * Reports a bug in one line and returns {@link #EXIT_INTERNAL}. Running out of memory is named as such:
     * the inputs are checked against limits that should prevent it.
     */
    static int internalError(Throwable e, PrintWriter err) {
        return internalError(e, err, "spanlift: ");
    }

    /**
     * As {@link #internalError(Throwable, PrintWriter)}, the line starting with {@code prefix} ({@code "program: "}).
     */
    public static int internalError(Throwable e, PrintWriter err, String prefix) {
        if (e instanceof OutOfMemoryError) {
            err.println(InputException.oneLine(prefix + "internal error: ran out of memory" + (e.getMessage() == null
                    ? "" : " (" + e.getMessage() + ")") + "; please report it, with the input that caused it"));
        } else {
            err.println(InputException.oneLine(prefix + "internal error (" + e.getClass().getSimpleName()
                    + (e.getMessage() == null ? "" : ": " + firstLine(e.getMessage())) + "); please report it"));
        }
        err.flush();
        return EXIT_INTERNAL;
    }

    private static String firstLine(String s) {
        return s.lines().findFirst().orElse("");
    }

    /**
     * The input file of the command that ran, as {@code "FILE: "}, for a refusal that comes from the engine
     * without a file name; empty when the command did not take exactly one file.
     */
    private static String inputFile(CommandLine.ParseResult parse) {
        CommandLine.ParseResult last = parse;
        while (last.hasSubcommand()) {
            last = last.subcommand();
        }
        List<Path> files = new ArrayList<>();
        for (CommandLine.Model.PositionalParamSpec p : last.matchedPositionals()) {
            Object value = p.getValue();
            if (value instanceof Path path) {
                files.add(path);
            }
        }
        return files.size() == 1 ? files.get(0) + ": " : "";
    }

    public static void main(String[] args) {
        System.setProperty("java.awt.headless", "true");
        int code;
        try {
            code = commandLine(args).execute(args);
        } catch (Error e) {
            // Beyond the execution strategy's reach (while the command line was being parsed, say).
            code = internalError(e, new PrintWriter(System.err, true));
        }
        System.exit(code);
    }
}
