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

class StallCommandTest {

    @Test
    void jsonCarriesStallStallSpeedsAtmosphereAndCaution() {
        CliRun r = CliRun.of("stall", CliRun.demo("trainer.wing.yaml"), "--weight", "750kg", "--altitude", "1500m",
                "--flaps", "20", "--format", "json");
        assertEquals(0, r.exitCode(), r.err());
        for (String key : List.of("\"stall\"", "\"CL\"", "\"alpha_deg\"", "\"eta\"", "\"section\"",
                "\"aileron_margin\"", "\"dcl\"", "\"stall_speed\"", "\"clean_eas\"", "\"clean_tas\"", "\"flaps_eas\"",
                "\"flaps_tas\"", "\"atmosphere\"", "\"density\"", "\"temperature\"", "\"pressure\"", "\"reference\"",
                "\"area\"", "\"caution\"", "\"stall_flaps\"", "\"half_span_CL\"")) {
            assertTrue(r.out().contains(key), "missing " + key);
        }
        assertFalse(r.out().contains("NaN"));
    }

    @Test
    void tableCarriesTheCautionAndNoFlapColumnWithoutFlaps() {
        CliRun r = CliRun.of("stall", CliRun.demo("trainer.wing.yaml"), "--weight", "1650lb");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("Caution: an estimate from linear theory"), r.out());
        assertTrue(r.out().contains("tail's download"), r.out());
        assertFalse(r.out().contains("flaps"), r.out());
        assertTrue(r.out().contains("stall speed EAS [kt]"));
    }

    @Test
    void anOnsetBesideAFlapEndIsNamedInTheTableAndTheJson() {
        CliRun table = CliRun.of("stall", CliRun.demo("trainer.wing.yaml"), "--flaps", "30");
        assertEquals(0, table.exitCode(), table.err());
        assertTrue(table.out().contains("NOTE (flaps): stall starts beside the end of the flap at y = 2.600 m"),
                table.out());
        assertFalse(table.out().contains("NOTE (clean)"), table.out());
        CliRun json = CliRun.of("stall", CliRun.demo("trainer.wing.yaml"), "--flaps", "30", "--format", "json");
        assertEquals(0, json.exitCode(), json.err());
        assertTrue(json.out().contains("\"beside_control_end\": null"), "clean: none");
        assertTrue(json.out().contains("\"beside_control_end\": {\n      \"control\": \"flap\",\n      \"y\": 2.6,\n"
                + "      \"first_on_control\": {\n        \"CL\": "), json.out());
        assertTrue(table.out().replace("\n  ", " ").contains("On the flap itself the first station reaches cl_max at "
                + "CL"),
                table.out());
    }

    @Test
    void sectionsWithoutClMaxAreRefusedUnlessAssumedAndTheAssumptionIsFlagged() {
        CliRun refused = CliRun.of("stall", CliRun.demo("tourer.wing.yaml"));
        assertEquals(2, refused.exitCode());
        assertTrue(refused.err().contains("gives no cl-max"), refused.err());
        assertTrue(refused.err().contains("--assume-cl-max"), refused.err());
        CliRun assumed = CliRun.of("stall", CliRun.demo("tourer.wing.yaml"), "--assume-cl-max", "--format", "json");
        assertEquals(0, assumed.exitCode(), assumed.err());
        assertTrue(assumed.out().contains("\"assumed_cl_max\": true"), assumed.out());
    }

    @Test
    void weightWithoutUnitIsBadInput() {
        CliRun r = CliRun.of("stall", CliRun.demo("trainer.wing.yaml"), "--weight", "750");
        assertEquals(2, r.exitCode());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().contains("--weight"), r.err());
        assertTrue(r.err().contains("with a unit"), r.err());
    }

    @Test
    void deflectingAControlThatDoesNotExistIsBadInput() {
        CliRun r = CliRun.of("stall", CliRun.demo("trainer.wing.yaml"), "--deflect", "slat=10");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("no control of that name"), r.err());
    }

    @Test
    void aSectionTableThatIsNotMonotonicIsBadInputWithItsLine(@TempDir Path dir) throws IOException {
        Path wing = dir.resolve("w.wing.yaml");
        Files.writeString(wing, String.join("\n", "units: m", "surfaces:", "  - name: wing", "    section: a",
                "    trapezoid: {span: 9, root-chord: 1.2}", "sections:", "  a:",
                "    cl-max: {reynolds: [1.0e6, 3.0e6, 2.0e6], values: [1.3, 1.4, 1.5]}", ""));
        CliRun r = CliRun.of("stall", wing.toString());
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("w.wing.yaml:8: sections.a.cl-max.reynolds[2]: the values must increase strictly"),
                r.err());
    }

    @Test
    void aMalformedCoordinateFileIsBadInput(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("bad.dat"), "my section\n1.0 0.0\n0.5 zero\n");
        Path wing = dir.resolve("w.wing.yaml");
        Files.writeString(wing, String.join("\n", "units: m", "surfaces:", "  - name: wing", "    section: a",
                "    trapezoid: {span: 9, root-chord: 1.2}", "sections:", "  a: {camber-file: bad.dat, cl-max: 1.4}",
                ""));
        CliRun r = CliRun.of("stall", wing.toString());
        assertEquals(2, r.exitCode());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().contains("w.wing.yaml:7: sections.a.camber-file:"), r.err());
        assertTrue(r.err().contains("bad.dat:3"), r.err());
    }
}
