package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ValidateCommandTest {

    @Test
    void oneCaseAsJsonCarriesTheContractKeys() {
        CliRun r = CliRun.of("validate", "--case", "worked-example-swept", "--format", "json");
        assertEquals(0, r.exitCode(), r.err());
        for (String key : List.of("\"cases\"", "\"case\"", "\"quantity\"", "\"reference\"", "\"source\"", "\"lattice\"",
                "\"strips\"", "\"rows\"", "\"strip-spacing\"", "\"row-spacing\"", "\"result\"", "\"converged\"",
                "\"error_pct\"", "\"tolerance_pct\"", "\"pass\"")) {
            assertTrue(r.out().contains(key), "missing " + key);
        }
        assertTrue(r.out().contains("\"strips\": 4") && r.out().contains("\"uniform\""), r.out());
        assertTrue(r.out().contains("\"pass\": true"));
        assertFalse(r.out().contains("NaN"));
    }

    @Test
    void tableShowsTheCaseAndItsSource() {
        CliRun r = CliRun.of("validate", "--case", "elliptic-e-A8");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("elliptic-e-A8"));
        assertTrue(r.out().contains("32x8 cos/cos"), "the case runs on the default lattice");
        assertTrue(r.out().contains("Prandtl"));
        assertTrue(r.out().contains("pass"));
    }

    @Test
    void unknownCaseIsBadInputAndListsTheCases() {
        CliRun r = CliRun.of("validate", "--case", "no-such-case");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("no-such-case") && r.err().contains("worked-example-swept"), r.err());
        assertTrue(r.out().isEmpty());
    }

    /**
     * The output file, with one case: every case runs (and must pass) in the validation module's own tests
     * ({@code ReferenceCasesTest}), so running them all again here would add time and no check.
     */
    @Test
    void theReportGoesWholeToTheOutputFileAndNothingToStandardOutput(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("report.json");
        CliRun r = CliRun.of("validate", "--case", "worked-example-swept", "--output", out.toString());
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().isEmpty(), r.out());
        String text = Files.readString(out);
        assertTrue(text.contains("\"passed\": 1") && text.contains("\"failed\": 0"), text);
        assertTrue(text.contains("\"case\": \"worked-example-swept\""), text);
        assertEquals(1, text.split("\"case\": ", -1).length - 1, "one case in the report");
    }
}
