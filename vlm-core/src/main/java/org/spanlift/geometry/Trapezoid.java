package org.spanlift.geometry;

import java.util.List;

/**
 * A straight-tapered mirrored planform, as a wing file's {@code trapezoid} describes it and as code can
 * build it: the right half, from the root (y = 0) to the tip (y = span / 2), with chord, leading edge and
 * twist linear in between. SI units and radians; wing axes: x aft, y toward the right tip, z up.
 *
 * <p>The quarter-chord line runs straight from the root's quarter-chord point (rootNoseX + rootChord / 4, 0,
 * rootNoseZ) to the tip's, swept aft by {@code quarterChordSweep} in the x-y plane; the leading edge rises
 * by {@code dihedral}. Twist is positive nose-up; the tip's is {@code rootTwist - washout}.
 *
 * @param span              tip-to-tip span, m (positive)
 * @param rootChord         chord at y = 0, m (positive)
 * @param taper             tip chord over root chord (0 or more: 0 is a pointed tip)
 * @param quarterChordSweep sweep of the quarter-chord line, rad, positive with the tip aft
 * @param dihedral          dihedral of the leading edge, rad, positive with the tip up
 * @param rootTwist         twist (incidence) at the root, rad, positive nose-up
 * @param washout           root twist minus tip twist, rad (positive: the tip meets the air at a smaller
 *                          angle than the root)
 * @param section           name of the section of the whole span, a key of the wing's section map
 * @param rootNoseX         x of the root leading edge, m
 * @param rootNoseZ         z of the root leading edge, m
 */
public record Trapezoid(double span, double rootChord, double taper, double quarterChordSweep, double dihedral,
        double rootTwist, double washout, String section, double rootNoseX, double rootNoseZ) {

    /**
     * Checks the values: a positive span and root chord, a taper of 0 or more, sweep and dihedral below 90 degrees
     * in size, finite twists and nose, and a section named.
     */
    public Trapezoid {
        if (!(span > 0) || !(rootChord > 0) || !(taper >= 0) || !Double.isFinite(span)
                || !Double.isFinite(rootChord) || !Double.isFinite(taper)) {
            throw new IllegalArgumentException("a trapezoid needs a positive span and root chord and a taper of 0 "
                    + "or more, got span " + span + " m, root chord " + rootChord + " m, taper " + taper);
        }
        if (!(Math.abs(quarterChordSweep) < Math.PI / 2) || !(Math.abs(dihedral) < Math.PI / 2)
                || !Double.isFinite(rootTwist) || !Double.isFinite(washout) || !Double.isFinite(rootNoseX)
                || !Double.isFinite(rootNoseZ)) {
            throw new IllegalArgumentException("a trapezoid needs a sweep and dihedral within +-90 degrees and "
                    + "finite twist, washout and root position");
        }
        if (section == null) {
            throw new IllegalArgumentException("a trapezoid needs a section name");
        }
    }

    /**
     * An untwisted, unswept, flat rectangle of the given span and chord (m), root leading edge at the
     * origin.
     */
    public static Trapezoid rectangle(double span, double chord, String section) {
        return new Trapezoid(span, chord, 1, 0, 0, 0, 0, section, 0, 0);
    }

    /** Half the span: the tip's y, m. */
    public double semiSpan() {
        return 0.5 * span;
    }

    /** The tip chord, taper times root chord, m. */
    public double tipChord() {
        return taper * rootChord;
    }

    /** The root and the tip station of the right half. */
    public StationPlanform planform() {
        double s = semiSpan();
        double tipChord = tipChord();
        double tipQuarterX = rootNoseX + 0.25 * rootChord + s * Math.tan(quarterChordSweep);
        return new StationPlanform(List.of(
                new Station(0, rootChord, rootNoseX, rootNoseZ, rootTwist, section),
                new Station(s, tipChord, tipQuarterX - 0.25 * tipChord, rootNoseZ + s * Math.tan(dihedral),
                        rootTwist - washout, section)));
    }

    /** The mirrored surface of this planform, without a fuselage (control limits: y in m on the right half). */
    public Surface surface(String name, List<ControlSurface> controls, LatticeSpec lattice) {
        return new Surface(name, true, planform(), controls, lattice);
    }
}
