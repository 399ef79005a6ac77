package org.spanlift.input.quantity;

/** A quantity string that cannot be read as the kind asked for; the message is one line. */
public class QuantityFormatException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    /**
     * @param message one line saying what was expected and what was given
     */
    public QuantityFormatException(String message) {
        super(message);
    }
}
