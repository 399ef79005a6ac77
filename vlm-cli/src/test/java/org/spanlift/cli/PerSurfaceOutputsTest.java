package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.spanlift.cli.output.TextTable;
import org.spanlift.geometry.Wing;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;
import org.spanlift.io.WingFileReader;
import org.spanlift.results.Coefficients;
import org.spanlift.results.Solution;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.vocabulary.ResultKey;
import org.spanlift.vocabulary.Vocabulary;

/**
 * A wing file with a tail: {@code solve} gives each surface's CL, CDi and Cm with its name and role, and
 * {@code stall} says that the onset's stations are the wing's, labels the CL it quotes as the configuration's
 * and gives the wing's own CL at onset. A wing alone keeps its keys, labels and caution.
 */
class PerSurfaceOutputsTest {

    private static final String TAIL = CliRun.demo("trainer-tail.wing.yaml");
    private static final String ALONE = CliRun.demo("trainer.wing.yaml");

    @Test
    void solveJsonGivesEachSurfacesShareWithNameAndRoleAndTheSharesAddUpToTheWhole() {
        YamlValue root = json(CliRun.of("solve", TAIL, "--alpha", "2,6", "--format", "json"));
        Wing wing = WingFileReader.read(Path.of(TAIL));
        WingAnalysis analysis = WingAnalysis.of(wing);
        for (int i = 0; i < 2; i++) {
            YamlValue point = at(root, "points." + i);
            double alpha = number(at(point, "alpha_deg"));
            Solution s = analysis.solve(Math.toRadians(alpha));
            double cl = 0;
            double cdi = 0;
            double cm = 0;
            for (int k = 0; k < wing.surfaces().size(); k++) {
                YamlValue one = at(point, "surfaces." + k);
                for (ResultKey<?> key : Vocabulary.SURFACE) {
                    assertNotNull(at(one, key.key()), key.key() + " is written");
                }
                assertEquals(wing.surfaces().get(k).name(), text(at(one, "name")));
                assertEquals(List.of("wing", "tail").get(k), text(at(one, "role")));
                Coefficients c = s.coefficients(k);
                assertEquals(c.lift(), number(at(one, "CL")), 1e-15);
                assertEquals(c.inducedDrag(), number(at(one, "CDi")), 1e-15);
                assertEquals(c.pitchingMoment(), number(at(one, "Cm")), 1e-15);
                cl += number(at(one, "CL"));
                cdi += number(at(one, "CDi"));
                cm += number(at(one, "Cm"));
            }
            assertEquals(number(at(point, "CL")), cl, 1e-12);
            assertEquals(number(at(point, "CDi")), cdi, 1e-12);
            assertEquals(number(at(point, "Cm")), cm, 1e-12);
            // the tail carries a share of its own: the totals are not the wing's
            assertTrue(Math.abs(number(at(point, "surfaces.1.CL"))) > 1e-3, "tail CL");
        }
    }

    @Test
    void solveTableListsEachSurfacesShareUnderItsNameAndRole() {
        CliRun table = CliRun.of("solve", TAIL, "--alpha", "4");
        assertEquals(0, table.exitCode(), table.err());
        YamlValue point = at(json(CliRun.of("solve", TAIL, "--alpha", "4", "--format", "json")), "points.0");
        assertTrue(table.out().contains("  each surface\n"), table.out());
        for (int k = 0; k < 2; k++) {
            YamlValue one = at(point, "surfaces." + k);
            String row = table.out().lines().filter(l -> l.startsWith("4.00") && l.contains(" " + text(at(one, "name"))
                    + "  " + text(at(one, "role")) + " ")).findFirst().orElse(null);
            assertNotNull(row, "a row for surface " + k + "\n" + table.out());
            for (String value : List.of(TextTable.fixed(number(at(one, "CL")), 4),
                    TextTable.fixed(number(at(one, "CDi")), 5), TextTable.fixed(number(at(one, "Cm")), 4))) {
                assertTrue(row.contains(value), value + " in " + row);
            }
        }
    }

    @Test
    void aWingAloneHasNoSurfaceSharesInSolve() {
        CliRun json = CliRun.of("solve", ALONE, "--alpha", "2", "--format", "json");
        assertEquals(0, json.exitCode(), json.err());
        assertFalse(json.out().contains("\"surfaces\""), json.out());
        assertFalse(json.out().contains("\"role\""), json.out());
        CliRun table = CliRun.of("solve", ALONE, "--alpha", "2");
        assertFalse(table.out().contains("each surface"), table.out());
    }

