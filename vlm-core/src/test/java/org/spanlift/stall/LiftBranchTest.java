package org.spanlift.stall;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.Wing;
import org.spanlift.section.CamberLines;
import org.spanlift.section.Table;
import org.spanlift.solve.WingAnalysis;

/** The bookkeeping of a traced lift branch. */
class LiftBranchTest {

    /**
     * The first angle where the Jacobian's determinant changed sign is the first such point of the whole
     * upward trace, the points of halved steps included. On this wing (rectangular, aspect ratio 7, 64 x 8
     * cosine lattice, synthetic curve of cl_max 1.4) the first change falls on a halved step near 17.4
     * degrees, where the trace recorded none before the fix.
     */
    @Test
    void theFirstSignChangeOfTheJacobianCountsEveryPointOfTheTrace() {
        Section section = Section.of("s", CamberLines.parse("NACA 0012")).withClMax(Table.constant(1.4));
        Surface surface = Trapezoid.rectangle(7.0, 1.0, "s")
                .surface("wing", List.of(), new LatticeSpec(64, 8, Spacing.COSINE, Spacing.COSINE));
        Wing wing = new Wing("w", LengthUnit.M, Wing.defaultReference(surface), List.of(surface), Map.of("s", section));
        WingAnalysis analysis = WingAnalysis.of(wing);
        double[] clean = new double[0];
        StripLimits limits = StripLimits.of(wing, analysis.lattice(), clean, OptionalDouble.empty());
        SectionCoupling coupling = SectionCoupling.of(analysis, clean,
                StripCurves.of(wing, analysis.lattice(), clean, limits, 0));
        LiftBranch branch = LiftBranch.trace(coupling, analysis.liftCurve(clean).zeroLiftAngle());

        List<CoupledPoint> up = branch.upward();
        CoupledPoint first = null;
        for (CoupledPoint p : up) {
            if (p.stableJacobian() != up.get(0).stableJacobian()) {
                first = p;
                break;
            }
        }
        assertTrue(first != null, "the determinant changes sign on this trace");
        double step = Math.toRadians(LiftBranch.STEP_DEG);
        double fromStart = (first.alpha() - up.get(0).alpha()) / step;
        assertTrue(Math.abs(fromStart - Math.rint(fromStart)) > 1e-9, "the first change falls on a halved step");
        assertTrue(branch.jacobianSignChange().isPresent(), "and is reported");
        assertEquals(first.alpha(), branch.jacobianSignChange().getAsDouble(), 0.0);
    }
}
