package org.spanlift.loads;

import org.spanlift.structure.LoadCase;

/**
 * The loads of one case on the right half-wing at its stations (the strip edges, root to tip), SI. Signs as
 * in the package description: shear positive up, bending positive for up-bending, torsion positive
 * nose-up, chord shear and chord bending positive for an aft load outboard. Immutable: the arrays are
 * copied on the way in and every array accessor returns a copy.
 *
 * @param loadCase       the case
 * @param alpha          angle of attack, rad (of the wing file's x axis)
 * @param liftCoefficient the wing's CL at that angle
 * @param dragCoefficient the wing's CD there: induced (Trefftz plane) plus profile (section polars, where
 *                        every section gives one)
 * @param normalCoefficient the wing's normal-force coefficient CN = CL cos(a) + CD sin(a), a the angle of
 *                        attack of the longitudinal axis: n W / (q S), the case's definition
 * @param chordCoefficient the wing's chordwise-force coefficient CC = CD cos(a) - CL sin(a), positive aft along
 *                        the longitudinal axis
 * @param axisAngle      the longitudinal axis's angle above the wing file's x axis, nose-up positive, rad
 * @param dynamicPressure q, Pa
 * @param y              stations, m
 * @param shear          N
 * @param bending        N m
 * @param torsion        N m
 * @param chordShear     N
 * @param chordBending   N m
 * @param normalLoad     the root's outboard resultant normal to the longitudinal axis, N: the half-wing's
 *                       normal force less n g times its mass
 * @param factor         the factor the loads carry: 1 for limit loads, the safety factor for ultimate
 * @param side           which half: both (a symmetric case, the right half standing for its mirror), or the
 *                       right or left half of an unsymmetrical case (the left given in its own mirror axes:
 *                       y outboard, the same sign conventions)
 */
public record SpanwiseLoads(LoadCase loadCase, double alpha, double liftCoefficient, double dragCoefficient,
        double normalCoefficient, double chordCoefficient, double axisAngle, double dynamicPressure,
        double[] y, double[] shear, double[] bending, double[] torsion, double[] chordShear, double[] chordBending,
        double normalLoad, double factor, Side side) {

    /** Which half the loads are of. */
    public enum Side {
        /** A symmetric case: the right half standing for both. */
        BOTH,
        /** The right half of an unsymmetrical case. */
        RIGHT,
        /** The left half of an unsymmetrical case, in its own mirror axes. */
        LEFT
    }

    /** Checks that the arrays share one length and copies them. */
    public SpanwiseLoads {
        int n = y.length;
        if (shear.length != n || bending.length != n || torsion.length != n || chordShear.length != n
                || chordBending.length != n) {
            throw new IllegalArgumentException("spanwise-load arrays differ in length");
        }
        y = y.clone();
        shear = shear.clone();
        bending = bending.clone();
        torsion = torsion.clone();
        chordShear = chordShear.clone();
        chordBending = chordBending.clone();
    }

    /** A copy of the stations, m. */
    @Override
    public double[] y() {
        return y.clone();
    }

    /** A copy of the shear at each station, N, positive up. */
    @Override
    public double[] shear() {
        return shear.clone();
    }

    /** A copy of the bending moment at each station, N m, positive for up-bending. */
    @Override
    public double[] bending() {
        return bending.clone();
    }

    /** A copy of the torsion at each station, N m, positive nose-up. */
    @Override
    public double[] torsion() {
        return torsion.clone();
    }

    /** A copy of the chordwise shear at each station, N, positive for an aft load outboard. */
    @Override
    public double[] chordShear() {
        return chordShear.clone();
    }

    /** A copy of the chordwise bending at each station, N m, positive for an aft load outboard. */
    @Override
    public double[] chordBending() {
        return chordBending.clone();
    }

    /** The number of stations. */
    public int stations() {
        return y.length;
    }

    /** The shear at the root (the first station), N. */
    public double rootShear() {
        return shear[0];
    }

    /** The bending moment at the root (the first station), N m. */
    public double rootBending() {
        return bending[0];
    }

    /** The torsion at the root (the first station), N m. */
    public double rootTorsion() {
        return torsion[0];
    }

    /** Every load times {@code f} (limit to ultimate with a safety factor); stations and case unchanged. */
    public SpanwiseLoads scaled(double f) {
        return new SpanwiseLoads(loadCase, alpha, liftCoefficient, dragCoefficient, normalCoefficient,
                chordCoefficient, axisAngle, dynamicPressure, y, times(shear, f), times(bending, f), times(torsion, f),
                times(chordShear, f), times(chordBending, f), normalLoad * f, factor * f, side);
    }

    private static double[] times(double[] v, double f) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = v[i] * f;
        }
        return out;
    }
}
