package org.spanlift.io;

import org.spanlift.input.Field;
import org.spanlift.input.quantity.PhysicalRange;
import org.spanlift.input.quantity.Quantity;
import org.spanlift.input.quantity.QuantityFormatException;
import org.spanlift.input.quantity.QuantityKind;

/** Typed reads of the dimensional values in structure, cases and envelope files, failing at the field. */
final class Quantities {

    private Quantities() {
    }

    /** The largest mass per unit span accepted, kg/m: a thousand tonnes over ten metres. */
    static final double MAX_MASS_PER_SPAN = 1e5;

    /** A mass with its unit (kg, g, lb), within {@link PhysicalRange#MASS}. */
    static double mass(Field f) {
        double m = f.quantity(QuantityKind.MASS);
        if (m < 0) {
            throw f.error("a mass must not be negative, got " + f.value().describe());
        }
        return f.quantity(PhysicalRange.MASS);
    }

    /** A mass per unit span, such as {@code 12kg/m} or {@code 0.7lb/in}, in kg/m, not negative. */
    static double massPerSpan(Field f) {
        String t = f.text().strip();
        int slash = t.lastIndexOf('/');
        if (slash <= 0 || slash == t.length() - 1) {
            throw f.error("expected a mass per unit span such as 12kg/m or 0.7lb/in, got " + f.value().describe());
        }
        double mass;
        double length;
        try {
            mass = Quantity.parse(t.substring(0, slash), QuantityKind.MASS).value();
            length = Quantity.parse("1" + t.substring(slash + 1).strip(), QuantityKind.LENGTH).value();
        } catch (QuantityFormatException e) {
            throw f.error("expected a mass per unit span such as 12kg/m or 0.7lb/in (a mass in kg, g or lb over "
                    + "a length unit m, mm, ft or in), got " + f.value().describe());
        }
        if (mass < 0) {
            throw f.error("a mass must not be negative, got " + f.value().describe());
        }
        double perSpan = mass / length;
        if (!(perSpan <= MAX_MASS_PER_SPAN)) {
            throw f.error("a mass per unit span must be from 0 to " + Field.brief(MAX_MASS_PER_SPAN) + " kg/m (a "
                    + "thousand tonnes over ten metres), got " + f.value().describe());
        }
        return perSpan;
    }

    /**
     * A speed (m/s, km/h, kt, mph, and for gust velocities also ft/s), m/s, within
     * {@link PhysicalRange#SPEED}.
     */
    static double speed(Field f) {
        String t = f.text().strip();
        double v;
        try {
            v = Quantity.parse(t, QuantityKind.SPEED).value();
        } catch (QuantityFormatException e) {
            String withFeet = e.getMessage().replace("(m/s, km/h, kt, mph)", "(m/s, km/h, kt, mph, or ft/s)");
            if (!t.endsWith("/s")) {
                throw f.error(withFeet);
            }
            try {
                v = Quantity.parse(t.substring(0, t.length() - 2), QuantityKind.LENGTH).value();
            } catch (QuantityFormatException e2) {
                throw f.error(withFeet);
            }
        }
        if (!(v > 0)) {
            throw f.error("a speed must be positive, got " + f.value().describe());
        }
        try {
            return PhysicalRange.SPEED.check(v, t);
        } catch (QuantityFormatException e) {
            throw f.error(e.getMessage());
        }
    }
}
