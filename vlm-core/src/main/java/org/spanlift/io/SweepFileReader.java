package org.spanlift.io;

import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.HexFormat;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import org.spanlift.atmosphere.AtmosphereState;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.balance.CentreOfGravity;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;
import org.spanlift.input.Field;
import org.spanlift.input.InputException;
import org.spanlift.input.TextFile;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;
import org.spanlift.input.quantity.Decimal;
import org.spanlift.input.quantity.Quantity;
import org.spanlift.input.quantity.QuantityFormatException;
import org.spanlift.input.quantity.PhysicalRange;
import org.spanlift.input.quantity.QuantityKind;
import org.spanlift.lattice.LatticeBuilder;
import org.spanlift.sweep.Constraint;
import org.spanlift.sweep.Derivation;
import org.spanlift.sweep.Design;
import org.spanlift.sweep.Expression;
import org.spanlift.sweep.Parameter;
import org.spanlift.sweep.ParameterPath;
import org.spanlift.sweep.Ranking;
import org.spanlift.sweep.ResultColumn;
import org.spanlift.sweep.Sweep;
import org.spanlift.stall.MissingSectionDataException;
import org.spanlift.structure.LoadCase;
import org.spanlift.stall.StripLimits;

/**
 * Reads and checks a sweep file ({@code .sweep.yaml}) and its base wing file into a {@link Sweep}: the base
 * wing, the swept parameters, the design (full grid or Latin hypercube), the flight condition and points,
 * the result columns, constraints and ranking. Every problem is an {@link InputException} naming the file,
 * line and field.
 */
public final class SweepFileReader {

    /** The largest design run without {@code --force}. */
    public static final long MAX_CASES_WITHOUT_FORCE = 10_000_000L;

    static final Set<String> TOP_KEYS = Set.of("base", "parameters", "design", "flight", "points", "columns",
            "constraints", "rank", "assume-cl-max", "names", "constants", "derived", "load-case");
    static final Set<String> LOAD_CASE_KEYS = Set.of("speed", "load-factor");
    static final Set<String> RANGE_KEYS = Set.of("from", "to", "step");
    static final Set<String> DESIGN_KEYS = Set.of("kind", "cases", "seed");
    static final Set<String> FLIGHT_KEYS = Set.of("weight", "altitude", "isa-offset", "load-factor", "flaps", "cg");
    static final Set<String> POINT_KEYS = Set.of("alpha", "CL");
    static final Set<String> RANK_KEYS = Set.of("by", "order", "keep");

    /**
     * Bounds on the size of a range's from, to and step (each may also be 0): every value a wing file holds
     * lies well inside, and exact decimal arithmetic on them stays cheap.
     */
    static final double MIN_RANGE_MAGNITUDE = 1e-12;
    static final double MAX_RANGE_MAGNITUDE = 1e12;
    /** Most values one range may give (far more than any sweep can run, with or without --force). */
    static final long MAX_RANGE_VALUES = 1_000_000_000L;
    /** Most angles or lift coefficients under points. */
    static final int MAX_POINTS = 100;
    /** Most entries under each of names, constants and derived. */
    static final int MAX_DERIVED_ENTRIES = 100;

    private SweepFileReader() {
    }

