package org.spanlift.geometry;

import java.util.List;

/**
 * One lifting surface. A mirrored surface is described on its right half (y from the root up) and has a
 * mirror image on the left; otherwise the description is the whole surface.
 *
 * @param name              the surface's name
 * @param mirrored          true when described on its right half with a mirror image on the left
 * @param planform          its planform
 * @param controls          its controls (copied)
 * @param lattice           its lattice density
 * @param fuselageHalfWidth y of the wing-fuselage junction of a mirrored surface, m (0: none). The lattice
 *                          carries the surface through the fuselage; the stations inboard of the junction
 *                          are covered by it and are not candidates for stall onset
 * @param role              what the surface does ({@link Wing} makes its first surface the wing)
 */
public record Surface(String name, boolean mirrored, Planform planform, List<ControlSurface> controls,
        LatticeSpec lattice, double fuselageHalfWidth, SurfaceRole role) {

    /**
     * Copies the controls and checks them: elevators only on a tail or canard; the fuselage half-width from 0
     * to below the tip, and positive only on a mirrored surface.
     */
    public Surface {
        controls = List.copyOf(controls);
        for (ControlSurface c : controls) {
            if (c.kind() == ControlKind.ELEVATOR && !role.pitchControlling()) {
                throw new IllegalArgumentException("the elevator '" + c.name() + "' needs a surface whose role is "
                        + "tail or canard; surface '" + name + "' is a " + role.word());
            }
        }
        if (!(fuselageHalfWidth >= 0) || !(fuselageHalfWidth < planform.yEnd())) {
            throw new IllegalArgumentException("the fuselage half-width must be from 0 to less than the semi-span, got "
                    + fuselageHalfWidth + " m");
        }
        if (fuselageHalfWidth > 0 && !mirrored) {
            throw new IllegalArgumentException("a fuselage half-width needs a mirrored surface");
        }
    }

    /** A surface with no special role (the wing, when it is the first). */
    public Surface(String name, boolean mirrored, Planform planform, List<ControlSurface> controls,
            LatticeSpec lattice, double fuselageHalfWidth) {
        this(name, mirrored, planform, controls, lattice, fuselageHalfWidth, SurfaceRole.OTHER);
    }

    /** A surface without a fuselage and with no special role. */
    public Surface(String name, boolean mirrored, Planform planform, List<ControlSurface> controls,
            LatticeSpec lattice) {
        this(name, mirrored, planform, controls, lattice, 0);
    }

    /** The same surface in another role. */
    public Surface withRole(SurfaceRole newRole) {
        return new Surface(name, mirrored, planform, controls, lattice, fuselageHalfWidth, newRole);
    }

    /** True when the station at |y| lies inside the fuselage (inboard of the junction). */
    public boolean insideFuselage(double y) {
        return Math.abs(y) < fuselageHalfWidth;
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

    /** The same surface with its washout larger by {@code change}, rad ({@link Planform#withWashoutChange}). */
    public Surface withWashoutChange(double change) {
        return new Surface(name, mirrored, planform.withWashoutChange(change), controls, lattice, fuselageHalfWidth,
                role);
    }

    /**
     * The same surface with a twist change piecewise linear through knots (zero at the root; see
     * {@link RetwistedPlanform}): same lattice, other incidences. A planform already changed so is changed
     * again from its base.
     */
    public Surface withTwistChange(double[] knots, double[] change) {
        Planform base = planform instanceof RetwistedPlanform r ? r.base() : planform;
        return new Surface(name, mirrored, new RetwistedPlanform(base, knots, change), controls, lattice,
                fuselageHalfWidth);
    }

    /** The same surface with another lattice. */
    public Surface withLattice(LatticeSpec spec) {
        return new Surface(name, mirrored, planform, controls, spec, fuselageHalfWidth, role);
    }
}
