package org.spanlift.validation.nonlinear;

import java.util.Arrays;

/**
 * A two-dimensional section lift curve cl(alpha) for the nonlinear lifting-line check, alpha being the
 * section's effective angle of attack measured from its chord line [rad]. Three kinds:
 * <ul>
 *   <li>{@link #linear}: the straight line cl = a0 (alpha - alpha0), no stall (the thin-airfoil line when
 *       a0 = 2 pi; Glauert, The Elements of Aerofoil and Airscrew Theory, 1926, chapter VII);</li>
 *   <li>{@link #tableDegrees}: points (alpha in degrees, cl) joined by straight lines, as section data are
 *       used in the step-by-step method of Sivells and Neely (NACA TN 1269, 1947);</li>
 *   <li>{@link #synthetic}: a straight line of slope a0 through alpha0, a parabolic cap that joins it with
 *       the same slope and reaches cl_max with zero slope, and beyond the peak, after a smooth blend, the
 *       post-stall lift of Viterna and Corrigan (1982).</li>
 * </ul>
 *
 * <p>The synthetic curve, with Delta the width of the cap (an angle), has its peak at
 * alpha_s = alpha0 + cl_max / a0 + Delta / 2 and is
 * <pre>
 *   cl = a0 (alpha - alpha0)                                alpha &lt;= alpha_s - Delta
 *   cl = cl_max - (a0 / (2 Delta)) (alpha_s - alpha)^2          alpha_s - Delta &lt;= alpha &lt;= alpha_s
 *   cl = cl_max + w(t) (V(alpha) - cl_max), w = 3 t^2 - 2 t^3,  alpha_s &lt;= alpha &lt;= alpha_b,
 *        t = (alpha - alpha_s) / (alpha_b - alpha_s),  alpha_b = min(alpha_s + Delta, (alpha_s + 90 deg) / 2)
 *   cl = V(alpha) = (CD_max / 2) sin(2 alpha) + K_L cos^2(alpha) / sin(alpha)     alpha_b &lt;= alpha &lt;= 90 deg
 *   K_L = (cl_max - CD_max sin(alpha_s) cos(alpha_s)) sin(alpha_s) / cos^2(alpha_s)
 * </pre>
 * The parabolic cap and the blend are this project's construction, not a published model: they make
 * the curve and its slope continuous (Newton's method needs the slope), with zero slope at the peak. V is
 * Viterna and Corrigan's lift equation (L. A. Viterna and R. D. Corrigan, "Fixed pitch rotor performance
 * of large horizontal axis wind turbines", DOE/NASA Workshop on Large Horizontal Axis Wind Turbines,
 * Cleveland, NASA CP-2230, 1982), which passes through the stall point (alpha_s, cl_max) and falls to zero
 * at 90 degrees; their maximum drag coefficient is CD_max = 1.11 + 0.018 AR with the aspect ratio taken as
 * 50 for a two-dimensional section, so CD_max = 2.01 ({@link #VITERNA_CD_MAX_2D}). These formulas are
 * quoted from memory of the paper (the search tool held no copy of it). With Delta = 0 there is neither
 * cap nor blend: the curve has a corner at the peak, which Newton's method handles badly.
 *
 * <p>Each curve has a domain of effective angles; the solver reports a station whose angle falls outside
 * it instead of extrapolating: a table's first to last point, the synthetic curve's alpha0 - cl_max / a0
 * (where the straight line reaches -cl_max; no negative stall is modelled) to 90 degrees, the straight
 * line -90 to 90 degrees. The peak of a curve is its largest cl on the domain (the first such point of a
 * table); a station whose effective angle lies beyond the peak's angle is "past its peak". A straight line
 * peaks at the end of its domain, so no station is ever past it.
 *
 * <p>Instances are immutable.
 */
public final class SectionLiftCurve {

