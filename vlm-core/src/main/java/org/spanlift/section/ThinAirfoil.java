package org.spanlift.section;

import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;
import java.util.Arrays;

/**
 * Thin-airfoil theory (Glauert's form) for a camber line: zero-lift angle, quarter-chord moment, ideal angle
 * and ideal lift coefficient. Stateless; all angles in radians.
 *
 * <p>With x = (1 - cos theta)/2 and the camber slope written as dz/dx(theta), the section lift coefficient is
 * cl = 2 pi (alpha - alpha_L0) with
 * <pre>
 *   alpha_L0 = -(1/pi) integral_0^pi dz/dx (cos theta - 1) dtheta,
 *   A_n      =  (2/pi) integral_0^pi dz/dx cos(n theta) dtheta,
 *   cm_c/4   =  (pi/4) (A2 - A1),
 *   alpha_i  =  (1/pi) integral_0^pi dz/dx dtheta   (the angle at which A0 = 0, no leading-edge suction peak),
 *   cl_i     =  pi A1                                (the ideal, or design, lift coefficient).
 * </pre>
 * The integrals are taken by adaptive 16-point Gauss-Legendre quadrature, split at the line's
 * {@link CamberLine#breakpoints() breakpoints}, to an absolute tolerance of 1e-13.
 */
public final class ThinAirfoil {

    private static final double TOLERANCE = 1e-13;

    private ThinAirfoil() {
    }

    /**
     * All thin-airfoil results of one line. {@code idealAngle} and {@code idealLiftCoefficient} may be absent.
     *
     * @param zeroLiftAngle        the zero-lift angle, rad
     * @param quarterChordMoment   the moment coefficient about the quarter chord
     * @param idealAngle           the ideal angle, rad, if defined
     * @param idealLiftCoefficient the ideal lift coefficient, if defined
     */
    public record Result(double zeroLiftAngle, double quarterChordMoment,
                         OptionalDouble idealAngle, OptionalDouble idealLiftCoefficient) {
    }

    /** Zero-lift angle alpha_L0, radians. */
    public static double zeroLiftAngle(CamberLine line) {
        return -integral(line, theta -> Math.cos(theta) - 1.0) / Math.PI;
    }

    /** Moment coefficient about the quarter chord, cm_c/4 = (pi/4)(A2 - A1), positive nose-up. */
    public static double quarterChordMoment(CamberLine line) {
        double a2MinusA1 = 2.0 / Math.PI * integral(line, theta -> Math.cos(2.0 * theta) - Math.cos(theta));
        return Math.PI / 4.0 * a2MinusA1;
    }

    /**
     * Ideal angle of attack alpha_i, radians, where A0 vanishes; absent where the slope is unbounded at the
     * leading edge (there the integral diverges).
     */
    public static OptionalDouble idealAngle(CamberLine line) {
        if (!line.slopeBoundedAtLeadingEdge()) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(integral(line, theta -> 1.0) / Math.PI);
    }

    /**
     * Ideal (design) lift coefficient cl_i = pi A1, the lift coefficient at the ideal angle; absent where
     * the slope is unbounded at the leading edge.
     */
    public static OptionalDouble idealLiftCoefficient(CamberLine line) {
        if (!line.slopeBoundedAtLeadingEdge()) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(2.0 * integral(line, Math::cos));
    }

    /** All results of one line. */
    public static Result analyse(CamberLine line) {
        return new Result(zeroLiftAngle(line), quarterChordMoment(line), idealAngle(line), idealLiftCoefficient(line));
    }

    /**
     * Closed-form zero-lift angle of the NACA four-digit mean line, radians, for checking the quadrature.
     * With theta_p = acos(1 - 2p) and F(theta) = (2p - 2) sin theta + (3/2 - 2p) theta + sin(2 theta)/4
     * (an antiderivative of (2p - 1 + cos theta)(cos theta - 1)):
     * <pre>
     *   alpha_L0 = -(m/pi) [ F(theta_p) / p^2 + (F(pi) - F(theta_p)) / (1 - p)^2 ].
     * </pre>
     */
    public static double zeroLiftAngleClosedForm(NacaFourDigit line) {
        if (line.isSymmetric()) {
            return 0.0;
        }
        double m = line.maxCamber();
        double p = line.maxCamberPosition();
        double thetaP = Math.acos(1.0 - 2.0 * p);
        double fP = antiderivative(p, thetaP);
        double fPi = antiderivative(p, Math.PI);
        return -m / Math.PI * (fP / (p * p) + (fPi - fP) / ((1.0 - p) * (1.0 - p)));
    }

    private static double antiderivative(double p, double theta) {
        return (2.0 * p - 2.0) * Math.sin(theta) + (1.5 - 2.0 * p) * theta + Math.sin(2.0 * theta) / 4.0;
    }

    /** Integral over theta in [0, pi] of slope(x(theta)) * weight(theta). */
    private static double integral(CamberLine line, DoubleUnaryOperator weight) {
        double[] xs = line.breakpoints();
        double[] splits = new double[xs.length];
        int n = 0;
        for (double x : xs) {
            if (x > 0.0 && x < 1.0) {
                double theta = Math.acos(1.0 - 2.0 * x);
                if (n == 0 || theta > splits[n - 1]) {
                    splits[n++] = theta;
                }
            }
        }
        double[] sorted = Arrays.copyOf(splits, n);
        DoubleUnaryOperator f = theta -> line.slope(0.5 * (1.0 - Math.cos(theta))) * weight.applyAsDouble(theta);
        return Quadrature.integrate(f, 0.0, Math.PI, sorted, TOLERANCE);
    }
}
