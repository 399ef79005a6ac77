package org.spanlift.validation.liftingline;

import java.util.Objects;
import java.util.function.DoubleUnaryOperator;

/**
 * A straight (unswept, no dihedral) wing, symmetric about its root, as seen by Prandtl's lifting-line
 * theory.
 *
 * <p>Every spanwise function takes the non-dimensional station {@code eta = 2y/b}, from 0 at the root to 1
 * at the tip, and is mirrored on the other half. Units are SI and angles are radians:
 * <ul>
 *   <li>{@code span} b, tip to tip [m];</li>
 *   <li>{@code chord(eta)} local chord [m], positive away from the tip (it may reach zero at the tip);</li>
 *   <li>{@code twist(eta)} geometric incidence of the section relative to the root-chord reference
 *       [rad], positive nose-up (washout is a tip twist below the root twist);</li>
 *   <li>{@code sectionLiftSlope(eta)} two-dimensional lift slope a0 [1/rad];</li>
 *   <li>{@code zeroLiftAngle(eta)} section zero-lift angle alpha0 [rad], measured from the section chord,
 *       negative for positive camber;</li>
 *   <li>{@code referenceArea} S [m^2], both halves; the factories set it to the planform area.</li>
 * </ul>
 * The functions must be pure (the same answer for the same eta): the solver samples them freely.
 *
 * @param span b [m], tip to tip, positive
 * @param chord c(eta) [m]
 * @param twist eps(eta) [rad], positive nose-up
 * @param sectionLiftSlope a0(eta) [1/rad], positive
 * @param zeroLiftAngle alpha0(eta) [rad]
 * @param referenceArea S [m^2], positive
 */