    @Test
    void stallWithATailSaysTheStationsAreTheWingsAndLabelsTheConfigurationsCl() {
        CliRun r = CliRun.of("stall", TAIL, "--weight", "750kg", "--flaps", "20");
        assertEquals(0, r.exitCode(), r.err());
        String out = r.out().replace("\n  ", " ");
        assertTrue(out.contains("The onset's stations are those of the wing (surface wing); the onset's CL is the "
                + "configuration's: the wing with tail, untrimmed"), r.out());
        assertTrue(out.contains("its maximum, is the wing's own"), r.out());
        assertTrue(r.out().contains("\nconfiguration CL at onset "), r.out());
        assertTrue(r.out().contains("\nwing's own CL at onset "), r.out());
        assertTrue(r.out().contains("\nmaximum wing CL "), r.out());
        assertFalse(r.out().contains("wing CL at onset"), r.out());
        assertTrue(out.contains("spanlift balance gives the trimmed stall speeds"), r.out());
        assertFalse(out.contains("for the wing alone"), r.out());
    }

    @Test
    void stallJsonGivesTheWingsOwnClAtOnsetFromTheSolutionThere() {
        YamlValue root = json(CliRun.of("stall", TAIL, "--weight", "750kg", "--flaps", "20", "--format", "json"));
        WingAnalysis analysis = WingAnalysis.of(WingFileReader.read(Path.of(TAIL)));
        // clean: every control at zero, so the onset's lift line is the file's
        double alpha = Math.toRadians(number(at(root, "stall.alpha_deg")));
        Solution atOnset = analysis.solve(alpha);
        assertEquals(atOnset.coefficients(0).lift(), number(at(root, "stall.wing_CL")), 1e-15);
        assertEquals(atOnset.coefficients().lift(), number(at(root, "stall.CL")), 1e-12);
        assertTrue(Math.abs(number(at(root, "stall.CL")) - number(at(root, "stall.wing_CL"))) > 0.01,
                "the tail's share is not negligible");
        assertNotNull(at(root, "stall_flaps.wing_CL"));
        assertTrue(text(at(root, "stall.method")).contains("The onset's stations are those of the wing"));
        assertTrue(text(at(root, "caution")).contains("spanlift balance gives the trimmed stall speeds"));
    }

    @Test
    void aWingAloneKeepsItsStallKeysLabelsAndCaution() {
        CliRun json = CliRun.of("stall", ALONE, "--weight", "750kg", "--format", "json");
        assertEquals(0, json.exitCode(), json.err());
        assertFalse(json.out().contains("wing_CL"), json.out());
        assertTrue(json.out().contains("\"method\": \"critical section, linear theory\""), json.out());
        CliRun table = CliRun.of("stall", ALONE, "--weight", "750kg");
        assertTrue(table.out().contains("\nwing CL at onset "), table.out());
        assertTrue(table.out().contains("\n  at wing CL "), table.out());
        assertFalse(table.out().contains("configuration"), table.out());
        assertTrue(table.out().contains("tail's download"), table.out());
        assertFalse(table.out().contains("spanlift balance"), table.out());
    }

    @Test
    void washoutWithATailCarriesTheUntrimmedCautionAndAWingAloneItsOwn() {
        CliRun tail = CliRun.of("washout", TAIL, "--weight", "750kg", "--aileron-margin", "0.05", "--format", "json");
        assertTrue(text(at(json(tail), "caution")).contains("spanlift balance gives the trimmed stall speeds"));
        CliRun alone = CliRun.of("washout", ALONE, "--weight", "750kg", "--aileron-margin", "0.05", "--format", "json");
        assertTrue(text(at(json(alone), "caution")).contains("for the wing alone (the tail's download"));
    }

    private static YamlValue json(CliRun run) {
        assertEquals(0, run.exitCode(), run.err());
        assertFalse(run.out().contains("NaN"), run.out());
        return YamlParser.parse(run.out(), "output.json");
    }

    private static double number(YamlValue v) {
        return Double.parseDouble(text(v));
    }

    private static String text(YamlValue v) {
        assertNotNull(v);
        return ((YamlValue.Scalar) v).text();
    }

    /** The value at a dotted path of mapping keys and list indices, or null. */
    private static YamlValue at(YamlValue root, String dotted) {
        YamlValue v = root;
        for (String step : dotted.split("\\.")) {
            if (v instanceof YamlValue.Mapping m) {
                v = m.get(step).orElse(null);
            } else if (v instanceof YamlValue.Sequence q && step.matches("\\d+")) {
                v = q.items().get(Integer.parseInt(step));
            } else {
                return null;
            }
            if (v == null) {
                return null;
            }
        }
        return v;
    }
}
