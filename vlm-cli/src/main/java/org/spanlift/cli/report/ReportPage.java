package org.spanlift.cli.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.spanlift.atmosphere.Airspeed;
import org.spanlift.cli.output.Results;
import org.spanlift.flight.FlightPoint;
import org.spanlift.flight.ReynoldsRule;
import org.spanlift.stall.StallEstimate;
import org.spanlift.vocabulary.ResultKey;
import org.spanlift.vocabulary.Vocabulary;
import org.spanlift.vocabulary.WingResult;
import org.spanlift.cli.plot.Figure;
import org.spanlift.cli.plot.FigureContext;
import org.spanlift.cli.plot.PlotKind;
import org.spanlift.cli.plot.Plots;
import org.spanlift.cli.plot.SvgWriter;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Planform;
import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Lattice;
import org.spanlift.solve.WingAnalysis;

/**
 * The single-wing report: one self-contained HTML page (style sheet and figures inline, no scripts, no
 * fetches) with the wing's description, its key results, every plot, the lattice and a convergence check.
 */
public final class ReportPage {

    /**
     * @param summary   the wing at its file lattice, with the condition at the chosen CL
     * @param fine      the same at twice as many strips, for the convergence note
     * @param stall     the stall-onset estimate, or why there is none
     * @param reynolds  rho V / mu for a point of lift coefficient CL, for the profile drag
     * @param context   the configuration of the figures (the summary's deflections and the flight condition)
     * @param alphasDeg the angles of the results table
     * @param rangeDeg  the angles of the lift curve and polar
     * @param version   the program version for the footer
     */
    public static String build(WingSummary summary, WingSummary fine, StallSummary stall, List<Double> alphasDeg,
            List<Double> rangeDeg, ReynoldsRule reynolds, FigureContext context, String version) {
        Wing wing = summary.wing();
        WingAnalysis analysis = summary.analysis();
        LengthUnit u = wing.displayUnit();
        Html h = Html.page("Spanlift report: " + wing.name());
        h.line("<header class=\"title\">");
        h.el("p", "class=\"kicker\"", "Spanlift wing report");
        h.el("h1", wing.name());
        h.el("p", "class=\"meta\"", "Wing file " + summary.file().getFileName() + "; lengths in " + u.symbol()
                + ", angles in degrees; " + deflectionText(wing, summary.deflections()) + ".");
        h.line("</header>");
        h.caution();

        keyResults(h, summary, stall, alphasDeg);
        description(h, summary);
        h.el("h2", "Figures");
        for (PlotKind kind : PlotKind.values()) {
            Figure f = figure(kind, summary, stall, rangeDeg, reynolds, context);
            if (f == null) {
                h.el("p", "class=\"missing\"", "No stall map: " + stall.unavailable());
                continue;
            }
            h.raw("<figure id=\"figure-").raw(kind.figureId()).line("\">");
            h.line(SvgWriter.element(f));
            h.raw("<figcaption><b>").text(f.title()).raw(".</b> ").text(f.description()).line("</figcaption>");
            h.line("</figure>");
        }
        lattice(h, summary, fine);
        h.el("h2", "Method and limits");
        h.el("p", "Vortex-lattice method: a horseshoe vortex on every panel, bound leg on the panel's quarter-chord "
                + "line, flow tangency at three-quarter chord; twist, camber and control deflections enter the "
                + "boundary condition linearly. Lift from Kutta-Joukowski on the bound legs, induced drag in the "
                + "Trefftz plane. The span efficiency e is CL\u00b2 / (\u03c0 A CDi) and is shown only where "
                + "|CL| \u2265 0.05. Pitching moment positive nose-up about the moment point; rolling moment positive "
                + "right wing down. The theory is linear and inviscid: it has no stall and no profile drag.");
        h.line("<footer>");
        h.text("Made by " + version + " from " + summary.file().getFileName() + ". The same wing file and options "
                + "give the same page.");
        h.line("</footer>");
        return h.close();
    }

