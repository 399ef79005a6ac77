package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.spanlift.atmosphere.AtmosphereState;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.flight.FlightCondition;
import org.spanlift.flight.FlightPoint;
import org.spanlift.flight.ReynoldsRule;
import org.spanlift.geometry.Wing;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;
import org.spanlift.io.WingFileReader;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.StallStudy;

/**
 * A Java user gets, through the library alone, the CD that {@code solve} prints and the stall speeds that
 * {@code stall} prints: the Reynolds-number rule, profile drag and the clean-and-flapped stall study are core
 * services, not command-line logic.
 */
class LibraryReproducesCliTest {

    private static final String FILE = CliRun.demo("trainer.wing.yaml");
    private static final double WEIGHT_N = 750 * StandardAtmosphere.G0;

    @Test
    void solvesCdAtTheLevelFlightReynoldsNumberOfEachPoint() {
        YamlValue printed = json(CliRun.of("solve", FILE, "--alpha", "0,4,8", "--weight", "750kg", "--altitude",
                "1000m", "--format", "json"));

        Wing wing = WingFileReader.read(java.nio.file.Path.of(FILE));
        WingAnalysis analysis = WingAnalysis.of(wing);
        AtmosphereState air = StandardAtmosphere.at(1000, 0);
        FlightCondition condition = new FlightCondition(WEIGHT_N, 1, air, OptionalDouble.empty());
        ReynoldsRule rule = ReynoldsRule.of(wing.reference(), air, OptionalDouble.empty(), Optional.of(condition));
        double[] alphas = {0, 4, 8};
        for (int i = 0; i < alphas.length; i++) {
            FlightPoint p = FlightPoint.of(analysis.solve(Math.toRadians(alphas[i])), wing, rule);
            assertEquals(p.drag().getAsDouble(), number(printed, "points", i, "CD"), 0, "CD at " + alphas[i]);
            assertEquals(p.profileDrag().getAsDouble(), number(printed, "points", i, "CDp"), 0);
        }
    }

    @Test
    void stallSpeedsCleanAndFlapped() {
        YamlValue printed = json(CliRun.of("stall", FILE, "--weight", "750kg", "--altitude", "1000m", "--flaps", "30",
                "--format", "json"));

        Wing wing = WingFileReader.read(java.nio.file.Path.of(FILE));
        WingAnalysis analysis = WingAnalysis.of(wing);
        FlightCondition condition = new FlightCondition(WEIGHT_N, 1, StandardAtmosphere.at(1000, 0),
                OptionalDouble.empty());
        StallStudy study = StallStudy.of(analysis, analysis.deflections(Map.of("flap", Math.toRadians(30))),
                OptionalDouble.empty(), Optional.of(condition));
        assertEquals(study.clean().speed().orElseThrow().equivalent(), number(printed, "stall_speed", -1, "clean_eas"),
                0);
        assertEquals(study.clean().speed().orElseThrow().trueSpeed(), number(printed, "stall_speed", -1, "clean_tas"),
                0);
        assertEquals(study.flaps().orElseThrow().speed().orElseThrow().equivalent(),
                number(printed, "stall_speed", -1, "flaps_eas"), 0);
        assertEquals(study.flaps().orElseThrow().estimate().lift(), number(printed, "stall_flaps", -1, "CL"), 0);
    }

    private static YamlValue json(CliRun run) {
        assertEquals(0, run.exitCode(), run.err());
        return YamlParser.parse(run.out(), "output.json");
    }

    /** The number at root.key[index].leaf (index -1: root.key.leaf). */
    private static double number(YamlValue root, String key, int index, String leaf) {
        YamlValue v = ((YamlValue.Mapping) root).get(key).orElseThrow();
        if (index >= 0) {
            v = ((YamlValue.Sequence) v).items().get(index);
        }
        return Double.parseDouble(((YamlValue.Scalar) ((YamlValue.Mapping) v).get(leaf).orElseThrow()).text());
    }
}
