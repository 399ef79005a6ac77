package org.spanlift.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.Locale;

import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.options.OutputTarget;
import org.spanlift.cli.sweep.Manifest;
import org.spanlift.cli.sweep.Ranker;
import org.spanlift.cli.sweep.RowCheck;
import org.spanlift.cli.sweep.RowFormat;
import org.spanlift.cli.sweep.RowReader;
import org.spanlift.input.InputException;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code spanlift merge}: joins the shard outputs of one sweep into one results file in case order. */
@Command(name = "merge", mixinStandardHelpOptions = true,
        description = "Join the outputs of spanlift sweep --shard i/n into one results file in case order, and "
                + "write its ranked summary.")
public final class MergeCommand implements Callable<Integer> {

    @Parameters(arity = "1..*", paramLabel = "SHARD_FILES", description = "The shard results files (.csv or .jsonl).")
    List<Path> files;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", required = true,
            description = "The joined results file (same format as the shards). Written whole or not at all.")
    Path output;

    @Spec
    CommandSpec spec;

    private record Part(Path file, Manifest manifest, long first, long end) {
    }

    @Override
    public Integer call() {
        RowFormat format = RowFormat.of(output.getFileName().toString());
        if (format == null) {
            throw new InputException("--output", 0, "", "expected a .csv or .jsonl file, got " + output);
        }
        OutputTarget target = OutputTarget.resolve("--output", output);
        if (target.kind() != OutputTarget.Kind.FILE) {
            throw new InputException("--output", 0, "", output + " is a device or FIFO; expected a results file (merge "
                    + "writes a manifest and a ranked summary beside it)");
        }
        List<Path> inputs = new ArrayList<>();
        for (Path f : files) {
            if (!Files.isRegularFile(f)) {
                throw new InputException(f.toString(), 0, "", "no such file; expected a shard's results file");
            }
            inputs.add(f);
            inputs.add(Manifest.pathFor(real(f)));
        }
        OutputOptions.checkAll(inputs, List.of(OutputOptions.also("--output", output),
                OutputOptions.also("the manifest of --output", Manifest.pathFor(target.base())),
                OutputOptions.also("the ranked summary of --output", Ranker.pathFor(target.base(), format))));
        List<Part> parts = new ArrayList<>();
        for (Path f : files) {
            Manifest m = Manifest.read(real(f));
            if (m == null) {
                throw new InputException(f.toString(), 0, "", "has no sweep manifest beside it ("
                        + Manifest.pathFor(real(f)).getFileName() + "); merge joins the outputs of spanlift sweep "
                        + "--shard");
            }
            if (RowFormat.of(f.getFileName().toString()) != format
                    || !m.get("format").equals(format.name().toLowerCase(Locale.ROOT))) {
                throw new InputException(f.toString(), 0, "", "is not in the output's format (" + format.extension()
                        + ")");
            }
            parts.add(new Part(f, m, m.number("first_case"), m.number("end_case")));
        }
        Manifest whole = parts.get(0).manifest().whole();
        int count = parts.get(0).manifest().shard().count();
        for (Part p : parts) {
            if (!p.manifest().whole().sameRun(whole) || p.manifest().shard().count() != count) {
                throw new InputException(p.file().toString(), 0, "", "belongs to another sweep or another "
                        + "division into "
                        + "shards than " + parts.get(0).file());
            }
        }
        parts.sort(Comparator.comparingLong(Part::first).thenComparing(p -> p.file().toString()));
        long cases = whole.number("cases");
        long at = 0;
        for (Part p : parts) {
            if (p.first() < at) {
                throw new InputException(p.file().toString(), 0, "", "overlaps another shard (shard "
                        + p.manifest().get("shard") + " is given twice?)");
            }
            if (p.first() > at) {
                throw new InputException("merge", 0, "", "cases " + at + " to " + (p.first() - 1)
                        + " are in none of the files; a shard of " + count + " is missing");
            }
            at = p.end();
        }
        if (at != cases) {
            throw new InputException("merge", 0, "", "cases " + at + " to " + (cases - 1)
                    + " are in none of the files; a shard of " + count + " is missing");
        }
        List<String> names = whole.columnNames();
        String header = format.header(names);
        String by = whole.get("rank_by");
        Ranker tally = new Ranker(names, by, "max".equals(whole.get("rank_order")),
                by == null ? 1 : Integer.parseInt(whole.get("rank_keep")));
        Path ranked = null;
        OutputTarget.Written written = target.begin(out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            if (header != null) {
                w.write(header);
            }
            for (Part p : parts) {
                copy(p, format, header, names, whole.parameterCount(), tally, w);
            }
            w.flush();
        });
        try {
            whole.write(target.base());
            if (by != null) {
                ranked = Ranker.write(target.base(), format, names, tally.tally().ranked());
            }
        } finally {
            written.close();
        }
        Ranker.Tally counts = tally.tally();
        var err = spec.commandLine().getErr();
        err.println("merge: " + counts.cases() + " cases from " + parts.size() + " file"
                + (parts.size() == 1 ? "" : "s")
                + ", " + counts.failed() + " failed; results in " + output + " (case order)");
        if (ranked != null) {
            err.println("  ranked summary in " + ranked + ": best " + counts.ranked().size() + " by " + by);
        }
        err.flush();
        return counts.failed() > 0 ? SpanliftCommand.EXIT_FAILED_CASES : 0;
    }

    /** The file a shard's path names, links followed (its manifest is beside that file); as given if no link. */
    private static Path real(Path f) {
        if (!Files.isSymbolicLink(f)) {
            return f;
        }
        try {
            return f.toRealPath();
        } catch (IOException e) {
            return f;
        }
    }

    /** Copies a shard's rows, each checked (the case expected, its id from its parameter values) and tallied. */
    private static void copy(Part p, RowFormat format, String header, List<String> names, int parameters, Ranker tally,
            Writer w) throws IOException {
        String shown = p.file().toString();
        String advice = "merge joins the files spanlift sweep --shard wrote, unedited";
        RowCheck check = new RowCheck(shown, format, names, parameters, null, advice);
        long expected = p.first();
        try (InputStream in = Files.newInputStream(p.file())) {
            RowReader r = new RowReader(in, format);
            try {
                if (header != null) {
                    String h = r.next();
                    if (h == null || !(h + "\n").equals(header)) {
                        throw new InputException(shown, 1, "", "the header differs from the manifest's columns");
                    }
                }
                String record;
                while ((record = r.next()) != null) {
                    if (expected >= p.end()) {
                        throw new InputException(shown, r.line(), "", "holds more rows than its shard's cases "
                                + p.first()
                                + " to " + (p.end() - 1) + "; " + advice);
                    }
                    tally.add(check.check(record, r.line(), expected), record, shown, r.line());
                    w.write(record);
                    w.write('\n');
                    expected++;
                }
            } catch (CharacterCodingException e) {
                throw new InputException(shown, r.line(), "", "the file is not UTF-8 text; " + advice);
            }
            if (r.partial() || expected != p.end()) {
                throw new InputException(shown, r.partial() ? r.line() : 0, "", "is unfinished: it has cases "
                        + p.first()
                        + " to " + (expected - 1) + " of " + p.first() + " to " + (p.end() - 1)
                        + (r.partial() ? " and an incomplete last row" : "") + "; finish it with spanlift sweep "
                        + "--resume --shard " + p.manifest().get("shard"));
            }
        }
    }
}
