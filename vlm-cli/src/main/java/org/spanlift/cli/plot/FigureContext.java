package org.spanlift.cli.plot;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;

/**
 * The configuration a figure was drawn for, which its subtitle and caption state: every deflected control
 * (degrees, trailing edge down; an aileron's is the right one's, the left one deflecting the other way) and,
 * when a flight condition was given, the weight, the pressure altitude and the load factor (named only when
 * it is not 1). Immutable; the same values always give the same text.
 *
 * @param deflections      the deflected controls, in the wing's control order (undeflected ones are left out)
 * @param weight           the weight in N, when a flight condition was given
 * @param pressureAltitude the pressure altitude in m (stated only with a weight)
 * @param loadFactor       the load factor (stated only with a weight, and only when it is not 1)
 */
public record FigureContext(List<Deflection> deflections, OptionalDouble weight, double pressureAltitude,
        double loadFactor) {

    /** One deflected control: its name, its kind and its deflection in radians, trailing edge down. */
    public record Deflection(String control, ControlKind kind, double angle) {
    }

    public FigureContext {
        deflections = List.copyOf(deflections);
        if (!Double.isFinite(pressureAltitude) || !(loadFactor > 0) || !Double.isFinite(loadFactor)) {
            throw new IllegalArgumentException("a finite pressure altitude and a positive load factor are needed");
        }
        if (weight.isPresent() && !(weight.getAsDouble() > 0 && Double.isFinite(weight.getAsDouble()))) {
            throw new IllegalArgumentException("the weight must be positive, got " + weight.getAsDouble());
        }
    }

    /** No control deflected, no flight condition. */
    public static FigureContext undeflected() {
        return new FigureContext(List.of(), OptionalDouble.empty(), 0, 1);
    }

    /**
     * The configuration of a wing at the given deflections (rad, in control order) and, if given, flight
     * condition: the controls deflected there, and the condition's weight, pressure altitude and load factor.
     */
    public static FigureContext of(Wing wing, double[] deflections, Optional<FlightCondition> condition) {
        List<ControlSurface> controls = wing.controls();
        if (deflections.length != controls.size()) {
            throw new IllegalArgumentException("expected " + controls.size() + " deflections, got "
                    + deflections.length);
        }
        List<Deflection> deflected = new ArrayList<>();
        for (int i = 0; i < controls.size(); i++) {
            if (deflections[i] != 0) {
                deflected.add(new Deflection(controls.get(i).name(), controls.get(i).kind(), deflections[i]));
            }
        }
        return condition.map(c -> new FigureContext(deflected, OptionalDouble.of(c.weight()),
                c.atmosphere().pressureAltitude(), c.loadFactor()))
                .orElseGet(() -> new FigureContext(deflected, OptionalDouble.empty(), 0, 1));
    }

    /** The deflection of a control in radians, 0 when it is not deflected. */
    public double deflection(String control) {
        return deflections.stream().filter(d -> d.control().equals(control)).mapToDouble(Deflection::angle)
                .findFirst().orElse(0);
    }

    /**
     * The configuration on one line, as a figure's subtitle shows it, such as
     * {@code flap 20° trailing edge down  ·  weight 7355 N  ·  pressure altitude 0 m}.
     */
    public String text() {
        return String.join(Text.SEPARATOR, parts());
    }

    /** The configuration as a sentence for a figure's description, such as {@code Drawn for flap 20° ...}. */
    public String sentence() {
        return "Drawn for " + String.join("; ", parts()) + ".";
    }

    /** The deflections alone, such as {@code flap 20° trailing edge down}, or that none is deflected. */
    public String deflectionText() {
        if (deflections.isEmpty()) {
            return "no control deflected";
        }
        List<String> parts = new ArrayList<>();
        for (Deflection d : deflections) {
            parts.add(describe(d));
        }
        return String.join(", ", parts);
    }

    /**
     * The configurations of several wings on one line: {@code every wing: ...} when they agree, else each
     * wing's key and configuration, such as {@code A: no control deflected  ·  B: flap 15° trailing edge down}.
     */
    public static String text(List<String> keys, List<FigureContext> contexts) {
        return several(keys, contexts, Text.SEPARATOR);
    }

    /** As {@link #text(List, List)}, as a sentence for a description. */
    public static String sentence(List<String> keys, List<FigureContext> contexts) {
        return "Drawn for " + several(keys, contexts, "; ") + ".";
    }

    private static String several(List<String> keys, List<FigureContext> contexts, String separator) {
        if (keys.size() != contexts.size() || contexts.isEmpty()) {
            throw new IllegalArgumentException("one key per configuration, and at least one");
        }
        if (contexts.stream().map(FigureContext::text).distinct().count() == 1) {
            return (contexts.size() > 1 ? "every wing: " : "") + String.join(", ", contexts.get(0).parts());
        }
        List<String> out = new ArrayList<>();
        for (int i = 0; i < keys.size(); i++) {
            out.add(keys.get(i) + ": " + String.join(", ", contexts.get(i).parts()));
        }
        return String.join(separator, out);
    }

    private List<String> parts() {
        List<String> parts = new ArrayList<>();
        parts.add(deflectionText());
        if (weight.isPresent()) {
            parts.add(String.format(Locale.ROOT, "weight %.0f N", weight.getAsDouble()));
            parts.add(String.format(Locale.ROOT, "pressure altitude %.0f m", pressureAltitude));
            if (loadFactor != 1) {
                parts.add("load factor " + number(loadFactor));
            }
        }
        return parts;
    }

    private static String describe(Deflection d) {
        double deg = Math.toDegrees(d.angle());
        String size = number(Math.abs(deg)) + "\u00b0";
        if (d.kind() == ControlKind.AILERON) {
            return d.control() + " " + size + " (right trailing edge " + (deg > 0 ? "down" : "up") + ", left "
                    + (deg > 0 ? "up" : "down") + ")";
        }
        return d.control() + " " + size + " trailing edge " + (deg > 0 ? "down" : "up");
    }

    /** A number with at most two decimals and no trailing zeros: 20, 12.5, 2.25. */
    static String number(double v) {
        BigDecimal b = BigDecimal.valueOf(v).setScale(2, RoundingMode.HALF_EVEN).stripTrailingZeros();
        return b.scale() < 0 ? b.setScale(0).toPlainString() : b.toPlainString();
    }
}
