package org.spanlift.io;

import org.spanlift.structure.MassTable;
import org.spanlift.structure.PointMass;
import org.spanlift.structure.WingStructure;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import org.spanlift.geometry.Planform;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.input.Field;
import org.spanlift.input.TextFile;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;

/**
 * Reads the {@code structure} section of a wing file into a {@link WingStructure}. Lengths are in the
 * file's {@code units}; masses carry their unit ({@code 95kg}, {@code 210lb}).
 *
 * <pre>
 * structure:
 *   spar: 0.35              # chord fraction of the spar line (default 0.35)
 *   mass: 95kg              # the whole wing, both halves, spread in proportion to local chord
 *   mass-centre: 0.40       # chord fraction of the distributed mass's centre line (default 0.40)
 *   longitudinal-axis: 1.5  # degrees nose-up from the file's x axis (default: the root chord line)
 *   mass-table:             # instead of mass: one half's mass per unit span, linear between rows
 *     - {y: 0.0, mass-per-span: 14kg/m}
 *     - {y: 4.9, mass-per-span: 4kg/m}
 *   point-masses:           # on the right half, mirrored on the left; x or chord-fraction
 *     - {name: fuel, mass: 40kg, y: 1.2, x: 0.55}
 * </pre>
 */
public final class StructureReader {

    /** Keys of the {@code structure} section. */
    public static final Set<String> KEYS = Set.of("spar", "mass", "mass-centre", "mass-table", "point-masses",
            "longitudinal-axis");
    /** Keys of each row of {@code mass-table}. */
    public static final Set<String> TABLE_KEYS = Set.of("y", "mass-per-span");
    /** Keys of each item of {@code point-masses}. */
    public static final Set<String> POINT_KEYS = Set.of("name", "mass", "y", "x", "chord-fraction");

    private StructureReader() {
    }

    /**
     * The structure of a wing file already read into {@code wing}: its {@code structure} section, or
     * {@link WingStructure#NONE} when it has none.
     */
    public static WingStructure read(Path path, Wing wing) {
        String file = path.toString();
        return fromTree(YamlParser.parse(TextFile.read(path, "wing file"), file), file, wing);
    }

    /** The structure from a wing file's YAML tree. */
    public static WingStructure fromTree(YamlValue tree, String file, Wing wing) {
        Field root = new Field(file, "", tree);
        return root.optional("structure").map(s -> read(s, wing.displayUnit().metres(), wing.main()))
                .orElse(WingStructure.NONE);
    }

    /**
     * Reads and checks a {@code structure} field against the wing (the first surface), lengths scaled by
     * {@code k} to metres.
     */
    public static WingStructure read(Field f, double k, Surface wing) {
        f.allowOnly(KEYS);
        if (!wing.mirrored()) {
            throw f.error("loads are computed per half-wing: the first surface must be mirrored");
        }
        Planform p = wing.planform();
        double root = p.yStart();
        double tip = p.yEnd();
        double tol = 1e-9 * (tip - root);
        double spar = f.optional("spar").map(s -> s.inRange(0, 1)).orElse(WingStructure.DEFAULT_SPAR);
        double centre = f.optional("mass-centre").map(s -> s.inRange(0, 1)).orElse(WingStructure.DEFAULT_MASS_CENTRE);
        if (f.has("mass") && f.has("mass-table")) {
            throw f.required("mass-table", "").error("give either mass (the whole wing, spread by chord) or "
                    + "mass-table, not both");
        }
        Optional<Double> mass = f.optional("mass").map(Quantities::mass);
        Optional<MassTable> table = f.optional("mass-table").map(t -> {
            List<Field> rows = t.items();
            if (rows.size() < 2) {
                throw t.error("expected at least two rows {y, mass-per-span}, got " + rows.size());
            }
            double[] y = new double[rows.size()];
            double[] mu = new double[rows.size()];
            for (int i = 0; i < rows.size(); i++) {
                Field r = rows.get(i);
                r.allowOnly(TABLE_KEYS);
                Field yf = r.required("y", "the row's spanwise position");
                y[i] = yf.number() * k;
                if (y[i] < root - tol || y[i] > tip + tol) {
                    throw yf.error("must be on the wing, from " + Field.format(root / k) + " to "
                            + Field.format(tip / k) + ", got " + Field.format(yf.number()));
                }
                if (i > 0 && !(y[i] > y[i - 1])) {
                    throw yf.error("mass-table rows must be in increasing y; this row's y "
                            + Field.format(yf.number()) + " does not follow " + Field.format(y[i - 1] / k));
                }
                mu[i] = Quantities.massPerSpan(r.required("mass-per-span", "a mass per unit span such as 12kg/m"));
            }
            return new MassTable(y, mu);
        });
        List<PointMass> points = new ArrayList<>();
        f.optional("point-masses").ifPresent(list -> {
            if (list.items().isEmpty()) {
                throw list.error("an empty list; expected at least one point mass {name, mass, y, x}, or leave "
                        + "point-masses out");
            }
            for (Field pf : list.items()) {
                pf.allowOnly(POINT_KEYS);
                String name = pf.optional("name").map(Field::text).orElse("point mass " + (points.size() + 1));
                double m = Quantities.mass(pf.required("mass", "a mass with its unit, such as 40kg"));
                Field yf = pf.required("y", "its spanwise position on the right half");
                double y = yf.number() * k;
                if (!(y > root + tol) || y > tip + tol) {
                    throw yf.error("a point mass must be on the half-wing, y above " + Field.format(root / k)
                            + " and up to the tip " + Field.format(tip / k) + ", got " + Field.format(yf.number()));
                }
                y = Math.min(y, tip);
                boolean hasX = pf.has("x");
                boolean hasFraction = pf.has("chord-fraction");
                if (hasX == hasFraction) {
                    throw pf.error("give its chordwise position as x (wing axes, aft) or chord-fraction, one of them");
                }
                double x = hasX ? chordwise(pf.required("x", ""), k)
                        : p.noseX(y) + pf.required("chord-fraction", "").inRange(0, 1) * p.chord(y);
                points.add(new PointMass(name, m, x, y));
            }
        });
        OptionalDouble axis = f.optional("longitudinal-axis")
                .map(a -> OptionalDouble.of(Math.toRadians(a.inRange(-30, 30))))
                .orElse(OptionalDouble.empty());
        return new WingStructure(spar, centre, mass, table, points, axis);
    }

    /** A point mass's x in metres, within the lengths a wing file accepts. */
    private static double chordwise(Field f, double k) {
        double x = f.number() * k;
        if (!(Math.abs(x) <= WingFileReader.MAX_LENGTH_M)) {
            throw f.error("is " + Field.brief(f.number()) + ", beyond any wing; expected an x within "
                    + Field.brief(WingFileReader.MAX_LENGTH_M / k) + " of the origin, in the file's units");
        }
        return x;
    }
}
