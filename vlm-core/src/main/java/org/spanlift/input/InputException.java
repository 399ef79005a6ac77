package org.spanlift.input;

/**
 * Bad input in a file the user wrote: carries the file, the 1-based line (0 when unknown), the field path
 * and what was expected, and prints as one line {@code file:line: field: message}. Line breaks and other
 * control characters in any part (text echoed from the file, say) are shown escaped, so the message stays
 * one line.
 */
public class InputException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** The longest field path a message shows; a longer one (a key of a file's own making) is cut short. */
    private static final int MAX_FIELD = 120;

    /** The file the problem is in. */
    private final String file;
    /** The 1-based line of the problem, 0 when unknown. */
    private final int line;
    /** The dotted field path, null or empty when none. */
    private final String field;
    /** What is wrong and what is expected, without the location. */
    private final String problem;

    /** A problem at the given file, 1-based line (0 when unknown) and dotted field path (null or empty for none). */
    public InputException(String file, int line, String field, String problem) {
        super(format(file, line, field, problem));
        this.file = file;
        this.line = line;
        this.field = field;
        this.problem = problem;
    }

    private static String format(String file, int line, String field, String problem) {
        StringBuilder b = new StringBuilder(file);
        if (line > 0) {
            b.append(':').append(line);
        }
        b.append(": ");
        if (field != null && !field.isEmpty()) {
            b.append(field.length() > MAX_FIELD ? field.substring(0, MAX_FIELD - 3) + "..." : field).append(": ");
        }
        return oneLine(b.append(problem).toString());
    }

    /** The text with line breaks, tabs and other control characters written as backslash escapes. */
    public static String oneLine(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                default -> {
                    if (Character.isISOControl(c) || c == '\u2028' || c == '\u2029' || c == '\u0085') {
                        b.append(String.format("\\u%04x", (int) c));
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.toString();
    }

    /** The file the problem is in. */
    public String file() {
        return file;
    }

    /** The 1-based line of the problem, 0 when unknown. */
    public int line() {
        return line;
    }

    /** The dotted field path, null or empty when the problem is not at one field. */
    public String field() {
        return field;
    }

    /** What is wrong and what is expected, without the location. */
    public String problem() {
        return problem;
    }
}
