package org.spanlift.geometry;

/** How lattice edges are spread over an interval. */
public enum Spacing {
    /** Equal intervals. */
    UNIFORM,
    /** The cosine law: edges at equal steps of an angle, clustered toward the ends it is applied to. */
    COSINE;

    /**
     * The edge position in [0, 1] for the parameter u in [0, 1] over a whole interval: uniform u, or
     * (1 - cos(pi u)) / 2, clustered at both ends.
     */
    public double full(double u) {
        return this == UNIFORM ? u : 0.5 * (1 - Math.cos(Math.PI * u));
    }

    /**
     * The edge position in [0, 1] for u in [0, 1] over one half of a mirrored span (root at 0, tip at 1):
     * the right half of the full-span law, so cosine spacing is sin(pi u / 2), clustered toward the tip.
     */
    public double half(double u) {
        return this == UNIFORM ? u : Math.sin(0.5 * Math.PI * u);
    }
}
