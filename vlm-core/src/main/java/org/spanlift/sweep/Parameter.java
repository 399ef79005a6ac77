package org.spanlift.sweep;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.List;

/**
 * One swept parameter: its path in the wing file and its values, as a list (numbers or words, used as
 * written) or a range from, to, step (exact decimal steps; the end point is included when it falls on the
 * grid within rounding). In a Latin hypercube a range is sampled continuously between from and to, and
 * snapped to its steps when it gives a step.
 */
public final class Parameter {

    private static final MathContext DIGITS = new MathContext(12, RoundingMode.HALF_EVEN);
    /** Relative slack for the end point of a range to count as on the grid. */
    static final double END_SLACK = 1e-9;

    private final ParameterPath path;
    private final int line;
    private final List<String> list;
    private final BigDecimal from;
    private final BigDecimal to;
    private final BigDecimal step;
    private final long count;

    private Parameter(ParameterPath path, int line, List<String> list, BigDecimal from, BigDecimal to,
            BigDecimal step) {
        this.path = path;
        this.line = line;
        this.list = list == null ? null : List.copyOf(list);
        this.from = from;
        this.to = to;
        this.step = step;
        this.count = list != null ? list.size() : step == null ? -1 : rangeCount(from, to, step);
    }

    /** A parameter with listed values. */
    public static Parameter ofList(ParameterPath path, int line, List<String> values) {
        return new Parameter(path, line, values, null, null, null);
    }

    /**
     * A parameter over a range; {@code step} may be null for a Latin hypercube only. The caller has checked
     * that a step is non-zero and leads from {@code from} to {@code to}.
     */
    public static Parameter ofRange(ParameterPath path, int line, BigDecimal from, BigDecimal to, BigDecimal step) {
        return new Parameter(path, line, null, from, to, step);
    }

    /** The number of grid values of a range: floor((to - from) / step + slack) + 1. */
    public static long rangeCount(BigDecimal from, BigDecimal to, BigDecimal step) {
        BigDecimal q = to.subtract(from).divide(step, MathContext.DECIMAL128);
        BigDecimal slack = q.abs().max(BigDecimal.ONE).multiply(BigDecimal.valueOf(END_SLACK));
        BigDecimal n = q.add(slack).setScale(0, RoundingMode.FLOOR).add(BigDecimal.ONE);
        return n.compareTo(BigDecimal.valueOf(Long.MAX_VALUE / 2)) > 0 ? Long.MAX_VALUE / 2 : n.longValueExact();
    }

    public ParameterPath path() {
        return path;
    }

    /** The line of the parameter in the sweep file. */
    public int line() {
        return line;
    }

    public boolean isRange() {
        return list == null;
    }

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
