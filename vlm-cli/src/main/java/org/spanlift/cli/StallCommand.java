package org.spanlift.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;

import org.spanlift.cli.options.LongSolveNotice;
import org.spanlift.atmosphere.Airspeed;
import org.spanlift.atmosphere.AtmosphereState;
import org.spanlift.cli.options.ClMaxOptions;
import org.spanlift.cli.options.FlightOptions;
import org.spanlift.cli.options.Format;
import org.spanlift.cli.options.InputFiles;
import org.spanlift.cli.options.OffersFormats;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.options.UnitsOption;
import org.spanlift.cli.output.Cautions;
import org.spanlift.cli.output.DisplayUnits;
import org.spanlift.cli.output.Json;
import org.spanlift.cli.output.Results;
import org.spanlift.cli.output.TextTable;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.io.WingFileReader;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.MissingSectionDataException;
import org.spanlift.section.PlainFlap;
import org.spanlift.stall.FlapLift;
import org.spanlift.stall.MaximumLift;
import org.spanlift.stall.StallEstimate;
import org.spanlift.stall.SyntheticCurve;
import org.spanlift.stall.StallStudy;
import org.spanlift.stall.StallStudy.Configuration;
import org.spanlift.vocabulary.Need;
import org.spanlift.vocabulary.ResultKey;
import org.spanlift.vocabulary.Vocabulary;
import org.spanlift.vocabulary.WingResult;


import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code spanlift stall}: where and at what lift the wing starts to stall, clean and with flaps, and the stall speeds.
 */
@Command(name = "stall", mixinStandardHelpOptions = true,
        description = "Stall onset by the critical-section method: station, CL, aileron margin, spread; stall speeds.")
public final class StallCommand implements Callable<Integer>, OffersFormats {

    /** The formats this command writes. */
    static final Set<Format> FORMATS = Collections.unmodifiableSet(EnumSet.of(Format.TABLE, Format.JSON));

    @Parameters(index = "0", paramLabel = "FILE", description = "The wing file (.wing.yaml).")
    Path file;

    @Mixin
    ClMaxOptions clMax;

    @Mixin
    OutputOptions output;

    @Mixin
    FlightOptions flight;

