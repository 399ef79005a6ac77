package org.spanlift.sweep;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import org.spanlift.io.SectionReader;
import org.spanlift.io.WingFileReader;

/**
 * The shape of a wing file, built from the reader's public key sets: which keys hold mappings, which
 * hold lists (and whether their elements are chosen by name), and which hold plain values. A sweep's
 * parameter paths are checked against it, so a key the base file leaves to its default can be swept.
 * Every key of a key set that is not listed here as structured is a plain value.
 */
final class WingSchema {

    /** What a key of the wing file holds. */
    enum Kind {
        /** A mapping with fixed keys. */
        MAPPING,
        /** A mapping whose keys are names chosen by the file (the sections). */
        NAMED_MAPPING,
        /** A list whose elements are mappings with a {@code name}. */
        NAMED_LIST,
        /** A list whose elements are chosen by index. */
        INDEXED_LIST,
        /** A plain value (number or text). */
        VALUE
    }

    /**
     * One node of the schema.
     *
     * @param kind     what the key holds
     * @param keys     the keys of a mapping (for the lists, the keys of each element)
     * @param element  the element of a list or of a named mapping
     * @param leaf     true when a plain value may stand here too (cl-max: a number or a table)
     */
    record Node(Kind kind, Map<String, Node> keys, Node element, boolean leaf) {

        static final Node VALUE = new Node(Kind.VALUE, Map.of(), null, true);
        static final Node NUMBERS = new Node(Kind.INDEXED_LIST, Map.of(), VALUE, false);

        Set<String> keyNames() {
            return new TreeSet<>(keys.keySet());
        }
    }

    static final Node ROOT;

    static {
        Node reference = mapping(WingFileReader.REFERENCE_KEYS, Map.of("moment-point", Node.NUMBERS), false);
        Node station = mapping(WingFileReader.STATION_KEYS, Map.of(), false);
        Node trapezoid = mapping(WingFileReader.TRAPEZOID_KEYS, Map.of("root-nose", Node.NUMBERS), false);
        Node elliptic = mapping(WingFileReader.ELLIPTIC_KEYS, Map.of("root-nose", Node.NUMBERS), false);
        Node control = mapping(WingFileReader.CONTROL_KEYS, Map.of(), false);
        Node lattice = mapping(WingFileReader.LATTICE_KEYS, Map.of(), false);
        Node surface = mapping(WingFileReader.SURFACE_KEYS, Map.of(
                "stations", new Node(Kind.INDEXED_LIST, Map.of(), station, false),
                "trapezoid", trapezoid,
                "elliptic", elliptic,
                "controls", new Node(Kind.NAMED_LIST, Map.of(), control, false),
                "lattice", lattice), false);
        Node clMaxTable = mapping(SectionReader.CL_MAX_TABLE_KEYS,
                Map.of("reynolds", Node.NUMBERS, "values", Node.NUMBERS), true);
        Node flap = mapping(SectionReader.FLAP_KEYS, Map.of("deflection", Node.NUMBERS, "increment", Node.NUMBERS),
                false);
        Node polar = mapping(SectionReader.POLAR_KEYS, Map.of("reynolds", Node.NUMBERS, "cl", Node.NUMBERS,
                "cd", new Node(Kind.INDEXED_LIST, Map.of(), Node.NUMBERS, true)), false);
        Node section = mapping(WingFileReader.SECTION_KEYS, Map.of("cl-max", clMaxTable, "flap-cl-max", flap,
                "drag-polar", polar), false);
        ROOT = mapping(WingFileReader.TOP_KEYS, Map.of(
                "reference", reference,
                "surfaces", new Node(Kind.NAMED_LIST, Map.of(), surface, false),
                "sections", new Node(Kind.NAMED_MAPPING, Map.of(), section, false)), false);
    }

    private WingSchema() {
    }

    private static Node mapping(Set<String> keys, Map<String, Node> structured, boolean leaf) {
        for (String k : structured.keySet()) {
            if (!keys.contains(k)) {
                throw new IllegalStateException("the schema names key '" + k + "' that the wing-file reader lacks");
            }
        }
        Map<String, Node> all = new HashMap<>();
        for (String k : keys) {
            all.put(k, structured.getOrDefault(k, Node.VALUE));
        }
        return new Node(Kind.MAPPING, Map.copyOf(all), null, leaf);
    }

    /** The keys of a mapping node, sorted, for messages. */
    static String expected(Node node) {
        return String.join(", ", List.copyOf(node.keyNames()));
    }
}
