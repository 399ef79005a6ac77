package org.spanlift.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
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
import org.spanlift.cli.options.OptionNumber;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.options.UnitsOption;
import org.spanlift.cli.output.Cautions;
import org.spanlift.cli.output.Csv;
import org.spanlift.cli.output.DisplayUnits;
import org.spanlift.cli.output.Json;
import org.spanlift.cli.output.Results;
import org.spanlift.cli.output.TextTable;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.io.WingFileReader;
import org.spanlift.input.quantity.PhysicalRange;
import org.spanlift.input.quantity.QuantityFormatException;
import org.spanlift.io.CasesReader;
import org.spanlift.loads.Envelope;
import org.spanlift.io.EnvelopeReader;
import org.spanlift.structure.EnvelopeSpec;
import org.spanlift.loads.Governing;
import org.spanlift.structure.LoadCase;
import org.spanlift.loads.LoadsAnalysis;
import org.spanlift.structure.PointMass;
import org.spanlift.loads.SpanwiseLoads;
import org.spanlift.io.StructureReader;
import org.spanlift.structure.WingStructure;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.MissingSectionDataException;
import org.spanlift.stall.StallAnalysis;
import org.spanlift.stall.StallEstimate;
import org.spanlift.stall.StripLimits;
import org.spanlift.vocabulary.ResultKey;
import org.spanlift.vocabulary.ResultUnit;
import org.spanlift.vocabulary.Vocabulary;
import org.spanlift.vocabulary.WingResult;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code spanlift loads}: spanwise shear, bending and torsion of the half-wing for spar sizing. */
@Command(name = "loads", mixinStandardHelpOptions = true,
        description = "Spanwise shear, bending and torsion of the half-wing (air load less inertia relief) for one "
                + "load case, a cases file or the corner points of a manoeuvre and gust envelope; the governing "
                + "case at each station.")
public final class LoadsCommand implements Callable<Integer>, OffersFormats {

    /** The formats this command writes. */
    static final Set<Format> FORMATS = Collections.unmodifiableSet(EnumSet.of(Format.TABLE, Format.JSON, Format.CSV));

    /** Linear theory carries any CL: the user must check the cases against the wing's maximum lift. */
    static final String STALL_CHECK = "Each case's wing CL is checked against the stall onset (critical-section "
            + "estimate at the case's Reynolds number, positive load factors); a case beyond it cannot be flown at "
            + "that speed and is refused unless --beyond-stall is given, then flagged.";

    static final String DEFINITION = "The load factor is the aerodynamic force normal to the airplane's longitudinal "
            + "axis over the weight (14 CFR 23.321(a), text before the 2017 rewrite): each case is solved for "
            + "CN = CL cos(a) + CD sin(a) = n W / (q S), a the angle of attack of that axis, and the inertia relief "
            + "acts along the normal axis. The air load includes the induced drag (Trefftz plane, per strip) and, "
            + "where every section gives a polar, the profile drag, resolved in the beam axes.";

    static final String NO_TAIL = "The tail's load is not included: the wing carries n W alone (a balancing tail's "
            + "download would add to it).";

    static final String ENVELOPE_NOTE = "The envelope's corner points are an aid to exploring loads, not a statement "
            + "of compliance with any airworthiness standard.";

    static final String GUST_FORMULA = "n = 1 +/- K_g rho0 U_de V a / (2 W/S), K_g = 0.88 mu_g / (5.3 + mu_g), "
            + "mu_g = 2 (W/S) / (rho c a g): the gust load factor formula of 14 CFR Part 23, 23.341(c) (pre-2017 "
            + "text) and EASA CS-23.341 (after Pratt, NACA TN 2964)";

    static final Map<String, String> SIGNS = signs();



    @Parameters(index = "0", paramLabel = "FILE", description = "The wing file (.wing.yaml), with its structure "
            + "section.")
    Path file;

    @Option(names = "--cases", paramLabel = "FILE", description = "A cases file (.cases.yaml): load cases, each with "
            + "weight, load-factor and speed (equivalent airspeed), altitude optional.")
    Path casesFile;

    @Option(names = "--envelope", paramLabel = "FILE", description = "An envelope file (.envelope.yaml): limit load "
            + "factors, design speeds and gust velocities; its corner points become the load cases.")
    Path envelopeFile;

    @Option(names = "--wing-mass", paramLabel = "M", description = "The whole wing's mass (both halves) with a unit "
            + "(95kg, 210lb), spread over each half in proportion to local chord; replaces the file's mass or "
            + "mass-table.")
    String wingMass;

