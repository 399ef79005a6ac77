package org.spanlift.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.cli.plot.Palette;
import org.spanlift.cli.plot.PlotKind;
import org.spanlift.cli.plot.SvgSupport;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

class PlotCommandTest {

    @TempDir
    Path dir;

    private Path plot(String wing, PlotKind kind, String name, String... extra) {
        Path out = dir.resolve(name);
        String[] args = new String[5 + extra.length];
        args[0] = "plot";
        args[1] = CliRun.demo(wing);
        args[2] = "--what=" + kind.cliName();
        args[3] = "--output";
        args[4] = out.toString();
        System.arraycopy(extra, 0, args, 5, extra.length);
        CliRun r = CliRun.of(args);
        assertEquals(0, r.exitCode(), r.err());
        assertEquals("", r.err());
        return out;
    }

    @Test
    void everyKindRendersAWellFormedSvgWithItsElements() throws Exception {
        for (PlotKind kind : PlotKind.values()) {
            Path out = plot("trainer.wing.yaml", kind, kind.cliName() + ".svg");
            Document doc = SvgSupport.parse(Files.readString(out));
            Element root = doc.getDocumentElement();
            assertEquals("svg", root.getLocalName(), kind.cliName());
            assertEquals(kind.figureId() + "-title", SvgSupport.all(doc, "title").get(0).getAttribute("id"));
            assertFalse(SvgSupport.all(doc, "desc").get(0).getTextContent().isBlank());
            int paths = SvgSupport.all(doc, "path").size();
            int markers = SvgSupport.all(doc, "circle").size();
            switch (kind) {
                case PLANFORM -> assertTrue(paths > 288, "planform: a path per panel, got " + paths);
                // the trainer has 48 strips; the curves 19 angles (-4 to 14); legends add one marker each
                case SPAN_LOAD -> assertTrue(markers >= 48, "span load: a marker per strip, got " + markers);
                case LIFT, POLAR -> assertTrue(markers >= 19, kind.cliName() + ": a marker per angle, got " + markers);
                case STALL -> assertTrue(markers >= 48, "stall map: a marker per strip, got " + markers);
            }
            if (kind != PlotKind.PLANFORM) {
                assertFalse(SvgSupport.all(doc, "line").isEmpty(), kind.cliName() + ": grid lines");
            }
            List<String> ids = SvgSupport.ids(doc);
            assertEquals(ids.size(), new HashSet<>(ids).size(), kind.cliName() + ": ids unique");
            ids.forEach(id -> assertTrue(id.startsWith(kind.figureId() + "-"), id));
        }
    }

    @Test
    void planformDrawsEveryPanelAndBothControlKinds() throws Exception {
        String svg = Files.readString(plot("trainer.wing.yaml", PlotKind.PLANFORM, "p.svg"));
        Document doc = SvgSupport.parse(svg);
        // 288 panels, two outlines' worth of text, hatching: far more paths than panels
        assertTrue(SvgSupport.all(doc, "path").size() > 288);
        // flap and aileron fills, in the palette's tints
        assertTrue(svg.contains("fill:" + rgb(Palette.FLAP_FILL)), "flap tint");
        assertTrue(svg.contains("fill:" + rgb(Palette.AILERON_FILL)), "aileron tint");
        assertTrue(svg.contains("stroke:" + rgb(Palette.FLAP_LINE)), "flap hatching");
        assertTrue(svg.contains("stroke:" + rgb(Palette.AILERON_LINE)), "aileron hatching");
    }

    private static String rgb(java.awt.Color c) {
        return "rgb(" + c.getRed() + "," + c.getGreen() + "," + c.getBlue() + ")";
    }

    @Test
    void svgOutputIsDeterministic() throws Exception {
        for (PlotKind kind : PlotKind.values()) {
            byte[] a = Files.readAllBytes(plot("trainer.wing.yaml", kind, "a.svg"));
            byte[] b = Files.readAllBytes(plot("trainer.wing.yaml", kind, "b.svg"));
            assertArrayEquals(a, b, kind.cliName());
        }
    }

