package org.spanlift.vocabulary;

/** What a result needs beyond the wing's geometry. */
public enum Need {
    /** Section cl_max data (or an assumed cl_max). */
    CL_MAX,
    /** A deflected flap. */
    FLAPS,
    /** A weight (a flight condition). */
    WEIGHT,
    /** A drag polar for every section. */
    POLARS,
    /** A centre of gravity. */
    CG,
    /**
     * A configuration of more than one surface: a surface's own share of a result, which for a wing alone
     * repeats the whole's (writers leave such a key out there, so a wing alone's outputs keep their keys).
     */
    SURFACES
}
