package org.spanlift.stall;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Station;
import org.spanlift.geometry.StationPlanform;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.input.RefusedException;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;
import org.spanlift.section.CamberLines;
import org.spanlift.section.Table;

/**
 * A fuselage side outboard of every strip's centre leaves no station that can stall: the stall limits are
 * refused with the reason, not left empty for the stall analysis to index into.
 */
class FuselageSideTest {

    /** Stations at y 0 and 4.9 m, one section with cl_max 1.3 (demo values). */
    private static Wing wing(double fuselageHalfWidth) {
        List<Station> stations = List.of(new Station(0, 1.4, 0, 0, 0, "s"), new Station(4.9, 0.8, 0, 0, 0, "s"));
        Surface s = new Surface("wing", true, new StationPlanform(stations), List.of(), LatticeSpec.DEFAULT,
                fuselageHalfWidth);
        Section section = new Section("s", CamberLines.parse("NACA 2412"), 0, Section.THIN_AIRFOIL_SLOPE,
                Optional.of(Table.constant(1.3)), Optional.empty(), Optional.empty(), OptionalDouble.empty());
        return new Wing("fuselage side", LengthUnit.M, Wing.defaultReference(s), List.of(s), Map.of("s", section));
    }

    @Test
    void noStripOutboardOfTheFuselageSideIsRefusedWithTheReason() {
        Wing w = wing(4.8999);
        RefusedException e = assertThrows(RefusedException.class,
                () -> StripLimits.of(w, LatticeBuilder.build(w), new double[0], OptionalDouble.empty()));
        assertTrue(e.getMessage().startsWith("no strip of the wing lies outboard of the fuselage side (fuselage "
                + "half-width 4.9 m), so no station can stall"), e.getMessage());
    }

    @Test
    void aFuselageSideInsideTheOutermostStripLeavesThatStrip() {
        Wing w = wing(4.89);
        Lattice lattice = LatticeBuilder.build(w);
        StripLimits limits = StripLimits.of(w, lattice, new double[0], OptionalDouble.empty());
        assertEquals(2, limits.strips().size(), "the outermost strip of each half, its centre near |y| 4.897 m");
        for (int id : limits.strips()) {
            assertTrue(Math.abs(lattice.strips().get(id).y()) > 4.89);
        }
    }
}
