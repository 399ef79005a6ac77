package org.spanlift.cli;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.concurrent.Callable;

import org.spanlift.cli.options.LongSolveNotice;
import org.spanlift.solve.LiftCurve;
import org.spanlift.atmosphere.Airspeed;
import org.spanlift.atmosphere.AtmosphereState;
import org.spanlift.cli.options.AlphaList;
import org.spanlift.cli.options.ClMaxOptions;
import org.spanlift.cli.options.FlightOptions;
import org.spanlift.cli.options.Format;
import org.spanlift.cli.options.InputFiles;
import org.spanlift.cli.options.OffersFormats;
import org.spanlift.cli.options.OptionNumber;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.options.OutputTarget;
import org.spanlift.cli.options.UnitsOption;
import org.spanlift.cli.output.Csv;
import org.spanlift.cli.output.DisplayUnits;
import org.spanlift.cli.output.Json;
import org.spanlift.cli.output.TextTable;
import org.spanlift.cli.output.Results;
import org.spanlift.flight.FlightCondition;
import org.spanlift.flight.FlightPoint;
import org.spanlift.flight.ReynoldsRule;
import org.spanlift.input.RefusedException;
import org.spanlift.vocabulary.Need;
import org.spanlift.vocabulary.ResultKey;
import org.spanlift.vocabulary.SurfaceResult;
import org.spanlift.vocabulary.Vocabulary;
import org.spanlift.vocabulary.WingResult;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.io.WingFileReader;
import org.spanlift.results.Coefficients;
import org.spanlift.results.ProfileDrag;
import org.spanlift.results.Solution;
import org.spanlift.results.SpanLoad;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.CoupledLift;
import org.spanlift.stall.MaximumLift;
import org.spanlift.stall.MissingSectionDataException;
import org.spanlift.stall.StripLimits;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code spanlift solve}: coefficients and span loads of one wing over angles of attack or target CLs. */
@Command(name = "solve", mixinStandardHelpOptions = true,
        description = "Solve a wing over angles of attack: CL, induced drag, span efficiency, moments, span load.")
public final class SolveCommand implements Callable<Integer>, OffersFormats {

    /** The formats this command writes. */
    static final Set<Format> FORMATS = Collections.unmodifiableSet(EnumSet.of(Format.TABLE, Format.JSON, Format.CSV));

    @Parameters(index = "0", paramLabel = "FILE", description = "The wing file (.wing.yaml).")
    Path file;

    @Option(names = {"-a", "--alpha"}, paramLabel = "LIST", defaultValue = "-4:12:2",
            description = "Angles of attack in degrees: a list 0,2,4 or a range from:to:step. Default: "
                    + "${DEFAULT-VALUE}.")
    String alpha;

    @Option(names = "--cl", paramLabel = "LIST", split = ",",
            description = "Solve at these wing lift coefficients (alpha from the lift line), such as 0.3,0.5. "
                    + "Without --alpha, only these.")
    List<String> targetLift = List.of();

    @Option(names = "--through-stall",
            description = "Couple the lattice with the sections' lift curves (or curves built from their cl-max) "
                    + "and give the lift through the stall, the linear CL beside it; without --alpha, from -4 "
                    + "degrees to 4 degrees past the maximum lift.")
    boolean throughStall;

    @Mixin
    ClMaxOptions clMax;

    @Option(names = "--span-load", paramLabel = "FILE.csv",
            description = "Also write the per-strip span load of every point to this CSV file (SI units).")
    Path spanLoadFile;

    /** The wing-level keys of the JSON output, in its order. */
    private static final List<ResultKey<WingResult>> WING_KEYS = Vocabulary.select(Vocabulary.WING,
            "reference.area", "reference.span", "reference.chord", "reference.aspect_ratio", "lattice.panels",
            "lattice.strips", "lattice.unknowns", "lift_slope_per_rad", "lift_slope_per_deg", "zero_lift_angle_deg");

    /** The point keys of the table, in its order. */
    private static final List<ResultKey<FlightPoint>> TABLE_KEYS = Vocabulary.select(Vocabulary.POINT,
            "alpha_deg", "CL", "CDi", "e", "Cm", "C_roll", "CD", "L_D");

