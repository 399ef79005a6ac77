package org.spanlift.cli.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.cli.CliRun;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

/**
 * SVG figures carry their words as text elements in a generic font stack: the title, the configuration line,
 * the legend, the axis titles and tick labels and the marks' labels, each once (a halo is a stroked copy
 * under its text), and no outline of a glyph.
 */
class SvgTextTest {

    @TempDir
    Path dir;

    private String plot(String what) throws Exception {
        Path out = dir.resolve(what + ".svg");
        CliRun r = CliRun.of("plot", CliRun.demo("trainer.wing.yaml"), "--what", what, "--output", out.toString());
        assertEquals(0, r.exitCode(), r.err());
        return Files.readString(out);
    }

    private static List<Element> texts(Document doc) {
        return SvgSupport.all(doc, "text");
    }

    private static List<String> words(Document doc) {
        return texts(doc).stream().map(Element::getTextContent).toList();
    }

    @Test
    void aChartWritesEveryTextAsText() throws Exception {
        String svg = plot("span-load");
        Document doc = SvgSupport.parse(svg);
        List<String> words = words(doc);
        assertTrue(words.get(0).startsWith("Span load at"), "the title first: " + words);
        assertTrue(words.contains("no control deflected"), "the configuration line: " + words);
        assertTrue(words.contains("spanwise station y [m], right tip positive"), "x axis title: " + words);
        assertTrue(words.contains("c\u00b7cl / c_ref,  cl  and  cl_max"), "y axis title, its spaces kept: " + words);
        for (String tick : List.of("-5", "-1", "0", "1", "5", "0.2", "1.2")) {
            assertTrue(words.contains(tick), "tick label " + tick + ": " + words);
        }
        for (String entry : List.of("c\u00b7cl / c_ref, lattice strips", "elliptic load of the same lift", "section cl",
                "section cl_max")) {
            assertTrue(words.contains(entry), "legend entry " + entry + ": " + words);
        }
        // the title is centred by the viewer, the y tick labels end at their tick marks
        assertTrue(texts(doc).get(0).getAttribute("style").contains("text-anchor:middle"));
        Element tick = texts(doc).stream().filter(t -> t.getTextContent().equals("0.2")).findFirst().orElseThrow();
        assertTrue(tick.getAttribute("style").contains("text-anchor:end"), tick.getAttribute("style"));
        assertTrue(tick.getAttribute("style").contains("font-size:12px"), tick.getAttribute("style"));
        // no glyph outlines: the text that was drawn as paths made the file more than twice as large
        assertTrue(svg.length() < 100_000, "span load SVG of " + svg.length() + " characters");
    }

    @Test
    void theFontIsAGenericStackOnTheRootAndNoGroupNamesJavasFont() throws Exception {
        Document doc = SvgSupport.parse(plot("lift"));
        String rootStyle = doc.getDocumentElement().getAttribute("style");
        assertTrue(rootStyle.contains("font-family:" + Palette.SVG_FONT_FAMILY), rootStyle);
        assertTrue(Palette.SVG_FONT_FAMILY.endsWith("sans-serif"));
        for (Element g : SvgSupport.all(doc, "g")) {
            assertFalse(g.getAttribute("style").contains("font-"), g.getAttribute("style"));
        }
        for (Element t : texts(doc)) {
            assertFalse(t.getAttribute("style").contains("font-family"), "the family is inherited");
        }
    }

    @Test
    void onlyTheTitleIsBoldWhateverTheChartLastDrew() throws Exception {
        for (PlotKind kind : PlotKind.values()) {
            List<Element> texts = texts(SvgSupport.parse(plot(kind.cliName())));
            for (int i = 0; i < texts.size(); i++) {
                String style = texts.get(i).getAttribute("style");
                String weight = i == 0 ? "font-weight:bold" : "font-weight:normal";
                assertTrue(style.contains(weight) && style.contains("font-style:normal"),
                        kind.cliName() + ", '" + texts.get(i).getTextContent() + "': " + style);
            }
        }
    }

    @Test
    void aHaloIsAStrokedCopyUnderItsText() throws Exception {
        Document doc = SvgSupport.parse(plot("lift"));
        List<Element> texts = texts(doc);
        int onset = -1;
        for (int i = 0; i < texts.size(); i++) {
            if (texts.get(i).getTextContent().startsWith("stall onset, CL ")) {
                onset = i;
                break;
            }
        }
        assertTrue(onset >= 0, "the onset's label");
        Element halo = texts.get(onset);
        Element label = texts.get(onset + 1);
        assertEquals(halo.getTextContent(), label.getTextContent());
        assertTrue(halo.getAttribute("style").contains("stroke:rgb(255,255,255)"), halo.getAttribute("style"));
        assertTrue(halo.getAttribute("style").contains("stroke-width:3"), halo.getAttribute("style"));
        assertTrue(label.getAttribute("style").contains("stroke:none"), label.getAttribute("style"));
        assertEquals(halo.getAttribute("x"), label.getAttribute("x"));
        assertEquals(halo.getAttribute("y"), label.getAttribute("y"));
    }

    @Test
    void thePlanformWritesItsLabelsAsText() throws Exception {
        Document doc = SvgSupport.parse(plot("planform"));
        List<String> words = words(doc);
        assertTrue(words.get(0).startsWith("Planform: "), words.toString());
        assertTrue(words.contains("direction of flight"), words.toString());
        assertTrue(words.contains("to scale"), words.toString());
        assertTrue(words.contains("flap") && words.contains("aileron"), words.toString());
    }
}
