package org.spanlift.cli.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.XYSeries.XYSeriesRenderStyle;
import org.knowm.xchart.style.XYStyler;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.spanlift.flight.ReynoldsRule;
import org.spanlift.section.PlainFlap;
import org.spanlift.solve.LiftCurve;
import org.spanlift.stall.MaximumLift;
import org.spanlift.washout.WashoutDesign;
import org.spanlift.washout.WashoutPoint;
import org.spanlift.washout.WashoutRequirement;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.results.ProfileDrag;
import org.spanlift.results.Solution;
import org.spanlift.results.SpanLoad;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.StallEstimate;

/**
 * The figures Spanlift draws, built from engine results: the planform, the span load, the lift curve and
 * the induced-drag polar and the stall map of one wing, and the overlays that compare several.
 */
public final class Plots {

    static final int CHART_WIDTH = 880;
    static final int CHART_HEIGHT = 500;
    /**
     * Points on a theory curve. The charts stroke each segment on its own, so the dash pattern restarts at
     * every point: segments must be long enough for the dashes to show.
     */
    static final int REFERENCE_POINTS = 29;

    /** The legend entry of the stall onset on the lift curve. */
    static final String STALL_ONSET = "stall onset (critical section)";
    /** The legend entry of the aileron span on the stall map. */
    static final String AILERON_SPAN = "aileron span";
    /** The legend entry of the deflected flaps' span on the stall map. */
    static final String FLAP_SPAN = "deflected flap span";
    /** The legend entry of the section lift coefficient on the span load. */
    static final String SECTION_CL = "section cl";

    private Plots() {
    }

    // ---------------------------------------------------------------- one wing

    /**
     * The planform with the stall-onset station (m, right half) marked when known.
     *
     * @param context the configuration the stall station was found for
     */
    public static PlanformFigure planform(WingAnalysis analysis, OptionalDouble stallStation, FigureContext context) {
        Wing wing = analysis.wing();
        Map<Integer, String> names = new LinkedHashMap<>();
        List<ControlSurface> controls = wing.controls();
        for (int i = 0; i < controls.size(); i++) {
            names.put(i, controls.get(i).name());
        }
        PlanformFigure.Layer layer = new PlanformFigure.Layer(wing.name(), WingGeometry.outlines(wing),
                WingGeometry.panels(wing, analysis.lattice()), names, Palette.INK, new BasicStroke(1.6f));
        LengthUnit u = wing.displayUnit();
        Reference r = wing.reference();
        int panels = analysis.lattice().panelCount();
        String geometry = String.format(Locale.ROOT, "span %s %s  \u00b7  area %s %s\u00b2  \u00b7  aspect ratio %.2f  "
                + "\u00b7  mean aerodynamic chord %s %s  \u00b7  %d panels", length(r.span(), u), u.symbol(),
                area(r.area(), u), u.symbol(), r.aspectRatio(), length(r.chord(), u), u.symbol(), panels);
        String desc = context.sentence() + " Top view of " + wing.name() + " to scale, leading edge up: the outline "
                + "of both halves, the " + panels + " lattice panels, and the control surfaces shaded by kind (flaps "
                + "hatched one way, ailerons the other)" + (stallStation.isPresent() ? "; the dashed lines mark the "
                + "stations where stall starts in this configuration (critical-section estimate)." : ".");
        return new PlanformFigure("planform", "Planform: " + wing.name(), List.of(geometry, context.text()), desc,
                List.of(layer), u, stallStation);
    }

