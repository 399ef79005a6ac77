package org.spanlift.cli.plot;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.XYSeries.XYSeriesRenderStyle;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;
import org.spanlift.results.Solution;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.MaximumLift;
import org.spanlift.stall.StallEstimate;
import org.spanlift.stall.StallStudy;

/** What each figure draws and says about the configuration it was drawn for. */
class PlotsTest {

    private static final WingAnalysis TRAINER = WingAnalysis.of(demo("trainer.wing.yaml"));
    private static final List<Double> ANGLES = List.of(-4.0, 0.0, 4.0, 8.0, 12.0, 16.0);
    /** 750 kg at standard gravity (9.80665 m/s^2), at 1000 m. */
    private static final Optional<FlightCondition> CONDITION = Optional.of(new FlightCondition(750 * 9.80665, 1,
            StandardAtmosphere.at(1000, 0), OptionalDouble.empty()));

    private static Wing demo(String name) {
        return WingFileReader.read(Path.of("..", "geometries", name));
    }

    private static double[] flaps(WingAnalysis analysis, double deg) {
        return analysis.deflections(Map.of("flap", Math.toRadians(deg)));
    }

    private static StallEstimate estimate(WingAnalysis analysis, double[] deflections) {
        return StallStudy.configuration("test", analysis, deflections, OptionalDouble.empty(), CONDITION).estimate();
    }

    private static void assertCarries(FigureContext context, Figure figure, List<String> subtitle) {
        assertTrue(String.join(" ", subtitle).contains("flap 20\u00b0 trailing edge down"), figure.id() + ": "
                + subtitle);
        assertTrue(String.join(" ", subtitle).contains("weight 7355 N"), figure.id() + ": " + subtitle);
        assertTrue(String.join(" ", subtitle).contains("pressure altitude 1000 m"), figure.id() + ": " + subtitle);
        assertTrue(figure.description().startsWith(context.sentence()), figure.id() + ": " + figure.description());
    }

    @Test
    void everyFigureOfOneWingShowsItsConfigurationUnderTheTitleAndInItsDescription() {
        double[] d = flaps(TRAINER, 20);
        FigureContext context = FigureContext.of(TRAINER.wing(), d, CONDITION);
        StallEstimate e = estimate(TRAINER, d);
        Solution s = TRAINER.solve(Math.toRadians(4), d);
        PlanformFigure planform = Plots.planform(TRAINER, OptionalDouble.of(e.y()), context);
        assertCarries(context, planform, planform.subtitle());
        for (ChartFigure f : List.of(Plots.spanLoad(TRAINER, s, Optional.of(e), context),
                Plots.liftCurve(TRAINER, d, ANGLES, Optional.of(e), Optional.empty(), context),
                Plots.polar(TRAINER, d, ANGLES, org.spanlift.flight.ReynoldsRule.of(TRAINER.wing().reference(),
                        StandardAtmosphere.at(1000, 0), OptionalDouble.empty(), CONDITION), context),
                Plots.stallMap(TRAINER, e, Optional.empty(), context))) {
            assertCarries(context, f, f.subtitle());
        }
    }

