package org.spanlift.geometry;

import org.spanlift.section.CamberLine;

/**
 * An airfoil section as the lattice sees it: its name and mean line, and the incidence correction (radians)
 * added to every panel of the section (zero unless a measured zero-lift angle is given: thin-airfoil
 * zero-lift angle minus the measured one).
 */
public record Section(String name, CamberLine camber, double incidenceCorrection) {

    public static Section of(String name, CamberLine camber) {
        return new Section(name, camber, 0);
    }
}
