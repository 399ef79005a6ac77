package org.spanlift.section;

import java.util.List;

/**
 * A section's profile drag coefficient against its lift coefficient, optionally at several Reynolds
 * numbers (linear in cl within a polar, linear in Reynolds number between polars, constant beyond the
 * ends).
 *
 * @param reynolds increasing Reynolds numbers of the polars (one value 0 for a single polar; copied in and
 *                 out)
 * @param polars   cd against cl, one table per Reynolds number
 */
public record ProfileDragPolar(double[] reynolds, List<Table> polars) {

    /** Copies the arrays and checks that there is one polar per Reynolds number, at least one. */
    public ProfileDragPolar {
        reynolds = reynolds.clone();
        polars = List.copyOf(polars);
        if (reynolds.length != polars.size() || polars.isEmpty()) {
            throw new IllegalArgumentException("one polar per Reynolds number");
        }
    }

    /** The Reynolds numbers of the polars (a copy). */
    @Override
    public double[] reynolds() {
        return reynolds.clone();
    }

    /** The profile drag coefficient at section lift coefficient {@code cl} and Reynolds number {@code re}. */
    public double cd(double cl, double re) {
        int n = reynolds.length;
        if (n == 1 || re <= reynolds[0]) {
            return polars.get(0).at(cl);
        }
        if (re >= reynolds[n - 1]) {
            return polars.get(n - 1).at(cl);
        }
        int hi = 1;
        while (reynolds[hi] < re) {
            hi++;
        }
        double w = (re - reynolds[hi - 1]) / (reynolds[hi] - reynolds[hi - 1]);
        return (1 - w) * polars.get(hi - 1).at(cl) + w * polars.get(hi).at(cl);
    }
}
