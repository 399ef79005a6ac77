package org.spanlift.stall;

import org.spanlift.input.RefusedException;
import org.spanlift.flight.FlightCondition;
import org.spanlift.atmosphere.Airspeed;
import org.spanlift.solve.WingAnalysis;

/**
 * The stall speed of a flight condition from the critical-section estimate of stall-onset CL, with the
 * strips' Reynolds numbers iterated together with the speed until both agree.
 *
 * @param equivalent equivalent airspeed, m/s
 * @param trueSpeed  true airspeed, m/s
 * @param estimate   the stall-onset estimate at that speed's Reynolds numbers
 * @param iterations how many speed updates were needed
 */
public record StallSpeed(double equivalent, double trueSpeed, StallEstimate estimate, int iterations) {

    /** Relative change of speed below which the iteration stops. */
    public static final double TOLERANCE = 1e-9;
    private static final int MAX_ITERATIONS = 100;

    /** The stall speed of the condition at the given deflections (rad, control order). */
    public static StallSpeed of(WingAnalysis analysis, double[] deflections, StripLimits limits,
            FlightCondition condition) {
        double nu = condition.atmosphere().kinematicViscosity();
        StallAnalysis stall = StallAnalysis.of(analysis, deflections, limits);
        double vt = 30;
        for (int k = 1; k <= MAX_ITERATIONS; k++) {
            StallEstimate e = stall.estimate(vt / nu);
            double ve = condition.equivalentSpeedFor(e.lift(), analysis.wing().reference());
            double next = Airspeed.trueFromEquivalent(ve, condition.atmosphere());
            if (Math.abs(next - vt) <= TOLERANCE * next) {
                StallEstimate settled = stall.estimate(next / nu);
                return new StallSpeed(ve, next, settled, k);
            }
            vt = next;
        }
        throw new RefusedException("the stall speed and the Reynolds numbers did not settle; "
                + "check the cl-max table against Reynolds number");
    }
}