    /**
     * The figure of a kind, as the report shows it; every kind has one (the switch is exhaustive), but the stall
     * map needs section cl-max data and is null without it.
     */
    static Figure figure(PlotKind kind, WingSummary s, StallSummary stall, List<Double> rangeDeg,
            ReynoldsRule reynolds, FigureContext context) {
        return switch (kind) {
            case STALL -> stall.estimate().map(e -> (Figure) Plots.stallMap(s.analysis(), e, context)).orElse(null);
            case PLANFORM -> Plots.planform(s.analysis(), stall.estimate()
                    .map(e -> OptionalDouble.of(e.y())).orElse(OptionalDouble.empty()), context);
            case SPAN_LOAD -> Plots.spanLoad(s.analysis(), s.spanLoadAtCl(), stall.estimate(), context);
            case LIFT -> Plots.liftCurve(s.analysis(), s.deflections(), rangeDeg, stall.estimate(), context);
            case POLAR -> Plots.polar(s.analysis(), s.deflections(), rangeDeg, reynolds, context);
        };
    }

    private static void keyResults(Html h, WingSummary s, StallSummary stall, List<Double> alphasDeg) {
        LengthUnit u = s.wing().displayUnit();
        WingResult w = s.wingResult();
        FlightPoint atCl = s.pointAtCl();
        String cl = Html.fixed(s.cl(), 2);
        h.el("h2", "Key results");
        h.line("<ul class=\"keys\">");
        ResultKey<WingResult> slope = Vocabulary.find(Vocabulary.WING, "lift_slope_per_rad");
        ResultKey<WingResult> perDeg = Vocabulary.find(Vocabulary.WING, "lift_slope_per_deg");
        key(h, slope.label(), value(slope, w, u) + " /rad", value(perDeg, w, u) + " per degree, at zero lift");
        ResultKey<WingResult> zero = Vocabulary.find(Vocabulary.WING, "zero_lift_angle_deg");
        key(h, zero.label(), value(zero, w, u) + "\u00b0", zero.description());
        ResultKey<FlightPoint> e = Vocabulary.find(Vocabulary.POINT, "e");
        key(h, "span efficiency e at CL " + cl, value(e, atCl, u), "CL\u00b2 / (\u03c0 A CDi)");
        ResultKey<FlightPoint> cdi = Vocabulary.find(Vocabulary.POINT, "CDi");
        ResultKey<FlightPoint> alpha = Vocabulary.find(Vocabulary.POINT, "alpha_deg");
        key(h, "induced drag CDi at CL " + cl, value(cdi, atCl, u), "at \u03b1 = " + value(alpha, atCl, u) + "\u00b0");
        stall.estimate().ifPresent(est -> {
            String flag = (est.assumedClMax() ? "; some cl_max assumed" : "") + est.besideControlEnd()
                    .map(end -> "; beside the end of the " + end.control() + ", where linear theory peaks: lattice-sensitive, "
                            + "pessimistic").orElse("");
            ResultKey<StallEstimate> onset = Vocabulary.find(Vocabulary.ONSET, "CL");
            key(h, "stall-onset CL", value(onset, est, u), "critical-section method, at \u03b1 = "
                    + value(Vocabulary.find(Vocabulary.ONSET, "alpha_deg"), est, u) + "\u00b0" + flag);
            key(h, "stall starts at", "\u03b7 = " + value(Vocabulary.find(Vocabulary.ONSET, "eta"), est, u), "y = "
                    + value(Vocabulary.find(Vocabulary.ONSET, "y"), est, u) + " " + u.symbol() + ", section "
                    + est.section());
            ResultKey<StallEstimate> margin = Vocabulary.find(Vocabulary.ONSET, "aileron_margin.dcl");
            est.aileronMargin().ifPresent(m -> key(h, "aileron margin", "\u0394cl = " + value(margin, est, u),
                    margin.description()));
        });
        stall.speed().ifPresent(v -> key(h, "stall speed", Html.fixed(Airspeed.knots(v.equivalent()), 1) + " kt EAS",
                Html.fixed(Airspeed.knots(v.trueSpeed()), 1) + " kt TAS; wing alone, see the caution"));
        h.line("</ul>");
        List<ResultKey<FlightPoint>> columns = Vocabulary.select(Vocabulary.POINT, "alpha_deg", "CL", "CDi", "e", "Cm",
                "C_roll");
        List<List<String>> rows = new ArrayList<>();
        for (double a : alphasDeg) {
            FlightPoint p = new FlightPoint(s.analysis().solve(Math.toRadians(a), s.deflections()), OptionalDouble.empty());
            rows.add(columns.stream().map(k -> value(k, p, u)).toList());
        }
        h.table("results", "Coefficients by angle of attack", columns.stream().map(k -> Results.label(k, u)).toList(),
                rows);
    }

