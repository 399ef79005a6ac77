package org.spanlift.cli.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.atmosphere.Airspeed;
import org.spanlift.balance.BalanceStudy;
import org.spanlift.cli.output.DisplayUnits;
import org.spanlift.cli.output.Cautions;
import org.spanlift.cli.output.Results;
import org.spanlift.flight.FlightCondition;
import org.spanlift.flight.FlightPoint;
import org.spanlift.flight.ReynoldsRule;
import org.spanlift.stall.MaximumLift;
import org.spanlift.stall.StallEstimate;
import org.spanlift.washout.WashoutDesign;
import org.spanlift.washout.WashoutPoint;
import org.spanlift.washout.WashoutRequirement;
import org.spanlift.stall.StallStudy;
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
     * What the page shows.
     *
     * @param clean     the wing clean (every flap at zero, other controls as asked), with its point at the chosen CL
     * @param flaps     the wing with the flaps asked, when a flap is deflected
     * @param fine      the clean wing at twice as many strips, for the convergence note
     * @param stall     the stall study (clean and flapped), when the sections allow it
     * @param stallFine the same at twice as many strips
     * @param unavailable why there is no stall study, else empty
     * @param condition the flight condition given, if any
     * @param reynolds  the Reynolds-number rule of the profile drag
     * @param context   the configuration the figures draw (deflections and flight condition)
     * @param alphasDeg the angles of the results table
     * @param rangeDeg  the angles of the lift curve and polar
     * @param units     the units of the tables
     * @param version   the program version for the footer
     */
    public record Inputs(WingSummary clean, Optional<WingSummary> flaps, WingSummary fine, Optional<StallStudy> stall,
            Optional<StallStudy> stallFine, String unavailable, Optional<FlightCondition> condition,
            ReynoldsRule reynolds, FigureContext context, List<Double> alphasDeg, List<Double> rangeDeg,
            DisplayUnits units, String version, Optional<Washout> washout, List<BalanceStudy> balance) {

        /** The configuration the figures draw: with flaps when asked, else clean. */
        WingSummary drawn() {
            return flaps.orElse(clean);
        }

        /** The stall configuration the figures draw. */
        Optional<StallStudy.Configuration> drawnStall() {
            return stall.map(s -> flaps.isPresent() && s.flaps().isPresent() ? s.flaps().get() : s.clean());
        }
    }

    /**
     * The washout answer the report shows when asked for.
     *
     * @param requirements the requirements
     * @param result       the search's answer
     * @param figure       its trade figure
     */
    public record Washout(List<WashoutRequirement> requirements, WashoutDesign.Result result, Figure figure) {
    }

    public static String build(Inputs in) {
        WingSummary summary = in.clean();
        Wing wing = summary.wing();
        DisplayUnits u = in.units();
        Html h = Html.page("Spanlift report: " + wing.name());
        h.line("<header class=\"title\">");
        h.el("p", "class=\"kicker\"", "Spanlift wing report");
        h.el("h1", wing.name());
        h.el("p", "class=\"meta\"", "Wing file " + summary.file().getFileName() + "; lengths in " + u.length().symbol()
                + ", angles in degrees.");
        h.el("p", "class=\"condition\"", conditionText(in));
        h.line("</header>");
        h.caution();

        keyResults(h, in);
        in.washout().ifPresent(w -> washout(h, w, summary.wing()));
        if (!in.balance().isEmpty()) {
            balance(h, in.balance(), u);
        }
        description(h, summary, u);
        h.el("h2", "Figures");
        String drawn = in.flaps().isPresent() ? "The figures show the wing with flaps ("
                + deflectionText(wing, in.drawn().deflections()) + ")." : "The figures show the wing clean.";
        h.el("p", "class=\"meta\"", drawn);
        for (PlotKind kind : PlotKind.values()) {
            Figure f = figure(kind, in.drawn(), in.drawnStall(), in.rangeDeg(), in.reynolds(), in.context());
            if (f == null) {
                h.el("p", "class=\"missing\"", "No stall map: " + in.unavailable());
                continue;
            }
            h.raw("<figure id=\"figure-").raw(kind.figureId()).line("\">");
            h.line(SvgWriter.element(f));
            h.raw("<figcaption><b>").text(f.title()).raw(".</b> ").text(f.description()).line("</figcaption>");
            h.line("</figure>");
        }
        lattice(h, in);
        h.el("h2", "Method and limits");
        h.el("p", "Vortex-lattice method: a horseshoe vortex on every panel, bound leg on the panel's quarter-chord "
                + "line, flow tangency at three-quarter chord; twist, camber and control deflections enter the "
                + "boundary condition linearly. Lift from Kutta-Joukowski on the bound legs, induced drag in the "
                + "Trefftz plane. The span efficiency e is CL\u00b2 / (\u03c0 A CDi) and is shown only where "
                + "|CL| \u2265 0.05. Pitching moment positive nose-up about the moment point; rolling moment positive "
                + "right wing down. The theory is linear and inviscid: it has no stall and no profile drag. Stall "
                + "onset is the critical-section estimate: the lowest wing CL at which a station reaches its section "
                + "cl_max.");
        h.line("<footer>");
        h.text("Made by " + in.version() + " from " + summary.file().getFileName() + ". The same wing file and "
                + "options give the same page.");
        h.line("</footer>");
        return h.close();
    }

    /** The condition the page was made for, in words: weight, altitude and its kind, flap setting. */
    static String conditionText(Inputs in) {
        List<String> parts = new ArrayList<>();
        DisplayUnits u = in.units();
        if (in.condition().isPresent()) {
            FlightCondition fc = in.condition().get();
            parts.add("weight " + u.weight(fc.weight()));
            if (fc.loadFactor() != 1) {
                parts.add("load factor " + Html.fixed(fc.loadFactor(), 2));
            }
            parts.add("pressure altitude " + u.altitude(fc.atmosphere().pressureAltitude())
                    + " (standard atmosphere, geopotential)");
        } else {
            parts.add("no weight given, so no stall speeds (cl_max tables read at their lowest Reynolds number)");
        }
        Wing wing = in.clean().wing();
        parts.add(in.flaps().isPresent() ? "flaps: " + deflectionText(wing, in.flaps().get().deflections())
                : "clean: " + deflectionText(wing, in.clean().deflections()));
        parts.add("aerodynamic results at CL " + Html.fixed(in.clean().cl(), 2));
        return "Condition: " + String.join("; ", parts) + ".";
    }

    /**
     * The figure of a kind, as the report shows it; every kind has one (the switch is exhaustive), but the stall
     * map needs section cl-max data and is null without it.
     */
    static Figure figure(PlotKind kind, WingSummary s, Optional<StallStudy.Configuration> stall, List<Double> rangeDeg,
            ReynoldsRule reynolds, FigureContext context) {
        Optional<StallEstimate> estimate = stall.map(StallStudy.Configuration::estimate);
        return switch (kind) {
            case STALL -> stall.map(c -> (Figure) Plots.stallMap(s.analysis(), c.estimate(), c.maximumLiftIfAny(),
                    context)).orElse(null);
            case PLANFORM -> Plots.planform(s.analysis(), estimate
                    .map(e -> OptionalDouble.of(e.y())).orElse(OptionalDouble.empty()), context);
            case SPAN_LOAD -> Plots.spanLoad(s.analysis(), s.spanLoadAtCl(), estimate, context);
            case LIFT -> Plots.liftCurve(s.analysis(), s.deflections(), rangeDeg, estimate,
                    stall.flatMap(StallStudy.Configuration::maximumLiftIfAny), context);
            case POLAR -> Plots.polar(s.analysis(), s.deflections(), rangeDeg, reynolds, context);
        };
    }

    private static void washout(Html h, Washout w, Wing wing) {
        h.el("h2", "Washout");
        WashoutDesign.Result r = w.result();
        String asked = String.join("; ", w.requirements().stream().map(WashoutRequirement::describe).toList());
        double file = Math.toDegrees(wing.main().planform().washout());
        h.el("p", r.washout().map(p -> String.format(Locale.ROOT, "The least washout meeting the requirements (%s) is "
                + "%.2f degrees (the file's %.2f %+.2f; root twist minus tip twist, linear from root to tip).", asked,
                Math.toDegrees(p.washout()), file, Math.toDegrees(p.change()))).orElse(String.format(Locale.ROOT,
                        "No washout from %.1f to %.1f degrees meets the requirements (%s); the slacks below are "
                                + "read at %.1f degrees.", Math.toDegrees(r.trade().get(0).washout()),
                        Math.toDegrees(r.atUpper().washout()), asked, Math.toDegrees(r.atUpper().washout()))));
        WashoutPoint at = r.washout().orElse(r.atUpper());
        List<List<String>> rows = new ArrayList<>();
        for (WashoutRequirement q : w.requirements()) {
            rows.add(List.of(q.describe(), Html.fixed(q.slack(at), 3) + " " + q.unit(),
                    q.slack(at) >= 0 ? "yes" : "no"));
        }
        h.table("washout", "Requirements at that washout", List.of("requirement", "slack", "met"), rows);
        h.raw("<figure id=\"figure-washout-trade\">").line("");
        h.line(SvgWriter.element(w.figure()));
        h.raw("<figcaption><b>").text(w.figure().title()).raw(".</b> ").text(w.figure().description())
                .line("</figcaption>");
        h.line("</figure>");
    }

    /** The configuration in balance at each centre of gravity asked for. */
    private static void balance(Html h, List<BalanceStudy> studies, DisplayUnits u) {
        h.el("h2", "Balance");
        BalanceStudy first = studies.get(0);
        h.el("p", String.format(Locale.ROOT, "Stick-fixed neutral point (dCm/dCL at small angles of attack): %s of the "
                + "mean aerodynamic chord%s.", Html.fixed(100 * first.neutralPoint().macFraction(), 1) + "%",
                first.downwashGradient().isPresent() ? "; downwash gradient at the tail "
                        + Html.fixed(first.downwashGradient().getAsDouble(), 3) + " (the lattice's, the tail removed)"
                        : ""));
        List<ResultKey<BalanceStudy>> keys = new ArrayList<>(Vocabulary.select(Vocabulary.BALANCE, "cg.x",
                "cg.mac_fraction", "static_margin", "derivatives.Cm_alpha", "derivatives.Cm_q", "derivatives.Cm_de"));
        if (first.stallClean().isPresent()) {
            keys.addAll(Vocabulary.select(Vocabulary.BALANCE, "stall_speed_trimmed.clean_eas",
                    "elevator_at_stall.clean_deg"));
        }
        if (first.stallFlaps().isPresent()) {
            keys.addAll(Vocabulary.select(Vocabulary.BALANCE, "stall_speed_trimmed.flaps_eas",
                    "elevator_at_stall.flaps_deg"));
        }
        if (first.stallClean().isPresent()) {
            keys.add(Vocabulary.find(Vocabulary.BALANCE, "elevator_at_stall.within_limits"));
        }
        List<List<String>> rows = new ArrayList<>();
        for (BalanceStudy s : studies) {
            rows.add(keys.stream().map(k -> value(k, s, u)).toList());
        }
        h.table("balance", "At each centre of gravity (derivatives per radian; trimmed stall power off)",
                keys.stream().map(k -> Results.label(k, u)).toList(), rows);
        first.stallClean().ifPresent(st -> h.el("p", "class=\"meta\"", "Trimmed stall speeds at " + (st.basis()
                == org.spanlift.balance.Balance.StallBasis.MAX_LIFT ? "the maximum lift of the section lift curves"
                        : "the linear stall onset, which errs safe") + ", with the tail's load."));
        if (first.forwardLimit().isPresent()) {
            h.el("p", String.format(Locale.ROOT, "Forward limit of the centre of gravity, the elevator at its up "
                    + "stop at "
                    + "the stall%s: %s of the mean aerodynamic chord.", first.flaps().isPresent() ? " with flaps" : "",
                    Html.fixed(100 * first.clean().macFraction(first.forwardLimit().getAsDouble()), 1) + "%"));
        }
        first.stallProblem().ifPresent(p -> h.el("p", "class=\"missing\"", "No trimmed stall: " + p + "."));
        h.el("p", "class=\"meta\"", Cautions.BALANCE);
    }

    /** One row of the clean-and-flapped table: a label and a cell per configuration. */
    private interface Cell {
        String of(WingSummary summary, Optional<StallStudy.Configuration> stall);
    }

    private static void keyResults(Html h, Inputs in) {
        DisplayUnits u = in.units();
        WingSummary s = in.clean();
        String cl = Html.fixed(s.cl(), 2);
        h.el("h2", "Key results");
        Optional<StallStudy.Configuration> cleanStall = in.stall().map(StallStudy::clean);
        h.line("<ul class=\"keys\">");
        ResultKey<WingResult> slope = Vocabulary.find(Vocabulary.WING, "lift_slope_per_rad");
        ResultKey<WingResult> perDeg = Vocabulary.find(Vocabulary.WING, "lift_slope_per_deg");
        key(h, slope.label(), value(slope, s.wingResult(), u) + " /rad", value(perDeg, s.wingResult(), u)
                + " per degree, at zero lift, clean");
        ResultKey<FlightPoint> e = Vocabulary.find(Vocabulary.POINT, "e");
        key(h, "span efficiency e at CL " + cl, value(e, s.pointAtCl(), u), "CL\u00b2 / (\u03c0 A CDi), clean");
        cleanStall.ifPresent(c -> {
            StallEstimate est = c.estimate();
            key(h, "stall-onset CL, clean", value(Vocabulary.find(Vocabulary.ONSET, "CL"), est, u),
                    "critical-section method, starting at \u03b7 = " + value(Vocabulary.find(Vocabulary.ONSET, "eta"),
                            est, u) + (est.assumedClMax() ? "; some cl_max assumed" : ""));
            ResultKey<StallEstimate> margin = Vocabulary.find(Vocabulary.ONSET, "aileron_margin.dcl");
            est.aileronMargin().ifPresent(m -> key(h, "aileron margin, clean", "\u0394cl = " + value(margin, est, u),
                    margin.description()));
            c.maximumLiftIfAny().ifPresent(m -> key(h, "maximum CL, clean", Html.fixed(m.lift(), 3),
                    "from the section lift curves" + (m.synthetic() ? " (synthetic: built from cl_max)" : "") + "; "
                            + Html.fixed(100 * m.stalledSpanFraction(), 0)
                            + "% of the span past its section peak there"));
            c.headlineEquivalent().ifPresent(v -> key(h, "stall speed, clean", Html.fixed(Airspeed.knots(v), 1)
                    + " kt EAS", Html.fixed(Airspeed.knots(c.headlineTrue().getAsDouble()), 1) + " kt TAS; "
                            + basisText(c) + "; wing alone, see the caution"));
        });
        in.stall().flatMap(StallStudy::flaps).ifPresent(f -> f.headlineEquivalent().ifPresent(v -> key(h,
                "stall speed, flaps", Html.fixed(Airspeed.knots(v), 1) + " kt EAS",
                Html.fixed(Airspeed.knots(f.headlineTrue().getAsDouble()), 1) + " kt TAS; " + basisText(f) + "; "
                        + deflectionText(s.wing(), f.deflections()))));
        in.balance().stream().findFirst().ifPresent(b -> b.stallClean().ifPresent(st -> key(h,
                "trimmed stall speed, clean", Html.fixed(Airspeed.knots(st.equivalentSpeed()), 1) + " kt EAS",
                "with the tail's load at the centre of gravity at " + Html.fixed(100 * b.cgMacFraction(), 1)
                        + "% of the MAC, power off; " + b.stallFlaps().map(f -> "with flaps "
                        + Html.fixed(Airspeed.knots(f.equivalentSpeed()), 1) + " kt EAS").orElse("see Balance"))));
        h.line("</ul>");
        if (in.stall().isEmpty()) {
            h.el("p", "class=\"missing\"", "No stall results: " + in.unavailable());
        }

        List<String> header = new ArrayList<>(List.of("quantity", "clean"));
        in.flaps().ifPresent(f -> header.add("flaps"));
        List<List<String>> rows = new ArrayList<>();
        Optional<StallStudy.Configuration> flapStall = in.stall().flatMap(StallStudy::flaps);
        for (ResultKey<WingResult> k : Vocabulary.select(Vocabulary.WING, "lift_slope_per_rad",
                "zero_lift_angle_deg")) {
            rows.add(row(Results.label(k, u), in, flapStall, (w, st) -> value(k, w.wingResult(), u)));
        }
        for (ResultKey<FlightPoint> k : Vocabulary.select(Vocabulary.POINT, "alpha_deg", "e", "CDi")) {
            rows.add(row(Results.label(k, u) + " at CL " + cl, in, flapStall, (w, st) -> value(k, w.pointAtCl(), u)));
        }
        if (in.stall().isPresent()) {
            for (ResultKey<StallEstimate> k : Vocabulary.select(Vocabulary.ONSET, "CL", "alpha_deg", "y", "eta",
                    "section", "aileron_margin.dcl", "half_span_CL")) {
                rows.add(row(Results.label(k, u), in, flapStall,
                        (w, st) -> st.map(c -> value(k, c.estimate(), u)).orElse("\u2013")));
            }
            if (in.condition().isPresent()) {
                rows.add(row("onset stall speed EAS [kt]", in, flapStall, (w, st) -> st.flatMap(
                        StallStudy.Configuration::speed).map(v -> Html.fixed(Airspeed.knots(v.equivalent()), 1))
                        .orElse("\u2013")));
            }
            for (ResultKey<MaximumLift> k : Vocabulary.select(Vocabulary.MAX_LIFT, "CL", "alpha_deg", "rounds_over",
                    "stalled_span_fraction", "first_stall.eta", "aileron.below_peak", "synthetic_curves")) {
                rows.add(row(Results.label(k, u), in, flapStall,
                        (w, st) -> st.flatMap(c -> c.maximumLiftIfAny()).map(m -> value(k, m, u)).orElse("\u2013")));
            }
            if (in.condition().isPresent()) {
                rows.add(row("stall speed at maximum CL EAS [kt]", in, flapStall, (w, st) -> st.flatMap(
                        c -> c.maximumLiftIfAny().flatMap(MaximumLift::speed))
                        .map(v -> Html.fixed(Airspeed.knots(v.equivalent()), 1))
                        .orElse("\u2013")));
            }
        }
        h.table("configurations", in.flaps().isPresent() ? "Clean and with flaps" : "Clean", header, rows);
        in.stall().ifPresent(study -> study.configurations().forEach(c -> c.estimate().besideControlEnd().ifPresent(
                end -> h.el("p", "class=\"meta\"", "Note (" + c.label() + "): stall starts beside the end of the "
                        + end.control() + ", where linear theory concentrates the deflected control's lift in a narrow "
                        + "peak; this onset falls as the lattice is refined and is pessimistic. "
                        + end.firstOnControl().map(f -> "On the " + end.control() + " itself the first station "
                                + "reaches cl_max at CL " + Html.fixed(f.lift(), 3) + ".").orElse("")))));

        List<ResultKey<FlightPoint>> columns = Vocabulary.select(Vocabulary.POINT, "alpha_deg", "CL", "CDi", "e", "Cm",
                "C_roll");
        List<List<String>> coefficients = new ArrayList<>();
        WingSummary drawn = in.drawn();
        for (double a : in.alphasDeg()) {
            FlightPoint p = new FlightPoint(drawn.analysis().solve(Math.toRadians(a), drawn.deflections()),
                    OptionalDouble.empty());
            coefficients.add(columns.stream().map(k -> value(k, p, u)).toList());
        }
        h.table("results", "Coefficients by angle of attack, " + (in.flaps().isPresent() ? "with flaps" : "clean"),
                columns.stream().map(k -> Results.label(k, u)).toList(), coefficients);
    }

    /** Which maximum a configuration's headline stall speed rests on. */
    private static String basisText(StallStudy.Configuration c) {
        return c.speedBasis().equals("max-lift") ? "at the maximum lift from measured section curves"
                : "at the linear onset, which errs safe (the section curves are partly synthetic)";
    }

    private static List<String> row(String label, Inputs in, Optional<StallStudy.Configuration> flapStall, Cell cell) {
        List<String> row = new ArrayList<>(List.of(label, cell.of(in.clean(), in.stall().map(StallStudy::clean))));
        in.flaps().ifPresent(f -> row.add(cell.of(f, flapStall)));
        return row;
    }

    /** A vocabulary value as the page shows it: display units, the key's decimals, a dash where absent. */
    private static <S> String value(ResultKey<S> key, S source, DisplayUnits u) {
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

    private static void description(Html h, WingSummary summary, DisplayUnits units) {
        Wing wing = summary.wing();
        LengthUnit u = units.length();
        String l = u.symbol();
        Reference r = wing.reference();
        h.el("h2", "The wing");
        List<List<String>> ref = new ArrayList<>();
        for (ResultKey<WingResult> k : Vocabulary.select(Vocabulary.WING, "reference.area", "reference.span",
                "reference.chord", "reference.aspect_ratio")) {
            ref.add(List.of(Results.label(k, units).replace("^2", "\u00b2"), value(k, summary.wingResult(), units)));
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

    private static void lattice(Html h, Inputs in) {
        WingSummary s = in.clean();
        WingSummary fine = in.fine();
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
        DisplayUnits u = in.units();
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
        ResultKey<StallEstimate> onset = Vocabulary.find(Vocabulary.ONSET, "CL");
        double onsetChange = Double.NaN;
        if (in.stall().isPresent() && in.stallFine().isPresent()) {
            StallEstimate coarse = in.stall().get().clean().estimate();
            StallEstimate refined = in.stallFine().get().clean().estimate();
            onsetChange = relative(refined.lift(), coarse.lift());
            conv.add(List.of("stall-onset CL, clean", value(onset, coarse, u), value(onset, refined, u),
                    Html.signed(100 * onsetChange, 2) + " %"));
        }
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
        if (!Double.isNaN(onsetChange)) {
            h.el("p", String.format(Locale.ROOT, "Doubling the strips moves the clean stall-onset CL by %.2f %%. The "
                    + "onset is a local value (the first station to reach cl_max) and settles more slowly than the "
                    + "integrated ones; a change of more than 1 %% means the onset should be read with that "
                    + "margin.", 100 * onsetChange));
        }
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
