package org.spanlift.geometry;

import java.util.List;

/**
 * One lifting surface. A mirrored surface is described on its right half (y from the root up) and has a
 * mirror image on the left; otherwise the description is the whole surface.
 */
public record Surface(String name, boolean mirrored, Planform planform, List<ControlSurface> controls,
        LatticeSpec lattice) {

    public Surface {
        controls = List.copyOf(controls);
    }

    /** Projected area of the whole surface, both halves when mirrored, m^2. */
    public double area() {
        return (mirrored ? 2 : 1) * planform.area();
    }

    /** Tip-to-tip projected span, m. */
    public double span() {
        return mirrored ? 2 * planform.yEnd() : planform.yEnd() - planform.yStart();
    }

    /** Mean aerodynamic chord, (1/S) integral c^2 dy, m. */
    public double meanAerodynamicChord() {
        return planform.chordSquaredIntegral() / planform.area();
    }

    /**
     * The quarter-chord point of the mean aerodynamic chord on the plane of symmetry (for a mirrored
     * surface y = 0), m.
     */
    public Vec3 quarterMacPoint() {
        double s = planform.area();
        double xLe = planform.chordNoseXIntegral() / s;
        double z = planform.chordNoseZIntegral() / s;
        double y = mirrored ? 0 : planform.chordYIntegral() / s;
        return new Vec3(xLe + 0.25 * meanAerodynamicChord(), y, z);
    }

    public Surface withControls(List<ControlSurface> newControls) {
        return new Surface(name, mirrored, planform, newControls, lattice);
    }

    public Surface withLattice(LatticeSpec spec) {
        return new Surface(name, mirrored, planform, controls, spec);
    }
}
