package org.spanlift.cli.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.cli.CliRun;
import org.w3c.dom.Document;

/** A name holding a control character XML 1.0 forbids still gives a well-formed figure, the character escaped. */
class ControlCharacterNamesTest {

    @TempDir
    Path dir;

    @Test
    void aControlCharacterInTheWingNameIsEscapedInTheSvg() throws Exception {
        Path wing = Files.writeString(dir.resolve("w.wing.yaml"), "name: \"bell\\u0007wing\"\nunits: m\nsurfaces:\n"
                + "  - name: wing\n    trapezoid: {span: 9, root-chord: 1.2}\n");
        Path svg = dir.resolve("w.svg");
        CliRun r = CliRun.of("plot", wing.toString(), "--what", "planform", "--output", svg.toString());
        assertEquals(0, r.exitCode(), r.err());
        String text = Files.readString(svg);
        Document doc = SvgSupport.parse(text);
        assertTrue(doc.getDocumentElement().getTextContent().contains("bell\\u0007wing"), "escaped, visible");
        assertTrue(text.chars().noneMatch(c -> c == 7), "no raw control character");
    }

    @Test
    void xmlSafeLeavesOrdinaryTextAlone() {
        assertEquals("Two-seat trainer, 20\u00b0 \u00b7 \"a\" <b>", SvgWriter.xmlSafe("Two-seat trainer, 20\u00b0 "
                + "\u00b7 \"a\" <b>"));
        assertEquals("a\\u0001b", SvgWriter.xmlSafe("a\u0001b"));
        assertEquals("tab\tand\nline", SvgWriter.xmlSafe("tab\tand\nline"));
    }
}
