package org.spanlift.section;

/** Temporary: replaced by the section library. */
public interface CamberLine {
    double z(double x);

    double slope(double x);

    String designation();
}
