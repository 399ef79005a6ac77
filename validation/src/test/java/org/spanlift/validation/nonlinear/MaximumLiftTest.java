package org.spanlift.validation.nonlinear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.spanlift.validation.liftingline.LiftingLineWing;

/**
 * The maximum lift coefficient of straight wings from a section's lift curve.
 *
 * <p>The section used throughout (unless a test says otherwise) is the synthetic curve with a0 = 6.0 per
 * radian (0.105 per degree, the order of the measured slopes of ordinary sections; the value is chosen, not
 * taken from a source), alpha0 = -2 degrees, cl_max = 1.5 and a rounded peak 4 degrees wide, followed by
 * Viterna and Corrigan's post-stall lift. Wings are untwisted unless stated, 32 terms (the default).
 *
 * <p>Measured (the values the assertions below bound; "inside": a maximum inside the branch, with lower CL
 * converged on both sides; "end": CL still rising where the branch ends at a fold, see {@link MaximumLift}):
 * <pre>
 *   wing                    CL_max  /cl_max alpha    kind    first stall: alpha  eta    CL      stalled  index
 *   rectangular A 6         1.3838  0.9225  18.04    end     16.92  0.000  1.3645   0.49     -1
 *   rectangular A 7         1.3957  0.9304  17.64    end     16.50  0.000  1.3770   0.53     -1
 *   rectangular A 8         1.4055  0.9370  17.50    inside  16.22  0.000  1.3880   0.58     +1
 *   rectangular A 9         1.4130  0.9420  17.08    end     16.00  0.000  1.3971   0.58     -1
 *   rectangular A 10        1.4198  0.9465  17.02    inside  15.82  0.000  1.4047   0.62     -1
 *   A 8 taper 0.6           1.4507  0.9671  17.28    end     16.72  0.471  1.4437   0.52     +1
 *   A 8 taper 0.4           1.4643  0.9762  17.23    end     16.50  0.634  1.4526   0.47     +1
 *   A 8 taper 0.25          1.4520  0.9680  16.62    end     15.96  0.741  1.4334   0.38     -1
 *   A 8 taper 0.4, 2 deg    1.4669  0.9779  18.31    end     17.60  0.514  1.4589   0.51     +1
 *   A 8 taper 0.4, 4 deg    1.4626  0.9751  18.98    end     18.42  0.337  1.4556   0.49     +1
 *   A 8 taper 0.4, 6 deg    1.4529  0.9686  19.54    end     19.02  0.243  1.4442   0.37     +1
 *   rectangular A 8, 2 deg  1.3679  0.9120  16.89    end     16.34  0.000  1.3506   0.22     +1
 *   rectangular A 8, 4 deg  1.3267  0.8845  16.99    end     16.52  0.000  1.3076   0.12     +1
 *   rectangular A 8, 6 deg  1.2808  0.8539  17.14    end     16.72  0.000  1.2606   0.07     +1
 * </pre>
 * (angles in degrees; "2 deg" is linear washout; stalled: the span fraction past its peak at CL_max.)
 */
class MaximumLiftTest {

    private static final double DEG = Math.PI / 180.0;
    private static final double CL_MAX = 1.5;
    private static final SectionLiftCurve SECTION = SectionLiftCurve.synthetic(6.0, -2.0 * DEG, CL_MAX, 4.0 * DEG);
    private final NonlinearLiftingLineSolver solver = new NonlinearLiftingLineSolver();

    /** A straight-tapered wing of aspect ratio A, root chord 1 m: A = 2 b / (c_root (1 + taper)). */
    static LiftingLineWing tapered(double aspectRatio, double taper) {
        return LiftingLineWing.trapezoidal(aspectRatio * (1.0 + taper) / 2.0, 1.0, taper);
    }

    static MaximumLift maximum(NonlinearLiftingLineSolver solver, LiftingLineWing planform) {
        NonlinearWing wing = NonlinearWing.uniform(planform, SECTION);
        MaximumLiftSearch search = solver.maximumLift(wing, 0.0, 1.0 * DEG, 30.0 * DEG);
        MaximumLift m = assertInstanceOf(MaximumLift.class, search,
                () -> "no maximum: " + (search instanceof MaximumLiftNotFound f ? f.reason() : ""));
        EquationCheck.satisfies(wing, m.atMaximum(), "at CL_max");
        assertTrue(m.bracketHigh() - m.bracketLow() <= 0.04 * DEG + 1e-12, "bracket within 0.04 deg");
        assertTrue(m.bracketLow() <= m.alphaAtClMax() && m.alphaAtClMax() <= m.bracketHigh());
        return m;
    }

