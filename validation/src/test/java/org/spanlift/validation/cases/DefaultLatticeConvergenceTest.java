package org.spanlift.validation.cases;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.LatticeSpec;

/**
 * The recommended default lattice meets the aim of {@link ConvergenceStudy} on the corner planforms of the
 * study (aspect ratio 5 and 12, taper 0.4 and 1, sweep 0 and 10 degrees; the full study is its main class).
 */
class DefaultLatticeConvergenceTest {

    /** The lattice recommended in validation/CONVERGENCE.md. */
    static final LatticeSpec RECOMMENDED = ReferenceCases.cosine(32, 8);

    @Test
    void recommendedLatticeMeetsTheAim() {
        assertTrue(RECOMMENDED.strips() * RECOMMENDED.rows() <= ConvergenceStudy.MAX_PANELS_PER_HALF);
        List<ConvergenceStudy.Planform> corners = new ArrayList<>();
        for (double ar : new double[] {5, 12}) {
            for (double taper : new double[] {0.4, 1.0}) {
                for (double sweep : new double[] {0, 10}) {
                    corners.add(new ConvergenceStudy.Planform(ar, taper, sweep));
                }
            }
        }
        for (ConvergenceStudy.Row r : ConvergenceStudy.run(corners, List.of(RECOMMENDED))) {
            assertTrue(r.meetsAim(), () -> r.planform().label() + ": lift slope " + r.slopeErrPct() + "%, e "
                    + r.eErrPct() + "%, e with flap " + r.eFlapErrPct() + "%");
        }
    }
}