    @Option(names = "--safety-factor", paramLabel = "F", description = "Multiply the limit loads by F (such as 1.5) "
            + "to give ultimate loads, and say so. Default: none (limit loads).")
    String safetyFactorText;

    /** The safety factor asked for, read from {@link #safetyFactorText}, or null. */
    private Double safetyFactor;

    @Mixin
    OutputOptions output;

    @Mixin
    FlightOptions flight;

    @Mixin
    UnitsOption units;

    @Spec
    CommandSpec spec;

    @Option(names = "--beyond-stall", description = "Compute load cases whose wing CL lies above the stall onset "
            + "(critical-section estimate) instead of refusing them; they are flagged in the output.")
    boolean beyondStallAllowed;

    @Mixin
    ClMaxOptions clMax;

    /** The load case of --weight, --load-factor and --speed, when given that way. */
    private LoadCase commandLineCase;

    /** Each case's stall-onset CL at its Reynolds number, where the sections give cl_max. */
    private final List<OptionalDouble> onsets = new ArrayList<>();

    /** Why the cases are not checked against the stall, or null when they are. */
    private String stallNote;

    /** True when case i needs more lift than the wing's stall onset gives (positive load factors only). */
    private boolean beyondStall(int i, List<SpanwiseLoads> results) {
        OptionalDouble onset = onsets.get(i);
        SpanwiseLoads l = results.get(i);
        return onset.isPresent() && LoadsAnalysis.beyondStall(l, onset.getAsDouble());
    }

    /** Where the cases came from, for messages. */
    private String caseSource() {
        return casesFile != null ? casesFile.toString() : envelopeFile != null ? envelopeFile.toString() : "loads";
    }