    @Test
    void theStallMapShadesTheSpanOfEachDeflectedFlapAndNamesItInTheLegend() {
        double[] d = flaps(TRAINER, 20);
        ChartFigure map = Plots.stallMap(TRAINER, estimate(TRAINER, d), Optional.empty(),
                FigureContext.of(TRAINER.wing(), d, CONDITION));
        ControlSurface flap = TRAINER.wing().control("flap").orElseThrow();
        double unit = TRAINER.wing().displayUnit().metres();
        List<XYSeries> bands = map.chart().getSeriesMap().values().stream()
                .filter(s -> s.getName().startsWith(Plots.FLAP_SPAN)).toList();
        assertEquals(2, bands.size(), "one band on each half");
        for (XYSeries band : bands) {
            assertEquals(XYSeriesRenderStyle.Area, band.getXYSeriesRenderStyle());
            assertEquals(Palette.FLAP_FILL, band.getFillColor());
            double side = Math.signum(band.getXData()[0] + band.getXData()[1]);
            double[] expected = side > 0 ? new double[] {flap.from() / unit, flap.to() / unit}
                    : new double[] {-flap.to() / unit, -flap.from() / unit};
            assertArrayEquals(expected, band.getXData(), 1e-12);
        }
        assertTrue(map.legend().stream().flatMap(List::stream).anyMatch(Plots.FLAP_SPAN::equals),
                map.legend().toString());
        assertTrue(map.description().contains("deflected flap (flap at 20 degrees)"), map.description());

        double[] clean = flaps(TRAINER, 0);
        ChartFigure cleanMap = Plots.stallMap(TRAINER, estimate(TRAINER, clean), Optional.empty(),
                FigureContext.of(TRAINER.wing(), clean, CONDITION));
        assertTrue(cleanMap.chart().getSeriesMap().keySet().stream().noneMatch(k -> k.startsWith(Plots.FLAP_SPAN)),
                "no flap band when no flap is deflected");
        assertTrue(cleanMap.chart().getSeriesMap().containsKey(Plots.AILERON_SPAN), "the aileron span stays shaded");
    }

    @Test
    void theLiftCurveDrawsTheLiftThroughTheStallAndMarksItsMaximum() {
        double[] d = flaps(TRAINER, 20);
        StallStudy.Configuration c = StallStudy.configuration("plot", TRAINER, d, OptionalDouble.empty(),
                Optional.empty());
        MaximumLift m = c.maximumLift();
        ChartFigure lift = Plots.liftCurve(TRAINER, d, ANGLES, Optional.of(c.estimate()), Optional.of(m),
                FigureContext.of(TRAINER.wing(), d, Optional.empty()));
        XYSeries through = lift.chart().getSeriesMap().values().stream()
                .filter(s -> s.getName().startsWith("CL through the stall")).findFirst().orElseThrow();
        assertEquals(m.curve().size(), through.getYData().length);
        XYSeries top = lift.chart().getSeriesMap().values().stream()
                .filter(s -> s.getName().startsWith("maximum lift")).findFirst().orElseThrow();
        assertEquals(m.lift(), top.getYData()[0], 0);
        for (double y : through.getYData()) {
            assertTrue(y <= m.lift() + 1e-12, "no point of the curve above the maximum");
        }
        assertTrue(lift.description().contains(String.format(java.util.Locale.ROOT, "CL %.3f", m.lift())),
                lift.description());
    }

    @Test
    void theLiftCurveMarksTheStallOnsetOfTheConfigurationDrawnOnTheCurve() {
        for (double deg : new double[] {0, 20}) {
            double[] d = flaps(TRAINER, deg);
            StallEstimate e = estimate(TRAINER, d);
            ChartFigure lift = Plots.liftCurve(TRAINER, d, ANGLES, Optional.of(e), Optional.empty(),
                    FigureContext.of(TRAINER.wing(), d, CONDITION));
            List<XYSeries> marks = lift.chart().getSeriesMap().values().stream()
                    .filter(s -> s.getName().startsWith(Plots.STALL_ONSET)).toList();
            assertEquals(1, marks.size(), "flaps " + deg);
            XYSeries mark = marks.get(0);
            assertTrue(mark.getMarker() instanceof OnsetMarker);
            assertEquals(Math.toDegrees(e.alpha()), mark.getXData()[0], 1e-12);
            assertEquals(e.lift(), mark.getYData()[0], 1e-12);
            // on the curve drawn: its CL at the onset angle is the onset CL
            assertEquals(e.line().lift(e.alpha()), mark.getYData()[0], 1e-12);
            XYSeries drawn = lift.chart().getSeriesMap().values().stream()
                    .filter(s -> s.getName().startsWith("CL, ")).findFirst().orElseThrow();
            assertEquals(e.line().lift(Math.toRadians(drawn.getXData()[0])), drawn.getYData()[0], 1e-12);
            assertTrue(lift.legend().stream().flatMap(List::stream).anyMatch(mark.getName()::equals));
        }
        assertTrue(estimate(TRAINER, flaps(TRAINER, 20)).lift() != estimate(TRAINER, flaps(TRAINER, 0)).lift(),
                "the flapped and clean onsets differ, so the marks above are told apart");

        WingAnalysis tourer = WingAnalysis.of(demo("tourer.wing.yaml"));
        double[] d = tourer.fileDeflections();
        ChartFigure none = Plots.liftCurve(tourer, d, ANGLES, Optional.empty(), Optional.empty(),
                FigureContext.of(tourer.wing(), d, Optional.empty()));
        assertTrue(none.chart().getSeriesMap().keySet().stream().noneMatch(k -> k.startsWith(Plots.STALL_ONSET)));
        assertTrue(none.description().contains("No stall onset is marked"), none.description());
    }

