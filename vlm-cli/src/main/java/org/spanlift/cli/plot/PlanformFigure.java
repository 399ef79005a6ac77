package org.spanlift.cli.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.geom.Area;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.LengthUnit;

/**
 * The top view of one wing (outline, lattice, controls shaded by kind) or of several wings overlaid, to
 * scale: the same pixels per metre along and across the span. The leading edge faces the top of the page
 * (x aft points down), the right wing is on the right, as seen from above.
 */
public final class PlanformFigure implements Figure {

    /** One wing to draw: its outlines, its panels (empty for an outline-only overlay), how to stroke it. */
    public record Layer(String label, List<WingGeometry.Outline> outlines, List<WingGeometry.Panel> panels,
            Map<Integer, String> controlNames, Color colour, BasicStroke stroke) {
    }

    private static final int WIDTH = 960;
    private static final double MARGIN_SIDE = 48;
    /** The title's baseline, the first subtitle line's, and the step to each further line. */
    private static final double TITLE_BASELINE = 30;
    private static final double SUBTITLE_BASELINE = 52;
    private static final double LINE = 19;
    /** From the last subtitle line's baseline to the top of the drawing (room for the stall label). */
    private static final double BELOW_SUBTITLE = 32;
    private static final double FOOTER = 86;
    /** Room kept clear of the subtitle at the top right, for the direction-of-flight arrow and its label. */
    private static final double ARROW_ROOM = 150;
    private static final double MAX_DRAWING_HEIGHT = 560;
    private static final double MIN_DRAWING_HEIGHT = 90;

    private static final Font TITLE = Palette.font(Font.BOLD, 17f);
    private static final Font SUBTITLE = Palette.font(Font.PLAIN, 12.5f);
    private static final Font LABEL = Palette.font(Font.PLAIN, 12f);
    private static final Font LEGEND = Palette.font(Font.PLAIN, 12f);

    private final String id;
    private final String title;
    private final List<String> subtitle;
    private final double header;
    private final String description;
    private final List<Layer> layers;
    private final LengthUnit unit;
    private final double yMin;
    private final double yMax;
    private final double xMin;
    private final double xMax;
    private final double scale;
    private final int height;
    private final OptionalDouble stallStation;

