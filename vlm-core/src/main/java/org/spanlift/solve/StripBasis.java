package org.spanlift.solve;

import java.util.List;

import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.Strip;

/**
 * Circulations (per unit freestream speed, metres) of every panel for a unit incidence, one radian nose-up,
 * on one strip's panels at unit freestream along +x: the basis of the strips' incidence corrections in the
 * nonlinear coupling. A correction d_k on unknown k adds {@code cos(alpha) d_k G_k} to the circulation, as
 * the panel incidence does in {@link BasisSolutions}; the factorization is reused, so each unknown costs one
 * forward and back substitution.
 *
 * <p>In a symmetric basis each unknown is a right-half strip of a mirrored lattice and the correction acts
 * on it and on its mirror image alike; otherwise each unknown is one strip (either half). Immutable.
 */
public final class StripBasis {

    private final List<Integer> strips;
    private final boolean symmetric;
    private final double[][] circulation;

    private StripBasis(List<Integer> strips, boolean symmetric, double[][] circulation) {
        this.strips = strips;
        this.symmetric = symmetric;
        this.circulation = circulation;
    }

    /**
     * Solves the strip bases.
     *
     * @param strips    lattice strip indices of the unknowns; in a symmetric basis right-half strips only
     * @param symmetric each correction mirrored (a symmetric condition of a mirrored lattice)
     */
    static StripBasis solve(Lattice lattice, InfluenceCache.Systems systems, boolean halves, List<Integer> strips,
            boolean symmetric) {
        if (symmetric && !lattice.mirrored()) {
            throw new IllegalArgumentException("a symmetric strip basis needs a mirrored lattice");
        }
        int n = lattice.panelCount();
        int half = lattice.halfCount();
        double[][] g = new double[strips.size()][];
        for (int k = 0; k < strips.size(); k++) {
            Strip st = lattice.strips().get(strips.get(k));
            if (symmetric && !st.right()) {
                throw new IllegalArgumentException("a symmetric strip basis takes right-half strips only");
            }
            if (!halves) {
                double[] rhs = new double[n];
                for (int r = 0; r < st.rows(); r++) {
                    rhs[st.firstPanel() + r] = -1;
                    if (symmetric) {
                        rhs[st.firstPanel() + r + half] = -1;
                    }
                }
                g[k] = new double[n];
                systems.full().solve(rhs, g[k]);
                continue;
            }
            int first = st.right() ? st.firstPanel() : st.firstPanel() - half;
            double[] rhs = new double[half];
            for (int r = 0; r < st.rows(); r++) {
                rhs[first + r] = -1;
            }
            double[] sym = BasisSolutions.expand(lattice, systems.symmetric(), rhs, 1);
            if (symmetric) {
                g[k] = sym;
                continue;
            }
            double[] anti = BasisSolutions.expand(lattice, systems.antisymmetric(), rhs, -1);
            double side = st.right() ? 1 : -1;
            g[k] = new double[n];
            for (int i = 0; i < n; i++) {
                g[k][i] = 0.5 * (sym[i] + side * anti[i]);
            }
        }
        return new StripBasis(List.copyOf(strips), symmetric, g);
    }

    /** The lattice strip indices of the unknowns. */
    public List<Integer> strips() {
        return strips;
    }

    /** True when each unknown acts on a right-half strip and its mirror image. */
    public boolean symmetric() {
        return symmetric;
    }

    /** Number of unknowns. */
    public int size() {
        return strips.size();
    }

    /** Circulation per unit speed of a panel for unit incidence on unknown k at unit freestream along +x, m. */
    public double circulation(int k, int panel) {
        return circulation[k][panel];
    }

    /**
     * Adds {@code cos(alpha) sum_k corrections_k G_k} to the circulations {@code g} (length panel count).
     *
     * @param corrections incidence corrections per unknown, rad
     */
    public void addTo(double alpha, double[] corrections, double[] g) {
        double c = Math.cos(alpha);
        for (int k = 0; k < corrections.length; k++) {
            double d = c * corrections[k];
            if (d != 0) {
                double[] gk = circulation[k];
                for (int i = 0; i < g.length; i++) {
                    g[i] += d * gk[i];
                }
            }
        }
    }
}
