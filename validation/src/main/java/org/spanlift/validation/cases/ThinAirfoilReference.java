package org.spanlift.validation.cases;

import java.util.function.DoubleUnaryOperator;

/**
 * Thin-airfoil reference values computed here, independently of the engine's section code: the zero-lift
 * angle of a mean line from Glauert's integral, and Glauert's plain-flap effectiveness.
 *
 * <pre>
 *   alpha_L0 = -(1/pi) integral_0^pi dz/dx (cos theta - 1) dtheta,   x = (1 - cos theta)/2
 *   d alpha_L0 / d delta = -(1 - (theta_h - sin theta_h)/pi),         cos theta_h = 1 - 2 x_h
 * </pre>
 * (Glauert, The Elements of Aerofoil and Airscrew Theory, 1926, ch. 7; the flap formula from Glauert,
 * Theoretical relationships for an aerofoil with hinged flap, ARC R&amp;M 1095, 1927.)
 */
public final class ThinAirfoilReference {

    /** Simpson intervals on each side of a mean line's break point (the integrand is smooth on each side). */
    private static final int INTERVALS = 4000;

    private ThinAirfoilReference() {
    }

    /**
     * Slope of the NACA four-digit mean line: maximum camber m at p (fractions of chord); two parabolas,
     * dz/dx = 2m/p^2 (p - x) ahead of p, 2m/(1-p)^2 (p - x) behind (Abbott and von Doenhoff, Theory of Wing
     * Sections, 1959, sec. 6.4).
     */
    public static DoubleUnaryOperator fourDigitSlope(double m, double p) {
        return x -> x < p ? 2 * m / (p * p) * (p - x) : 2 * m / ((1 - p) * (1 - p)) * (p - x);
    }

    /**
     * Slope of the NACA 230 mean line: z = (k1/6)(x^3 - 3 r x^2 + r^2 (3 - r) x) ahead of r, a straight line
     * behind, with r = 0.2025 and k1 = 15.957 (Abbott and von Doenhoff, Theory of Wing Sections, 1959,
     * sec. 6.5, mean-line constants).
     */
    public static DoubleUnaryOperator line230Slope() {
        double r = 0.2025;
        double k1 = 15.957;
        return x -> x < r ? k1 / 6 * (3 * x * x - 6 * r * x + r * r * (3 - r)) : -k1 / 6 * r * r * r;
    }

    /** The zero-lift angle (rad) of a mean line whose slope is smooth on either side of {@code breakX}. */
    public static double zeroLiftAngle(DoubleUnaryOperator slope, double breakX) {
        double thetaBreak = Math.acos(1 - 2 * breakX);
        DoubleUnaryOperator f = t -> slope.applyAsDouble(0.5 * (1 - Math.cos(t))) * (Math.cos(t) - 1);
        return -(simpson(f, 0, thetaBreak) + simpson(f, thetaBreak, Math.PI)) / Math.PI;
    }

    /** Glauert's flap effectiveness tau = -d alpha_L0 / d delta for a flap of the given chord fraction. */
    public static double flapEffectiveness(double flapChordFraction) {
        double hinge = 1 - flapChordFraction;
        double theta = Math.acos(1 - 2 * hinge);
        return 1 - (theta - Math.sin(theta)) / Math.PI;
    }

    private static double simpson(DoubleUnaryOperator f, double a, double b) {
        double h = (b - a) / INTERVALS;
        double sum = f.applyAsDouble(a) + f.applyAsDouble(b);
        for (int i = 1; i < INTERVALS; i++) {
            sum += (i % 2 == 1 ? 4 : 2) * f.applyAsDouble(a + i * h);
        }
        return sum * h / 3;
    }
}
