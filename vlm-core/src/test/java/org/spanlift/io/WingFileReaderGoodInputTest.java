package org.spanlift.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Planform;
import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;

/** What the reader makes of well-formed files: units, angles, planform geometry and defaults. */
class WingFileReaderGoodInputTest {

    private static final double TIGHT = 1e-12;

    private static Wing read(String text) {
        return WingFileReader.parse(text, "test.wing.yaml");
    }

    @Test
    void feetConvertToMetresByExactlyPointThreeZeroFourEight() {
        Wing wing = read("""
                units: ft
                reference: {area: 100, span: 30, chord: 4}
                surfaces:
                  - name: wing
                    stations:
                      - {y: 0, chord: 5, nose-z: 1}
                      - {y: 15, chord: 3, nose-x: 2}
                """);
        assertEquals(0.3048, LengthUnit.FT.metres(), 0.0);
        Planform p = wing.main().planform();
        assertEquals(15 * 0.3048, p.yEnd(), 0.0);
        assertEquals(5 * 0.3048, p.chord(0), 0.0);
        assertEquals(2 * 0.3048, p.noseX(p.yEnd()), 0.0);
        assertEquals(1 * 0.3048, p.noseZ(0), 0.0);
        Reference r = wing.reference();
        assertEquals(100 * 0.3048 * 0.3048, r.area(), 0.0);
        assertEquals(30 * 0.3048, r.span(), 0.0);
        assertEquals(4 * 0.3048, r.chord(), 0.0);
        assertEquals(LengthUnit.FT, wing.displayUnit());
    }

    @Test
    void fuselageHalfWidthIsALengthInTheFileUnitAndZeroWhenLeftOut() {
        String surface = """
                units: ft
                surfaces:
                  - name: wing
                    %s
                    trapezoid: {span: 30, root-chord: 5}
                """;
        assertEquals(2 * 0.3048, read(surface.formatted("fuselage-half-width: 2")).main().fuselageHalfWidth(), TIGHT);
        assertEquals(0, read(surface.formatted("mirror: true")).main().fuselageHalfWidth(), 0.0);
    }

    @Test
    void anglesInDegreesBecomeRadians() {
        Wing wing = read("""
                units: m
                surfaces:
                  - name: wing
                    stations:
                      - {y: 0, chord: 1.4, twist: 2.5}
                      - {y: 4.5, chord: 0.8, twist: -3}
                    controls:
                      - {name: flap, kind: flap, from: 0.5, to: 2.0, chord-fraction: 0.25, deflection: 10}
                """);
        Planform p = wing.main().planform();
        assertEquals(Math.toRadians(2.5), p.twist(0), TIGHT);
        assertEquals(Math.toRadians(-3), p.twist(4.5), TIGHT);
        ControlSurface flap = wing.control("flap").orElseThrow();
        assertEquals(Math.toRadians(10), flap.deflection(), TIGHT);
        assertEquals(0.75, flap.hingeFraction(), TIGHT);
    }

    @Test
    void trapezoidTipFollowsQuarterChordSweepDihedralAndWashout() {
        Wing wing = read("""
                units: m
                surfaces:
                  - name: wing
                    trapezoid: {span: 10, root-chord: 2, taper: 0.5, sweep: 10, dihedral: 5, washout: 2,
                                root-twist: 1, root-nose: [0.3, 0.1]}
                """);
        Planform p = wing.main().planform();
        double s = 5;
        double cr = 2;
        double ct = 1;
        assertEquals(s, p.yEnd(), TIGHT);
        assertEquals(ct, p.chord(s), TIGHT);
        // The quarter-chord line runs back by s tan(sweep) from root to tip.
        double rootQuarter = 0.3 + 0.25 * cr;
        assertEquals(rootQuarter + s * Math.tan(Math.toRadians(10)), p.noseX(s) + 0.25 * ct, TIGHT);
        assertEquals(0.1 + s * Math.tan(Math.toRadians(5)), p.noseZ(s), TIGHT);
        assertEquals(Math.toRadians(1), p.twist(0), TIGHT);
        assertEquals(Math.toRadians(1 - 2), p.twist(s), TIGHT);
    }

