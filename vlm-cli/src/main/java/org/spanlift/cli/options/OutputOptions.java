package org.spanlift.cli.options;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.EnumSet;
import java.util.Set;
import java.util.concurrent.ThreadLocalRandom;

import org.spanlift.input.InputException;

import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Option;

/**
 * The output options every command shares: where to write and in which format. A file is written whole
 * or not at all (a temporary file beside it, moved into place when complete).
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

    /** Writes the text to the output file atomically, or to {@code stdout}. */
    public void write(String text, PrintWriter stdout) {
        if (output == null) {
            stdout.print(text);
            stdout.flush();
            return;
        }
        writeAtomically(output, text.getBytes(StandardCharsets.UTF_8));
    }

    /** Writes bytes to a file via a temporary file in the same folder, then moves it into place. */
    public static void writeAtomically(Path target, byte[] bytes) {
        Path absolute = target.toAbsolutePath();
        requireFolder(target);
        try {
            Path tmp = temporarySibling(absolute);
            try {
                Files.write(tmp, bytes);
                Files.move(tmp, absolute, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } finally {
                Files.deleteIfExists(tmp);
            }
        } catch (IOException e) {
            throw new InputException(target.toString(), 0, "", "cannot write the output file ("
                    + e.getClass().getSimpleName() + (e.getMessage() == null ? "" : ": " + e.getMessage()) + ")");
        }
    }

    /**
     * Creates an empty temporary file beside the target, to be moved onto it when complete. Unlike a
     * temporary file of the platform's, it gets the permissions any new file in that folder gets (the
     * user's umask), so the output, once moved into place, is as readable as the user expects.
     */
    public static Path temporarySibling(Path target) throws IOException {
        Path absolute = target.toAbsolutePath();
        for (int attempt = 1; ; attempt++) {
            Path tmp = absolute.resolveSibling("." + absolute.getFileName() + "."
                    + Long.toHexString(ThreadLocalRandom.current().nextLong()) + ".part");
            try {
                return Files.createFile(tmp);
            } catch (FileAlreadyExistsException e) {
                if (attempt == 100) {
                    throw e;
                }
            }
        }
    }

    /** Refuses an output path whose folder does not exist, before anything is computed or written. */
    public static void requireFolder(Path target) {
        Path dir = target.toAbsolutePath().getParent();
        if (dir != null && !Files.isDirectory(dir)) {
            throw new InputException(target.toString(), 0, "", "the folder " + dir + " does not exist; expected an "
                    + "output path in an existing folder");
        }
    }

    public Path outputFile() {
        return output;
    }
}
