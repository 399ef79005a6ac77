package org.spanlift.validation.wings;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.spanlift.geometry.EllipticPlanform;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.Wing;
import org.spanlift.section.CamberLines;

/**
 * Wings built in code for the checks: the model records of the engine put together with their sections
 * and reference values, so a check states its geometry in a line.
 */
public final class Wings {

    /** The name of the flat-plate mean line. */
    public static final String FLAT = "flat";

    private Wings() {
    }

    /** A wing of the given surfaces, referred to the first one ({@link Wing#defaultReference}). */
    public static Wing of(String name, List<Surface> surfaces) {
        return of(name, surfaces, Wing.defaultReference(surfaces.get(0)));
    }

    /** A wing of the given surfaces and reference values; every section named is parsed as a mean line. */
    public static Wing of(String name, List<Surface> surfaces, Reference reference) {
        Map<String, Section> sections = new LinkedHashMap<>();
        for (Surface s : surfaces) {
            for (String section : s.planform().sectionNames()) {
                sections.computeIfAbsent(section, n -> Section.of(n, CamberLines.parse(n)));
            }
        }
        return new Wing(name, LengthUnit.M, reference, surfaces, sections);
    }

    /** A wing of one surface, referred to it. */
    public static Wing of(Surface surface) {
        return of(surface.name(), List.of(surface));
    }

    /**
     * The untwisted flat elliptic wing of aspect ratio A with mean chord 1 m (span A metres, root chord
     * 4/pi m), straight unswept quarter-chord line, no dihedral.
     */
    public static Wing elliptic(double aspectRatio, LatticeSpec lattice) {
        double semiSpan = 0.5 * aspectRatio;
        double rootChord = 4 / Math.PI;
        EllipticPlanform shape = new EllipticPlanform(semiSpan, rootChord, 0, 0, 0, 0, 0, FLAT);
        return of(new Surface("elliptic", true, shape, List.of(), lattice));
    }

    /** The untwisted rectangular wing of aspect ratio A, chord 1 m, span A metres, with the given mean line. */
    public static Wing rectangular(double aspectRatio, String section, LatticeSpec lattice) {
        return of(Trapezoid.rectangle(aspectRatio, 1, section).surface("rectangle", List.of(), lattice));
    }
}
