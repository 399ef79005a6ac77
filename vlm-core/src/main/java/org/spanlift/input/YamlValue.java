package org.spanlift.input;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * A YAML document as plain data with the line of every value (1-based): scalars keep their text, mappings
 * their key order. Produced by {@link YamlParser}; nothing in it is constructed from the file's tags.
 * Immutable; {@link Mapping#with} and {@link Sequence#with} return changed copies (for sweeps).
 */
public sealed interface YamlValue permits YamlValue.Scalar, YamlValue.Mapping, YamlValue.Sequence {

    /** The 1-based line the value starts on. */
    int line();

    /** What this value is, for messages: "a number", "a mapping", "a list". */
    String describe();

    /**
     * A scalar: its text and whether it was plain (unquoted) in the file.
     *
     * @param text  the text as written (without quotes)
     * @param plain true when unquoted
     * @param line  its 1-based line
     */
    record Scalar(String text, boolean plain, int line) implements YamlValue {
        @Override
        public String describe() {
            String shown = Field.shown(text);
            return plain ? "'" + shown + "'" : "the quoted text \"" + shown + "\"";
        }

        /** Whether this is YAML's null: plain and empty, {@code ~} or {@code null} (any case). */
        public boolean isNull() {
            return plain && (text.isEmpty() || text.equals("~") || text.equalsIgnoreCase("null"));
        }
    }

    /**
     * One key of a mapping, with the line of the key.
     *
     * @param key     the key
     * @param keyLine the key's 1-based line
     * @param value   its value
     */
    record Entry(String key, int keyLine, YamlValue value) {
    }

    /**
     * A mapping with string keys in file order; keys are unique.
     *
     * @param entries the entries, in file order
     * @param line    the mapping's 1-based line
     */
    record Mapping(List<Entry> entries, int line) implements YamlValue {
        /** Copies the entries. */
        public Mapping {
            entries = List.copyOf(entries);
        }

        @Override
        public String describe() {
            return "a mapping";
        }

        /** The entry of the key, if present. */
        public Optional<Entry> entry(String key) {
            return entries.stream().filter(e -> e.key().equals(key)).findFirst();
        }

        /** The value of the key, if present. */
        public Optional<YamlValue> get(String key) {
            return entry(key).map(Entry::value);
        }

        /** A copy with the key's value replaced, or the key appended when absent. */
        public Mapping with(String key, YamlValue value) {
            List<Entry> copy = new ArrayList<>(entries);
            for (int i = 0; i < copy.size(); i++) {
                if (copy.get(i).key().equals(key)) {
                    copy.set(i, new Entry(key, copy.get(i).keyLine(), value));
                    return new Mapping(copy, line);
                }
            }
            copy.add(new Entry(key, value.line(), value));
            return new Mapping(copy, line);
        }
    }

    /**
     * A list.
     *
     * @param items the items, in file order
     * @param line  the list's 1-based line
     */
    record Sequence(List<YamlValue> items, int line) implements YamlValue {
        /** Copies the items. */
        public Sequence {
            items = List.copyOf(items);
        }

        @Override
        public String describe() {
            return "a list";
        }

        /** A copy with the item at the index replaced. */
        public Sequence with(int index, YamlValue value) {
            List<YamlValue> copy = new ArrayList<>(items);
            copy.set(index, value);
            return new Sequence(copy, line);
        }
    }
}
