package org.spanlift.input;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;

import org.junit.jupiter.api.Test;

/**
 * The YAML tree is bounded in its expanded size, not only in its aliases: a short text of nested aliases
 * is refused at the line where it outgrows the limit, before the tree is built.
 */
class YamlParserLimitsTest {

    /** Levels of nested aliases, each a list of three aliases of the level below. */
    private static String nestedAliases(int levels) {
        StringBuilder b = new StringBuilder("units: m\na0: &a0 x\n");
        for (int i = 1; i <= levels; i++) {
            b.append("a").append(i).append(": &a").append(i).append(" [*a").append(i - 1).append(", *a").append(i - 1)
                    .append(", *a").append(i - 1).append("]\n");
        }
        return b.toString();
    }

    @Test
    void sixteenNestedAliasesOfThreeAreRefusedWhereTheyOutgrowTheLimit() {
        String text = nestedAliases(16);
        assertTrue(text.length() < 600, "a few hundred bytes: " + text.length());
        // Level k holds (3^(k+1) - 1) / 2 values once expanded (88 573 at level 10); with the keys and the levels
        // below it, the running count first passes 100 000 at level 10, on line 12.
        InputException e = assertTimeoutPreemptively(Duration.ofSeconds(10),
                () -> assertThrows(InputException.class, () -> YamlParser.parse(text, "bomb.wing.yaml")));
        assertEquals(12, e.line(), e.getMessage());
        assertEquals("bomb.wing.yaml:12: with its aliases expanded, the document grows past 100000 values here; "
                + "expected at most 100000 values, aliases expanded", e.getMessage());
    }

    @Test
    void aliasesThatStayWithinTheLimitAreExpanded() {
        YamlValue.Mapping root = (YamlValue.Mapping) YamlParser.parse(nestedAliases(3), "small.wing.yaml");
        YamlValue.Sequence a3 = (YamlValue.Sequence) root.get("a3").orElseThrow();
        YamlValue.Sequence a2 = (YamlValue.Sequence) a3.items().get(2);
        YamlValue.Sequence a1 = (YamlValue.Sequence) a2.items().get(0);
        assertEquals(new YamlValue.Scalar("x", true, 2), a1.items().get(1), "the anchored scalar, with its line");
    }

    @Test
    void aPlainDocumentOfMoreValuesThanTheLimitIsRefusedToo() {
        StringBuilder b = new StringBuilder("values: [");
        for (int i = 0; i < YamlParser.MAX_NODES; i++) {
            b.append(i % 10).append(',');
        }
        String text = b.append("0]\n").toString();
        InputException e = assertThrows(InputException.class, () -> YamlParser.parse(text, "many.wing.yaml"));
        assertEquals(1, e.line());
        assertTrue(e.problem().startsWith("the document holds more than 100000 values"), e.getMessage());
    }

    @Test
    void moreAliasesThanTheCapAreRefusedOnTheLineOfTheFirstOneTooMany() {
        StringBuilder b = new StringBuilder("name: &n wing\nnames:\n");
        for (int i = 0; i <= YamlParser.MAX_ALIASES; i++) {
            b.append("  - *n\n");
        }
        InputException e = assertThrows(InputException.class, () -> YamlParser.parse(b.toString(), "f.wing.yaml"));
        assertEquals(3 + YamlParser.MAX_ALIASES, e.line());
        assertTrue(e.problem().startsWith("more than 50 aliases"), e.getMessage());
    }

    @Test
    void emptyDocumentSaysWhatItsKindOfFileShouldHold() {
        InputException e = assertThrows(InputException.class,
                () -> YamlParser.parse("# nothing\n", "c.cases.yaml", "a list of load cases under the key cases"));
        assertEquals("c.cases.yaml:1: the file holds only comments; expected a list of load cases under the key cases",
                e.getMessage());
    }

    @Test
    void characterThatYamlDoesNotAllowIsLocatedByLine() {
        InputException e = assertThrows(InputException.class,
                () -> YamlParser.parse("units: m\nname: a\u0007b\n", "f.wing.yaml"));
        assertEquals(2, e.line(), e.getMessage());
        assertTrue(e.problem().contains("U+0007"), e.getMessage());
    }

    @Test
    void wholeDocumentOfTextIsRefusedWithoutEchoingIt() {
        String secret = "the quick brown fox jumps over the lazy dog";
        InputException e = assertThrows(InputException.class,
                () -> new Field("f.wing.yaml", "", YamlParser.parse(secret + "\n", "f.wing.yaml")).mapping());
        assertEquals("f.wing.yaml:1: the file holds plain text rather than keys with values; expected a mapping of "
                + "keys (is this the right file?)", e.getMessage());
    }
}