    /**
     * Reads and checks a sweep file and its base wing file.
     *
     * @param force allow designs of more than {@link #MAX_CASES_WITHOUT_FORCE} cases
     */
    public static Sweep read(Path path, boolean force) {
        String file = path.toString();
        String text = TextFile.read(path, "sweep file");
        Field root = new Field(file, "",
                YamlParser.parse(text, file, "a sweep description (base, parameters and columns)"));
        root.mapping();
        root.allowOnly(TOP_KEYS);

        Field baseField = root.required("base", "the base wing file, relative to the sweep file");
        String baseName = baseField.text();
        Path folder = path.toAbsolutePath().getParent();
        Path basePath;
        try {
            basePath = path.getParent() == null ? Path.of(baseName) : path.getParent().resolve(baseName);
        } catch (InvalidPathException e) {
            throw baseField.error("not a path this system accepts (" + e.getReason() + "); expected the base wing "
                    + "file, relative to the sweep file");
        }
        if (Files.exists(basePath) && !Files.isRegularFile(basePath)) {
            throw baseField.error("'" + Field.shown(baseName) + "' is not a regular file (a folder or a device); "
                    + "expected the "
                    + "base wing file, relative to the sweep file");
        }
        if (!Files.isRegularFile(basePath)) {
            throw baseField.error("no wing file '" + Field.shown(baseName) + "' beside the sweep file (in " + folder
                    + ")");
        }
        String baseText = TextFile.read(basePath, "wing file");
        YamlValue baseTree = YamlParser.parse(baseText, basePath.toString());
        Wing baseWing = WingFileReader.fromTree(baseTree, basePath.toString());
        List<String> controls = baseWing.controls().stream().map(ControlSurface::name).toList();

        Field paramsField = root.required("parameters", "a mapping from wing-file paths to values or ranges");
        List<Parameter> parameters = new ArrayList<>();
        for (Field p : paramsField.entries()) {
            parameters.add(parameter(p, baseTree));
        }
        if (parameters.isEmpty()) {
            throw paramsField.error("expected at least one parameter");
        }
        Derivation derivation = derivation(root, baseTree, parameters);

        Design design = design(root, paramsField, parameters, force);

        Optional<Field> flight = root.optional("flight");
        flight.ifPresent(f -> f.allowOnly(FLIGHT_KEYS));
        OptionalDouble weight = flight.flatMap(f -> f.optional("weight")).map(Field::weight)
                .map(OptionalDouble::of).orElse(OptionalDouble.empty());
        double altitude = flight.flatMap(f -> f.optional("altitude")).map(CasesReader::altitude).orElse(0.0);
        double isaOffset = flight.flatMap(f -> f.optional("isa-offset"))
                .map(f -> f.quantity(PhysicalRange.TEMPERATURE_OFFSET)).orElse(0.0);
        double loadFactor = flight.flatMap(f -> f.optional("load-factor")).map(f -> f.inRange(0.1, 15)).orElse(1.0);
        OptionalDouble flaps = flight.flatMap(f -> f.optional("flaps")).map(f -> OptionalDouble.of(f.inRange(-45, 45)))
                .orElse(OptionalDouble.empty());
        Optional<CentreOfGravity> cg = flight.flatMap(f -> f.optional("cg")).map(f -> {
            try {
                return CentreOfGravity.parse(f.text());
            } catch (QuantityFormatException e) {
                throw f.error(e.getMessage());
            }
        });
        Optional<FlightCondition> condition = Optional.empty();
        if (weight.isPresent()) {
            Field at = flight.orElseThrow();
            AtmosphereState atm;
            try {
                atm = StandardAtmosphere.at(altitude, isaOffset);
            } catch (IllegalArgumentException e) {
                throw at.optional("isa-offset").orElse(at).error(e.getMessage());
            }
            condition = Optional.of(new FlightCondition(weight.getAsDouble(), loadFactor, atm, OptionalDouble.empty()));
        }
        if (flaps.isPresent() && baseWing.controls().stream().noneMatch(c -> c.kind() == ControlKind.FLAP)) {
            throw flight.orElseThrow().required("flaps", "").error("the base wing has no control of kind flap");
        }

        List<Double> alphas = new ArrayList<>();
        List<Double> lifts = new ArrayList<>();
        root.optional("points").ifPresent(p -> {
            p.allowOnly(POINT_KEYS);
            if (p.mapping().entries().isEmpty()) {
                throw p.error("expected alpha or CL (a list or a range {from, to, step}), or leave points out");
            }
            p.optional("alpha").ifPresent(a -> alphas.addAll(numbers(a, -30, 30)));
            p.optional("CL").ifPresent(c -> lifts.addAll(numbers(c, -4, 4)));
        });

        Field columnsField = root.required("columns", "a list of result names, such as lift_slope_per_rad, "
                + "e@CL=0.5, stall.eta");
        Set<String> names = new LinkedHashSet<>();
        for (Field c : columnsField.items()) {
            String name = c.text().trim();
            List<String> expanded = new ArrayList<>();
            if (ResultColumn.isPointKey(name) && (!alphas.isEmpty() || !lifts.isEmpty())) {
                alphas.forEach(a -> expanded.add(name + "@alpha=" + Field.format(a)));
                lifts.forEach(l -> expanded.add(name + "@CL=" + Field.format(l)));
            } else {
                expanded.add(name);
            }
            for (String e : expanded) {
                column(c, e, controls);
                if (!names.add(e)) {
                    throw c.error("the column " + e + " is listed twice");
                }
            }
        }
        if (names.isEmpty()) {
            throw columnsField.error("expected at least one result column");
        }

        List<Constraint> constraints = new ArrayList<>();
        root.optional("constraints").ifPresent(cs -> {
            if (cs.items().isEmpty()) {
                throw cs.error("an empty list; expected at least one constraint, or leave constraints out");
            }
            for (Field c : cs.items()) {
                Constraint k;
                try {
                    k = Constraint.parse(c.text(), controls);
                } catch (Constraint.ConstraintException | ResultColumn.ColumnException e) {
                    throw c.error(e.getMessage());
                }
                constraints.add(k);
                names.addAll(k.columns());
            }
        });

        Ranking ranking = root.optional("rank").map(r -> {
            r.allowOnly(RANK_KEYS);
            Field by = r.required("by", "the column to rank by");
            column(by, by.text().trim(), controls);
            String order = r.optional("order").map(o -> o.choice(List.of("max", "min"))).orElse("max");
            int keep = r.optional("keep").map(k -> k.integer(1, Ranking.MAX_KEEP)).orElse(Ranking.DEFAULT_KEEP);
            return new Ranking(by.text().trim(), order.equals("max"), keep);
        }).orElse(null);
        if (ranking != null) {
            names.add(ranking.by());
        }

        OptionalDouble assume = root.optional("assume-cl-max").map(a -> {
            if (a.value() instanceof YamlValue.Scalar s && s.plain()
                    && (s.text().equalsIgnoreCase("true") || s.text().equalsIgnoreCase("false"))) {
                return a.bool() ? OptionalDouble.of(StripLimits.CONSERVATIVE_CL_MAX) : OptionalDouble.empty();
            }
            return OptionalDouble.of(a.inRange(0.3, 3));
        }).orElse(OptionalDouble.empty());

        List<ResultColumn> columns = new ArrayList<>();
        for (String n : names) {
            columns.add(ResultColumn.parse(n, controls));
        }
        boolean stall = columns.stream().anyMatch(ResultColumn::needsClMax);
        if (stall && condition.isEmpty() && columns.stream().anyMatch(ResultColumn::needsWeight)) {
            throw columnsField.error("stall_speed columns need a weight: add flight: {weight: ...} (such as 1100kg)");
        }
        if (cg.isEmpty() && columns.stream().anyMatch(ResultColumn::needsCentreOfGravity)) {
            throw columnsField.error("balance columns need a centre of gravity: add flight: {cg: ...} (such as 25%mac "
                    + "or 0.62m)");
        }
        if (columns.stream().anyMatch(ResultColumn::needsFlaps)
                && baseWing.controls().stream().noneMatch(c -> c.kind() == ControlKind.FLAP)) {
            throw columnsField.error("stall_flaps columns need a control of kind flap; the base wing has none");
        }
        if (stall && assume.isEmpty()) {
            requireClMax(columnsField, baseName, basePath, baseWing, baseTree, parameters, derivation, design);
        }
        if (stall && assume.isPresent() && !names.contains(ResultColumn.ASSUMED_CL_MAX)) {
            columns.add(ResultColumn.parse(ResultColumn.ASSUMED_CL_MAX, controls));
        }
        refuseColumnsNamedAsPaths(columnsField, names, parameters, derivation);
        Optional<LoadCase> loadCase = loadCase(root, columnsField, columns, condition, altitude, baseTree, baseWing);
        return new Sweep(file, baseName, basePath, baseTree, baseWing, parameters, derivation, design, columns,
                constraints,
                Optional.ofNullable(ranking), condition, flaps, assume, loadCase, cg, fingerprint(text, baseText));
    }