    @Test
    void theSpanLoadDrawsEachStationsClMaxWhenTheSectionsGiveIt() {
        double[] d = flaps(TRAINER, 20);
        StallEstimate e = estimate(TRAINER, d);
        ChartFigure load = Plots.spanLoad(TRAINER, TRAINER.solve(Math.toRadians(4), d), Optional.of(e),
                FigureContext.of(TRAINER.wing(), d, CONDITION));
        Map<String, XYSeries> series = load.chart().getSeriesMap();
        // the trainer has a fuselage: one line per half, the legend naming the first
        XYSeries left = series.get(Plots.clMaxName(e));
        XYSeries right = series.get(Plots.clMaxName(e) + ", right half");
        double unit = TRAINER.wing().displayUnit().metres();
        List<StallEstimate.StripStall> strips = e.strips();
        int n = left.getXData().length;
        assertEquals(strips.size(), n + right.getXData().length);
        for (int i = 0; i < strips.size(); i++) {
            XYSeries half = i < n ? left : right;
            int k = i < n ? i : i - n;
            assertEquals(strips.get(i).y() / unit, half.getXData()[k], 1e-12);
            assertEquals(strips.get(i).clMax(), half.getYData()[k], 0);
        }
        assertTrue(series.containsKey(Plots.SECTION_CL), "cl beside it");
        assertTrue(load.legend().stream().flatMap(List::stream).anyMatch(Plots.clMaxName(e)::equals),
                load.legend().toString());

        ChartFigure without = Plots.spanLoad(TRAINER, TRAINER.solve(Math.toRadians(4), d), Optional.empty(),
                FigureContext.of(TRAINER.wing(), d, CONDITION));
        assertFalse(without.chart().getSeriesMap().keySet().stream().anyMatch(k -> k.startsWith("section cl_max")));
    }

    @Test
    void negativeSpanLoadsStayInView() {
        double[] d = flaps(TRAINER, 20);
        // at CL 0.5 with the flaps down the washed-out tips carry a download
        Solution s = TRAINER.solve(TRAINER.liftCurve(d).alphaFor(0.5), d);
        double least = Double.POSITIVE_INFINITY;
        for (double v : s.spanLoad(0).cl()) {
            least = Math.min(least, v);
        }
        assertTrue(least < 0, "a negative section cl to show");
        ChartFigure load = Plots.spanLoad(TRAINER, s, Optional.empty(), FigureContext.of(TRAINER.wing(), d,
                Optional.empty()));
        assertNull(load.chart().getStyler().getYAxisMin(), "the axis is not cut at zero");
        ChartFigure clean = Plots.spanLoad(TRAINER, TRAINER.solve(Math.toRadians(4), flaps(TRAINER, 0)),
                Optional.empty(), FigureContext.undeflected());
        assertEquals(Double.valueOf(0), clean.chart().getStyler().getYAxisMin(), "positive loads start at zero");
    }
}
