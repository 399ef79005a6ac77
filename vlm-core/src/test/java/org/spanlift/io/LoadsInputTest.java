package org.spanlift.io;

import org.spanlift.loads.Envelope;
import org.spanlift.loads.GustFormula;
import org.spanlift.structure.EnvelopeSpec;
import org.spanlift.structure.LoadCase;
import org.spanlift.structure.MassTable;
import org.spanlift.structure.WingStructure;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.spanlift.atmosphere.StandardAtmosphere;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.input.YamlParser;

/** The structure section, cases and envelope files: what they accept and the one-line errors they give. */
class LoadsInputTest {

    private static final String WING = "name: t\nunits: m\nsurfaces:\n  - name: wing\n"
            + "    trapezoid: {span: 10.0, root-chord: 1.5, taper: 0.6}\n";

    private static WingStructure structure(String section) {
        String text = WING + section;
        Wing wing = WingFileReader.parse(text, "t.wing.yaml");
        return StructureReader.fromTree(YamlParser.parse(text, "t.wing.yaml"), "t.wing.yaml", wing);
    }

    private static InputException badStructure(String section) {
        return assertThrows(InputException.class, () -> WingFileReader.parse(WING + section, "t.wing.yaml"));
    }

    @Test
    void readsMassesWithTheirUnitsAndDefaults() {
        WingStructure s = structure("structure:\n  mass: 210lb\n  point-masses:\n"
                + "    - {name: fuel, mass: 40kg, y: 1.2, x: 0.55}\n    - {mass: 500g, y: 5.0, chord-fraction: 0.5}\n");
        assertEquals(WingStructure.DEFAULT_SPAR, s.sparFraction());
        assertEquals(WingStructure.DEFAULT_MASS_CENTRE, s.massCentreFraction());
        assertEquals(210 * 0.45359237, s.wingMass().orElseThrow(), 1e-12);
        assertEquals(2, s.pointMasses().size());
        assertEquals(0.5, s.pointMasses().get(1).mass(), 1e-15);
        // unswept quarter-chord line: the tip chord 0.9 m has its leading edge at 0.25 (1.5 - 0.9)
        double tipNose = 0.25 * 1.5 - 0.25 * 0.9;
        assertEquals(tipNose + 0.45, s.pointMasses().get(1).x(), 1e-12);
    }

    @Test
    void readsAMassTableInTheFileUnits() {
        String text = "name: t\nunits: ft\nsurfaces:\n  - name: wing\n    trapezoid: {span: 30.0, root-chord: 5}\n"
                + "structure:\n  spar: 0.3\n  mass-table:\n    - {y: 0, mass-per-span: 1.2lb/in}\n"
                + "    - {y: 15, mass-per-span: 0.5lb/ft}\n";
        Wing wing = WingFileReader.parse(text, "t.wing.yaml");
        WingStructure s = StructureReader.fromTree(YamlParser.parse(text, "t.wing.yaml"), "t.wing.yaml", wing);
        MassTable t = s.table().orElseThrow();
        assertEquals(15 * 0.3048, t.y()[1], 1e-12);
        assertEquals(1.2 * 0.45359237 / 0.0254, t.perSpan()[0], 1e-9);
        assertEquals(0.5 * 0.45359237 / 0.3048, t.perSpan()[1], 1e-9);
    }

    @Test
    void aMassTableOutOfOrderIsRefusedAtItsLine() {
        InputException e = badStructure("structure:\n  mass-table:\n    - {y: 0, mass-per-span: 12kg/m}\n"
                + "    - {y: 3, mass-per-span: 8kg/m}\n    - {y: 2, mass-per-span: 6kg/m}\n");
        assertEquals(10, e.line());
        assertEquals("structure.mass-table[2].y", e.field());
        assertTrue(e.problem().contains("increasing y"), e.problem());
    }

    @Test
    void aPointMassOutsideTheSpanIsRefused() {
        InputException e = badStructure("structure:\n  point-masses:\n    - {name: tank, mass: 40kg, y: 5.5, x: "
                + "0.5}\n");
        assertEquals("structure.point-masses[0].y", e.field());
        assertTrue(e.problem().contains("on the half-wing"), e.problem());
        assertThrows(InputException.class, () -> WingFileReader.parse(WING
                + "structure:\n  point-masses:\n    - {mass: 40kg, y: 0, x: 0.5}\n", "t.wing.yaml"));
    }

