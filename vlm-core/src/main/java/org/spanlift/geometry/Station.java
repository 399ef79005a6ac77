package org.spanlift.geometry;

/**
 * One spanwise station of a surface, SI units: the leading-edge point (noseX, y, noseZ) and chord in
 * metres, the twist (incidence, positive nose-up) in radians, and the name of its section.
 *
 * @param y       spanwise position, m
 * @param chord   chord, m
 * @param noseX   leading-edge x, m
 * @param noseZ   leading-edge z, m
 * @param twist   twist (incidence), rad, positive nose-up
 * @param section the section's name
 */
public record Station(double y, double chord, double noseX, double noseZ, double twist, String section) {

    /** Checks that the station names a section. */
    public Station {
        if (section == null) {
            throw new IllegalArgumentException("the station at y = " + y + " m needs a section name");
        }
    }
}
