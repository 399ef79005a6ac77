package org.spanlift.cli.sweep;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.PriorityQueue;

import org.spanlift.cli.options.OutputOptions;
import org.spanlift.input.InputException;

/**
 * Reads a finished results file once, streaming: counts its cases, failures and feasible cases, and keeps
 * the best {@code keep} rows by the ranking column (successful, feasible where there are constraints, with
 * a value), ties in case order. The ranked summary has the results' columns after a {@code rank} column.
 */
public final class Ranker {

    /** What the results file holds. */
    public record Tally(long cases, long failed, long feasible, List<String> ranked) {
    }

    private record Candidate(double value, long index, String line) {
    }

    private Ranker() {
    }

    /**
     * @param rankBy      the column to rank by, or null for counting only
     * @param highestFirst the order
     */
    public static Tally scan(Path results, RowFormat format, List<String> names, String rankBy, boolean highestFirst,
            int keep) {
        boolean constrained = names.contains("feasible");
        Comparator<Candidate> better = Comparator.comparingDouble(Candidate::value);
        if (highestFirst) {
            better = better.reversed();
        }
        better = better.thenComparingLong(Candidate::index);
        PriorityQueue<Candidate> best = new PriorityQueue<>(better.reversed());
        long cases = 0;
        long failed = 0;
        long feasible = 0;
        try (BufferedReader r = Files.newBufferedReader(results, StandardCharsets.UTF_8)) {
            if (format.header(names) != null) {
                r.readLine();
            }
            String line;
            while ((line = r.readLine()) != null) {
                Map<String, String> row;
                try {
                    row = format.parse(names, line);
                } catch (IllegalArgumentException e) {
                    throw new InputException(results.toString(), 0, "", "a row cannot be read (" + e.getMessage() + ")");
                }
                cases++;
                if (row.get("error") != null) {
                    failed++;
                    continue;
                }
                boolean ok = !constrained || "true".equals(row.get("feasible"));
                if (constrained && ok) {
                    feasible++;
                }
                if (rankBy == null || !ok || row.get(rankBy) == null) {
                    continue;
                }
                Candidate c = new Candidate(Double.parseDouble(row.get(rankBy)), Long.parseLong(row.get("case")), line);
                if (best.size() < keep) {
                    best.add(c);
                } else if (better.compare(c, best.peek()) < 0) {
                    best.poll();
                    best.add(c);
                }
            }
        } catch (IOException e) {
            throw new InputException(results.toString(), 0, "", "cannot read the results (" + e.getMessage() + ")");
        }
        Candidate[] sorted = best.toArray(new Candidate[0]);
        Arrays.sort(sorted, better);
        List<String> lines = new ArrayList<>();
        for (Candidate c : sorted) {
            lines.add(c.line());
        }
        return new Tally(cases, failed, feasible, lines);
    }

    /** The ranked summary's path beside the results: {@code results.ranked.csv}. */
    public static Path pathFor(Path results, RowFormat format) {
        return Manifest.beside(results, ".ranked" + format.extension());
    }

    /** Writes the ranked summary atomically. */
    public static Path write(Path results, RowFormat format, List<String> names, List<String> ranked) {
        StringBuilder b = new StringBuilder();
        if (format == RowFormat.CSV) {
            b.append("rank,").append(format.header(names));
        }
        for (int i = 0; i < ranked.size(); i++) {
            String line = ranked.get(i);
            if (format == RowFormat.CSV) {
                b.append(i + 1).append(',').append(line).append('\n');
            } else {
                b.append("{\"rank\":").append(i + 1).append(',').append(line.substring(1)).append('\n');
            }
        }
        Path p = pathFor(results, format);
        OutputOptions.writeAtomically(p, b.toString().getBytes(StandardCharsets.UTF_8));
        return p;
    }
}
