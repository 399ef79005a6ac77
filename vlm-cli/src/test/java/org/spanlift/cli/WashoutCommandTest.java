package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;

/** {@code spanlift washout}: its answer, round trip through {@code stall}, its outputs and refusals. */
class WashoutCommandTest {

    @TempDir
    Path dir;

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

    /** The tourer with its washout replaced. */
    private Path tourerWith(double washoutDeg) throws IOException {
        String text = Files.readString(Path.of(CliRun.demo("tourer.wing.yaml")), StandardCharsets.UTF_8);
        String changed = text.replace("washout: 2}", String.format(Locale.ROOT, "washout: %.17g}", washoutDeg));
        assertTrue(!changed.equals(text), "the demo's washout key was found");
        Path file = dir.resolve("tourer-" + washoutDeg + ".wing.yaml");
        Files.writeString(file, changed, StandardCharsets.UTF_8);
        return file;
    }

    @Test
    void theWashoutFoundMeetsTheAileronMarginWhenStallAnalysesTheWingWithIt() throws IOException {
        YamlValue w = json(CliRun.of("washout", CliRun.demo("tourer.wing.yaml"), "--aileron-margin", "0.1",
                "--assume-cl-max=1.4", "--format", "json"));
        assertEquals("true", ((YamlValue.Scalar) at(w, "met")).text());
        double washout = number(w, "washout_deg");
        YamlValue stall = json(CliRun.of("stall", tourerWith(washout).toString(), "--assume-cl-max=1.4",
                "--format", "json"));
        assertTrue(number(stall, "stall.aileron_margin.dcl") >= 0.1 - 1e-6);
        YamlValue less = json(CliRun.of("stall", tourerWith(washout - 0.01).toString(), "--assume-cl-max=1.4",
                "--format", "json"));
        assertTrue(number(less, "stall.aileron_margin.dcl") < 0.1, "a washout smaller by the tolerance misses it");
        for (String key : new String[] {"washout_change_deg", "requirements.0.slack", "stall.CL", "stall.eta",
                "stall.aileron_margin.dcl", "cruise.CL", "cruise.e", "cruise.CDi", "trade.0.washout_deg"}) {
            at(w, key);
        }
        assertEquals(washout - 2, number(w, "washout_change_deg"), 1e-9, "the change to the file's 2 degrees");
    }

