package org.spanlift.cli.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.cli.CliRun;
import org.spanlift.cli.output.Csv;

/**
 * Names and values holding a carriage return, a line feed, a comma or a double quote are quoted in every
 * CSV the program writes (RFC 4180), and read back intact where the program reads its own CSV: resume,
 * merge and the ranked summary.
 */
class QuotedNamesTest {

    @TempDir
    Path dir;

    /** The values of names.sweep.yaml, as YAML reads them. */
    private static final List<String> NAMES = List.of("a\rb", "c,d", "e\"f", "g\nh", "i\r\nj", "plain");

    @Test
    void aSurfaceNameWithACarriageReturnIsQuotedInTheSpanLoad() {
        Path wing = Runs.resource(dir, "names.wing.yaml");
        Path load = dir.resolve("load.csv");
        CliRun r = Runs.of("solve", wing.toString(), "--alpha", "0,4", "--span-load", load.toString(),
                "--output", dir.resolve("points.csv").toString());
        assertEquals(0, r.exitCode(), r.err());
        String text = Runs.read(load);
        assertTrue(text.contains(",\"main\rwing \"\"A\"\"\","), text);
        List<List<String>> records = Csv.records(text);
        assertEquals(List.of("alpha_deg", "surface", "y_m", "chord_m", "cl", "cl_c_m", "circulation_m",
                "induced_angle_deg"), records.get(0));
        assertEquals(1 + 2 * 12, records.size(), "one record per strip of both halves at each angle");
        for (List<String> row : records.subList(1, records.size())) {
            assertEquals(8, row.size(), row.toString());
            assertEquals("main\rwing \"A\"", row.get(1));
            assertTrue(Double.isFinite(Double.parseDouble(row.get(4))), row.toString());
        }
    }

    private static List<String> names(String csv) {
        List<List<String>> records = Csv.records(csv);
        int column = records.get(0).indexOf("name");
        return records.subList(1, records.size()).stream().map(r -> r.get(column)).toList();
    }

    @Test
    void sweepRowsKeepTheValuesAndResumeAndMergeReadThemBack() throws IOException {
        Runs.write(dir, "w.wing.yaml", Runs.WING);
        Path sweep = Runs.resource(dir, "names.sweep.yaml");
        Path whole = dir.resolve("whole.csv");
        CliRun r = Runs.of("sweep", sweep.toString(), "-o", whole.toString());
        assertEquals(0, r.exitCode(), r.err());
        String full = Runs.read(whole);
        assertEquals(NAMES, names(full));
        assertTrue(full.contains(",\"a\rb\","), full);
        assertEquals(3, names(Runs.read(dir.resolve("whole.ranked.csv"))).size());

        Path cut = dir.resolve("cut.csv");
        assertEquals(0, Runs.of("sweep", sweep.toString(), "-o", cut.toString()).exitCode());
        int inside = full.indexOf("\"g\nh") + 3;
        try (FileChannel ch = FileChannel.open(cut, StandardOpenOption.WRITE)) {
            ch.truncate(inside);
        }
        CliRun resumed = Runs.of("sweep", sweep.toString(), "-o", cut.toString(), "--resume");
        assertEquals(0, resumed.exitCode(), resumed.err());
        assertEquals(full, Runs.read(cut));

        String[] shards = new String[3];
        for (int i = 1; i <= 3; i++) {
            shards[i - 1] = dir.resolve("part" + i + ".csv").toString();
            assertEquals(0, Runs.of("sweep", sweep.toString(), "-o", shards[i - 1], "--shard", i + "/3").exitCode());
        }
        Path merged = dir.resolve("merged.csv");
        CliRun m = Runs.of("merge", shards[2], shards[0], shards[1], "--output", merged.toString());
        assertEquals(0, m.exitCode(), m.err());
        assertEquals(full, Runs.read(merged));
        assertEquals(Runs.read(dir.resolve("whole.ranked.csv")), Runs.read(dir.resolve("merged.ranked.csv")));
    }
}
