package org.spanlift.input;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * The shape of a YAML file kind: which keys hold mappings, which hold lists (and whether their elements are
 * chosen by name), and which hold plain values. A path into a file can be checked against it before any
 * file of that kind is read.
 */
public final class YamlSchema {

    /** What a key holds. */
    public enum Kind {
        /** A mapping with fixed keys. */
        MAPPING,
        /** A mapping whose keys are names chosen by the file (the sections of a wing file). */
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
    public record Node(Kind kind, Map<String, Node> keys, Node element, boolean leaf) {

        /** A plain value. */
        public static final Node VALUE = new Node(Kind.VALUE, Map.of(), null, true);
        /** A list of plain values (numbers), chosen by index. */
        public static final Node NUMBERS = new Node(Kind.INDEXED_LIST, Map.of(), VALUE, false);

        /** The names of the keys, sorted. */
        public Set<String> keyNames() {
            return new TreeSet<>(keys.keySet());
        }
    }

    private YamlSchema() {
    }

    /**
     * A mapping node with the given keys: those in {@code structured} hold the nodes given there, every other
     * key a plain value.
     *
     * @param leaf true when a plain value may stand in place of the mapping
     */
    public static Node mapping(Set<String> keys, Map<String, Node> structured, boolean leaf) {
        for (String k : structured.keySet()) {
            if (!keys.contains(k)) {
                throw new IllegalStateException("the schema names key '" + k + "' that is not among the keys given");
            }
        }
        Map<String, Node> all = new HashMap<>();
        for (String k : keys) {
            all.put(k, structured.getOrDefault(k, Node.VALUE));
        }
        return new Node(Kind.MAPPING, Map.copyOf(all), null, leaf);
    }

    /** The keys of a mapping node, sorted, for messages. */
    public static String expected(Node node) {
        return String.join(", ", List.copyOf(node.keyNames()));
    }
}
