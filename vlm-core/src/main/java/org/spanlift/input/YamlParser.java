package org.spanlift.input;

import java.io.StringReader;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.snakeyaml.engine.v2.api.LoadSettings;
import org.snakeyaml.engine.v2.common.Anchor;
import org.snakeyaml.engine.v2.composer.Composer;
import org.snakeyaml.engine.v2.events.AliasEvent;
import org.snakeyaml.engine.v2.events.Event;
import org.snakeyaml.engine.v2.events.NodeEvent;
import org.snakeyaml.engine.v2.exceptions.Mark;
import org.snakeyaml.engine.v2.exceptions.MarkedYamlEngineException;
import org.snakeyaml.engine.v2.exceptions.ReaderException;
import org.snakeyaml.engine.v2.exceptions.YamlEngineException;
import org.snakeyaml.engine.v2.nodes.MappingNode;
import org.snakeyaml.engine.v2.nodes.Node;
import org.snakeyaml.engine.v2.nodes.NodeTuple;
import org.snakeyaml.engine.v2.nodes.ScalarNode;
import org.snakeyaml.engine.v2.nodes.SequenceNode;
import org.snakeyaml.engine.v2.nodes.Tag;
import org.snakeyaml.engine.v2.parser.ParserImpl;
import org.snakeyaml.engine.v2.scanner.StreamReader;

/**
 * Reads YAML text into a {@link YamlValue} tree with line marks. Safe: only the node graph is composed (no
 * object construction); explicit tags other than the standard scalar, list and mapping ones are refused;
 * duplicate keys are refused. Before the node graph is built, one pass over the parser's events refuses
 * nesting deeper than {@link #MAX_DEPTH}, aliases that refer to a list or mapping from inside it, more than
 * {@link #MAX_ALIASES} aliases, and a document whose tree, with every alias expanded, would hold more than
 * {@link #MAX_NODES} values: a few hundred bytes of nested aliases can otherwise stand for billions of
 * values. Each refusal names the line where the limit is passed.
 */
public final class YamlParser {

    private static final Set<Tag> STANDARD_TAGS = Set.of(Tag.STR, Tag.INT, Tag.FLOAT, Tag.BOOL, Tag.NULL, Tag.MAP,
            Tag.SEQ);
    /** The longest text parsed, in characters: as long as the longest file {@link TextFile} reads. */
    public static final int MAX_CHARACTERS = TextFile.MAX_BYTES;

    /** Deepest nesting of lists and mappings accepted (a wing file needs five levels). */
    public static final int MAX_DEPTH = 32;

    /** Most aliases ({@code *name}) in one document. */
    public static final int MAX_ALIASES = 50;

    /**
     * Most values (scalars, lists and mappings, keys included) in the tree of one document with every alias
     * expanded: a wing of 400 stations with measured section tables holds a few thousand.
     */
    public static final int MAX_NODES = 100_000;

    /** What a wing file is expected to hold, for messages about a document that holds nothing. */
    private static final String WING = "a wing description (a mapping with at least 'units' and 'surfaces')";

    private YamlParser() {
    }

    /**
     * Parses one YAML document of a wing file.
     *
     * @param file the file name for messages
     * @throws InputException for a syntax error, an empty document, a tag, a duplicate key, too deep a
     *         nesting, a self-referring alias, too many aliases or too large an expanded tree
     */
    public static YamlValue parse(String text, String file) {
        return parse(text, file, WING);
    }

