package org.spanlift.cli;

import java.io.BufferedReader;
import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.Locale;

import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.sweep.Manifest;
import org.spanlift.cli.sweep.Ranker;
import org.spanlift.cli.sweep.RowFormat;
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
        List<Part> parts = new ArrayList<>();
        for (Path f : files) {
            if (!Files.isRegularFile(f)) {
                throw new InputException(f.toString(), 0, "", "no such file");
            }
            Manifest m = Manifest.read(f);
            if (m == null) {
                throw new InputException(f.toString(), 0, "", "has no sweep manifest beside it ("
                        + Manifest.pathFor(f).getFileName() + "); merge joins the outputs of spanlift sweep --shard");
            }
            if (RowFormat.of(f.getFileName().toString()) != format
                    || !m.get("format").equals(format.name().toLowerCase(Locale.ROOT))) {
                throw new InputException(f.toString(), 0, "", "is not in the output's format (" + format.extension() + ")");
            }
            parts.add(new Part(f, m, m.number("first_case"), m.number("end_case")));
        }
        Manifest whole = parts.get(0).manifest().whole();
        String count = parts.get(0).manifest().get("shard").split("/")[1];
        for (Part p : parts) {
            if (!p.manifest().whole().sameRun(whole) || !p.manifest().get("shard").split("/")[1].equals(count)) {
                throw new InputException(p.file().toString(), 0, "", "belongs to another sweep or another division into "
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
        List<String> names = Arrays.asList(whole.get("columns").split(",", -1));
        String header = format.header(names);
        Path target = output.toAbsolutePath();
        Path tmp = null;
        try {
            tmp = OutputOptions.temporarySibling(target);
            try (BufferedWriter w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
                if (header != null) {
                    w.write(header);
                }
                for (Part p : parts) {
                    copy(p, format, header, w);
                }
            }
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            throw new InputException(output.toString(), 0, "", "cannot write the output file (" + e.getMessage() + ")");
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException e) {
                    // the move has taken it, or it is gone
                }
            }
        }
        whole.write(output);
        String by = whole.get("rank_by");
        Ranker.Tally tally = Ranker.scan(output, format, names, by, "max".equals(whole.get("rank_order")),
                by == null ? 1 : Integer.parseInt(whole.get("rank_keep")));
        var err = spec.commandLine().getErr();
        err.println("merge: " + tally.cases() + " cases from " + parts.size() + " file" + (parts.size() == 1 ? "" : "s")
                + ", " + tally.failed() + " failed; results in " + output + " (case order)");
        if (by != null) {
            Path ranked = Ranker.write(output, format, names, tally.ranked());
            err.println("  ranked summary in " + ranked + ": best " + tally.ranked().size() + " by " + by);
        }
        err.flush();
        return tally.failed() > 0 ? SpanliftCommand.EXIT_FAILED_CASES : 0;
    }

    private static void copy(Part p, RowFormat format, String header, BufferedWriter w) throws IOException {
        long expected = p.first();
        try (BufferedReader r = Files.newBufferedReader(p.file(), StandardCharsets.UTF_8)) {
            if (header != null) {
                String h = r.readLine();
                if (h == null || !(h + "\n").equals(header)) {
                    throw new InputException(p.file().toString(), 1, "", "the header differs from the manifest's columns");
                }
            }
            String line;
            while ((line = r.readLine()) != null) {
                long index;
                try {
                    index = format.caseIndex(line);
                } catch (IllegalArgumentException e) {
                    throw new InputException(p.file().toString(), 0, "", "holds a line that is not a sweep row");
                }
                if (index != expected || index >= p.end()) {
                    throw new InputException(p.file().toString(), 0, "", "expected case " + expected + ", found case "
                            + index);
                }
                w.write(line);
                w.write('\n');
                expected++;
            }
        }
        if (expected != p.end()) {
            throw new InputException(p.file().toString(), 0, "", "is unfinished: it has cases " + p.first() + " to "
                    + (expected - 1) + " of " + p.first() + " to " + (p.end() - 1) + "; finish it with spanlift sweep "
                    + "--resume --shard " + p.manifest().get("shard"));
        }
    }
}
