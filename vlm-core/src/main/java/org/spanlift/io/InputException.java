package org.spanlift.io;

/**
 * Bad input in a file the user wrote: carries the file, the 1-based line (0 when unknown), the field path
 * and what was expected, and prints as one line {@code file:line: field: message}.
 */
public class InputException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final String file;
    private final int line;
    private final String field;
    private final String problem;

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
            b.append(field).append(": ");
        }
        return b.append(problem).toString();
    }

    public String file() {
        return file;
    }

    public int line() {
        return line;
    }

    public String field() {
        return field;
    }

    /** What is wrong and what is expected, without the location. */
    public String problem() {
        return problem;
    }
}
