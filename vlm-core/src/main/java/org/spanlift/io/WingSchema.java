package org.spanlift.io;

import java.util.Map;

import org.spanlift.input.YamlSchema;
import org.spanlift.input.YamlSchema.Kind;
import org.spanlift.input.YamlSchema.Node;

/**
 * The shape of a wing file, built from the reader's public key sets: which keys hold mappings, which
 * hold lists (and whether their elements are chosen by name), and which hold plain values. A sweep's
 * parameter paths are checked against it, so a key the base file leaves to its default can be swept.
 * Every key of a key set that is not listed here as structured is a plain value.
 */
public final class WingSchema {

    /** The root of a wing file. */
    public static final Node ROOT;

    static {
        Node reference = YamlSchema.mapping(WingFileReader.REFERENCE_KEYS, Map.of("moment-point", Node.NUMBERS), false);
        Node station = YamlSchema.mapping(WingFileReader.STATION_KEYS, Map.of(), false);
        Node trapezoid = YamlSchema.mapping(WingFileReader.TRAPEZOID_KEYS, Map.of("root-nose", Node.NUMBERS), false);
        Node elliptic = YamlSchema.mapping(WingFileReader.ELLIPTIC_KEYS, Map.of("root-nose", Node.NUMBERS), false);
        Node control = YamlSchema.mapping(WingFileReader.CONTROL_KEYS, Map.of("limits", Node.NUMBERS), false);
        Node lattice = YamlSchema.mapping(WingFileReader.LATTICE_KEYS, Map.of(), false);
        Node surface = YamlSchema.mapping(WingFileReader.SURFACE_KEYS, Map.of(
                "stations", new Node(Kind.INDEXED_LIST, Map.of(), station, false),
                "trapezoid", trapezoid,
                "elliptic", elliptic,
                "controls", new Node(Kind.NAMED_LIST, Map.of(), control, false),
                "lattice", lattice), false);
        Node clMaxTable = YamlSchema.mapping(SectionReader.CL_MAX_TABLE_KEYS,
                Map.of("reynolds", Node.NUMBERS, "values", Node.NUMBERS), true);
        Node flap = YamlSchema.mapping(SectionReader.FLAP_KEYS,
                Map.of("deflection", Node.NUMBERS, "increment", Node.NUMBERS),
                false);
        Node polar = YamlSchema.mapping(SectionReader.POLAR_KEYS, Map.of("reynolds", Node.NUMBERS, "cl", Node.NUMBERS,
                "cd", new Node(Kind.INDEXED_LIST, Map.of(), Node.NUMBERS, true)), false);
        // A curve's cl is one list of numbers, or with reynolds a list of such lists: cl[3] names a value of
        // the first form, cl[0][3] one of the second.
        Node clRows = new Node(Kind.INDEXED_LIST, Map.of(), Node.VALUE, true);
        Node curveCl = new Node(Kind.INDEXED_LIST, Map.of(), clRows, false);
        Node liftCurve = YamlSchema.mapping(SectionLiftCurveReader.LIFT_CURVE_KEYS, Map.of("reynolds", Node.NUMBERS,
                "alpha", Node.NUMBERS, "cl", curveCl), false);
        Node flapCurve = YamlSchema.mapping(SectionLiftCurveReader.FLAP_CURVE_KEYS, Map.of("reynolds", Node.NUMBERS,
                "alpha", Node.NUMBERS, "cl", curveCl), false);
        Node section = YamlSchema.mapping(WingFileReader.SECTION_KEYS, Map.of("cl-max", clMaxTable, "flap-cl-max", flap,
                "drag-polar", polar, "lift-curve", liftCurve,
                "flap-lift-curves", new Node(Kind.INDEXED_LIST, Map.of(), flapCurve, false)), false);
        ROOT = YamlSchema.mapping(WingFileReader.TOP_KEYS, Map.of(
                "reference", reference,
                "surfaces", new Node(Kind.NAMED_LIST, Map.of(), surface, false),
                "fuselage", YamlSchema.mapping(WingFileReader.FUSELAGE_KEYS, Map.of(), false),
                "thrust-line", YamlSchema.mapping(WingFileReader.THRUST_LINE_KEYS, Map.of(), false),
                "sections", new Node(Kind.NAMED_MAPPING, Map.of(), section, false)), false);
    }

    private WingSchema() {
    }
}
