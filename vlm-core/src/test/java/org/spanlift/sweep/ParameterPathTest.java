package org.spanlift.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;
import org.spanlift.io.WingSchema;

class ParameterPathTest {

    private static final YamlValue STATIONS = YamlParser.parse(SweepFixtures.WING, "w.wing.yaml");
    private static final YamlValue TRAPEZOID = YamlParser.parse(SweepFixtures.TRAPEZOID, "t.wing.yaml");

    private static Wing apply(YamlValue tree, String path, String value) {
        return WingFileReader.fromTree(ParameterPath.parse(path, WingSchema.ROOT).apply(tree, value), "x.wing.yaml");
    }

    @Test
    void setsValuesByNameAndIndex() {
        Wing w = apply(STATIONS, "surfaces.wing.stations[2].twist", "-4");
        assertEquals(Math.toRadians(-4), w.main().planform().twist(5.0), 1e-12);
        w = apply(STATIONS, "surfaces.wing.controls.flap.chord-fraction", "0.3");
        assertEquals(0.3, w.control("flap").orElseThrow().chordFraction(), 0);
        w = apply(STATIONS, "sections.outer.cl-max", "1.1");
        assertTrue(w.sections().get("outer").clMax().isPresent());
        w = apply(TRAPEZOID, "surfaces.wing.trapezoid.taper", "0.8");
        assertEquals(0.8 * 1.6, w.main().planform().chord(5.0), 1e-12);
        w = apply(STATIONS, "surfaces[0].stations[0].chord", "1.7");
        assertEquals(1.7, w.main().planform().chord(0.0), 1e-12);
    }

    @Test
    void createsKeysTheBaseLeavesToTheirDefault() {
        Wing w = apply(TRAPEZOID, "surfaces.wing.lattice.strips", "30");
        assertEquals(30, w.main().lattice().strips());
        w = apply(TRAPEZOID, "surfaces.wing.trapezoid.sweep", "5");
        assertTrue(w.main().planform().stationYs().size() >= 2);
    }

    @Test
    void refusesPathsTheSchemaDoesNotKnow() {
        String m = assertThrows(ParameterPath.PathException.class,
                () -> ParameterPath.parse("surfaces.wing.trapezoid.tapper", WingSchema.ROOT)).getMessage();
        assertTrue(m.contains("unknown key 'tapper'") && m.contains("taper"), m);
        m = assertThrows(ParameterPath.PathException.class, () -> ParameterPath.parse("surfaces.wing.lattice",
                WingSchema.ROOT)).getMessage();
        assertTrue(m.contains("a mapping") && m.contains("strips"), m);
        m = assertThrows(ParameterPath.PathException.class, () -> ParameterPath.parse("surfaces.wing.stations.twist",
                WingSchema.ROOT))
                .getMessage();
        assertTrue(m.contains("index in brackets"), m);
        assertThrows(ParameterPath.PathException.class, () -> ParameterPath.parse("surfaces.wing.controls.flap.name",
                WingSchema.ROOT));
        assertThrows(ParameterPath.PathException.class, () -> ParameterPath.parse("units.x", WingSchema.ROOT));
    }

    @Test
    void refusesWhatTheBaseFileLacks() {
        String m = assertThrows(ParameterPath.PathException.class,
                () -> ParameterPath.parse("surfaces.wing.stations[3].twist", WingSchema.ROOT).apply(STATIONS, "1"))
                .getMessage();
        assertTrue(m.contains("has 3 elements"), m);
        m = assertThrows(ParameterPath.PathException.class,
                () -> ParameterPath.parse("surfaces.tail.trapezoid.taper", WingSchema.ROOT).apply(TRAPEZOID, "1"))
                .getMessage();
        assertTrue(m.contains("no element named 'tail'") && m.contains("wing"), m);
        m = assertThrows(ParameterPath.PathException.class,
                () -> ParameterPath.parse("surfaces.wing.trapezoid.taper", WingSchema.ROOT).apply(STATIONS, "1"))
                .getMessage();
        assertTrue(m.contains("has stations, not trapezoid"), m);
        m = assertThrows(ParameterPath.PathException.class,
                () -> ParameterPath.parse("sections.tip.cl-max", WingSchema.ROOT).apply(STATIONS, "1")).getMessage();
        assertTrue(m.contains("no 'tip'"), m);
    }

    @Test
    void leavesTheBaseTreeUnchanged() {
        YamlValue changed = ParameterPath.parse("surfaces.wing.trapezoid.taper", WingSchema.ROOT)
                .apply(TRAPEZOID, "0.9");
        assertEquals(0.5 * 1.6, WingFileReader.fromTree(TRAPEZOID, "t").main().planform().chord(5.0), 1e-12);
        assertEquals(0.9 * 1.6, WingFileReader.fromTree(changed, "t").main().planform().chord(5.0), 1e-12);
    }
}
