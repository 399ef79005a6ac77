package org.spanlift.loads;

import org.spanlift.input.RefusedException;
import org.spanlift.structure.LoadCase;
import org.spanlift.structure.PointMass;
import org.spanlift.structure.WingStructure;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;
import org.spanlift.solve.WingAnalysis;

/** Signs and bookkeeping of the spanwise loads. */
class LoadsAnalysisTest {

    private static final double G = StandardAtmosphere.G0;
    private static final Wing WING = WingFileReader.parse("name: r\nunits: m\nsurfaces:\n  - name: wing\n"
            + "    trapezoid: {span: 9.0, root-chord: 1.25}\n    lattice: {strips: 16, rows: 4}\n", "r.wing.yaml");
    private static final WingAnalysis ANALYSIS = WingAnalysis.of(WING);

    private static SpanwiseLoads loads(WingStructure s, double n) {
        return LoadsAnalysis.of(ANALYSIS, s, ANALYSIS.fileDeflections())
                .loads(new LoadCase("c", 6000, n, 50, 0, "given"));
    }

    private static WingStructure with(double spar, List<PointMass> points) {
        return new WingStructure(spar, 0.40, Optional.empty(), Optional.empty(), points);
    }

    @Test
    void upLoadGivesPositiveShearAndBendingAndDownLoadNegative() {
        SpanwiseLoads up = loads(WingStructure.NONE, 3);
        SpanwiseLoads down = loads(WingStructure.NONE, -1.5);
        assertTrue(up.rootShear() > 0 && up.rootBending() > 0);
        assertTrue(down.rootShear() < 0 && down.rootBending() < 0);
        // flat, untwisted, massless wing: the root shear is n W / 2 (the load factor's definition), so it scales
        // with n exactly
        assertEquals(-0.5, down.rootShear() / up.rootShear(), 1e-9);
    }

    @Test
    void liftAheadOfTheSparTwistsNoseUp() {
        // a flat plate carries its lift at the quarter chord: nose-up about a spar aft of it, nose-down ahead
        assertTrue(loads(with(0.45, List.of()), 3).rootTorsion() > 0);
        assertTrue(loads(with(0.05, List.of()), 3).rootTorsion() < 0);
        // moving the axis aft by d on this constant-chord, unswept, flat wing adds d times the shear, nose-up
        SpanwiseLoads a = loads(with(0.25, List.of()), 3);
        SpanwiseLoads b = loads(with(0.45, List.of()), 3);
        for (int k = 0; k < a.stations(); k++) {
            assertEquals(0.20 * 1.25 * a.shear()[k], b.torsion()[k] - a.torsion()[k], 1e-9 * a.rootBending());
        }
    }

    @Test
    void aMassAftOfTheSparTwistsNoseUpUnderPositiveLoadFactor() {
        SpanwiseLoads none = loads(with(0.25, List.of()), 3);
        double mp = 20;
        double xp = 0.25 * 1.25 + 0.3; // 0.3 m aft of the spar line
        SpanwiseLoads tank = loads(with(0.25, List.of(new PointMass("tank", mp, xp, 2.0))), 3);
        // inertia n g m along minus the normal axis (the wing's z: its root chord is the longitudinal axis),
        // 0.3 m aft: nose-up 3 g m 0.3; the case's angle of attack is unchanged by the mass
        assertEquals(none.alpha(), tank.alpha(), 0);
        double expected = 3 * G * mp * 0.3;
        assertEquals(expected, tank.rootTorsion() - none.rootTorsion(), 1e-9 * expected);
        // and it relieves bending by n g m times its distance, with shear less by n g m
        assertEquals(-3 * G * mp, tank.rootShear() - none.rootShear(), 1e-9 * none.rootShear());
        assertEquals(-3 * G * mp * 2.0, tank.rootBending() - none.rootBending(), 1e-9 * none.rootBending());
        // outboard of the mass the loads are those of the massless wing
        int k = 0;
        while (tank.y()[k] <= 2.0) {
            k++;
        }
        assertEquals(none.shear()[k], tank.shear()[k], 1e-9 * none.rootShear());
    }

    @Test
    void safetyFactorMultipliesEveryLoad() {
        SpanwiseLoads l = loads(with(0.35, List.of(new PointMass("tank", 10, 0.6, 1.0))), 3.8);
        SpanwiseLoads u = l.scaled(1.5);
        assertEquals(1.5 * l.rootShear(), u.rootShear(), 0);
        assertEquals(1.5 * l.bending()[3], u.bending()[3], 0);
        assertEquals(1.5 * l.torsion()[5], u.torsion()[5], 0);
        assertEquals(1.5, u.factor());
        assertEquals(l.liftCoefficient(), u.liftCoefficient());
    }

    @Test
    void governingPicksTheExtremesWithTheirCases() {
        List<SpanwiseLoads> all = List.of(loads(WingStructure.NONE, 1), loads(WingStructure.NONE, 3.8),
                loads(WingStructure.NONE, -1.5));
        Governing g = Governing.of(all);
        assertEquals(1, g.bending().maxCase()[0]);
        assertEquals(2, g.bending().minCase()[0]);
        assertEquals(all.get(1).rootBending(), g.bending().max()[0]);
        assertEquals(all.get(2).rootShear(), g.shear().min()[0]);
    }

    @Test
    void aCaseBeyondTheLinearRangeIsRefused() {
        LoadsAnalysis la = LoadsAnalysis.of(ANALYSIS, WingStructure.NONE, ANALYSIS.fileDeflections());
        RefusedException e = assertThrows(RefusedException.class,
                () -> la.loads(new LoadCase("slow", 60000, 6, 20, 0, "given")));
        assertTrue(e.getMessage().contains("'slow'"), e.getMessage());
    }
}
