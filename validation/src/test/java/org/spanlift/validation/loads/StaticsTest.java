package org.spanlift.validation.loads;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;
import org.spanlift.structure.LoadCase;
import org.spanlift.loads.LoadsAnalysis;
import org.spanlift.structure.MassTable;
import org.spanlift.structure.PointMass;
import org.spanlift.loads.SpanwiseLoads;
import org.spanlift.structure.WingStructure;
import org.spanlift.solve.WingAnalysis;

/**
 * Statics of the half-wing as a free body (Newton's laws; common practice for any loads calculation):
 * the root carries the half-wing's lift less its inertia, nothing is left at the tip, and the bending
 * moment is the integral of the shear along the spar.
 */
class StaticsTest {

    private static final double G = StandardAtmosphere.G0;

    /** A tapered wing with dihedral, washout, camber and a flap down: every term of the air load. */
    private static final String TRAINER = """
            name: statics trainer
            units: m
            surfaces:
              - name: wing
                stations:
                  - {y: 0.0, chord: 1.40, nose-x: 0.00, nose-z: 0.00, twist: 0.0, section: inner}
                  - {y: 2.2, chord: 1.40, nose-x: 0.00, nose-z: 0.08, twist: 0.0, section: inner}
                  - {y: 4.9, chord: 0.80, nose-x: 0.15, nose-z: 0.26, twist: -3.0, section: outer}
                controls:
                  - {name: flap, kind: flap, from: 0.5, to: 2.6, chord-fraction: 0.25, deflection: 10}
                lattice: {strips: 24, rows: 6}
            sections:
              inner: {camber: NACA 2412}
              outer: {camber: NACA 0012}
            """;

    /**
     * Each half's root resultant normal to the longitudinal axis equals n (W/2 - g m_half), m_half the
     * half-wing's mass with its point masses, to 1e-6 relative, for up and down load factors, with a mass table
     * and with a chord-spread wing mass: the load factor is the aerodynamic force normal to that axis over the
     * weight (14 CFR 23.321(a), text before the 2017 rewrite) and the inertia acts along it. The half-wing mass
     * is computed here independently (trapezoids of the table).
     */
    @Test
    void rootCarriesTheHalfLiftLessTheInertia() {
        Wing wing = WingFileReader.parse(TRAINER, "trainer.wing.yaml");
        WingAnalysis a = WingAnalysis.of(wing);
        List<PointMass> points = List.of(new PointMass("tank", 38, 0.55, 1.3), new PointMass("light", 1.5, 0.2, 4.9));
        MassTable table = new MassTable(new double[] {0, 2.2, 4.9}, new double[] {16, 11, 4});
        double tableHalf = 0.5 * (16 + 11) * 2.2 + 0.5 * (11 + 4) * 2.7;
        List<WingStructure> structures = List.of(
                new WingStructure(0.35, 0.40, Optional.empty(), Optional.of(table), points),
                new WingStructure(0.30, 0.45, Optional.of(96.0), Optional.empty(), points));
        double[] halfMass = {tableHalf + 39.5, 48 + 39.5};
        double w = 1050 * G;
        for (int s = 0; s < 2; s++) {
            LoadsAnalysis la = LoadsAnalysis.of(a, structures.get(s), a.fileDeflections());
            assertEquals(halfMass[s], la.halfWingMass(), 1e-9 * halfMass[s], "half-wing mass");
            for (double[] nv : new double[][] {{1, 40}, {3.8, 55}, {-1.5, 60}, {4.4, 70}}) {
                SpanwiseLoads l = la.loads(new LoadCase("n", w, nv[0], nv[1], 0, "given"));
                double expected = nv[0] * (w / 2 - G * halfMass[s]);
                assertEquals(expected, l.normalLoad(), 1e-6 * Math.abs(expected), "n " + nv[0]);
            }
        }
    }

