package org.spanlift.cli.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.AffineTransform;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.XYSeries.XYSeriesRenderStyle;
import org.knowm.xchart.style.XYStyler;
import org.knowm.xchart.style.markers.None;

/**
 * An XChart chart as a {@link Figure}, between a header and a legend of its own: above, the title and, in a
 * lighter line below it, the subtitle (the configuration the chart was drawn for, wrapped when it is long);
 * below, the legend in as many centred rows as its entries need (a shaded band as a swatch, a line with its
 * stroke and marker, a lone marker). The chart paints its axes and series in between; their texts (tick
 * labels, axis titles) the figure writes itself where the chart laid them out, so that SVG carries them as
 * text: the chart's own are painted in a transparent colour, which {@link SvgCanvas} does not write.
 */
public final class ChartFigure implements Figure {

    static final Font TITLE = Palette.font(Font.BOLD, 16f);
    static final Font SUBTITLE = Palette.font(Font.PLAIN, 12.5f);
    private static final double TITLE_BASELINE = 28;
    private static final double LINE = 19;
    private static final double BELOW_HEADER = 8;
    private static final double SIDE = 40;
    static final Font LEGEND = Palette.font(Font.PLAIN, 12f);
    private static final double ROW = 22;
    private static final double SYMBOL = 30;
    private static final double SYMBOL_GAP = 7;
    private static final double ENTRY_GAP = 24;
    private static final double BELOW_LEGEND = 12;
    private static final Color NONE = new Color(0, 0, 0, 0);

    private final String id;
    private final String title;
    private final String description;
    private final XYChart chart;
    private final List<String> subtitle;
    private final List<List<XYSeries>> legend;
    private final int width;
    private final int height;
    private final Color tickColour;
    private final Color titleColour;

    /**
     * @param chart    the chart, complete, its title the figure's; the figure takes its size, growing by a line
     *                 for each line of subtitle and each row of legend after the first
     * @param subtitle the line under the title
     */
    public ChartFigure(String id, String description, XYChart chart, String subtitle) {
        this.id = id;
        this.title = chart.getTitle();
        this.description = description;
        this.chart = chart;
        this.width = chart.getWidth();
        this.subtitle = List.copyOf(Text.wrap(subtitle, SUBTITLE, width - 2 * SIDE));
        this.legend = rows(chart, width - 2 * SIDE);
        this.height = chart.getHeight() + (int) Math.round(LINE * (this.subtitle.size() - 1)
                + ROW * (Math.max(1, legend.size()) - 1));
        XYStyler st = chart.getStyler();
        st.setChartTitleVisible(false);
        st.setLegendVisible(false);
        this.tickColour = st.getAxisTickLabelsColor();
        this.titleColour = st.getChartFontColor();
        st.setXAxisTickLabelsColor(NONE);
        st.setYAxisTickLabelsColor(NONE);
        st.setXAxisTitleColor(NONE);
        st.setYAxisTitleColor(NONE);
    }

    public XYChart chart() {
        return chart;
    }

    /** The legend entries as drawn, row by row: the series' names. */
    public List<List<String>> legend() {
        return legend.stream().map(row -> row.stream().map(XYSeries::getName).toList()).toList();
    }

    /** The subtitle as drawn, one entry per line. */
    public List<String> subtitle() {
        return subtitle;
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
        return width;
    }

    @Override
    public int height() {
        return height;
    }

    private double header() {
        return TITLE_BASELINE + LINE * subtitle.size() + BELOW_HEADER;
    }

    @Override
    public void paint(Graphics2D g) {
        g.setColor(Palette.PAPER);
        g.fill(new Rectangle2D.Double(0, 0, width, height));
        Text.draw(g, title, TITLE, width / 2.0, TITLE_BASELINE, Text.Align.CENTRE, Palette.INK, null);
        for (int i = 0; i < subtitle.size(); i++) {
            Text.draw(g, subtitle.get(i), SUBTITLE, width / 2.0, TITLE_BASELINE + LINE * (i + 1), Text.Align.CENTRE,
                    Palette.MUTED, null);
        }
        AffineTransform saved = g.getTransform();
        int top = (int) Math.round(header());
        int bottom = (int) Math.round(height - ROW * legend.size() - BELOW_LEGEND);
        g.translate(0, top);
        chart.paint(g, width, bottom - top);
        axisTexts(g);
        g.setTransform(saved);
        // after the chart, which gives series without a style of their own their default one
        for (int r = 0; r < legend.size(); r++) {
            List<XYSeries> row = legend.get(r);
            double x = (width - rowWidth(row)) / 2;
            double baseline = bottom + ROW * r + 15;
            for (XYSeries s : row) {
                symbol(g, s, x, baseline - 4);
                Text.draw(g, s.getName(), LEGEND, x + SYMBOL + SYMBOL_GAP, baseline, Text.Align.LEFT, Palette.INK,
                        null);
                x += entryWidth(s) + ENTRY_GAP;
            }
        }
    }

