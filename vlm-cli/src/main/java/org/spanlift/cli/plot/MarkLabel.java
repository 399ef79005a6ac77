package org.spanlift.cli.plot;

import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;

import org.knowm.xchart.internal.chartpart.Annotation;

/**
 * A short label beside a marked point of a chart, in the chart's data coordinates. It sits above and to the
 * left of the point (clear of a curve that rises to the right through it) unless that would leave the plot
 * area, then below and to the right; the text has a white halo so it reads over grid lines.
 */
final class MarkLabel extends Annotation {

    private static final double GAP = 9;

    private final String text;
    private final double x;
    private final double y;
    private final Font font;
    private final Color colour;

    MarkLabel(String text, double x, double y, Font font, Color colour) {
        super(false);
        this.text = text;
        this.x = x;
        this.y = y;
        this.font = font;
        this.colour = colour;
    }

    @Override
    public void paint(Graphics2D g) {
        if (!isVisible) {
            return;
        }
        double px = getXAxisScreenValue(x);
        double py = getYAxisScreenValue(y);
        double w = Text.width(text, font);
        double ascent = font.getSize2D() * 0.75;
        // the plot area in screen coordinates (y grows downward)
        double left = Math.min(getXAxisScreenValueForMin(), getXAxisScreenValueForMax());
        double right = Math.max(getXAxisScreenValueForMin(), getXAxisScreenValueForMax());
        double top = Math.min(getYAxisScreenValueForMin(), getYAxisScreenValueForMax());
        double bottom = Math.max(getYAxisScreenValueForMin(), getYAxisScreenValueForMax());
        boolean aboveLeft = px - GAP - w >= left && py - GAP - ascent >= top;
        double baseline;
        if (aboveLeft) {
            baseline = py - GAP;
            Text.draw(g, text, font, px - GAP, baseline, Text.Align.RIGHT, colour, Palette.PAPER);
        } else {
            baseline = Math.min(py + GAP + ascent, bottom - 2);
            Text.draw(g, text, font, Math.min(px + GAP, right - w), baseline, Text.Align.LEFT, colour, Palette.PAPER);
        }
        bounds = new Rectangle2D.Double(aboveLeft ? px - GAP - w : px + GAP, baseline - ascent, w, ascent);
    }
}