    /**
     * On a flat wing (no dihedral, no twist) whose longitudinal axis is its chord line, the beam axes are the
     * airplane's: the root beam shear (normal to the wing plane) is n (W/2 - g m_half) and the chord shear is
     * the chordwise air force CC q S / 2 (positive aft, CC = CD cos alpha - CL sin alpha), both to 1e-6
     * relative, for any angle of attack; the case's coefficients reproduce CN = CL cos alpha + CD sin alpha =
     * n W / (q S) to 1e-9. The spar is the quarter-chord line, unswept on this trapezoid, so the chord axis is
     * x (on a swept spar line, part of the chordwise force is axial along the spar).
     */
    @Test
    void flatWingRootShearIsTheNormalLoadAndTheChordShearTheChordwiseAirLoad() {
        Wing wing = LoadsFixtures.trapezoid(10, 1.6, 0.5, 24);
        WingAnalysis a = WingAnalysis.of(wing);
        WingStructure st = new WingStructure(0.25, 0.40, Optional.of(80.0), Optional.empty(),
                List.of(new PointMass("tank", 30, 0.6, 1.5)));
        LoadsAnalysis la = LoadsAnalysis.of(a, st, a.fileDeflections());
        double w = 900 * G;
        for (double[] nv : new double[][] {{3.8, 50}, {1.0, 70}, {-1.5, 60}}) {
            SpanwiseLoads l = la.loads(new LoadCase("case", w, nv[0], nv[1], 0, "given"));
            double net = nv[0] * (w / 2 - G * (40 + 30));
            assertEquals(net, l.rootShear(), 1e-6 * Math.abs(net), "shear, n " + nv[0]);
            double q = l.dynamicPressure();
            double area = wing.reference().area();
            double cn = l.liftCoefficient() * Math.cos(l.alpha()) + l.dragCoefficient() * Math.sin(l.alpha());
            double cc = l.dragCoefficient() * Math.cos(l.alpha()) - l.liftCoefficient() * Math.sin(l.alpha());
            assertEquals(nv[0] * w / (q * area), cn, 1e-9 * Math.abs(cn), "CN, n " + nv[0]);
            assertEquals(cn, l.normalCoefficient(), 1e-12 * Math.abs(cn));
            assertEquals(cc, l.chordCoefficient(), 1e-12 * Math.max(1e-3, Math.abs(cc)));
            assertEquals(cc * q * area / 2, l.chordShear()[0], 1e-6 * Math.abs(net), "chord shear, n " + nv[0]);
        }
    }

    /**
     * At the dive speed with n near 1 (small CL) the chordwise load is aft (the drag outweighs the forward tilt
     * of the lift) and equals CC q S / 2 on each half, CC > 0: the case of 14 CFR 23.349-type chordwise loads
     * the old lift-only loads missed. The wing has drag polars so profile drag enters.
     */
    @Test
    void chordwiseLoadAtTheDiveSpeedIsAft() {
        Wing wing = WingFileReader.parse("""
                name: polar wing
                units: m
                surfaces:
                  - name: wing
                    section: s
                    trapezoid: {span: 10, root-chord: 1.6, taper: 0.5}
                    lattice: {strips: 24, rows: 6}
                sections:
                  s:
                    camber: NACA 2412
                    drag-polar: {reynolds: [1.0e6, 6.0e6], cl: [-0.5, 0, 0.5, 1.0, 1.4],
                                 cd: [[0.012, 0.008, 0.009, 0.013, 0.022], [0.009, 0.006, 0.007, 0.010, 0.017]]}
                """, "polar.wing.yaml");
        WingAnalysis a = WingAnalysis.of(wing);
        // the spar on the quarter-chord line, unswept on this trapezoid, so the chord axis is x
        WingStructure massless = new WingStructure(0.25, 0.40, Optional.empty(), Optional.empty(), List.of());
        LoadsAnalysis la = LoadsAnalysis.of(a, massless, a.fileDeflections());
        SpanwiseLoads l = la.loads(new LoadCase("dive", 900 * G, 1.0, 85, 0, "given"));
        assertTrue(l.chordCoefficient() > 0, "aft at VD: CC " + l.chordCoefficient());
        double area = wing.reference().area();
        assertEquals(l.chordCoefficient() * l.dynamicPressure() * area / 2, l.chordShear()[0],
                1e-6 * Math.abs(l.chordShear()[0]));
    }