    /**
     * An untwisted elliptic wing has uniform downwash, CL/(pi A), and so the same effective angle and the
     * same cl at every station (L. Prandtl, 1918; H. Glauert, The Elements of Aerofoil and Airscrew Theory,
     * 1926, chapter XI): every section reaches its peak together, and CL_max = cl_max at
     * alpha = alpha_peak + cl_max / (pi A). The search samples every 0.02 degree: its best point is one of
     * the two samples around the peak (within 0.02 degree of it) and lifts at least as much as the nearer
     * one, which lies within 0.01 degree, where the section curve is at most (a0 / (2 Delta)) (0.01 deg)^2
     * = 1.3e-6 below cl_max (the cap; past the peak the blend falls more slowly still).
     */
    @ParameterizedTest(name = "A = {0}")
    @ValueSource(doubles = {6.0, 8.0})
    void anEllipticWingReachesTheSectionsClMax(double aspectRatio) {
        double span = aspectRatio * Math.PI / 4.0; // root chord 1 m: S = pi b / 4, A = 4 b / pi
        MaximumLift m = maximum(solver, LiftingLineWing.elliptic(span, 1.0));
        assertTrue(m.insideBranch(), "a maximum inside the branch");
        assertEquals(CL_MAX, m.clMax(), 1.5e-6);
        double expectedAlpha = SECTION.peakAngle() + CL_MAX / (Math.PI * aspectRatio);
        assertEquals(expectedAlpha, m.alphaAtClMax(), NonlinearLiftingLineSolver.FINE_STEP + 1e-12);
        double fraction = m.atMaximum().stalledSpanFraction();
        assertTrue(fraction < 1e-12 || fraction > 1.0 - 1e-12, "the whole span passes its peak together: " + fraction);
        for (double cl : m.atMaximum().sectionLift()) {
            assertEquals(m.clMax(), cl, 1e-9, "uniform cl across the span");
        }
    }

    /**
     * Rule of thumb of conceptual design: an untwisted, unswept wing of high aspect ratio reaches about 0.9
     * of its section's cl_max (D. P. Raymer, Aircraft Design: A Conceptual Approach, chapter 12, CL_max =
     * 0.9 cl_max cos(sweep) for high aspect ratio; quoted from memory). The rule is given to one
     * significant figure, so it is checked to within 0.05: 0.85 to 0.95. Measured (class comment): 0.9225
     * at A = 6 rising to 0.9465 at A = 10, inside the band, and above the critical-section value (the CL at
     * which the first station reaches its peak, 0.910 to 0.936 of cl_max) by the lift the wing gains while
     * the stall spreads from the root.
     */
    @ParameterizedTest(name = "A = {0}")
    @ValueSource(doubles = {6.0, 7.0, 8.0, 9.0, 10.0})
    void aRectangularWingReachesAboutNineTenthsOfTheSectionsClMax(double aspectRatio) {
        MaximumLift m = maximum(solver, tapered(aspectRatio, 1.0));
        double ratio = m.clMax() / CL_MAX;
        assertTrue(ratio >= 0.85 && ratio <= 0.95, "CL_max / cl_max = " + ratio);
        assertNotNull(m.firstStallLift());
        assertTrue(m.clMax() >= m.firstStallLift(), "the branch goes on past the first stall");
        assertEquals(0.0, m.firstStallEta(), 0.0, "a rectangular wing stalls first at the root");
        assertTrue(m.atMaximum().stalledSpanFraction() > 0.0, "part of the span is past its peak at CL_max");
    }

    /**
     * Critical-section expectations (common practice, e.g. the stall-pattern discussion of conceptual
     * design texts): taper moves the first station to stall outboard, from the root of a rectangular wing
     * toward the tip as the taper ratio falls; on a tapered wing washout moves it back inboard.
     */
    @Test
    void taperMovesTheFirstStallOutboardAndWashoutMovesItInboard() {
        double previous = -1.0;
        for (double taper : new double[] {1.0, 0.6, 0.4, 0.25}) {
            double eta = maximum(solver, tapered(8.0, taper)).firstStallEta();
            assertTrue(eta > previous, "taper " + taper + ": first stall at eta " + eta + ", outboard of " + previous);
            previous = eta;
        }
        previous = 2.0;
        for (double washout : new double[] {0.0, 2.0, 4.0, 6.0}) {
            double eta = maximum(solver, tapered(8.0, 0.4).withLinearWashout(washout * DEG)).firstStallEta();
            assertTrue(eta < previous, washout + " deg washout: first stall at eta " + eta + ", inboard of "
                    + previous);
            previous = eta;
        }
    }

