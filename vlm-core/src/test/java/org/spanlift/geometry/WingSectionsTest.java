package org.spanlift.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.spanlift.section.CamberLines;

/** A wing refuses, when built, a surface that names a section its section map lacks. */
class WingSectionsTest {

    private static final Map<String, Section> SECTIONS = Map.of(
            "root", Section.of("root", CamberLines.parse("NACA 2412")),
            "flat", Section.of("flat", CamberLines.parse("flat")));

    private static Wing wing(Surface surface) {
        return new Wing("test", LengthUnit.M, Wing.defaultReference(surface), List.of(surface), SECTIONS);
    }

    private static Surface stations(String tipSection) {
        StationPlanform p = new StationPlanform(List.of(new Station(0, 1.4, 0, 0, 0, "root"),
                new Station(2.5, 1.2, 0.05, 0, 0, "root"), new Station(4.5, 0.8, 0.15, 0, 0, tipSection)));
        return new Surface("wing", true, p, List.of(), LatticeSpec.DEFAULT);
    }

    @Test
    void aStationNamingAMissingSectionIsRefusedNamingTheStationAndTheSection() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> wing(stations("tip")));
        String m = e.getMessage();
        assertTrue(m.contains("surface 'wing'") && m.contains("station index 2") && m.contains("y = 4.5 m"), m);
        assertTrue(m.contains("section 'tip'"), m);
        assertTrue(m.contains("flat, root"), "lists the sections the wing has: " + m);
    }

    @Test
    void anEllipticSurfaceNamingAMissingSectionIsRefused() {
        Surface s = new Surface("tail", true, new EllipticPlanform(1.5, 0.6, 4, 0.3, 0, 0, 0, "NACA 0009"), List.of(),
                LatticeSpec.DEFAULT);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> wing(s));
        assertTrue(e.getMessage().contains("surface 'tail'") && e.getMessage().contains("section 'NACA 0009'"),
                e.getMessage());
    }

    @Test
    void aWingWhoseSectionsAreAllKnownIsBuiltAndKeepsThem() {
        Wing w = wing(stations("flat"));
        assertEquals(SECTIONS, w.sections());
        assertEquals(List.of("root", "flat"), w.main().planform().sectionNames());
    }

    @Test
    void aStationWithoutASectionNameIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> new Station(0, 1, 0, 0, 0, null));
    }
}