    /**
     * Parses one YAML document.
     *
     * @param file     the file name for messages
     * @param expected what the document should hold, for the message about an empty one ({@code "a list of
     *                 load cases under 'cases'"})
     * @throws InputException for a syntax error, an empty document, a tag, a duplicate key, too deep a
     *         nesting, a self-referring alias, too many aliases or too large an expanded tree
     */
    public static YamlValue parse(String text, String file, String expected) {
        if (text.length() > MAX_CHARACTERS) {
            throw new InputException(file, lineOf(text, MAX_CHARACTERS), "", "the text goes on past "
                    + MAX_CHARACTERS + " characters (the limit is reached on this line); expected at most "
                    + MAX_CHARACTERS);
        }
        // a key that is a list or a mapping reaches the tree, where the reader refuses it on its line (the
        // engine's own refusal, its default since 3.0, names neither the line nor what is expected)
        LoadSettings settings = LoadSettings.builder().setLabel(file).setCodePointLimit(MAX_CHARACTERS + 1)
                .setMaxAliasesForCollections(MAX_ALIASES).setAllowNonScalarKeys(true).build();
        Optional<Node> root;
        try {
            // the parser and composer directly: the engine's module does not export its lowlevel api
            checkStructure(() -> new ParserImpl(settings, new StreamReader(settings, new StringReader(text))), file);
            root = new Composer(settings, new ParserImpl(settings, new StreamReader(settings, new StringReader(text))))
                    .getSingleNode();
        } catch (MarkedYamlEngineException e) {
            throw syntaxError(e, text, file);
        } catch (ReaderException e) {
            throw new InputException(file, lineOf(text, e.getPosition()), "", String.format(Locale.ROOT,
                    "a character U+%04X that YAML does not allow; expected printable text", e.getCodePoint()));
        } catch (YamlEngineException e) {
            throw new InputException(file, 0, "", "not valid YAML: " + firstLine(e.getMessage())
                    + "; expected " + expected);
        }
        if (root.isEmpty()) {
            throw new InputException(file, 1, "", (text.isBlank() ? "the file is empty"
                    : "the file holds only comments")
                    + "; expected " + expected);
        }
        return convert(root.get(), file, "");
    }

