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
    CG
}
