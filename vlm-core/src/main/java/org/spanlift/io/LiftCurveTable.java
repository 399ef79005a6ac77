package org.spanlift.io;

import org.spanlift.input.InputException;
import org.spanlift.section.MeasuredLiftCurve;

/**
 * A section lift curve as a reader took it from a wing file or a CSV file, before it becomes a
 * {@link MeasuredLiftCurve}: angles still in degrees, and with the place each value came from, so that a
 * check on the curve as a whole can name the line of the value at fault.
 *
 * @param reynolds the Reynolds numbers, {0} for a curve without one
 * @param alphaDeg the angles of attack, degrees, strictly increasing
 * @param cl       one row of cl per Reynolds number, each as long as {@code alphaDeg}
 * @param place    where a value of the curve is, for messages
 * @param name     the curve in words, for a message about another key: {@code the lift curve (line 9)}
 */
record LiftCurveTable(double[] reynolds, double[] alphaDeg, double[][] cl, Place place, String name) {

    /** Where the values of a curve are. */
    interface Place {
        /**
         * An error at the cl value of Reynolds-number row {@code row} at angle index {@code point}.
         */
        InputException at(int row, int point, String problem);
    }

    /** The model's curve, angles in radians. */
    MeasuredLiftCurve model() {
        double[] alpha = new double[alphaDeg.length];
        for (int i = 0; i < alpha.length; i++) {
            alpha[i] = Math.toRadians(alphaDeg[i]);
        }
        return new MeasuredLiftCurve(reynolds, alpha, cl);
    }

    /** Whether the curve is given against Reynolds number (rather than as one curve without one). */
    boolean hasReynolds() {
        return !(reynolds.length == 1 && reynolds[0] == 0);
    }
}