    /**
     * Viterna and Corrigan's maximum drag coefficient for a two-dimensional section: 1.11 + 0.018 * 50
     * (their aspect ratio is capped at 50, which stands for the two-dimensional case).
     */
    public static final double VITERNA_CD_MAX_2D = 1.11 + 0.018 * 50.0;

    private static final double RIGHT_ANGLE = Math.PI / 2.0;

    private enum Kind { LINEAR, TABLE, SYNTHETIC }

    private final Kind kind;
    private final double liftSlope;
    private final double zeroLiftAngle;
    private final double capStart;
    private final double peakAngle;
    private final double peakCl;
    private final double viternaK;
    private final double blendEnd;
    private final double[] alphas;
    private final double[] cls;
    private final double minAngle;
    private final double maxAngle;

    private SectionLiftCurve(Kind kind, double liftSlope, double zeroLiftAngle, double capStart, double peakAngle,
            double peakCl, double viternaK, double blendEnd, double[] alphas, double[] cls, double minAngle,
            double maxAngle) {
        this.kind = kind;
        this.liftSlope = liftSlope;
        this.zeroLiftAngle = zeroLiftAngle;
        this.capStart = capStart;
        this.peakAngle = peakAngle;
        this.peakCl = peakCl;
        this.viternaK = viternaK;
        this.blendEnd = blendEnd;
        this.alphas = alphas;
        this.cls = cls;
        this.minAngle = minAngle;
        this.maxAngle = maxAngle;
    }

    /**
     * The straight line cl = a0 (alpha - alpha0) on -90 to 90 degrees.
     *
     * @param liftSlope a0 [1/rad], positive
     * @param zeroLiftAngle alpha0 [rad], within 30 degrees of zero
     */
    public static SectionLiftCurve linear(double liftSlope, double zeroLiftAngle) {
        requireSlope(liftSlope);
        requireZeroLiftAngle(zeroLiftAngle);
        double top = liftSlope * (RIGHT_ANGLE - zeroLiftAngle);
        return new SectionLiftCurve(Kind.LINEAR, liftSlope, zeroLiftAngle, RIGHT_ANGLE, RIGHT_ANGLE, top, 0.0,
                RIGHT_ANGLE, null, null, -RIGHT_ANGLE, RIGHT_ANGLE);
    }

    /**
     * Points joined by straight lines.
     *
     * @param alphaDegrees effective angles [deg], strictly increasing, within -90 to 90, at least two
     * @param cl section lift coefficients, finite, one per angle
     */
    public static SectionLiftCurve tableDegrees(double[] alphaDegrees, double[] cl) {
        if (alphaDegrees == null || cl == null) {
            throw new IllegalArgumentException("section lift table missing");
        }
        if (alphaDegrees.length != cl.length) {
            throw new IllegalArgumentException("section lift table has " + alphaDegrees.length + " angles and "
                    + cl.length + " lift coefficients");
        }
        if (alphaDegrees.length < 2) {
            throw new IllegalArgumentException("section lift table needs at least two points");
        }
        int n = alphaDegrees.length;
        double[] a = new double[n];
        double[] c = cl.clone();
        int peak = 0;
        for (int i = 0; i < n; i++) {
            double deg = alphaDegrees[i];
            if (!Double.isFinite(deg) || deg < -90.0 || deg > 90.0) {
                throw new IllegalArgumentException("table angle must be a finite angle within -90 to 90 degrees, got "
                        + deg);
            }
            if (i > 0 && !(deg > alphaDegrees[i - 1])) {
                throw new IllegalArgumentException("table angles must increase strictly, got " + alphaDegrees[i - 1]
                        + " then " + deg + " degrees");
            }
            if (!Double.isFinite(c[i])) {
                throw new IllegalArgumentException("table lift coefficient at " + deg + " degrees is not finite");
            }
            a[i] = Math.toRadians(deg);
            if (c[i] > c[peak]) {
                peak = i;
            }
        }
        return new SectionLiftCurve(Kind.TABLE, Double.NaN, Double.NaN, Double.NaN, a[peak], c[peak], 0.0,
                Double.NaN, a, c, a[0], a[n - 1]);
    }

