package org.spanlift.validation.engine;

import java.util.function.DoubleUnaryOperator;

/**
 * Thin-airfoil theory, evaluated here independently of the engine (which never calls this class): the
 * zero-lift angle of a mean line by quadrature of the thin-airfoil integral, and the flap effectiveness of
 * a plain flap.
 *
 * <p>Zero-lift angle (Glauert 1926, The Elements of Aerofoil and Airscrew Theory; Anderson, Fundamentals of
 * Aerodynamics, thin-airfoil chapter): with x/c = (1 - cos theta) / 2,
 *
 * <pre>alpha_0 = -(1/pi) integral_0^pi (dz/dx)(theta) (cos theta - 1) d theta.</pre>
 *
 * <p>Plain flap of chord fraction E hinged at x_h/c = 1 - E (Glauert, Theoretical relationships for an
 * aerofoil with hinged flap, ARC R&amp;M 1095, 1927): the deflected flap is a mean-line slope of -delta aft of
 * the hinge, so the same integral gives d alpha_0 / d delta = -tau with
 *
 * <pre>tau = 1 - (theta_h - sin theta_h) / pi,   cos theta_h = 1 - 2 x_h/c = 2E - 1,</pre>
 *
 * theta_h measured from the leading edge (the hinge at theta_h = 120 degrees for E = 0.25, tau = 0.6090).
 */
final class ThinAirfoil {

    /** Simpson intervals per smooth piece: the integrand is smooth on each, error below 1e-12. */
    private static final int INTERVALS = 4096;

    private ThinAirfoil() {
    }

    /**
     * Slope dz/dx of the NACA four-digit mean line with maximum camber m (fraction of chord) at p (fraction
     * of chord): two parabolas meeting at x = p (Abbott and von Doenhoff, Theory of Wing Sections, 1959,
     * section 6.4), written out here again rather than taken from the engine.
     */
    static double naca4Slope(double m, double p, double x) {
        return x < p ? 2 * m / (p * p) * (p - x) : 2 * m / ((1 - p) * (1 - p)) * (p - x);
    }

    /** The NACA four-digit zero-lift angle, rad, by quadrature split at the joint x = p. */
    static double naca4ZeroLiftAngle(double m, double p) {
        double thetaP = Math.acos(1 - 2 * p);
        DoubleUnaryOperator slope = x -> naca4Slope(m, p, x);
        return -(integral(slope, 0, thetaP) + integral(slope, thetaP, Math.PI)) / Math.PI;
    }

    /**
     * The same zero-lift angle in closed form (the integral done by hand, for checking the quadrature):
     * with F(theta) = (p - 1) sin theta - (p - 3/4) theta + sin(2 theta) / 8,
     * alpha_0 = -(1/pi) [2m/p^2 F(theta_p) + 2m/(1-p)^2 (F(pi) - F(theta_p))].
     */
    static double naca4ZeroLiftAngleClosedForm(double m, double p) {
        double thetaP = Math.acos(1 - 2 * p);
        DoubleUnaryOperator f = t -> (p - 1) * Math.sin(t) - (p - 0.75) * t + Math.sin(2 * t) / 8;
        double front = 2 * m / (p * p) * f.applyAsDouble(thetaP);
        double back = 2 * m / ((1 - p) * (1 - p)) * (f.applyAsDouble(Math.PI) - f.applyAsDouble(thetaP));
        return -(front + back) / Math.PI;
    }

    /** Glauert's flap effectiveness tau = -d alpha_0 / d delta for a flap of chord fraction E, closed form. */
    static double flapEffectiveness(double flapChordFraction) {
        double thetaH = Math.acos(2 * flapChordFraction - 1);
        return 1 - (thetaH - Math.sin(thetaH)) / Math.PI;
    }

    /** The same by quadrature of the thin-airfoil integral with the slope -1 aft of the hinge. */
    static double flapEffectivenessByQuadrature(double flapChordFraction) {
        double thetaH = Math.acos(2 * flapChordFraction - 1);
        double alpha0PerDelta = -integral(x -> -1, thetaH, Math.PI) / Math.PI;
        return -alpha0PerDelta;
    }

    /** Composite Simpson rule of slope(x(theta)) (cos theta - 1) over [t0, t1]. */
    private static double integral(DoubleUnaryOperator slope, double t0, double t1) {
        double h = (t1 - t0) / INTERVALS;
        double sum = 0;
        for (int k = 0; k <= INTERVALS; k++) {
            double t = t0 + k * h;
            // evaluate just inside the piece, so the slope's jump at a joint never leaks across it
            double tt = k == 0 ? t + 1e-14 : k == INTERVALS ? t - 1e-14 : t;
            double x = 0.5 * (1 - Math.cos(tt));
            double weight = k == 0 || k == INTERVALS ? 1 : k % 2 == 1 ? 4 : 2;
            sum += weight * slope.applyAsDouble(x) * (Math.cos(t) - 1);
        }
        return sum * h / 3;
    }
}
