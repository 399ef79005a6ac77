package org.spanlift.cli.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.function.Function;

import org.spanlift.cli.output.Results;
import org.spanlift.flight.FlightPoint;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.input.Field;
import org.spanlift.vocabulary.ResultKey;
import org.spanlift.vocabulary.Vocabulary;
import org.spanlift.vocabulary.WingResult;

/**
 * The comparison table: one column per wing, and the differences of every later wing from the first.
 * The quantities are vocabulary keys; values are SI (m, m^2) with angles in degrees, lift slope per radian;
 * {@link Row#display} converts lengths to a display unit.
 */
public final class Comparison {

    /**
     * One compared quantity: a vocabulary key, taken from the wing or (for a point key) at the common CL.
     *
     * @param key    the key as JSON and CSV write it ({@code reference.area}, {@code e@CL=0.5})
     * @param result the vocabulary key
     * @param label  the table label
     * @param value  its value for one wing, SI
     */
    public record Row(String key, ResultKey<?> result, String label, Function<WingSummary, OptionalDouble> value) {

        /** The unit as the table shows it, lengths in {@code u}; "-" for a ratio. */
        public String unit(LengthUnit u) {
            String unit = Results.unit(result, u);
            return unit.isEmpty() ? "-" : unit;
        }

        public double display(double si, LengthUnit u) {
            return Results.display(result, si, u);
        }

        public int decimals() {
            return result.decimals();
        }
    }

    private static final List<String> WING_KEYS = List.of("reference.area", "reference.span",
            "reference.aspect_ratio", "mean_aerodynamic_chord", "lift_slope_per_rad", "zero_lift_angle_deg");
    private static final List<String> POINT_KEYS = List.of("alpha_deg", "e", "CDi");

    private final List<String> labels;
    private final List<WingSummary> wings;
    private final double cl;

    public Comparison(List<String> labels, List<WingSummary> wings, double cl) {
        this.labels = List.copyOf(labels);
        this.wings = List.copyOf(wings);
        this.cl = cl;
    }

    /** The compared quantities: wing keys, then point keys at the common CL. */
    public List<Row> rows() {
        List<Row> rows = new ArrayList<>();
        for (ResultKey<WingResult> k : Vocabulary.select(Vocabulary.WING, WING_KEYS.toArray(String[]::new))) {
            rows.add(new Row(k.key(), k, k.label(), s -> number(k.of(s.wingResult()))));
        }
        String at = "@CL=" + Field.format(cl);
        for (ResultKey<FlightPoint> k : Vocabulary.select(Vocabulary.POINT, POINT_KEYS.toArray(String[]::new))) {
            rows.add(new Row(k.key() + at, k, k.label() + " at the common CL", s -> number(k.of(s.pointAtCl()))));
        }
        return rows;
    }

    private static OptionalDouble number(Object v) {
        return v instanceof Number n ? OptionalDouble.of(n.doubleValue()) : OptionalDouble.empty();
    }

    public List<String> labels() {
        return labels;
    }

    public List<WingSummary> wings() {
        return wings;
    }

    public double cl() {
        return cl;
    }

    /** Value of a row for wing i, or empty. */
    public OptionalDouble value(Row row, int i) {
        return row.value().apply(wings.get(i));
    }

    /** Difference of wing i from the first, or empty where either is. */
    public OptionalDouble difference(Row row, int i) {
        OptionalDouble a = value(row, 0);
        OptionalDouble b = value(row, i);
        return a.isPresent() && b.isPresent() ? OptionalDouble.of(b.getAsDouble() - a.getAsDouble())
                : OptionalDouble.empty();
    }

    /** The tree for JSON output (SI). */
    public Map<String, Object> json() {
        Map<String, Object> root = new LinkedHashMap<>();
        Map<String, Object> units = new LinkedHashMap<>();
        units.put("length", "m");
        units.put("area", "m^2");
        units.put("angle", "deg");
        units.put("lift_slope", "per rad");
        root.put("units", units);
        root.put("common_CL", cl);
        List<Object> list = new ArrayList<>();
        for (int i = 0; i < wings.size(); i++) {
            Map<String, Object> w = new LinkedHashMap<>();
            w.put("label", labels.get(i));
            w.put("name", wings.get(i).wing().name());
            w.put("file", wings.get(i).file().toString());
            for (Row r : rows()) {
                w.put(r.key(), value(r, i));
            }
            list.add(w);
        }
        root.put("wings", list);
        List<Object> diffs = new ArrayList<>();
        for (int i = 1; i < wings.size(); i++) {
            Map<String, Object> d = new LinkedHashMap<>();
            d.put("label", labels.get(i));
            d.put("minus", labels.get(0));
            for (Row r : rows()) {
                d.put(r.key(), difference(r, i));
            }
            diffs.add(d);
        }
        root.put("differences", diffs);
        return root;
    }
}
