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

    /** A tabulated curve, linear between its points, extended along its first segment below them. */
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

    /** See {@link SectionCurve#line}. */
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

    /** See {@link SectionCurve#table}. */
    final class TableCurve implements SectionCurve {
        private final Table t;
        private final double peak;

        TableCurve(Table t) {
            if (t.size() < 2) {
                throw new IllegalArgumentException("a lift curve needs at least two points");
            }
            this.t = t;
            int best = 0;
            for (int i = 1; i < t.size(); i++) {
                if (t.y(i) > t.y(best)) {
                    best = i;
                } else if (t.y(i) < t.y(best)) {
                    break;
                }
            }
            this.peak = t.x(best);
        }

        @Override
        public double lift(double alpha) {
            if (alpha < t.x(0)) {
                return t.y(0) + slope(alpha) * (alpha - t.x(0));
            }
            return t.at(alpha);
        }

        @Override
        public double slope(double alpha) {
            int n = t.size();
            int i = 0;
            while (i < n - 2 && alpha >= t.x(i + 1)) {
                i++;
            }
            return (t.y(i + 1) - t.y(i)) / (t.x(i + 1) - t.x(i));
        }

        @Override
        public double lastAngle() {
            return t.x(t.size() - 1);
        }

        @Override
        public double peakAngle() {
            return peak;
        }
    }

    /** See {@link SectionCurve#blend}. */
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

    /** See {@link SectionCurve#shifted}. */
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
