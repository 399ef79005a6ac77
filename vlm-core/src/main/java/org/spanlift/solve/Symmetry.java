package org.spanlift.solve;

/** Which influence system a solve uses. */
public enum Symmetry {
    /** Right half with images of equal circulation: symmetric conditions (alpha, flaps). */
    SYMMETRIC,
    /** Right half with images of opposite circulation: antisymmetric conditions (ailerons). */
    ANTISYMMETRIC,
    /** Every panel its own unknown: where no symmetry holds. */
    FULL
}