    /**
     * Washout lowers the maximum lift of a wing that stalls first at the root (common practice: it unloads
     * the tips, which were not the limit): on the rectangular wing of aspect ratio 8, each 2 degrees of
     * linear washout lowers CL_max, and the CL at which the first station reaches its peak, by a modest
     * amount (measured: 2.5 to 3 percent of cl_max per 2 degrees; checked as a fall of less than 5 percent).
     * On the wing of taper 0.4, whose tips stall first, 2 degrees raise CL_max slightly (class comment);
     * that is not asserted.
     */
    @Test
    void washoutLowersTheMaximumLiftOfARectangularWingModestly() {
        MaximumLift previous = null;
        for (double washout : new double[] {0.0, 2.0, 4.0}) {
            MaximumLift m = maximum(solver, tapered(8.0, 1.0).withLinearWashout(washout * DEG));
            if (previous != null) {
                double drop = (previous.clMax() - m.clMax()) / CL_MAX;
                assertTrue(drop > 0.0 && drop < 0.05, washout + " deg: CL_max falls by " + drop + " of cl_max");
                double firstDrop = (previous.firstStallLift() - m.firstStallLift()) / CL_MAX;
                assertTrue(firstDrop > 0.0 && firstDrop < 0.05, washout + " deg: first-stall CL falls by " + firstDrop);
            }
            previous = m;
        }
    }

    /**
     * Convergence with the number of terms N, rectangular wing of aspect ratio 8, untwisted and with 4
     * degrees of washout (measured):
     * <pre>
     *   N      untwisted: CL_max  kind     first-stall CL    4 deg washout: CL_max  kind     first-stall CL
     *   8                 1.40543 inside   1.38796                          1.36646 inside   1.30754
     *   16                1.40435 end      1.38803                          1.33609 end      1.30763
     *   32                1.40551 inside   1.38804                          1.32670 end      1.30764
     *   64                1.40551 inside   1.38804                          1.32040 end      1.30764
     *   128               1.40551 inside   1.38804                          1.31614 end      1.30764
     * </pre>
     * The first-stall CL converges like the linear solution (1e-5 by 16 terms). A maximum inside the branch
     * converges too: from 32 terms on, CL_max of the untwisted wing changes by less than 1e-5. Where the
     * branch ends at a fold, it ends sooner after the first stall as terms are added (the harmonics that
     * lose their stiffness past a peak, see the solver), and CL_max falls toward the first-stall CL: with
     * washout this discretized equation has no CL_max independent of N, only the first-stall value. The
     * test pins both behaviours.
     */
    @Test
    void convergenceWithTheNumberOfTerms() {
        int[] counts = {16, 32, 64, 128};
        MaximumLift[] plain = new MaximumLift[counts.length];
        MaximumLift[] washed = new MaximumLift[counts.length];
        for (int i = 0; i < counts.length; i++) {
            NonlinearLiftingLineSolver s = new NonlinearLiftingLineSolver(counts[i]);
            plain[i] = maximum(s, tapered(8.0, 1.0));
            washed[i] = maximum(s, tapered(8.0, 1.0).withLinearWashout(4.0 * DEG));
        }
        MaximumLift finest = plain[counts.length - 1];
        for (int i = 0; i < counts.length; i++) {
            assertEquals(finest.firstStallLift(), plain[i].firstStallLift(), 1e-4, "first-stall CL, N = " + counts[i]);
            assertEquals(washed[counts.length - 1].firstStallLift(), washed[i].firstStallLift(), 1e-4,
                    "first-stall CL with washout, N = " + counts[i]);
            assertNotNull(washed[i].endOfBranch(), "with washout the branch ends, N = " + counts[i]);
            assertTrue(washed[i].clMax() >= washed[i].firstStallLift(), "and past the first stall");
            if (i > 0) {
                assertTrue(washed[i].clMax() < washed[i - 1].clMax(), "and sooner with more terms, N = " + counts[i]);
            }
        }
        for (int i = 1; i < counts.length; i++) {
            assertNull(plain[i].endOfBranch(), "untwisted: a maximum inside the branch, N = " + counts[i]);
            assertEquals(finest.clMax(), plain[i].clMax(), 1e-5, "untwisted CL_max, N = " + counts[i]);
        }
    }
}
