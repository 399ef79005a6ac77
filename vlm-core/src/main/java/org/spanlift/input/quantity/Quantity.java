package org.spanlift.input.quantity;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * A dimensional value read from text, held in SI.
 *
 * @param value the value in the SI unit of its kind ({@link QuantityKind#siUnit()})
 * @param kind what the value measures
 * @param text the text it was read from
 */
public record Quantity(double value, QuantityKind kind, String text) {

    private static final Pattern NON_FINITE = Pattern.compile("[+-]?(?i:nan|inf)");
    /** The most characters of a text a message shows. */
    private static final int SHOWN = 40;

    /** Refuses a missing kind or text and a value that is not finite. */
    public Quantity {
        if (kind == null || text == null) {
            throw new IllegalArgumentException("a quantity needs a kind and its text");
        }
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("a quantity must be finite, got " + value);
        }
    }

    /**
     * Reads a number followed by a unit symbol of the given kind, such as {@code 6000N},
     * {@code 1350lb} or {@code 1e3 N}: at most one space between number and unit, surrounding
     * white space ignored, the number in the one syntax of {@link Decimal} (decimal point and an exponent
     * of at most three digits allowed), no sign restriction.
     *
     * @param text the quantity as typed
     * @param kind what it must measure
     * @return the quantity in SI
     * @throws QuantityFormatException with a one-line message saying what was expected
     */
    public static Quantity parse(String text, QuantityKind kind) {
        String expected = "expected a " + kind.description() + " with a unit (" + kind.unitList() + "), got ";
        String body = text == null ? "" : text.strip();
        if (body.isEmpty()) {
            throw new QuantityFormatException(expected + "an empty string");
        }
        String given = expected + quote(text);
        if (NON_FINITE.matcher(body).lookingAt()) {
            throw new QuantityFormatException(given + ": the number must be finite");
        }
        Optional<String> number = Decimal.leading(body);
        if (number.isEmpty()) {
            throw new QuantityFormatException(given + ": it does not start with a number");
        }
        Optional<String> syntax = Decimal.problem(number.get());
        if (syntax.isPresent()) {
            throw new QuantityFormatException(given + ": " + syntax.get() + " before the unit");
        }
        double magnitude = Double.parseDouble(number.get());
        if (!Double.isFinite(magnitude)) {
            throw new QuantityFormatException(given + ": the number must be finite");
        }
        String rest = body.substring(number.get().length());
        String unit = rest.startsWith(" ") ? rest.substring(1) : rest;
        if (unit.isEmpty()) {
            throw new QuantityFormatException(given);
        }
        if (Character.isWhitespace(unit.charAt(0))) {
            throw new QuantityFormatException(
                    given + ": only one space, and no other white space, may separate the number and the unit");
        }
        if (!kind.accepts(unit)) {
            throw new QuantityFormatException(given + ": " + whyNot(unit, kind));
        }
        double si = magnitude * kind.siPerUnit(unit);
        if (!Double.isFinite(si)) {
            throw new QuantityFormatException(given + ": the number must be finite");
        }
        return new Quantity(si, kind, text);
    }

    /**
     * Reads a weight: a force ({@code N, kN, kgf, lbf, lb}) or a mass ({@code kg, g}) under standard gravity.
     *
     * @param text the weight as typed, such as {@code 1100kg} or {@code 2400lb}
     * @return the weight in newtons, positive and within {@link PhysicalRange#WEIGHT}
     * @throws QuantityFormatException with a one-line message saying what was expected
     */
    public static double weight(String text) {
        double newtons;
        try {
            newtons = parse(text, QuantityKind.FORCE).value();
        } catch (QuantityFormatException force) {
            try {
                newtons = parse(text, QuantityKind.MASS).value() * ExactFactors.KILOGRAM_FORCE;
            } catch (QuantityFormatException mass) {
                throw new QuantityFormatException(force.getMessage() + ", or a mass in kg");
            }
        }
        if (!(newtons > 0)) {
            throw new QuantityFormatException("a weight must be positive, got " + quote(text));
        }
        return PhysicalRange.WEIGHT.check(newtons, text);
    }

    /**
     * @param unit an accepted unit symbol of this quantity's kind
     * @return the value expressed in that unit
     * @throws QuantityFormatException for a symbol the kind does not accept
     */
    public double in(String unit) {
        return value / kind.siPerUnit(unit);
    }

    /**
     * @param unit an accepted unit symbol of this quantity's kind
     * @return the value written in that unit, as {@link QuantityKind#format} writes it
     * @throws QuantityFormatException for a symbol the kind does not accept
     */
    public String format(String unit) {
        return kind.format(value, unit);
    }

    private static String whyNot(String unit, QuantityKind kind) {
        List<QuantityKind> owners = Arrays.stream(QuantityKind.values()).filter(k -> k.accepts(unit)).toList();
        if (!owners.isEmpty()) {
            String others = owners.stream().map(QuantityKind::description).collect(Collectors.joining(" or "));
            String reason = quote(unit) + " is a " + others + " unit";
            if (kind == QuantityKind.FORCE && unit.equals("kg")) {
                reason += "; write a weight in kilograms as kgf";
            }
            return reason;
        }
        String reason = quote(unit) + " is not a " + kind.description() + " unit";
        return kind.caseInsensitiveMatch(unit)
                .map(match -> reason + " (units are case-sensitive: " + match + "?)")
                .orElse(reason);
    }

    /**
     * Quotes text for a one-line message, escaping line breaks and other control characters; text longer
     * than {@value #SHOWN} characters is cut short with an ellipsis.
     */
    static String quote(String text) {
        StringBuilder quoted = new StringBuilder("\"");
        String shown = text.length() > SHOWN ? text.substring(0, SHOWN - 3) : text;
        for (char c : shown.toCharArray()) {
            if (c == '\n') {
                quoted.append("\\n");
            } else if (c == '\r') {
                quoted.append("\\r");
            } else if (c == '\t') {
                quoted.append("\\t");
            } else if (Character.isISOControl(c)) {
                quoted.append(String.format("\\u%04x", (int) c));
            } else {
                quoted.append(c);
            }
        }
        return quoted.append(shown.length() < text.length() ? "...\"" : "\"").toString();
    }
}
