package org.spanlift.stall;

/** The highest lift of a curve between two angles, found by sampling and golden-section refinement. */
final class Peaks {

    private static final double STEP = Math.toRadians(0.05);
    private static final double TOLERANCE = 1e-9;

    private Peaks() {
    }

    /** The angle (rad) of the highest lift of the curve within [from, to]. */
    static double first(SectionCurve curve, double from, double to) {
        if (!(to > from)) {
            return from;
        }
        int n = Math.max(2, (int) Math.ceil((to - from) / STEP));
        double h = (to - from) / n;
        int best = 0;
        double top = curve.lift(from);
        for (int i = 1; i <= n; i++) {
            double v = curve.lift(from + i * h);
            if (v > top) {
                top = v;
                best = i;
            }
        }
        double lo = from + Math.max(0, best - 1) * h;
        double hi = from + Math.min(n, best + 1) * h;
        double g = (Math.sqrt(5) - 1) / 2;
        double c = hi - g * (hi - lo);
        double d = lo + g * (hi - lo);
        while (hi - lo > TOLERANCE) {
            if (curve.lift(c) >= curve.lift(d)) {
                hi = d;
            } else {
                lo = c;
            }
            c = hi - g * (hi - lo);
            d = lo + g * (hi - lo);
        }
        return 0.5 * (lo + hi);
    }
}