    private static Parameter parameter(Field p, YamlValue baseTree) {
        String pathText = p.path().substring("parameters.".length());
        String variable = isVariable(pathText) ? pathText : null;
        ParameterPath path = null;
        if (variable != null && Expression.FUNCTIONS.containsKey(variable)) {
            throw p.error(variable + " is a function of the expressions; choose another name for the study variable");
        }
        if (variable == null) {
            try {
                path = ParameterPath.parse(pathText, WingSchema.ROOT);
            } catch (ParameterPath.PathException e) {
                throw p.error(e.getMessage());
            }
        }
        Parameter parameter;
        if (p.value() instanceof YamlValue.Sequence) {
            List<String> values = new ArrayList<>();
            Set<String> seen = new HashSet<>();
            for (Field item : p.items()) {
                if (!(item.value() instanceof YamlValue.Scalar)) {
                    throw item.error("expected a plain value (a number or a word), got " + item.value().describe());
                }
                String v = item.text().trim();
                if (variable != null && !Decimal.matches(v)) {
                    throw item.error("a study variable takes numbers; got " + item.value().describe());
                }
                if (!seen.add(v)) {
                    throw item.error("the value " + v + " is listed twice");
                }
                values.add(v);
            }
            if (values.isEmpty()) {
                throw p.error("expected at least one value");
            }
            parameter = variable != null ? Parameter.ofList(variable, p.line(), values)
                    : Parameter.ofList(path, p.line(), values);
        } else if (p.value() instanceof YamlValue.Mapping) {
            p.allowOnly(RANGE_KEYS);
            Field fromField = p.required("from", "the first value of the range");
            Field toField = p.required("to", "the last value of the range");
            BigDecimal from = decimal(fromField);
            BigDecimal to = decimal(toField);
            BigDecimal step = p.optional("step").map(SweepFileReader::decimal).orElse(null);
            if (step != null) {
                Field stepField = p.required("step", "");
                if (step.signum() == 0) {
                    throw stepField.error("the step must not be zero");
                }
                if (to.compareTo(from) != 0 && to.subtract(from).signum() != step.signum()) {
                    throw stepField.error("the step must lead from " + fromField.text() + " to " + toField.text()
                            + ": expected a " + (to.compareTo(from) > 0 ? "positive" : "negative") + " step, got "
                            + stepField.text());
                }
                if (!countAtMost(from, to, step, MAX_RANGE_VALUES)) {
                    throw stepField.error("the range from " + fromField.text() + " to " + toField.text() + " by "
                            + stepField.text() + " has more than " + MAX_RANGE_VALUES + " values; expected a "
                            + "coarser step");
                }
            } else if (to.compareTo(from) < 0) {
                throw toField.error("must not be below 'from' (" + fromField.text() + ") in a range without a step");
            }
            parameter = variable != null ? Parameter.ofRange(variable, p.line(), from, to, step)
                    : Parameter.ofRange(path, p.line(), from, to, step);
        } else {
            throw p.error("expected a list of values or a range {from: ..., to: ..., step: ...}, got "
                    + p.value().describe());
        }
        String first = parameter.hasStep() || !parameter.isRange() ? parameter.gridValue(0) : parameter.sample(0);
        try {
            parameter.apply(baseTree, first);
        } catch (ParameterPath.PathException e) {
            throw p.error(e.getMessage());
        }
        return parameter;
    }