    @Mixin
    OutputOptions output;

    @Mixin
    FlightOptions flight;

    @Mixin
    UnitsOption units;

    @Spec
    CommandSpec spec;

    /**
     * The lift through the stall at the asked angles, or from -4 degrees to 4 degrees past the maximum in
     * whole degrees: the coupled solutions found on the path of a slowly rising angle, each with the share
     * of the span past its section peak, and the angles with none.
     */
    record ThroughStall(CoupledLift lift, MaximumLift maximum, List<Solution> solutions, List<Double> stalled,
            List<Double> missingDeg) {

        static ThroughStall of(Path file, WingAnalysis analysis, double[] deflections, OptionalDouble assumed,
                List<Double> alphasDeg, OptionalDouble eas, AtmosphereState atmosphere) {
            StripLimits limits;
            try {
                limits = StripLimits.of(analysis.wing(), analysis.lattice(), deflections, assumed);
            } catch (MissingSectionDataException e) {
                throw new InputException(file.toString(), 0, "sections", e.getMessage());
            }
            double rePerMetre = eas.isPresent() ? Airspeed.trueFromEquivalent(eas.getAsDouble(), atmosphere)
                    / atmosphere.kinematicViscosity() : 0;
            CoupledLift lift = CoupledLift.of(analysis, deflections, limits, rePerMetre);
            MaximumLift maximum = lift.maximum();
            List<Double> asked = alphasDeg;
            if (asked.isEmpty()) {
                asked = new ArrayList<>();
                double top = Math.ceil(Math.toDegrees(maximum.alpha())) + 4;
                for (double a = -4; a <= top; a++) {
                    asked.add(a);
                }
            }
            List<Solution> solutions = new ArrayList<>();
            List<Double> stalled = new ArrayList<>();
            List<Double> missing = new ArrayList<>();
            for (double a : asked) {
                Optional<CoupledLift.Point> p = lift.at(Math.toRadians(a));
                if (p.isPresent()) {
                    solutions.add(p.get().solution());
                    stalled.add(p.get().stalledSpanFraction());
                } else {
                    missing.add(a);
                }
            }
            return new ThroughStall(lift, maximum, solutions, stalled, missing);
        }
    }

    /** The level-flight (or load-factor n) point of a weight and speed. */
    record Level(FlightCondition condition, Solution solution) {
    }

    /**
     * What the flight options add to the coefficients: profile drag (at the Reynolds number per metre the
     * flight options give for each point's CL) and dimensional circulation.
     */
    record Dimensions(Wing wing, AtmosphereState atmosphere, OptionalDouble equivalentSpeed,
            ReynoldsRule reynolds) {

        /** The circulation scale: the true speed in m/s when given (circulation in m^2/s), else 1 (Gamma/V in m). */
        double circulationScale() {
            return equivalentSpeed.isPresent()
                    ? Airspeed.trueFromEquivalent(equivalentSpeed.getAsDouble(), atmosphere) : 1;
        }

        FlightPoint point(Solution s) {
            return FlightPoint.of(s, wing, reynolds);
        }
    }

