package org.spanlift.structure;

import java.util.List;
import java.util.OptionalDouble;

/**
 * What the user gives to build a manoeuvre and gust envelope (SI; speeds are equivalent airspeeds).
 *
 * @param weights            aircraft weights, N, one envelope each
 * @param altitude           pressure altitude, m (for the gust mass ratio's density)
 * @param positive           positive limit manoeuvring load factor n1, up to VD
 * @param negative           negative limit manoeuvring load factor n2, at VC
 * @param negativeAtDive     the negative limit at VD (the line from n2 at VC runs linearly to it); 0 by
 *                           default
 * @param va                 design manoeuvring speed
 * @param vb                 design speed for maximum gust intensity (optional)
 * @param vc                 design cruising speed
 * @param vd                 design dive speed
 * @param gustB              derived gust velocity at VB (with vb)
 * @param gustC              derived gust velocity at VC
 * @param gustD              derived gust velocity at VD
 * @param liftSlope          lift-curve slope per radian for the gust formula; empty: the wing's own
 * @param minimumLift        the wing's most negative CL (optional): adds the corner where the negative
 *                           stall line meets n2
 */
public record EnvelopeSpec(List<Double> weights, double altitude, double positive, double negative,
        double negativeAtDive, double va, OptionalDouble vb, double vc, double vd, OptionalDouble gustB,
        double gustC, double gustD, OptionalDouble liftSlope, OptionalDouble minimumLift) {

    /** Copies the weights. */
    public EnvelopeSpec {
        weights = List.copyOf(weights);
    }
}
