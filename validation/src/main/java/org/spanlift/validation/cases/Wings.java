package org.spanlift.validation.cases;

import java.util.List;
import java.util.Map;

import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.EllipticPlanform;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Planform;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.Wing;
import org.spanlift.section.CamberLines;

/**
 * Wings of the reference cases, built in code: mirrored, untwisted, without dihedral, of span 2 (semi-span
 * 1 m), one section named {@code s}. Every length follows from the aspect ratio and taper.
 */
public final class Wings {

    /** The semi-span of every case wing, m. */
    public static final double SEMI_SPAN = 1.0;

    private Wings() {
    }

    /**
     * A straight-tapered wing of aspect ratio {@code aspectRatio}, taper (tip over root chord)
     * {@code taper} and quarter-chord sweep {@code sweepQuarter} (rad), with the given camber line and
     * controls.
     */
    public static Wing trapezoid(double aspectRatio, double taper, double sweepQuarter, String camber,
            List<ControlSurface> controls, LatticeSpec lattice) {
        double s = SEMI_SPAN;
        double area = 4 * s * s / aspectRatio;                 // both halves
        double root = area / (s * (1 + taper));                // S = b cr (1 + taper) / 2, b = 2 s
        Planform p = new Trapezoid(2 * s, root, taper, sweepQuarter, 0, 0, 0, "s", 0, 0).planform();
        return wing("trapezoid A=" + aspectRatio + " taper=" + taper, p, camber, controls, lattice);
    }

    /** A flat straight-tapered wing without controls. */
    public static Wing trapezoid(double aspectRatio, double taper, double sweepQuarter, LatticeSpec lattice) {
        return trapezoid(aspectRatio, taper, sweepQuarter, "flat", List.of(), lattice);
    }

    /** A flat elliptic wing (straight quarter-chord line) of aspect ratio {@code aspectRatio}. */
    public static Wing elliptic(double aspectRatio, LatticeSpec lattice) {
        double s = SEMI_SPAN;
        double root = 8 * s / (Math.PI * aspectRatio);          // S = pi b c0 / 4 = b^2 / A
        Planform p = new EllipticPlanform(s, root, 0, 0, 0, 0, 0, "s");
        return wing("elliptic A=" + aspectRatio, p, "flat", List.of(), lattice);
    }

    private static Wing wing(String name, Planform planform, String camber, List<ControlSurface> controls,
            LatticeSpec lattice) {
        Surface surface = new Surface("wing", true, planform, controls, lattice);
        return new Wing(name, LengthUnit.M, Wing.defaultReference(surface), List.of(surface),
                Map.of("s", Section.of("s", CamberLines.parse(camber))));
    }
}