    /**
     * @param subtitle     the lines under the title (each wrapped when it is too long): the geometry, the
     *                     configuration
     * @param stallStation the spanwise station (m, right half) where stall starts, marked on both halves
     */
    public PlanformFigure(String id, String title, List<String> subtitle, String description, List<Layer> layers,
            LengthUnit unit, OptionalDouble stallStation) {
        this.stallStation = stallStation;
        this.id = id;
        this.title = title;
        List<String> lines = new ArrayList<>();
        for (String s : subtitle) {
            lines.addAll(Text.wrap(s, SUBTITLE, WIDTH - 2 * MARGIN_SIDE - ARROW_ROOM));
        }
        this.subtitle = List.copyOf(lines);
        this.header = SUBTITLE_BASELINE + LINE * (lines.size() - 1) + BELOW_SUBTITLE;
        this.description = description;
        this.layers = List.copyOf(layers);
        this.unit = unit;
        double y0 = Double.POSITIVE_INFINITY;
        double y1 = Double.NEGATIVE_INFINITY;
        double x0 = Double.POSITIVE_INFINITY;
        double x1 = Double.NEGATIVE_INFINITY;
        for (Layer layer : layers) {
            for (WingGeometry.Outline o : layer.outlines()) {
                for (int i = 0; i < o.ys().length; i++) {
                    y0 = Math.min(y0, o.ys()[i]);
                    y1 = Math.max(y1, o.ys()[i]);
                    x0 = Math.min(x0, o.xs()[i]);
                    x1 = Math.max(x1, o.xs()[i]);
                }
            }
        }
        // keep the centreline in the middle of the page: symmetric span extent
        double half = Math.max(Math.abs(y0), Math.abs(y1));
        this.yMin = -half;
        this.yMax = half;
        this.xMin = x0;
        this.xMax = x1;
        double across = (WIDTH - 2 * MARGIN_SIDE) / (yMax - yMin);
        double along = MAX_DRAWING_HEIGHT / Math.max(xMax - xMin, 1e-9);
        this.scale = Math.min(across, along);
        double drawing = Math.max(MIN_DRAWING_HEIGHT, (xMax - xMin) * scale);
        this.height = (int) Math.ceil(header + drawing + FOOTER);
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public String title() {
        return title;
    }

    @Override
    public String description() {
        return description;
    }

    @Override
    public int width() {
        return WIDTH;
    }

    @Override
    public int height() {
        return height;
    }

    /** The lines under the title, as drawn. */
    public List<String> subtitle() {
        return subtitle;
    }

    /** Pixels per metre, the same across and along the span. */
    public double scale() {
        return scale;
    }

    private double sx(double y) {
        return WIDTH / 2.0 + y * scale;
    }

    private double sy(double x) {
        double drawing = height - header - FOOTER;
        double used = (xMax - xMin) * scale;
        return header + (drawing - used) / 2 + (x - xMin) * scale;
    }

    @Override
    public void paint(Graphics2D g) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.setColor(Palette.PAPER);
        g.fill(new Rectangle2D.Double(0, 0, WIDTH, height));
        Text.draw(g, title, TITLE, MARGIN_SIDE - 24, TITLE_BASELINE, Text.Align.LEFT, Palette.INK, null);
        for (int i = 0; i < subtitle.size(); i++) {
            Text.draw(g, subtitle.get(i), SUBTITLE, MARGIN_SIDE - 24, SUBTITLE_BASELINE + LINE * i, Text.Align.LEFT,
                    Palette.MUTED, null);
        }
        flightArrow(g);
        centreline(g);
        boolean single = layers.size() == 1;
        for (Layer layer : layers) {
            shadeControls(g, layer);
        }
        for (Layer layer : layers) {
            g.setColor(Palette.LATTICE);
            g.setStroke(new BasicStroke(0.6f));
            for (WingGeometry.Panel p : layer.panels()) {
                g.draw(polygon(p.ys(), p.xs()));
            }
        }
        for (Layer layer : layers) {
            g.setColor(single ? Palette.INK : layer.colour());
            g.setStroke(layer.stroke());
            for (WingGeometry.Outline o : layer.outlines()) {
                g.draw(polygon(o.ys(), o.xs()));
            }
        }
        for (Layer layer : layers) {
            controlLabels(g, layer);
        }
        stallStation.ifPresent(y -> markStall(g, y));
        legend(g, single);
        scaleBar(g);
    }

    private void flightArrow(Graphics2D g) {
        double x = WIDTH - MARGIN_SIDE + 14;
        double top = 20;
        double bottom = 54;
        g.setColor(Palette.MUTED);
        g.setStroke(new BasicStroke(1.4f));
        g.draw(new Line2D.Double(x, top + 6, x, bottom));
        Path2D head = new Path2D.Double();
        head.moveTo(x, top);
        head.lineTo(x - 5, top + 9);
        head.lineTo(x + 5, top + 9);
        head.closePath();
        g.fill(head);
        Text.draw(g, "direction of flight", LABEL, x - 12, 42, Text.Align.RIGHT, Palette.MUTED, null);
    }

    /** A line across the chord at the stall-onset station, both halves, labelled above the wing. */
    private void markStall(Graphics2D g, double y) {
        g.setColor(Palette.VERMILLION);
        g.setStroke(new BasicStroke(2.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {7f, 3f}, 0f));
        double pad = 8;
        for (double side : new double[] {1, -1}) {
            double px = sx(side * y);
            g.draw(new Line2D.Double(px, sy(xMin) - pad, px, sy(xMax) + pad));
        }
        Text.draw(g, String.format(Locale.ROOT, "stall starts, y = \u00b1%.3f %s", y / unit.metres(), unit.symbol()),
                LABEL, sx(y) + 6, sy(xMin) - pad - 4, Text.Align.LEFT, Palette.VERMILLION, null);
    }

