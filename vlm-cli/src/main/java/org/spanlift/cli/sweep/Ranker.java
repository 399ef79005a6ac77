package org.spanlift.cli.sweep;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.PriorityQueue;

import org.spanlift.cli.options.OutputTarget;
import org.spanlift.input.InputException;

/**
 * Tallies a results file's rows as they are written or read back: counts the cases, failures and feasible
 * cases, and keeps the best {@code keep} rows by the ranking column (successful, feasible where there are
 * constraints, with a value), ties in case order. The ranked summary has the results' columns after a
 * {@code rank} column.
 */
public final class Ranker {

    /** What the results file holds. */
    public record Tally(long cases, long failed, long feasible, List<String> ranked) {
    }

    private record Candidate(double value, long index, String line) {
    }

    private final String rankBy;
    private final boolean constrained;
    private final int keep;
    private final Comparator<Candidate> better;
    private final PriorityQueue<Candidate> best;
    private long cases;
    private long failed;
    private long feasible;

    /**
     * @param names        the results' columns
     * @param rankBy       the column to rank by, or null for counting only
     * @param highestFirst the order
     */
    public Ranker(List<String> names, String rankBy, boolean highestFirst, int keep) {
        this.rankBy = rankBy;
        this.constrained = names.contains("feasible");
        this.keep = keep;
        Comparator<Candidate> order = Comparator.comparingDouble(Candidate::value);
        if (highestFirst) {
            order = order.reversed();
        }
        this.better = order.thenComparingLong(Candidate::index);
        this.best = new PriorityQueue<>(better.reversed());
    }

    /**
     * Counts one row (its cells by column, as {@link RowFormat#parse} gives them) and keeps it if it ranks.
     *
     * @param line the row as written, without its line end
     * @param file the file and line the row comes from, for a message about a bad ranking value
     */
    public void add(Map<String, String> row, String line, String file, int lineNumber) {
        cases++;
        if (row.get("error") != null) {
            failed++;
            return;
        }
        boolean ok = !constrained || "true".equals(row.get("feasible"));
        if (constrained && ok) {
            feasible++;
        }
        String cell = rankBy == null ? null : row.get(rankBy);
        if (!ok || cell == null) {
            return;
        }
        double value;
        try {
            value = Double.parseDouble(cell);
        } catch (NumberFormatException e) {
            value = Double.NaN;
        }
        if (!Double.isFinite(value)) {
            throw new InputException(file, lineNumber, rankBy, "expected a finite number to rank by, got '" + cell
                    + "'");
        }
        Candidate c = new Candidate(value, Long.parseLong(row.get("case")), line);
        if (best.size() < keep) {
            best.add(c);
        } else if (better.compare(c, best.peek()) < 0) {
            best.poll();
            best.add(c);
        }
    }

    /** The counts so far and the best rows, best first. */
    public Tally tally() {
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

    /** Writes the ranked summary beside the results (whole or not at all). */
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
        OutputTarget.resolve("ranked summary", p).write(b.toString().getBytes(StandardCharsets.UTF_8));
        return p;
    }
}
