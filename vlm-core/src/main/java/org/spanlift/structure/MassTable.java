package org.spanlift.structure;

/**
 * Mass per unit span of one half-wing, linear between rows, zero outside the first and last row.
 * Immutable: the arrays are copied on the way in and on the way out.
 *
 * @param y        spanwise positions, m, strictly increasing (copied)
 * @param perSpan  mass per unit span there, kg/m, not negative (copied)
 */
public record MassTable(double[] y, double[] perSpan) {

    /** Checks the rows (at least two, y increasing, mass per span finite and not negative) and copies them. */
    public MassTable {
        if (y.length < 2 || y.length != perSpan.length) {
            throw new IllegalArgumentException("a mass table needs at least two rows of y and mass per span");
        }
        y = y.clone();
        perSpan = perSpan.clone();
        for (int i = 0; i < y.length; i++) {
            if (!(perSpan[i] >= 0) || !Double.isFinite(perSpan[i])) {
                throw new IllegalArgumentException("a mass per span must not be negative");
            }
            if (i > 0 && !(y[i] > y[i - 1])) {
                throw new IllegalArgumentException("mass-table rows must be in increasing y");
            }
        }
    }

    /** A copy of the stations, m. */
    @Override
    public double[] y() {
        return y.clone();
    }

    /** A copy of the mass per unit span at each station, kg/m. */
    @Override
    public double[] perSpan() {
        return perSpan.clone();
    }

    /** Mass per unit span at y, kg/m. */
    public double at(double yy) {
        if (yy < y[0] || yy > y[y.length - 1]) {
            return 0;
        }
        for (int i = 1; i < y.length; i++) {
            if (yy <= y[i]) {
                double w = (yy - y[i - 1]) / (y[i] - y[i - 1]);
                return (1 - w) * perSpan[i - 1] + w * perSpan[i];
            }
        }
        return perSpan[y.length - 1];
    }
}
