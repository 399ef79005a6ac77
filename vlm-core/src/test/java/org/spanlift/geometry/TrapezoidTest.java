package org.spanlift.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.spanlift.io.WingFileReader;

/** The trapezoid as a model type: one shape whether a wing file or Java code describes it. */
class TrapezoidTest {

    private static final double TIGHT = 1e-12;

    @Test
    void theWingFileAndCodeBuildTheSameStations() {
        Wing file = WingFileReader.parse("""
                units: m
                sections:
                  main: {camber: NACA 2412}
                surfaces:
                  - name: wing
                    section: main
                    trapezoid: {span: 9.6, root-chord: 1.5, taper: 0.45, sweep: 4, dihedral: 3, root-twist: 1.5,
                                washout: 2.5, root-nose: [0.2, -0.1]}
                """, "test.wing.yaml");
        Trapezoid code = new Trapezoid(9.6, 1.5, 0.45, Math.toRadians(4), Math.toRadians(3), Math.toRadians(1.5),
                Math.toRadians(2.5), "main", 0.2, -0.1);
        // record equality compares every double exactly
        assertEquals(code.planform(), file.main().planform());
        // a wing makes its first surface the wing
        assertEquals(code.surface("wing", List.of(), LatticeSpec.DEFAULT).withRole(SurfaceRole.WING), file.main());
    }

    @Test
    void theStationsFollowTheTaperSweepDihedralAndWashout() {
        double sweep = Math.toRadians(12);
        double dihedral = Math.toRadians(5);
        double rootTwist = Math.toRadians(2);
        double washout = Math.toRadians(3);
        Trapezoid t = new Trapezoid(10, 1.6, 0.5, sweep, dihedral, rootTwist, washout, "s", 0.3, 0.1);
        List<Station> stations = t.planform().stations();
        Station root = stations.get(0);
        Station tip = stations.get(1);
        assertEquals(2, stations.size());
        assertEquals(5, t.semiSpan(), 0.0);
        assertEquals(0, root.y(), 0.0);
        assertEquals(5, tip.y(), 0.0);
        assertEquals(1.6, root.chord(), 0.0);
        assertEquals(0.8, tip.chord(), TIGHT);
        assertEquals(t.tipChord(), tip.chord(), 0.0);
        assertEquals(0.3, root.noseX(), 0.0);
        assertEquals(0.1, root.noseZ(), 0.0);
        double rootQuarter = root.noseX() + 0.25 * root.chord();
        double tipQuarter = tip.noseX() + 0.25 * tip.chord();
        assertEquals(sweep, Math.atan((tipQuarter - rootQuarter) / 5), TIGHT, "quarter-chord sweep");
        assertEquals(dihedral, Math.atan((tip.noseZ() - root.noseZ()) / 5), TIGHT, "dihedral");
        assertEquals(rootTwist, root.twist(), 0.0);
        assertEquals(rootTwist - washout, tip.twist(), TIGHT, "washout is root twist minus tip twist");
        // area of one half of a trapezoid: s (c_root + c_tip) / 2
        assertEquals(5 * (1.6 + 0.8) / 2, t.planform().area(), TIGHT);
    }

    @Test
    void aRectangleIsFlatUnsweptAndUntwisted() {
        Trapezoid r = Trapezoid.rectangle(8, 1.25, "flat");
        for (Station s : r.planform().stations()) {
            assertEquals(1.25, s.chord(), 0.0);
            assertEquals(0, s.noseX(), 0.0);
            assertEquals(0, s.noseZ(), 0.0);
            assertEquals(0, s.twist(), 0.0);
        }
        assertEquals(8, r.surface("wing", List.of(), LatticeSpec.DEFAULT).span(), 0.0);
    }

    @Test
    void impossibleShapesAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> new Trapezoid(0, 1, 1, 0, 0, 0, 0, "s", 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new Trapezoid(8, -1, 1, 0, 0, 0, 0, "s", 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new Trapezoid(8, 1, -0.1, 0, 0, 0, 0, "s", 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new Trapezoid(8, 1, Double.NaN, 0, 0, 0, 0, "s", 0, 0));
        assertThrows(IllegalArgumentException.class,
                () -> new Trapezoid(8, 1, 1, Math.PI / 2, 0, 0, 0, "s", 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new Trapezoid(8, 1, 1, 0, 0, 0, 0, null, 0, 0));
    }
}
