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

class LoadsCommandTest {

    /** The demo trainer wing, which carries a structure section (invented masses). */
    private static String trainerWithStructure() throws IOException {
        String path = CliRun.demo("trainer.wing.yaml");
        if (!Files.readString(Path.of(path)).contains("structure:")) {
            throw new IllegalStateException("the demo trainer lost its structure section");
        }
        return path;
    }

    @Test
    void singleCaseJsonCarriesTheContractKeysAndTheCaution() throws IOException {
        String wing = trainerWithStructure();
        CliRun r = CliRun.of("loads", wing, "--weight", "750kg", "--load-factor", "3.8", "--speed", "110kt",
                "--format", "json");
        assertEquals(0, r.exitCode(), r.err());
        for (String key : List.of("\"cases\"", "\"load_factor\"", "\"speed\"", "\"y\"", "\"shear\"", "\"bending\"",
                "\"torsion\"", "\"root\"", "\"governing\"", "\"max_case\"", "\"min_case\"", "\"units\"", "\"caution\"",
                "\"sign_conventions\"", "\"half_wing_mass\"")) {
            assertTrue(r.out().contains(key), "missing " + key);
        }
        assertTrue(r.out().contains("preliminary sizing only"));
        assertTrue(r.out().contains("no safety factor applied"));
        assertTrue(r.out().contains("\"half_wing_mass\": 86.4"), "48 kg spread + 38.4 kg of point masses");
        assertFalse(r.out().contains("NaN"));
    }

    @Test
    void casesFileGivesOneCaseEachAndTheGoverningTable() throws IOException {
        String wing = trainerWithStructure();
        CliRun r = CliRun.of("loads", wing, "--cases", CliRun.demo("trainer.cases.yaml"));
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("push-over at cruise speed"));
        assertTrue(r.out().contains("governing case at each station"));
        assertTrue(r.out().contains("Caution: loads for preliminary sizing only"));
    }

    @Test
    void envelopeNamesTheGustFormulaAndSaysItIsNoCompliance() throws IOException {
        String wing = trainerWithStructure();
        CliRun r = CliRun.of("loads", wing, "--envelope", CliRun.demo("trainer.envelope.yaml"), "-f", "json");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("23.341"));
        assertTrue(r.out().contains("not a statement of compliance"));
        assertTrue(r.out().contains("\"gust_alleviation_factor\""));
    }

    @Test
    void safetyFactorMultipliesAndSaysSo() throws IOException {
        String wing = trainerWithStructure();
        CliRun limit = CliRun.of("loads", wing, "--weight", "750kg", "--load-factor", "3.8", "--speed", "110kt", "-f",
                "csv");
        CliRun ult = CliRun.of("loads", wing, "--weight", "750kg", "--load-factor", "3.8", "--speed", "110kt", "-f",
                "csv", "--safety-factor", "1.5");
        assertEquals(0, ult.exitCode(), ult.err());
        // the CSV is data from its first line: the caution and the factor are columns of every row
        assertTrue(ult.out().startsWith("case,name,"), ult.out().lines().findFirst().orElse(""));
        String row = ult.out().lines().toList().get(1);
        assertTrue(row.contains("safety factor 1.50") && row.contains("Caution:"), row);
        double m0 = Double.parseDouble(limit.out().lines().toList().get(1).split(",")[7]);
        double m1 = Double.parseDouble(ult.out().lines().toList().get(1).split(",")[7]);
        assertEquals(1.5 * m0, m1, 1e-6 * m1);
    }

    @Test
    void wingMassOptionReplacesTheFilesMass() throws IOException {
        String wing = trainerWithStructure();
        CliRun r = CliRun.of("loads", wing, "--weight", "750kg", "--load-factor", "1", "--speed", "80kt", "-f", "json",
                "--wing-mass", "0kg");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("\"distributed_mass_per_half\": 0"),
                r.out().lines().filter(l -> l.contains("distributed"))
                .findFirst().orElse(""));
    }

    @Test
    void badInputGetsOneLineAndExitCodeTwo(@TempDir Path dir) throws IOException {
        String wing = trainerWithStructure();
        Path cases = dir.resolve("bad.cases.yaml");
        Files.writeString(cases, "cases:\n  - {load-factor: 3.8, speed: 100kt}\n");
        CliRun r = CliRun.of("loads", wing, "--cases", cases.toString());
        assertEquals(2, r.exitCode());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().contains("bad.cases.yaml:2: cases[0].weight: missing key; expected"), r.err());

        Path badWing = dir.resolve("bad.wing.yaml");
        Files.writeString(badWing, Files.readString(Path.of(wing)).replace("y: 1.3, x: 0.55", "y: 6.3, x: 0.55"));
        CliRun w = CliRun.of("loads", badWing.toString(), "--weight", "750kg", "--speed", "100kt");
        assertEquals(2, w.exitCode());
        assertEquals(1, w.err().lines().count(), w.err());
        assertTrue(w.err().contains("structure.point-masses[0].y"), w.err());

        CliRun none = CliRun.of("loads", wing);
        assertEquals(2, none.exitCode());
        CliRun both = CliRun.of("loads", wing, "--weight", "750kg", "--speed", "100kt", "--cases", cases.toString());
        assertEquals(2, both.exitCode());
        CliRun noSpeed = CliRun.of("loads", wing, "--weight", "750kg");
        assertEquals(2, noSpeed.exitCode());
        assertTrue(noSpeed.err().contains("--speed"), noSpeed.err());
    }

    @Test
    void aCaseBeyondTheStallOnsetIsRefusedUnlessAskedForAndThenFlagged() {
        String wing = CliRun.demo("trainer.wing.yaml");
        CliRun refused = CliRun.of("loads", wing, "--weight", "750kg", "--load-factor", "3.8", "--speed", "95kt");
        assertEquals(2, refused.exitCode(), refused.out());
        assertTrue(refused.err().contains("above the wing's stall-onset CL")
                && refused.err().contains("--beyond-stall"),
                refused.err());
        assertEquals(1, refused.err().lines().count(), refused.err());
        CliRun flagged = CliRun.of("loads", wing, "--weight", "750kg", "--load-factor", "3.8", "--speed", "95kt",
                "--beyond-stall", "-f", "json");
        assertEquals(0, flagged.exitCode(), flagged.err());
        assertTrue(flagged.out().contains("\"beyond_stall\": true"), flagged.out());
        CliRun table = CliRun.of("loads", wing, "--weight", "750kg", "--load-factor", "3.8", "--speed", "95kt",
                "--beyond-stall");
        assertTrue(table.out().contains("* beyond the stall onset"), table.out());
        CliRun fine = CliRun.of("loads", wing, "--weight", "750kg", "--load-factor", "3.8", "--speed", "110kt", "-f",
                "json");
        assertTrue(fine.out().contains("\"beyond_stall\": false"), fine.out());
        assertTrue(fine.out().contains("\"tail\": \"The tail's load is not included"), "the tail load is stated");
    }
}
