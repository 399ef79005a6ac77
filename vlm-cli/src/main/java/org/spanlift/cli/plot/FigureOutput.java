package org.spanlift.cli.plot;

import java.nio.file.Path;
import java.util.EnumSet;
import java.util.Set;

import org.spanlift.cli.options.Format;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.input.InputException;

/** Writing figures and pages: the checks on the output file name, and the write through {@link OutputOptions}. */
public final class FigureOutput {

    private FigureOutput() {
    }

    /**
     * The format to write, checked so that the output file's extension agrees with it: a drawing written
     * into a file named for another format would mislead whoever opens it.
     */
    public static Format format(OutputOptions output, Set<Format> offered) {
        Format f = output.format(offered);
        Path file = output.outputFile();
        if (file != null) {
            Format byName = Format.fromFileName(file.getFileName().toString());
            if (byName != f) {
                throw new InputException("--output", 0, "", "expected a file ending in " + extensions(offered)
                        + (byName == null ? "" : " matching --format " + f) + ", got '" + file + "'");
            }
        }
        return f;
    }

    private static String extensions(Set<Format> offered) {
        return String.join(" or ", EnumSet.copyOf(offered).stream().map(f -> "." + f).toList());
    }

    /** Writes a figure as SVG or PNG to the output file, or SVG to standard output. */
    public static void write(Figure figure, Format format, OutputOptions output, java.io.PrintWriter stdout) {
        if (format == Format.PNG) {
            if (output.outputFile() == null) {
                throw new InputException("--output", 0, "", "a PNG image needs an output file (--output F.png)");
            }
            output.write(PngWriter.bytes(figure));
            return;
        }
        output.write(SvgWriter.document(figure), stdout);
    }
}
