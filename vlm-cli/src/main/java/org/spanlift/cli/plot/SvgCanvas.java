package org.spanlift.cli.plot;

import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics;
import java.awt.Paint;
import java.awt.Shape;

import org.apache.batik.svggen.DOMGroupManager;
import org.apache.batik.svggen.SVGGeneratorContext;
import org.apache.batik.svggen.SVGGraphics2D;
import org.w3c.dom.Element;

/**
 * Batik's SVG generator with text written as SVG {@code <text>} elements ({@link Text#draw} comes here):
 * anchored where the figure anchors it (start, middle or end), sized and weighted from the figure's font,
 * the family left to the document's font stack ({@link Palette#SVG_FONT_FAMILY}), so the words stay words
 * (selectable, searchable, read by screen readers) and the file does not carry the outlines of whatever
 * font this machine has. A halo is a copy of the text under it, stroked in the halo colour.
 *
 * <p>A fill or stroke in a fully transparent colour writes nothing: that is how {@link ChartFigure} keeps
 * the chart library from drawing its axis texts as outlines while it still lays the axes out for them.
 */
final class SvgCanvas extends SVGGraphics2D {

    private static final String XML_NS = "http://www.w3.org/XML/1998/namespace";
    /** The width of a halo's ring, in pixels (a stroke of 3 reaches 1.5 beyond the letters). */
    private static final String HALO_WIDTH = "3";

    SvgCanvas(SVGGeneratorContext ctx) {
        super(ctx, false);
    }

    private SvgCanvas(SvgCanvas g) {
        super(g);
    }

    @Override
    public Graphics create() {
        return new SvgCanvas(this);
    }

    @Override
    public void fill(Shape s) {
        if (!invisible(getPaint())) {
            super.fill(s);
        }
    }

    @Override
    public void draw(Shape s) {
        if (!invisible(getPaint())) {
            super.draw(s);
        }
    }

    private static boolean invisible(Paint p) {
        return p instanceof Color c && c.getAlpha() == 0;
    }

    /** The text with its baseline at y, anchored at x; see {@link Text#draw}. */
    void text(String text, Font font, double x, double y, Text.Align align, Color colour, Color halo) {
        if (halo != null) {
            Element under = element(text, font, x, y, align);
            String ring = "rgb(" + halo.getRed() + "," + halo.getGreen() + "," + halo.getBlue() + ")";
            under.setAttributeNS(null, "fill", ring);
            under.setAttributeNS(null, "stroke", ring);
            under.setAttributeNS(null, "stroke-width", HALO_WIDTH);
            under.setAttributeNS(null, "stroke-linejoin", "round");
            setPaint(halo);
            getDOMGroupManager().addElement(under, DOMGroupManager.FILL);
        }
        setPaint(colour);
        getDOMGroupManager().addElement(element(text, font, x, y, align), DOMGroupManager.FILL);
    }

    private Element element(String text, Font font, double x, double y, Text.Align align) {
        SVGGeneratorContext ctx = getGeneratorContext();
        Element t = getDOMFactory().createElementNS(SvgWriter.SVG_NS, "text");
        t.setAttributeNS(null, "x", ctx.doubleString(x));
        t.setAttributeNS(null, "y", ctx.doubleString(y));
        // runs of spaces are part of some labels ("cl  and  cl_max")
        t.setAttributeNS(XML_NS, "xml:space", "preserve");
        switch (align) {
            case LEFT -> { }
            case CENTRE -> t.setAttributeNS(null, "text-anchor", "middle");
            case RIGHT -> t.setAttributeNS(null, "text-anchor", "end");
        }
        // all three always: Batik gives an element the graphics state's font for whatever it leaves unset
        t.setAttributeNS(null, "font-size", ctx.doubleString(font.getSize2D()) + "px");
        t.setAttributeNS(null, "font-weight", font.isBold() ? "bold" : "normal");
        t.setAttributeNS(null, "font-style", font.isItalic() ? "italic" : "normal");
        t.appendChild(getDOMFactory().createTextNode(text));
        return t;
    }
}
