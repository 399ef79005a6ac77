package org.spanlift.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.Vec3;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Lattice;
import org.spanlift.results.Solution;
import org.spanlift.section.CamberLines;

/** The velocity field of a solved lattice against the system it was solved from. */
class InducedVelocityTest {

    private static final double DEG = Math.PI / 180;

    private static Wing wing() {
        List<ControlSurface> controls = List.of(new ControlSurface("aileron", ControlKind.AILERON, 2.5, 4.2, 0.25, 0));
        Surface s = new Trapezoid(9, 1.4, 0.5, 10 * DEG, 4 * DEG, 0, 2 * DEG, "s", 0, 0).surface("wing", controls,
                new LatticeSpec(12, 4, Spacing.COSINE, Spacing.COSINE));
        return new Wing("w", LengthUnit.M, Wing.defaultReference(s), List.of(s),
                Map.of("s", Section.of("s", CamberLines.parse("NACA 2412"))));
    }

    @Test
    void atEveryControlPointTheFlowMeetsTheBoundaryCondition() {
        // (V + v) . n = -eps V . t on every panel, both halves, with an aileron deflected (no symmetry)
        WingAnalysis analysis = WingAnalysis.of(wing());
        double alpha = 6 * DEG;
        double delta = 5 * DEG;
        Solution s = analysis.solve(alpha, new double[] {delta});
        InducedVelocity field = InducedVelocity.of(s);
        Lattice lattice = analysis.lattice();
        double vx = Math.cos(alpha);
        double vz = Math.sin(alpha);
        double[] v = new double[3];
        for (int i = 0; i < lattice.panelCount(); i++) {
            field.at(lattice.cx(i), lattice.cy(i), lattice.cz(i), v);
            double normal = (vx + v[0]) * lattice.nx(i) + v[1] * lattice.ny(i) + (vz + v[2]) * lattice.nz(i);
            double eps = lattice.incidence(i) + delta * lattice.controlSign(i);
            assertEquals(-eps * vx, normal, 1e-12, "panel " + i);
        }
    }

    @Test
    void aSymmetricLoadGivesAMirroredField() {
        Solution s = WingAnalysis.of(wing()).solve(5 * DEG);
        InducedVelocity field = InducedVelocity.of(s);
        for (Vec3 p : List.of(new Vec3(6, 1.3, 0.2), new Vec3(0.5, 2.9, -0.4), new Vec3(30, 4.4, 0.01))) {
            Vec3 right = field.at(p);
            Vec3 left = field.at(new Vec3(p.x(), -p.y(), p.z()));
            assertEquals(right.x(), left.x(), 1e-13);
            assertEquals(right.y(), -left.y(), 1e-13);
            assertEquals(right.z(), left.z(), 1e-13);
        }
    }

    @Test
    void theDownwashAngleIsTheTurnOfTheLocalFlowFromTheFreestream() {
        double alpha = 8 * DEG;
        // flow turned down by exactly 3 degrees: v = (cos(a - 3), sin(a - 3)) - (cos a, sin a)
        double turned = alpha - 3 * DEG;
        double vx = Math.cos(turned) - Math.cos(alpha);
        double vz = Math.sin(turned) - Math.sin(alpha);
        assertEquals(3 * DEG, InducedVelocity.downwashAngle(alpha, vx, vz), 1e-15);
        // to first order, epsilon = -(v . n) with n = (-sin a, 0, cos a)
        double small = 1e-6;
        assertEquals(small, InducedVelocity.downwashAngle(alpha, small * Math.sin(alpha), -small * Math.cos(alpha)),
                1e-15);
    }
}
