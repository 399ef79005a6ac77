package org.spanlift.cli.options;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.spanlift.input.InputException;

import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Option;

/**
 * The output options every command shares: where to write and in which format. A file is written whole
 * or not at all (a temporary file beside it, moved into place when complete); a device or FIFO is streamed
 * into; see {@link OutputTarget}. Every command calls {@link #check} with its inputs before it computes.
 */
public final class OutputOptions {

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "Write to FILE instead of standard output. Written whole or not at all.")
    Path output;

    /** The option's name, for {@link #describeFormats}. */
    static final String FORMAT_OPTION = "--format";

    @Option(names = {"-f", FORMAT_OPTION}, paramLabel = "FORMAT",
            description = "Output format. Default: from the output file's extension, else table.")
    Format format;

    /** The output file once checked (null for standard output). */
    private OutputTarget target;
    private boolean checked;

    /**
     * Replaces the help text of a command's {@code --format} with one that lists the formats it writes and its
     * default (picocli builds the help from the shared annotation, which cannot know them).
     */
    public static void describeFormats(CommandSpec command, Set<Format> offered) {
        OptionSpec option = command.findOption(FORMAT_OPTION);
        if (option == null) {
            return;
        }
        Format fallback = defaultFormat(offered);
        String text = offered.size() == 1 ? "Output format: " + fallback + " only."
                : "Output format: " + names(offered) + ". Default: from the output file's extension, else "
                        + fallback + ".";
        command.remove(option);
        command.addOption(OptionSpec.builder(option).description(text).build());
    }

    private static Format defaultFormat(Set<Format> offered) {
        return offered.contains(Format.TABLE) ? Format.TABLE : offered.iterator().next();
    }

    /** The chosen format, checked against what the command offers. */
    public Format format(Set<Format> offered) {
        Format f = format;
        if (f == null && output != null) {
            f = Format.fromFileName(output.getFileName().toString());
        }
        if (f == null) {
            f = defaultFormat(offered);
        }
        if (!offered.contains(f)) {
            throw new InputException("--format", 0, "", "this command writes " + names(offered) + ", not " + f);
        }
        return f;
    }

    private static String names(Set<Format> formats) {
        return String.join(", ", EnumSet.copyOf(formats).stream().map(Format::toString).toList());
    }

    /** Another output of a command, by the option (or the role) that names it; a null path is none. */
    public record Named(String option, Path path) {
    }

    /** Another output of a command: {@code also("--span-load", file)}. */
    public static Named also(String option, Path path) {
        return new Named(option, path);
    }

    /**
     * Checks every output of the command before anything is computed or written, and must be called before
     * {@link #write}: each output must be a file in an existing folder (or a device, a FIFO, a descriptor),
     * not a folder; none may be the same file as one of the command's inputs (writing it would destroy the
     * input), nor the same file as another output.
     *
     * @param inputs the files the command reads (those that do not exist are left to their readers)
     * @param others the command's other outputs
     * @return every output given, by option
     */
    public Map<String, OutputTarget> check(List<Path> inputs, Named... others) {
        List<Named> all = new ArrayList<>();
        all.add(new Named("--output", output));
        all.addAll(Arrays.asList(others));
        Map<String, OutputTarget> targets = checkAll(inputs, all);
        target = targets.get("--output");
        checked = true;
        return targets;
    }

    /** The check of {@link #check} for any list of outputs (a sweep's results and the files beside them). */
    public static Map<String, OutputTarget> checkAll(List<Path> inputs, List<Named> outputs) {
        Map<String, OutputTarget> targets = new LinkedHashMap<>();
        for (Named n : outputs) {
            if (n.path() == null) {
                continue;
            }
            OutputTarget t = OutputTarget.resolve(n.option(), n.path());
            for (OutputTarget other : targets.values()) {
                if (t.sameFileAs(other)) {
                    throw new InputException(n.option(), 0, "", n.path() + " is also the " + other.option() + " file "
                            + other.given() + "; expected a different file for each output");
                }
            }
            for (Path in : inputs) {
                if (t.isInput(in)) {
                    throw new InputException(n.option(), 0, "", n.path() + " is the input file " + in
                            + "; writing it would destroy that input; expected another file");
                }
            }
            targets.put(n.option(), t);
        }
        return targets;
    }

    /** Writes the text to the output (see {@link OutputTarget}), or to {@code stdout}. */
    public void write(String text, PrintWriter stdout) {
        if (output == null) {
            stdout.print(text);
            stdout.flush();
            return;
        }
        write(text.getBytes(StandardCharsets.UTF_8));
    }

    /** Writes bytes to the output file (an output file must be given). */
    public void write(byte[] bytes) {
        if (!checked) {
            throw new IllegalStateException("the command did not check its outputs before writing");
        }
        if (target == null) {
            throw new IllegalStateException("no output file to write bytes to");
        }
        target.write(bytes);
    }

    public Path outputFile() {
        return output;
    }
}
