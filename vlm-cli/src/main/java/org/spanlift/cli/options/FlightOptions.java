package org.spanlift.cli.options;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;
import org.spanlift.io.InputException;

import picocli.CommandLine.Option;

/**
 * The flight-condition options shared by the commands that solve a condition. Deflections are in
 * degrees, trailing edge down; an aileron's is the right one's.
 */
public final class FlightOptions {

    @Option(names = "--deflect", paramLabel = "NAME=DEG",
            description = "Deflect one control by DEG degrees (trailing edge down; an aileron's is the right "
                    + "one's), overriding the wing file. Repeatable.")
    List<String> deflect = List.of();

    @Option(names = "--flaps", paramLabel = "DEG",
            description = "Deflect every control of kind flap by DEG degrees.")
    Double flaps;

    /**
     * The deflections asked for on the command line, in radians by control name: first --flaps for every
     * flap, then each --deflect.
     *
     * @throws InputException for a malformed value or a control the wing does not have
     */
    public Map<String, Double> deflections(Wing wing) {
        Map<String, Double> out = new LinkedHashMap<>();
        if (flaps != null) {
            checkAngle("--flaps", flaps);
            List<ControlSurface> flapList = wing.controls().stream().filter(c -> c.kind() == ControlKind.FLAP).toList();
            if (flapList.isEmpty()) {
                throw new InputException("--flaps", 0, "", "the wing has no control of kind flap");
            }
            flapList.forEach(c -> out.put(c.name(), Math.toRadians(flaps)));
        }
        for (String d : deflect) {
            int eq = d.indexOf('=');
            if (eq <= 0) {
                throw new InputException("--deflect", 0, "", "expected NAME=DEG (such as flap=20), got '" + d + "'");
            }
            String name = d.substring(0, eq).trim();
            double deg;
            try {
                deg = Double.parseDouble(d.substring(eq + 1).trim());
            } catch (NumberFormatException e) {
                throw new InputException("--deflect", 0, name, "expected the deflection in degrees, got '"
                        + d.substring(eq + 1) + "'");
            }
            checkAngle("--deflect " + name, deg);
            if (wing.control(name).isEmpty()) {
                List<String> names = wing.controls().stream().map(ControlSurface::name).toList();
                throw new InputException("--deflect", 0, name, "the wing has no control of that name; it has "
                        + (names.isEmpty() ? "none" : String.join(", ", names)));
            }
            out.put(name, Math.toRadians(deg));
        }
        return out;
    }

    private static void checkAngle(String option, double deg) {
        if (!Double.isFinite(deg) || Math.abs(deg) > 45) {
            throw new InputException(option, 0, "", "expected a deflection from -45 to 45 degrees, got " + deg);
        }
    }
}
