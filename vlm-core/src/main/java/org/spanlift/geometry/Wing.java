package org.spanlift.geometry;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;

/**
 * A whole aircraft lifting system as described by one wing file: its surfaces (the first is the wing), the
 * sections they name, and the reference values. Immutable; SI units throughout. The length unit of the
 * file is kept for display only. Every section a surface names must be in {@code sections}: a wing naming
 * one that is not is refused with an {@link IllegalArgumentException} naming the station and the section.
 */
public record Wing(String name, LengthUnit displayUnit, Reference reference, List<Surface> surfaces,
        Map<String, Section> sections) {

    public Wing {
        surfaces = List.copyOf(surfaces);
        sections = Map.copyOf(sections);
        if (surfaces.isEmpty()) {
            throw new IllegalArgumentException("a wing needs at least one surface");
        }
        for (Surface s : surfaces) {
            requireSections(s, sections);
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

    /** Every control on every surface, in file order. */
    public List<ControlSurface> controls() {
        List<ControlSurface> all = new ArrayList<>();
        surfaces.forEach(s -> all.addAll(s.controls()));
        return all;
    }

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
                sections);
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
        return new Wing(name, displayUnit, reference, changed, sections);
    }
}
