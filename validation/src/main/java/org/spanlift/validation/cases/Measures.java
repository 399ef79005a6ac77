package org.spanlift.validation.cases;

import org.spanlift.geometry.Wing;
import org.spanlift.results.Solution;
import org.spanlift.results.SpanLoad;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.validation.liftingline.LiftingLineSolution;
import org.spanlift.validation.liftingline.LiftingLineSolver;
import org.spanlift.validation.liftingline.LiftingLineWing;

/** The quantities the cases measure on a wing, and the lifting-line references they are compared with. */
public final class Measures {

    /** Angle of attack at which span efficiency and span loads are read, rad (CL near 0.5 on these wings). */
    public static final double ALPHA = 0.1;

    private static final LiftingLineSolver LIFTING_LINE = new LiftingLineSolver();

    private Measures() {
    }

    /** dCL/dalpha at zero lift, per radian, with the wing's own deflections. */
    public static double liftSlope(Wing wing) {
        WingAnalysis a = WingAnalysis.of(wing);
        return a.liftCurve(a.fileDeflections()).slope();
    }

    /** The wing's zero-lift angle, degrees. */
    public static double zeroLiftAngleDeg(Wing wing) {
        WingAnalysis a = WingAnalysis.of(wing);
        return Math.toDegrees(a.liftCurve(a.fileDeflections()).zeroLiftAngle());
    }

    /** Span efficiency at {@link #ALPHA}. */
    public static double spanEfficiency(Wing wing) {
        Solution s = WingAnalysis.of(wing).solve(ALPHA);
        return s.coefficients().spanEfficiency().orElse(Double.NaN);
    }

    /**
     * Flap effectiveness -d alpha_0/d delta of a flat, untwisted wing whose only control is a flap: from
     * the zero-lift angle at a small deflection d, tan(alpha_0) = -d X/Z exactly (superposition), so
     * tau = -tan(alpha_0)/d.
     */
    public static double flapEffectiveness(Wing wing) {
        double d = 1e-3;
        WingAnalysis a = WingAnalysis.of(wing);
        return -Math.tan(a.liftCurve(new double[] {d}).zeroLiftAngle()) / d;
    }

    /**
     * Section lift slope at the root strip, dcl / d(alpha - alpha_i), per radian, with alpha_i the strip's
     * induced angle.
     */
    public static double rootSectionLiftSlope(Wing wing) {
        // With the freestream (cos a, 0, sin a) the load of a flat wing goes as sin(a), not a: read the slope
        // at a small angle, where the two differ by a^2/6 (2e-7 here), not at ALPHA (0.17%).
        double alpha = 1e-3;
        SpanLoad l = WingAnalysis.of(wing).solve(alpha).spanLoad(0);
        int root = l.size() / 2;            // the first strip right of the plane of symmetry
        return l.cl()[root] / (alpha - l.inducedAngle()[root]);
    }

    /**
     * Largest departure of the span load c cl from the elliptic load of the same lift, over strips with
     * |eta| up to {@code etaMax}, percent of the elliptic load at the root.
     */
    public static double ellipticLoadDeviationPct(Wing wing, double etaMax) {
        Solution s = WingAnalysis.of(wing).solve(ALPHA);
        double cl = s.coefficients().lift();
        double area = wing.reference().area();
        double b = wing.reference().span();
        double root = 4 * cl * area / (Math.PI * b);
        SpanLoad l = s.spanLoad(0);
        double[] ys = l.y();
        double[] clc = l.clc();
        double worst = 0;
        for (int i = 0; i < ys.length; i++) {
            double eta = 2 * ys[i] / b;
            if (Math.abs(eta) <= etaMax) {
                double elliptic = root * Math.sqrt(1 - eta * eta);
                worst = Math.max(worst, Math.abs(clc[i] - elliptic) / root);
            }
        }
        return 100 * worst;
    }

    /**
     * Largest departure of c cl / CL from Schrenk's load (c(y) + c_e(y)) / 2, c_e the elliptic chord of the
     * same span and area, over strips with |eta| up to {@code etaMax}, percent of the mean chord S/b.
     */
    public static double schrenkDeviationPct(Wing wing, double etaMax) {
        Solution s = WingAnalysis.of(wing).solve(ALPHA);
        double cl = s.coefficients().lift();
        double area = wing.reference().area();
        double b = wing.reference().span();
        double mean = area / b;
        SpanLoad l = s.spanLoad(0);
        double[] ys = l.y();
        double[] clc = l.clc();
        double worst = 0;
        for (int i = 0; i < ys.length; i++) {
            double y = ys[i];
            double eta = 2 * y / b;
            if (Math.abs(eta) <= etaMax) {
                double chord = wing.main().planform().chord(Math.abs(y));
                double elliptic = 4 * area / (Math.PI * b) * Math.sqrt(1 - eta * eta);
                double schrenk = 0.5 * (chord + elliptic);
                worst = Math.max(worst, Math.abs(clc[i] / cl - schrenk) / mean);
            }
        }
        return 100 * worst;
    }

    /** Lifting-line (Glauert series) solution of a straight-tapered wing of the case family, a0 = 2 pi. */
    public static LiftingLineSolution liftingLine(double aspectRatio, double taper) {
        double span = 2 * Wings.SEMI_SPAN;
        double root = 2 * span / (aspectRatio * (1 + taper));   // S = b^2/A = b cr (1 + taper)/2
        return LIFTING_LINE.solve(LiftingLineWing.trapezoidal(span, root, taper), ALPHA);
    }
}
