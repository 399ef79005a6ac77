package org.spanlift.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.spanlift.input.YamlSchema;
import org.spanlift.input.YamlValue;

/**
 * A place in a wing file named by its keys separated by dots, such as {@code surfaces.wing.trapezoid.taper}
 * or {@code surfaces.wing.stations[2].twist}: a list element is chosen by its {@code name} where it has one
 * ({@code surfaces.wing}, {@code controls.flap}), else by its index in brackets counted from 0; a section by
 * its name ({@code sections.inner.cl-max}). Checked against the wing-file schema when parsed; applying it to
 * a wing tree creates mapping keys the file leaves to their defaults ({@code lattice.strips}), but never
 * list elements, sections or a planform the base file does not have.
 */
public final class ParameterPath {

    private static final Pattern TOKEN = Pattern.compile("([^\\[\\]]+)((?:\\[\\d+\\])*)");
    private static final Pattern INDEX = Pattern.compile("\\[(\\d+)\\]");
    private static final Set<String> PLANFORMS = Set.of("stations", "trapezoid", "elliptic");

    /** One step of a path. */
    private sealed interface Step permits Key, Index, Name {
    }

    /** A mapping key; {@code mustExist} for section names and planform kinds. */
    private record Key(String key, boolean mustExist) implements Step {
    }

    private record Index(int index) implements Step {
    }

    private record Name(String name) implements Step {
    }

    /** A path that does not fit the schema or the base file. */
    public static final class PathException extends RuntimeException {
        private static final long serialVersionUID = 1L;

        PathException(String message) {
            super(message);
        }
    }

    private final String text;
    private final List<Step> steps;

    private ParameterPath(String text, List<Step> steps) {
        this.text = text;
        this.steps = List.copyOf(steps);
    }

    /**
     * Parses and checks a path against a file schema.
     *
     * @param root the schema of the file kind (a wing file's: {@code org.spanlift.io.WingSchema.ROOT})
     * @throws PathException saying what the schema expects where the path leaves it
     */
    public static ParameterPath parse(String text, YamlSchema.Node root) {
        String t = text.trim();
        if (t.isEmpty()) {
            throw new PathException("expected a path of wing-file keys separated by dots");
        }
        List<Step> steps = new ArrayList<>();
        YamlSchema.Node node = root;
        StringBuilder at = new StringBuilder();
        boolean elementNamed = false;
        for (String token : t.split("\\.", -1)) {
            Matcher m = TOKEN.matcher(token);
            if (!m.matches()) {
                throw new PathException("'" + token + "' in " + t + " is not a key with optional [index] suffixes");
            }
            String key = m.group(1);
            String where = at.length() == 0 ? "the top level of a wing file" : "'" + at + "'";
            switch (node.kind()) {
                case MAPPING -> {
                    if (!node.keys().containsKey(key)) {
                        throw new PathException("unknown key '" + key + "' at " + where + "; expected one of "
                                + YamlSchema.expected(node));
                    }
                    if (key.equals("name") && elementNamed) {
                        throw new PathException("a name chooses the list element and cannot be swept");
                    }
                    steps.add(new Key(key, PLANFORMS.contains(key)));
                    node = node.keys().get(key);
                }
                case NAMED_MAPPING -> {
                    steps.add(new Key(key, true));
                    node = node.element();
                }
                case NAMED_LIST -> {
                    steps.add(new Name(key));
                    node = node.element();
                }
                case INDEXED_LIST -> throw new PathException(where + " is a list: choose an element by its index in "
                        + "brackets, such as " + at + "[0]");
                default -> throw new PathException(where + " holds a plain value; there is nothing below it");
            }
            elementNamed = steps.get(steps.size() - 1) instanceof Name;
            at.append(at.length() == 0 ? "" : ".").append(key);
            Matcher idx = INDEX.matcher(m.group(2));
            while (idx.find()) {
                if (node.kind() != YamlSchema.Kind.INDEXED_LIST && node.kind() != YamlSchema.Kind.NAMED_LIST) {
                    throw new PathException("'" + at + "' is not a list; it takes no index");
                }
                String digits = idx.group(1);
                if (digits.length() > 6) {
                    throw new PathException("the index " + digits + " in " + t + " is too large");
                }
                steps.add(new Index(Integer.parseInt(digits)));
                elementNamed = node.kind() == YamlSchema.Kind.NAMED_LIST;
                node = node.element();
                at.append('[').append(digits).append(']');
            }
        }
        if (!node.leaf()) {
            throw new PathException("'" + t + "' names " + (node.kind() == YamlSchema.Kind.MAPPING
                    ? "a mapping; continue the path with one of its keys: " + YamlSchema.expected(node)
                    : "a list or a group; continue the path to one value"));
        }
        return new ParameterPath(t, steps);
    }

    /** The path as written. */
    public String text() {
        return text;
    }

    @Override
    public String toString() {
        return text;
    }

    /**
     * A copy of the wing tree with the value at this path replaced by a plain scalar (or created).
     *
     * @throws PathException when the base file lacks a list element, section or planform the path needs
     */
    public YamlValue apply(YamlValue tree, String value) {
        return set(tree, 0, value, tree.line(), "");
    }

