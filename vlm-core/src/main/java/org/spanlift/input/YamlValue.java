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

    int line();

    /** What this value is, for messages: "a number", "a mapping", "a list". */
    String describe();

    /**
     * A scalar: its text and whether it was plain (unquoted) in the file.
     */
    record Scalar(String text, boolean plain, int line) implements YamlValue {
        @Override
        public String describe() {
            String shown = Field.shown(text);
            return plain ? "'" + shown + "'" : "the quoted text \"" + shown + "\"";
        }

        public boolean isNull() {
            return plain && (text.isEmpty() || text.equals("~") || text.equalsIgnoreCase("null"));
        }
    }

    /** One key of a mapping, with the line of the key. */
    record Entry(String key, int keyLine, YamlValue value) {
    }

    /** A mapping with string keys in file order; keys are unique. */
    record Mapping(List<Entry> entries, int line) implements YamlValue {
        public Mapping {
            entries = List.copyOf(entries);
        }

        @Override
        public String describe() {
            return "a mapping";
        }

        public Optional<Entry> entry(String key) {
            return entries.stream().filter(e -> e.key().equals(key)).findFirst();
        }

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

    /** A list. */
    record Sequence(List<YamlValue> items, int line) implements YamlValue {
        public Sequence {
            items = List.copyOf(items);
        }

        @Override
        public String describe() {
            return "a list";
        }

        public Sequence with(int index, YamlValue value) {
            List<YamlValue> copy = new ArrayList<>(items);
            copy.set(index, value);
            return new Sequence(copy, line);
        }
    }
}
