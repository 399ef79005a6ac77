package org.spanlift.cli.options;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.atmosphere.Airspeed;
import org.spanlift.atmosphere.AtmosphereState;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.flight.FlightCondition;
import org.spanlift.flight.ReynoldsRule;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;
import org.spanlift.input.Field;
import org.spanlift.input.InputException;
import org.spanlift.input.quantity.Decimal;
import org.spanlift.input.quantity.PhysicalRange;
import org.spanlift.input.quantity.Quantity;
import org.spanlift.input.quantity.QuantityFormatException;
import org.spanlift.input.quantity.QuantityKind;

import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;

/**
 * The flight-condition options shared by the commands that solve a condition. Dimensional values carry
 * a unit suffix ({@code 1100kg}, {@code 2400lb}, {@code 9800ft}, {@code 90kt}); deflections are in degrees,
 * trailing edge down, an aileron's being the right one's.
 */
public final class FlightOptions {

    /** The largest control deflection accepted, degrees. */
    static final double MAX_DEFLECTION = 45;

    @Option(names = "--weight", paramLabel = "W",
            description = "Aircraft weight with a unit: a force (N, kN, kgf, lbf, lb) or a mass (kg), "
                    + "such as 1100kg or 2400lb.")
    String weight;

    @Option(names = "--altitude", paramLabel = "H", defaultValue = "0m",
            description = "Pressure altitude with a unit (m, ft), standard atmosphere. Default: ${DEFAULT-VALUE}.")
    String altitude;

    @Option(names = "--isa-offset", paramLabel = "DT", defaultValue = "0K",
            description = "Temperature offset from the standard atmosphere, kelvin (15K). Default: ${DEFAULT-VALUE}.")
    String isaOffset;

    @ArgGroup(exclusive = true, multiplicity = "0..1")
    Speed speed;

    /** The airspeed: equivalent (the default) or true. */
    static final class Speed {
        @Option(names = "--speed", paramLabel = "V", required = true,
                description = "Equivalent airspeed with a unit (m/s, km/h, kt, mph), such as 90kt.")
        String equivalent;

        @Option(names = "--true-speed", paramLabel = "V", required = true,
                description = "True airspeed with a unit, instead of --speed.")
        String trueSpeed;
    }

    @Option(names = "--load-factor", paramLabel = "N", defaultValue = "1",
            description = "Load factor n (lift over weight). Default: ${DEFAULT-VALUE}.")
    String loadFactor;

    @Option(names = "--deflect", paramLabel = "NAME=DEG",
            description = "Deflect one control by DEG degrees (trailing edge down; an aileron's is the right "
                    + "one's), overriding the wing file. Repeatable.")
    List<String> deflect = List.of();

    @Option(names = "--flaps", paramLabel = "DEG",
            description = "Deflect every control of kind flap by DEG degrees (trailing edge down), from -45 to 45.")
    String flaps;

    /**
     * The deflections asked for on the command line, in radians by control name: first --flaps for every
     * flap, then each --deflect.
     *
     * @throws InputException for a malformed value or a control the wing does not have
     */
    public Map<String, Double> deflections(Wing wing) {
        Map<String, Double> out = new LinkedHashMap<>();
        if (flaps != null) {
            double flapsDeg = Angles.parse("--flaps", flaps, "a flap deflection", MAX_DEFLECTION);
            List<ControlSurface> flapList = wing.controls().stream().filter(c -> c.kind() == ControlKind.FLAP).toList();
            if (flapList.isEmpty()) {
                throw new InputException("--flaps", 0, "", "the wing has no control of kind flap");
            }
            flapList.forEach(c -> out.put(c.name(), Math.toRadians(flapsDeg)));
        }
        for (String d : deflect) {
            int eq = d.indexOf('=');
            if (eq <= 0) {
                throw new InputException("--deflect", 0, "", "expected NAME=DEG (such as flap=20), got '" + d + "'");
            }
            String name = d.substring(0, eq).trim();
            double deg = Angles.parse("--deflect " + name, d.substring(eq + 1), "a deflection", MAX_DEFLECTION);
            if (wing.control(name).isEmpty()) {
                List<String> names = wing.controls().stream().map(ControlSurface::name).toList();
                throw new InputException("--deflect", 0, name, "the wing has no control of that name; it has "
                        + (names.isEmpty() ? "none" : String.join(", ", names)));
            }
            out.put(name, Math.toRadians(deg));
        }
        return out;
    }