    /**
     * The derived entries with the names and constants their expressions use. Every name is a constant, a
     * swept parameter (its value in each case) or a value the base file gives at a path that is not swept
     * (fixed); no name may stand for a derived path, so derived values depend on no other derived value.
     * Parts of an expression that use fixed values only are evaluated now, and a failure there refused.
     */
    private static Derivation derivation(Field root, YamlValue baseTree, List<Parameter> parameters) {
        Optional<Field> derivedField = root.optional("derived");
        Optional<Field> namesField = root.optional("names");
        Optional<Field> constantsField = root.optional("constants");
        String units = baseTree instanceof YamlValue.Mapping m && m.get("units").orElse(null)
                instanceof YamlValue.Scalar u ? u.text().trim() : "the file's unit";
        Map<String, Parameter> swept = new HashMap<>();
        Map<String, Integer> sweptIndex = new HashMap<>();
        for (int p = 0; p < parameters.size(); p++) {
            Parameter parameter = parameters.get(p);
            if (parameter.isVariable()) {
                continue;
            }
            String place = placeOf(parameter.path(), baseTree,
                    new InputException(root.file(), parameter.line(), "parameters." + parameter.path().text(), ""));
            Parameter same = swept.put(place, parameter);
            if (same != null) {
                throw new InputException(root.file(), parameter.line(), "parameters." + parameter.path().text(),
                        "names the same value as the parameter " + same.path().text() + "; sweep it once");
            }
            sweptIndex.put(place, p);
        }

        if (derivedField.isEmpty()) {
            for (Optional<Field> f : List.of(namesField, constantsField)) {
                if (f.isPresent()) {
                    throw f.get().error("names and constants serve the expressions of derived entries; add "
                            + "derived, or leave this out");
                }
            }
            for (Parameter p : parameters) {
                if (p.isVariable()) {
                    throw unusedVariable(root, p);
                }
            }
            return Derivation.none();
        }
        List<Field> derivedEntries = bounded(derivedField.get(), "derived",
                "a mapping from wing-file paths to expressions, such as surfaces.wing.trapezoid.root-chord: "
                + "2 * area / (span * (1 + taper))");
        Map<String, String> derivedPlaces = new HashMap<>();
        List<ParameterPath> derivedPaths = new ArrayList<>();
        for (Field d : derivedEntries) {
            ParameterPath path = wingPath(d, d.path().substring("derived.".length()));
            try {
                path.apply(baseTree, "1");
            } catch (ParameterPath.PathException e) {
                throw d.error(e.getMessage());
            }
            String place = placeOf(path, baseTree, d.error(""));
            if (swept.containsKey(place)) {
                throw d.error("this value is also swept (parameters." + swept.get(place).path().text() + "); a value "
                        + "is either swept or derived");
            }
            String other = derivedPlaces.put(place, path.text());
            if (other != null) {
                throw d.error("names the same value as the derived entry " + other + "; derive it once");
            }
            derivedPaths.add(path);
        }

        Map<String, Integer> slots = new LinkedHashMap<>();
        List<String> slotNames = new ArrayList<>();
        List<Integer> parameterOf = new ArrayList<>();
        List<Double> fixed = new ArrayList<>();
        for (int p = 0; p < parameters.size(); p++) {
            if (parameters.get(p).isVariable()) {
                slots.put(parameters.get(p).key(), slots.size());
                slotNames.add(parameters.get(p).key());
                parameterOf.add(p);
                fixed.add(0.0);
            }
        }
        String unitsNote = "every name stands for a number in the base wing file's own units (" + units
                + " for lengths, degrees for angles)";
        if (constantsField.isPresent()) {
            for (Field c : bounded(constantsField.get(), "constants", "a mapping from names to numbers")) {
                String name = declaredName(c, "constants.", slots);
                if (!(c.value() instanceof YamlValue.Scalar s) || !s.plain() || !Decimal.matches(s.text())) {
                    throw c.error("expected a plain number, got " + c.value().describe() + "; constants take no unit: "
                            + unitsNote);
                }
                slots.put(name, slots.size());
                slotNames.add(name);
                parameterOf.add(-1);
                fixed.add(c.number());
            }
        }
        if (namesField.isPresent()) {
            for (Field n : bounded(namesField.get(), "names", "a mapping from names to wing-file paths, such as "
                    + "taper: surfaces.wing.trapezoid.taper")) {
                String name = declaredName(n, "names.", slots);
                ParameterPath path = wingPath(n, n.text());
                String place = placeOf(path, baseTree, n.error(""));
                if (derivedPlaces.containsKey(place)) {
                    throw n.error("names the derived value " + derivedPlaces.get(place) + "; expressions use swept "
                            + "values, values of the base file and constants, never derived values");
                }
                Integer p = sweptIndex.get(place);
                double value = 0;
                if (p != null) {
                    Parameter parameter = parameters.get(p);
                    if (!parameter.isRange()) {
                        for (long i = 0; i < parameter.gridCount(); i++) {
                            if (!Decimal.matches(parameter.gridValue(i))) {
                                throw n.error("names the swept parameter " + parameter.path().text() + ", whose value '"
                                        + Field.shown(parameter.gridValue(i)) + "' is not a number");
                            }
                        }
                    }
                } else {
                    YamlValue v = path.find(baseTree).orElseThrow(() -> n.error("the base file gives no value at "
                            + path.text() + " (its default applies); give the value in the base file, or sweep it"));
                    if (!(v instanceof YamlValue.Scalar s) || !s.plain() || !Decimal.matches(s.text())) {
                        throw n.error("the base file's value at " + path.text() + " is " + v.describe()
                                + ", not a plain number");
                    }
                    value = Decimal.parse(((YamlValue.Scalar) v).text());
                }
                slots.put(name, slots.size());
                slotNames.add(name);
                parameterOf.add(p == null ? -1 : p);
                fixed.add(value);
            }
        }

        double[] fixedValues = fixed.stream().mapToDouble(Double::doubleValue).toArray();
        boolean[] known = new boolean[fixedValues.length];
        for (int s = 0; s < known.length; s++) {
            known[s] = parameterOf.get(s) < 0;
        }
        List<Derivation.Derived> derived = new ArrayList<>();
        for (int i = 0; i < derivedEntries.size(); i++) {
            Field d = derivedEntries.get(i);
            if (!(d.value() instanceof YamlValue.Scalar)) {
                throw d.error("expected an expression, such as 2 * area / (span * (1 + taper)), got "
                        + d.value().describe());
            }
            Expression e;
            try {
                e = Expression.parse(d.text(), slots);
                OptionalDouble now = e.fold(fixedValues, known);
                String problem = now.isPresent() ? Derivation.outOfRange(now.getAsDouble()) : null;
                if (problem != null) {
                    throw d.error(problem);
                }
            } catch (Expression.ExpressionException x) {
                throw d.error(x.located());
            }
            derived.add(new Derivation.Derived(derivedPaths.get(i), d.file(), d.line(), d.path(), e));
        }
        for (Parameter p : parameters) {
            if (p.isVariable()
                    && derived.stream().noneMatch(d -> d.expression().slots().contains(slots.get(p.key())))) {
                throw unusedVariable(root, p);
            }
        }
        return new Derivation(derived, slotNames, parameterOf.stream().mapToInt(Integer::intValue).toArray(),
                fixedValues);
    }

