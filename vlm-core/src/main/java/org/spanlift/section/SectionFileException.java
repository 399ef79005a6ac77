package org.spanlift.section;

import java.nio.file.Path;

/**
 * A coordinate file that cannot be used. The message is one line:
 * {@code FILE:LINE: what is wrong; expected what}, or {@code FILE: ...} where no line applies.
 */
public class SectionFileException extends IllegalArgumentException {

    private final transient Path file;
    private final int line;

    /**
     * @param file     the file
     * @param line     1-based line number, or 0 where no single line applies
     * @param problem  what is wrong
     * @param expected what is expected instead
     */
    public SectionFileException(Path file, int line, String problem, String expected) {
        super(format(file, line, problem, expected));
        this.file = file;
        this.line = line;
    }

    private static String format(Path file, int line, String problem, String expected) {
        String where = line > 0 ? file + ":" + line : String.valueOf(file);
        String text = where + ": " + problem + "; expected " + expected;
        return text.replace('\n', ' ').replace('\r', ' ');
    }

    /** The file concerned. */
    public Path file() {
        return file;
    }

    /** The 1-based line number, or 0 where no single line applies. */
    public int line() {
        return line;
    }
}
