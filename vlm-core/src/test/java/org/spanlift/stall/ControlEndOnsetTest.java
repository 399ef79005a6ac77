package org.spanlift.stall;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Station;
import org.spanlift.geometry.StationPlanform;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.section.CamberLines;
import org.spanlift.section.Table;
import org.spanlift.solve.WingAnalysis;

/**
 * A part-span flap whose inner end lies outboard of the root: in linear theory the deflected flap's lift
 * peaks at its ends in a band narrower than the chord, and the unflapped station beside the inner end is the
 * first to reach cl_max. That onset is flagged, and it is lattice-sensitive: each halving of the strip width
 * lowers it (the behaviour the stall command's note describes), while the first station on the flap itself
 * settles.
 */
class ControlEndOnsetTest {

    private static final double FLAP_FROM = 0.5;
    private static final double FLAP_TO = 2.6;

    /**
     * A constant-chord centre panel and a tapered, washed-out outer panel (semi-span 4.9 m); one section with
     * cl_max 1.3 and a flap cl_max increment of 0.72 at 30 degrees (demo values).
     */
    private static Wing wing(double flapDeg, int strips) {
        return wing(flapDeg, strips, 0);
    }

    private static Wing wing(double flapDeg, int strips, double fuselageHalfWidth) {
        List<Station> stations = List.of(new Station(0, 1.4, 0, 0, 0, "s"), new Station(2.2, 1.4, 0, 0, 0, "s"),
                new Station(4.9, 0.8, 0.15, 0, Math.toRadians(-3), "s"));
        ControlSurface flap = new ControlSurface("flap", ControlKind.FLAP, FLAP_FROM, FLAP_TO, 0.25,
                Math.toRadians(flapDeg));
        Surface s = new Surface("wing", true, new StationPlanform(stations), List.of(flap),
                new LatticeSpec(strips, 4, Spacing.COSINE, Spacing.COSINE), fuselageHalfWidth);
        Table increment = new Table(new double[] {0, 10, 20, 30, 40}, new double[] {0, 0.30, 0.55, 0.72, 0.80});
        Section section = new Section("s", CamberLines.parse("NACA 2412"), 0, Section.THIN_AIRFOIL_SLOPE,
                Optional.of(Table.constant(1.3)), Optional.of(increment), Optional.empty(), OptionalDouble.empty());
        return new Wing("flap end", LengthUnit.M, Wing.defaultReference(s), List.of(s), Map.of("s", section));
    }

    private static StallEstimate onset(Wing w) {
        WingAnalysis a = WingAnalysis.of(w);
        StripLimits limits = StripLimits.of(w, a.lattice(), a.fileDeflections(), OptionalDouble.empty());
        return StallAnalysis.estimate(a, a.fileDeflections(), limits, 0);
    }

    @Test
    void anOnsetBesideADeflectedFlapEndIsFlaggedWithThatEnd() {
        StallEstimate e = onset(wing(30, 32));
        StallEstimate.ControlEnd end = e.besideControlEnd().orElseThrow();
        assertEquals("flap", end.control());
        assertEquals(FLAP_FROM, end.y(), 1e-12);
        assertTrue(e.y() < FLAP_FROM, "the unflapped station inboard of the flap end: y = " + e.y());
    }

    @Test
    void theFirstStationOnTheFlapItselfSettlesAsTheStripsAreRefined() {
        double[] lift = new double[3];
        int[] strips = {32, 64, 128};
        for (int i = 0; i < strips.length; i++) {
            StallEstimate.Reach first = onset(wing(30, strips[i])).besideControlEnd().orElseThrow().firstOnControl()
                    .orElseThrow();
            assertTrue(first.y() > FLAP_FROM && first.y() < FLAP_TO, "on the flap: y = " + first.y());
            lift[i] = first.lift();
        }
        // The onset beside the end moves by about 4% per halving of the strips; here the change stays far below.
        assertEquals(lift[1], lift[2], 0.002 * lift[2], "64 against 128 strips");
        assertEquals(lift[0], lift[2], 0.005 * lift[2], "32 against 128 strips");
    }

    /** Inside the fuselage no station is a stall candidate, and a flap end at its side is no free end. */
    @Test
    void withTheFlapStartingAtTheFuselageSideNeitherTheStubNorThatEndCounts() {
        for (int strips : new int[] {32, 128}) {
            StallEstimate e = onset(wing(30, strips, FLAP_FROM));
            assertTrue(e.strips().stream().allMatch(st -> Math.abs(st.y()) >= FLAP_FROM),
                    "no strip inside the fuselage");
            assertTrue(e.y() >= FLAP_FROM, strips + " strips: onset at y = " + e.y());
            e.besideControlEnd().ifPresent(end -> assertEquals(FLAP_TO, end.y(), 1e-12, "only the outer end is free"));
        }
    }

    /**
     * Fact of the trade (common practice): flaps lower the stall speed, so the flapped stall-onset CL is the
     * higher, also on a fine lattice, once the stub inside the fuselage is not taken for a wing section.
     */
    @Test
    void withTheFuselageSideExcludedFlapsRaiseTheStallOnsetCl() {
        for (int strips : new int[] {32, 128}) {
            double clean = onset(wing(0, strips, FLAP_FROM)).lift();
            double flapped = onset(wing(30, strips, FLAP_FROM)).lift();
            assertTrue(flapped > clean + 0.1, strips + " strips: " + clean + " -> " + flapped);
        }
    }

    @Test
    void anUndeflectedFlapFlagsNothing() {
        assertTrue(onset(wing(0, 32)).besideControlEnd().isEmpty());
    }

    @Test
    void theOnsetBesideAFlapEndFallsAsTheStripsAreRefined() {
        double previous = Double.POSITIVE_INFINITY;
        for (int strips : new int[] {16, 32, 64, 128}) {
            StallEstimate e = onset(wing(30, strips));
            assertTrue(e.besideControlEnd().isPresent(), strips + " strips: still beside the flap end");
            assertTrue(e.lift() < previous - 0.01, strips + " strips: CL " + e.lift() + " after " + previous);
            previous = e.lift();
        }
    }
}
