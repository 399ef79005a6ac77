package org.spanlift.cli.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Path2D;

import org.knowm.xchart.style.markers.Marker;

/**
 * The mark of a stall onset on a chart: a diamond about twice the size of a series marker, in the marker
 * colour with a white rim, so that it stands out on the curve it sits on.
 */
final class OnsetMarker extends Marker {

    @Override
    public void paint(Graphics2D g, double x, double y, int size) {
        double h = size * 1.3;
        Path2D.Double d = new Path2D.Double();
        d.moveTo(x - h, y);
        d.lineTo(x, y - h);
        d.lineTo(x + h, y);
        d.lineTo(x, y + h);
        d.closePath();
        Color colour = g.getColor();
        g.setColor(Palette.PAPER);
        g.setStroke(new BasicStroke(2.4f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        g.draw(d);
        g.setColor(colour);
        g.fill(d);
    }
}
