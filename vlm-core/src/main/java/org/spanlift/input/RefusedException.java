package org.spanlift.input;

/**
 * A question the engine cannot answer for the inputs it was given, such as a target CL beyond the linear
 * range, a geometry whose system is singular, or stall results for sections without cl_max. The message is
 * one line that says why and what to check. Unlike {@link InputException} it carries no file location: the
 * caller knows which file or option the inputs came from. Any other exception from the engine is a bug.
 */
public class RefusedException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** A refusal with the given message, made one line. */
    public RefusedException(String message) {
        super(InputException.oneLine(message));
    }
}
