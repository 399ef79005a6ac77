package org.spanlift.stall;

/**
 * A section lift curve built from a lift slope, a zero-lift angle and cl_max, for sections that give no
 * measured curve; the outputs flag it as synthetic. Angles in radians, from the chord line.
 *
 * <ul>
 * <li>Linear, cl = a0 (alpha - alpha0), up to a rounded peak: a parabolic cap of width
 * h = {@value #ROUNDING} cl_max / a0, tangent to the line at its start and level at its top, which is cl_max
 * at alpha0 + cl_max / a0 + h / 2. The line then leaves it at 0.85 cl_max. (A shape of the project's own; real
 * sections bend away from the line from roughly that height, common practice.)</li>
 * <li>Past the peak, the post-stall lift of Viterna and Corrigan (L. A. Viterna and R. D. Corrigan, "Fixed
 * pitch rotor performance of large horizontal axis wind turbines", NASA CP-2230, 1982), anchored at the
 * peak: cl = (CD_max / 2) sin 2 alpha + K cos^2 alpha / sin alpha, with K = (cl_max - CD_max sin a_s cos
 * a_s) sin a_s / cos^2 a_s measured from the zero-lift angle. CD_max is the two-dimensional value
 * {@value #CD_MAX_2D} (a flat plate broadside to the flow, about 2 in two dimensions: Hoerner, Fluid-Dynamic
 * Drag, 1965; value recalled from memory), not the aspect-ratio form, which would count the wing's
 * three-dimensional effect a second time inside the lattice. A smoothstep over {@value #BLEND_DEG} degrees
 * takes the cap into it, so the curve has a continuous slope everywhere.</li>
 * </ul>
 */
public final class SyntheticCurve implements SectionCurve {

    /** What the curve is, for outputs to state. */
    public static final String DESCRIPTION = "linear to a rounded peak at cl_max, then the post-stall lift of "
            + "Viterna and Corrigan (1982) with the two-dimensional CD_max 2.0";

    /** The width of the rounded peak over cl_max / a0. */
    public static final double ROUNDING = 0.3;
    /** Two-dimensional maximum drag coefficient of the post-stall model. */
    public static final double CD_MAX_2D = 2.0;
    /** The width of the blend from the cap into the post-stall model, degrees. */
    public static final double BLEND_DEG = 2.0;

    private final double slope;
    private final double zeroLift;
    private final double clMax;
    private final double capStart;
    private final double peak;
    private final double blendEnd;
    private final double k;

    /**
     * @param slope    lift slope a0, per radian
     * @param zeroLift zero-lift angle alpha0, rad
     * @param clMax    the section's maximum lift coefficient, positive
     */
    public SyntheticCurve(double slope, double zeroLift, double clMax) {
        if (!(slope > 0) || !(clMax > 0)) {
            throw new IllegalArgumentException("a synthetic lift curve needs a positive slope and cl_max");
        }
        this.slope = slope;
        this.zeroLift = zeroLift;
        this.clMax = clMax;
        double h = ROUNDING * clMax / slope;
        this.capStart = zeroLift + clMax / slope - h / 2;
        this.peak = capStart + h;
        this.blendEnd = peak + Math.toRadians(BLEND_DEG);
        double s = Math.sin(peak - zeroLift);
        double c = Math.cos(peak - zeroLift);
        this.k = (clMax - CD_MAX_2D * s * c) * s / (c * c);
    }

    @Override
    public double lift(double alpha) {
        if (alpha <= capStart) {
            return slope * (alpha - zeroLift);
        }
        if (alpha <= peak) {
            double d = peak - alpha;
            return clMax - slope * d * d / (2 * (peak - capStart));
        }
        if (alpha >= blendEnd) {
            return postStall(alpha);
        }
        double t = (alpha - peak) / (blendEnd - peak);
        double w = t * t * (3 - 2 * t);
        return clMax + w * (postStall(alpha) - clMax);
    }

    @Override
    public double slope(double alpha) {
        if (alpha <= capStart) {
            return slope;
        }
        if (alpha <= peak) {
            return slope * (peak - alpha) / (peak - capStart);
        }
        if (alpha >= blendEnd) {
            return postStallSlope(alpha);
        }
        double width = blendEnd - peak;
        double t = (alpha - peak) / width;
        double w = t * t * (3 - 2 * t);
        double dw = 6 * t * (1 - t) / width;
        return dw * (postStall(alpha) - clMax) + w * postStallSlope(alpha);
    }

    @Override
    public double lastAngle() {
        return zeroLift + Math.PI / 2;
    }

    @Override
    public double peakAngle() {
        return peak;
    }

    @Override
    public double peakLift() {
        return clMax;
    }

    private double postStall(double alpha) {
        double a = alpha - zeroLift;
        double s = Math.sin(a);
        double c = Math.cos(a);
        return CD_MAX_2D * s * c + k * c * c / s;
    }

    private double postStallSlope(double alpha) {
        double a = alpha - zeroLift;
        double s = Math.sin(a);
        double c = Math.cos(a);
        return CD_MAX_2D * (c * c - s * s) - k * c * (1 + s * s) / (s * s);
    }
}
