package org.spanlift.input;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Input files are read through a bounded stream, as UTF-8 text without control characters, faults located. */
class TextFileTest {

    @Test
    void fileLargerThanTheLimitIsRefusedOnTheLineWhereTheLimitIsPassed(@TempDir Path dir) throws IOException {
        Path path = dir.resolve("long.wing.yaml");
        byte[] line = "# a comment line of sixty-four characters, repeated to the end.\n"
                .getBytes(StandardCharsets.UTF_8);
        assertEquals(64, line.length);
        try (OutputStream out = Files.newOutputStream(path)) {
            for (int i = 0; i <= TextFile.MAX_BYTES / 64; i++) {
                out.write(line);
            }
        }
        InputException e = assertThrows(InputException.class, () -> TextFile.read(path, "wing file"));
        assertEquals(TextFile.MAX_BYTES / 64 + 1, e.line(), "the limit falls at the start of the line after 2^18 "
                + "lines");
        assertEquals(path + ":" + e.line() + ": the file goes on past 16 MiB (the limit is reached on this line); "
                + "expected a wing file of at most 16 MiB", e.getMessage());
    }

    @Test
    void fileOfExactlyTheLimitIsRead(@TempDir Path dir) throws IOException {
        Path path = dir.resolve("full.wing.yaml");
        byte[] bytes = new byte[TextFile.MAX_BYTES];
        Arrays.fill(bytes, (byte) ' ');
        Files.write(path, bytes);
        assertEquals(TextFile.MAX_BYTES, TextFile.read(path, "wing file").length());
    }

    @Test
    void deviceThatNeverEndsIsRefusedAtTheLimit() {
        Path zero = Path.of("/dev/zero");
        assumeTrue(Files.exists(zero), "a system with /dev/zero");
        InputException e = assertThrows(InputException.class, () -> TextFile.read(zero, "wing file"));
        assertEquals("/dev/zero:1: the file goes on past 16 MiB (the limit is reached on this line); expected a wing "
                + "file of at most 16 MiB", e.getMessage());
    }

    @Test
    void utf8ByteOrderMarkIsDropped() {
        byte[] bytes = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF, 'u', 'n', 'i', 't', 's', ':', ' ', 'm', '\n'};
        assertEquals("units: m\n", TextFile.decode(bytes, "f.wing.yaml", "wing file"));
    }

    @Test
    void utf16WithoutByteOrderMarkIsRecognisedOnItsFirstLine() {
        byte[] bytes = "units: m\n".getBytes(StandardCharsets.UTF_16LE);
        InputException e = assertThrows(InputException.class, () -> TextFile.decode(bytes, "f.wing.yaml", "wing file"));
        assertEquals(1, e.line());
        assertTrue(e.problem().contains("UTF-16 text without a byte-order mark"), e.getMessage());
    }

    @Test
    void invalidUtf8IsLocatedByLineWithCarriageReturnsCountedOnce() {
        byte[] bytes = {'a', '\r', '\n', 'b', '\r', 'c', '\n', (byte) 0xC3, '(', '\n'};
        InputException e = assertThrows(InputException.class, () -> TextFile.decode(bytes, "f.dat", "text file"));
        assertEquals("f.dat:4: the file is not UTF-8 text (byte 0xC3 on this line is not UTF-8); expected a text file "
                + "saved as UTF-8", e.getMessage());
    }

    @Test
    void controlCharacterIsLocatedAndNamed() {
        byte[] bytes = "units: m\nname: a\u001bb\n".getBytes(StandardCharsets.UTF_8);
        InputException e = assertThrows(InputException.class, () -> TextFile.decode(bytes, "f.wing.yaml",
                "envelope file"));
        assertEquals("f.wing.yaml:2: a control character U+001B on this line; expected an envelope file of plain "
                + "text (printable characters, tabs and line breaks only)", e.getMessage());
    }

    @Test
    void tabsAndLineBreaksArePlainText() {
        byte[] bytes = "0.5\t0.01\r\n0.6\t0.02\n".getBytes(StandardCharsets.UTF_8);
        assertEquals("0.5\t0.01\r\n0.6\t0.02\n", TextFile.decode(bytes, "f.dat", "text file"));
    }
}
