package org.spanlift.cli.options;

import org.spanlift.input.InputException;
import org.spanlift.input.quantity.Decimal;
import org.spanlift.input.quantity.QuantityFormatException;

/** A plain number given to an option, in the one number syntax of the files ({@link Decimal}). */
public final class OptionNumber {

    private OptionNumber() {
    }

    /**
     * @param option the option, for the message
     * @param text   the value as typed
     * @return the number
     * @throws InputException naming the option when the text is not a decimal number
     */
    public static double parse(String option, String text) {
        try {
            return Decimal.parse(text);
        } catch (QuantityFormatException e) {
            throw new InputException(option, 0, "", e.getMessage());
        }
    }
}
