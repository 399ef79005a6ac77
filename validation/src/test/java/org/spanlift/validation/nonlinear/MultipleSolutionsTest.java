package org.spanlift.validation.nonlinear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.spanlift.validation.liftingline.LiftingLineWing;

/**
 * Several solutions past a section's peak, and failures that carry no lift.
 *
 * <p>On an untwisted elliptic wing of one section the downwash is uniform, CL / (pi A) (L. Prandtl, 1918;
 * H. Glauert, The Elements of Aerofoil and Airscrew Theory, 1926, chapter XI), so a solution with the same
 * cl everywhere exists for every root alpha_eff of
 * <pre>
 *   alpha = alpha_eff + cl(alpha_eff) / (pi A)
 * </pre>
 * (derived here from that result). Where the section's lift falls faster than pi A per radian past its
 * peak, the right-hand side decreases over that stretch and some angles have three roots: an attached one,
 * one on the steep fall, and a stalled one. The tests compute the roots of the piecewise-linear table
 * themselves and compare.
 */
class MultipleSolutionsTest {

    private static final double DEG = Math.PI / 180.0;
    private static final double ASPECT_RATIO = 6.0;
    /** Peak 1.5 at 14 deg, a gentle fall to 15 deg, then -0.55 over one degree (-31.5 per radian). */
    private static final double[] TABLE_DEG = {-10.0, 12.0, 14.0, 15.0, 16.0, 30.0, 45.0};
    private static final double[] TABLE_CL = {-0.9, 1.4, 1.5, 1.45, 0.9, 1.0, 1.05};

    private static NonlinearWing ellipticWing() {
        double span = ASPECT_RATIO * Math.PI / 4.0; // root chord 1 m
        return NonlinearWing.uniform(LiftingLineWing.elliptic(span, 1.0),
                SectionLiftCurve.tableDegrees(TABLE_DEG, TABLE_CL));
    }

    /** Every cl of alpha = alpha_eff + cl(alpha_eff) / (pi A), segment by segment of the table. */
    private static List<Double> uniformSolutions(double alpha) {
        List<Double> cls = new ArrayList<>();
        double k = 1.0 / (Math.PI * ASPECT_RATIO);
        for (int i = 0; i + 1 < TABLE_DEG.length; i++) {
            double a0 = TABLE_DEG[i] * DEG;
            double a1 = TABLE_DEG[i + 1] * DEG;
            double f0 = a0 + k * TABLE_CL[i] - alpha;
            double f1 = a1 + k * TABLE_CL[i + 1] - alpha;
            if (f0 == 0.0 || f0 * f1 < 0.0) {
                double t = f0 / (f0 - f1);
                cls.add(TABLE_CL[i] + t * (TABLE_CL[i + 1] - TABLE_CL[i]));
            }
        }
        return cls;
    }