    /** Nothing is outboard of the tip: shear, bending and torsion are zero there (to round-off). */
    @Test
    void loadsVanishAtTheTip() {
        Wing wing = WingFileReader.parse(TRAINER, "trainer.wing.yaml");
        WingAnalysis a = WingAnalysis.of(wing);
        WingStructure st = new WingStructure(0.35, 0.40, Optional.of(96.0), Optional.empty(),
                List.of(new PointMass("tip light", 1.5, 0.3, 4.9)));
        SpanwiseLoads l = LoadsAnalysis.of(a, st, a.fileDeflections())
                .loads(new LoadCase("n", 1050 * G, 3.8, 55, 0, "given"));
        int tip = l.stations() - 1;
        assertEquals(0, l.shear()[tip], 1e-12 * Math.abs(l.rootShear()));
        assertEquals(0, l.bending()[tip], 1e-12 * Math.abs(l.rootBending()));
        assertEquals(0, l.torsion()[tip], 1e-12 * Math.abs(l.rootBending()));
    }

    /**
     * Bending is the integral of shear along the spar, dM/ds = -S. On a straight, unswept wing with dihedral
     * whose strip loads act at the strip midspans (the panel forces at the bound-leg midpoints, and a mass
     * spread by chord on a constant chord), the trapezoidal integral of the stepwise shear is exact: 1e-9
     * of the root bending at every station. A point mass, lumped where it is rather than at its strip's
     * midspan, may change that by at most n g m times half its strip's width, the bound checked then.
     */
    @Test
    void bendingIsTheIntegralOfShear() {
        Wing wing = WingFileReader.parse("name: r\nunits: m\nsurfaces:\n  - name: wing\n    trapezoid: {span: 9.0, "
                + "root-chord: 1.25, dihedral: 4}\n    lattice: {strips: 24, rows: 6}\n", "r.wing.yaml");
        WingAnalysis a = WingAnalysis.of(wing);
        double cosDihedral = Math.cos(Math.toRadians(4));
        double n = 3.8;
        LoadCase c = new LoadCase("n", 700 * G, n, 50, 0, "given");
        WingStructure spread = new WingStructure(0.35, 0.40, Optional.of(70.0), Optional.empty(), List.of());
        SpanwiseLoads l = LoadsAnalysis.of(a, spread, a.fileDeflections()).loads(c);
        double[] integral = integrate(l, cosDihedral);
        for (int k = 0; k < l.stations(); k++) {
            assertEquals(integral[k], l.bending()[k], 1e-9 * l.rootBending(), "station " + k);
        }
        double mp = 25;
        double yp = 1.7;
        WingStructure withPoint = new WingStructure(0.35, 0.40, Optional.of(70.0), Optional.empty(),
                List.of(new PointMass("tank", mp, 0.5, yp)));
        SpanwiseLoads lp = LoadsAnalysis.of(a, withPoint, a.fileDeflections()).loads(c);
        double[] ip = integrate(lp, cosDihedral);
        double width = 0;
        for (int k = 0; k + 1 < lp.stations(); k++) {
            if (lp.y()[k] < yp && yp <= lp.y()[k + 1]) {
                width = (lp.y()[k + 1] - lp.y()[k]) / cosDihedral;
            }
        }
        double bound = n * G * mp * width / 2 + 1e-9 * lp.rootBending();
        for (int k = 0; k < lp.stations(); k++) {
            assertEquals(ip[k], lp.bending()[k], bound, "station " + k);
        }
    }

    /** The trapezoidal integral of shear from each station to the tip, along the spar (ds = dy / cos dihedral). */
    private static double[] integrate(SpanwiseLoads l, double cosDihedral) {
        int m = l.stations();
        double[] out = new double[m];
        for (int k = m - 2; k >= 0; k--) {
            double ds = (l.y()[k + 1] - l.y()[k]) / cosDihedral;
            // the shear is constant within a strip (its loads are lumped); just inboard of edge k+1 it is
            // the value at k, so the strip's integral is S_k ds minus the strip's own load times half ds,
            // which the trapezoid of the two edge values gives when the load acts at midspan
            out[k] = out[k + 1] + 0.5 * (l.shear()[k] + l.shear()[k + 1]) * ds;
        }
        return out;
    }
}
