package org.spanlift.stall;

import org.spanlift.section.Table;

/**
 * A section's lift coefficient against its angle of attack through the stall, the angle measured from the
 * section's chord line, in radians. Implementations are immutable.
 */
public interface SectionCurve {

    /** The section lift coefficient at angle of attack alpha (rad). */
    double lift(double alpha);

    /** d cl / d alpha at alpha, per radian (the right-hand slope at a table's corner). */
    double slope(double alpha);

    /** The largest angle (rad) at which the curve is known; a table ends there. */
    double lastAngle();

    /** The angle (rad) of the curve's first maximum of lift. */
    double peakAngle();

    /** The curve's first maximum of lift. */
    default double peakLift() {
        return lift(peakAngle());
    }

    /**
     * A tabulated curve, the monotone cubic through its points ({@link TableCurve}), extended along a straight
     * line below them.
     */
    static SectionCurve table(Table t) {
        return new TableCurve(t);
    }

    /** {@code (1 - w) a + w b}: a blend of two curves at the same angle. */
    static SectionCurve blend(SectionCurve a, SectionCurve b, double w) {
        if (w == 0) {
            return a;
        }
        if (w == 1) {
            return b;
        }
        return new Blend(a, b, w);
    }

    /** {@code base(alpha + shift) + raise}: the curve moved to lower angles by shift and up by raise. */
    static SectionCurve shifted(SectionCurve base, double shift, double raise) {
        if (shift == 0 && raise == 0) {
            return base;
        }
        return new Shifted(base, shift, raise);
    }

    /** A straight line cl = slope (alpha - zeroLift), known at every angle: the thin-airfoil form. */
    static SectionCurve line(double slope, double zeroLift) {
        return new Line(slope, zeroLift);
    }

    /**
     * See {@link SectionCurve#line}.
     *
     * @param liftSlope the slope dcl/dalpha, per radian
     * @param zeroLift  the zero-lift angle, rad
     */
    record Line(double liftSlope, double zeroLift) implements SectionCurve {
        @Override
        public double lift(double alpha) {
            return liftSlope * (alpha - zeroLift);
        }

        @Override
        public double slope(double alpha) {
            return liftSlope;
        }

        @Override
        public double lastAngle() {
            return Double.POSITIVE_INFINITY;
        }

        @Override
        public double peakAngle() {
            return Double.POSITIVE_INFINITY;
        }

        @Override
        public double peakLift() {
            return Double.POSITIVE_INFINITY;
        }
    }

    /**
     * See {@link SectionCurve#table}: the monotone piecewise cubic of Fritsch and Carlson ("Monotone
     * piecewise cubic interpolation", SIAM J. Numer. Anal. 17(2), 1980), with the slopes at the points chosen
     * by the harmonic-mean rule of Fritsch and Butland (SIAM J. Sci. Stat. Comput. 5(2), 1984). It passes
     * through every point, rises and falls where the table does (a point where the table turns keeps slope
     * zero, so the table's highest cl stays the peak, at its angle) and has a continuous slope, which
     * Newton's method needs. Below the first point it continues along the first segment's straight line.
     */
    final class TableCurve implements SectionCurve {
        private final double[] x;
        private final double[] y;
        private final double[] d;
        private final double peak;

        TableCurve(Table t) {
            int n = t.size();
            if (n < 2) {
                throw new IllegalArgumentException("a lift curve needs at least two points");
            }
            x = new double[n];
            y = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = t.x(i);
                y[i] = t.y(i);
            }
            double[] delta = new double[n - 1];
            for (int i = 0; i < n - 1; i++) {
                delta[i] = (y[i + 1] - y[i]) / (x[i + 1] - x[i]);
            }
            d = new double[n];
            d[0] = delta[0];
            d[n - 1] = delta[n - 2];
            for (int i = 1; i < n - 1; i++) {
                if (delta[i - 1] * delta[i] <= 0) {
                    d[i] = 0;
                } else {
                    double h0 = x[i] - x[i - 1];
                    double h1 = x[i + 1] - x[i];
                    double w0 = 2 * h1 + h0;
                    double w1 = h1 + 2 * h0;
                    d[i] = (w0 + w1) / (w0 / delta[i - 1] + w1 / delta[i]);
                }
            }
            int best = 0;
            for (int i = 1; i < n; i++) {
                if (y[i] > y[best]) {
                    best = i;
                } else if (y[i] < y[best]) {
                    break;
                }
            }
            this.peak = x[best];
        }

        private int segment(double alpha) {
            int i = java.util.Arrays.binarySearch(x, alpha);
            int k = i >= 0 ? i : -i - 2;
            return Math.max(0, Math.min(x.length - 2, k));
        }

        @Override
        public double lift(double alpha) {
            if (alpha <= x[0]) {
                return y[0] + d[0] * (alpha - x[0]);
            }
            if (alpha >= x[x.length - 1]) {
                return y[y.length - 1];
            }
            int k = segment(alpha);
            double h = x[k + 1] - x[k];
            double s = (alpha - x[k]) / h;
            double h00 = (1 + 2 * s) * (1 - s) * (1 - s);
            double h10 = s * (1 - s) * (1 - s);
            double h01 = s * s * (3 - 2 * s);
            double h11 = s * s * (s - 1);
            return h00 * y[k] + h10 * h * d[k] + h01 * y[k + 1] + h11 * h * d[k + 1];
        }

        @Override
        public double slope(double alpha) {
            if (alpha <= x[0]) {
                return d[0];
            }
            if (alpha >= x[x.length - 1]) {
                return 0;
            }
            int k = segment(alpha);
            double h = x[k + 1] - x[k];
            double s = (alpha - x[k]) / h;
            double dh00 = 6 * s * (s - 1) / h;
            double dh10 = (1 - s) * (1 - 3 * s);
            double dh01 = -6 * s * (s - 1) / h;
            double dh11 = s * (3 * s - 2);
            return dh00 * y[k] + dh10 * d[k] + dh01 * y[k + 1] + dh11 * d[k + 1];
        }

        @Override
        public double lastAngle() {
            return x[x.length - 1];
        }

        @Override
        public double peakAngle() {
            return peak;
        }
    }

    /**
     * See {@link SectionCurve#blend}.
     *
     * @param a the curve of weight 1 - w
     * @param b the curve of weight w
     * @param w the weight of {@code b}
     */
    record Blend(SectionCurve a, SectionCurve b, double w) implements SectionCurve {
        @Override
        public double lift(double alpha) {
            return (1 - w) * a.lift(alpha) + w * b.lift(alpha);
        }

        @Override
        public double slope(double alpha) {
            return (1 - w) * a.slope(alpha) + w * b.slope(alpha);
        }

        @Override
        public double lastAngle() {
            return Math.min(a.lastAngle(), b.lastAngle());
        }

        @Override
        public double peakAngle() {
            return Peaks.first(this, Math.min(a.peakAngle(), b.peakAngle()), Math.max(a.peakAngle(), b.peakAngle()));
        }
    }

    /**
     * See {@link SectionCurve#shifted}.
     *
     * @param base  the curve moved
     * @param shift the move to lower angles, rad
     * @param raise the rise of cl
     */
    record Shifted(SectionCurve base, double shift, double raise) implements SectionCurve {
        @Override
        public double lift(double alpha) {
            return base.lift(alpha + shift) + raise;
        }

        @Override
        public double slope(double alpha) {
            return base.slope(alpha + shift);
        }

        @Override
        public double lastAngle() {
            return base.lastAngle() - shift;
        }

        @Override
        public double peakAngle() {
            return base.peakAngle() - shift;
        }
    }
}