    /**
     * The span load of the first surface (the wing) at one solved condition and, when the sections give
     * cl_max data, each station's cl_max beside its cl.
     *
     * @param limits  the stall estimate of the same configuration, whose strips carry each station's cl_max;
     *                empty when the sections give none
     * @param context the configuration of the solution
     */
    public static ChartFigure spanLoad(WingAnalysis analysis, Solution s, Optional<StallEstimate> limits,
            FigureContext context) {
        Wing wing = analysis.wing();
        LengthUnit u = wing.displayUnit();
        Reference r = wing.reference();
        SpanLoad load = s.spanLoad(0);
        int n = load.size();
        double[] y = load.y();
        double[] clc = load.clc();
        double[] cl = load.cl();
        for (int i = 0; i < n; i++) {
            y[i] /= u.metres();
            clc[i] /= r.chord();
        }
        double wingLift = s.coefficients(0).lift();
        double[][] ell = ellipticLoad(wing.main(), wingLift * r.area(), r.chord(), u, REFERENCE_POINTS);
        String title = String.format(Locale.ROOT, "Span load at \u03b1 = %.2f\u00b0 (CL = %.3f)",
                Math.toDegrees(s.alpha()), s.coefficients().lift());
        XYChart c = chart(title, "spanwise station y [" + u.symbol() + "], right tip positive",
                limits.isPresent() ? "c\u00b7cl / c_ref,  cl  and  cl_max" : "c\u00b7cl / c_ref  and  cl");
        XYSeries a = c.addSeries("c\u00b7cl / c_ref, lattice strips", y, clc);
        style(a, Palette.BLUE, Palette.line(0, 2.2f), SeriesMarkers.CIRCLE);
        XYSeries b = c.addSeries("elliptic load of the same lift", ell[0], ell[1]);
        style(b, Palette.INK, Palette.referenceLine(), SeriesMarkers.NONE);
        XYSeries d = c.addSeries(SECTION_CL, y, cl);
        style(d, Palette.VERMILLION, Palette.line(2, 1.8f), SeriesMarkers.DIAMOND);
        String limitText = "";
        if (limits.isPresent()) {
            StallEstimate e = limits.get();
            double[][] max = clMaxAlongSpan(e, u);
            halves(c, clMaxName(e), max[0], max[1], wing.main().fuselageHalfWidth() > 0, Palette.VERMILLION,
                    Palette.line(1, 2.0f), SeriesMarkers.NONE);
            limitText = " The line section cl_max is each station's cl_max as the stall estimate of this configuration "
                    + "reads it (flap increments included; at " + (context.weight().isPresent() ? "the stall speed's "
                    + "Reynolds numbers" : "the cl-max tables' lowest Reynolds number")
                    + "), so the gap between cl and "
                    + "cl_max is each station's margin" + (e.assumedClMax() ? "; some sections give no cl-max and an "
                    + "assumed value is used." : ".");
        }
        // Negative loads (a washed-out tip beside a deflected flap) stay in view.
        if (min(clc) >= 0 && min(cl) >= 0) {
            c.getStyler().setYAxisMin(0.0);
        }
        String desc = context.sentence() + String.format(Locale.ROOT, " Spanwise load of %s at %.2f degrees angle of "
                + "attack: c times cl over the reference chord %s %s for each lattice strip, the elliptic load "
                + "carrying the same lift, and the section lift coefficient cl.", surfaceLabel(wing),
                Math.toDegrees(s.alpha()), length(r.chord(), u), u.symbol()) + limitText;
        return new ChartFigure(PlotKind.SPAN_LOAD.figureId(), desc, c, context.text());
    }