    @Test
    void pngIsAnImageAndDeterministic() throws Exception {
        Path a = plot("rectangular.wing.yaml", PlotKind.LIFT, "a.png");
        Path b = plot("rectangular.wing.yaml", PlotKind.LIFT, "b.png");
        assertArrayEquals(Files.readAllBytes(a), Files.readAllBytes(b));
        BufferedImage img = ImageIO.read(a.toFile());
        assertEquals(1760, img.getWidth());
        assertEquals(1000, img.getHeight());
    }

    @Test
    void spanLoadAtAGivenAngleAndFlaps() throws Exception {
        String svg = Files.readString(plot("trainer.wing.yaml", PlotKind.SPAN_LOAD, "s.svg", "--alpha", "6",
                "--flaps", "20"));
        assertTrue(svg.contains("Span load at \u03b1 = 6.00\u00b0"), "title");
    }

    private static String description(Path svg) throws Exception {
        return SvgSupport.all(SvgSupport.parse(Files.readString(svg)), "desc").get(0).getTextContent();
    }

    @Test
    void everyKindStatesTheConfigurationItWasDrawnFor() throws Exception {
        // 750 kg at standard gravity, 9.80665 m/s^2
        String weight = String.format(Locale.ROOT, "weight %.0f N", 750 * 9.80665);
        for (PlotKind kind : PlotKind.values()) {
            String configured = description(plot("trainer.wing.yaml", kind, kind.cliName() + "-c.svg", "--flaps", "20",
                    "--weight", "750kg", "--altitude", "3000m", "--load-factor", "2"));
            for (String part : List.of("flap 20\u00b0 trailing edge down", weight, "pressure altitude 3000 m",
                    "load factor 2")) {
                assertTrue(configured.contains(part), kind.cliName() + " lacks " + part + ": " + configured);
            }
            String plain = description(plot("trainer.wing.yaml", kind, kind.cliName() + "-p.svg"));
            assertTrue(plain.startsWith("Drawn for no control deflected."), kind.cliName() + ": " + plain);
            assertFalse(plain.contains("weight") || plain.contains("pressure altitude"), kind.cliName() + ": " + plain);
        }
    }

    @Test
    void stallMapShadesTheDeflectedFlapsOnly() throws Exception {
        String fill = "fill:" + rgb(Palette.FLAP_FILL);
        assertTrue(Files.readString(plot("trainer.wing.yaml", PlotKind.STALL, "f.svg", "--flaps", "20"))
                .contains(fill));
        assertFalse(Files.readString(plot("trainer.wing.yaml", PlotKind.STALL, "c.svg")).contains(fill));
    }

    @Test
    void svgToStandardOutput() throws Exception {
        CliRun r = CliRun.of("plot", CliRun.demo("rectangular.wing.yaml"), "--what", "polar");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals("svg", SvgSupport.parse(r.out()).getDocumentElement().getLocalName());
    }

    private void assertBad(String... args) {
        CliRun r = CliRun.of(args);
        assertEquals(2, r.exitCode(), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().startsWith("spanlift: "), r.err());
        assertEquals("", r.out());
    }

    @Test
    void badInputExitsTwoWithOneLineAndWritesNothing() throws Exception {
        String wing = CliRun.demo("trainer.wing.yaml");
        Path pdf = dir.resolve("x.pdf");
        assertBad("plot", wing, "--what", "flutter", "--output", dir.resolve("x.svg").toString());
        // the tourer's section gives no cl-max: no stall map unless one is assumed
        assertBad("plot", CliRun.demo("tourer.wing.yaml"), "--what", "stall", "--output",
                dir.resolve("w.svg").toString());
        assertBad("plot", wing, "--what", "lift", "--output", pdf.toString());
        assertBad("plot", wing, "--what", "lift", "--format", "png", "--output", dir.resolve("x.svg").toString());
        assertBad("plot", wing, "--what", "lift", "--format", "png");
        assertBad("plot", wing, "--what", "span-load", "--alpha", "0,4", "--output", dir.resolve("y.svg").toString());
        assertBad("plot", wing, "--what", "lift", "--deflect", "rudder=5", "--output", dir.resolve("z.svg").toString());
        try (var files = Files.list(dir)) {
            assertEquals(0, files.count(), "nothing written");
        }
    }
}
