package org.spanlift.io;

import org.spanlift.input.Field;
import org.spanlift.input.quantity.Quantity;
import org.spanlift.input.quantity.QuantityFormatException;
import org.spanlift.input.quantity.QuantityKind;

/** Typed reads of the dimensional values in structure, cases and envelope files, failing at the field. */
final class Quantities {

    private Quantities() {
    }

    /** A mass with its unit (kg, g, lb), not negative. */
    static double mass(Field f) {
        double m = f.quantity(QuantityKind.MASS);
        if (m < 0) {
            throw f.error("a mass must not be negative, got " + f.text());
        }
        return m;
    }

    /** A mass per unit span, such as {@code 12kg/m} or {@code 0.7lb/in}, in kg/m, not negative. */
    static double massPerSpan(Field f) {
        String t = f.text().strip();
        int slash = t.lastIndexOf('/');
        if (slash <= 0 || slash == t.length() - 1) {
            throw f.error("expected a mass per unit span such as 12kg/m or 0.7lb/in, got '" + t + "'");
        }
        double mass;
        double length;
        try {
            mass = Quantity.parse(t.substring(0, slash), QuantityKind.MASS).value();
            length = Quantity.parse("1" + t.substring(slash + 1).strip(), QuantityKind.LENGTH).value();
        } catch (QuantityFormatException e) {
            throw f.error("expected a mass per unit span such as 12kg/m or 0.7lb/in (a mass in kg, g or lb over "
                    + "a length unit m, mm, ft or in), got '" + t + "'");
        }
        if (mass < 0) {
            throw f.error("a mass must not be negative, got " + t);
        }
        return mass / length;
    }

    /** A speed (m/s, km/h, kt, mph, and for gust velocities also ft/s), positive, m/s. */
    static double speed(Field f) {
        String t = f.text().strip();
        double v;
        try {
            v = Quantity.parse(t, QuantityKind.SPEED).value();
        } catch (QuantityFormatException e) {
            if (!t.endsWith("/s")) {
                throw f.error(e.getMessage() + " or ft/s");
            }
            try {
                v = Quantity.parse(t.substring(0, t.length() - 2), QuantityKind.LENGTH).value();
            } catch (QuantityFormatException e2) {
                throw f.error(e.getMessage() + " or ft/s");
            }
        }
        if (!(v > 0)) {
            throw f.error("a speed must be positive, got " + t);
        }
        return v;
    }
}