    private static InputException unusedVariable(Field root, Parameter p) {
        return new InputException(root.file(), p.line(), "parameters." + p.key(), "'" + p.key() + "' is not a key of "
                + "a wing file's top level (expected a path such as surfaces.wing.trapezoid.taper), and as a study "
                + "variable no derived expression uses it");
    }

    /** The entries of a names, constants or derived mapping: 1 to {@value #MAX_DERIVED_ENTRIES}. */
    private static List<Field> bounded(Field f, String key, String expected) {
        if (!(f.value() instanceof YamlValue.Mapping)) {
            throw f.error("expected " + expected + ", got " + f.value().describe());
        }
        List<Field> entries = f.entries();
        if (entries.isEmpty() || entries.size() > MAX_DERIVED_ENTRIES) {
            throw f.error("expected from 1 to " + MAX_DERIVED_ENTRIES + " entries under " + key + ", got "
                    + entries.size());
        }
        return entries;
    }

    /** A name declared under names or constants: the entry's key, checked and not yet declared. */
    private static String declaredName(Field f, String prefix, Map<String, Integer> declared) {
        String name = f.path().substring(prefix.length());
        if (!Expression.NAME.matcher(name).matches()) {
            throw f.error("'" + Field.shown(name) + "' is not a name; expected a letter, then letters, digits or "
                    + "underscores (at most 32 characters), such as span or root_chord");
        }
        if (Expression.FUNCTIONS.containsKey(name)) {
            throw f.error(name + " is a function of the expressions; choose another name");
        }
        if (declared.containsKey(name)) {
            throw f.error("the name " + name + " is declared twice (as a study variable, under constants or under "
                    + "names)");
        }
        return name;
    }

