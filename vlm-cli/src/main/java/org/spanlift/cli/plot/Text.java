package org.spanlift.cli.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.font.FontRenderContext;
import java.awt.font.TextLayout;
import java.awt.geom.AffineTransform;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

/**
 * The figures' text. In SVG ({@link SvgCanvas}) it is written as text elements, anchored at the point given,
 * so a viewer lays the words out in its own font of the document's font stack; in a bitmap it is filled as
 * outlines of Java's font. Widths for layout (wrapping, legends, room beside a label) come from Java's font.
 */
final class Text {

    enum Align { LEFT, CENTRE, RIGHT }

    private static final FontRenderContext FRC = new FontRenderContext(null, true, true);

    private Text() {
    }

    /** The advance width of the text in pixels. */
    static double width(String text, Font font) {
        return new TextLayout(text, font, FRC).getAdvance();
    }

    /** The bounds of the text's ink, relative to its origin on the baseline (y negative above it). */
    static Rectangle2D ink(String text, Font font) {
        return new TextLayout(text, font, FRC).getBounds();
    }

    /** The separator of the parts of a subtitle, where it breaks first. */
    static final String SEPARATOR = "  \u00b7  ";

    /**
     * The text broken into lines no wider than {@code width} pixels: between the parts joined by
     * {@link #SEPARATOR} where it can, inside a part (at spaces) only when the part alone is too wide. A
     * single word wider than the width stays whole on its line.
     */
    static List<String> wrap(String text, Font font, double width) {
        List<String> lines = new ArrayList<>();
        String line = "";
        for (String part : text.split(Pattern.quote(SEPARATOR))) {
            String longer = line.isEmpty() ? part : line + SEPARATOR + part;
            if (width(longer, font) <= width) {
                line = longer;
                continue;
            }
            if (!line.isEmpty()) {
                lines.add(line);
            }
            line = "";
            for (String word : part.split(" ")) {
                String more = line.isEmpty() ? word : line + " " + word;
                if (!line.isEmpty() && width(more, font) > width) {
                    lines.add(line);
                    line = word;
                } else {
                    line = more;
                }
            }
        }
        lines.add(line);
        return lines;
    }

    /**
     * Draws the text with its baseline at y.
     *
     * @param halo when not null, a ring of this colour is drawn under the letters so they read over lines
     */
    static void draw(Graphics2D g, String text, Font font, double x, double y, Align align, Color colour,
            Color halo) {
        if (text.isEmpty()) {
            return;
        }
        if (g instanceof SvgCanvas svg) {
            svg.text(text, font, x, y, align, colour, halo);
            return;
        }
        TextLayout layout = new TextLayout(text, font, FRC);
        double w = layout.getAdvance();
        double left = switch (align) {
            case LEFT -> x;
            case CENTRE -> x - w / 2;
            case RIGHT -> x - w;
        };
        Shape shape = layout.getOutline(AffineTransform.getTranslateInstance(left, y));
        if (halo != null) {
            g.setColor(halo);
            g.setStroke(new BasicStroke(3f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            g.draw(shape);
        }
        g.setColor(colour);
        g.fill(shape);
    }
}
