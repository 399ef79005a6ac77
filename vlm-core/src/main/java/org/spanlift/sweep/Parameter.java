package org.spanlift.sweep;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.List;

import org.spanlift.input.YamlValue;

/**
 * One swept parameter: its path in the wing file, or the name of a study variable that only derived values
 * use ({@code aspect_ratio}; it sets no wing value itself), and its values, as a list (numbers or words, used as
 * written) or a range from, to, step (exact decimal steps; the end point is included when it falls on the
 * grid within rounding). In a Latin hypercube a range is sampled continuously between from and to, and
 * snapped to its steps when it gives a step.
 */
public final class Parameter {

    private static final MathContext DIGITS = new MathContext(12, RoundingMode.HALF_EVEN);
    /** Relative slack for the end point of a range to count as on the grid. */
    static final double END_SLACK = 1e-9;

    private final ParameterPath path;
    private final String key;
    private final int line;
    private final List<String> list;
    private final BigDecimal from;
    private final BigDecimal to;
    private final BigDecimal step;
    private final long count;

    private Parameter(ParameterPath path, String variable, int line, List<String> list, BigDecimal from,
            BigDecimal to, BigDecimal step) {
        this.path = path;
        this.key = path != null ? path.text() : variable;
        this.line = line;
        this.list = list == null ? null : List.copyOf(list);
        this.from = from;
        this.to = to;
        this.step = step;
        this.count = list != null ? list.size() : step == null ? -1 : rangeCount(from, to, step);
    }

    /** A parameter with listed values. */
    public static Parameter ofList(ParameterPath path, int line, List<String> values) {
        return new Parameter(path, null, line, values, null, null, null);
    }

    /** A study variable with listed values (numbers: the reader checks). */
    public static Parameter ofList(String variable, int line, List<String> values) {
        return new Parameter(null, variable, line, values, null, null, null);
    }

    /** A study variable over a range, as {@link #ofRange(ParameterPath, int, BigDecimal, BigDecimal, BigDecimal)}. */
    public static Parameter ofRange(String variable, int line, BigDecimal from, BigDecimal to, BigDecimal step) {
        return new Parameter(null, variable, line, null, from, to, step);
    }

    /**
     * A parameter over a range; {@code step} may be null for a Latin hypercube only. The caller has checked
     * that a step is non-zero and leads from {@code from} to {@code to}.
     */
    public static Parameter ofRange(ParameterPath path, int line, BigDecimal from, BigDecimal to, BigDecimal step) {
        return new Parameter(path, null, line, null, from, to, step);
    }

    /** The number of grid values of a range: floor((to - from) / step + slack) + 1. */
    public static long rangeCount(BigDecimal from, BigDecimal to, BigDecimal step) {
        BigDecimal q = to.subtract(from).divide(step, MathContext.DECIMAL128);
        BigDecimal slack = q.abs().max(BigDecimal.ONE).multiply(BigDecimal.valueOf(END_SLACK));
        BigDecimal n = q.add(slack).setScale(0, RoundingMode.FLOOR).add(BigDecimal.ONE);
        return n.compareTo(BigDecimal.valueOf(Long.MAX_VALUE / 2)) > 0 ? Long.MAX_VALUE / 2 : n.longValueExact();
    }

    /**
     * The parameter's path in the wing file.
     *
     * @throws IllegalStateException for a study variable, which has none
     */
    public ParameterPath path() {
        if (path == null) {
            throw new IllegalStateException("the study variable " + key + " has no wing-file path");
        }
        return path;
    }

    /** Whether this is a study variable: a name that only derived values use, with no wing-file path. */
    public boolean isVariable() {
        return path == null;
    }

    /** The parameter as the sweep file writes it and its column is named: the path, or the variable's name. */
    public String key() {
        return key;
    }

    /** The wing tree with the value at the parameter's path; a study variable leaves the tree as it is. */
    public YamlValue apply(YamlValue tree, String value) {
        return path == null ? tree : path.apply(tree, value);
    }

    /** The line of the parameter in the sweep file. */
    public int line() {
        return line;
    }

    /** True when the values are a range rather than a list. */
    public boolean isRange() {
        return list == null;
    }

    /** True when the range gives a step. */
    public boolean hasStep() {
        return step != null;
    }

    /** The number of grid values (a range needs a step). */
    public long gridCount() {
        if (count < 0) {
            throw new IllegalStateException("a range without a step has no grid");
        }
        return count;
    }

    /** The i-th grid value, as text. */
    public String gridValue(long i) {
        if (list != null) {
            return list.get((int) i);
        }
        return text(from.add(step.multiply(BigDecimal.valueOf(i))));
    }

    /** The value at the fraction u in [0, 1) of the parameter's extent (Latin hypercube). */
    public String sample(double u) {
        if (list != null) {
            return list.get((int) Math.min(list.size() - 1, Math.floor(u * list.size())));
        }
        if (step != null) {
            return gridValue((long) Math.min(count - 1, Math.floor(u * count)));
        }
        double v = from.doubleValue() + u * (to.doubleValue() - from.doubleValue());
        return text(new BigDecimal(v).round(DIGITS));
    }

    private static String text(BigDecimal d) {
        String s = d.round(DIGITS).stripTrailingZeros().toPlainString();
        return s.equals("-0") ? "0" : s;
    }
}