    private static ParameterPath wingPath(Field at, String text) {
        try {
            return ParameterPath.parse(text, WingSchema.ROOT);
        } catch (ParameterPath.PathException e) {
            throw at.error(e.getMessage());
        }
    }

    private static String placeOf(ParameterPath path, YamlValue baseTree, InputException at) {
        try {
            return path.place(baseTree);
        } catch (ParameterPath.PathException e) {
            throw new InputException(at.file(), at.line(), at.field(), e.getMessage());
        }
    }

    /**
     * The load case of the {@code loads.*} columns: {@code load-case: {speed, load-factor}} with the flight's
     * weight and pressure altitude. The columns need it, the flight's weight, a {@code structure} section in
     * the base wing file and a mirrored first surface; a load case without such a column is refused.
     */
    private static Optional<LoadCase> loadCase(Field root, Field columnsField, List<ResultColumn> columns,
            Optional<FlightCondition> condition, double altitude, YamlValue baseTree, Wing baseWing) {
        boolean wanted = columns.stream().anyMatch(ResultColumn::needsLoadCase);
        Optional<Field> field = root.optional("load-case");
        if (field.isEmpty()) {
            if (wanted) {
                throw columnsField.error("loads.* columns need a load case: add load-case: {speed: 110kt, "
                        + "load-factor: 3.8} (and the weight under flight)");
            }
            return Optional.empty();
        }
        Field lc = field.get();
        lc.allowOnly(LOAD_CASE_KEYS);
        if (!wanted) {
            throw lc.error("a load case serves the loads.* columns (such as loads.root.bending); add one, or leave "
                    + "load-case out");
        }
        double speed = Quantities.speed(lc.required("speed", "the equivalent airspeed with a unit, such as 110kt"));
        double n = lc.optional("load-factor").map(f -> f.inRange(-CasesReader.MAX_LOAD_FACTOR,
                CasesReader.MAX_LOAD_FACTOR)).orElse(1.0);
        if (condition.isEmpty()) {
            throw lc.error("a load case needs the aircraft's weight: add flight: {weight: ...} (such as 1100kg)");
        }
        if (!(baseTree instanceof YamlValue.Mapping m && m.get("structure").isPresent())) {
            throw columnsField.error("loads.* columns need a structure section in the base wing file (its masses give "
                    + "the inertia relief)");
        }
        if (!baseWing.main().mirrored()) {
            throw columnsField.error("loads.* columns need a mirrored first surface: loads are computed per half-wing");
        }
        return Optional.of(new LoadCase(String.format(Locale.ROOT, "n %s at %s m/s EAS", Field.format(n),
                Field.brief(speed)), condition.get().weight(), n, speed, altitude, "given"));
    }