    @Override
    public Integer call() {
        Format format = output.format(FORMATS);
        List<Path> inputs = new ArrayList<>(InputFiles.wing(file));
        inputs.addAll(Arrays.asList(casesFile, envelopeFile));
        inputs.removeIf(Objects::isNull);
        output.check(inputs);
        units.check(format);
        FlightOptions.refuse(spec, "load cases are at equivalent airspeeds on a standard day, where the loads do "
                + "not depend on the temperature", "--isa-offset");
        safetyFactor = safetyFactorText == null ? null : OptionNumber.parse("--safety-factor", safetyFactorText);
        if (safetyFactor != null && !(safetyFactor >= 1 && safetyFactor <= 3)) {
            throw new InputException("--safety-factor", 0, "", "expected a factor from 1 to 3, got "
                    + safetyFactorText.strip());
        }
        Wing wing = WingFileReader.read(file);
        if (!wing.main().mirrored()) {
            throw new InputException(file.toString(), 0, "surfaces[0].mirror",
                    "loads are computed per half-wing: the first surface must be mirrored");
        }
        WingStructure structure = StructureReader.read(file, wing);
        if (wingMass != null) {
            double m;
            try {
                m = PhysicalRange.MASS.parse(wingMass);
            } catch (QuantityFormatException e) {
                throw new InputException("--wing-mass", 0, "", e.getMessage());
            }
            structure = structure.withWingMass(m);
        }
        WingAnalysis analysis = LongSolveNotice.analyse(wing, spec.commandLine().getErr());
        double[] deflections = analysis.deflections(flight.deflections(wing));
        LoadsAnalysis loads = LoadsAnalysis.of(analysis, structure, deflections);

        Optional<StripLimits> limits;
        try {
            limits = Optional.of(StripLimits.of(wing, analysis.lattice(), deflections, clMax.assumed()));
        } catch (MissingSectionDataException e) {
            limits = Optional.empty();
            stallNote = "The cases are not checked against the wing's stall: " + e.getMessage() + ".";
        }
        List<Envelope.Point> envelope = null;
        List<LoadCase> cases;
        AtmosphereState atmosphere = flight.atmosphere();
        OptionalDouble weight = flight.weightNewtons();
        OptionalDouble speed = flight.equivalentSpeed(atmosphere);
        int sources = (weight.isPresent() || speed.isPresent() ? 1 : 0) + (casesFile != null ? 1 : 0)
                + (envelopeFile != null ? 1 : 0);
        if (sources != 1) {
            throw new InputException("loads", 0, "", sources == 0
                    ? "give the load cases: --weight W --load-factor N --speed V, or --cases FILE, or --envelope FILE"
                    : "give only one of: --weight/--speed, --cases FILE, --envelope FILE");
        }
        if (casesFile != null) {
            cases = CasesReader.read(casesFile);
        } else if (envelopeFile != null) {
            EnvelopeSpec es = EnvelopeReader.read(envelopeFile);
            double area = wing.reference().area();
            OptionalDouble maxNormal = OptionalDouble.empty();
            if (limits.isPresent()) {
                // the stall line at the onset of VA's Reynolds number (the first weight's)
                double re = new LoadCase("VA", es.weights().get(0), 1, es.va(), es.altitude(), "").reynoldsPerMetre();
                StallEstimate onset = StallAnalysis.estimate(analysis, deflections, limits.get(), re);
                maxNormal = OptionalDouble.of(loads.normalCoefficient(onset.alpha(), re));
            }
            envelope = Envelope.points(es, area, area / wing.reference().span(), loads.liftCurve().slope(), maxNormal);
            cases = envelope.stream().map(Envelope.Point::loadCase).toList();
        } else {
            if (weight.isEmpty()) {
                throw new InputException("--weight", 0, "", "a load case needs the weight (such as 1100kg)");
            }
            if (speed.isEmpty()) {
                throw new InputException("--speed", 0, "", "a load case needs the equivalent airspeed (such as 105kt)");
            }
            double n = flight.loadFactor();
            commandLineCase = new LoadCase(String.format(Locale.ROOT, "n %.2f at %.1f m/s EAS", n, speed.getAsDouble()),
                    weight.getAsDouble(), n, speed.getAsDouble(), atmosphere.pressureAltitude(), "given");
            cases = List.of(commandLineCase);
        }
        List<SpanwiseLoads> results = new ArrayList<>();
        double f = safetyFactor == null ? 1 : safetyFactor;
        for (SpanwiseLoads l : loads.loads(cases)) {
            results.add(f == 1 ? l : l.scaled(f));
            onsets.add(limits.isPresent() ? OptionalDouble.of(loads.stallOnsetLift(l.loadCase(), limits.get()))
                    : OptionalDouble.empty());
        }
        for (int i = 0; i < results.size(); i++) {
            if (beyondStall(i, results) && !beyondStallAllowed) {
                SpanwiseLoads l = results.get(i);
                throw new InputException(caseSource(), 0, l.loadCase().name(), String.format(Locale.ROOT,
                        "the case needs a wing CL of %.3f, above the wing's stall-onset CL %.3f at its "
                                + "Reynolds number: "
                                + "it cannot be flown at that speed; lower the load factor or raise the speed, or give "
                                + "--beyond-stall to compute it anyway (flagged)", l.liftCoefficient(),
                        onsets.get(i).getAsDouble()));
            }
        }
        Governing governing = Governing.of(results);
        String text = switch (format) {
            case JSON -> Json.write(json(wing, loads, results, governing, envelope));
            case CSV -> csv(results);
            default -> table(wing, loads, results, governing, envelope, units.units(wing.displayUnit()));
        };
        output.write(text, spec.commandLine().getOut());
        return 0;
    }

    private String factorNote() {
        return safetyFactor == null ? "limit loads: no safety factor applied"
                : String.format(Locale.ROOT, "ultimate loads: limit loads times the safety factor %.2f "
                        + "(--safety-factor)",
                        safetyFactor);
    }

    private static Map<String, String> signs() {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("station", "values at y are the resultant of everything outboard of y (air load and inertia), on the "
                + "right half; the left half is its mirror image");
        m.put("axes", "e_s along the spar line, outboard; n normal to the wing plane, up; e_t = e_s x n, in the wing "
                + "plane, aft");
        m.put("shear", "force along n, positive up");
        m.put("bending", "moment about the spar point along e_t, positive up-bending (outboard load up)");
        m.put("torsion", "moment along e_s, positive nose-up");
        m.put("chord_shear", "force along e_t, positive aft");
        m.put("chord_bending", "in-plane moment, positive for an aft load outboard");
        return m;
    }

