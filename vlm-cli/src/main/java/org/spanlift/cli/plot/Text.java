package org.spanlift.cli.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.font.FontRenderContext;
import java.awt.font.TextLayout;
import java.awt.geom.AffineTransform;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

/**
 * Text drawn as outlines, the way the charts draw theirs, so that a figure looks the same in every viewer
 * whatever fonts it has.
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