    /** A vocabulary value as the page shows it: display units, the key's decimals, a dash where absent. */
    private static <S> String value(ResultKey<S> key, S source, LengthUnit u) {
        Object v = key.of(source);
        if (v == null) {
            return "\u2013";
        }
        return v instanceof Number n ? Html.fixed(Results.display(key, n.doubleValue(), u), key.decimals())
                : String.valueOf(v);
    }

    private static void key(Html h, String label, String value, String note) {
        h.raw("<li><span class=\"label\">").text(label).raw("</span><span class=\"value\">").text(value)
                .raw("</span><span class=\"note\">").text(note).line("</span></li>");
    }

    private static void description(Html h, WingSummary summary) {
        Wing wing = summary.wing();
        LengthUnit u = wing.displayUnit();
        String l = u.symbol();
        Reference r = wing.reference();
        h.el("h2", "The wing");
        List<List<String>> ref = new ArrayList<>();
        for (ResultKey<WingResult> k : Vocabulary.select(Vocabulary.WING, "reference.area", "reference.span",
                "reference.chord", "reference.aspect_ratio")) {
            ref.add(List.of(Results.label(k, u).replace("^2", "\u00b2"), value(k, summary.wingResult(), u)));
        }
        ref.add(List.of("moment point x, y, z [" + l + "]", Html.fixed(r.momentPoint().x() / u.metres(), 3)
                + ", " + Html.fixed(r.momentPoint().y() / u.metres(), 3) + ", "
                + Html.fixed(r.momentPoint().z() / u.metres(), 3)));
        h.table("reference", "Reference values (coefficients are based on these)", List.of("quantity", "value"), ref);
        List<List<String>> rows = new ArrayList<>();
        for (Surface s : wing.surfaces()) {
            Planform p = s.planform();
            double y0 = p.yStart();
            double y1 = p.yEnd();
            double c0 = p.chord(y0);
            double c1 = p.chord(y1);
            rows.add(List.of(s.name() + (s.mirrored() ? " (mirrored)" : ""), Html.fixed(s.span() / u.metres(), 3),
                    Html.fixed(s.area() / (u.metres() * u.metres()), 3), Html.fixed(c0 / u.metres(), 3),
                    Html.fixed(c1 / u.metres(), 3), Html.fixed(c0 > 0 ? c1 / c0 : 0, 3),
                    Html.fixed(s.meanAerodynamicChord() / u.metres(), 3),
                    Html.fixed(Math.toDegrees(Math.atan2(p.noseX(y1) - p.noseX(y0), y1 - y0)), 2),
                    Html.fixed(Math.toDegrees(Math.atan2(p.noseZ(y1) - p.noseZ(y0), y1 - y0)), 2),
                    Html.fixed(Math.toDegrees(p.twist(y0)), 2) + " / " + Html.fixed(Math.toDegrees(p.twist(y1)), 2)));
        }
        h.table("wide", "Surfaces", List.of("surface", "span [" + l + "]", "area [" + l + "\u00b2]",
                "root chord [" + l + "]", "tip chord [" + l + "]", "taper", "MAC [" + l + "]", "LE sweep [deg]",
                "dihedral [deg]", "twist root / tip [deg]"), rows);
        h.el("p", "class=\"meta\"", "Sweep and dihedral are those of the straight line from the root leading edge to "
                + "the tip leading edge; twist is positive nose-up.");
        if (!wing.controls().isEmpty()) {
            List<List<String>> cr = new ArrayList<>();
            for (ControlSurface c : wing.controls()) {
                cr.add(List.of(c.name(), c.kind().name().toLowerCase(Locale.ROOT), Html.fixed(c.from() / u.metres(), 3),
                        Html.fixed(c.to() / u.metres(), 3), Html.fixed(c.chordFraction(), 3),
                        Html.fixed(Math.toDegrees(c.deflection()), 1)));
            }
            h.table("controls", "Control surfaces (as in the file)", List.of("control", "kind", "from y [" + l + "]",
                    "to y [" + l + "]", "chord fraction", "deflection [deg]"), cr);
        }
    }

