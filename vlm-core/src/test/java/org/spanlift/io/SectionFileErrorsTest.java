package org.spanlift.io;

import org.spanlift.section.CamberLines;
import org.spanlift.input.InputException;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** Malformed coordinate files under src/test/resources/section: one-line messages with file, line and expectation. */
class SectionFileErrorsTest {

    private static InputException refuse(String name, int line, String... fragments) {
        Path file = Path.of("src/test/resources/section", name);
        InputException e = assertThrows(InputException.class, () -> CoordinateFileReader.read(file));
        String message = e.getMessage();
        assertFalse(message.contains("\n") || message.contains("\r"), "one line: " + message);
        assertTrue(message.startsWith(file + ":" + line + ": "), "file and line first: " + message);
        assertTrue(message.contains("; expected "), "says what is expected: " + message);
        for (String fragment : fragments) {
            assertTrue(message.contains(fragment), "'" + fragment + "' in: " + message);
        }
        assertEquals(line, e.line());
        assertEquals(file.toString(), e.file());
        return e;
    }

    @Test
    void nonNumericLine() {
        // The word itself is not echoed: a file given by mistake may hold anything.
        InputException e = refuse("non-numeric.dat", 6, "value 2 on the line is not a number",
                "a name is allowed on the first line only");
        assertFalse(e.getMessage().contains("abc"), e.getMessage());
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
        InputException e = assertThrows(InputException.class, () -> CoordinateFileReader.read(file));
        assertTrue(e.getMessage().startsWith(file + ": no such file"), e.getMessage());
        assertTrue(e.getMessage().contains("; expected the path of a text file of x y section coordinates"),
                e.getMessage());
    }
}