    private YamlValue set(YamlValue node, int pos, String value, int line, String at) {
        if (pos == steps.size()) {
            return new YamlValue.Scalar(value, true, node == null ? line : node.line());
        }
        Step step = steps.get(pos);
        String here = at.isEmpty() ? "the top level" : "'" + at + "'";
        if (step instanceof Key k) {
            YamlValue.Mapping map;
            if (node == null || isNull(node)) {
                map = new YamlValue.Mapping(List.of(), node == null ? line : node.line());
            } else if (node instanceof YamlValue.Mapping m) {
                map = m;
            } else {
                throw new PathException(here + " of the base file is " + node.describe() + ", not a mapping");
            }
            Optional<YamlValue> child = map.get(k.key()).filter(v -> !isNull(v));
            if (child.isEmpty() && k.mustExist()) {
                throw new PathException(missing(k.key(), at, map));
            }
            String next = at.isEmpty() ? k.key() : at + "." + k.key();
            return map.with(k.key(), set(child.orElse(null), pos + 1, value, map.line(), next));
        }
        if (!(node instanceof YamlValue.Sequence seq)) {
            throw new PathException(here + " of the base file is " + (node == null ? "absent" : node.describe())
                    + "; the path needs a list there");
        }
        if (step instanceof Index i) {
            if (i.index() >= seq.items().size()) {
                throw new PathException(here + " of the base file has " + seq.items().size()
                        + " elements; there is no index " + i.index() + " (counted from 0)");
            }
            return seq.with(i.index(), set(seq.items().get(i.index()), pos + 1, value, seq.line(),
                    at + "[" + i.index() + "]"));
        }
        Name n = (Name) step;
        List<String> names = new ArrayList<>();
        for (int i = 0; i < seq.items().size(); i++) {
            YamlValue item = seq.items().get(i);
            if (item instanceof YamlValue.Mapping m && m.get("name").orElse(null) instanceof YamlValue.Scalar s) {
                names.add(s.text());
                if (s.text().equals(n.name())) {
                    return seq.with(i, set(item, pos + 1, value, seq.line(), at + "." + n.name()));
                }
            }
        }
        throw new PathException(here + " of the base file has no element named '" + n.name() + "'; it has "
                + (names.isEmpty() ? "none" : String.join(", ", names)));
    }

    /**
     * The place this path names in a wing tree, with every list element chosen by name written as its index
     * ({@code surfaces[0].trapezoid.taper}): two paths name the same value exactly when their places in the
     * base tree are equal, however they are written. Keys the tree leaves to their defaults are part of the
     * place as written.
     *
     * @throws PathException when the tree lacks a list element, section or planform the path needs
     */
    public String place(YamlValue tree) {
        StringBuilder b = new StringBuilder();
        walk(tree, b);
        return b.toString();
    }

    /**
     * The value at this path in a wing tree, when the tree gives one (a key left to its default gives none).
     *
     * @throws PathException when the tree lacks a list element, section or planform the path needs
     */
    public Optional<YamlValue> find(YamlValue tree) {
        return Optional.ofNullable(walk(tree, new StringBuilder()));
    }

    /** Follows the path through the tree, writing its place; the value there, or null when absent. */
    private YamlValue walk(YamlValue tree, StringBuilder place) {
        YamlValue node = tree;
        for (Step step : steps) {
            if (node != null && isNull(node)) {
                node = null;
            }
            if (step instanceof Key k) {
                place.append(place.length() == 0 ? "" : ".").append(k.key());
                if (node == null) {
                    continue;
                }
                if (!(node instanceof YamlValue.Mapping m)) {
                    throw new PathException("'" + place + "' of the base file is inside " + node.describe()
                            + ", not a mapping");
                }
                Optional<YamlValue> child = m.get(k.key()).filter(v -> !isNull(v));
                if (child.isEmpty() && k.mustExist()) {
                    throw new PathException(missing(k.key(), place.substring(0, Math.max(0,
                            place.length() - k.key().length() - 1)), m));
                }
                node = child.orElse(null);
                continue;
            }
            if (!(node instanceof YamlValue.Sequence seq)) {
                throw new PathException("'" + place + "' of the base file is " + (node == null ? "absent"
                        : node.describe()) + "; the path needs a list there");
            }
            int index = -1;
            if (step instanceof Index i) {
                index = i.index();
                if (index >= seq.items().size()) {
                    throw new PathException("'" + place + "' of the base file has " + seq.items().size()
                            + " elements; there is no index " + index + " (counted from 0)");
                }
            } else {
                String name = ((Name) step).name();
                for (int i = 0; i < seq.items().size() && index < 0; i++) {
                    if (seq.items().get(i) instanceof YamlValue.Mapping m
                            && m.get("name").orElse(null) instanceof YamlValue.Scalar s && s.text().equals(name)) {
                        index = i;
                    }
                }
                if (index < 0) {
                    throw new PathException("'" + place + "' of the base file has no element named '" + name + "'");
                }
            }
            place.append('[').append(index).append(']');
            node = seq.items().get(index);
        }
        return node == null || isNull(node) ? null : node;
    }

    private static String missing(String key, String at, YamlValue.Mapping map) {
        if (PLANFORMS.contains(key)) {
            List<String> has = PLANFORMS.stream().filter(p -> map.get(p).isPresent()).sorted().toList();
            return "'" + at + "' of the base file has " + (has.isEmpty() ? "no planform" : String.join(" and ", has))
                    + ", not " + key + "; sweep the planform the base file uses";
        }
        List<String> keys = map.entries().stream().map(YamlValue.Entry::key).toList();
        return "the base file has no '" + key + "' in " + (at.isEmpty() ? "the top level" : "'" + at + "'")
                + "; it has " + (keys.isEmpty() ? "none" : String.join(", ", keys));
    }

    private static boolean isNull(YamlValue v) {
        return v instanceof YamlValue.Scalar s && s.isNull();
    }
}