    /**
     * Continuing upward and downward finds the attached and the stalled uniform solutions, which differ
     * between the folds, 16 deg + 0.9 / (pi A) rad = 18.735 deg and 15 deg + 1.45 / (pi A) rad =
     * 19.407 deg, and agree outside. Each branch ends at its fold: the upward one fails at the first grid
     * angle above 19.407 deg, the downward one at the first below 18.735 deg (Newton finds nothing near
     * the branch there), and each starts again at the next angle. Every solution is checked against the
     * equation, and its CL against the roots computed here (to 1e-9). On the attached branch past the
     * peak the section slope is -2.9 per radian, so the harmonics n &gt;= 7 have lost their stiffness
     * (1 + n c_root cl' / (4 b) &lt; 0 on this elliptic wing): 13 of the 16, an odd number, hence the index
     * -1.
     */
    @Test
    void anEllipticWingWithASteepStallHasAnAttachedAndAStalledSolution() {
        NonlinearWing wing = ellipticWing();
        LiftSweep sweep = new NonlinearLiftingLineSolver(16).sweep(wing, 17.0 * DEG, 21.0 * DEG, 0.25 * DEG);
        double low = 16.0 * DEG + 0.9 / (Math.PI * ASPECT_RATIO);
        double high = 15.0 * DEG + 1.45 / (Math.PI * ASPECT_RATIO);
        int multiple = 0;
        double step = 0.25 * DEG;
        for (LiftSweep.Row row : sweep.rows()) {
            String at = "alpha " + row.alpha() / DEG + " deg";
            boolean firstAboveUpperFold = row.alpha() > high && row.alpha() - step < high;
            boolean firstBelowLowerFold = row.alpha() < low && row.alpha() + step > low;
            if (firstAboveUpperFold) {
                assertInstanceOf(NonlinearFailure.class, row.upward(), at + ": the attached branch has ended");
                assertFalse(row.multiple());
                continue;
            }
            if (firstBelowLowerFold) {
                assertInstanceOf(NonlinearFailure.class, row.downward(), at + ": the stalled branch has ended");
                assertFalse(row.multiple());
                continue;
            }
            NonlinearSolution up = assertInstanceOf(NonlinearSolution.class, row.upward(), at + " upward");
            NonlinearSolution down = assertInstanceOf(NonlinearSolution.class, row.downward(), at + " downward");
            EquationCheck.satisfies(wing, up, at + " upward");
            EquationCheck.satisfies(wing, down, at + " downward");
            List<Double> roots = uniformSolutions(row.alpha());
            assertTrue(roots.stream().anyMatch(r -> Math.abs(r - up.liftCoefficient()) < 1e-9),
                    at + ": upward CL is a root");
            assertTrue(roots.stream().anyMatch(r -> Math.abs(r - down.liftCoefficient()) < 1e-9),
                    at + ": downward CL is a root");
            boolean inside = row.alpha() > low && row.alpha() < high;
            assertEquals(inside, row.multiple(), at);
            if (inside) {
                multiple++;
                assertEquals(3, roots.size(), at + ": three roots");
                assertEquals(roots.get(0), up.liftCoefficient(), 1e-9, at + ": upward stays attached");
                assertEquals(roots.get(2), down.liftCoefficient(), 1e-9, at + ": downward stays stalled");
                assertEquals(1.0, up.stalledSpanFraction(), 1e-12, at + ": upward is past the peak, on the gentle "
                        + "fall");
                assertEquals(-1, up.index(), at + ": 13 harmonics without stiffness");
                assertEquals(1.0, down.stalledSpanFraction(), 1e-12);
                assertEquals(1, down.index(), at + ": the stalled branch rises again (positive slope)");
            }
        }
        assertEquals(3, multiple, "18.75, 19.0 and 19.25 deg");
        assertTrue(sweep.anyMultiple());
    }

    /** Past the data of a section the solver reports a failure, never a number. */
    @Test
    void leavingTheSectionDataIsAFailureNotASolution() {
        SectionLiftCurve shortTable = SectionLiftCurve.tableDegrees(new double[] {-10.0, 12.0},
                new double[] {-0.9, 1.4});
        NonlinearWing wing = NonlinearWing.uniform(LiftingLineWing.rectangular(8.0, 1.0, 2.0 * Math.PI), shortTable);
        NonlinearLiftingLineSolver solver = new NonlinearLiftingLineSolver();
        NonlinearFailure f = assertInstanceOf(NonlinearFailure.class, solver.solve(wing, 20.0 * DEG));
        assertFalse(f.converged());
        assertTrue(f.reason().contains("outside its section data"), f.reason());
        MaximumLiftNotFound none = assertInstanceOf(MaximumLiftNotFound.class,
                solver.maximumLift(wing, 0.0, 1.0 * DEG, 30.0 * DEG));
        assertFalse(none.found());
        assertTrue(none.reason().contains("before any station passes its peak"), none.reason());
        for (NonlinearSolution s : none.branch()) {
            EquationCheck.satisfies(wing, s, "branch point at " + s.alpha() / DEG + " deg");
        }
        LiftSweep sweep = solver.sweep(wing, 10.0 * DEG, 20.0 * DEG, 2.0 * DEG);
        for (LiftSweep.Row row : sweep.rows()) {
            if (row.upward() instanceof NonlinearSolution s) {
                EquationCheck.satisfies(wing, s, "sweep at " + row.alpha() / DEG + " deg");
            } else {
                assertFalse(row.multiple());
            }
        }
        assertInstanceOf(NonlinearFailure.class, sweep.rows().get(sweep.rows().size() - 1).upward());
    }

    @Test
    void aStartOfAnotherSizeIsRefused() {
        NonlinearWing wing = ellipticWing();
        NonlinearSolution start = assertInstanceOf(NonlinearSolution.class,
                new NonlinearLiftingLineSolver(8).solve(wing, 5.0 * DEG));
        assertThrows(IllegalArgumentException.class, () -> new NonlinearLiftingLineSolver(16)
                .solve(wing, 6.0 * DEG, start));
        assertThrows(IllegalArgumentException.class, () -> new NonlinearLiftingLineSolver(0));
        assertThrows(IllegalArgumentException.class, () -> new NonlinearLiftingLineSolver().solve(wing, Double.NaN));
    }
}
