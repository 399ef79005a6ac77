package org.spanlift.geometry;

/** How a control surface deflects on a mirrored surface. */
public enum ControlKind {
    /** Both sides deflect the same way (symmetric). */
    FLAP,
    /** The left side deflects opposite to the right (antisymmetric); mirrored surfaces only. */
    AILERON,
    /** Symmetric pitch control on a tail or canard: the deflection that trims the configuration. */
    ELEVATOR
}