    @Mixin
    UnitsOption units;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Format format = output.format(FORMATS);
        output.check(InputFiles.wing(file));
        units.check(format);
        FlightOptions.refuse(spec, "stall finds the stall speed itself; give --weight (and --altitude) for it",
                "--speed", "--true-speed");
        Wing wing = WingFileReader.read(file);
        Map<String, Double> overrides = flight.deflections(wing);
        Optional<FlightCondition> condition = flight.condition();
        AtmosphereState atmosphere = flight.atmosphere();
        WingAnalysis analysis = LongSolveNotice.analyse(wing, spec.commandLine().getErr());
        double[] asked = analysis.deflections(overrides);
        StallStudy study;
        try {
            study = StallStudy.of(analysis, asked, clMax.assumed(), condition);
        } catch (MissingSectionDataException e) {
            throw new InputException(file.toString(), 0, "sections", e.getMessage());
        }
        WingResult wingResult = WingResult.of(analysis, asked);
        String text = format == Format.JSON
                ? Json.write(json(wingResult, study, atmosphere))
                : table(wing, study, atmosphere, units.units(wing.displayUnit()));
        output.write(text, spec.commandLine().getOut());
        return 0;
    }

    /** The onset keys a configuration shows: a surface's own share only where the wing file has several. */
    private static List<ResultKey<StallEstimate>> onsetKeys(Wing wing) {
        boolean several = wing.surfaces().size() > 1;
        return Vocabulary.ONSET.stream().filter(k -> several || !k.needs(Need.SURFACES)).toList();
    }

    /** What the onset's stations and CLs are, where the wing file has other surfaces besides the wing. */
    private static String configurationNote(Wing wing) {
        List<String> others = wing.surfaces().stream().skip(1).map(s -> s.name().equals(s.role().word()) ? s.name()
                : s.name() + " (" + s.role().word() + ")").toList();
        return "The onset's stations are those of the wing (surface " + wing.main().name() + "); the onset's CL is "
                + "the configuration's: the wing with " + String.join(", ", others) + ", untrimmed, at the "
                + "deflections given (the file's, or --deflect), with the wing's own CL at onset beside it. The lift "
                + "traced through the stall, and its maximum, is the wing's own (the other surfaces stay linear). "
                + "The stall speeds rest on the configuration's CL, at the onset and at the wing's maximum.";
    }

    private static Map<String, Object> stallJson(Wing wing, Configuration c) {
        Map<String, Object> m = new LinkedHashMap<>();
        Results.put(m, onsetKeys(wing), c.estimate());
        m.put("method", wing.surfaces().size() > 1 ? "critical section, linear theory. " + configurationNote(wing)
                : "critical section, linear theory");
        List<StallEstimate.StripStall> right = c.estimate().strips().stream().filter(s -> s.y() > 0).toList();
        Map<String, Object> spread = new LinkedHashMap<>();
        spread.put("y", right.stream().mapToDouble(StallEstimate.StripStall::y).toArray());
        spread.put("eta", right.stream().mapToDouble(StallEstimate.StripStall::eta).toArray());
        spread.put("reynolds", right.stream().mapToDouble(StallEstimate.StripStall::reynolds).toArray());
        spread.put("cl_max", right.stream().mapToDouble(StallEstimate.StripStall::clMax).toArray());
        spread.put("cl_at_onset", right.stream().mapToDouble(StallEstimate.StripStall::clAtOnset).toArray());
        spread.put("cl_basic", right.stream().mapToDouble(StallEstimate.StripStall::clBasic).toArray());
        spread.put("cl_additional", right.stream().mapToDouble(StallEstimate.StripStall::clAdditional).toArray());
        spread.put("section_alpha_deg", right.stream().mapToDouble(s -> Math.toDegrees(s.sectionAngle())).toArray());
        List<Object> reach = new ArrayList<>();
        right.forEach(s -> reach.add(s.liftToReach()));
        spread.put("CL_reaching_cl_max", reach);
        m.put("strips", spread);
        return m;
    }

    private static Map<String, Object> maxLiftJson(Wing wing, Configuration c) {
        Map<String, Object> o = new LinkedHashMap<>();
        if (c.maximumLiftIfAny().isEmpty()) {
            o.put("unavailable", c.maximumLiftProblem().orElseThrow());
            return o;
        }
        MaximumLift m = c.maximumLift();
        boolean several = wing.surfaces().size() > 1;
        List<ResultKey<MaximumLift>> keys = Vocabulary.MAX_LIFT.stream()
                .filter(k -> m.speed().isPresent() || !k.key().startsWith("stall_speed"))
                .filter(k -> several || !k.needs(Need.SURFACES)).toList();
        Results.put(o, keys, m);
        o.put("method", "lattice coupled with the section lift curves (strip incidence corrections), traced "
                + "through the stall");
        o.put("section_curves", m.synthetic() ? "synthetic where no lift-curve is given: " + SyntheticCurve.DESCRIPTION
                : "measured");
        List<FlapLift.Values> flaps = FlapLift.values(wing, c.deflections());
        if (!flaps.isEmpty()) {
            Map<String, Object> model = new LinkedHashMap<>();
            model.put("source", PlainFlap.source());
            model.put("range", PlainFlap.range());
            List<Object> each = new ArrayList<>();
            for (FlapLift.Values v : flaps) {
                Map<String, Object> one = new LinkedHashMap<>();
                one.put("control", v.control());
                one.put("chord_fraction", v.chordFraction());
                one.put("deflection_deg", Math.toDegrees(v.deflection()));
                one.put("tau", v.tau());
                one.put("effectiveness_ratio", v.effectivenessRatio().isPresent() ? v.effectivenessRatio().getAsDouble()
                        : null);
                one.put("large_deflection_factor", v.largeDeflection().isPresent() ? v.largeDeflection().getAsDouble()
                        : null);
                one.put("section_lift_increment", v.liftIncrement());
                one.put("section_cl_max_increment", v.clMaxIncrement());
                one.put("within_handbook_data", v.covered());
                each.add(one);
            }
            model.put("controls", each);
            o.put("flap_model", model);
        }
        if (m.inviscidFlap()) {
            o.put("flap_outside_handbook_data", "a deflected control lies outside the handbook data ("
                    + PlainFlap.range() + "): its strips carry the inviscid flap lift");
        }
        List<MaximumLift.StripState> right = m.strips().stream().filter(s -> s.y() > 0).toList();
        Map<String, Object> strips = new LinkedHashMap<>();
        strips.put("y", right.stream().mapToDouble(MaximumLift.StripState::y).toArray());
        strips.put("eta", right.stream().mapToDouble(MaximumLift.StripState::eta).toArray());
        strips.put("cl", right.stream().mapToDouble(MaximumLift.StripState::cl).toArray());
        strips.put("cl_peak", right.stream().mapToDouble(MaximumLift.StripState::peakCl).toArray());
        strips.put("cl_over_cl_peak", right.stream().mapToDouble(s -> s.cl() / s.peakCl()).toArray());
        strips.put("section_alpha_deg", right.stream().mapToDouble(s -> Math.toDegrees(s.sectionAngle())).toArray());
        strips.put("past_peak", right.stream().map(MaximumLift.StripState::pastPeak).toList());
        List<Object> stallAlpha = new ArrayList<>();
        right.forEach(st -> stallAlpha.add(st.stallAlpha().isPresent()
                ? (Object) Math.toDegrees(st.stallAlpha().getAsDouble()) : null));
        strips.put("alpha_passing_peak_deg", stallAlpha);
        strips.put("cl_beyond", right.stream().mapToDouble(MaximumLift.StripState::clBeyond).toArray());
        strips.put("beyond_alpha_deg", Math.toDegrees(m.beyondAlpha()));
        o.put("strips_at_maximum", strips);
        Map<String, Object> curve = new LinkedHashMap<>();
        curve.put("alpha_deg", m.curve().stream().mapToDouble(p -> Math.toDegrees(p.alpha())).toArray());
        curve.put("CL", m.curve().stream().mapToDouble(MaximumLift.CurvePoint::lift).toArray());
        curve.put("CDi", m.curve().stream().mapToDouble(MaximumLift.CurvePoint::inducedDrag).toArray());
        curve.put("Cm", m.curve().stream().mapToDouble(MaximumLift.CurvePoint::pitchingMoment).toArray());
        curve.put("stalled_span_fraction", m.curve().stream().mapToDouble(MaximumLift.CurvePoint::stalledSpanFraction)
                .toArray());
        o.put("progression", curve);
        return o;
    }

    private static Map<String, Object> json(WingResult wingResult, StallStudy study, AtmosphereState atmosphere) {
        Wing wing = wingResult.analysis().wing();
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("name", wing.name());
        Map<String, Object> units = new LinkedHashMap<>();
        units.put("length", "m");
        units.put("area", "m^2");
        units.put("speed", "m/s");
        units.put("density", "kg/m^3");
        units.put("temperature", "K");
        units.put("pressure", "Pa");
        units.put("force", "N");
        units.put("altitude", "m, pressure altitude (geopotential, standard atmosphere)");
        root.put("units", units);
        Results.put(root, Vocabulary.select(Vocabulary.WING, "reference.area", "reference.span"), wingResult);
        Map<String, Object> atm = new LinkedHashMap<>();
        atm.put("pressure_altitude", atmosphere.pressureAltitude());
        atm.put("density", atmosphere.density());
        atm.put("temperature", atmosphere.temperature());
        atm.put("pressure", atmosphere.pressure());
        root.put("atmosphere", atm);
        root.put("fuselage_half_width", wing.main().fuselageHalfWidth());
        root.put("stall", stallJson(wing, study.clean()));
        root.put("max_lift", maxLiftJson(wing, study.clean()));
        study.flaps().ifPresent(flaps -> {
            Map<String, Object> f = stallJson(wing, flaps);
            f.put("deflections_deg", deflections(wing, flaps.deflections()));
            root.put("stall_flaps", f);
            root.put("max_lift_flaps", maxLiftJson(wing, flaps));
            Results.put(root, Vocabulary.select(Vocabulary.STUDY, "flap_increment_CL"), study);
        });
        study.condition().ifPresent(fc -> {
            List<ResultKey<StallStudy>> speeds = study.flaps().isPresent()
                    ? Vocabulary.select(Vocabulary.STUDY, "stall_speed.clean_eas", "stall_speed.clean_tas",
                            "stall_speed.flaps_eas", "stall_speed.flaps_tas", "stall_speed.basis",
                            "stall_speed.flaps_basis")
                    : Vocabulary.select(Vocabulary.STUDY, "stall_speed.clean_eas", "stall_speed.clean_tas",
                            "stall_speed.basis");
            Results.put(root, speeds, study);
            @SuppressWarnings("unchecked")
            Map<String, Object> sp = (Map<String, Object>) root.get("stall_speed");
            sp.put("weight", fc.weight());
            sp.put("load_factor", fc.loadFactor());
        });
        root.put("caution", Cautions.stall(wing.surfaces().size()));
        return root;
    }

    private static Map<String, Object> deflections(Wing wing, double[] d) {
        Map<String, Object> m = new LinkedHashMap<>();
        for (int i = 0; i < d.length; i++) {
            m.put(wing.controls().get(i).name(), Math.toDegrees(d[i]));
        }
        return m;
    }

    private static String table(Wing wing, StallStudy study, AtmosphereState atmosphere, DisplayUnits unit) {
        String u = unit.length().symbol();
        double k = unit.length().metres();
        StringBuilder b = new StringBuilder(wing.name()).append('\n');
        b.append("  stall onset by the critical-section method (linear theory)\n");
        boolean several = wing.surfaces().size() > 1;
        if (several) {
            b.append(TextTable.wrap(configurationNote(wing))).append('\n');
        }
        double fuselage = wing.main().fuselageHalfWidth();
        if (fuselage > 0) {
            b.append(String.format(Locale.ROOT, "  stations inside the fuselage (|y| < %.3f %s) are not stall "
                    + "candidates%n",
                    fuselage / k, u));
        }
        study.condition().ifPresent(fc -> {
            b.append("  weight ").append(unit.weight(fc.weight()));
            if (fc.loadFactor() != 1) {
                b.append(String.format(Locale.ROOT, ", load factor %.2f", fc.loadFactor()));
            }
            b.append(String.format(Locale.ROOT, "; pressure altitude %s (geopotential), density %.4f kg/m^3, %.2f K%n",
                    unit.altitude(atmosphere.pressureAltitude()), atmosphere.density(), atmosphere.temperature()));
        });
        b.append('\n');
        List<Configuration> configs = study.configurations();
        List<String> headers = new ArrayList<>(List.of(""));
        configs.forEach(c -> headers.add(c.label()));
        TextTable t = new TextTable(headers);
        List<ResultKey<StallEstimate>> onsetRows = new ArrayList<>(Vocabulary.select(Vocabulary.ONSET, "CL",
                "alpha_deg", "y", "eta", "section", "section_alpha_deg", "aileron_margin.dcl", "aileron_margin.y",
                "half_span_CL"));
        if (several) {
            onsetRows.add(1, Vocabulary.find(Vocabulary.ONSET, "wing_CL"));
        }
        for (ResultKey<StallEstimate> onsetKey : onsetRows) {
            ResultKey<StallEstimate> key = several ? Vocabulary.forSeveralSurfaces(onsetKey) : onsetKey;
            t.row(cells(Results.label(key, unit), configs, c -> Results.cell(key, c.estimate(), unit)));
        }
        if (study.condition().isPresent()) {
            t.row(cells("onset stall speed EAS [kt]", configs,
                    c -> TextTable.fixed(Airspeed.knots(c.speed().orElseThrow().equivalent()), 1)));
            t.row(cells("onset stall speed TAS [kt]", configs,
                    c -> TextTable.fixed(Airspeed.knots(c.speed().orElseThrow().trueSpeed()), 1)));
            if (!unit.us()) {
                t.row(cells("onset stall speed EAS [m/s]", configs,
                        c -> TextTable.fixed(c.speed().orElseThrow().equivalent(), 2)));
            }
        }
        t.row(cells("", configs, c -> ""));
        t.row(cells("maximum lift (section lift curves)", configs, c -> ""));
        List<String> maxNames = new ArrayList<>(List.of("CL", "alpha_deg", "rounds_over", "trace_end",
                "stalled_span_fraction", "first_stall.eta", "first_stall.CL", "aileron.below_peak",
                "aileron.margin_dcl", "synthetic_curves"));
        if (several) {
            maxNames.add(2, "configuration_CL");
        }
        for (ResultKey<MaximumLift> maxKey : Vocabulary.select(Vocabulary.MAX_LIFT, maxNames.toArray(String[]::new))) {
            ResultKey<MaximumLift> key = several ? Vocabulary.forSeveralSurfaces(maxKey) : maxKey;
            t.row(cells(Results.label(key, unit), configs, c -> c.maximumLiftIfAny()
                    .map(m -> Results.cell(key, m, unit)).orElse("-")));
        }
        if (study.condition().isPresent()) {
            t.row(cells("stall speed at max CL EAS [kt]", configs, c -> c.maximumLiftIfAny()
                    .map(m -> TextTable.fixed(Airspeed.knots(m.speed().orElseThrow().equivalent()), 1)).orElse("-")));
            t.row(cells("stall speed at max CL TAS [kt]", configs, c -> c.maximumLiftIfAny()
                    .map(m -> TextTable.fixed(Airspeed.knots(m.speed().orElseThrow().trueSpeed()), 1)).orElse("-")));
        }
        b.append(t.render());
        study.condition().ifPresent(fc -> b.append('\n').append(TextTable.wrap(headlineText(configs))).append('\n'));
        for (Configuration c : configs) {
            c.maximumLiftProblem().ifPresent(problem -> b.append('\n').append(TextTable.wrap(String.format(Locale.ROOT,
                    "NOTE (%s, maximum lift): none: %s.", c.label(), problem))).append('\n'));
            if (c.maximumLiftIfAny().isEmpty()) {
                continue;
            }
            MaximumLift m = c.maximumLift();
            if (!m.peak()) {
                b.append('\n').append(TextTable.wrap(String.format(Locale.ROOT, "NOTE (%s, maximum lift): %s",
                        c.label(), switch (m.end()) {
                            case CURVE_ENDS -> "the traced lift curve ends where a section's tabulated lift curve "
                                    + "ends, before the lift has fallen; the maximum shown is the highest found "
                                    + "(extend the section's lift curve to higher angles)";
                            case DEEP_STALL -> "the traced lift curve ends where a station is 10 degrees past its "
                                    + "section peak, before the lift has fallen; the maximum shown is the highest "
                                    + "found";
                            default -> "the lift breaks off at the maximum: a station stalls abruptly there (a "
                                    + "fold of the coupled solution)";
                        }))).append('\n');
            }
            m.multipleSolutions().ifPresent(r -> b.append(TextTable.wrap(String.format(Locale.ROOT,
                    "NOTE (%s, maximum lift): two or more coupled solutions exist from alpha %.2f to %.2f deg (more or "
                            + "less of the span stalled): the lift there depends on the way the angle was reached.",
                            c.label(),
                    Math.toDegrees(r[0]), Math.toDegrees(r[1])))).append('\n'));
        }
        study.flapIncrement().ifPresent(inc -> b.append(String.format(Locale.ROOT,
                "%n  flaps raise the stall-onset CL by %.3f%n", inc)));
        for (Configuration c : configs) {
            c.estimate().besideControlEnd().ifPresent(end -> b.append('\n')
                    .append(TextTable.wrap(String.format(Locale.ROOT,
                    "NOTE (%s): stall starts beside the end of the %s at y = %.3f %s. Linear theory concentrates a "
                            + "deflected control's lift in a peak at its ends, narrower than the chord, so this "
                            + "onset depends on the lattice (finer strips resolve more of the peak and lower it) and "
                            + "is pessimistic: read it as a sign that "
                            + "the %s end may stall early. %s", c.label(), end.control(), end.y() / k, u,
                    end.control(), end.firstOnControl().map(f -> String.format(Locale.ROOT, "On the %s itself the "
                            + "first station reaches cl_max at CL %.3f (y = %.3f %s), a value that settles as the "
                            + "lattice is refined.", end.control(), f.lift(), Math.abs(f.y()) / k, u))
                            .orElse("No station on the " + end.control() + " itself reaches cl_max."))))
                    .append('\n'));
        }
        for (Configuration c : configs) {
            for (FlapLift.Values v : FlapLift.values(wing, c.deflections())) {
                b.append('\n').append(TextTable.wrap(String.format(Locale.ROOT,
                        "NOTE (%s): %s, %.0f%% chord at %.1f deg: "
                                + "%s; section lift %+.3f, cl_max %+.3f. Both the onset and the maximum lift use it.",
                        c.label(), v.control(), 100 * v.chordFraction(), Math.toDegrees(v.deflection()), v.covered()
                                ? String.format(Locale.ROOT, "the handbook plain-flap lift, effectiveness ratio %.3f x "
                                        + "K' %.3f = %.3f of the thin-airfoil lift 2 pi tau delta, tau %.3f (%s)",
                                        v.effectivenessRatio().getAsDouble(), v.largeDeflection().getAsDouble(),
                                        v.effectivenessRatio().getAsDouble() * v.largeDeflection().getAsDouble(),
                                        v.tau(), PlainFlap.source())
                                : "beyond the handbook data (" + PlainFlap.range() + "), so the inviscid flap lift",
                        v.liftIncrement() * Math.signum(v.deflection()),
                        v.clMaxIncrement() * Math.signum(v.deflection())))).append('\n');
            }
            c.estimate().pointedTipFrom().ifPresent(from -> b.append('\n').append(TextTable.wrap(String.format(
                    Locale.ROOT, "NOTE (%s): the strips beyond |y| = %.3f %s have a chord under 5%% of the mean "
                            + "aerodynamic chord (a tip ending in a point, where linear theory's section lift grows "
                            + "without bound): the onset leaves them out; the maximum lift keeps them, limited by "
                            + "their section curves.", c.label(), from / k, u))).append('\n'));
        }
        if (study.assumedClMax()) {
            b.append("\n  NOTE: some sections give no cl-max; an assumed value was used (--assume-cl-max).\n");
        }
        if (study.flaps().isPresent() && study.flaps().get().estimate().defaultFlapIncrement()) {
            b.append("  NOTE: flapped stations use the handbook default plain-flap cl_max increment (no flap-cl-max "
                    + "table).\n");
        }
        if (study.condition().isEmpty()) {
            b.append("\n  No --weight given: no stall speeds; cl-max tables read at their lowest Reynolds number.\n");
        }
        b.append('\n').append(TextTable.wrap(Cautions.stall(wing.surfaces().size()))).append('\n');
        return b.toString();
    }

    /** Which maximum each configuration's headline stall speed rests on, and why. */
    private static String headlineText(List<Configuration> configs) {
        List<String> parts = new ArrayList<>();
        for (Configuration c : configs) {
            parts.add(c.label() + " at the " + (c.speedBasis().equals("max-lift") ? "maximum lift (every section "
                    + "gives a measured lift curve)" : "linear onset, which errs safe (the maximum lift rests on "
                    + "synthetic section curves built from cl_max, or there is none)"));
        }
        return "The headline stall speeds: " + String.join("; ", parts) + ". The other one is shown beside it.";
    }

    private interface Cell {
        String of(Configuration c);
    }

    private static List<String> cells(String label, List<Configuration> configs, Cell cell) {
        List<String> row = new ArrayList<>();
        row.add(label);
        configs.forEach(c -> row.add(cell.of(c)));
        return row;
    }


    @Override
    public Set<Format> formats() {
        return FORMATS;
    }
}
