package org.spanlift.solve;

import java.util.Locale;

import org.spanlift.input.RefusedException;

/**
 * CL against alpha at fixed deflections: CL = slope sin(alpha - zeroLiftAngle), exact in linear theory with
 * the freestream (cos alpha, 0, sin alpha). So {@code slope} is dCL/dalpha at zero lift, per radian, and
 * {@code zeroLiftAngle} is in radians.
 *
 * @param slope         dCL/dalpha at zero lift, per radian
 * @param zeroLiftAngle the zero-lift angle of attack, rad
 */
public record LiftCurve(double slope, double zeroLiftAngle) {

    /** The largest |CL| a target may ask for. */
    public static final double MAX_TARGET_LIFT = 3;
    /** The largest |alpha| a target may need, degrees: beyond it linear theory is not an answer. */
    public static final double MAX_TARGET_ALPHA_DEG = 30;

    /** CL at angle of attack alpha (rad). */
    public double lift(double alpha) {
        return slope * Math.sin(alpha - zeroLiftAngle);
    }

    /**
     * The angle of attack (rad) for a CL on the rising side of the curve.
     *
     * @throws RefusedException when |CL| is at or beyond the slope (no angle reaches it)
     */
    public double alphaFor(double cl) {
        if (!(Math.abs(cl) < slope)) {
            throw new RefusedException("CL " + cl + " is beyond this wing's linear range");
        }
        return zeroLiftAngle + Math.asin(cl / slope);
    }

    /**
     * The angle of attack (rad) for a target CL that a user asked for: |CL| at most {@value #MAX_TARGET_LIFT}
     * and an angle within {@value #MAX_TARGET_ALPHA_DEG} degrees, where linear theory still answers.
     *
     * @throws RefusedException saying which limit the target passes
     */
    public double alphaForTarget(double cl) {
        if (!Double.isFinite(cl) || Math.abs(cl) > MAX_TARGET_LIFT) {
            throw new RefusedException("expected a lift coefficient from -3 to 3, got " + cl);
        }
        if (Math.abs(cl) >= slope || Math.abs(Math.toDegrees(alphaFor(cl))) > MAX_TARGET_ALPHA_DEG) {
            throw new RefusedException(String.format(Locale.ROOT,
                    "CL %.3f needs an angle of attack beyond 30 degrees, outside linear theory", cl));
        }
        return alphaFor(cl);
    }
}
