package org.spanlift.validation.wings;

import java.util.List;

import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.Station;
import org.spanlift.geometry.StationPlanform;
import org.spanlift.geometry.Surface;

/**
 * A straight-tapered, mirrored surface described in code, SI units and radians: tip-to-tip span, root chord,
 * taper (tip chord over root chord), sweep of the quarter-chord line, dihedral, root twist and washout
 * (root twist minus tip twist), one section name for the whole span, and the position of the root
 * leading edge. The root quarter-chord point sits at (rootX + rootChord / 4, 0, rootZ).
 */
public record Trapezoid(double span, double rootChord, double taper, double quarterChordSweep, double dihedral,
        double rootTwist, double washout, String section, double rootX, double rootZ) {

    /** An untwisted, unswept, flat rectangle of the given span and chord, root leading edge at the origin. */
    public static Trapezoid rectangle(double span, double chord, String section) {
        return new Trapezoid(span, chord, 1, 0, 0, 0, 0, section, 0, 0);
    }

    public double tipChord() {
        return taper * rootChord;
    }

    /** Projected area of both halves, m^2. */
    public double area() {
        return 0.5 * span * rootChord * (1 + taper);
    }

    public double aspectRatio() {
        return span * span / area();
    }

    /** The same shape moved by (dx, dz). */
    public Trapezoid translated(double dx, double dz) {
        return new Trapezoid(span, rootChord, taper, quarterChordSweep, dihedral, rootTwist, washout, section,
                rootX + dx, rootZ + dz);
    }

    /** The same shape with every length multiplied by k (angles unchanged). */
    public Trapezoid scaled(double k) {
        return new Trapezoid(k * span, k * rootChord, taper, quarterChordSweep, dihedral, rootTwist, washout,
                section, k * rootX, k * rootZ);
    }

    /** The root and tip stations of the right half. */
    public StationPlanform planform() {
        double s = 0.5 * span;
        double ct = tipChord();
        double tipX = rootX + 0.25 * rootChord + s * Math.tan(quarterChordSweep) - 0.25 * ct;
        double tipZ = rootZ + s * Math.tan(dihedral);
        return new StationPlanform(List.of(
                new Station(0, rootChord, rootX, rootZ, rootTwist, section),
                new Station(s, ct, tipX, tipZ, rootTwist - washout, section)));
    }

    /** The mirrored surface with the given controls (spanwise limits in metres on the right half). */
    public Surface surface(String name, List<ControlSurface> controls, LatticeSpec lattice) {
        return new Surface(name, true, planform(), controls, lattice);
    }
}
