package org.spanlift.solve;

import org.spanlift.input.RefusedException;
/** The influence system cannot be solved reliably: the geometry is degenerate (crossing or coincident panels). */
public final class SingularSystemException extends RefusedException {

    private static final long serialVersionUID = 1L;

    /** A refusal with the given message. */
    public SingularSystemException(String message) {
        super(message);
    }
}