    /**
     * Refuses a result column with the name of a swept or derived path ({@code reference.area} is both): the
     * rows would have two columns of one name.
     */
    private static void refuseColumnsNamedAsPaths(Field columnsField, Set<String> columns, List<Parameter> parameters,
            Derivation derivation) {
        List<String> paths = new ArrayList<>();
        parameters.forEach(p -> paths.add(p.key()));
        derivation.derived().forEach(d -> paths.add(d.path().text()));
        for (String path : paths) {
            if (columns.contains(path)) {
                throw columnsField.error("the result column " + path + " has the name of a swept or derived value, "
                        + "whose own column holds its value (in the wing file's units); leave the result column out");
            }
        }
    }

    /**
     * Whether a parameter's key is a study variable: a bare name (no dots or brackets) that is not a key of a
     * wing file's top level. The reader refuses a variable no derived expression uses, so a mistyped
     * top-level key is not silently taken for one.
     */
    static boolean isVariable(String key) {
        return Expression.NAME.matcher(key).matches() && !WingSchema.ROOT.keys().containsKey(key);
    }

    /**
     * A range's from, to or step as an exact decimal. The number's syntax (at most 40 characters, an exponent
     * of at most three digits) and size are checked before any decimal arithmetic.
     */
    private static BigDecimal decimal(Field f) {
        f.number();
        BigDecimal d = new BigDecimal(f.text().trim());
        BigDecimal size = d.abs();
        if (d.signum() != 0 && (size.compareTo(BigDecimal.valueOf(MIN_RANGE_MAGNITUDE)) < 0
                || size.compareTo(BigDecimal.valueOf(MAX_RANGE_MAGNITUDE)) > 0)) {
            throw f.error("is " + f.text().trim() + "; expected 0 or a number from " + Field.brief(MIN_RANGE_MAGNITUDE)
                    + " to " + Field.brief(MAX_RANGE_MAGNITUDE) + " in size (either sign), as every value of a wing "
                    + "file is");
        }
        return d;
    }

    /**
     * Whether the range from, to, step (the step non-zero and leading from one to the other) has at most
     * {@code limit} values; bounded work whatever the numbers, so that the exact count
     * ({@link Parameter#rangeCount}) is taken only of a range known to be small enough.
     */
    static boolean countAtMost(BigDecimal from, BigDecimal to, BigDecimal step, long limit) {
        BigDecimal steps = to.subtract(from).divide(step, MathContext.DECIMAL64).abs();
        if (steps.compareTo(BigDecimal.valueOf(limit)) >= 0) {
            return false;
        }
        return Parameter.rangeCount(from, to, step) <= limit;
    }

    private static Design design(Field root, Field paramsField, List<Parameter> parameters, boolean force) {
        Optional<Field> d = root.optional("design");
        String kind = "grid";
        if (d.isPresent() && d.get().value() instanceof YamlValue.Scalar) {
            kind = d.get().choice(List.of("grid", "latin-hypercube"));
        } else if (d.isPresent()) {
            d.get().allowOnly(DESIGN_KEYS);
            kind = d.get().optional("kind").map(k -> k.choice(List.of("grid", "latin-hypercube"))).orElse("grid");
        }
        Field at = d.orElse(paramsField);
        if (kind.equals("grid")) {
            if (d.isPresent() && d.get().value() instanceof YamlValue.Mapping) {
                for (String k : List.of("cases", "seed")) {
                    if (d.get().has(k)) {
                        throw d.get().required(k, "").error("a full grid takes no " + k
                                + "; use kind: latin-hypercube");
                    }
                }
            }
            for (Parameter p : parameters) {
                if (p.isRange() && !p.hasStep()) {
                    throw new InputException(at.file(), p.line(), "parameters." + p.key(),
                            "a range in a full grid needs a step");
                }
            }
            long n = Design.gridCount(parameters);
            if (n > MAX_CASES_WITHOUT_FORCE && !force) {
                throw at.error("the full grid has " + (n == Long.MAX_VALUE ? "too many" : String.valueOf(n))
                        + " cases, more than " + MAX_CASES_WITHOUT_FORCE + "; use --force to run it anyway, or a "
                        + "latin-hypercube design");
            }
            if (n == Long.MAX_VALUE) {
                throw at.error("the full grid has too many cases to count");
            }
            return Design.grid(parameters);
        }
        Field lhs = d.orElseThrow();
        if (!(lhs.value() instanceof YamlValue.Mapping)) {
            throw lhs.error("a Latin hypercube needs its cases and a seed: design: {kind: latin-hypercube, cases: 200, "
                    + "seed: 1}");
        }
        Field casesField = lhs.required("cases", "the number of cases");
        long cases = wholeNumber(casesField, 1, force ? Long.MAX_VALUE / 4 : Long.MAX_VALUE / 4);
        if (cases > MAX_CASES_WITHOUT_FORCE && !force) {
            throw casesField.error("more than " + MAX_CASES_WITHOUT_FORCE + " cases; use --force to run them anyway");
        }
        Field seedField = lhs.required("seed", "a whole number, so that the same cases come out on every run");
        long seed = wholeNumber(seedField, Long.MIN_VALUE / 2, Long.MAX_VALUE / 2);
        return Design.latinHypercube(parameters, cases, seed);
    }

