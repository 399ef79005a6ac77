package org.spanlift.cli.sweep;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * How a sweep reports its progress on standard error: a bar redrawn in place, a line every ten seconds, or
 * nothing; {@code auto} draws the bar only when standard error itself is a terminal (decided from the file
 * descriptor, not from {@code System.console()}, which looks at standard input and output), else lines.
 */
public enum ProgressMode {
    AUTO, BAR, LINES, NONE;

    /** Where this process's standard error points, on Linux. */
    static final Path STANDARD_ERROR = Path.of("/proc/self/fd/2");

    /** True when progress goes to the terminal as a bar redrawn in place. */
    public boolean bar() {
        return this == BAR || (this == AUTO && isTerminal(STANDARD_ERROR));
    }

    /**
     * True when the file descriptor link names a terminal device ({@code /dev/pts/N}, {@code /dev/ttyN} or
     * {@code /dev/tty}); false when it names a file or a pipe, or cannot be read (another system).
     */
    static boolean isTerminal(Path descriptor) {
        try {
            String target = Files.readSymbolicLink(descriptor).toString();
            return target.startsWith("/dev/pts/") || target.startsWith("/dev/tty");
        } catch (IOException | UnsupportedOperationException | SecurityException e) {
            return false;
        }
    }
}
