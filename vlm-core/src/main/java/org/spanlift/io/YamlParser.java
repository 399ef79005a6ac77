package org.spanlift.io;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.snakeyaml.engine.v2.api.LoadSettings;
import org.snakeyaml.engine.v2.api.lowlevel.Compose;
import org.snakeyaml.engine.v2.exceptions.Mark;
import org.snakeyaml.engine.v2.exceptions.MarkedYamlEngineException;
import org.snakeyaml.engine.v2.exceptions.YamlEngineException;
import org.snakeyaml.engine.v2.nodes.MappingNode;
import org.snakeyaml.engine.v2.nodes.Node;
import org.snakeyaml.engine.v2.nodes.NodeTuple;
import org.snakeyaml.engine.v2.nodes.ScalarNode;
import org.snakeyaml.engine.v2.nodes.SequenceNode;
import org.snakeyaml.engine.v2.nodes.Tag;

/**
 * Reads YAML text into a {@link YamlValue} tree with line marks. Safe: only the node graph is composed (no
 * object construction); explicit tags other than the standard scalar, list and mapping ones are refused;
 * duplicate keys are refused.
 */
public final class YamlParser {

    private static final Set<Tag> STANDARD_TAGS = Set.of(Tag.STR, Tag.INT, Tag.FLOAT, Tag.BOOL, Tag.NULL, Tag.MAP,
            Tag.SEQ);
    private static final int MAX_CODE_POINTS = 8 * 1024 * 1024;

    private YamlParser() {
    }

    /**
     * Parses one YAML document.
     *
     * @param file the file name for messages
     * @throws InputException for a syntax error, an empty document, a tag or a duplicate key
     */
    public static YamlValue parse(String text, String file) {
        LoadSettings settings = LoadSettings.builder().setLabel(file).setCodePointLimit(MAX_CODE_POINTS)
                .setMaxAliasesForCollections(50).build();
        Optional<Node> root;
        try {
            root = new Compose(settings).composeString(text);
        } catch (MarkedYamlEngineException e) {
            int line = e.getProblemMark().map(m -> m.getLine() + 1).orElse(0);
            throw new InputException(file, line, "", "not valid YAML: " + firstLine(e.getProblem()));
        } catch (YamlEngineException e) {
            throw new InputException(file, 0, "", "not valid YAML: " + firstLine(e.getMessage()));
        }
        if (root.isEmpty()) {
            throw new InputException(file, 1, "", "the file is empty; expected a YAML mapping");
        }
        return convert(root.get(), file);
    }

    private static String firstLine(String s) {
        if (s == null) {
            return "syntax error";
        }
        int nl = s.indexOf('\n');
        return (nl < 0 ? s : s.substring(0, nl)).trim();
    }

    private static int line(Node node) {
        return node.getStartMark().map(Mark::getLine).orElse(-1) + 1;
    }

    private static YamlValue convert(Node node, String file) {
        if (!STANDARD_TAGS.contains(node.getTag())) {
            throw new InputException(file, line(node), "",
                    "type tags are not allowed (found " + node.getTag().getValue() + ")");
        }
        if (node instanceof ScalarNode s) {
            return new YamlValue.Scalar(s.getValue(), s.isPlain(), line(node));
        }
        if (node instanceof SequenceNode seq) {
            List<YamlValue> items = new ArrayList<>();
            for (Node item : seq.getValue()) {
                items.add(convert(item, file));
            }
            return new YamlValue.Sequence(items, line(node));
        }
        MappingNode map = (MappingNode) node;
        List<YamlValue.Entry> entries = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (NodeTuple t : map.getValue()) {
            Node k = t.getKeyNode();
            if (!(k instanceof ScalarNode ks) || !STANDARD_TAGS.contains(k.getTag())) {
                throw new InputException(file, line(k), "", "keys must be plain names");
            }
            String key = ks.getValue();
            if (key.equals("<<")) {
                throw new InputException(file, line(k), key, "merge keys are not supported; write the keys out");
            }
            if (!seen.add(key)) {
                throw new InputException(file, line(k), key, "duplicate key; each key may appear once");
            }
            entries.add(new YamlValue.Entry(key, line(k), convert(t.getValueNode(), file)));
        }
        return new YamlValue.Mapping(entries, line(node));
    }
}
