package org.spanlift.solve;

import org.ejml.data.DMatrixRMaj;
import org.spanlift.lattice.Lattice;
import org.spanlift.solve.linear.DenseLu;
import org.spanlift.solve.linear.LuOptions;

/**
 * The aerodynamic influence matrix of a lattice, A[i][j] = n_i . v_j(P_i) (normalwash at control point i
 * of horseshoe j at unit circulation), factorized once by LU with partial pivoting behind the solver seam
 * ({@link DenseLu}, chosen by {@link LuOptions}; {@link LuOptions#DEFAULT} unless a caller says otherwise). It
 * depends on the planform only; every right-hand side is then one forward and back substitution.
 *
 * <p>Symmetric and antisymmetric systems have the right-half panels as unknowns and add (subtract) the
 * influence of each panel's mirror image. Solves may run from several threads at once.
 */
public final class InfluenceSystem {

    /** Pivot ratio (smallest over largest |U_ii|) below which the system is refused as singular. */
    public static final double PIVOT_RATIO_LIMIT = 1e-12;

    private final Symmetry symmetry;
    private final int size;
    private final DenseLu lu;

    /** Factorizes the row-major {@code n} x {@code n} matrix {@code a}, which the factorization may overwrite. */
    private InfluenceSystem(Symmetry symmetry, double[] a, int n, LuOptions options) {
        this.symmetry = symmetry;
        this.size = n;
        this.lu = DenseLu.create(options);
        lu.factor(a, n);
        double ratio = lu.pivotRatio();
        if (ratio == 0) {
            throw new SingularSystemException("the influence matrix is singular (coincident or crossing panels)");
        }
        if (!(ratio > PIVOT_RATIO_LIMIT)) {
            throw new SingularSystemException(String.format(
                    "the influence matrix is singular or badly conditioned (pivot ratio %.1e); "
                            + "check for coincident, crossing or degenerate panels", ratio));
        }
    }

    /** Assembles and factorizes the system of the given symmetry with the default factorization. */
    public static InfluenceSystem of(Lattice lattice, Symmetry symmetry) {
        return of(lattice, symmetry, LuOptions.DEFAULT);
    }

    /** Assembles and factorizes the system of the given symmetry as the options say. */
    public static InfluenceSystem of(Lattice lattice, Symmetry symmetry, LuOptions options) {
        int n = symmetry == Symmetry.FULL ? lattice.panelCount() : lattice.halfCount();
        SolveBudget.require(n, 1);
        return new InfluenceSystem(symmetry, assemble(lattice, symmetry, options.threads()), n, options);
    }

    /**
     * The symmetric and antisymmetric systems of a mirrored lattice.
     *
     * @param symmetric     the symmetric system
     * @param antisymmetric the antisymmetric system
     */
    public record Pair(InfluenceSystem symmetric, InfluenceSystem antisymmetric) {
    }

    /**
     * Both half-span systems from one pass over the influences: each direct term D and image term M is
     * evaluated once, and A_sym = D + M, A_anti = D - M.
     */
    public static Pair pair(Lattice lattice) {
        return pair(lattice, LuOptions.DEFAULT);
    }

    /** Both half-span systems, factorized as the options say. */
    public static Pair pair(Lattice lattice, LuOptions options) {
        if (!lattice.mirrored()) {
            throw new IllegalArgumentException("a symmetric pair of systems needs a mirrored lattice");
        }
        int n = lattice.halfCount();
        SolveBudget.require(n, 2);
        double[] sym = new double[n * n];
        double[] anti = new double[n * n];
        new InfluenceRows(lattice).build(n, options.threads(), (i, row) -> {
            for (int j = 0; j < n; j++) {
                sym[i * n + j] = row[j] + row[j + n];
                anti[i * n + j] = row[j] - row[j + n];
            }
        });
        InfluenceSystem symmetric = new InfluenceSystem(Symmetry.SYMMETRIC, sym, n, options);
        return new Pair(symmetric, new InfluenceSystem(Symmetry.ANTISYMMETRIC, anti, n, options));
    }

    /** The influence matrix alone (for tests and benchmarks), assembled on one thread. */
    public static DMatrixRMaj assemble(Lattice lattice, Symmetry symmetry) {
        int n = symmetry == Symmetry.FULL ? lattice.panelCount() : lattice.halfCount();
        return DMatrixRMaj.wrap(n, n, assemble(lattice, symmetry, 1));
    }

    /**
     * The row-major influence matrix, its rows split between up to {@code threads} threads (the matrix does
     * not depend on how many).
     */
    static double[] assemble(Lattice lattice, Symmetry symmetry, int threads) {
        if (symmetry != Symmetry.FULL && !lattice.mirrored()) {
            throw new IllegalArgumentException("a " + symmetry + " system needs a mirrored lattice");
        }
        int n = symmetry == Symmetry.FULL ? lattice.panelCount() : lattice.halfCount();
        int half = lattice.halfCount();
        double[] a = new double[n * n];
        InfluenceRows rows = new InfluenceRows(lattice);
        if (symmetry == Symmetry.FULL) {
            rows.build(n, threads, (i, row) -> System.arraycopy(row, 0, a, i * n, n));
        } else {
            double sign = symmetry == Symmetry.ANTISYMMETRIC ? -1 : 1;
            rows.build(n, threads, (i, row) -> {
                for (int j = 0; j < n; j++) {
                    a[i * n + j] = row[j] + sign * row[j + half];
                }
            });
        }
        return a;
    }

    /** The symmetry the system was built for. */
    public Symmetry symmetry() {
        return symmetry;
    }

    /** Number of unknowns. */
    public int size() {
        return size;
    }

    /**
     * Solves A x = b. Writes the solution into {@code x} (length {@link #size()}, overwritten);
     * {@code b} is not modified and must not be {@code x}.
     */
    public void solve(double[] b, double[] x) {
        lu.solve(b, x);
        for (int i = 0; i < size; i++) {
            if (!Double.isFinite(x[i])) {
                throw new SingularSystemException("the influence system gave a non-finite circulation");
            }
        }
    }
}
