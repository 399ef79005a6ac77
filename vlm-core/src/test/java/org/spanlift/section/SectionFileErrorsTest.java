package org.spanlift.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** Malformed coordinate files under src/test/resources/section: one-line messages with file, line and expectation. */
class SectionFileErrorsTest {

    private static SectionFileException refuse(String name, int line, String... fragments) {
        Path file = Path.of("src/test/resources/section", name);
        SectionFileException e = assertThrows(SectionFileException.class, () -> CamberLines.fromCoordinateFile(file));
        String message = e.getMessage();
        assertFalse(message.contains("\n") || message.contains("\r"), "one line: " + message);
        assertTrue(message.startsWith(file + ":" + line + ": "), "file and line first: " + message);
        assertTrue(message.contains("; expected "), "says what is expected: " + message);
        for (String fragment : fragments) {
            assertTrue(message.contains(fragment), "'" + fragment + "' in: " + message);
        }
        assertEquals(line, e.line());
        assertEquals(file, e.file());
        return e;
    }

    @Test
    void nonNumericLine() {
        refuse("non-numeric.dat", 6, "'0.5 abc' is not a pair of numbers", "a name is allowed on the first line only");
    }

    @Test
    void oneColumnOnly() {
        refuse("one-column.dat", 4, "only one column (0.95)", "expected two columns x y");
    }

    @Test
    void threeColumns() {
        refuse("three-columns.dat", 4, "3 columns", "expected two columns x y");
    }

    @Test
    void tooFewPoints() {
        refuse("too-few.dat", 6, "only 5 coordinate points", "at least 10 points");
    }

    @Test
    void noLeadingEdge() {
        refuse("no-leading-edge.dat", 14, "no leading edge", "one contour round the leading edge");
    }

    @Test
    void xOutsideTheSaneRange() {
        refuse("percent.dat", 2, "x = 100.0000 is outside -0.1 to 1.1", "coordinates in chords");
    }

    @Test
    void surfacesCrossing() {
        refuse("crossing.dat", 5, "upper and lower surfaces cross near x = 0.8536", "upper surface above the lower");
    }

    @Test
    void notANumber() {
        refuse("nan.dat", 9, "x is NaN", "finite numbers");
    }

    @Test
    void missingFile() {
        Path file = Path.of("src/test/resources/section/absent.dat");
        SectionFileException e = assertThrows(SectionFileException.class, () -> CamberLines.fromCoordinateFile(file));
        assertTrue(e.getMessage().startsWith(file + ": cannot be read"), e.getMessage());
        assertTrue(e.getMessage().contains("; expected a readable"), e.getMessage());
    }

    @Test
    void isAnIllegalArgumentException() {
        assertTrue(IllegalArgumentException.class.isAssignableFrom(SectionFileException.class));
    }
}