    private void centreline(Graphics2D g) {
        g.setColor(Palette.MUTED);
        g.setStroke(new BasicStroke(0.9f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {12f, 3f, 2f, 3f}, 0f));
        double pad = 12;
        g.draw(new Line2D.Double(sx(0), sy(xMin) - pad, sx(0), sy(xMax) + pad));
    }

    private void shadeControls(Graphics2D g, Layer layer) {
        Map<String, Area> regions = new LinkedHashMap<>();
        Map<String, ControlKind> kinds = new LinkedHashMap<>();
        for (WingGeometry.Panel p : layer.panels()) {
            if (p.control() < 0) {
                continue;
            }
            String key = p.control() + (p.ys()[0] + p.ys()[1] >= 0 ? "R" : "L");
            regions.computeIfAbsent(key, k -> new Area()).add(new Area(polygon(p.ys(), p.xs())));
            kinds.put(key, p.kind());
        }
        for (Map.Entry<String, Area> e : regions.entrySet()) {
            ControlKind kind = kinds.get(e.getKey());
            shade(g, e.getValue(), kind);
        }
    }

    private static void shade(Graphics2D g, Shape region, ControlKind kind) {
        boolean flap = kind == ControlKind.FLAP;
        g.setColor(flap ? Palette.FLAP_FILL : Palette.AILERON_FILL);
        g.fill(region);
        Shape oldClip = g.getClip();
        g.clip(region);
        g.setColor(flap ? Palette.FLAP_LINE : Palette.AILERON_LINE);
        g.setStroke(new BasicStroke(0.8f));
        Rectangle2D b = region.getBounds2D();
        double step = 6;
        double extent = b.getWidth() + b.getHeight();
        for (double t = -b.getHeight(); t <= extent; t += step) {
            if (flap) {
                g.draw(new Line2D.Double(b.getMinX() + t, b.getMaxY(), b.getMinX() + t + b.getHeight(), b.getMinY()));
            } else {
                g.draw(new Line2D.Double(b.getMinX() + t, b.getMinY(), b.getMinX() + t + b.getHeight(), b.getMaxY()));
            }
        }
        g.setClip(oldClip);
    }

    private void controlLabels(Graphics2D g, Layer layer) {
        Map<Integer, double[]> box = new LinkedHashMap<>();
        for (WingGeometry.Panel p : layer.panels()) {
            if (p.control() < 0 || p.ys()[0] + p.ys()[1] < 0) {
                continue;
            }
            double[] b = box.computeIfAbsent(p.control(), k -> new double[] {Double.POSITIVE_INFINITY,
                Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY});
            b[0] = Math.min(b[0], Math.min(p.ys()[0], p.ys()[1]));
            b[1] = Math.max(b[1], Math.max(p.ys()[0], p.ys()[1]));
            b[2] = Math.max(b[2], Math.max(p.xs()[2], p.xs()[3]));
        }
        for (Map.Entry<Integer, double[]> e : box.entrySet()) {
            String name = layer.controlNames().get(e.getKey());
            if (name == null) {
                continue;
            }
            double[] b = e.getValue();
            double centre = sx(0.5 * (b[0] + b[1]));
            Text.draw(g, name, LABEL, centre, sy(b[2]) + 16, Text.Align.CENTRE, Palette.INK, Palette.PAPER);
        }
    }