    private static long wholeNumber(Field f, long lo, long hi) {
        f.number();
        try {
            BigDecimal d = new BigDecimal(f.text().trim().replace("_", ""));
            long v = d.longValueExact();
            if (v < lo || v > hi) {
                throw f.error("must be from " + lo + " to " + hi + ", got " + v);
            }
            return v;
        } catch (ArithmeticException | NumberFormatException e) {
            throw f.error("expected a whole number, got " + f.text());
        }
    }

    private static List<Double> numbers(Field f, double lo, double hi) {
        List<Double> out = new ArrayList<>();
        if (f.value() instanceof YamlValue.Mapping) {
            f.allowOnly(RANGE_KEYS);
            Field fromField = f.required("from", "the first value");
            Field toField = f.required("to", "the last value");
            Field stepField = f.required("step", "the step");
            BigDecimal from = decimal(fromField);
            BigDecimal to = decimal(toField);
            BigDecimal step = decimal(stepField);
            if (step.signum() == 0 || (to.compareTo(from) != 0 && to.subtract(from).signum() != step.signum())) {
                throw stepField.error("the step must be non-zero and lead from " + fromField.text() + " to "
                        + toField.text());
            }
            if (!countAtMost(from, to, step, MAX_POINTS)) {
                throw stepField.error("the range from " + fromField.text() + " to " + toField.text() + " by "
                        + stepField.text() + " gives more than " + MAX_POINTS + " points; expected at most "
                        + MAX_POINTS);
            }
            long n = Parameter.rangeCount(from, to, step);
            for (long i = 0; i < n; i++) {
                out.add(from.add(step.multiply(BigDecimal.valueOf(i))).doubleValue());
            }
        } else {
            List<Field> items = f.items();
            if (items.isEmpty() || items.size() > MAX_POINTS) {
                throw f.error("expected from 1 to " + MAX_POINTS + " values, got " + items.size());
            }
            for (Field item : items) {
                out.add(item.inRange(lo, hi));
            }
        }
        for (double v : out) {
            if (v < lo || v > hi) {
                throw f.error("must lie from " + Field.format(lo) + " to " + Field.format(hi) + ", got " + v);
            }
        }
        return out;
    }

    private static void column(Field at, String name, List<String> controls) {
        try {
            ResultColumn.parse(name, controls);
        } catch (ResultColumn.ColumnException e) {
            throw at.error(e.getMessage());
        }
    }

    private static void requireClMax(Field at, String baseName, Path basePath, Wing baseWing, YamlValue baseTree,
            List<Parameter> parameters, Derivation derivation, Design design) {
        Wing wing = baseWing;
        try {
            String[] first = design.values(0);
            YamlValue tree = baseTree;
            for (int p = 0; p < parameters.size(); p++) {
                tree = parameters.get(p).apply(tree, first[p]);
            }
            tree = derivation.apply(tree, derivation.values(first));
            wing = WingFileReader.fromTree(tree, basePath.toString());
        } catch (RuntimeException e) {
            wing = baseWing;
        }
        try {
            StripLimits.of(wing, LatticeBuilder.build(wing), new double[wing.controls().size()],
                    OptionalDouble.empty());
        } catch (MissingSectionDataException e) {
            throw at.error("stall columns need section cl-max data, and " + baseName + " gives none for section"
                    + (e.sections().size() > 1 ? "s " : " ") + String.join(", ", e.sections())
                    + "; add cl-max to the section, or set assume-cl-max in the sweep file (flagged in the output)");
        }
    }

    private static String fingerprint(String sweepText, String baseText) {
        try {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            md.update(sweepText.getBytes(StandardCharsets.UTF_8));
            md.update((byte) 0);
            md.update(baseText.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(md.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this Java runtime", e);
        }
    }
}
