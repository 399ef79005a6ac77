package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.balance.BalanceStudy;
import org.spanlift.balance.CentreOfGravity;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.Wing;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;
import org.spanlift.io.WingFileReader;
import org.spanlift.solve.WingAnalysis;

/** {@code spanlift balance}: the library's numbers under the keys the JSON promises, the table, and refusals. */
class BalanceCommandTest {

    private static final String TRAINER = CliRun.demo("trainer-tail.wing.yaml");

    private static YamlValue json(CliRun r) {
        assertEquals(0, r.exitCode(), r.err());
        assertFalse(r.out().contains("NaN"));
        return YamlParser.parse(r.out(), "output.json");
    }

    private static YamlValue at(YamlValue root, String dotted) {
        YamlValue v = root;
        for (String step : dotted.split("\\.")) {
            v = v instanceof YamlValue.Mapping m ? m.get(step).orElseThrow(() -> new AssertionError("no " + dotted))
                    : ((YamlValue.Sequence) v).items().get(Integer.parseInt(step));
        }
        return v;
    }

    private static double number(YamlValue root, String dotted) {
        return Double.parseDouble(((YamlValue.Scalar) at(root, dotted)).text());
    }

    @Test
    void theJsonCarriesTheLibrarysBalanceUnderThePromisedKeys() {
        YamlValue j = json(CliRun.of("balance", TRAINER, "--cg", "25%mac", "--cg", "0.3m", "--weight", "750kg",
                "--flaps", "30", "--format", "json"));
        Wing wing = WingFileReader.read(Path.of(TRAINER));
        WingAnalysis a = WingAnalysis.of(wing);
        double[] asked = a.deflections(java.util.Map.of("flap", Math.toRadians(30)));
        FlightCondition fc = new FlightCondition(750 * 9.80665, 1, StandardAtmosphere.at(0, 0), OptionalDouble.empty());
        List<String> cgs = List.of("25%mac", "0.3m");
        for (int i = 0; i < cgs.size(); i++) {
            BalanceStudy s = BalanceStudy.of(a, asked, CentreOfGravity.parse(cgs.get(i)), Optional.of(fc),
                    OptionalDouble.empty());
            assertEquals(s.neutralPoint().x(), number(j, "neutral_point.x"), 0);
            assertEquals(s.neutralPoint().macFraction(), number(j, "neutral_point.mac_fraction"), 0);
            assertEquals(s.staticMargin(), number(j, "static_margin." + i), 0);
            assertEquals(s.derivatives().liftSlope(), number(j, "derivatives." + i + ".CL_alpha"), 0);
            assertEquals(s.derivatives().momentSlope(), number(j, "derivatives." + i + ".Cm_alpha"), 0);
            assertEquals(s.derivatives().liftPerRate(), number(j, "derivatives." + i + ".CL_q"), 0);
            assertEquals(s.derivatives().momentPerRate(), number(j, "derivatives." + i + ".Cm_q"), 0);
            assertEquals(s.derivatives().liftPerElevator().getAsDouble(), number(j, "derivatives." + i + ".CL_de"), 0);
            assertEquals(s.derivatives().momentPerElevator().getAsDouble(), number(j, "derivatives." + i + ".Cm_de"),
                    0);
            assertEquals(s.downwashGradient().getAsDouble(), number(j, "derivatives." + i + ".downwash_gradient"), 0);
            assertEquals(s.stallClean().orElseThrow().equivalentSpeed(),
                    number(j, "stall_speed_trimmed." + i + ".clean_eas"), 0);
            assertEquals(s.stallFlaps().orElseThrow().equivalentSpeed(),
                    number(j, "stall_speed_trimmed." + i + ".flaps_eas"), 0);
        }
        assertEquals("onset", ((YamlValue.Scalar) at(j, "stall_speed_trimmed.0.basis")).text());
        assertTrue(((YamlValue.Sequence) at(j, "trim")).items().size() >= 8, "a trim table for each centre of gravity");
        assertEquals(0.3, number(j, "trim.6.cg_x"), 1e-12);
        assertTrue(number(j, "forward_limit.mac_fraction") < 0.25);
        assertTrue(((YamlValue.Scalar) at(j, "caution")).text().startsWith("Caution:"));
    }

    @Test
    void theTableGivesTheNeutralPointMarginsTrimAndTrimmedStall() {
        CliRun r = CliRun.of("balance", TRAINER, "--cg", "25%mac", "--weight", "750kg");
        assertEquals(0, r.exitCode(), r.err());
        for (String s : List.of("Neutral point, stick fixed", "static margin / MAC", "pitch rate q c/(2V)",
                "Trim in level flight", "Trimmed stall, power off", "Forward limit", "Stick-free stability is not "
                + "computed", "Caution:")) {
            assertTrue(r.out().contains(s), "missing '" + s + "' in:\n" + r.out());
        }
        assertFalse(r.out().contains("NaN"));
    }

    @Test
    void withoutAnElevatorTheMarginsStandAndTrimIsSaidToBeUnavailable() {
        CliRun r = CliRun.of("balance", CliRun.demo("trainer.wing.yaml"), "--cg", "25%mac", "--weight", "750kg");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("Trim is unavailable"), r.out());
        assertTrue(r.out().contains("static margin"), r.out());
    }

    @Test
    void aMalformedCentreOfGravityIsRefusedInOneLine() {
        CliRun r = CliRun.of("balance", TRAINER, "--cg", "25%");
        assertEquals(2, r.exitCode());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains("--cg") && r.err().contains("25%mac"), r.err());
        assertEquals("", r.out());
    }

    @Test
    void aCentreOfGravityFarOutsideTheAirframeIsRefusedInOneLine() {
        CliRun r = CliRun.of("balance", TRAINER, "--cg", "200m");
        assertEquals(2, r.exitCode());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains("the centre of gravity 200m lies"), r.err());
        assertEquals("", r.out());
    }

    @Test
    void aTrimSpeedWithoutAWeightIsRefused() {
        CliRun r = CliRun.of("balance", TRAINER, "--cg", "25%mac", "--trim-speed", "90kt");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("--weight"), r.err());
    }

    @Test
    void theReportGainsABalanceSectionWithTheSameMarginAndTrimmedStallSpeed() {
        CliRun report = CliRun.of("report", TRAINER, "--cg", "25%mac", "--weight", "750kg", "--format", "html");
        assertEquals(0, report.exitCode(), report.err());
        YamlValue j = json(CliRun.of("balance", TRAINER, "--cg", "25%mac", "--weight", "750kg", "--format", "json"));
        String html = report.out();
        int section = html.indexOf("<h2>Balance</h2>");
        assertTrue(section > 0, "a balance section");
        String rest = html.substring(section);
        assertTrue(rest.contains(String.format(java.util.Locale.ROOT, "%.3f", number(j, "static_margin.0"))), rest);
        assertTrue(rest.contains(String.format(java.util.Locale.ROOT, "%.2f",
                number(j, "stall_speed_trimmed.0.clean_eas"))), "the trimmed stall speed");
        assertTrue(html.contains("trimmed stall speed, clean"), "among the key results");
    }
}