    /**
     * The tick labels and axis titles, where the chart laid them out: a y tick label right-aligned against
     * its tick marks and centred on its tick, an x tick label centred under its tick with its digits' foot on
     * the top of the title's box, the x title centred under the plot with its lowest ink on the chart's
     * bottom, the y title turned to read upward, centred beside the plot. As the chart does, a tick label
     * that would stand outside its axis or the chart is left out.
     */
    private void axisTexts(Graphics2D g) {
        XYStyler st = chart.getStyler();
        Font ticks = st.getAxisTickLabelsFont();
        double digits = Text.ink("0123456789", ticks).getHeight();
        if (st.isYAxisTicksVisible()) {
            ChartAxes.AxisText y = ChartAxes.y(chart);
            double right = y.tickLabels().getMaxX();
            double top = y.bounds().getMinY();
            double foot = y.bounds().getMaxY();
            for (int i = 0; i < y.labels().size(); i++) {
                double at = foot - y.locations().get(i);
                if (!y.labels().get(i).isEmpty() && at > top && at < foot) {
                    Text.draw(g, y.labels().get(i), ticks, right, at + digits / 2, Text.Align.RIGHT, tickColour, null);
                }
            }
        }
        if (st.isXAxisTicksVisible()) {
            ChartAxes.AxisText x = ChartAxes.x(chart);
            double baseline = x.tickLabels().getMaxY();
            double left = x.bounds().getMinX();
            double right = x.bounds().getMaxX();
            for (int i = 0; i < x.labels().size(); i++) {
                String label = x.labels().get(i);
                double at = left + x.locations().get(i);
                double w = Text.ink(label, ticks).getWidth();
                if (!label.isEmpty() && at > left && at < right && at - w / 2 > 0 && at + w / 2 < chart.getWidth()) {
                    Text.draw(g, label, ticks, at, baseline, Text.Align.CENTRE, tickColour, null);
                }
            }
        }
        Font titles = st.getAxisTitleFont();
        String xTitle = chart.getXAxisTitle();
        if (xTitle != null && !xTitle.isBlank() && st.isXAxisTitleVisible()) {
            Rectangle2D box = ChartAxes.x(chart).bounds();
            Rectangle2D ink = Text.ink(xTitle, titles);
            Text.draw(g, xTitle, titles, box.getCenterX(), box.getMaxY() - ink.getMaxY(), Text.Align.CENTRE,
                    titleColour, null);
        }
        String yTitle = chart.getYAxisTitle();
        if (yTitle != null && !yTitle.isBlank() && st.isYAxisTitleVisible()) {
            Rectangle2D box = ChartAxes.y(chart).bounds();
            AffineTransform saved = g.getTransform();
            g.translate(box.getMinX() + Text.ink(yTitle, titles).getHeight(), box.getCenterY());
            g.rotate(-Math.PI / 2);
            Text.draw(g, yTitle, titles, 0, 0, Text.Align.CENTRE, titleColour, null);
            g.setTransform(saved);
        }
    }

    /** The series shown in the legend, in the chart's order, broken into rows no wider than {@code width}. */
    private static List<List<XYSeries>> rows(XYChart chart, double width) {
        List<List<XYSeries>> rows = new ArrayList<>();
        List<XYSeries> row = new ArrayList<>();
        double used = 0;
        for (XYSeries s : chart.getSeriesMap().values()) {
            if (!s.isShowInLegend()) {
                continue;
            }
            double w = entryWidth(s);
            if (!row.isEmpty() && used + ENTRY_GAP + w > width) {
                rows.add(List.copyOf(row));
                row.clear();
                used = 0;
            }
            used += (row.isEmpty() ? 0 : ENTRY_GAP) + w;
            row.add(s);
        }
        if (!row.isEmpty()) {
            rows.add(List.copyOf(row));
        }
        return List.copyOf(rows);
    }

    private static double entryWidth(XYSeries s) {
        return SYMBOL + SYMBOL_GAP + Text.width(s.getName(), LEGEND);
    }

    private static double rowWidth(List<XYSeries> row) {
        double w = 0;
        for (XYSeries s : row) {
            w += (w == 0 ? 0 : ENTRY_GAP) + entryWidth(s);
        }
        return w;
    }

    /** A series' legend symbol, centred on (x + SYMBOL / 2, y). */
    private void symbol(Graphics2D g, XYSeries s, double x, double y) {
        XYSeriesRenderStyle style = s.getXYSeriesRenderStyle();
        if (style == XYSeriesRenderStyle.Area) {
            Rectangle2D box = new Rectangle2D.Double(x, y - 6, SYMBOL, 12);
            g.setColor(s.getFillColor());
            g.fill(box);
            g.setColor(Palette.MUTED);
            g.setStroke(new BasicStroke(0.8f));
            g.draw(box);
            return;
        }
        if (style != XYSeriesRenderStyle.Scatter && s.getLineStyle() != null) {
            g.setColor(s.getLineColor());
            g.setStroke(s.getLineStyle());
            g.draw(new Line2D.Double(x, y, x + SYMBOL, y));
        }
        if (s.getMarker() != null && !(s.getMarker() instanceof None)) {
            g.setColor(s.getMarkerColor());
            s.getMarker().paint(g, x + SYMBOL / 2, y, chart.getStyler().getMarkerSize());
        }
    }
}
