package org.spanlift.cli.sweep;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The progress bar is drawn only where standard error is a terminal. */
class ProgressModeTest {

    @TempDir
    Path dir;

    @Test
    void aDescriptorOnAPseudoTerminalIsATerminal() throws Exception {
        Path fd = Files.createSymbolicLink(dir.resolve("2"), Path.of("/dev/pts/3"));
        assertTrue(ProgressMode.isTerminal(fd));
    }

    @Test
    void aDescriptorOnAFileOrAPipeIsNot() throws Exception {
        Path file = Files.writeString(dir.resolve("err.log"), "");
        assertFalse(ProgressMode.isTerminal(Files.createSymbolicLink(dir.resolve("2"), file)));
        assertFalse(ProgressMode.isTerminal(Files.createSymbolicLink(dir.resolve("p"), Path.of("pipe:[12345]"))));
        assertFalse(ProgressMode.isTerminal(dir.resolve("missing")));
    }

    @Test
    void onlyAutoLooksAtTheDescriptor() {
        assertTrue(ProgressMode.BAR.bar());
        assertFalse(ProgressMode.LINES.bar());
        assertFalse(ProgressMode.NONE.bar());
    }

    @Test
    void underTheTestRunnerStandardErrorIsNotATerminal() {
        // surefire gives the forked test process pipes, never a terminal
        assertFalse(ProgressMode.AUTO.bar());
    }
}