    /** The flap setting asked for with {@code --flaps}, degrees. */
    public OptionalDouble flapsDeg() {
        return flaps == null ? OptionalDouble.empty()
                : OptionalDouble.of(Angles.parse("--flaps", flaps, "a flap deflection", MAX_DEFLECTION));
    }

    /**
     * The atmosphere at the given pressure altitude and offset, each checked against its range (the
     * standard atmosphere's altitudes; {@link PhysicalRange#TEMPERATURE_OFFSET}) and refused under its own
     * option.
     */
    public AtmosphereState atmosphere() {
        double h = quantity("--altitude", altitude, QuantityKind.LENGTH);
        if (!(h >= StandardAtmosphere.MIN_ALTITUDE && h <= StandardAtmosphere.MAX_ALTITUDE)) {
            throw new InputException("--altitude", 0, "", "a pressure altitude must be from "
                    + Field.brief(StandardAtmosphere.MIN_ALTITUDE) + " m to "
                    + Field.brief(StandardAtmosphere.MAX_ALTITUDE) + " m (geopotential, the standard atmosphere's "
                    + "range), got " + Field.brief(h) + " m");
        }
        double dt;
        try {
            dt = PhysicalRange.TEMPERATURE_OFFSET.parse(isaOffset);
        } catch (QuantityFormatException e) {
            throw new InputException("--isa-offset", 0, "", e.getMessage());
        }
        try {
            return StandardAtmosphere.at(h, dt);
        } catch (IllegalArgumentException e) {
            throw new InputException("--isa-offset", 0, "", e.getMessage());
        }
    }

    /** The weight in newtons, if given. */
    public OptionalDouble weightNewtons() {
        if (weight == null) {
            return OptionalDouble.empty();
        }
        try {
            return OptionalDouble.of(Quantity.weight(weight)); // within PhysicalRange.WEIGHT
        } catch (QuantityFormatException e) {
            throw new InputException("--weight", 0, "", e.getMessage());
        }
    }

    /**
     * The equivalent airspeed in m/s, if a speed was given (a true speed is converted); the speed typed must
     * lie within {@link PhysicalRange#SPEED}.
     */
    public OptionalDouble equivalentSpeed(AtmosphereState atmosphere) {
        if (speed == null) {
            return OptionalDouble.empty();
        }
        double v = speed.equivalent != null ? speed("--speed", speed.equivalent)
                : Airspeed.equivalentFromTrue(speed("--true-speed", speed.trueSpeed), atmosphere);
        return OptionalDouble.of(v);
    }

    private static double speed(String option, String text) {
        try {
            return PhysicalRange.SPEED.parse(text);
        } catch (QuantityFormatException e) {
            throw new InputException(option, 0, "", e.getMessage());
        }
    }

    /** The load factor, checked: a decimal number above 0 and up to 15. */
    public double loadFactor() {
        double n;
        try {
            n = Decimal.parse(loadFactor);
        } catch (QuantityFormatException e) {
            throw new InputException("--load-factor", 0, "", e.getMessage());
        }
        if (!(n > 0 && n <= 15)) {
            throw new InputException("--load-factor", 0, "", "expected a load factor above 0 and up to 15, got "
                    + loadFactor.strip());
        }
        return n;
    }

    /** The flight condition when a weight is given. */
    public Optional<FlightCondition> condition() {
        OptionalDouble w = weightNewtons();
        if (w.isEmpty()) {
            return Optional.empty();
        }
        AtmosphereState atm = atmosphere();
        return Optional.of(new FlightCondition(w.getAsDouble(), loadFactor(), atm, equivalentSpeed(atm)));
    }

    /** The Reynolds-number rule of these options for the section polars (see {@link ReynoldsRule}). */
    public ReynoldsRule reynoldsRule(Wing wing) {
        AtmosphereState atm = atmosphere();
        return ReynoldsRule.of(wing.reference(), atm, equivalentSpeed(atm), condition());
    }

    private static double quantity(String option, String text, QuantityKind kind) {
        try {
            return Quantity.parse(text, kind).value();
        } catch (QuantityFormatException e) {
            throw new InputException(option, 0, "", e.getMessage());
        }
    }

    /**
     * Refuses any of the named options given on this command line, with the reason it does not apply.
     *
     * @throws InputException naming the first option given
     */
    public static void refuse(CommandSpec spec, String reason, String... options) {
        for (String o : options) {
            if (spec.commandLine().getParseResult().hasMatchedOption(o)) {
                throw new InputException(o, 0, "", "does not apply to " + spec.name() + ": " + reason);
            }
        }
    }
}
