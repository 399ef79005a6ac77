package org.spanlift.cli.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.cli.CliRun;

/**
 * Merge and resume trust nothing they read back: a manifest missing keys or with malformed values, and
 * rows whose id or values were edited anywhere in the file, are refused with one line naming the file, its
 * line and the field (exit 2), and nothing is written.
 */
class UntrustedFilesTest {

    @TempDir
    Path dir;

    private Path sweep;

    private Path[] shards() {
        sweep = Runs.scenario(dir, Runs.SWEEP);
        Path[] parts = new Path[2];
        for (int i = 1; i <= 2; i++) {
            parts[i - 1] = dir.resolve("p" + i + ".csv");
            CliRun r = Runs.of("sweep", sweep.toString(), "-o", parts[i - 1].toString(), "--shard", i + "/2");
            assertEquals(0, r.exitCode(), r.err());
        }
        return parts;
    }

    private static void refusedInOneLine(CliRun r, String... parts) {
        assertEquals(2, r.exitCode(), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        for (String p : parts) {
            assertTrue(r.err().contains(p), "'" + p + "' in: " + r.err());
        }
        assertFalse(r.err().contains("internal error") || r.err().contains("Exception"), r.err());
    }

    @Test
    void aManifestMissingKeysOrWithMalformedValuesIsRefusedByMergeAndResume() throws IOException {
        Path[] parts = shards();
        Path manifest = Manifest.pathFor(parts[1]);
        String[][] cases = {
            {"empty.manifest.json", "spanlift_sweep: missing key"},
            {"no-format.manifest.json", "format: missing key"},
            {"shard-2.manifest.json", "shard: expected i/n with 1 <= i <= n (such as 2/4), got '2'"},
            {"no-first-case.manifest.json", "first_case: missing key"},
        };
        Path merged = dir.resolve("merged.csv");
        for (String[] c : cases) {
            Files.copy(Runs.resource(dir, "manifests/" + c[0]), manifest, StandardCopyOption.REPLACE_EXISTING);
            CliRun merge = Runs.of("merge", parts[0].toString(), parts[1].toString(), "--output", merged.toString());
            refusedInOneLine(merge, manifest + ":1: " + c[1]);
            assertFalse(Files.exists(merged));
            String rows = Runs.read(parts[1]);
            CliRun resume = Runs.of("sweep", sweep.toString(), "-o", parts[1].toString(), "--shard", "2/2", "--resume");
            refusedInOneLine(resume, manifest + ":1: " + c[1]);
            assertEquals(rows, Runs.read(parts[1]), "a refused resume leaves the rows as they were");
        }
    }

    @Test
    void mergeChecksEveryRowsIdAndNamesTheFileAndLineOfTheFirstBadOne() {
        Path[] parts = shards();
        String text = Runs.read(parts[0]);
        List<String> lines = text.lines().toList();
        String row = lines.get(5);
        String[] cells = row.split(",", 3);
        String editedId = new StringBuilder(cells[1]).reverse().toString();
        Runs.write(dir, "p1.csv", text.replace(row, cells[0] + "," + editedId + "," + cells[2]));
        Path merged = dir.resolve("merged.csv");
        CliRun r = Runs.of("merge", parts[0].toString(), parts[1].toString(), "--output", merged.toString());
        refusedInOneLine(r, parts[0] + ":6: id: case 4 has the id '" + editedId + "'");
        assertFalse(Files.exists(merged));

        String[] all = row.split(",", -1);
        all[3] = "1.75";
        Runs.write(dir, "p1.csv", text.replace(row, String.join(",", all)));
        CliRun values = Runs.of("merge", parts[0].toString(), parts[1].toString(), "--output", merged.toString());
        refusedInOneLine(values, parts[0] + ":6: id: case 4 has the id '" + cells[1] + "', not the one its parameter "
                + "values give");
        assertFalse(Files.exists(merged));

        Runs.write(dir, "p1.csv", text.replace(row, row + ",extra"));
        CliRun extra = Runs.of("merge", parts[0].toString(), parts[1].toString(), "--output", merged.toString());
        refusedInOneLine(extra, parts[0] + ":6: not a row of this sweep");
        assertFalse(Files.exists(merged));
    }

    @Test
    void resumeChecksEveryRowNotOnlyTheLast() {
        sweep = Runs.scenario(dir, Runs.SWEEP);
        Path out = dir.resolve("r.csv");
        assertEquals(0, Runs.of("sweep", sweep.toString(), "-o", out.toString()).exitCode());
        String text = Runs.read(out);
        List<String> lines = text.lines().toList();
        String row = lines.get(3);
        String[] cells = row.split(",", 3);
        String editedId = new StringBuilder(cells[1]).reverse().toString();
        String edited = text.replace(row, cells[0] + "," + editedId + "," + cells[2]);
        String cut = edited.substring(0, edited.indexOf('\n', edited.length() / 2) + 1);
        Runs.write(dir, "r.csv", cut);
        CliRun r = Runs.of("sweep", sweep.toString(), "-o", out.toString(), "--resume");
        refusedInOneLine(r, out + ":4: id: case 2 has the id '" + editedId + "'", "run without --resume");
        assertEquals(cut, Runs.read(out));

        String swapped = text.replace(lines.get(7) + "\n", "").replace(lines.get(8) + "\n", lines.get(8) + "\n"
                + lines.get(7) + "\n");
        Runs.write(dir, "r.csv", swapped.substring(0, swapped.indexOf('\n', swapped.length() / 2) + 1));
        CliRun order = Runs.of("sweep", sweep.toString(), "-o", out.toString(), "--resume");
        refusedInOneLine(order, out + ":8: case: expected case 6, found '7'");
    }
}
