package org.spanlift.cli.build;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.spanlift.cli.SpanliftCommand;

import picocli.AutoComplete;
import picocli.CommandLine;
import picocli.codegen.docgen.manpage.ManPageGenerator;

/**
 * Build step (run by {@code vlm-cli/pom.xml} at prepare-package, on the test class path because the man page
 * generator is a build-time dependency only): writes the bash completion script and one AsciiDoc man page per
 * command, from the command line exactly as {@link SpanliftCommand#commandLine()} configures it (so each
 * command's {@code --format} help lists its own formats).
 *
 * <p>Layout under the folder given, as in the release archive: {@code bin/spanlift_completion} (the name the
 * script's own installation notes look for), {@code man/spanlift.adoc}, {@code man/spanlift-solve.adoc} and so on.
 * Every page states the program's version (not the commit, so the pages change only with the commands).
 */
public final class GenerateDocs {

    /** Wide enough that no synopsis wraps. */
    static final int SYNOPSIS_WIDTH = 1000;

    private GenerateDocs() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length != 1) {
            throw new IllegalArgumentException("usage: GenerateDocs OUTPUT_FOLDER");
        }
        write(Path.of(args[0]));
    }

    /** Writes the completion script and the man pages under {@code out}; returns the files written. */
    public static List<Path> write(Path out) throws IOException {
        CommandLine root = SpanliftCommand.commandLine();
        // A synopsis wrapped at the terminal width breaks the AsciiDoc markup inside an option; the renderer
        // wraps the lines itself.
        root.setUsageHelpWidth(SYNOPSIS_WIDTH);
        String version = root.getCommandSpec().version()[0];
        List<Path> written = new ArrayList<>();
        Path completion = out.resolve("bin").resolve("spanlift_completion");
        Files.createDirectories(completion.getParent());
        Files.writeString(completion, AutoComplete.bash("spanlift", root), StandardCharsets.UTF_8);
        written.add(completion);
        Path man = out.resolve("man");
        Files.createDirectories(man);
        manPages(root, version, man, written);
        return written;
    }

    private static void manPages(CommandLine command, String version, Path folder, List<Path> written) {
        command.getCommandSpec().version(version);
        Path page = folder.resolve(command.getCommandSpec().qualifiedName("-") + ".adoc");
        try (Writer w = Files.newBufferedWriter(page, StandardCharsets.UTF_8);
                PrintWriter pw = new PrintWriter(w)) {
            ManPageGenerator.writeSingleManPage(pw, command.getCommandSpec());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        written.add(page);
        for (CommandLine sub : command.getSubcommands().values()) {
            manPages(sub, version, folder, written);
        }
    }
}