    @Test
    void ellipticChordFollowsTheEllipseWithAStraightQuarterChordLine() {
        Wing wing = read("""
                units: m
                surfaces:
                  - name: wing
                    elliptic: {span: 12, root-chord: 1.2, root-nose: [0.4, 0]}
                """);
        Surface main = wing.main();
        Planform p = main.planform();
        assertEquals(1.2 * Math.sqrt(0.75), p.chord(3), TIGHT);
        assertEquals(0, p.chord(6), TIGHT);
        assertEquals(0.4 + 0.3, p.noseX(3) + 0.25 * p.chord(3), TIGHT);
        assertEquals(Math.PI * 1.2 * 12 / 4, main.area(), TIGHT);
        // Mean aerodynamic chord of an ellipse: 8 c0 / (3 pi) (common practice, from integral c^2 dy / S).
        assertEquals(8 * 1.2 / (3 * Math.PI), wing.reference().chord(), TIGHT);
    }

    @Test
    void surfaceWithoutLatticeGetsThirtyTwoStripsByEightRowsCosineBothWays() {
        Wing wing = read("""
                units: m
                surfaces:
                  - name: wing
                    trapezoid: {span: 9, root-chord: 1.25}
                """);
        assertEquals(new LatticeSpec(32, 8, Spacing.COSINE, Spacing.COSINE), wing.main().lattice());
    }

    @Test
    void referenceDefaultsToAreaSpanAndClosedFormMacOfTheTrapezoid() {
        Wing wing = read("""
                units: m
                surfaces:
                  - name: wing
                    trapezoid: {span: 10, root-chord: 2, taper: 0.4, sweep: 0}
                  - name: tail
                    trapezoid: {span: 3, root-chord: 0.7, root-nose: [4.5, 0.2]}
                """);
        double cr = 2;
        double t = 0.4;
        double b = 10;
        Reference r = wing.reference();
        assertEquals(b * cr * (1 + t) / 2, r.area(), TIGHT);
        assertEquals(b, r.span(), TIGHT);
        // Mean aerodynamic chord of a straight-tapered wing, MAC = (2/3) c_r (1 + t + t^2) / (1 + t), and its
        // spanwise place y = (b/6)(1 + 2t)/(1 + t): common practice.
        double mac = 2.0 / 3.0 * cr * (1 + t + t * t) / (1 + t);
        assertEquals(mac, r.chord(), TIGHT);
        double yMac = b / 6 * (1 + 2 * t) / (1 + t);
        // Unswept quarter-chord line: the leading edge moves back by (c_r - c) / 4.
        double xLeMac = 0.25 * (cr - mac);
        assertEquals(xLeMac + 0.25 * mac, r.momentPoint().x(), TIGHT);
        assertEquals(0, r.momentPoint().y(), TIGHT);
        assertEquals(0.25 * cr, r.momentPoint().x(), TIGHT);
        assertEquals(cr * (1 - (1 - t) * yMac / (b / 2)), mac, TIGHT);
    }

    @Test
    void sectionNamesMayHoldDotsAndAliasesMayRepeatASection() {
        Wing wing = read("""
                units: m
                surfaces:
                  - name: wing
                    stations:
                      - {y: 0, chord: 1.4, section: root.v2}
                      - {y: 4.5, chord: 0.8, section: tip}
                sections:
                  root.v2: &cambered {camber: NACA 2412}
                  tip: *cambered
                """);
        assertEquals("root.v2", wing.main().planform().section(0).inner());
        assertEquals("NACA 2412", wing.sections().get("tip").camber().designation());
        assertEquals("NACA 2412", wing.sections().get("root.v2").camber().designation());
    }
}
