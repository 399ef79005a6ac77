package org.spanlift.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

import picocli.CommandLine;

/** Runs the command line in-process and captures its exit code, standard output and standard error. */
public record CliRun(int exitCode, String out, String err) {

    /** The demo wings at the repository root, seen from the module folder. */
    public static final Path GEOMETRIES = Path.of("..", "geometries");

    /** Runs {@code args} on the command line {@code main} builds for them. */
    public static CliRun of(String... args) {
        CommandLine cl = SpanliftCommand.commandLine(args);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }

    public static String demo(String name) {
        return GEOMETRIES.resolve(name).toString();
    }
}