    /**
     * CL against alpha at the given deflections, with the stall onset marked when it is known.
     *
     * @param onset   the critical-section stall onset of the same configuration, empty when the sections give
     *                no cl_max
     * @param context the configuration
     */
    public static ChartFigure liftCurve(WingAnalysis analysis, double[] deflections, List<Double> alphasDeg,
            Optional<StallEstimate> onset, Optional<MaximumLift> maximum, FigureContext context) {
        LiftCurve inviscid = analysis.liftCurve(deflections);
        LiftCurve line = onset.map(StallEstimate::line).orElse(inviscid);
        boolean handbook = !line.equals(inviscid);
        double[] a = toArray(alphasDeg);
        double[] cl = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            cl[i] = line.lift(Math.toRadians(a[i]));
        }
        String title = String.format(Locale.ROOT, "Lift curve: slope %.3f per rad (%.4f per deg), zero lift at "
                + "%.2f\u00b0",
                line.slope(), line.slope() * Math.PI / 180, Math.toDegrees(line.zeroLiftAngle()));
        XYChart c = chart(title, "angle of attack \u03b1 [deg]", maximum.isPresent() ? "CL"
                : "CL  (inviscid linear theory: no stall)");
        XYSeries s = c.addSeries((maximum.isPresent() ? "CL, linear theory, " : "CL, ") + analysis.wing().name()
                + (handbook ? " (flaps at their handbook lift)" : ""), a, cl);
        style(s, Palette.BLUE, Palette.line(0, 2.2f), SeriesMarkers.CIRCLE);
        String maxText = "";
        if (maximum.isPresent()) {
            MaximumLift m = maximum.get();
            double[] ca = m.curve().stream().mapToDouble(p -> Math.toDegrees(p.alpha())).toArray();
            double[] ccl = m.curve().stream().mapToDouble(MaximumLift.CurvePoint::lift).toArray();
            XYSeries coupled = c.addSeries("CL through the stall (section lift curves"
                    + (m.synthetic() ? ", synthetic" : "") + ")", ca, ccl);
            style(coupled, Palette.VERMILLION, Palette.line(1, 2.2f), SeriesMarkers.NONE);
            XYSeries top = c.addSeries(String.format(Locale.ROOT, "maximum lift: CL = %.3f at \u03b1 = %.2f\u00b0",
                    m.lift(), Math.toDegrees(m.alpha())), new double[] {Math.toDegrees(m.alpha())},
                    new double[] {m.lift()});
            top.setXYSeriesRenderStyle(XYSeriesRenderStyle.Scatter);
            top.setMarker(SeriesMarkers.SQUARE);
            top.setMarkerColor(Palette.VERMILLION);
            c.addAnnotation(new MarkLabel(String.format(Locale.ROOT, "maximum lift, CL %.3f", m.lift()),
                    Math.toDegrees(m.alpha()), m.lift(), Palette.font(Font.PLAIN, 12f), Palette.VERMILLION));
            maxText = String.format(Locale.ROOT, " The vermillion curve is the lift through the stall from the "
                    + "sections' lift curves%s (the lattice coupled with them, on the path of a slowly rising angle "
                    + "of attack), from %.1f to %.1f degrees; its square marks the maximum lift, CL %.3f at %.2f "
                    + "degrees, with %.0f%% of the span past its section peak.", m.synthetic()
                            ? " (some built from cl_max: synthetic)" : "", ca[0], ca[ca.length - 1], m.lift(),
                    Math.toDegrees(m.alpha()), 100 * m.stalledSpanFraction());
        }
        XYSeries z = c.addSeries(String.format(Locale.ROOT, "zero-lift angle %.2f\u00b0",
                Math.toDegrees(line.zeroLiftAngle())), new double[] {Math.toDegrees(line.zeroLiftAngle())},
                new double[] {0});
        z.setXYSeriesRenderStyle(XYSeriesRenderStyle.Scatter);
        z.setMarker(SeriesMarkers.DIAMOND);
        z.setMarkerColor(Palette.VERMILLION);
        String onsetText = " No stall onset is marked: the sections give no cl_max data.";
        if (onset.isPresent()) {
            StallEstimate e = onset.get();
            double alphaDeg = Math.toDegrees(e.alpha());
            boolean outside = alphaDeg < min(a) || alphaDeg > max(a);
            XYSeries m = c.addSeries(String.format(Locale.ROOT, "%s: CL = %.3f at \u03b1 = %.2f\u00b0%s", STALL_ONSET,
                    e.lift(), alphaDeg, outside ? ", beyond the angles drawn" : ""), new double[] {alphaDeg},
                    new double[] {e.lift()});
            m.setXYSeriesRenderStyle(XYSeriesRenderStyle.Scatter);
            m.setMarker(new OnsetMarker());
            m.setMarkerColor(Palette.INK);
            c.addAnnotation(new MarkLabel(String.format(Locale.ROOT, "stall onset, CL %.3f", e.lift()), alphaDeg,
                    e.lift(), Palette.font(Font.PLAIN, 12f), Palette.INK));
            onsetText = String.format(Locale.ROOT, " The black diamond marks the stall onset of this configuration by "
                    + "the critical-section method: at CL %.3f (%.2f degrees) the first station, at y = %s %s, reaches "
                    + "its section cl_max%s. Beyond it the blue line is linear theory only.", e.lift(), alphaDeg,
                    length(e.y(), analysis.wing().displayUnit()), analysis.wing().displayUnit().symbol(),
                    e.assumedClMax() ? " (some sections give no cl-max: an assumed value is used)" : "");
        }
        String desc = context.sentence() + String.format(Locale.ROOT, " Lift coefficient against angle of attack from "
                + "%.1f to %.1f degrees by linear vortex-lattice theory, which does not stall; the lift slope at zero "
                + "lift is %.3f per radian.", a[0], a[a.length - 1], line.slope()) + (handbook ? " The deflected flaps "
                + "and ailerons lift as the handbook plain-flap correction says (" + PlainFlap.source() + "), not with "
                + "their inviscid lift." : "") + onsetText + maxText;
        return new ChartFigure(PlotKind.LIFT.figureId(), desc, c, context.text());
    }

    /**
     * CL against induced drag at the given deflections, with the elliptic-loading bound; and, where every
     * section has a drag polar, against the total drag CDi + CDp.
     *
     * @param reynoldsPerMetre rho V / mu for a point of lift coefficient CL (0 reads the polars at their
     *                         lowest Reynolds number)
     * @param context          the configuration
     */
    public static ChartFigure polar(WingAnalysis analysis, double[] deflections, List<Double> alphasDeg,
            ReynoldsRule reynoldsPerMetre, FigureContext context) {
        Wing wing = analysis.wing();
        double[] a = toArray(alphasDeg);
        double[] cl = new double[a.length];
        double[] cd = new double[a.length];
        double[] total = new double[a.length];
        boolean profile = ProfileDrag.available(wing);
        for (int i = 0; i < a.length; i++) {
            Solution sol = analysis.solve(Math.toRadians(a[i]), deflections);
            var co = sol.coefficients();
            cl[i] = co.lift();
            cd[i] = co.inducedDrag();
            if (profile) {
                total[i] = cd[i] + ProfileDrag.coefficient(sol, wing, reynoldsPerMetre.perMetre(cl[i])).getAsDouble();
            }
        }
        double ar = wing.reference().aspectRatio();
        double lo = Math.min(0, min(cl));
        double hi = Math.max(0, max(cl));
        int m = REFERENCE_POINTS;
        double[] rcl = new double[m];
        double[] rcd = new double[m];
        for (int i = 0; i < m; i++) {
            rcl[i] = lo + (hi - lo) * i / (m - 1);
            rcd[i] = rcl[i] * rcl[i] / (Math.PI * ar);
        }
        String eText = "";
        LiftCurve line = analysis.liftCurve(deflections);
        if (0.5 < line.slope()) {
            var at = analysis.solve(line.alphaFor(0.5), deflections).coefficients();
            if (at.spanEfficiency().isPresent()) {
                eText = String.format(Locale.ROOT, ": e = %.3f at CL 0.5", at.spanEfficiency().getAsDouble());
            }
        }
        XYChart c = chart((profile ? "Drag polar" : "Induced-drag polar") + eText, profile
                ? "CD and CDi  (CDi from the Trefftz plane; CD adds the sections' profile drag)"
                : "CDi  (induced drag only, Trefftz plane; the sections give no drag polar)", "CL");
        XYSeries s = c.addSeries("CL against CDi, " + wing.name(), cd, cl);
        style(s, Palette.BLUE, Palette.line(0, 2.2f), SeriesMarkers.CIRCLE);
        if (profile) {
            XYSeries t = c.addSeries("CL against CD = CDi + CDp", total, cl);
            style(t, Palette.GREEN, Palette.line(2, 2.2f), SeriesMarkers.SQUARE);
        }
        XYSeries e = c.addSeries(String.format(Locale.ROOT, "elliptic, e = 1 (A = %.2f)", ar), rcd, rcl);
        style(e, Palette.INK, Palette.referenceLine(), SeriesMarkers.NONE);
        c.getStyler().setXAxisMin(0.0);
        c.getStyler().setXAxisDecimalPattern("0.000");
        String desc = context.sentence() + String.format(Locale.ROOT, " Lift coefficient against induced drag "
                + "coefficient from %.1f to %.1f "
                + "degrees angle of attack, beside the parabola of elliptic loading at the same aspect ratio. %s",
                a[0], a[a.length - 1], profile ? "The total drag adds the profile drag of the section polars, "
                        + "integrated strip by strip." : "Profile drag is not included: the sections give no polar.");
        return new ChartFigure(PlotKind.POLAR.figureId(), desc, c, context.text());
    }

    /**
     * The stall map: section cl at stall onset and the section cl_max along the span (critical-section
     * method, linear theory), the aileron span, the span of each deflected flap and the fuselage shaded, and
     * the onset station marked.
     *
     * @param context the configuration of the estimate; its deflected flaps are shaded
     */
    public static ChartFigure stallMap(WingAnalysis analysis, StallEstimate stall, Optional<MaximumLift> maximum,
            FigureContext context) {
        Wing wing = analysis.wing();
        LengthUnit u = wing.displayUnit();
        List<StallEstimate.StripStall> strips = stall.strips();
        int n = strips.size();
        double[] y = new double[n];
        double[] cl = new double[n];
        double top = 0;
        for (int i = 0; i < n; i++) {
            y[i] = strips.get(i).y() / u.metres();
            cl[i] = strips.get(i).clAtOnset();
            top = Math.max(top, Math.max(cl[i], strips.get(i).clMax()));
        }
        double band = 1.1 * top;
        if (maximum.isPresent()) {
            for (MaximumLift.StripState st : maximum.get().strips()) {
                band = Math.max(band, 1.1 * Math.max(st.cl(), st.clBeyond()));
            }
        }
        String title = String.format(Locale.ROOT, "Stall map: onset at CL = %.3f (\u03b1 = %.2f\u00b0), station \u03b7 "
                + "= %.2f",
                stall.lift(), Math.toDegrees(stall.alpha()), stall.eta());
        XYChart c = chart(title, "spanwise station y [" + u.symbol() + "], right tip positive",
                "section cl at stall onset  and  cl_max");
        List<String> flapped = new ArrayList<>();
        for (ControlSurface cs : wing.main().controls()) {
            double deflection = context.deflection(cs.name());
            if (cs.kind() == ControlKind.AILERON) {
                shadeSpan(c, AILERON_SPAN, cs, u, band, Palette.AILERON_FILL);
            } else if (cs.kind() == ControlKind.FLAP && deflection != 0) {
                shadeSpan(c, FLAP_SPAN, cs, u, band, Palette.FLAP_FILL);
                flapped.add(cs.name() + " at " + FigureContext.number(Math.toDegrees(deflection)) + " degrees");
            }
        }
        double fuselage = wing.main().fuselageHalfWidth() / u.metres();
        if (fuselage > 0) {
            XYSeries body = c.addSeries("fuselage", new double[] {-fuselage, fuselage},
                    new double[] {band, band});
            body.setXYSeriesRenderStyle(XYSeriesRenderStyle.Area);
            body.setFillColor(Palette.FUSELAGE_FILL);
            body.setLineColor(Palette.FUSELAGE_FILL);
            body.setMarker(SeriesMarkers.NONE);
        }
        String progression = "";
        if (maximum.isPresent()) {
            MaximumLift m = maximum.get();
            double[][] atMax = bothHalves(m.strips(), MaximumLift.StripState::cl, u);
            double[][] beyond = bothHalves(m.strips(), MaximumLift.StripState::clBeyond, u);
            halves(c, String.format(Locale.ROOT, "section cl at maximum lift (CL %.3f, \u03b1 = %.2f\u00b0)",
                    m.lift(), Math.toDegrees(m.alpha())), atMax[0], atMax[1], fuselage > 0, Palette.GREEN,
                    Palette.line(0, 2.2f), SeriesMarkers.NONE);
            if (m.beyondAlpha() > m.alpha() + 1e-9) {
                halves(c, String.format(Locale.ROOT, "section cl past it (\u03b1 = %.2f\u00b0)",
                        Math.toDegrees(m.beyondAlpha())), beyond[0], beyond[1], fuselage > 0, Palette.PURPLE,
                        Palette.line(2, 2.0f), SeriesMarkers.NONE);
            }
            progression = String.format(Locale.ROOT, " From the section lift curves%s: the section cl at the "
                    + "maximum lift (CL %.3f at %.2f degrees, %.0f%% of the span past its section peak)%s.",
                    m.synthetic() ? " (some built from cl_max: synthetic)" : "", m.lift(), Math.toDegrees(m.alpha()),
                    100 * m.stalledSpanFraction(), m.beyondAlpha() > m.alpha() + 1e-9 ? String.format(Locale.ROOT,
                            " and past it at %.2f degrees", Math.toDegrees(m.beyondAlpha())) : "");
        }
        double[][] max = clMaxAlongSpan(stall, u);
        halves(c, clMaxName(stall), max[0], max[1], fuselage > 0, Palette.VERMILLION, Palette.line(1, 2.0f),
                SeriesMarkers.NONE);
        halves(c, "section cl at stall onset", y, cl, fuselage > 0, Palette.BLUE, Palette.line(0, 2.2f),
                SeriesMarkers.CIRCLE);
        double yOnset = stall.y() / u.metres();
        double clOnset = stall.onsetStrip().clMax();
        XYSeries mark = c.addSeries(String.format(Locale.ROOT, "stall starts: y = \u00b1%.3f %s", yOnset, u.symbol()),
                new double[] {-yOnset, yOnset}, new double[] {clOnset, clOnset});
        mark.setXYSeriesRenderStyle(XYSeriesRenderStyle.Scatter);
        mark.setMarker(new OnsetMarker());
        mark.setMarkerColor(Palette.INK);
        c.getStyler().setYAxisMin(0.0);
        c.getStyler().setYAxisMax(band);
        List<String> shaded = new ArrayList<>();
        if (wing.main().controls().stream().anyMatch(cs -> cs.kind() == ControlKind.AILERON)) {
            shaded.add("the aileron span");
        }
        if (!flapped.isEmpty()) {
            shaded.add("the span of the deflected " + (flapped.size() == 1 ? "flap (" : "flaps (")
                    + String.join(", ", flapped) + ")");
        }
        if (fuselage > 0) {
            shaded.add("the fuselage, inside which no station is a stall candidate");
        }
        String desc = context.sentence() + String.format(Locale.ROOT, " Section lift coefficient along the span of %s "
                + "at the wing CL where the first station reaches its section cl_max (%.3f, at %.2f degrees), beside "
                + "the cl_max of each station%s. Critical-section method in linear theory.%s",
                surfaceLabel(wing), stall.lift(), Math.toDegrees(stall.alpha()),
                shaded.isEmpty() ? "" : "; shaded: " + String.join("; ", shaded),
                stall.assumedClMax() ? " Some sections give no cl-max: an assumed value is used." : "") + progression;
        return new ChartFigure(PlotKind.STALL.figureId(), desc, c, context.text());
    }

    /**
     * A value of the maximum-lift strips along both halves, y ascending, in the display unit: the strips as
     * they are when they cover both halves, else the right half mirrored.
     */
    private static double[][] bothHalves(List<MaximumLift.StripState> strips,
            java.util.function.ToDoubleFunction<MaximumLift.StripState> value, LengthUnit u) {
        boolean mirror = strips.stream().allMatch(st -> st.y() > 0);
        List<double[]> points = new ArrayList<>();
        for (MaximumLift.StripState st : strips) {
            points.add(new double[] {st.y() / u.metres(), value.applyAsDouble(st)});
            if (mirror) {
                points.add(new double[] {-st.y() / u.metres(), value.applyAsDouble(st)});
            }
        }
        points.sort(java.util.Comparator.comparingDouble(p -> p[0]));
        double[] y = points.stream().mapToDouble(p -> p[0]).toArray();
        double[] v = points.stream().mapToDouble(p -> p[1]).toArray();
        return new double[][] {y, v};
    }

    /** The legend entry of the sections' cl_max, flagged when some is assumed. */
    static String clMaxName(StallEstimate e) {
        return "section cl_max" + (e.assumedClMax() ? " (partly assumed)" : "");
    }

    /** Each strip's y (display unit) and cl_max, from a stall estimate. */
    private static double[][] clMaxAlongSpan(StallEstimate e, LengthUnit u) {
        List<StallEstimate.StripStall> strips = e.strips();
        double[] y = new double[strips.size()];
        double[] v = new double[strips.size()];
        for (int i = 0; i < y.length; i++) {
            y[i] = strips.get(i).y() / u.metres();
            v[i] = strips.get(i).clMax();
        }
        return new double[][] {y, v};
    }

    /**
     * A spanwise series (y ascending); with a fuselage, one line per half so that none is drawn across it
     * (no strip there is a stall candidate), the legend naming the first.
     */
    private static void halves(XYChart c, String name, double[] y, double[] v, boolean split, Color colour,
            BasicStroke stroke, org.knowm.xchart.style.markers.Marker marker) {
        int right = 0;
        while (split && right < y.length && y[right] < 0) {
            right++;
        }
        for (int[] half : new int[][] {{0, right}, {right, y.length}}) {
            if (half[1] == half[0]) {
                continue;
            }
            boolean first = half[0] == 0;
            XYSeries s = c.addSeries(first ? name : name + ", right half", Arrays.copyOfRange(y, half[0], half[1]),
                    Arrays.copyOfRange(v, half[0], half[1]));
            style(s, colour, stroke, marker);
            s.setShowInLegend(first);
        }
    }

    /**
     * Shades a control's span on both halves, full height; the legend names the first band of a name only
     * (the others get numbered series names, which the chart requires to be unique).
     */
    private static void shadeSpan(XYChart c, String name, ControlSurface cs, LengthUnit u, double height, Color fill) {
        for (double side : new double[] {1, -1}) {
            double a = side * cs.from() / u.metres();
            double b = side * cs.to() / u.metres();
            boolean first = !c.getSeriesMap().containsKey(name);
            String key = name;
            for (int k = 2; c.getSeriesMap().containsKey(key); k++) {
                key = name + " " + k;
            }
            XYSeries area = c.addSeries(key, new double[] {Math.min(a, b), Math.max(a, b)},
                    new double[] {height, height});
            area.setXYSeriesRenderStyle(XYSeriesRenderStyle.Area);
            area.setFillColor(fill);
            area.setLineColor(fill);
            area.setMarker(SeriesMarkers.NONE);
            area.setShowInLegend(first);
        }
    }

    // ---------------------------------------------------------------- several wings

    /**
     * Outlines of several wings overlaid to scale, each in its own file's axes.
     *
     * @param keys     each wing's short key (A, B, ...), for the configurations line
     * @param contexts each wing's configuration
     */
    public static PlanformFigure planformOverlay(List<Wing> wings, List<String> labels, List<String> keys,
            List<FigureContext> contexts, LengthUnit unit) {
        List<PlanformFigure.Layer> layers = new ArrayList<>();
        for (int i = 0; i < wings.size(); i++) {
            layers.add(new PlanformFigure.Layer(legendLabel(labels.get(i), wings.size()),
                    WingGeometry.outlines(wings.get(i)), List.of(), Map.of(),
                    Palette.series(i), Palette.line(i, 2f)));
        }
        String desc = FigureContext.sentence(keys, contexts) + " Top views of " + wings.size() + " wings overlaid "
                + "to scale, each in its own file's axes (leading edge up, centreline dash-dotted); outlines only.";
        return new PlanformFigure("compare-planform", "Planforms overlaid", List.of("outlines to scale, each wing in "
                + "its own file's axes", FigureContext.text(keys, contexts)), desc, layers, unit,
                OptionalDouble.empty());
    }

    /**
     * Span-load shapes of several wings at the same CL: c cl / (CL S / b) against 2y / b, so every curve
     * encloses the same area and the elliptic load is 4 / pi sqrt(1 - eta^2).
     */
    public static ChartFigure spanLoadOverlay(List<Wing> wings, List<Solution> solutions, List<String> labels,
            List<String> keys, List<FigureContext> contexts, double commonCl) {
        XYChart c = chart(String.format(Locale.ROOT, "Span-load shapes at CL = %.2f", commonCl),
                "2y / b  (fraction of the semi-span, right tip at 1)", "c\u00b7cl / (CL \u00b7 S / b)");
        for (int i = 0; i < wings.size(); i++) {
            Surface main = wings.get(i).main();
            Solution s = solutions.get(i);
            SpanLoad load = s.spanLoad(0);
            double b = main.span();
            double mid = main.mirrored() ? 0 : 0.5 * (main.planform().yStart() + main.planform().yEnd());
            double mean = s.coefficients(0).lift() * wings.get(i).reference().area() / b;
            double[] eta = load.y();
            double[] v = load.clc();
            for (int k = 0; k < eta.length; k++) {
                eta[k] = 2 * (eta[k] - mid) / b;
                v[k] /= mean;
            }
            XYSeries series = c.addSeries(legendLabel(labels.get(i), wings.size()), eta, v);
            style(series, Palette.series(i), Palette.line(i, 2f), Palette.marker(i));
        }
        int m = REFERENCE_POINTS;
        double[] eta = new double[m];
        double[] v = new double[m];
        for (int k = 0; k < m; k++) {
            double t = Math.PI * k / (m - 1);
            eta[k] = -Math.cos(t);
            v[k] = 4 / Math.PI * Math.sin(t);
        }
        XYSeries e = c.addSeries("elliptic", eta, v);
        style(e, Palette.MUTED, Palette.referenceLine(), SeriesMarkers.NONE);
        if (c.getSeriesMap().values().stream().allMatch(series -> min(series.getYData()) >= 0)) {
            c.getStyler().setYAxisMin(0.0);
        }
        c.getStyler().setXAxisMin(-1.0);
        c.getStyler().setXAxisMax(1.0);
        c.getStyler().setMarkerSize(5);
        String desc = FigureContext.sentence(keys, contexts) + String.format(Locale.ROOT, " Span-load shapes of %d "
                + "wings at CL %.2f, each normalized by its own "
                + "mean load CL S / b and plotted against the fraction of its semi-span, with the elliptic shape.",
                wings.size(), commonCl);
        return new ChartFigure("compare-span-load", desc, c, FigureContext.text(keys, contexts));
    }

    /** Lift curves of several wings on common axes, each at the deflections of its configuration. */
    public static ChartFigure liftOverlay(List<WingAnalysis> analyses, List<String> labels, List<String> keys,
            List<FigureContext> contexts, List<Double> alphasDeg) {
        XYChart c = chart("Lift curves", "angle of attack \u03b1 [deg]", "CL  (inviscid linear theory: no stall)");
        double[] a = toArray(alphasDeg);
        for (int i = 0; i < analyses.size(); i++) {
            WingAnalysis an = analyses.get(i);
            double[] d = an.fileDeflections();
            double[] cl = new double[a.length];
            for (int k = 0; k < a.length; k++) {
                cl[k] = an.solve(Math.toRadians(a[k]), d).coefficients().lift();
            }
            XYSeries s = c.addSeries(legendLabel(labels.get(i), analyses.size()), a, cl);
            style(s, Palette.series(i), Palette.line(i, 2f), Palette.marker(i));
        }
        String desc = FigureContext.sentence(keys, contexts) + " Lift coefficient against angle of attack for "
                + analyses.size() + " wings, each on its own reference area, with the deflections of its file.";
        return new ChartFigure("compare-lift", desc, c, FigureContext.text(keys, contexts));
    }

    /**
     * The washout trade: the onset station, the aileron margin at onset (with ailerons) and the cruise span
     * efficiency against washout, with the least washout that meets the requirements marked.
     */
    public static ChartFigure washoutTrade(String wingName, WashoutDesign.Result r,
            List<WashoutRequirement> requirements, double cruiseCl, FigureContext context) {
        List<WashoutPoint> trade = r.trade();
        double[] washoutDeg = trade.stream().mapToDouble(p -> Math.toDegrees(p.washout())).toArray();
        double[] eta = trade.stream().mapToDouble(p -> p.onset().eta()).toArray();
        boolean ailerons = trade.get(0).onset().aileronMargin().isPresent();
        Optional<double[]> margin = ailerons ? Optional.of(trade.stream()
                .mapToDouble(p -> p.onset().aileronMargin().orElseThrow().dcl()).toArray()) : Optional.empty();
        double[] cruiseE = trade.stream().mapToDouble(p -> p.cruiseE().orElse(0)).toArray();
        OptionalDouble answerDeg = r.washout().map(p -> OptionalDouble.of(Math.toDegrees(p.washout())))
                .orElse(OptionalDouble.empty());
        String asked = String.join("; ", requirements.stream().map(WashoutRequirement::describe).toList());
        XYChart c = chart("Washout trade: " + wingName, "washout (root twist minus tip twist) [deg]",
                "onset \u03b7, aileron margin \u0394cl, cruise e");
        XYSeries onset = c.addSeries("stall-onset station \u03b7", washoutDeg, eta);
        style(onset, Palette.BLUE, Palette.line(0, 2.2f), SeriesMarkers.CIRCLE);
        margin.ifPresent(m -> {
            XYSeries s = c.addSeries("aileron margin at onset \u0394cl", washoutDeg, m);
            style(s, Palette.VERMILLION, Palette.line(1, 2.2f), SeriesMarkers.NONE);
        });
        XYSeries e = c.addSeries(String.format(Locale.ROOT, "span efficiency e at CL %.2f", cruiseCl), washoutDeg,
                cruiseE);
        style(e, Palette.GREEN, Palette.line(2, 2.2f), SeriesMarkers.NONE);
        String answer = " No washout within the range drawn meets the requirements.";
        if (answerDeg.isPresent()) {
            double w = answerDeg.getAsDouble();
            XYSeries mark = c.addSeries(String.format(Locale.ROOT, "least washout meeting them: %.2f\u00b0", w),
                    new double[] {w, w}, new double[] {0, 1});
            style(mark, Palette.INK, Palette.line(1, 1.5f), SeriesMarkers.NONE);
            answer = String.format(Locale.ROOT, " The vertical line marks the least washout that meets them, %.2f "
                    + "degrees.", w);
        }
        String desc = context.sentence() + " The stall-onset station (critical-section method), the least aileron "
                + "section margin at the onset and the span efficiency at the cruise CL against the washout, root "
                + "twist minus tip twist, linear from root to tip. Requirements: " + asked + "." + answer;
        return new ChartFigure("washout-trade", desc, c, context.text());
    }

    // ---------------------------------------------------------------- helpers

    /**
     * A chart in Spanlift's style: white, light grid; {@link ChartFigure} adds title and legend and writes the
     * axis texts.
     */
    static XYChart chart(String title, String xTitle, String yTitle) {
        XYChart c = new XYChart(CHART_WIDTH, CHART_HEIGHT);
        c.setTitle(title);
        c.setXAxisTitle(xTitle);
        c.setYAxisTitle(yTitle);
        XYStyler st = c.getStyler();
        st.setLocale(Locale.ROOT);
        st.setChartBackgroundColor(Palette.PAPER);
        st.setPlotBackgroundColor(Palette.PAPER);
        st.setChartFontColor(Palette.INK);
        st.setPlotBorderVisible(true);
        st.setPlotBorderColor(Palette.MUTED);
        st.setPlotGridLinesColor(Palette.GRID);
        st.setPlotGridLinesStroke(new BasicStroke(0.8f));
        // the title, subtitle and legend are ChartFigure's (the legend wraps into rows)
        st.setChartTitleVisible(false);
        st.setLegendVisible(false);
        st.setAxisTitleFont(Palette.font(Font.PLAIN, 13f));
        st.setAxisTickLabelsFont(Palette.font(Font.PLAIN, 12f));
        st.setAxisTickLabelsColor(Palette.INK);
        st.setAxisTickMarksColor(Palette.MUTED);
        st.setMarkerSize(6);
        st.setChartPadding(14);
        st.setPlotContentSize(0.94);
        st.setAntiAlias(true);
        st.setToolTipsEnabled(false);
        st.setDefaultSeriesRenderStyle(XYSeriesRenderStyle.Line);
        return c;
    }

    private static void style(XYSeries s, Color colour, BasicStroke stroke,
            org.knowm.xchart.style.markers.Marker marker) {
        s.setLineColor(colour);
        s.setLineStyle(stroke);
        s.setMarker(marker);
        s.setMarkerColor(colour);
    }

    /** The elliptic load c cl / c_ref of a surface carrying lift {@code liftArea} (CL S, m^2). */
    static double[][] ellipticLoad(Surface surface, double liftArea, double refChord, LengthUnit u, int points) {
        double b = surface.span();
        double mid = surface.mirrored() ? 0 : 0.5 * (surface.planform().yStart() + surface.planform().yEnd());
        double peak = 4 * liftArea / (Math.PI * b);
        double[] y = new double[points];
        double[] v = new double[points];
        for (int k = 0; k < points; k++) {
            double t = Math.PI * k / (points - 1);
            y[k] = (mid - 0.5 * b * Math.cos(t)) / u.metres();
            v[k] = peak * Math.sin(t) / refChord;
        }
        return new double[][] {y, v};
    }

    /** A legend entry short enough that the legends of {@code count} series fit on one line. */
    static String legendLabel(String label, int count) {
        int max = Math.max(8, 96 / Math.max(1, count) - 4);
        return label.length() <= max ? label : label.substring(0, max - 1).stripTrailing() + "\u2026";
    }

    private static String surfaceLabel(Wing wing) {
        return wing.surfaces().size() > 1 ? "the surface '" + wing.main().name() + "' of " + wing.name() : wing.name();
    }

    static String length(double metres, LengthUnit u) {
        return String.format(Locale.ROOT, "%.3f", metres / u.metres());
    }

    static String area(double squareMetres, LengthUnit u) {
        return String.format(Locale.ROOT, "%.3f", squareMetres / (u.metres() * u.metres()));
    }

    static double[] toArray(List<Double> list) {
        double[] a = new double[list.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = list.get(i);
        }
        return a;
    }

    private static double min(double[] a) {
        double m = Double.POSITIVE_INFINITY;
        for (double v : a) {
            m = Math.min(m, v);
        }
        return m;
    }

    private static double max(double[] a) {
        double m = Double.NEGATIVE_INFINITY;
        for (double v : a) {
            m = Math.max(m, v);
        }
        return m;
    }
}
