package org.spanlift.cli.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.function.Function;

import org.spanlift.geometry.LengthUnit;

/**
 * The comparison table: one column per wing, and the differences of every later wing from the first.
 * Values are SI (m, m^2) with angles in degrees, lift slope per radian; {@link Row#display} converts
 * lengths to a display unit.
 */
public final class Comparison {

    /** How a quantity is converted for display: by a power of the length unit (0, 1 or 2). */
    public record Row(String key, String label, int lengthPower, String unitSuffix, int decimals,
            Function<WingSummary, OptionalDouble> value) {

        public String unit(LengthUnit u) {
            return switch (lengthPower) {
                case 1 -> u.symbol();
                case 2 -> u.symbol() + "^2";
                default -> unitSuffix;
            };
        }

        public double display(double si, LengthUnit u) {
            return si / Math.pow(u.metres(), lengthPower);
        }
    }

    private final List<String> labels;
    private final List<WingSummary> wings;
    private final double cl;

    public Comparison(List<String> labels, List<WingSummary> wings, double cl) {
        this.labels = List.copyOf(labels);
        this.wings = List.copyOf(wings);
        this.cl = cl;
    }

    public static List<Row> rows() {
        return List.of(
                new Row("area_m2", "reference area", 2, "", 3, s -> OptionalDouble.of(s.area())),
                new Row("span_m", "reference span", 1, "", 3, s -> OptionalDouble.of(s.span())),
                new Row("aspect_ratio", "aspect ratio", 0, "-", 3, s -> OptionalDouble.of(s.aspectRatio())),
                new Row("mac_m", "mean aerodynamic chord", 1, "", 3, s -> OptionalDouble.of(s.mac())),
                new Row("lift_slope_per_rad", "lift slope", 0, "/rad", 4, s -> OptionalDouble.of(s.liftSlope())),
                new Row("zero_lift_angle_deg", "zero-lift angle", 0, "deg", 3,
                        s -> OptionalDouble.of(Math.toDegrees(s.zeroLiftAngle()))),
                new Row("alpha_at_CL_deg", "alpha at the common CL", 0, "deg", 3,
                        s -> OptionalDouble.of(Math.toDegrees(s.alphaAtCl()))),
                new Row("e_at_CL", "span efficiency e at the common CL", 0, "-", 4, WingSummary::spanEfficiency),
                new Row("CDi_at_CL", "induced drag CDi at the common CL", 0, "-", 5,
                        s -> OptionalDouble.of(s.inducedDrag())));
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
