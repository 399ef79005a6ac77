package org.spanlift.cli.plot;

import java.awt.geom.Rectangle2D;
import java.lang.reflect.Method;
import java.util.List;

import org.knowm.xchart.internal.chartpart.Axis;
import org.knowm.xchart.internal.chartpart.AxisTick;
import org.knowm.xchart.internal.chartpart.AxisTickCalculator;
import org.knowm.xchart.internal.chartpart.AxisTickLabels;
import org.knowm.xchart.internal.chartpart.Chart;
import org.knowm.xchart.XYChart;

/**
 * Where a painted chart put its axes' texts, so that {@link ChartFigure} can write them itself (as text in
 * SVG): the tick labels and their positions, the axis's box and the box of its tick labels.
 * XChart keeps the axes package-private; they are read here by reflection, in one place, and a chart library
 * that no longer has them fails here with a message (every figure test paints charts).
 */
final class ChartAxes {

    /**
     * One axis after painting, in the chart's pixels.
     *
     * @param labels    the tick labels, empty where a tick has none
     * @param locations each tick's distance from the axis's start (the left of an x axis, the bottom of a
     *                  y axis), in pixels
     * @param bounds    the axis's box: for an x axis from the plot's bottom to the chart's, for a y axis from
     *                  the chart's left to the plot's
     * @param tickLabels the box the tick labels take
     */
    record AxisText(List<String> labels, List<Double> locations, Rectangle2D bounds, Rectangle2D tickLabels) {
    }

    private static final Method X_AXIS = method(Chart.class, "getXAxis");
    private static final Method Y_AXIS = method(Chart.class, "getYAxis");
    private static final Method AXIS_TICK = method(Axis.class, "getAxisTick");
    private static final Method TICK_LABELS = method(AxisTick.class, "getAxisTickLabels");

    private ChartAxes() {
    }

    static AxisText x(XYChart chart) {
        return read(call(X_AXIS, chart));
    }

    static AxisText y(XYChart chart) {
        return read(call(Y_AXIS, chart));
    }

    private static AxisText read(Object axisObject) {
        Axis<?, ?> axis = (Axis<?, ?>) axisObject;
        AxisTickCalculator ticks = axis.getAxisTickCalculator();
        AxisTickLabels<?, ?> labels = (AxisTickLabels<?, ?>) call(TICK_LABELS, call(AXIS_TICK, axis));
        return new AxisText(List.copyOf(ticks.getTickLabels().stream().map(l -> l == null ? "" : l).toList()),
                List.copyOf(ticks.getTickLocations()), axis.getBounds(), labels.getBounds());
    }

    private static Method method(Class<?> owner, String name) {
        try {
            Method m = owner.getDeclaredMethod(name);
            m.setAccessible(true);
            return m;
        } catch (ReflectiveOperationException | RuntimeException e) {
            throw new IllegalStateException("the chart library has no " + owner.getSimpleName() + "." + name
                    + "(): the figures cannot write their axis texts", e);
        }
    }

    private static Object call(Method m, Object target) {
        try {
            return m.invoke(target);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("the chart library's " + m.getName() + "() failed", e);
        }
    }
}
