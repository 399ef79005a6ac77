package org.spanlift.cli.options;

import org.spanlift.input.InputException;
import org.spanlift.results.Coefficients;

/** The common lift coefficient of {@code compare} and {@code report} (e, CDi and span loads are taken there). */
public final class CommonLift {

    private CommonLift() {
    }

    /**
     * A common CL given with {@code --cl}, read and checked.
     *
     * @throws InputException unless it is a decimal number with {@code 0.05 <= |CL| <= 3} (e is defined only
     *         away from zero lift)
     */
    public static double parse(String text) {
        double cl = OptionNumber.parse("--cl", text);
        check(cl);
        return cl;
    }

    /**
     * Checks a common CL.
     *
     * @throws InputException unless {@code 0.05 <= |CL| <= 3}
     */
    public static void check(double cl) {
        if (!Double.isFinite(cl) || Math.abs(cl) < Coefficients.SPAN_EFFICIENCY_MIN_LIFT || Math.abs(cl) > 3) {
            throw new InputException("--cl", 0, "", "expected a lift coefficient with 0.05 <= |CL| <= 3 (e is "
                    + "defined only away from zero lift), got " + cl);
        }
    }
}
