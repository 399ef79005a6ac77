package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.cli.plot.PlotKind;
import org.spanlift.cli.plot.SvgSupport;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

class ReportCommandTest {

    @TempDir
    Path dir;

    private String report(String wing, String... extra) throws Exception {
        Path out = dir.resolve("report.html");
        List<String> args = new ArrayList<>(List.of("report", CliRun.demo(wing), "--output", out.toString()));
        args.addAll(List.of(extra));
        CliRun r = CliRun.of(args.toArray(String[]::new));
        assertEquals(0, r.exitCode(), r.err());
        return Files.readString(out);
    }

    @Test
    void reportContainsEveryPlot() throws Exception {
        Document doc = SvgSupport.parse(report("trainer.wing.yaml"));
        List<String> figures = new ArrayList<>();
        for (Element svg : SvgSupport.all(doc, "svg")) {
            String label = svg.getAttribute("aria-labelledby");
            figures.add(label.substring(0, label.indexOf("-title")));
            assertFalse(SvgSupport.all(doc, "path").isEmpty());
        }
        List<String> expected = new ArrayList<>();
        for (PlotKind k : PlotKind.values()) {
            expected.add(k.figureId());
        }
        assertEquals(expected, figures, "one inline figure per plot kind, in order");
        List<String> ids = SvgSupport.ids(doc);
        assertEquals(ids.size(), new HashSet<>(ids).size(), "ids are unique across the page");
    }

    @Test
    void reportIsSelfContainedAndCarriesTheCaution() throws Exception {
        String html = report("trainer.wing.yaml");
        assertFalse(html.contains("<script"), "no scripts");
        assertFalse(html.contains("<link"), "no linked files");
        Matcher m = Pattern.compile("(?:src|href)=\"([^\"]*)\"|url\\(([^)]*)\\)").matcher(html);
        while (m.find()) {
            String ref = m.group(1) != null ? m.group(1) : m.group(2);
            assertTrue(ref.startsWith("#"), "reference outside the page: " + ref);
        }
        Matcher urls = Pattern.compile("https?://[^\"' <>]+").matcher(html);
        while (urls.find()) {
            assertTrue(urls.group().startsWith("http://www.w3.org/"), urls.group());
        }
        assertTrue(html.contains("they do not certify it"));
        assertTrue(html.contains("airworthiness standards"));
        assertTrue(html.contains("@media print"));
    }

    @Test
    void reportHasKeyResultsLatticeAndConvergence() throws Exception {
        String html = report("trainer.wing.yaml");
        for (String s : List.of("Key results", "lift slope", "zero-lift angle", "span efficiency e at CL 0.50",
                "Coefficients by angle of attack", "Lattice of the file", "32 strips", "64 strips", "512 panels",
                "cosine", "Convergence")) {
            assertTrue(html.contains(s), s);
        }
    }

    @Test
    void reportStatesItsConditionAndShowsCleanAndFlappedSideBySide() throws Exception {
        String html = report("trainer.wing.yaml", "--flaps", "30", "--weight", "750kg", "--altitude", "1000m");
        int top = html.indexOf("</header>");
        String header = html.substring(0, top);
        for (String s : List.of("Condition:", "weight 7355 N (750.0 kg)", "pressure altitude 1000 m (standard "
                + "atmosphere, geopotential)", "flap 30.0\u00b0")) {
            assertTrue(header.contains(s), s + " in the page's header");
        }
        assertTrue(html.contains("Clean and with flaps"), "a side-by-side table");
        assertTrue(html.contains(">clean</th>") && html.contains(">flaps</th>"), "clean and flaps columns");
        assertTrue(html.contains("stall speed, clean") && html.contains("stall speed, flaps"), "both stall speeds");
        assertTrue(html.contains("stall-onset CL, clean"), "the convergence note covers the stall onset");
        assertTrue(html.contains("The figures show the wing with flaps"), "the figures' configuration is stated");
    }

    @Test
    void reportInUsUnits() throws Exception {
        String html = report("trainer.wing.yaml", "--units", "us", "--weight", "750kg");
        assertTrue(html.contains("weight 1653 lbf"), "weight in lbf");
        assertTrue(html.contains("lengths in ft"), "lengths in ft");
        assertTrue(html.contains("reference span [ft]"), "reference values in ft");
    }

    @Test
    void everyFigureCaptionStatesTheConfiguration() throws Exception {
        Document doc = SvgSupport.parse(report("trainer.wing.yaml", "--flaps", "20", "--weight", "750kg"));
        List<Element> captions = SvgSupport.all(doc, "figcaption");
        assertEquals(PlotKind.values().length, captions.size());
        // 750 kg at standard gravity, 9.80665 m/s^2
        String weight = String.format(java.util.Locale.ROOT, "weight %.0f N", 750 * 9.80665);
        for (Element caption : captions) {
            String text = caption.getTextContent();
            assertTrue(text.contains("Drawn for flap 20\u00b0 trailing edge down; " + weight
                    + "; pressure altitude 0 m."),
                    text);
        }
    }

    @Test
    void reportIsDeterministic() throws Exception {
        byte[] a = report("tourer.wing.yaml", "--flaps", "15").getBytes(java.nio.charset.StandardCharsets.UTF_8);
        byte[] b = report("tourer.wing.yaml", "--flaps", "15").getBytes(java.nio.charset.StandardCharsets.UTF_8);
        assertArrayEquals(a, b);
    }

    @Test
    void reportRefusesAnotherExtension() {
        CliRun r = CliRun.of("report", CliRun.demo("trainer.wing.yaml"), "--output", dir.resolve("r.pdf").toString());
        assertEquals(2, r.exitCode());
        assertEquals(1, r.err().lines().count(), r.err());
    }
}