    private Map<String, Object> json(Wing wing, LoadsAnalysis loads, List<SpanwiseLoads> results, Governing g,
            List<Envelope.Point> envelope) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("name", wing.name());
        Map<String, Object> units = new LinkedHashMap<>();
        units.put("length", "m");
        units.put("force", "N");
        units.put("moment", "N m");
        units.put("mass", "kg");
        units.put("speed", "m/s, equivalent airspeed");
        units.put("pressure", "Pa");
        units.put("altitude", "m, pressure altitude (geopotential, standard atmosphere)");
        root.put("units", units);
        root.put("caution", Cautions.LOADS);
        root.put("load_factor_definition", DEFINITION);
        root.put("longitudinal_axis_deg", Math.toDegrees(loads.axisAngle()));
        root.put("longitudinal_axis",
                loads.structure().longitudinalAxis().isPresent() ? "given in the structure section"
                        : "the wing's root chord line");
        root.put("tail", NO_TAIL);
        root.put("stall_check", stallNote == null ? STALL_CHECK : stallNote);
        root.put("safety_factor", safetyFactor);
        root.put("loads_are", factorNote());
        root.put("sign_conventions", SIGNS);
        WingStructure st = loads.structure();
        Map<String, Object> s = new LinkedHashMap<>();
        s.put("spar_chord_fraction", st.sparFraction());
        s.put("mass_centre_chord_fraction", st.massCentreFraction());
        s.put("distributed_mass_per_half", loads.distributedHalfMass());
        s.put("distribution", st.table().isPresent() ? "mass table" : "in proportion to chord");
        List<Object> pm = new ArrayList<>();
        for (PointMass p : st.pointMasses()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("name", p.name());
            m.put("mass_per_side", p.mass());
            m.put("x", p.x());
            m.put("y", p.y());
            pm.add(m);
        }
        s.put("point_masses", pm);
        s.put("half_wing_mass", loads.halfWingMass());
        root.put("structure", s);
        Results.put(root, Vocabulary.select(Vocabulary.WING, "reference.area", "reference.span"),
                new WingResult(loads.analysis(), loads.liftCurve()));
        List<Object> cs = new ArrayList<>();
        for (SpanwiseLoads l : results) {
            LoadCase c = l.loadCase();
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("name", c.name());
            m.put("side", l.side().name().toLowerCase(Locale.ROOT));
            m.put("origin", c.origin());
            m.put("weight", c.weight());
            m.put("load_factor", c.loadFactor());
            m.put("speed", c.equivalentSpeed());
            m.put("altitude", c.altitude());
            Results.put(m, Vocabulary.select(Vocabulary.LOADS, "dynamic_pressure", "CN", "CL", "CD", "CC", "alpha_deg"),
                    l);
            int index = results.indexOf(l);
            m.put("stall_onset_CL", onsets.get(index).isPresent() ? (Object) onsets.get(index).getAsDouble() : null);
            m.put("beyond_stall", onsets.get(index).isPresent() ? (Object) beyondStall(index, results) : null);
            m.put("y", l.y());
            m.put("shear", l.shear());
            m.put("bending", l.bending());
            m.put("torsion", l.torsion());
            m.put("chord_shear", l.chordShear());
            m.put("chord_bending", l.chordBending());
            Results.put(m, Vocabulary.select(Vocabulary.LOADS, "root.shear", "root.bending", "root.torsion",
                    "root.chord_shear", "root.chord_bending", "root.normal_load"), l);
            cs.add(m);
        }
        root.put("cases", cs);
        Map<String, Object> gov = new LinkedHashMap<>();
        gov.put("y", g.y());
        gov.put("shear", extremes(g.shear()));
        gov.put("bending", extremes(g.bending()));
        gov.put("torsion", extremes(g.torsion()));
        root.put("governing", gov);
        if (envelope != null) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("note", ENVELOPE_NOTE);
            e.put("gust_formula", GUST_FORMULA);
            e.put("lift_slope_per_rad_of_wing", loads.liftCurve().slope());
            List<Object> pts = new ArrayList<>();
            for (Envelope.Point p : envelope) {
                Map<String, Object> m = new LinkedHashMap<>();
                m.put("name", p.loadCase().name());
                m.put("kind", p.kind());
                m.put("speed", p.loadCase().equivalentSpeed());
                m.put("load_factor", p.loadCase().loadFactor());
                m.put("mass_ratio", Double.isNaN(p.massRatio()) ? null : p.massRatio());
                m.put("gust_alleviation_factor", Double.isNaN(p.alleviation()) ? null : p.alleviation());
                pts.add(m);
            }
            e.put("points", pts);
            root.put("envelope", e);
        }
        return root;
    }

    private static Map<String, Object> extremes(Governing.Extremes e) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("max", e.max());
        m.put("max_case", Arrays.stream(e.maxCase()).boxed().toList());
        m.put("min", e.min());
        m.put("min_case", Arrays.stream(e.minCase()).boxed().toList());
        return m;
    }

    private String csv(List<SpanwiseLoads> results) {
        Csv c = new Csv(List.of("case", "name", "side", "load_factor", "speed_eas_m_s", "y_m", "shear_N", "bending_N_m",
                "torsion_N_m", "chord_shear_N", "chord_bending_N_m", "loads_are", "caution"));
        String caution = Cautions.LOADS + " " + NO_TAIL + " n is the aerodynamic force normal to the longitudinal axis "
                + "over the weight (14 CFR 23.321(a), pre-2017 text); see the table or JSON output for the axis.";
        for (int i = 0; i < results.size(); i++) {
            SpanwiseLoads l = results.get(i);
            double[] y = l.y();
            double[] shear = l.shear();
            double[] bending = l.bending();
            double[] torsion = l.torsion();
            double[] chordShear = l.chordShear();
            double[] chordBending = l.chordBending();
            for (int k = 0; k < l.stations(); k++) {
                c.row(i, l.loadCase().name(), l.side().name().toLowerCase(Locale.ROOT), l.loadCase().loadFactor(),
                        l.loadCase().equivalentSpeed(), y[k],
                        shear[k], bending[k], torsion[k], chordShear[k], chordBending[k], factorNote(), caution);
            }
        }
        return c.toString();
    }


    private String table(Wing wing, LoadsAnalysis loads, List<SpanwiseLoads> results, Governing g,
            List<Envelope.Point> envelope, DisplayUnits du) {
        String u = du.length().symbol();
        double k = du.length().metres();
        String m = du.massSymbol();
        WingStructure st = loads.structure();
        StringBuilder b = new StringBuilder(wing.name()).append('\n');
        b.append("  spanwise loads of the right half-wing; ").append(factorNote()).append('\n');
        b.append(String.format(Locale.ROOT, "  spar line at %.0f%% chord; half-wing mass %.2f %s (distributed "
                + "%.2f %s, %s, "
                + "centre at %.0f%% chord", 100 * st.sparFraction(), du.mass(loads.halfWingMass()), m,
                du.mass(loads.distributedHalfMass()), m, st.table().isPresent() ? "mass table" : "by chord",
                100 * st.massCentreFraction()));
        for (PointMass p : st.pointMasses()) {
            b.append(String.format(Locale.ROOT, "; %s %.2f %s at y %.3f %s", p.name(), du.mass(p.mass()), m, p.y() / k,
                    u));
        }
        b.append(")\n");
        if (!st.hasMass()) {
            b.append("  NOTE: no wing mass given: no inertia relief (larger loads in magnitude).\n");
        }
        b.append("  signs: shear up +, bending up-bending +, torsion nose-up + (about the spar line; see the "
                + "README)\n\n");
        List<ResultKey<SpanwiseLoads>> keys = Vocabulary.select(Vocabulary.LOADS, "CN", "CL", "alpha_deg", "root.shear",
                "root.bending", "root.torsion");
        List<String> header = new ArrayList<>(List.of("#", "case", "n", "EAS [kt]"));
        keys.forEach(key -> header.add(Results.label(key, du)));
        header.add(3 + 3, "onset CL");
        TextTable cases = new TextTable(header);
        boolean anyBeyond = false;
        for (int i = 0; i < results.size(); i++) {
            SpanwiseLoads l = results.get(i);
            List<String> row = new ArrayList<>(List.of(String.valueOf(i), caseName(l, envelope, du),
                    TextTable.fixed(l.loadCase().loadFactor(), 2),
                    TextTable.fixed(Airspeed.knots(l.loadCase().equivalentSpeed()), 1)));
            keys.forEach(key -> row.add(Results.cell(key, l, du)));
            boolean beyond = beyondStall(i, results);
            anyBeyond |= beyond;
            row.add(3 + 3, onsets.get(i).isPresent() ? TextTable.fixed(onsets.get(i).getAsDouble(), 3)
                    + (beyond ? " *" : "") : "-");
            cases.row(row);
        }
        b.append(cases.render());
        if (anyBeyond) {
            b.append("  * beyond the stall onset: computed because --beyond-stall was given; the wing cannot fly that "
                    + "case.\n");
        }
        b.append('\n');
        b.append("  governing case at each station: value (case #)\n");
        String f = du.symbol(ResultUnit.NEWTON);
        String mo = du.symbol(ResultUnit.NEWTON_METRE);
        TextTable t = new TextTable(List.of("y [" + u + "]", "shear max [" + f + "]", "shear min [" + f + "]",
                "bending max [" + mo + "]", "bending min [" + mo + "]", "torsion max [" + mo + "]",
                "torsion min [" + mo + "]"));
        ResultUnit[] kinds = {ResultUnit.NEWTON, ResultUnit.NEWTON, ResultUnit.NEWTON_METRE, ResultUnit.NEWTON_METRE,
            ResultUnit.NEWTON_METRE, ResultUnit.NEWTON_METRE};
        double[] gy = g.y();
        List<double[]> values = new ArrayList<>();
        List<int[]> which = new ArrayList<>();
        for (Governing.Extremes e : List.of(g.shear(), g.bending(), g.torsion())) {
            values.addAll(List.of(e.max(), e.min()));
            which.addAll(List.of(e.maxCase(), e.minCase()));
        }
        for (int s = 0; s < gy.length; s++) {
            List<String> row = new ArrayList<>(List.of(TextTable.fixed(gy[s] / k, 3)));
            for (int c = 0; c < values.size(); c++) {
                row.add(cell(du.convert(kinds[c], values.get(c)[s]), which.get(c)[s]));
            }
            t.row(row);
        }
        b.append(t.render());
        if (envelope != null) {
            b.append('\n').append(TextTable.wrap("Gust load factors: " + GUST_FORMULA + "; a = "
                    + String.format(Locale.ROOT, "%.3f", loads.liftCurve().slope())
                    + " per rad (the wing's own unless the "
                    + "envelope file gives lift-slope), c = S/b. " + ENVELOPE_NOTE)).append('\n');
        }
        b.append('\n').append(TextTable.wrap(stallNote == null ? STALL_CHECK : stallNote)).append('\n');
        b.append(TextTable.wrap(String.format(Locale.ROOT, "%s The longitudinal axis is %s, %.2f deg above the file's "
                + "x axis.", DEFINITION, loads.structure().longitudinalAxis().isPresent() ? "given in the structure "
                        + "section" : "the wing's root chord line", Math.toDegrees(loads.axisAngle())))).append('\n');
        b.append(TextTable.wrap(NO_TAIL)).append('\n');
        b.append('\n').append(TextTable.wrap(Cautions.LOADS)).append('\n');
        return b.toString();
    }

    /**
     * A case's name in the table's units: the command line's case and the envelope's points are named from their
     * values; a case from a cases file keeps its own name.
     */
    private String caseName(SpanwiseLoads l, List<Envelope.Point> envelope, DisplayUnits du) {
        String half = switch (l.side()) {
            case RIGHT -> " (right half)";
            case LEFT -> " (left half)";
            case BOTH -> "";
        };
        return caseName(l.loadCase(), envelope, du) + half;
    }

    private String caseName(LoadCase c, List<Envelope.Point> envelope, DisplayUnits du) {
        if (c == commandLineCase) {
            return String.format(Locale.ROOT, "n %.2f at %s EAS", c.loadFactor(), du.speed(c.equivalentSpeed()));
        }
        if (envelope != null) {
            for (Envelope.Point p : envelope) {
                if (p.loadCase() == c) {
                    return Double.isNaN(p.gustVelocity())
                            ? String.format(Locale.ROOT, "manoeuvre n %+.2f at %s, %s", c.loadFactor(), p.speedName(),
                                    du.force(c.weight()))
                            : String.format(Locale.ROOT, "%s gust %s at %s, n %+.2f, %s", c.loadFactor() >= 1 ? "up"
                                    : "down", gust(p.gustVelocity(), du), p.speedName(), c.loadFactor(),
                                    du.force(c.weight()));
                }
            }
        }
        return c.name();
    }

    /** A derived gust velocity as the standards give it: m/s, or ft/s in US units. */
    private static String gust(double metresPerSecond, DisplayUnits du) {
        return du.us() ? String.format(Locale.ROOT, "%.1f ft/s", metresPerSecond / LengthUnit.FT.metres())
                : String.format(Locale.ROOT, "%.2f m/s", metresPerSecond);
    }

    private static String cell(double v, int c) {
        return TextTable.fixed(v, 0) + " (" + c + ")";
    }

    @Override
    public Set<Format> formats() {
        return FORMATS;
    }
}
