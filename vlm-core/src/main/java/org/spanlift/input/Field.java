package org.spanlift.input;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import org.spanlift.input.quantity.Decimal;
import org.spanlift.input.quantity.PhysicalRange;
import org.spanlift.input.quantity.Quantity;
import org.spanlift.input.quantity.QuantityFormatException;
import org.spanlift.input.quantity.QuantityKind;

/**
 * A value of an input file together with where it is (file, line, dotted field path), with typed readers
 * that fail with an {@link InputException} naming that place and what was expected.
 */
public final class Field {

    private final String file;
    private final String path;
    private final YamlValue value;
    /** The line of the key this value belongs to, 0 when it has none (the document, a list item). */
    private final int keyLine;

    /** A field of the given file at the dotted path, holding the value. */
    public Field(String file, String path, YamlValue value) {
        this(file, path, value, 0);
    }

    private Field(String file, String path, YamlValue value, int keyLine) {
        this.file = file;
        this.path = path;
        this.value = value;
        this.keyLine = keyLine;
    }

    /** The file the value was read from, as messages name it. */
    public String file() {
        return file;
    }

    /** The dotted field path of the value, empty for the whole document. */
    public String path() {
        return path;
    }

    /**
     * The line messages about this field name: a scalar's own line; for a list or mapping given under a key,
     * the key's line (a block list or mapping starts on the line after its key).
     */
    public int line() {
        return value instanceof YamlValue.Scalar || keyLine <= 0 ? value.line() : keyLine;
    }

    /** The value itself. */
    public YamlValue value() {
        return value;
    }

    /** An error at this field. */
    public InputException error(String problem) {
        return new InputException(file, line(), path, problem);
    }

    private String child(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    /**
     * The value as a mapping. A whole document that is not a mapping is refused without showing any of its
     * text: it may be any file at all, and its content is not for a message to echo.
     */
    public YamlValue.Mapping mapping() {
        if (value instanceof YamlValue.Mapping m) {
            return m;
        }
        if (path.isEmpty() && value instanceof YamlValue.Scalar) {
            throw error("the file holds plain text rather than keys with values; expected a mapping of keys (is "
                    + "this the right file?)");
        }
        throw error("expected a mapping of keys, got " + value.describe());
    }

    /** Refuses keys outside {@code allowed}, naming the first unknown one and the keys accepted. */
    public Field allowOnly(Set<String> allowed) {
        for (YamlValue.Entry e : mapping().entries()) {
            if (!allowed.contains(e.key())) {
                throw new InputException(file, e.keyLine(), child(e.key()),
                        "unknown key; expected one of " + String.join(", ", allowed.stream().sorted().toList()));
            }
        }
        return this;
    }

    /** Whether the mapping has the key (with a value or, wrongly, without one). */
    public boolean has(String key) {
        return mapping().entry(key).isPresent();
    }

    private static boolean isNull(YamlValue v) {
        return v instanceof YamlValue.Scalar s && s.isNull();
    }

    /**
     * The key's field when the key is given. A key written without a value is refused: leaving a value out
     * by mistake must not silently select the default.
     */
    public Optional<Field> optional(String key) {
        Optional<YamlValue.Entry> e = mapping().entry(key);
        if (e.isEmpty()) {
            return Optional.empty();
        }
        if (isNull(e.get().value())) {
            throw new InputException(file, e.get().keyLine(), child(key),
                    "the key has no value; expected a value, or leave the key out for the default");
        }
        return Optional.of(new Field(file, child(key), e.get().value(), e.get().keyLine()));
    }

    /** The key's field; a missing key, or one without a value, is refused with what is expected. */
    public Field required(String key, String expected) {
        Optional<YamlValue.Entry> e = mapping().entry(key);
        if (e.isEmpty()) {
            throw new InputException(file, line(), child(key), "missing key; expected " + expected);
        }
        if (isNull(e.get().value())) {
            throw new InputException(file, e.get().keyLine(), child(key), "the key has no value; expected "
                    + expected);
        }
        return new Field(file, child(key), e.get().value(), e.get().keyLine());
    }

    /** The items of a list, each with its index in the path; anything else is refused. */
    public List<Field> items() {
        if (!(value instanceof YamlValue.Sequence seq)) {
            throw error("expected a list, got " + value.describe());
        }
        List<Field> out = new ArrayList<>();
        for (int i = 0; i < seq.items().size(); i++) {
            out.add(new Field(file, path + "[" + i + "]", seq.items().get(i)));
        }
        return out;
    }

    /** The keys of a mapping with their fields, in file order. */
    public List<Field> entries() {
        List<Field> out = new ArrayList<>();
        for (YamlValue.Entry e : mapping().entries()) {
            out.add(new Field(file, child(e.key()), e.value(), e.keyLine()));
        }
        return out;
    }

    /** The value as text; a missing value, a list or a mapping is refused. */
    public String text() {
        if (value instanceof YamlValue.Scalar s && !s.isNull()) {
            return s.text();
        }
        throw error("expected a text value, got " + value.describe());
    }

    /**
     * A finite number, in the one syntax of every file ({@link Decimal}: a decimal number with an exponent
     * of at most three digits; no hexadecimal, type suffix or digit separator).
     */
    public double number() {
        if (!(value instanceof YamlValue.Scalar s) || s.isNull()) {
            throw error("expected a number, got " + value.describe());
        }
        String t = s.text().trim();
        Optional<String> problem = Decimal.problem(t);
        if (!s.plain()) {
            throw error("expected a number, got " + s.describe()
                    + (problem.isEmpty() ? "; write numbers without quotes" : ""));
        }
        if (problem.isPresent()) {
            // A word for infinity or NaN is shown as written; anything else as the file has it, cut short.
            throw error(problem.get() + ", got " + (problem.get().equals(Decimal.NOT_FINITE) ? t : s.describe()));
        }
        double d = Double.parseDouble(t);
        if (!Double.isFinite(d)) {
            throw error("expected a finite number, got " + t + " (beyond the range of numbers, about 1.8e308)");
        }
        return d;
    }

    /** A finite number greater than zero. */
    public double positive() {
        double d = number();
        if (!(d > 0)) {
            throw error("must be positive, got " + format(d));
        }
        return d;
    }

    /** A number within [lo, hi]. */
    public double inRange(double lo, double hi) {
        double d = number();
        if (d < lo || d > hi) {
            throw error("must be from " + format(lo) + " to " + format(hi) + ", got " + format(d));
        }
        return d;
    }

    /** A whole number within [lo, hi]. */
    public int integer(int lo, int hi) {
        double d = number();
        if (d != Math.rint(d)) {
            throw error("expected a whole number, got " + format(d));
        }
        if (d < lo || d > hi) {
            throw error("must be from " + lo + " to " + hi + ", got " + format(d));
        }
        return (int) d;
    }

    /** {@code true} or {@code false} (case-insensitive, unquoted). */
    public boolean bool() {
        if (value instanceof YamlValue.Scalar s && s.plain()) {
            String t = s.text().toLowerCase(Locale.ROOT);
            if (t.equals("true")) {
                return true;
            }
            if (t.equals("false")) {
                return false;
            }
        }
        throw error("expected true or false, got " + value.describe());
    }

    /** One of the given words (case-insensitive), returned in lower case. */
    public String choice(List<String> words) {
        String t = text().trim().toLowerCase(Locale.ROOT);
        if (!words.contains(t)) {
            throw error("expected one of " + String.join(", ", words) + ", got '" + shown(text()) + "'");
        }
        return t;
    }

    /** A list of exactly n numbers. */
    public double[] numbers(int n) {
        List<Field> list = items();
        if (list.size() != n) {
            throw error("expected a list of " + n + " numbers, got " + list.size());
        }
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = list.get(i).number();
        }
        return out;
    }