    private void legend(Graphics2D g, boolean single) {
        // cursor: x, y of the next entry; entries wrap before the scale bar's corner
        double[] at = {MARGIN_SIDE - 24, height - FOOTER + 34};
        if (single) {
            legendLine(g, at, Palette.INK, new BasicStroke(1.6f), "outline");
            legendLine(g, at, Palette.LATTICE, new BasicStroke(1f), "lattice panels");
            boolean flap = false;
            boolean aileron = false;
            for (WingGeometry.Panel p : layers.get(0).panels()) {
                flap |= p.kind() == ControlKind.FLAP;
                aileron |= p.kind() == ControlKind.AILERON;
            }
            if (flap) {
                legendSwatch(g, at, ControlKind.FLAP, "flap");
            }
            if (aileron) {
                legendSwatch(g, at, ControlKind.AILERON, "aileron");
            }
        } else {
            for (Layer layer : layers) {
                legendLine(g, at, layer.colour(), layer.stroke(), layer.label());
            }
        }
    }

    /** Moves the cursor to a new line when an entry this wide would run into the scale bar. */
    private void wrap(double[] at, double entry) {
        if (at[0] + entry > WIDTH - 190 && at[0] > MARGIN_SIDE) {
            at[0] = MARGIN_SIDE - 24;
            at[1] += 22;
        }
    }

    private void legendLine(Graphics2D g, double[] at, Color colour, BasicStroke stroke, String text) {
        double entry = 36 + Text.width(text, LEGEND);
        wrap(at, entry);
        double x = at[0];
        double y = at[1];
        g.setColor(colour);
        g.setStroke(stroke);
        g.draw(new Line2D.Double(x, y - 4, x + 30, y - 4));
        Text.draw(g, text, LEGEND, x + 36, y, Text.Align.LEFT, Palette.INK, null);
        at[0] = x + entry + 22;
    }

    private void legendSwatch(Graphics2D g, double[] at, ControlKind kind, String text) {
        double entry = 36 + Text.width(text, LEGEND);
        wrap(at, entry);
        double x = at[0];
        double y = at[1];
        Rectangle2D r = new Rectangle2D.Double(x, y - 12, 30, 14);
        shade(g, r, kind);
        g.setColor(Palette.MUTED);
        g.setStroke(new BasicStroke(0.8f));
        g.draw(r);
        Text.draw(g, text, LEGEND, x + 36, y, Text.Align.LEFT, Palette.INK, null);
        at[0] = x + entry + 22;
    }

    private void scaleBar(Graphics2D g) {
        double metres = unit.metres();
        double target = (yMax - yMin) / metres / 5;
        double length = nice(target);
        double px = length * metres * scale;
        double right = WIDTH - MARGIN_SIDE + 20;
        double y = height - FOOTER + 36;
        double left = right - px;
        g.setColor(Palette.INK);
        g.setStroke(new BasicStroke(1.2f));
        g.draw(new Line2D.Double(left, y, right, y));
        g.draw(new Line2D.Double(left, y - 5, left, y + 5));
        g.draw(new Line2D.Double(right, y - 5, right, y + 5));
        g.draw(new Line2D.Double((left + right) / 2, y - 3, (left + right) / 2, y + 3));
        String text = format(length) + " " + unit.symbol();
        Text.draw(g, text, LEGEND, (left + right) / 2, y - 9, Text.Align.CENTRE, Palette.INK, null);
        Text.draw(g, "to scale", LEGEND, right, y + 20, Text.Align.RIGHT, Palette.MUTED, null);
    }

    /** The nearest 1, 2 or 5 times a power of ten at or below the value. */
    static double nice(double value) {
        double p = Math.pow(10, Math.floor(Math.log10(value)));
        double m = value / p;
        return (m >= 5 ? 5 : m >= 2 ? 2 : 1) * p;
    }

    private static String format(double v) {
        return v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%s", v);
    }

    private Path2D polygon(double[] ys, double[] xs) {
        Path2D path = new Path2D.Double();
        path.moveTo(sx(ys[0]), sy(xs[0]));
        for (int i = 1; i < ys.length; i++) {
            path.lineTo(sx(ys[i]), sy(xs[i]));
        }
        path.closePath();
        return path;
    }
}
