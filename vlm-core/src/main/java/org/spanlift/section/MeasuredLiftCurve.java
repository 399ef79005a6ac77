package org.spanlift.section;

import java.util.Arrays;

/**
 * A section's measured lift coefficient against its angle of attack (from the chord line) through and
 * beyond the stall, at one or more Reynolds numbers: the points as given, linear in Reynolds number between
 * curves, constant beyond the Reynolds numbers' ends ({@link #at}). Between the angles the stall analysis
 * interpolates with a monotone cubic ({@code stall.SectionCurve.table}). Angles in radians. Immutable.
 */
public final class MeasuredLiftCurve {

    private final double[] reynolds;
    private final double[] alpha;
    private final double[][] cl;

    /**
     * @param reynolds increasing Reynolds numbers (one value, 0, for a curve without one)
     * @param alpha    strictly increasing angles of attack, rad, at least two
     * @param cl       cl per Reynolds number, each as long as {@code alpha}
     * @throws IllegalArgumentException when the shapes or orders do not hold
     */
    public MeasuredLiftCurve(double[] reynolds, double[] alpha, double[][] cl) {
        if (reynolds.length == 0 || reynolds.length != cl.length || alpha.length < 2) {
            throw new IllegalArgumentException("one cl row per Reynolds number and at least two angles");
        }
        for (int i = 1; i < alpha.length; i++) {
            if (!(alpha[i] > alpha[i - 1])) {
                throw new IllegalArgumentException("the angles must increase strictly");
            }
        }
        for (int i = 1; i < reynolds.length; i++) {
            if (!(reynolds[i] > reynolds[i - 1])) {
                throw new IllegalArgumentException("the Reynolds numbers must increase strictly");
            }
        }
        this.reynolds = reynolds.clone();
        this.alpha = alpha.clone();
        this.cl = new double[cl.length][];
        for (int r = 0; r < cl.length; r++) {
            if (cl[r].length != alpha.length) {
                throw new IllegalArgumentException("each cl row needs one value per angle");
            }
            this.cl[r] = cl[r].clone();
        }
    }

    /** A curve without a Reynolds number. */
    public static MeasuredLiftCurve of(double[] alpha, double[] cl) {
        return new MeasuredLiftCurve(new double[] {0}, alpha, new double[][] {cl});
    }

    /** The points of the curve at one Reynolds number: cl against alpha (rad), linear between the given curves. */
    public Table at(double re) {
        int n = reynolds.length;
        if (n == 1 || re <= reynolds[0]) {
            return new Table(alpha, cl[0]);
        }
        if (re >= reynolds[n - 1]) {
            return new Table(alpha, cl[n - 1]);
        }
        int hi = 1;
        while (reynolds[hi] < re) {
            hi++;
        }
        double w = (re - reynolds[hi - 1]) / (reynolds[hi] - reynolds[hi - 1]);
        double[] mixed = new double[alpha.length];
        for (int i = 0; i < alpha.length; i++) {
            mixed[i] = (1 - w) * cl[hi - 1][i] + w * cl[hi][i];
        }
        return new Table(alpha, mixed);
    }

    /** The angles, rad (a copy). */
    public double[] alpha() {
        return alpha.clone();
    }

    /** The Reynolds numbers (a copy). */
    public double[] reynolds() {
        return reynolds.clone();
    }

    /** The cl of Reynolds-number row r (a copy). */
    public double[] cl(int r) {
        return cl[r].clone();
    }

    @Override
    public String toString() {
        return "MeasuredLiftCurve" + Arrays.toString(reynolds);
    }
}