    @Test
    void aNegativeMassIsRefused() {
        InputException e = badStructure("structure:\n  mass: -95kg\n");
        assertEquals("structure.mass", e.field());
        assertTrue(e.problem().contains("must not be negative"), e.problem());
        InputException p = badStructure("structure:\n  point-masses:\n    - {mass: -1kg, y: 2, x: 0.5}\n");
        assertEquals("structure.point-masses[0].mass", p.field());
    }

    @Test
    void aMassWithoutUnitOrWithBothFormsIsRefused() {
        assertTrue(badStructure("structure:\n  mass: 95\n").problem().contains("kg"));
        assertTrue(badStructure("structure:\n  mass: 95kg\n  mass-table:\n    - {y: 0, mass-per-span: 1kg/m}\n"
                + "    - {y: 5, mass-per-span: 1kg/m}\n").problem().contains("not both"));
        assertEquals("structure.spars", badStructure("structure:\n  spars: 0.3\n").field());
    }

    @Test
    void readsCasesWithTheirUnits() {
        List<LoadCase> cases = CasesReader.parse("cases:\n  - {name: a, weight: 1100kg, load-factor: 3.8, speed: "
                + "105kt}\n"
                + "  - {weight: 2400lb, load-factor: -1.5, speed: 60m/s, altitude: 5000ft}\n", "c.cases.yaml");
        assertEquals(2, cases.size());
        assertEquals(1100 * StandardAtmosphere.G0, cases.get(0).weight(), 1e-9);
        assertEquals(105 * 1852.0 / 3600, cases.get(0).equivalentSpeed(), 1e-12);
        assertEquals(2400 * 4.4482216152605, cases.get(1).weight(), 1e-9);
        assertEquals(-1.5, cases.get(1).loadFactor());
        assertEquals(5000 * 0.3048, cases.get(1).altitude(), 1e-9);
        assertEquals("case 2", cases.get(1).name());
    }

    @Test
    void aCaseWithoutWeightIsRefusedAtItsLine() {
        InputException e = assertThrows(InputException.class, () -> CasesReader.parse(
                "cases:\n  - {weight: 1100kg, load-factor: 3.8, speed: 105kt}\n  - {load-factor: 3.8, speed: 105kt}\n",
                "c.cases.yaml"));
        assertEquals(3, e.line());
        assertEquals("cases[1].weight", e.field());
        assertTrue(e.problem().startsWith("missing key; expected"), e.problem());
    }

    @Test
    void envelopeCornerPointsFollowTheGivenLimitsAndTheGustFormula() {
        EnvelopeSpec spec = EnvelopeReader.parse("weight: 1000kg\nload-factors: {positive: 3.8, negative: -1.52}\n"
                + "speeds: {va: 100kt, vc: 120kt, vd: 170kt}\ngusts: {vc: 50ft/s, vd: 25ft/s}\n", "e.envelope.yaml");
        List<Envelope.Point> p = Envelope.points(spec, 14, 1.4, 5.0);
        assertEquals(8, p.size(), "4 manoeuvre corners and 2 x 2 gust points");
        assertEquals(3.8, p.get(0).loadCase().loadFactor());
        assertEquals(100 * 1852.0 / 3600, p.get(0).loadCase().equivalentSpeed(), 1e-12);
        assertEquals(-1.52, p.get(2).loadCase().loadFactor());
        assertEquals(0.0, p.get(3).loadCase().loadFactor(), "negative line ends at 0 at VD by default");
        GustFormula.GustLoad g = GustFormula.of(1000 * StandardAtmosphere.G0 / 14, 1.4, 5.0, StandardAtmosphere.RHO0,
                15.24, 120 * 1852.0 / 3600);
        assertEquals(1 + g.increment(), p.get(4).loadCase().loadFactor(), 1e-12);
        assertEquals(1 - g.increment(), p.get(5).loadCase().loadFactor(), 1e-12);
    }

    @Test
    void anEnvelopeWithVdBelowVcIsRefused() {
        InputException e = assertThrows(InputException.class, () -> EnvelopeReader.parse("weight: 1000kg\n"
                + "load-factors: {positive: 3.8, negative: -1.52}\nspeeds: {va: 100kt, vc: 120kt, vd: 110kt}\n"
                + "gusts: {vc: 50ft/s, vd: 25ft/s}\n", "e.envelope.yaml"));
        assertEquals("speeds.vd", e.field());
    }
}
