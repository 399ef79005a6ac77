package org.spanlift.io;

import org.spanlift.structure.LoadCase;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Optional;
import java.util.Set;

import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.input.Field;
import org.spanlift.input.TextFile;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;
import org.spanlift.input.quantity.QuantityKind;

/**
 * Reads a cases file ({@code .cases.yaml}): a list of load cases, each with its weight, load factor and
 * equivalent airspeed, altitude optional.
 *
 * <p>An unsymmetrical (rolling) case adds {@code aileron} (the right aileron's deflection, degrees, trailing
 * edge down) or {@code other-side} (the left half's share of the right half's air load, 0 to 1): the
 * fraction of the load factor and the deflection or share are the user's, from the applicable standard.
 *
 * <pre>
 * cases:
 *   - {name: pull-up at VA, weight: 1100kg, load-factor: 3.8, speed: 105kt}
 *   - {name: push-over at VC, weight: 1100kg, load-factor: -1.5, speed: 125kt, altitude: 2000ft}
 * </pre>
 */
public final class CasesReader {

    /** Keys accepted at the top of a cases file. */
    public static final Set<String> TOP_KEYS = Set.of("cases");
    /** Keys accepted in each item of {@code cases}. */
    public static final Set<String> CASE_KEYS = Set.of("name", "weight", "load-factor", "speed", "altitude",
            "aileron", "other-side");
    /** Load factors accepted, both signs. */
    public static final double MAX_LOAD_FACTOR = 15;
    /** Most cases in one file. */
    public static final int MAX_CASES = 500;

    private CasesReader() {
    }

    /** Reads and checks a cases file. */
    public static List<LoadCase> read(Path path) {
        String file = path.toString();
        return parse(TextFile.read(path, "cases file"), file);
    }

    /** Parses and checks a cases file's text; {@code file} names it in messages. */
    public static List<LoadCase> parse(String text, String file) {
        YamlValue tree = YamlParser.parse(text, file, "a list of load cases under the key cases");
        Field root = new Field(file, "", tree);
        root.mapping();
        root.allowOnly(TOP_KEYS);
        Field list = root.required("cases", "a list of load cases {name, weight, load-factor, speed, altitude}");
        List<Field> items = list.items();
        if (items.isEmpty() || items.size() > MAX_CASES) {
            throw list.error("expected from 1 to " + MAX_CASES + " cases, got " + items.size());
        }
        List<LoadCase> out = new ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            Field c = items.get(i);
            c.allowOnly(CASE_KEYS);
            String name = c.optional("name").map(Field::text).orElse("case " + (i + 1));
            double w = c.required("weight", "the aircraft weight with a unit, such as 1100kg").weight();
            double n = c.required("load-factor", "the load factor n (a plain number, negative for down loads)")
                    .inRange(-MAX_LOAD_FACTOR, MAX_LOAD_FACTOR);
            double v = Quantities.speed(c.required("speed", "the equivalent airspeed with a unit, such as 105kt"));
            double h = c.optional("altitude").map(a -> altitude(a)).orElse(0.0);
            if (c.has("aileron") && c.has("other-side")) {
                throw c.error("an unsymmetrical case takes either aileron (degrees, the right one trailing edge down) "
                        + "or other-side (the left half's share of the air load), not both");
            }
            Optional<LoadCase.Asymmetry> asymmetry = Optional.empty();
            if (c.has("aileron")) {
                asymmetry = Optional.of(new LoadCase.Asymmetry(OptionalDouble.of(Math.toRadians(
                        c.required("aileron", "").inRange(-45, 45))), OptionalDouble.empty()));
            } else if (c.has("other-side")) {
                asymmetry = Optional.of(new LoadCase.Asymmetry(OptionalDouble.empty(),
                        OptionalDouble.of(c.required("other-side", "").inRange(0, 1))));
            }
            out.add(new LoadCase(name, w, n, v, h, "given", asymmetry));
        }
        return out;
    }

    /** A pressure altitude with its unit, within the standard atmosphere's range. */
    static double altitude(Field f) {
        double h = f.quantity(QuantityKind.LENGTH);
        if (h < StandardAtmosphere.MIN_ALTITUDE || h > StandardAtmosphere.MAX_ALTITUDE) {
            throw f.error("a pressure altitude must be from " + Field.format(StandardAtmosphere.MIN_ALTITUDE)
                    + " m to " + Field.format(StandardAtmosphere.MAX_ALTITUDE) + " m, got " + f.text());
        }
        return h;
    }
}