    @Override
    public Integer call() {
        Format format = output.format(FORMATS);
        OutputTarget spanLoadTarget = output.check(InputFiles.wing(file),
                OutputOptions.also("--span-load", spanLoadFile))
                .get("--span-load");
        units.check(format);
        if (!spec.commandLine().getParseResult().hasMatchedOption("--weight")) {
            FlightOptions.refuse(spec, "the load factor sets the CL required by --weight at --speed; give --weight",
                    "--load-factor");
        }
        boolean alphaGiven = spec.commandLine().getParseResult().hasMatchedOption("--alpha");
        if (!throughStall) {
            FlightOptions.refuse(spec, "an assumed cl_max serves --through-stall only", "--assume-cl-max");
        } else if (!targetLift.isEmpty()) {
            throw new InputException("--cl", 0, "", "past the stall a CL is reached at two angles of attack; with "
                    + "--through-stall give angles with --alpha");
        }
        List<Double> alphas = targetLift.isEmpty() || alphaGiven ? AlphaList.parse(alpha) : List.of();
        Wing wing = WingFileReader.read(file);
        Map<String, Double> overrides = flight.deflections(wing);
        AtmosphereState atmosphere = flight.atmosphere();
        OptionalDouble eas = flight.equivalentSpeed(atmosphere);
        Optional<FlightCondition> condition = flight.condition();
        WingAnalysis analysis = LongSolveNotice.analyse(wing, spec.commandLine().getErr());
        double[] deflections = analysis.deflections(overrides);
        LiftCurve line = analysis.liftCurve(deflections);
        List<Solution> points = new ArrayList<>();
        Optional<ThroughStall> stall = Optional.empty();
        if (throughStall) {
            stall = Optional.of(ThroughStall.of(file, analysis, deflections, clMax.assumed(), alphaGiven ? alphas
                    : List.of(), eas, atmosphere));
            points.addAll(stall.get().solutions());
        }
        for (double a : throughStall ? List.<Double>of() : alphas) {
            points.add(analysis.solve(Math.toRadians(a), deflections));
        }
        for (String text : targetLift) {
            double cl = OptionNumber.parse("--cl", text);
            points.add(analysis.solve(alphaFor(line, cl, "--cl"), deflections));
        }
        Optional<Level> level = Optional.empty();
        if (condition.isPresent() && eas.isPresent()) {
            double cl = condition.get().requiredLiftCoefficient(wing.reference());
            level = Optional.of(new Level(condition.get(),
                    analysis.solve(alphaFor(line, cl, "--weight with --speed"), deflections)));
        }
        Dimensions dims = new Dimensions(wing, atmosphere, eas, flight.reynoldsRule(wing));
        String text = switch (format) {
            case JSON -> Json.write(json(wing, analysis, line, points, level, dims, stall));
            case CSV -> csv(points, dims, line, stall);
            default -> table(wing, analysis, line, points, level, dims, units.units(wing.displayUnit()), stall);
        };
        String loads = spanLoadFile == null ? null : spanLoadCsv(wing, points, dims);
        output.write(text, spec.commandLine().getOut());
        if (loads != null) {
            spanLoadTarget.write(loads.getBytes(StandardCharsets.UTF_8));
        }
        return 0;
    }

    private static double alphaFor(LiftCurve line, double cl, String option) {
        try {
            return line.alphaForTarget(cl);
        } catch (RefusedException e) {
            throw new InputException(option, 0, "", e.getMessage());
        }
    }

