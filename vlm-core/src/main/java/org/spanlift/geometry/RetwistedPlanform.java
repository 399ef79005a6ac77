package org.spanlift.geometry;

import java.util.Arrays;
import java.util.List;

/**
 * Another planform with a twist change added: piecewise linear in y through its own knots, zero at the root
 * (the base's {@code yStart}) and the given change at each knot, the last knot at the tip. Everything else is
 * the base's, and the knots are not lattice cut lines (the base's stations are), so the lattice, the sections
 * and their blends stay exactly the base's and only the strips' incidence changes: the twist change at a
 * strip's control point, as any twist enters the lattice.
 *
 * @param base   the planform whose twist is changed
 * @param knots  y of the knots, m, increasing, above the root, the last at the tip
 * @param change the twist change at each knot, rad, positive nose-up
 */
public record RetwistedPlanform(Planform base, double[] knots, double[] change) implements Planform {

    /**
     * Copies the arrays and checks them: a base without a twist change, one finite change per knot, knots
     * increasing from the root with the last at the tip.
     */
    public RetwistedPlanform {
        knots = knots.clone();
        change = change.clone();
        if (base instanceof RetwistedPlanform) {
            throw new IllegalArgumentException("a twist change applies to a planform without one");
        }
        if (knots.length == 0 || knots.length != change.length) {
            throw new IllegalArgumentException("give a twist change at each knot, at least one");
        }
        double previous = base.yStart();
        for (int k = 0; k < knots.length; k++) {
            if (!(knots[k] > previous) || !Double.isFinite(change[k])) {
                throw new IllegalArgumentException("twist knots must increase from the root, with finite changes");
            }
            previous = knots[k];
        }
        if (Math.abs(knots[knots.length - 1] - base.yEnd()) > 1e-9 * (base.yEnd() - base.yStart())) {
            throw new IllegalArgumentException("the last twist knot must be at the tip");
        }
    }

    /** The knots' y, m (a copy). */
    @Override
    public double[] knots() {
        return knots.clone();
    }

    /** The twist change at each knot, rad (a copy). */
    @Override
    public double[] change() {
        return change.clone();
    }

    /** The twist change at y, rad: linear between the root (zero), the knots, and constant past the last. */
    public double changeAt(double y) {
        double y0 = base.yStart();
        double c0 = 0;
        double ay = y;
        for (int k = 0; k < knots.length; k++) {
            if (ay <= knots[k] || k == knots.length - 1) {
                double f = Math.min(1, Math.max(0, (ay - y0) / (knots[k] - y0)));
                return c0 + f * (change[k] - c0);
            }
            y0 = knots[k];
            c0 = change[k];
        }
        throw new IllegalStateException("unreachable");
    }

    /**
     * The twist change at y per unit change at knot k (the knot's hat function): 1 at the knot, falling
     * linearly to zero at its neighbours and the root; the last knot's stays 1 past the tip.
     */
    public static double shape(double[] knots, double root, int k, double y) {
        double ay = y;
        double left = k == 0 ? root : knots[k - 1];
        double at = knots[k];
        if (ay <= left) {
            return 0;
        }
        if (ay <= at) {
            return (ay - left) / (at - left);
        }
        if (k == knots.length - 1) {
            return 1;
        }
        double right = knots[k + 1];
        return ay < right ? (right - ay) / (right - at) : 0;
    }

    @Override
    public double yStart() {
        return base.yStart();
    }

    @Override
    public double yEnd() {
        return base.yEnd();
    }

    @Override
    public double chord(double y) {
        return base.chord(y);
    }

    @Override
    public double noseX(double y) {
        return base.noseX(y);
    }

    @Override
    public double noseZ(double y) {
        return base.noseZ(y);
    }

    @Override
    public double twist(double y) {
        return base.twist(y) + changeAt(y);
    }

    @Override
    public SectionBlend section(double y) {
        return base.section(y);
    }

    @Override
    public List<String> sectionNames() {
        return base.sectionNames();
    }

    @Override
    public List<Double> stationYs() {
        return base.stationYs();
    }

    @Override
    public double area() {
        return base.area();
    }

    @Override
    public double chordSquaredIntegral() {
        return base.chordSquaredIntegral();
    }

    @Override
    public double chordNoseXIntegral() {
        return base.chordNoseXIntegral();
    }

    @Override
    public double chordYIntegral() {
        return base.chordYIntegral();
    }

    @Override
    public double chordNoseZIntegral() {
        return base.chordNoseZIntegral();
    }

    @Override
    public RetwistedPlanform withWashoutChange(double washoutChange) {
        return new RetwistedPlanform(base.withWashoutChange(washoutChange), knots, change);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RetwistedPlanform r && r.base.equals(base) && Arrays.equals(r.knots, knots)
                && Arrays.equals(r.change, change);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * base.hashCode() + Arrays.hashCode(knots)) + Arrays.hashCode(change);
    }

    @Override
    public String toString() {
        return "RetwistedPlanform[" + base + ", knots " + Arrays.toString(knots) + ", change "
                + Arrays.toString(change) + "]";
    }
}
