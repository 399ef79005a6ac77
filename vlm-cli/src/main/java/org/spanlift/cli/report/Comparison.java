package org.spanlift.cli.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Function;

import org.spanlift.cli.output.DisplayUnits;
import org.spanlift.flight.FlightCondition;
import org.spanlift.flight.FlightPoint;
import org.spanlift.input.Field;
import org.spanlift.loads.SpanwiseLoads;
import org.spanlift.stall.StallEstimate;
import org.spanlift.stall.MaximumLift;
import org.spanlift.stall.StallStudy;
import org.spanlift.washout.WashoutDesign;
import org.spanlift.structure.LoadCase;
import org.spanlift.vocabulary.ResultKey;
import org.spanlift.vocabulary.Vocabulary;
import org.spanlift.vocabulary.WingResult;

/**
 * The comparison: one column per wing and the differences of every later wing from the first. The
 * quantities are vocabulary keys, each value the one the single-wing command prints for the same options:
 * the wing and its point at the common CL clean (every flap at zero, as {@code solve} without {@code --flaps}),
 * the stall onset clean and with flaps and the stall speeds as {@code stall} gives them, the root loads of
 * the load case as {@code loads} gives them (clean). Values are SI; {@link Row#display} converts them.
 */
public final class Comparison {

    /**
     * One wing of the comparison.
     *
     * @param summary   the wing and its point at the common CL, clean
     * @param stall     its stall study, when its sections give cl_max (or one is assumed)
     * @param loads     the load case's loads, when there is a load case
     * @param washout   the answer of the washout search, when requirements were given
     * @param notes     why a group of values is missing or how it was obtained
     */
    public record Entry(WingSummary summary, Optional<StallStudy> stall, Optional<SpanwiseLoads> loads,
            Optional<WashoutDesign.Result> washout, List<String> notes) {

        public Entry {
            notes = List.copyOf(notes);
        }
    }

    /**
     * One compared quantity.
     *
     * @param key    the key as JSON and CSV write it ({@code reference.area}, {@code e@CL=0.5},
     *               {@code stall_flaps.CL}, {@code loads.root.bending})
     * @param result the vocabulary key
     * @param label  the table label
     * @param value  its value for one wing, SI
     */
    public record Row(String key, ResultKey<?> result, String label, Function<Entry, OptionalDouble> value) {

        /** The unit as the table shows it; "-" for a ratio. */
        public String unit(DisplayUnits u) {
            String unit = u.symbol(result.unit());
            return unit.isEmpty() ? "-" : unit;
        }

        public double display(double si, DisplayUnits u) {
            return u.convert(result.unit(), si);
        }

        public int decimals() {
            return result.decimals();
        }
    }

    private static final List<String> WING_KEYS = List.of("reference.area", "reference.span",
            "reference.aspect_ratio", "mean_aerodynamic_chord", "lift_slope_per_rad", "zero_lift_angle_deg");
    private static final List<String> POINT_KEYS = List.of("alpha_deg", "e", "CDi", "CD", "L_D");
    private static final List<String> ONSET_KEYS = List.of("CL", "alpha_deg", "eta", "aileron_margin.dcl",
            "half_span_CL");
    private static final List<String> FLAP_KEYS = List.of("CL", "alpha_deg", "eta", "aileron_margin.dcl");
    private static final List<String> LOAD_KEYS = List.of("CL", "root.shear", "root.bending", "root.torsion");

    private final List<String> labels;
    private final List<Entry> entries;
    private final double cl;
    private final Optional<FlightCondition> condition;
    private final Optional<LoadCase> loadCase;
    private final OptionalDouble flapsDeg;
    private final List<Row> rows;

    /**
     * @param flapsDeg the flap setting asked for, degrees (for labels)
     */
    public Comparison(List<String> labels, List<Entry> entries, double cl, Optional<FlightCondition> condition,
            Optional<LoadCase> loadCase, OptionalDouble flapsDeg) {
        this.labels = List.copyOf(labels);
        this.entries = List.copyOf(entries);
        this.cl = cl;
        this.condition = condition;
        this.loadCase = loadCase;
        this.flapsDeg = flapsDeg;
        this.rows = List.copyOf(buildRows());
    }

