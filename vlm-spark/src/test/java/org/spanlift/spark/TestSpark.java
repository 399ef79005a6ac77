package org.spanlift.spark;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.apache.spark.sql.SparkSession;
import org.spanlift.cli.SpanliftCommand;

import picocli.CommandLine;

/**
 * The one local SparkSession of the module's tests, started on first use and left to the JVM's end: two
 * cores, each task allowed a second attempt (so a killed attempt is retried as on a cluster), the loopback
 * address only, no web UI, two shuffle partitions. The command finds it running and leaves it running.
 */
final class TestSpark {

    /** Tries per task: a first attempt and one retry. */
    static final int MAX_FAILURES = 2;

    private static SparkSession session;

    private TestSpark() {
    }

    static synchronized SparkSession session() {
        if (session == null) {
            session = SparkSession.builder().appName("spanlift-spark tests").master("local[2," + MAX_FAILURES + "]")
                    .config("spark.driver.bindAddress", "127.0.0.1").config("spark.driver.host", "127.0.0.1")
                    .config("spark.ui.enabled", "false").config("spark.sql.shuffle.partitions", "2")
                    .getOrCreate();
        }
        return session;
    }

    /** A run of a command line in-process: exit code, standard output and standard error. */
    record Run(int exitCode, String out, String err) {
    }

    /** Runs {@code spanlift-spark ARGS} on the shared session, with a fault injected when not null. */
    static Run spark(CaseTask.TaskFault fault, String... args) {
        session();
        CommandLine cl = SpanliftSparkCommand.commandLine();
        ((SparkSweepCommand) cl.getSubcommands().get("sweep").getCommand()).fault = fault;
        return run(cl, args);
    }

    /** Runs the local {@code spanlift ARGS}. */
    static Run local(String... args) {
        return run(SpanliftCommand.commandLine(), args);
    }

    private static Run run(CommandLine cl, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new Run(code, out.toString(), err.toString());
    }
}
