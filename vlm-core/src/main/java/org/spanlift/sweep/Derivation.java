package org.spanlift.sweep;

import java.util.List;

import org.spanlift.input.Field;
import org.spanlift.input.InputException;
import org.spanlift.input.YamlValue;

/**
 * The derived values of a sweep: wing-file values computed per case from the swept values, values of the
 * base file and constants, each by an {@link Expression} over the names the sweep file declares. Read by
 * {@code org.spanlift.io.SweepFileReader}, which checks that no derived path is also swept or named, so a
 * derived value never depends on another (there are no cycles to find) and each is applied to the case's
 * wing tree after the swept values.
 *
 * <p>Each name has a slot: a swept parameter's (its value in the case), or a fixed value known when the file
 * is read (a constant, or a value the base file gives at a path that is not swept).
 */
public final class Derivation {

    /**
     * One derived entry.
     *
     * @param path       where its value goes in the wing file
     * @param file       the sweep file, for messages
     * @param line       the entry's line in the sweep file
     * @param field      the entry's field ({@code derived.surfaces.wing.trapezoid.root-chord})
     * @param expression its expression over the slots
     */
    public record Derived(ParameterPath path, String file, int line, String field, Expression expression) {
    }

    /** The largest size of a derived value: as every value of a wing file and every range bound. */
    public static final double MAX_MAGNITUDE = 1e12;

    private static final Derivation NONE = new Derivation(List.of(), List.of(), new int[0], new double[0]);

    private final List<Derived> derived;
    private final List<String> slotNames;
    private final int[] parameterOfSlot;
    private final double[] fixed;

    /**
     * @param derived         the derived entries, in file order
     * @param slotNames       each slot's name, for messages
     * @param parameterOfSlot per slot, the index of its swept parameter, or -1 for a fixed value
     * @param fixed           per slot, the fixed value (ignored for a swept slot)
     */
    public Derivation(List<Derived> derived, List<String> slotNames, int[] parameterOfSlot, double[] fixed) {
        if (slotNames.size() != parameterOfSlot.length || fixed.length != parameterOfSlot.length) {
            throw new IllegalArgumentException("one name, parameter index and value per slot");
        }
        this.derived = List.copyOf(derived);
        this.slotNames = List.copyOf(slotNames);
        this.parameterOfSlot = parameterOfSlot.clone();
        this.fixed = fixed.clone();
    }

    /** No derived values. */
    public static Derivation none() {
        return NONE;
    }

    /** The derived entries, in file order. */
    public List<Derived> derived() {
        return derived;
    }

    /** True when there are no derived values. */
    public boolean isEmpty() {
        return derived.isEmpty();
    }

    /**
     * The derived values of a case, in entry order.
     *
     * @param swept the case's swept values as text, in parameter order (numbers where a name uses them: the
     *              reader checks that)
     * @throws InputException naming the sweep file, the entry's line and field, the character of the
     *                        expression where it failed and the names' values, when a value is not a finite
     *                        number of at most {@value #MAX_MAGNITUDE} in size
     */
    public double[] values(String[] swept) {
        double[] slots = fixed.clone();
        for (int s = 0; s < slots.length; s++) {
            if (parameterOfSlot[s] >= 0) {
                slots[s] = Double.parseDouble(swept[parameterOfSlot[s]]);
            }
        }
        double[] out = new double[derived.size()];
        for (int d = 0; d < out.length; d++) {
            Derived e = derived.get(d);
            double v;
            try {
                v = e.expression().evaluate(slots);
            } catch (Expression.ExpressionException x) {
                throw new InputException(e.file(), e.line(), e.field(), x.located() + names(e, slots));
            }
            String problem = outOfRange(v);
            if (problem != null) {
                throw new InputException(e.file(), e.line(), e.field(), problem + names(e, slots));
            }
            out[d] = v;
        }
        return out;
    }

    /** Why a derived value cannot go into a wing file, or null when it can. */
    public static String outOfRange(double v) {
        if (!Double.isFinite(v)) {
            return "the value is not a finite number";
        }
        if (Math.abs(v) > MAX_MAGNITUDE) {
            return "the value " + Field.brief(v) + " is beyond " + Field.brief(MAX_MAGNITUDE)
                    + " in size; expected a value a wing file can hold";
        }
        return null;
    }

    /** The values of the names an entry uses, for a message: " (with span = 34, taper = -1)". */
    private String names(Derived e, double[] slots) {
        if (e.expression().slots().isEmpty()) {
            return "";
        }
        StringBuilder b = new StringBuilder(" (with ");
        boolean first = true;
        for (int s : e.expression().slots()) {
            b.append(first ? "" : ", ").append(slotNames.get(s)).append(" = ").append(Field.brief(slots[s]));
            first = false;
        }
        return b.append(')').toString();
    }

    /** The wing tree with the derived values written at their paths, as plain numbers. */
    public YamlValue apply(YamlValue tree, double[] values) {
        YamlValue t = tree;
        for (int d = 0; d < derived.size(); d++) {
            t = derived.get(d).path().apply(t, text(values[d]));
        }
        return t;
    }

    /**
     * A derived value as the wing file gets it: Java's shortest text that reads back as the same double, in
     * the files' number syntax ({@code 5.6}, {@code 1.0E-5}), so the wing uses exactly the value the results
     * show.
     */
    public static String text(double v) {
        return Double.toString(v == 0 ? 0.0 : v);
    }
}
