package org.spanlift.geometry;

/**
 * What a surface does in the configuration. The wing is always the first surface; a surface without a declared
 * role (after the first) is a lifting surface with no special role.
 */
public enum SurfaceRole {
    /** The main wing: stall, aileron and load results concern its stations. */
    WING,
    /** A horizontal tail behind the wing. */
    TAIL,
    /** A foreplane ahead of the wing. */
    CANARD,
    /** A lifting surface with no special role. */
    OTHER;

    /** True for a surface that may carry an elevator. */
    public boolean pitchControlling() {
        return this == TAIL || this == CANARD;
    }

    /** The word of the wing file. */
    public String word() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