    private static Map<String, Object> json(Wing wing, WingAnalysis analysis, LiftCurve line,
            List<Solution> points, Optional<Level> level, Dimensions dims, Optional<ThroughStall> stall) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("name", wing.name());
        Map<String, Object> units = new LinkedHashMap<>();
        units.put("length", "m");
        units.put("area", "m^2");
        units.put("angle", "deg unless the key says rad");
        units.put("circulation", dims.equivalentSpeed().isPresent() ? "m^2/s (at the true speed)" : "m (Gamma/V)");
        units.put("speed", "m/s");
        units.put("altitude", "m, pressure altitude (geopotential, standard atmosphere)");
        root.put("units", units);
        Reference r = wing.reference();
        Results.put(root, WING_KEYS, new WingResult(analysis, line));
        @SuppressWarnings("unchecked")
        Map<String, Object> ref = (Map<String, Object>) root.get("reference");
        ref.put("moment_point", new double[] {r.momentPoint().x(), r.momentPoint().y(), r.momentPoint().z()});
        @SuppressWarnings("unchecked")
        Map<String, Object> lat = (Map<String, Object>) root.get("lattice");
        lat.put("solve", analysis.lattice().mirrored() ? "half span, symmetric and antisymmetric" : "full span");
        root.put("deflections_deg", deflectionsJson(wing, analysis.deflections(Map.of()), points));
        level.ifPresent(l -> {
            Map<String, Object> f = new LinkedHashMap<>();
            f.put("weight", l.condition().weight());
            f.put("load_factor", l.condition().loadFactor());
            f.put("pressure_altitude", dims.atmosphere().pressureAltitude());
            f.put("density", dims.atmosphere().density());
            f.put("speed_eas", dims.equivalentSpeed().getAsDouble());
            f.put("speed_tas", dims.circulationScale());
            f.put("CL_required", l.solution().coefficients().lift());
            f.put("alpha_required_deg", Math.toDegrees(l.solution().alpha()));
            f.put("point", pointJson(wing, l.solution(), dims));
            root.put("flight", f);
        });
        List<Object> list = new ArrayList<>();
        for (int i = 0; i < points.size(); i++) {
            Map<String, Object> p = pointJson(wing, points.get(i), dims);
            if (stall.isPresent()) {
                p.put("CL_linear", line.lift(points.get(i).alpha()));
                p.put("stalled_span_fraction", stall.get().stalled().get(i));
            }
            list.add(p);
        }
        root.put("points", list);
        stall.ifPresent(st -> {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("method", "lattice coupled with the section lift curves; points on the path of a slowly rising "
                    + "angle of attack");
            Results.put(m, Vocabulary.MAX_LIFT.stream().filter(k -> !k.needs(Need.WEIGHT)).toList(), st.maximum());
            m.put("alpha_without_solution_deg", st.missingDeg());
            root.put("through_stall", m);
        });
        return root;
    }

    private static Map<String, Object> pointJson(Wing wing, Solution s, Dimensions dims) {
        FlightPoint point = dims.point(s);
        Map<String, Object> p = new LinkedHashMap<>();
        Results.put(p, pointKeys(point), point);
        p.put("span_load", spanLoadJson(s.spanLoad(0), dims.circulationScale()));
        if (wing.surfaces().size() > 1) {
            List<Object> surfaces = new ArrayList<>();
            for (int k = 0; k < wing.surfaces().size(); k++) {
                Map<String, Object> one = new LinkedHashMap<>();
                Results.put(one, Vocabulary.SURFACE, SurfaceResult.of(wing.surfaces().get(k), s, k));
                one.put("span_load", spanLoadJson(s.spanLoad(k), dims.circulationScale()));
                surfaces.add(one);
            }
            p.put("surfaces", surfaces);
        }
        return p;
    }

    /** The point keys that apply: the profile-drag ones only where the sections give polars. */
    private static List<ResultKey<FlightPoint>> pointKeys(FlightPoint point) {
        return Vocabulary.POINT.stream().filter(k -> point.profileDrag().isPresent() || !k.needs(Need.POLARS))
                .toList();
    }

    private static Map<String, Object> deflectionsJson(Wing wing, double[] fileDeflections, List<Solution> points) {
        Map<String, Object> d = new LinkedHashMap<>();
        List<ControlSurface> controls = wing.controls();
        for (int i = 0; i < controls.size(); i++) {
            d.put(controls.get(i).name(),
                    Math.toDegrees(points.isEmpty() ? fileDeflections[i] : points.get(0).deflection(i)));
        }
        return d;
    }

    private static Map<String, Object> spanLoadJson(SpanLoad l, double circulationScale) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("y", l.y());
        m.put("chord", l.chord());
        m.put("cl", l.cl());
        m.put("cl_c", l.clc());
        double[] gamma = l.circulation();
        double[] deg = l.inducedAngle();
        for (int i = 0; i < deg.length; i++) {
            gamma[i] *= circulationScale;
            deg[i] = Math.toDegrees(deg[i]);
        }
        m.put("circulation", gamma);
        m.put("induced_angle_deg", deg);
        return m;
    }

    private static String csv(List<Solution> points, Dimensions dims, LiftCurve line, Optional<ThroughStall> stall) {
        boolean drag = ProfileDrag.available(dims.wing());
        List<ResultKey<FlightPoint>> keys = Vocabulary.POINT.stream().filter(k -> drag || !k.needs(Need.POLARS))
                .toList();
        List<String> header = new ArrayList<>(Vocabulary.names(keys));
        if (stall.isPresent()) {
            header.addAll(List.of("CL_linear", "stalled_span_fraction"));
        }
        Csv csv = new Csv(header);
        for (int i = 0; i < points.size(); i++) {
            FlightPoint point = dims.point(points.get(i));
            List<Object> row = new ArrayList<>(keys.stream().map(k -> k.of(point)).toList());
            if (stall.isPresent()) {
                row.add(line.lift(points.get(i).alpha()));
                row.add(stall.get().stalled().get(i));
            }
            csv.row(row.toArray());
        }
        return csv.toString();
    }

    private static String spanLoadCsv(Wing wing, List<Solution> points, Dimensions dims) {
        String gammaColumn = dims.equivalentSpeed().isPresent() ? "circulation_m2_s" : "circulation_m";
        Csv csv = new Csv(List.of("alpha_deg", "surface", "y_m", "chord_m", "cl", "cl_c_m", gammaColumn,
                "induced_angle_deg"));
        for (Solution s : points) {
            for (int k = 0; k < wing.surfaces().size(); k++) {
                SpanLoad l = s.spanLoad(k);
                double[] y = l.y();
                double[] chord = l.chord();
                double[] cl = l.cl();
                double[] clc = l.clc();
                double[] gamma = l.circulation();
                double[] induced = l.inducedAngle();
                for (int i = 0; i < l.size(); i++) {
                    csv.row(Math.toDegrees(s.alpha()), wing.surfaces().get(k).name(), y[i], chord[i], cl[i], clc[i],
                            gamma[i] * dims.circulationScale(), Math.toDegrees(induced[i]));
                }
            }
        }
        return csv.toString();
    }

    private static String table(Wing wing, WingAnalysis analysis, LiftCurve line, List<Solution> points,
            Optional<Level> level, Dimensions dims, DisplayUnits unit, Optional<ThroughStall> stall) {
        String u = unit.length().symbol();
        double k = unit.length().metres();
        Reference r = wing.reference();
        StringBuilder b = new StringBuilder();
        b.append(wing.name()).append('\n');
        b.append(String.format(Locale.ROOT, "  reference    area %.3f %s^2, span %.3f %s, chord %.3f %s, aspect ratio "
                + "%.3f%n",
                r.area() / (k * k), u, r.span() / k, u, r.chord() / k, u, r.aspectRatio()));
        b.append(String.format(Locale.ROOT, "  moments about (%.3f, %.3f, %.3f) %s%n",
                r.momentPoint().x() / k, r.momentPoint().y() / k, r.momentPoint().z() / k, u));
        int panels = analysis.lattice().panelCount();
        boolean mirrored = analysis.lattice().mirrored();
        b.append(String.format(Locale.ROOT, "  lattice      %d panels in %d strips, %d unknowns (%s)%n", panels,
                analysis.lattice().strips().size(), mirrored ? analysis.lattice().halfCount() : panels,
                mirrored ? "half-span symmetric solve" : "full-span solve"));
        b.append(String.format(Locale.ROOT,
                "  lift slope   %.4f per rad (%.5f per deg) at zero lift; zero-lift angle %.3f deg%n", line.slope(),
                line.slope() * Math.PI / 180, Math.toDegrees(line.zeroLiftAngle())));
        if (!wing.controls().isEmpty()) {
            List<String> d = new ArrayList<>();
            double[] shown = points.isEmpty() ? analysis.fileDeflections() : null;
            List<ControlSurface> controls = wing.controls();
            for (int i = 0; i < controls.size(); i++) {
                double deg = Math.toDegrees(shown != null ? shown[i] : points.get(0).deflection(i));
                d.add(controls.get(i).name() + " " + TextTable.fixed(deg, 1) + " deg");
            }
            b.append("  controls     ").append(String.join(", ", d)).append(" (trailing edge down; aileron: right "
                    + "side)\n");
        }
        level.ifPresent(l -> b.append(String.format(Locale.ROOT,
                "  flight       weight %s, n = %.2f, %s EAS (%s TAS) at %s pressure altitude:%n"
                        + "               CL required %.4f at alpha %.2f deg%n",
                unit.force(l.condition().weight()), l.condition().loadFactor(),
                unit.speed(dims.equivalentSpeed().getAsDouble()), unit.speed(dims.circulationScale()),
                unit.altitude(dims.atmosphere().pressureAltitude()), l.solution().coefficients().lift(),
                Math.toDegrees(l.solution().alpha()))));
        b.append('\n');
        boolean drag = ProfileDrag.available(wing);
        List<ResultKey<FlightPoint>> keys = TABLE_KEYS.stream().filter(key -> drag || !key.needs(Need.POLARS)).toList();
        List<String> headers = new ArrayList<>(keys.stream().map(key -> Results.label(key, unit)).toList());
        boolean several = wing.surfaces().size() > 1;
        if (stall.isPresent()) {
            headers.addAll(List.of("CL linear", "past peak"));
        }
        TextTable t = new TextTable(headers);
        for (int i = 0; i < points.size(); i++) {
            Solution s = points.get(i);
            FlightPoint point = dims.point(s);
            List<String> row = new ArrayList<>(keys.stream().map(key -> Results.cell(key, point, unit)).toList());
            if (stall.isPresent()) {
                row.add(TextTable.fixed(line.lift(s.alpha()), 4));
                row.add(TextTable.fixed(stall.get().stalled().get(i), 2));
            }
            t.row(row);
        }
        if (stall.isPresent()) {
            MaximumLift m = stall.get().maximum();
            b.append(TextTable.wrap(String.format(Locale.ROOT, "Through the stall: the lattice coupled with the "
                    + "section lift curves (%s). Maximum %s %.4f at alpha %.2f deg, %s; %.0f%% of the span past "
                    + "its section peak there. \"past peak\" is the share of the span past its section peak; "
                    + "\"CL linear\" is linear theory's CL.", m.synthetic() ? "some built from cl-max, synthetic"
                            : "measured", wing.surfaces().size() > 1 ? "wing CL (the wing's own lift; the other "
                                    + "surfaces stay linear)" : "CL", m.lift(), Math.toDegrees(m.alpha()),
                    m.peak() ? "where the lift rounds over"
                            : "where the lift breaks off or the traced curve ends ("
                                    + m.end().name().toLowerCase(Locale.ROOT).replace('_', '-') + ")",
                    100 * m.stalledSpanFraction()))).append("\n\n");
        }
        b.append(t.render());
        if (several) {
            b.append('\n').append(surfaceTable(wing, points, unit));
        }
        stall.filter(st -> !st.missingDeg().isEmpty()).ifPresent(st -> b.append(TextTable.wrap(String.format(
                Locale.ROOT, "No solution on the path of a rising angle of attack at %s deg: beyond the traced "
                        + "curve, or where the lift depends on how the angle was reached.", st.missingDeg().stream()
                                .map(a -> TextTable.fixed(a, 1)).collect(java.util.stream.Collectors.joining(", ")))))
                .append('\n'));
        if (several) {
            b.append("\n  CL, CDi and Cm are the whole configuration's; \"each surface\" gives every surface's share "
                    + "on the\n"
                    + "  reference area and chord (the shares add up to the whole).\n");
        }
        b.append("\n  e is shown only where |CL| >= 0.05. CDi from the Trefftz plane. Cm positive nose-up; C_roll\n"
                + "  positive right wing down, on the reference span. Use --format json for span loads.\n");
        if (drag) {
            b.append("  CD adds the sections' profile drag (strip integration of their polars) to CDi.\n");
        }
        return b.toString();
    }

    /** Each surface's share of every point: CL, CDi and Cm on the reference area and chord. */
    private static String surfaceTable(Wing wing, List<Solution> points, DisplayUnits unit) {
        ResultKey<FlightPoint> alphaKey = Vocabulary.find(Vocabulary.POINT, "alpha_deg");
        List<String> headers = new ArrayList<>(List.of(Results.label(alphaKey, unit)));
        Vocabulary.SURFACE.forEach(key -> headers.add(Results.label(key, unit)));
        TextTable t = new TextTable(headers);
        for (Solution s : points) {
            for (int k = 0; k < wing.surfaces().size(); k++) {
                SurfaceResult share = SurfaceResult.of(wing.surfaces().get(k), s, k);
                List<String> row = new ArrayList<>(List.of(Results.cellOf(alphaKey, Math.toDegrees(s.alpha()), unit)));
                Vocabulary.SURFACE.forEach(key -> row.add(Results.cell(key, share, unit)));
                t.row(row);
            }
        }
        return "  each surface\n" + t.render();
    }

    @Override
    public Set<Format> formats() {
        return FORMATS;
    }
}
