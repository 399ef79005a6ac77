package org.spanlift.cli.plot;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.util.HashSet;
import java.util.List;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

class SvgWriterTest {

    /** A figure that clips, so Batik has to emit a clip path with an id. */
    private static final class Boxes implements Figure {
        @Override
        public String id() {
            return "boxes";
        }

        @Override
        public String title() {
            return "Boxes & <lines>";
        }

        @Override
        public String description() {
            return "Two boxes, one clipped.";
        }

        @Override
        public int width() {
            return 200;
        }

        @Override
        public int height() {
            return 100;
        }

        @Override
        public void paint(Graphics2D g) {
            g.setColor(Color.WHITE);
            g.fill(new Rectangle2D.Double(0, 0, 200, 100));
            g.setColor(Palette.BLUE);
            g.clip(new Rectangle2D.Double(10, 10, 50, 50));
            g.fill(new Rectangle2D.Double(0, 0, 100, 100));
            g.setClip(null);
            g.setColor(Palette.VERMILLION);
            g.fill(new Rectangle2D.Double(120, 20, 40, 40));
        }
    }

    @Test
    void svgIsWellFormedWithTitleDescriptionAndViewBox() throws Exception {
        Document doc = SvgSupport.parse(SvgWriter.document(new Boxes()));
        Element root = doc.getDocumentElement();
        assertEquals("svg", root.getLocalName());
        assertEquals(SvgWriter.SVG_NS, root.getNamespaceURI());
        assertEquals("0 0 200 100", root.getAttribute("viewBox"));
        assertEquals("Boxes & <lines>", SvgSupport.all(doc, "title").get(0).getTextContent());
        assertEquals(1, SvgSupport.all(doc, "desc").size());
        assertFalse(SvgSupport.all(doc, "clipPath").isEmpty());
    }

    @Test
    void everyIdCarriesTheFigurePrefixAndEveryReferenceResolves() throws Exception {
        String svg = SvgWriter.document(new Boxes());
        Document doc = SvgSupport.parse(svg);
        List<String> ids = SvgSupport.ids(doc);
        assertFalse(ids.isEmpty());
        assertEquals(ids.size(), new HashSet<>(ids).size(), "ids are unique");
        for (String id : ids) {
            assertTrue(id.startsWith("boxes-"), id);
        }
        var m = java.util.regex.Pattern.compile("url\\(#([^)]+)\\)").matcher(svg);
        int refs = 0;
        while (m.find()) {
            assertTrue(ids.contains(m.group(1)), "reference to " + m.group(1));
            refs++;
        }
        assertTrue(refs > 0);
    }

    @Test
    void sameFigureGivesSameBytes() {
        assertArrayEquals(SvgWriter.bytes(new Boxes()), SvgWriter.bytes(new Boxes()));
        assertArrayEquals(PngWriter.bytes(new Boxes()), PngWriter.bytes(new Boxes()));
    }

    @Test
    void pngIsTwiceTheFigureSize() throws Exception {
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(PngWriter.bytes(new Boxes())));
        assertEquals(400, img.getWidth());
        assertEquals(200, img.getHeight());
        assertEquals(Palette.VERMILLION.getRGB(), img.getRGB(280, 80));
    }

    @Test
    void noGeneratorCommentOrTimeStamp() {
        String svg = SvgWriter.document(new Boxes());
        assertFalse(svg.contains("<!--"));
        assertFalse(svg.toLowerCase(java.util.Locale.ROOT).contains("batik"));
    }

    @Test
    void legendLabelsAreShortened() {
        assertEquals("A: short", Plots.legendLabel("A: short", 4));
        String cut = Plots.legendLabel("A: a very long wing name indeed, far too long for a legend", 4);
        assertTrue(cut.length() <= 20 && cut.endsWith("\u2026"), cut);
    }
}
