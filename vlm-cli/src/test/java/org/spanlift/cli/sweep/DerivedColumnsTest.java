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

/** A sweep's derived values in its results: a column each after the parameters, kept by resume and merge. */
class DerivedColumnsTest {

    @TempDir
    Path dir;

    /** Constant area (10 x 1.6 x 1.5 / 2 = 12 m^2) while taper varies; 4 x 2 cases. */
    private static final String SWEEP = """
            base: w.wing.yaml
            parameters:
              surfaces.wing.trapezoid.taper: [0.5, 0.7, 0.85, 1]
              surfaces.wing.trapezoid.washout: [0, 2]
            names: {taper: surfaces.wing.trapezoid.taper, span: surfaces.wing.trapezoid.span}
            constants: {area: 12}
            derived:
              surfaces.wing.trapezoid.root-chord: 2 * area / (span * (1 + taper))
            columns: [reference.area, e@CL=0.5]
            rank: {by: e@CL=0.5, order: max, keep: 3}
            """;

    @Test
    void eachDerivedValueHasAColumnAfterTheParametersHoldingTheValueTheWingUsed() {
        Path s = Runs.scenario(dir, SWEEP);
        Path csv = dir.resolve("r.csv");
        CliRun r = Runs.of("sweep", s.toString(), "-o", csv.toString());
        assertEquals(0, r.exitCode(), r.err());
        List<List<String>> rows = Csv.records(Runs.read(csv));
        assertEquals(List.of("case", "id", "surfaces.wing.trapezoid.taper", "surfaces.wing.trapezoid.washout",
                "surfaces.wing.trapezoid.root-chord", "reference.area", "e@CL=0.5", "error"), rows.get(0));
        assertEquals(9, rows.size());
        for (List<String> row : rows.subList(1, rows.size())) {
            double taper = Double.parseDouble(row.get(2));
            assertEquals(2 * 12.0 / (10.0 * (1 + taper)), Double.parseDouble(row.get(4)));
            assertEquals(12.0, Double.parseDouble(row.get(5)), 1e-12 * 12);
        }
        assertTrue(Runs.read(dir.resolve("r.ranked.csv")).startsWith("rank,case,id,surfaces.wing.trapezoid.taper,"
                + "surfaces.wing.trapezoid.washout,surfaces.wing.trapezoid.root-chord,"));

        Path jsonl = dir.resolve("r.jsonl");
        assertEquals(0, Runs.of("sweep", s.toString(), "-o", jsonl.toString()).exitCode());
        String first = Runs.read(jsonl).lines().findFirst().orElseThrow();
        assertTrue(first.contains("\"surfaces.wing.trapezoid.washout\":0,\"surfaces.wing.trapezoid.root-chord\":1.6,"),
                first);
    }

    @Test
    void resumeAndMergeKeepTheDerivedColumns() throws IOException {
        Path s = Runs.scenario(dir, SWEEP);
        Path whole = dir.resolve("whole.csv");
        assertEquals(0, Runs.of("sweep", s.toString(), "-o", whole.toString()).exitCode());
        String full = Runs.read(whole);

        Path cut = dir.resolve("cut.csv");
        assertEquals(0, Runs.of("sweep", s.toString(), "-o", cut.toString()).exitCode());
        try (FileChannel ch = FileChannel.open(cut, StandardOpenOption.WRITE)) {
            ch.truncate(full.indexOf('\n', full.length() / 2) + 30);
        }
        CliRun resumed = Runs.of("sweep", s.toString(), "-o", cut.toString(), "--resume");
        assertEquals(0, resumed.exitCode(), resumed.err());
        assertEquals(full, Runs.read(cut));

        String[] shards = new String[2];
        for (int i = 1; i <= 2; i++) {
            shards[i - 1] = dir.resolve("part" + i + ".csv").toString();
            assertEquals(0, Runs.of("sweep", s.toString(), "-o", shards[i - 1], "--shard", i + "/2").exitCode());
        }
        Path merged = dir.resolve("merged.csv");
        CliRun m = Runs.of("merge", shards[0], shards[1], "--output", merged.toString());
        assertEquals(0, m.exitCode(), m.err());
        assertEquals(full, Runs.read(merged));
        assertEquals(Runs.read(dir.resolve("whole.ranked.csv")), Runs.read(dir.resolve("merged.ranked.csv")));
    }

    @Test
    void aCaseWhoseDerivedValueFailsHasItsReasonInTheRowAndAnEmptyDerivedCell() {
        Path s = Runs.scenario(dir, SWEEP.replace("2 * area / (span * (1 + taper))", "1.6 + 0.1 / (taper - 0.7)"));
        Path csv = dir.resolve("f.csv");
        CliRun r = Runs.of("sweep", s.toString(), "-o", csv.toString());
        assertEquals(1, r.exitCode(), r.err());
        assertTrue(r.err().contains("8 cases") && r.err().contains("2 failed"), r.err());
        List<List<String>> rows = Csv.records(Runs.read(csv));
        List<String> failed = rows.get(3);
        assertEquals("0.7", failed.get(2));
        assertEquals("", failed.get(4));
        assertTrue(failed.get(failed.size() - 1).endsWith("s.sweep.yaml:8: derived.surfaces.wing.trapezoid.root-chord: "
                + "character 11 of the expression: division by zero (0.1 / 0) (with taper = 0.7)"), failed.toString());
    }
}