    /**
     * The synthetic curve described in the class comment, with Viterna and Corrigan's two-dimensional
     * CD_max = 2.01.
     *
     * @param liftSlope a0 [1/rad], positive
     * @param zeroLiftAngle alpha0 [rad], within 30 degrees of zero
     * @param clMax the peak, positive
     * @param capWidth Delta [rad], 0 (a sharp corner) up to 2 cl_max / a0 (the cap then starts at zero lift)
     * @throws IllegalArgumentException also if the peak does not fall between 0 and 90 degrees (the
     *     post-stall equation needs a positive stall angle)
     */
    public static SectionLiftCurve synthetic(double liftSlope, double zeroLiftAngle, double clMax, double capWidth) {
        requireSlope(liftSlope);
        requireZeroLiftAngle(zeroLiftAngle);
        if (!(clMax > 0.0) || !Double.isFinite(clMax)) {
            throw new IllegalArgumentException("cl_max must be positive and finite, got " + clMax);
        }
        if (!(capWidth >= 0.0) || !(capWidth <= 2.0 * clMax / liftSlope)) {
            throw new IllegalArgumentException("width of the rounded peak must be between 0 and 2 cl_max / a0 = "
                    + 2.0 * clMax / liftSlope + " rad, got " + capWidth);
        }
        double peak = zeroLiftAngle + clMax / liftSlope + capWidth / 2.0;
        if (!(peak > 0.0) || !(peak < RIGHT_ANGLE)) {
            throw new IllegalArgumentException("the peak must fall between 0 and 90 degrees, got "
                    + Math.toDegrees(peak) + " degrees");
        }
        double s = Math.sin(peak);
        double c = Math.cos(peak);
        double k = (clMax - VITERNA_CD_MAX_2D * s * c) * s / (c * c);
        double blendEnd = Math.min(peak + capWidth, 0.5 * (peak + RIGHT_ANGLE));
        return new SectionLiftCurve(Kind.SYNTHETIC, liftSlope, zeroLiftAngle, peak - capWidth, peak, clMax, k,
                blendEnd, null, null, zeroLiftAngle - clMax / liftSlope, RIGHT_ANGLE);
    }

    /** Whether cl is defined at this effective angle [rad] (within the domain, ends included). */
    public boolean covers(double alpha) {
        return alpha >= minAngle && alpha <= maxAngle;
    }

    /** Lower end of the domain [rad]. */
    public double minAngle() {
        return minAngle;
    }

    /** Upper end of the domain [rad]. */
    public double maxAngle() {
        return maxAngle;
    }

    /** The largest cl of the curve on its domain. */
    public double clMax() {
        return peakCl;
    }

    /** The effective angle of {@link #clMax()} [rad]. */
    public double peakAngle() {
        return peakAngle;
    }

    /** Whether this effective angle [rad] lies beyond the peak. */
    public boolean isPastPeak(double alpha) {
        return alpha > peakAngle;
    }

    /**
     * Section lift coefficient at an effective angle [rad].
     *
     * @throws IllegalArgumentException outside the domain or for a non-finite angle
     */
    public double cl(double alpha) {
        requireCovered(alpha);
        switch (kind) {
            case LINEAR:
                return liftSlope * (alpha - zeroLiftAngle);
            case TABLE: {
                int i = segment(alpha);
                double t = (alpha - alphas[i]) / (alphas[i + 1] - alphas[i]);
                return cls[i] + t * (cls[i + 1] - cls[i]);
            }
            default:
                if (alpha <= capStart) {
                    return liftSlope * (alpha - zeroLiftAngle);
                }
                if (alpha <= peakAngle) {
                    double d = peakAngle - alpha;
                    return peakCl - liftSlope / (2.0 * (peakAngle - capStart)) * d * d;
                }
                double v = viterna(alpha);
                if (alpha >= blendEnd) {
                    return v;
                }
                double t = (alpha - peakAngle) / (blendEnd - peakAngle);
                return peakCl + t * t * (3.0 - 2.0 * t) * (v - peakCl);
        }
    }

