package org.spanlift.cli.plot;

import java.awt.Graphics2D;

import org.knowm.xchart.XYChart;

/** An XChart chart as a {@link Figure}: the chart paints itself into the graphics it is given. */
public final class ChartFigure implements Figure {

    private final String id;
    private final String description;
    private final XYChart chart;

    public ChartFigure(String id, String description, XYChart chart) {
        this.id = id;
        this.description = description;
        this.chart = chart;
    }

    public XYChart chart() {
        return chart;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public String title() {
        return chart.getTitle();
    }

    @Override
    public String description() {
        return description;
    }

    @Override
    public int width() {
        return chart.getWidth();
    }

    @Override
    public int height() {
        return chart.getHeight();
    }

    @Override
    public void paint(Graphics2D g) {
        chart.paint(g, chart.getWidth(), chart.getHeight());
    }
}