    private List<Row> buildRows() {
        List<Row> out = new ArrayList<>();
        for (ResultKey<WingResult> k : Vocabulary.select(Vocabulary.WING, WING_KEYS.toArray(String[]::new))) {
            out.add(new Row(k.key(), k, k.label(), e -> number(k.of(e.summary().wingResult()))));
        }
        String at = "@CL=" + Field.format(cl);
        boolean polars = entries.stream().anyMatch(e -> e.summary().pointAtCl().profileDrag().isPresent());
        for (ResultKey<FlightPoint> k : Vocabulary.select(Vocabulary.POINT, POINT_KEYS.toArray(String[]::new))) {
            if (polars || !k.needs(org.spanlift.vocabulary.Need.POLARS)) {
                out.add(new Row(k.key() + at, k, k.label() + " at the common CL",
                        e -> number(k.of(e.summary().pointAtCl()))));
            }
        }
        if (entries.stream().anyMatch(e -> e.stall().isPresent())) {
            for (ResultKey<StallEstimate> k : Vocabulary.select(Vocabulary.ONSET, ONSET_KEYS.toArray(String[]::new))) {
                out.add(new Row(Vocabulary.CLEAN + k.key(), k, k.label() + ", clean",
                        e -> e.stall().map(s -> number(k.of(s.clean().estimate()))).orElse(OptionalDouble.empty())));
            }
        }
        if (entries.stream().anyMatch(e -> e.stall().flatMap(StallStudy::flaps).isPresent())) {
            String flaps = flapsDeg.isPresent() ? ", flaps " + Field.format(flapsDeg.getAsDouble())
                    + " deg" : ", flaps";
            for (ResultKey<StallEstimate> k : Vocabulary.select(Vocabulary.ONSET, FLAP_KEYS.toArray(String[]::new))) {
                out.add(new Row(Vocabulary.FLAPS + k.key(), k, k.label() + flaps,
                        e -> e.stall().flatMap(StallStudy::flaps)
                        .map(f -> number(k.of(f.estimate()))).orElse(OptionalDouble.empty())));
            }
            ResultKey<StallStudy> inc = Vocabulary.find(Vocabulary.STUDY, "flap_increment_CL");
            out.add(new Row(inc.key(), inc, inc.label(), e -> e.stall().map(s -> number(inc.of(s)))
                    .orElse(OptionalDouble.empty())));
        }
        if (entries.stream().anyMatch(e -> e.stall().isPresent())) {
            ResultKey<MaximumLift> top = Vocabulary.find(Vocabulary.MAX_LIFT, "CL");
            out.add(new Row(Vocabulary.MAX_CLEAN + top.key(), top, top.label() + ", clean", e -> e.stall()
                    .flatMap(s -> s.clean().maximumLiftIfAny()).map(m -> number(top.of(m)))
                    .orElse(OptionalDouble.empty())));
            if (entries.stream().anyMatch(e -> e.stall().flatMap(StallStudy::flaps).isPresent())) {
                out.add(new Row(Vocabulary.MAX_FLAPS + top.key(), top, top.label() + ", flaps", e -> e.stall()
                        .flatMap(StallStudy::flaps).flatMap(f -> f.maximumLiftIfAny()).map(m -> number(top.of(m)))
                        .orElse(OptionalDouble.empty())));
            }
        }
        if (entries.stream().anyMatch(e -> e.washout().isPresent())) {
            for (ResultKey<WashoutDesign.Result> k : Vocabulary.select(Vocabulary.WASHOUT, "washout.least_deg",
                    "washout.change_deg", "washout.cruise_e")) {
                out.add(new Row(k.key(), k, k.label(), e -> e.washout().map(w -> number(k.of(w)))
                        .orElse(OptionalDouble.empty())));
            }
        }
        if (condition.isPresent() && entries.stream().anyMatch(e -> e.stall().isPresent())) {
            for (ResultKey<StallStudy> k : Vocabulary.select(Vocabulary.STUDY, "stall_speed.clean_eas",
                    "stall_speed.clean_tas", "stall_speed.flaps_eas", "stall_speed.flaps_tas")) {
                if (k.key().contains("flaps") && entries.stream().allMatch(e -> e.stall().flatMap(StallStudy::flaps)
                        .isEmpty())) {
                    continue;
                }
                out.add(new Row(k.key(), k, k.label() + " (wing alone)", e -> e.stall().map(s -> number(k.of(s)))
                        .orElse(OptionalDouble.empty())));
            }
        }
        if (loadCase.isPresent()) {
            for (ResultKey<SpanwiseLoads> k : Vocabulary.select(Vocabulary.LOADS, LOAD_KEYS.toArray(String[]::new))) {
                out.add(new Row(Vocabulary.LOAD_CASE + k.key(), k, k.label() + " in the load case",
                        e -> e.loads().map(l -> number(k.of(l))).orElse(OptionalDouble.empty())));
            }
        }
        return out;
    }