    /** The 1-based line of the character at {@code index} (CR LF counts as one line break). */
    private static int lineOf(String text, int index) {
        int line = 1;
        for (int i = 0; i < index && i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || (c == '\r' && (i + 1 >= text.length() || text.charAt(i + 1) != '\n'))) {
                line++;
            }
        }
        return line;
    }

    /**
     * Walks the event stream (no recursion, so any depth is safe) and refuses too deep a nesting, an alias to
     * a list or mapping that is still open (which would make the tree contain itself), too many aliases, and
     * a tree that would grow past {@link #MAX_NODES} values once its aliases are expanded. The expanded size
     * is counted as the events go by: each scalar, list and mapping counts one, each alias the size of what
     * its anchor names, so the count stays exact and the pass stops at the first value past the limit.
     */
    private static void checkStructure(Iterable<Event> events, String file) {
        Deque<Optional<Anchor>> open = new ArrayDeque<>();
        Deque<Long> openedAt = new ArrayDeque<>();
        Map<Anchor, Long> sizes = new HashMap<>();
        long nodes = 0;
        int aliases = 0;
        for (Event e : events) {
            long before = nodes;
            switch (e.getEventId()) {
                case SequenceStart, MappingStart -> {
                    open.push(((NodeEvent) e).getAnchor());
                    openedAt.push(nodes);
                    nodes++;
                    if (open.size() > MAX_DEPTH) {
                        throw new InputException(file, line(e.getStartMark()), "", "lists and mappings nested "
                                + open.size() + " deep; expected at most " + MAX_DEPTH + " levels");
                    }
                }
                case SequenceEnd, MappingEnd -> {
                    Optional<Anchor> anchor = open.pop();
                    long start = openedAt.pop();
                    if (anchor.isPresent()) {
                        sizes.put(anchor.get(), nodes - start);
                    }
                }
                case Scalar -> {
                    nodes++;
                    ((NodeEvent) e).getAnchor().ifPresent(a -> sizes.put(a, 1L));
                }
                case Alias -> {
                    Anchor a = ((AliasEvent) e).getAlias();
                    if (open.stream().anyMatch(o -> o.isPresent() && o.get().equals(a))) {
                        throw new InputException(file, line(e.getStartMark()), "", "the alias *" + a.getValue()
                                + " refers to the list or mapping that contains it; expected a value that does "
                                + "not contain itself");
                    }
                    if (++aliases > MAX_ALIASES) {
                        throw new InputException(file, line(e.getStartMark()), "", "more than " + MAX_ALIASES
                                + " aliases (*name); expected at most " + MAX_ALIASES + ", or the values written out");
                    }
                    // An alias to an anchor not yet defined is left for the composer to refuse.
                    nodes += sizes.getOrDefault(a, 1L);
                }
                default -> {
                }
            }
            if (nodes > MAX_NODES) {
                throw new InputException(file, line(e.getStartMark()), "", (nodes - before > 1
                        ? "with its aliases expanded, the document grows past " + MAX_NODES + " values here"
                        : "the document holds more than " + MAX_NODES + " values")
                        + "; expected at most " + MAX_NODES + " values, aliases expanded");
            }
        }
    }

    private static InputException syntaxError(MarkedYamlEngineException e, String text, String file) {
        String problem = firstLine(e.getProblem());
        int line = e.getProblemMark().map(m -> m.getLine() + 1).orElse(0);
        int last = lastContentLine(text);
        if (problem.contains("(TAB)")) {
            return new InputException(file, line, "", "a tab character where YAML expects indentation or a value; "
                    + "expected spaces (YAML is indented with spaces, never tabs)");
        }
        if (problem.startsWith("found undefined alias ")) {
            String name = Field.shown(problem.substring("found undefined alias ".length()).trim());
            return new InputException(file, Math.min(line, last), "", "the alias *" + name + " names no anchor; "
                    + "expected an anchor &" + name + " given earlier in the file");
        }
        if (problem.startsWith("but found another document")) {
            return new InputException(file, Math.min(line, last), "", "a second document starts here (after ---); "
                    + "expected a single document");
        }
        if (line > last && e.getContextMark().isPresent()) {
            // The file ended inside something left open: point at where that began.
            int start = e.getContextMark().get().getLine() + 1;
            String what = firstLine(e.getContext()).replaceFirst("^while (parsing|scanning) (an? )?", "");
            return new InputException(file, start, "", "not valid YAML: the file ends inside the " + what
                    + " that starts on this line; " + problem.replace("<stream end>", "the end of the file"));
        }
        return new InputException(file, Math.min(line, last), "", "not valid YAML: "
                + problem.replace("<stream end>", "the end of the file"));
    }

    /** The last line (1-based) holding anything but white space; at least 1. */
    private static int lastContentLine(String text) {
        String[] lines = text.split("\r\n|\r|\n", -1);
        for (int i = lines.length - 1; i >= 0; i--) {
            if (!lines[i].isBlank()) {
                return i + 1;
            }
        }
        return 1;
    }

    private static String firstLine(String s) {
        if (s == null) {
            return "syntax error";
        }
        int nl = s.indexOf('\n');
        return (nl < 0 ? s : s.substring(0, nl)).trim();
    }

    private static int line(Optional<Mark> mark) {
        return mark.map(Mark::getLine).orElse(-1) + 1;
    }

    private static int line(Node node) {
        return line(node.getStartMark());
    }

    private static String child(String path, String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    private static YamlValue convert(Node node, String file, String path) {
        if (!STANDARD_TAGS.contains(node.getTag())) {
            String tag = node.getTag().getValue();
            tag = tag.startsWith(Tag.PREFIX) ? "!!" + tag.substring(Tag.PREFIX.length()) : tag;
            throw new InputException(file, line(node), path, "type tags such as " + tag
                    + " are not accepted; expected a plain value without a tag");
        }
        if (node instanceof ScalarNode s) {
            return new YamlValue.Scalar(s.getValue(), s.isPlain(), line(node));
        }
        if (node instanceof SequenceNode seq) {
            List<YamlValue> items = new ArrayList<>();
            for (Node item : seq.getValue()) {
                items.add(convert(item, file, path + "[" + items.size() + "]"));
            }
            return new YamlValue.Sequence(items, line(node));
        }
        MappingNode map = (MappingNode) node;
        List<YamlValue.Entry> entries = new ArrayList<>();
        Map<String, Integer> seen = new HashMap<>();
        for (NodeTuple t : map.getValue()) {
            Node k = t.getKeyNode();
            if (!(k instanceof ScalarNode ks) || !STANDARD_TAGS.contains(k.getTag())) {
                throw new InputException(file, line(k), path, "a key that is a list, a mapping or tagged; "
                        + "expected plain names as keys");
            }
            String key = ks.getValue();
            String keyPath = child(path, key);
            if (key.equals("<<")) {
                throw new InputException(file, line(k), keyPath, "merge keys are not supported; "
                        + "expected the keys written out");
            }
            Integer first = seen.putIfAbsent(key, line(k));
            if (first != null) {
                throw new InputException(file, line(k), keyPath, "duplicate key (first given on line " + first
                        + "); expected each key once");
            }
            entries.add(new YamlValue.Entry(key, line(k), convert(t.getValueNode(), file, keyPath)));
        }
        return new YamlValue.Mapping(entries, line(node));
    }
}
