package org.spanlift.vocabulary;

import java.util.EnumSet;
import java.util.Set;
import java.util.function.Function;

/**
 * One scalar result: its key, its SI unit, how a table labels it, a one-line description, and how it is
 * obtained from its source (a {@link WingResult}, a flight point, a stall estimate, a stall study or a
 * control). A key with dots is a nested object in JSON: {@code aileron_margin.dcl} is
 * {@code "aileron_margin": {"dcl": ...}}, and the same dotted key is a sweep column.
 *
 * @param <S>         the source the value is read from
 * @param key         the key, as JSON nests it and a sweep names its column
 * @param unit        the SI unit of the value
 * @param label       a short label for tables, without the unit
 * @param description one line that says what the value is
 * @param decimals    decimals shown in tables (in the SI unit)
 * @param needs       what the value needs beyond the geometry
 * @param value       how the value is obtained: a {@code Double}, {@code Integer}, {@code Boolean},
 *                    {@code String}, or null where the value does not exist (e near zero lift)
 */
public record ResultKey<S>(String key, ResultUnit unit, String label, String description, int decimals,
        Set<Need> needs, Function<S, Object> value) {

    /** Copies the needs into an unmodifiable set. */
    public ResultKey {
        needs = needs.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(needs));
    }

    /** The value for this source (see {@link #value}). */
    public Object of(S source) {
        return value.apply(source);
    }

    /** True when the value needs this. */
    public boolean needs(Need need) {
        return needs.contains(need);
    }
}