public record LiftingLineWing(
        double span,
        DoubleUnaryOperator chord,
        DoubleUnaryOperator twist,
        DoubleUnaryOperator sectionLiftSlope,
        DoubleUnaryOperator zeroLiftAngle,
        double referenceArea) {

    /** Thin-airfoil section lift slope, 2 pi per radian. */
    public static final double THIN_AIRFOIL_LIFT_SLOPE = 2.0 * Math.PI;

    /** Intervals (in the angle theta, eta = cos theta) of the Simpson rule used for a general planform area. */
    private static final int AREA_INTERVALS = 4096;

    /**
     * Checks the scalar components and that no function is missing; the chord function itself is checked
     * by the solver at the stations where it is used, and by {@link #of}.
     *
     * @throws IllegalArgumentException if the span or the reference area is not a positive finite number
     * @throws NullPointerException if a function is null
     */
    public LiftingLineWing {
        if (!(span > 0.0) || !Double.isFinite(span)) {
            throw new IllegalArgumentException("span must be a positive finite length in metres, got " + span);
        }
        Objects.requireNonNull(chord, "chord");
        Objects.requireNonNull(twist, "twist");
        Objects.requireNonNull(sectionLiftSlope, "sectionLiftSlope");
        Objects.requireNonNull(zeroLiftAngle, "zeroLiftAngle");
        if (!(referenceArea > 0.0) || !Double.isFinite(referenceArea)) {
            throw new IllegalArgumentException(
                    "reference area must be a positive finite area in square metres, got " + referenceArea);
        }
    }

    /**
     * A wing of general planform whose reference area is the planform area, integrated numerically from
     * the chord function: S = b * integral of c(eta) over eta in [0, 1], evaluated as
     * b * integral of c(cos theta) sin theta over theta in [0, pi/2] by Simpson's rule (4096 intervals).
     *
     * @throws IllegalArgumentException if the span is not positive, or the chord is not positive at some
     *     sampled station short of the tip, or negative or not finite at the tip
     */
    public static LiftingLineWing of(double span, DoubleUnaryOperator chord, DoubleUnaryOperator twist,
            DoubleUnaryOperator sectionLiftSlope, DoubleUnaryOperator zeroLiftAngle) {
        if (!(span > 0.0) || !Double.isFinite(span)) {
            throw new IllegalArgumentException("span must be a positive finite length in metres, got " + span);
        }
        Objects.requireNonNull(chord, "chord");
        double h = 0.5 * Math.PI / AREA_INTERVALS;
        double sum = 0.0;
        for (int i = 0; i <= AREA_INTERVALS; i++) {
            double theta = i * h;
            double eta = i == 0 ? 1.0 : Math.cos(theta);
            double c = chord.applyAsDouble(eta);
            checkChord(eta, c);
            double weight = (i == 0 || i == AREA_INTERVALS) ? 1.0 : (i % 2 == 1 ? 4.0 : 2.0);
            sum += weight * c * Math.sin(theta);
        }
        double area = span * sum * h / 3.0;
        return new LiftingLineWing(span, chord, twist, sectionLiftSlope, zeroLiftAngle, area);
    }

    /**
     * An untwisted wing of elliptic planform, c(eta) = rootChord * sqrt(1 - eta^2), uniform section, zero
     * section zero-lift angle. Planform area S = pi b c_root / 4 (closed form).
     *
     * @param span b [m]
     * @param rootChord c_root [m]
     * @param sectionLiftSlope a0 [1/rad]
     */
    public static LiftingLineWing elliptic(double span, double rootChord, double sectionLiftSlope) {
        requirePositive(rootChord, "root chord");
        requirePositiveSlope(sectionLiftSlope);
        return new LiftingLineWing(span,
                eta -> rootChord * Math.sqrt(Math.max(0.0, 1.0 - eta * eta)),
                eta -> 0.0,
                eta -> sectionLiftSlope,
                eta -> 0.0,
                Math.PI * span * rootChord / 4.0);
    }

    /** {@link #elliptic(double, double, double)} with the thin-airfoil section lift slope 2 pi. */
    public static LiftingLineWing elliptic(double span, double rootChord) {
        return elliptic(span, rootChord, THIN_AIRFOIL_LIFT_SLOPE);
    }

    /**
     * An untwisted wing of straight-tapered planform, c(eta) = rootChord * (1 - (1 - taper) eta), uniform
     * section, zero section zero-lift angle. Planform area S = b c_root (1 + taper) / 2 (closed form).
     * A taper of 1 is the rectangular wing; a taper of 0 a pointed tip.
     *
     * @param span b [m]
     * @param rootChord c_root [m]
     * @param taper tip chord over root chord, non-negative
     * @param sectionLiftSlope a0 [1/rad]
     */
    public static LiftingLineWing trapezoidal(double span, double rootChord, double taper, double sectionLiftSlope) {
        requirePositive(rootChord, "root chord");
        if (!(taper >= 0.0) || !Double.isFinite(taper)) {
            throw new IllegalArgumentException("taper ratio must be a finite number >= 0, got " + taper);
        }
        requirePositiveSlope(sectionLiftSlope);
        return new LiftingLineWing(span,
                eta -> rootChord * (1.0 - (1.0 - taper) * eta),
                eta -> 0.0,
                eta -> sectionLiftSlope,
                eta -> 0.0,
                span * rootChord * (1.0 + taper) / 2.0);
    }

    /** {@link #trapezoidal(double, double, double, double)} with the thin-airfoil section lift slope 2 pi. */
    public static LiftingLineWing trapezoidal(double span, double rootChord, double taper) {
        return trapezoidal(span, rootChord, taper, THIN_AIRFOIL_LIFT_SLOPE);
    }

    /** A rectangular wing: {@link #trapezoidal} with taper 1 (S = b c). */
    public static LiftingLineWing rectangular(double span, double chord, double sectionLiftSlope) {
        return trapezoidal(span, chord, 1.0, sectionLiftSlope);
    }

    /** Aspect ratio A = b^2 / S. */
    public double aspectRatio() {
        return span * span / referenceArea;
    }

    /** This wing with another twist distribution eps(eta) [rad], positive nose-up; all else kept. */
    public LiftingLineWing withTwist(DoubleUnaryOperator newTwist) {
        return new LiftingLineWing(span, chord, newTwist, sectionLiftSlope, zeroLiftAngle, referenceArea);
    }

    /**
     * This wing with linear washout: eps(eta) = -washout * eta, so the root keeps zero incidence and the tip
     * sits {@code washout} radians nose-down. A negative value is wash-in.
     *
     * @param washout root twist minus tip twist [rad]
     */
    public LiftingLineWing withLinearWashout(double washout) {
        if (!Double.isFinite(washout)) {
            throw new IllegalArgumentException("washout must be a finite angle in radians, got " + washout);
        }
        return withTwist(eta -> -washout * eta);
    }

    /** This wing with another section zero-lift angle distribution alpha0(eta) [rad]; all else kept. */
    public LiftingLineWing withZeroLiftAngle(DoubleUnaryOperator newZeroLiftAngle) {
        return new LiftingLineWing(span, chord, twist, sectionLiftSlope, newZeroLiftAngle, referenceArea);
    }

    /**
     * Checks one chord sample: positive and finite short of the tip, non-negative and finite at the tip.
     *
     * @throws IllegalArgumentException naming the station and the value otherwise
     */
    static void checkChord(double eta, double c) {
        if (!Double.isFinite(c)) {
            throw new IllegalArgumentException("chord at eta = " + eta + " is not finite (" + c + ")");
        }
        if (eta < 1.0 && !(c > 0.0)) {
            throw new IllegalArgumentException("chord must be positive away from the tip, got " + c
                    + " m at eta = " + eta);
        }
        if (c < 0.0) {
            throw new IllegalArgumentException("chord must not be negative at the tip, got " + c + " m");
        }
    }

    private static void requirePositive(double value, String what) {
        if (!(value > 0.0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(what + " must be a positive finite length in metres, got " + value);
        }
    }

    private static void requirePositiveSlope(double a0) {
        if (!(a0 > 0.0) || !Double.isFinite(a0)) {
            throw new IllegalArgumentException("section lift slope must be positive and finite (per radian), got "
                    + a0);
        }
    }
}
