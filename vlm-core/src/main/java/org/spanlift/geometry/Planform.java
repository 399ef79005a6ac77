package org.spanlift.geometry;

import java.util.List;

/**
 * The shape of one surface as functions of the spanwise coordinate y (metres): chord, leading-edge x and
 * z, and twist (radians, positive nose-up). The lattice lies on the flat, untwisted surface; twist enters
 * the boundary condition only.
 */
public sealed interface Planform permits StationPlanform, EllipticPlanform, RetwistedPlanform {

    /** Smallest y the surface covers (the root of a mirrored surface). */
    double yStart();

    /** Largest y the surface covers (the tip). */
    double yEnd();

    /** The local chord at y, m. */
    double chord(double y);

    /** The x of the leading edge at y, m (aft positive). */
    double noseX(double y);

    /** The z of the leading edge at y, m (up positive). */
    double noseZ(double y);

    /** The local twist (incidence) at y, rad, positive nose-up. */
    double twist(double y);

    /**
     * The section blend at y: the two sections on either side and the weight of the outer one, so that a
     * section property p(y) = (1 - weight) p(inner) + weight p(outer).
     */
    SectionBlend section(double y);

    /** The names of the sections the planform uses, root to tip, each once. */
    List<String> sectionNames();

    /** The y of the defining stations, root to tip, ends included (lattice cut lines). */
    List<Double> stationYs();

    /** Planform area of the part described (one half for a mirrored surface), m^2. */
    double area();

    /** Integral of chord squared over the part described, m^3 (for the mean aerodynamic chord). */
    double chordSquaredIntegral();

    /** Integral of chord times leading-edge x, m^3 (for the mean aerodynamic chord position). */
    double chordNoseXIntegral();

    /** Integral of chord times y, m^3 (for the mean aerodynamic chord position). */
    double chordYIntegral();

    /** Integral of chord times leading-edge z, m^3. */
    double chordNoseZIntegral();

    /**
     * The same planform with its washout (root twist minus tip twist) larger by {@code change} (rad): a twist
     * change falling linearly from 0 at the root (yStart) to -change at the tip.
     */
    Planform withWashoutChange(double change);

    /** Root twist minus tip twist, rad. */
    default double washout() {
        return twist(yStart()) - twist(yEnd());
    }
}
