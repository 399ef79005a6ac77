package org.spanlift.sweep;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.Objects;
import java.util.stream.Stream;

/**
 * A condition a case must meet to be ranked, such as {@code stall.eta < controls.aileron.from_eta}: two
 * operands (result columns or numbers) and a comparison ({@code <}, {@code <=}, {@code >}, {@code >=}). A
 * case whose operand has no value (e absent near zero lift, no aileron) does not meet it.
 *
 * @param text       the constraint as written
 * @param left       the left operand: a column name, or null when {@code leftValue} is a number
 * @param leftValue  the left operand's number (when {@code left} is null)
 * @param op         the comparison
 * @param right      the right operand: a column name, or null when {@code rightValue} is a number
 * @param rightValue the right operand's number (when {@code right} is null)
 */
public record Constraint(String text, String left, double leftValue, String op, String right, double rightValue) {

    private static final Pattern FORM = Pattern.compile("\\s*(\\S+)\\s*(<=|>=|<|>)\\s*(\\S+)\\s*");

    /** A bad constraint. */
    public static final class ConstraintException extends RuntimeException {
        private static final long serialVersionUID = 1L;

        ConstraintException(String message) {
            super(message);
        }
    }

    /**
     * Parses a constraint; column operands are checked by {@link ResultColumn#parse}.
     *
     * @throws ConstraintException or {@link ResultColumn.ColumnException} saying what is expected
     */
    public static Constraint parse(String text, List<String> controls) {
        Matcher m = FORM.matcher(text);
        if (!m.matches()) {
            throw new ConstraintException("expected 'A < B' (or <=, >, >=) with result columns or numbers, got '"
                    + text + "'");
        }
        String l = m.group(1);
        String r = m.group(3);
        Double lv = number(l);
        Double rv = number(r);
        if (lv != null && rv != null) {
            throw new ConstraintException("compares two numbers; name a result column on one side");
        }
        if (lv == null) {
            ResultColumn.parse(l, controls);
        }
        if (rv == null) {
            ResultColumn.parse(r, controls);
        }
        return new Constraint(text.trim(), lv == null ? l : null, lv == null ? 0 : lv, m.group(2),
                rv == null ? r : null, rv == null ? 0 : rv);
    }

    private static Double number(String s) {
        try {
            double d = Double.parseDouble(s);
            return Double.isFinite(d) ? d : null;
        } catch (NumberFormatException e) {
            return null;
        }
    }

    /** The columns this constraint reads. */
    public List<String> columns() {
        return Stream.of(left, right).filter(Objects::nonNull).toList();
    }

    /** Whether the values meet the constraint; a missing value (null) does not. */
    public boolean holds(Double leftColumn, Double rightColumn) {
        Double a = left == null ? Double.valueOf(leftValue) : leftColumn;
        Double b = right == null ? Double.valueOf(rightValue) : rightColumn;
        if (a == null || b == null) {
            return false;
        }
        return switch (op) {
            case "<" -> a < b;
            case "<=" -> a <= b;
            case ">" -> a > b;
            default -> a >= b;
        };
    }
}
