package org.spanlift.geometry;

/**
 * One spanwise station of a surface, SI units: the leading-edge point (noseX, y, noseZ) and chord in
 * metres, the twist (incidence, positive nose-up) in radians, and the name of its section.
 */
public record Station(double y, double chord, double noseX, double noseZ, double twist, String section) {

    public Station {
        if (section == null) {
            throw new IllegalArgumentException("the station at y = " + y + " m needs a section name");
        }
    }
}
