package org.spanlift.geometry;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.TreeSet;

/**
 * A whole aircraft lifting system as described by one wing file: its surfaces (the first is the wing), the
 * sections they name, and the reference values. Immutable; SI units throughout. The length unit of the
 * file is kept for display only. Every section a surface names must be in {@code sections}: a wing naming
 * one that is not is refused with an {@link IllegalArgumentException} naming the station and the section.
 *
 * <p>The first surface is the wing: a first surface without a role gets {@link SurfaceRole#WING}, and no other
 * surface may have it; at most one surface is the tail and one the canard.
 *
 * @param name             the wing's name
 * @param displayUnit      the file's length unit, for display only
 * @param reference        the reference values of the coefficients
 * @param surfaces         the surfaces, the wing first
 * @param sections         the sections by name
 * @param fuselage         the fuselage of the empirical pitching-moment estimate, if described
 * @param thrustLineHeight the height of the thrust line above the centre of gravity, m, if given (thrust along
 *                         the body x axis, equal to the drag in level flight)
 */
public record Wing(String name, LengthUnit displayUnit, Reference reference, List<Surface> surfaces,
        Map<String, Section> sections, Optional<Fuselage> fuselage, OptionalDouble thrustLineHeight) {

    /**
     * Copies the surfaces and sections and checks them: at least one surface, the first the wing (one of role
     * other taken as such), at most one wing, tail and canard, a finite thrust-line height, and every section
     * a surface names.
     */
    public Wing {
        if (surfaces.isEmpty()) {
            throw new IllegalArgumentException("a wing needs at least one surface");
        }
        surfaces = new ArrayList<>(surfaces);
        if (surfaces.get(0).role() == SurfaceRole.OTHER) {
            surfaces.set(0, surfaces.get(0).withRole(SurfaceRole.WING));
        }
        surfaces = List.copyOf(surfaces);
        sections = Map.copyOf(sections);
        requireRoles(surfaces);
        if (thrustLineHeight.isPresent() && !Double.isFinite(thrustLineHeight.getAsDouble())) {
            throw new IllegalArgumentException("the thrust line height must be a finite length");
        }
        for (Surface s : surfaces) {
            requireSections(s, sections);
        }
    }

    /** A wing without fuselage or thrust line. */
    public Wing(String name, LengthUnit displayUnit, Reference reference, List<Surface> surfaces,
            Map<String, Section> sections) {
        this(name, displayUnit, reference, surfaces, sections, Optional.empty(), OptionalDouble.empty());
    }

    private static void requireRoles(List<Surface> surfaces) {
        if (surfaces.get(0).role() != SurfaceRole.WING) {
            throw new IllegalArgumentException("the first surface is the wing; surface '" + surfaces.get(0).name()
                    + "' is declared a " + surfaces.get(0).role().word());
        }
        for (SurfaceRole role : List.of(SurfaceRole.WING, SurfaceRole.TAIL, SurfaceRole.CANARD)) {
            List<String> named = surfaces.stream().filter(s -> s.role() == role).map(Surface::name).toList();
            if (named.size() > 1) {
                throw new IllegalArgumentException("only one surface may be the " + role.word() + (role
                        == SurfaceRole.WING ? " (the first)" : "") + "; found " + String.join(", ", named));
            }
        }
    }

    /**
     * Refuses a surface naming a section that the section map lacks, naming the station (or the surface, for
     * an elliptic planform) and the section.
     */
    private static void requireSections(Surface surface, Map<String, Section> sections) {
        String where = "surface '" + surface.name() + "'";
        Planform planform = surface.planform() instanceof RetwistedPlanform r ? r.base() : surface.planform();
        if (planform instanceof StationPlanform p) {
            List<Station> stations = p.stations();
            for (int i = 0; i < stations.size(); i++) {
                Station st = stations.get(i);
                if (!sections.containsKey(st.section())) {
                    throw missingSection(where + ", station index " + i + " (y = " + st.y() + " m)", st.section(),
                            sections);
                }
            }
        } else if (planform instanceof EllipticPlanform e && !sections.containsKey(e.sectionName())) {
            throw missingSection(where + " (elliptic planform)", e.sectionName(), sections);
        }
    }

    private static IllegalArgumentException missingSection(String where, String name, Map<String, Section> sections) {
        return new IllegalArgumentException(where + " names section '" + name + "', which the wing's sections lack; "
                + "they are: " + (sections.isEmpty() ? "none" : String.join(", ", new TreeSet<>(sections.keySet()))));
    }

    /** The first surface: the one that stall, aileron and load results concern. */
    public Surface main() {
        return surfaces.get(0);
    }

    /** True when every surface is mirrored, so that symmetric and antisymmetric half-span solves apply. */
    public boolean symmetric() {
        return surfaces.stream().allMatch(Surface::mirrored);
    }

    /** The index of the surface of the given role, if there is one. */
    public OptionalInt surfaceIndex(SurfaceRole role) {
        for (int i = 0; i < surfaces.size(); i++) {
            if (surfaces.get(i).role() == role) {
                return OptionalInt.of(i);
            }
        }
        return OptionalInt.empty();
    }

    /** Every control on every surface, in file order. */
    public List<ControlSurface> controls() {
        List<ControlSurface> all = new ArrayList<>();
        surfaces.forEach(s -> all.addAll(s.controls()));
        return all;
    }

    /** The control of the given name, if there is one. */
    public Optional<ControlSurface> control(String name) {
        return controls().stream().filter(c -> c.name().equals(name)).findFirst();
    }

    /** Reference values defaulted from the first surface: its area, span, MAC and quarter-MAC point. */
    public static Reference defaultReference(Surface first) {
        return new Reference(first.area(), first.span(), first.meanAerodynamicChord(), first.quarterMacPoint());
    }

    /** A copy with every surface's lattice replaced. */
    public Wing withLattice(LatticeSpec spec) {
        return new Wing(name, displayUnit, reference, surfaces.stream().map(s -> s.withLattice(spec)).toList(),
                sections, fuselage, thrustLineHeight);
    }

    /**
     * The same wing with a twist change on its first surface, piecewise linear through knots (y, m) from zero
     * at the root, rad ({@link Surface#withTwistChange}).
     */
    public Wing withTwistChange(double[] knots, double[] change) {
        List<Surface> changed = new ArrayList<>(surfaces);
        changed.set(0, surfaces.get(0).withTwistChange(knots, change));
        return new Wing(name, displayUnit, reference, changed, sections);
    }

    /** The same wing with the washout of its first surface larger by {@code change}, rad. */
    public Wing withWashoutChange(double change) {
        List<Surface> changed = new ArrayList<>(surfaces);
        changed.set(0, surfaces.get(0).withWashoutChange(change));
        return new Wing(name, displayUnit, reference, changed, sections, fuselage, thrustLineHeight);
    }
}
