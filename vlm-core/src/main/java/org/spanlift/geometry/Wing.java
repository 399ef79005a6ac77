package org.spanlift.geometry;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A whole aircraft lifting system as described by one wing file: its surfaces (the first is the wing), the
 * sections they name, and the reference values. Immutable; SI units throughout. The length unit of the
 * file is kept for display only.
 */
public record Wing(String name, LengthUnit displayUnit, Reference reference, List<Surface> surfaces,
        Map<String, Section> sections) {

    public Wing {
        surfaces = List.copyOf(surfaces);
        sections = Map.copyOf(sections);
        if (surfaces.isEmpty()) {
            throw new IllegalArgumentException("a wing needs at least one surface");
        }
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

    /** A copy with one control's deflection replaced (radians, trailing edge down). */
    public Wing withDeflection(String controlName, double radians) {
        List<Surface> changed = surfaces.stream().map(s -> s.withControls(s.controls().stream()
                .map(c -> c.name().equals(controlName) ? c.withDeflection(radians) : c).toList())).toList();
        return new Wing(name, displayUnit, reference, changed, sections);
    }

    /** A copy with every surface's lattice replaced. */
    public Wing withLattice(LatticeSpec spec) {
        return new Wing(name, displayUnit, reference, surfaces.stream().map(s -> s.withLattice(spec)).toList(),
                sections);
    }
}