    @Test
    void anUnreachableRequirementIsAnsweredWithWhatFailsAndByHowMuch() {
        CliRun r = CliRun.of("washout", CliRun.demo("tourer.wing.yaml"), "--aileron-margin", "0.9",
                "--assume-cl-max=1.4");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("NO washout from 0.0 to 10.0 deg meets them"), r.out());
        assertTrue(r.out().contains("NO"), r.out());
    }

    @Test
    void withoutARequirementOrWithAnUnknownControlItIsRefused() {
        CliRun none = CliRun.of("washout", CliRun.demo("tourer.wing.yaml"), "--assume-cl-max=1.4");
        assertEquals(2, none.exitCode());
        assertTrue(none.err().contains("give at least one requirement"), none.err());
        CliRun unknown = CliRun.of("washout", CliRun.demo("tourer.wing.yaml"), "--onset-inboard-of", "spoiler",
                "--assume-cl-max=1.4");
        assertEquals(2, unknown.exitCode());
        assertTrue(unknown.err().contains("no control named 'spoiler'"), unknown.err());
    }

    @Test
    void compareAndReportGiveTheSameAnswerAsWashout() throws IOException {
        YamlValue w = json(CliRun.of("washout", CliRun.demo("tourer.wing.yaml"), "--aileron-margin", "0.1",
                "--assume-cl-max=1.4", "--format", "json"));
        YamlValue cmp = json(CliRun.of("compare", CliRun.demo("tourer.wing.yaml"), CliRun.demo("trainer.wing.yaml"),
                "--aileron-margin", "0.1", "--assume-cl-max=1.4", "--format", "json"));
        YamlValue first = ((YamlValue.Sequence) at(cmp, "wings")).items().get(0);
        double compared = Double.parseDouble(((YamlValue.Scalar) ((YamlValue.Mapping) first).get("washout.least_deg")
                .orElseThrow()).text());
        assertEquals(number(w, "washout_deg"), compared, 0);
        CliRun report = CliRun.of("report", CliRun.demo("tourer.wing.yaml"), "--aileron-margin", "0.1",
                "--assume-cl-max=1.4", "--output", dir.resolve("r.html").toString());
        assertEquals(0, report.exitCode(), report.err());
        String html = Files.readString(dir.resolve("r.html"), StandardCharsets.UTF_8);
        assertTrue(html.contains(String.format(Locale.ROOT, "is %.2f degrees", number(w, "washout_deg"))),
                "the report states the same washout");
        assertTrue(html.contains("figure-washout-trade"), "and draws the trade");
    }

    @Test
    void theTradeFigureIsDrawn() {
        CliRun svg = CliRun.of("washout", CliRun.demo("tourer.wing.yaml"), "--aileron-margin", "0.1",
                "--assume-cl-max=1.4", "--format", "svg");
        assertEquals(0, svg.exitCode(), svg.err());
        assertTrue(svg.out().contains("<svg"), "an SVG document");
        assertTrue(svg.out().contains("least washout that meets them"), "its description names the answer");
    }

    /**
     * The tourer's trapezoid (quarter chord unswept) written instead as stations at the root, the twist stations and
     * the tip, with the twists washout gives there.
     */
    private Path tourerAsStations(YamlValue twist) throws IOException {
        StringBuilder stations = new StringBuilder();
        for (YamlValue st : ((YamlValue.Sequence) at(twist, "twist.stations")).items()) {
            double y = number(st, "y") / 0.3048;
            double chord = 5.6 * (1 - 0.5 * y / 17.0);
            double z = y * Math.tan(Math.toRadians(5));
            stations.append(String.format(Locale.ROOT, "      - {y: %.17g, chord: %.17g, nose-x: %.17g, nose-z: %.17g, "
                    + "twist: %.17g, section: main}%n", y, chord, 0.25 * (5.6 - chord), z, number(st, "twist_deg")));
        }
        String text = Files.readString(Path.of(CliRun.demo("tourer.wing.yaml")), StandardCharsets.UTF_8);
        String line = "    trapezoid: {span: 34.0, root-chord: 5.6, taper: 0.5, sweep: 0, dihedral: 5, washout: 2}\n";
        assertTrue(text.contains(line), "the demo's trapezoid line was found");
        Path file = dir.resolve("tourer-stations.wing.yaml");
        Files.writeString(file, text.replace(line, "    stations:\n" + stations), StandardCharsets.UTF_8);
        return file;
    }

    @Test
    void theTwistDistributionWrittenIntoTheFileAsStationsMeetsTheRequirementsWhenStallAnalysesIt() throws IOException {
        YamlValue w = json(CliRun.of("washout", CliRun.demo("tourer.wing.yaml"), "--aileron-margin", "0.1",
                "--onset-inboard-of", "aileron", "--assume-cl-max=1.4", "--twist-stations", "4", "--format", "json"));
        assertEquals("true", ((YamlValue.Scalar) at(w, "met")).text());
        Path stations = tourerAsStations(w);
        YamlValue stall = json(CliRun.of("stall", stations.toString(), "--assume-cl-max=1.4", "--format", "json"));
        assertTrue(number(stall, "stall.aileron_margin.dcl") >= 0.1 - 1e-6, "margin");
        assertTrue(number(stall, "stall.y") <= 10.0 * 0.3048, "onset inboard of the aileron");
        assertEquals(number(w, "stall.CL"), number(stall, "stall.CL"), 1e-6, "the same onset");
        // the total washout and its change to the file's 2 degrees, as the stations say
        double root = number(w, "twist.stations.0.twist_deg");
        double tip = number(w, "twist.stations.4.twist_deg");
        assertEquals(root - tip, number(w, "washout_deg"), 1e-9);
        assertEquals(root - tip - 2, number(w, "washout_change_deg"), 1e-9);
        assertEquals(0, number(w, "twist.stations.0.twist_change_deg"), 0);
    }

    @Test
    void theTwistDistributionCostsNoMoreInCruiseThanTheLeastLinearWashout() {
        YamlValue w = json(CliRun.of("washout", CliRun.demo("tourer.wing.yaml"), "--aileron-margin", "0.1",
                "--assume-cl-max=1.4", "--twist-stations", "4", "--format", "json"));
        double linear = number(w, "cruise.CDi_linear_washout");
        assertTrue(number(w, "cruise.CDi") <= linear, number(w, "cruise.CDi") + " against " + linear);
        assertEquals(number(w, "linear_washout.washout_deg"), number(json(CliRun.of("washout",
                CliRun.demo("tourer.wing.yaml"), "--aileron-margin", "0.1", "--assume-cl-max=1.4", "--format",
                "json")), "washout_deg"), 0, "the linear answer is washout's own");
        assertTrue(number(w, "cruise.CDi") > number(w, "cruise.CDi_without_washout"),
                "a margin the untwisted wing lacks costs drag");
    }

    @Test
    void theTwistTableGivesEachStationTheWashoutAndTheCruiseComparison() {
        CliRun r = CliRun.of("washout", CliRun.demo("tourer.wing.yaml"), "--aileron-margin", "0.1",
                "--assume-cl-max=1.4", "--twist-stations", "3");
        assertEquals(0, r.exitCode(), r.err());
        for (String words : new String[] {"station y [ft]", "change [deg]", "Washout (root twist minus tip twist)",
                "zero washout", "least linear washout", "twist distribution", "Against the least linear washout",
                "Caution"}) {
            assertTrue(r.out().contains(words), words + " in\n" + r.out());
        }
        assertEquals(3 + 1, r.out().lines().filter(l -> l.matches("^[0-9]+\\.[0-9]{3}  .*")).count(),
                "the root and three stations:\n" + r.out());
    }

    @Test
    void twistOptionsThatDoNotFitAreRefusedInOneLineWithoutOutput() {
        String tourer = CliRun.demo("tourer.wing.yaml");
        String[][] cases = {
            {"--twist-bounds", "-5:5"},
            {"--smoothness", "1"},
            {"--twist-stations", "0"},
            {"--twist-stations", "4.5"},
            {"--twist-stations", "17"},
            {"--twist-stations", "4", "--twist-bounds", "5:-5"},
            {"--twist-stations", "4", "--twist-bounds", "-30:5"},
            {"--twist-stations", "4", "--smoothness", "-1"},
            {"--twist-stations", "4", "--format", "svg"},
            {"--twist-stations", "4", "--ailerons-below-peak"},
        };
        for (String[] extra : cases) {
            String[] args = new String[5 + extra.length];
            args[0] = "washout";
            args[1] = tourer;
            args[2] = "--aileron-margin";
            args[3] = "0.1";
            args[4] = "--assume-cl-max=1.4";
            System.arraycopy(extra, 0, args, 5, extra.length);
            CliRun r = CliRun.of(args);
            assertEquals(2, r.exitCode(), String.join(" ", extra) + ": " + r.err());
            assertEquals("", r.out(), String.join(" ", extra));
            assertEquals(1, r.err().strip().lines().count(), r.err());
            assertFalse(r.err().contains("Exception") || r.err().contains("NaN"), r.err());
        }
    }

    @Test
    void theCruiseOfATwistDistributionIsFlownWithTheFlapsUpWhateverTheStallIsStudiedWith() {
        String trainer = CliRun.demo("trainer.wing.yaml");
        YamlValue clean = json(CliRun.of("washout", trainer, "--aileron-margin", "0.05", "--twist-stations", "4",
                "--format", "json"));
        YamlValue flapped = json(CliRun.of("washout", trainer, "--aileron-margin", "0.05", "--flaps", "20",
                "--twist-stations", "4", "--format", "json"));
        assertEquals(number(clean, "cruise.CDi_without_washout"), number(flapped, "cruise.CDi_without_washout"), 0);
        assertTrue(number(clean, "stall.CL") != number(flapped, "stall.CL"), "the stall is studied with the flaps");
    }
}
