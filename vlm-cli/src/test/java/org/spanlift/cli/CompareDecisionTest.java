package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;

/**
 * {@code compare} answers "which wing, at what stall speed and root bending" in one run, and each of its
 * values is the one the single-wing command prints for the same options.
 */
class CompareDecisionTest {

    private static final String TRAINER = CliRun.demo("trainer.wing.yaml");
    private static final String TOURER = CliRun.demo("tourer.wing.yaml");
    private static final String[] CONDITION = {"--weight", "750kg", "--altitude", "1000m", "--flaps", "20",
        "--assume-cl-max"};

    private static YamlValue compare;

    @BeforeAll
    static void compareOnce() {
        CliRun r = CliRun.of(concat(new String[] {"compare", TRAINER, TOURER, "--load-factor", "3.8", "--speed",
            "110kt", "--format", "json"}, CONDITION));
        assertEquals(0, r.exitCode(), r.err());
        compare = YamlParser.parse(r.out(), "compare.json");
    }

    @Test
    void stallRowsEqualTheStallCommand() {
        for (int i = 0; i < 2; i++) {
            String file = i == 0 ? TRAINER : TOURER;
            CliRun s = CliRun.of(concat(new String[] {"stall", file, "--format", "json"}, CONDITION));
            assertEquals(0, s.exitCode(), s.err());
            YamlValue stall = YamlParser.parse(s.out(), "stall.json");
            for (String key : List.of("stall.CL", "stall.alpha_deg", "stall.eta", "stall.aileron_margin.dcl",
                    "stall_flaps.CL", "stall_flaps.eta", "flap_increment_CL", "stall_speed.clean_eas",
                    "stall_speed.flaps_eas", "stall_speed.clean_tas")) {
                assertEquals(text(at(stall, key.split("\\."))), text(wing(i, key)), key + " of wing " + i);
            }
        }
    }

    @Test
    void rootLoadsEqualTheLoadsCommandForTheSameCase() {
        CliRun l = CliRun.of("loads", TRAINER, "--weight", "750kg", "--altitude", "1000m", "--load-factor", "3.8",
                "--speed", "110kt", "--format", "json");
        assertEquals(0, l.exitCode(), l.err());
        YamlValue loads = YamlParser.parse(l.out(), "loads.json");
        YamlValue firstCase = ((YamlValue.Sequence) at(loads, "cases")).items().get(0);
        for (String key : List.of("root.shear", "root.bending", "root.torsion", "CL")) {
            assertEquals(text(at(firstCase, key.split("\\."))), text(wing(0, "loads." + key)), key);
        }
        assertTrue(text(at(compare, "caution")).startsWith("Caution"), "values bearing on safety carry the caution");
    }

    @Test
    void aerodynamicRowsAreCleanAsSolvePrintsThem() {
        CliRun s = CliRun.of("solve", TRAINER, "--cl", "0.5", "--format", "json");
        assertEquals(0, s.exitCode(), s.err());
        YamlValue point = ((YamlValue.Sequence) at(YamlParser.parse(s.out(), "solve.json"), "points")).items().get(0);
        assertEquals(text(at(point, "e")), text(wing(0, "e@CL=0.5")));
        assertEquals(text(at(point, "CDi")), text(wing(0, "CDi@CL=0.5")));
    }

    @Test
    void tableStatesTheConditionAndFollowsTheUnitSystem() {
        CliRun si = CliRun.of(concat(new String[] {"compare", TRAINER, TOURER, "--load-factor", "3.8", "--speed",
            "110kt"}, CONDITION));
        assertEquals(0, si.exitCode(), si.err());
        assertTrue(si.out().contains("weight 7355 N (750.0 kg)"), si.out());
        assertTrue(si.out().contains("pressure altitude 1000 m"), si.out());
        assertTrue(si.out().contains("root bending in the load case"), si.out());
        assertTrue(si.out().contains("N m"), si.out());
        CliRun us = CliRun.of(concat(new String[] {"compare", TRAINER, TOURER, "--units", "us", "--load-factor",
            "3.8", "--speed", "110kt"}, CONDITION));
        assertEquals(0, us.exitCode(), us.err());
        assertTrue(us.out().contains("weight 1653 lbf"), us.out());
        assertTrue(us.out().contains("ft lbf"), us.out());
        assertTrue(us.out().contains("pressure altitude 3281 ft"), us.out());
    }

    private static YamlValue wing(int i, String flatKey) {
        YamlValue w = ((YamlValue.Sequence) at(compare, "wings")).items().get(i);
        return ((YamlValue.Mapping) w).get(flatKey).orElseThrow(() -> new AssertionError("compare has no " + flatKey));
    }

    private static YamlValue at(YamlValue root, String... path) {
        YamlValue v = root;
        for (String p : path) {
            v = ((YamlValue.Mapping) v).get(p).orElseThrow(() -> new AssertionError("no " + p));
        }
        return v;
    }

    private static String text(YamlValue v) {
        return ((YamlValue.Scalar) v).text();
    }

    private static String[] concat(String[] a, String[] b) {
        String[] out = new String[a.length + b.length];
        System.arraycopy(a, 0, out, 0, a.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }
}