    private static OptionalDouble number(Object v) {
        return v instanceof Number n ? OptionalDouble.of(n.doubleValue()) : OptionalDouble.empty();
    }

    /** The compared quantities, in table order. */
    public List<Row> rows() {
        return rows;
    }

    public List<String> labels() {
        return labels;
    }

    public List<Entry> entries() {
        return entries;
    }

    /** The wings' summaries, in order. */
    public List<WingSummary> wings() {
        return entries.stream().map(Entry::summary).toList();
    }

    public double cl() {
        return cl;
    }

    public Optional<FlightCondition> condition() {
        return condition;
    }

    public Optional<LoadCase> loadCase() {
        return loadCase;
    }

    public OptionalDouble flapsDeg() {
        return flapsDeg;
    }

    /** True when a row bears on safety (stall speeds, maximum lift, loads): the outputs then carry the caution. */
    public boolean bearsOnSafety() {
        return rows.stream().anyMatch(r -> r.key().startsWith("stall") || r.key().startsWith(Vocabulary.LOAD_CASE));
    }

    /** Value of a row for wing i, or empty. */
    public OptionalDouble value(Row row, int i) {
        return row.value().apply(entries.get(i));
    }

    /** Difference of wing i from the first, or empty where either is. */
    public OptionalDouble difference(Row row, int i) {
        OptionalDouble a = value(row, 0);
        OptionalDouble b = value(row, i);
        return a.isPresent() && b.isPresent() ? OptionalDouble.of(b.getAsDouble() - a.getAsDouble())
                : OptionalDouble.empty();
    }

    /** The tree for JSON output (SI). */
    public Map<String, Object> json(String caution) {
        Map<String, Object> root = new LinkedHashMap<>();
        Map<String, Object> units = new LinkedHashMap<>();
        units.put("length", "m");
        units.put("area", "m^2");
        units.put("angle", "deg");
        units.put("lift_slope", "per rad");
        units.put("speed", "m/s (equivalent airspeed where the key says eas)");
        units.put("force", "N");
        units.put("moment", "N m");
        units.put("altitude", "m, pressure altitude (geopotential, standard atmosphere)");
        root.put("units", units);
        root.put("common_CL", cl);
        condition.ifPresent(fc -> {
            Map<String, Object> c = new LinkedHashMap<>();
            c.put("weight", fc.weight());
            c.put("pressure_altitude", fc.atmosphere().pressureAltitude());
            c.put("stall_load_factor", fc.loadFactor());
            c.put("flaps_deg", flapsDeg.isPresent() ? (Object) flapsDeg.getAsDouble() : null);
            loadCase.ifPresent(lc -> {
                Map<String, Object> l = new LinkedHashMap<>();
                l.put("load_factor", lc.loadFactor());
                l.put("speed_eas", lc.equivalentSpeed());
                c.put("load_case", l);
            });
            root.put("condition", c);
        });
        List<Object> list = new ArrayList<>();
        for (int i = 0; i < entries.size(); i++) {
            Map<String, Object> w = new LinkedHashMap<>();
            w.put("label", labels.get(i));
            w.put("name", entries.get(i).summary().wing().name());
            w.put("file", entries.get(i).summary().file().toString());
            for (Row r : rows) {
                w.put(r.key(), value(r, i));
            }
            w.put("notes", entries.get(i).notes());
            list.add(w);
        }
        root.put("wings", list);
        List<Object> diffs = new ArrayList<>();
        for (int i = 1; i < entries.size(); i++) {
            Map<String, Object> d = new LinkedHashMap<>();
            d.put("label", labels.get(i));
            d.put("minus", labels.get(0));
            for (Row r : rows) {
                d.put(r.key(), difference(r, i));
            }
            diffs.add(d);
        }
        root.put("differences", diffs);
        if (bearsOnSafety()) {
            root.put("caution", caution);
        }
        return root;
    }
}