    /**
     * dcl/dalpha [1/rad] at an effective angle: the derivative of the piece that holds it; at a corner,
     * the piece above it (a table's next segment, the post-stall branch at the synthetic curve's peak),
     * and at a table's last point, its last segment.
     *
     * @throws IllegalArgumentException outside the domain or for a non-finite angle
     */
    public double slope(double alpha) {
        requireCovered(alpha);
        switch (kind) {
            case LINEAR:
                return liftSlope;
            case TABLE: {
                int i = segment(alpha);
                return (cls[i + 1] - cls[i]) / (alphas[i + 1] - alphas[i]);
            }
            default:
                if (alpha < capStart) {
                    return liftSlope;
                }
                if (alpha < peakAngle) {
                    return liftSlope * (peakAngle - alpha) / (peakAngle - capStart);
                }
                double dv = viternaSlope(alpha);
                if (alpha >= blendEnd) {
                    return dv;
                }
                double width = blendEnd - peakAngle;
                double t = (alpha - peakAngle) / width;
                double w = t * t * (3.0 - 2.0 * t);
                double dw = 6.0 * t * (1.0 - t) / width;
                return dw * (viterna(alpha) - peakCl) + w * dv;
        }
    }

    /** Viterna and Corrigan's post-stall lift. */
    private double viterna(double alpha) {
        double s = Math.sin(alpha);
        double c = Math.cos(alpha);
        return VITERNA_CD_MAX_2D * s * c + viternaK * c * c / s;
    }

    /** Its derivative: CD_max cos(2 alpha) - K_L cos(alpha) (1 + sin^2(alpha)) / sin^2(alpha). */
    private double viternaSlope(double alpha) {
        double s = Math.sin(alpha);
        double c = Math.cos(alpha);
        return VITERNA_CD_MAX_2D * (c * c - s * s) - viternaK * c * (1.0 + s * s) / (s * s);
    }

    @Override
    public String toString() {
        switch (kind) {
            case LINEAR:
                return "linear section curve a0 = " + liftSlope + " /rad, alpha0 = " + Math.toDegrees(zeroLiftAngle)
                        + " deg";
            case TABLE:
                return "section table of " + alphas.length + " points, cl_max " + peakCl + " at "
                        + Math.toDegrees(peakAngle) + " deg";
            default:
                return "synthetic section curve a0 = " + liftSlope + " /rad, alpha0 = " + Math.toDegrees(zeroLiftAngle)
                        + " deg, cl_max " + peakCl + " at " + Math.toDegrees(peakAngle) + " deg";
        }
    }

    /** Index i of the table segment [alpha_i, alpha_i+1) that holds alpha (the last one at the last point). */
    private int segment(double alpha) {
        int i = Arrays.binarySearch(alphas, alpha);
        if (i < 0) {
            i = -i - 2;
        }
        return Math.min(Math.max(i, 0), alphas.length - 2);
    }

    private void requireCovered(double alpha) {
        if (!covers(alpha)) {
            throw new IllegalArgumentException("effective angle " + Math.toDegrees(alpha)
                    + " deg is outside the section data (" + Math.toDegrees(minAngle) + " to "
                    + Math.toDegrees(maxAngle)
                    + " deg)");
        }
    }

    private static void requireSlope(double a0) {
        if (!(a0 > 0.0) || !Double.isFinite(a0)) {
            throw new IllegalArgumentException("section lift slope must be positive and finite (per radian), got "
                    + a0);
        }
    }

    private static void requireZeroLiftAngle(double alpha0) {
        if (!Double.isFinite(alpha0) || Math.abs(alpha0) > Math.toRadians(30.0)) {
            throw new IllegalArgumentException("zero-lift angle must be within 30 degrees of zero, got "
                    + Math.toDegrees(alpha0) + " degrees");
        }
    }
}
