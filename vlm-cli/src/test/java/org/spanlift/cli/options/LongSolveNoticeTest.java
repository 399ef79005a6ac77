package org.spanlift.cli.options;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;

/** A very large lattice is announced with its estimated time; the demo wings solve without a word. */
class LongSolveNoticeTest {

    private static Wing wing(int strips, int rows, boolean mirrored) {
        String planform = mirrored ? "    trapezoid: {span: 9, root-chord: 1.2}\n"
                : "    stations:\n      - {y: -4.5, chord: 1.2}\n      - {y: 4.5, chord: 1.2}\n";
        return WingFileReader.parse("name: w\nunits: m\nsurfaces:\n  - name: wing\n    mirror: " + mirrored + "\n"
                + planform + "    lattice: {strips: " + strips + ", rows: " + rows + "}\n", "w.wing.yaml");
    }

    @Test
    void theLargeLatticesOfTheHostileRunsTakeMinutes() {
        Wing large = wing(400, 15, true);
        assertEquals(6000, LongSolveNotice.unknowns(large));
        double seconds = LongSolveNotice.estimatedSeconds(large);
        // (2/3) 6000^3 / 1.6e9 + 4.2e-8 6000^2 = 90 s + 1.5 s
        assertEquals(91.5, seconds, 0.1);
        Wing unmirrored = wing(400, 30, false);
        assertEquals(12000, LongSolveNotice.unknowns(unmirrored));
        assertTrue(LongSolveNotice.estimatedSeconds(unmirrored) > 10 * 60, "12,000 unknowns: many minutes");
    }

    @Test
    void theDefaultLatticeSolvesQuietly() {
        StringWriter err = new StringWriter();
        LongSolveNotice.analyse(wing(32, 8, true), new PrintWriter(err));
        assertEquals("", err.toString());
        assertTrue(LongSolveNotice.estimatedSeconds(wing(32, 8, true)) < 0.1);
    }
}