    /**
     * A quantity of the given kind with its unit ({@code 95kg}, {@code 9800ft}), in SI.
     *
     * @throws InputException at this field, with the units accepted
     */
    public double quantity(QuantityKind kind) {
        try {
            return Quantity.parse(text(), kind).value();
        } catch (QuantityFormatException e) {
            throw error(e.getMessage());
        }
    }

    /**
     * A quantity within its physical range ({@code 102kt}, {@code 40kg}), in SI.
     *
     * @throws InputException at this field, with the units accepted or the range
     */
    public double quantity(PhysicalRange range) {
        try {
            return range.parse(text());
        } catch (QuantityFormatException e) {
            throw error(e.getMessage());
        }
    }

    /**
     * A weight: a force (N, kN, kgf, lbf, lb) or a mass (kg, g) under standard gravity; newtons, within
     * {@link PhysicalRange#WEIGHT}.
     *
     * @throws InputException at this field
     */
    public double weight() {
        try {
            return Quantity.weight(text());
        } catch (QuantityFormatException e) {
            throw error(e.getMessage());
        }
    }

    /**
     * A number for a message, short whatever its size: four significant digits at most, plain from 1e-4 to
     * 1e7 ({@code 0.003281}, {@code 4.9}), with an exponent beyond, in the files' own syntax ({@code 1e200},
     * {@code 4.941e-324}).
     */
    public static String brief(double d) {
        if (!Double.isFinite(d)) {
            return String.valueOf(d);
        }
        if (d == 0) {
            return "0";
        }
        double a = Math.abs(d);
        if (a >= 1e-4 && a < 1e7) {
            return new BigDecimal(d).round(new MathContext(4)).stripTrailingZeros().toPlainString();
        }
        String[] parts = String.format(Locale.ROOT, "%.3e", d).split("e");
        String mantissa = parts[0].replaceAll("0+$", "").replaceAll("\\.$", "");
        return mantissa + "e" + Integer.parseInt(parts[1]);
    }

    /**
     * Text of a file for a message, cut short: at most 40 characters, the rest replaced by an ellipsis.
     */
    public static String shown(String text) {
        return text.length() > 40 ? text.substring(0, 37) + "..." : text;
    }

    /** A number for a message: a whole number under 1e15 in size without a decimal point, else as Java prints it. */
    public static String format(double d) {
        return d == Math.rint(d) && Math.abs(d) < 1e15 ? String.valueOf((long) d) : String.valueOf(d);
    }
}