    private static void lattice(Html h, WingSummary s, WingSummary fine) {
        Wing wing = s.wing();
        Lattice lat = s.analysis().lattice();
        h.el("h2", "Lattice and convergence");
        List<List<String>> rows = new ArrayList<>();
        for (Surface sf : wing.surfaces()) {
            rows.add(List.of(sf.name(), Integer.toString(sf.lattice().strips()) + (sf.mirrored() ? " per half" : ""),
                    Integer.toString(sf.lattice().rows()), sf.lattice().stripSpacing().name().toLowerCase(Locale.ROOT),
                    sf.lattice().rowSpacing().name().toLowerCase(Locale.ROOT)));
        }
        h.table("lattice", "Lattice of the file", List.of("surface", "strips", "rows per strip", "strip spacing",
                "row spacing"), rows);
        int unknowns = lat.mirrored() ? lat.halfCount() : lat.panelCount();
        h.el("p", lat.panelCount() + " panels in " + lat.strips().size() + " strips over both halves; " + unknowns
                + " unknowns per system (" + (lat.mirrored() ? "half span, solved with mirror images" : "full span")
                + ").");
        LengthUnit u = wing.displayUnit();
        double slopeChange = relative(fine.liftSlope(), s.liftSlope());
        ResultKey<WingResult> slope = Vocabulary.find(Vocabulary.WING, "lift_slope_per_rad");
        ResultKey<FlightPoint> e = Vocabulary.find(Vocabulary.POINT, "e");
        ResultKey<FlightPoint> cdi = Vocabulary.find(Vocabulary.POINT, "CDi");
        String at = " at CL " + Html.fixed(s.cl(), 2);
        List<List<String>> conv = new ArrayList<>();
        conv.add(List.of(Results.label(slope, u), value(slope, s.wingResult(), u), value(slope, fine.wingResult(), u),
                Html.signed(100 * slopeChange, 2) + " %"));
        double eChange = Double.NaN;
        if (s.spanEfficiency().isPresent() && fine.spanEfficiency().isPresent()) {
            eChange = relative(fine.spanEfficiency().getAsDouble(), s.spanEfficiency().getAsDouble());
            conv.add(List.of(e.label() + at, value(e, s.pointAtCl(), u), value(e, fine.pointAtCl(), u),
                    Html.signed(100 * eChange, 2) + " %"));
        }
        conv.add(List.of(cdi.label() + at, value(cdi, s.pointAtCl(), u), value(cdi, fine.pointAtCl(), u),
                Html.signed(100 * relative(fine.inducedDrag(), s.inducedDrag()), 2) + " %"));
        int strips = wing.main().lattice().strips();
        h.table("convergence", "Convergence: the file lattice against twice as many strips",
                List.of("quantity", strips + " strips", 2 * strips + " strips", "change"), conv);
        double worst = Math.max(Math.abs(slopeChange), Double.isNaN(eChange) ? 0 : Math.abs(eChange));
        String verdict = worst < 0.005
                ? String.format(Locale.ROOT, "Doubling the strips moves the lift slope and e by at most %.2f %%: the "
                        + "file lattice is fine enough for these quantities.", 100 * worst)
                : String.format(Locale.ROOT, "Doubling the strips moves the lift slope or e by %.2f %%: refine the "
                        + "lattice (more strips) before relying on them.", 100 * worst);
        h.el("p", verdict);
    }

    private static double relative(double fine, double coarse) {
        return (fine - coarse) / coarse;
    }

    static String deflectionText(Wing wing, double[] deflections) {
        List<ControlSurface> controls = wing.controls();
        if (controls.isEmpty()) {
            return "no control surfaces";
        }
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < controls.size(); i++) {
            parts.add(controls.get(i).name() + " " + Html.fixed(Math.toDegrees(deflections[i]), 1) + "\u00b0");
        }
        return "deflections " + String.join(", ", parts) + " (trailing edge down; aileron: the right one)";
    }

    private ReportPage() {
    }
}
