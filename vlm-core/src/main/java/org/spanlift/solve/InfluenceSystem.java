package org.spanlift.solve;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.decomposition.lu.LUDecompositionAlt_DDRM;
import org.ejml.dense.row.linsol.lu.LinearSolverLu_DDRM;
import org.spanlift.lattice.Lattice;

/**
 * The aerodynamic influence matrix of a lattice, A[i][j] = n_i . v_j(P_i) (normalwash at control point i
 * of horseshoe j at unit circulation), factorized once by LU with partial pivoting (EJML). It depends on
 * the planform only; every right-hand side is then one forward and back substitution.
 *
 * <p>Symmetric and antisymmetric systems have the right-half panels as unknowns and add (subtract) the
 * influence of each panel's mirror image. Not thread-safe: one instance per thread.
 */
public final class InfluenceSystem {

    /** Pivot ratio (smallest over largest |U_ii|) below which the system is refused as singular. */
    public static final double PIVOT_RATIO_LIMIT = 1e-12;

    private final Symmetry symmetry;
    private final int size;
    private final LinearSolverLu_DDRM solver;
    private final DMatrixRMaj rhs;
    private final DMatrixRMaj solution;

    private InfluenceSystem(Symmetry symmetry, DMatrixRMaj matrix) {
        this.symmetry = symmetry;
        this.size = matrix.numRows;
        this.solver = new LinearSolverLu_DDRM(new LUDecompositionAlt_DDRM());
        if (!solver.setA(matrix)) {
            throw new SingularSystemException("the influence matrix is singular (coincident or crossing panels)");
        }
        double[] lu = solver.getDecomposition().getLU().data;
        double min = Double.POSITIVE_INFINITY;
        double max = 0;
        for (int i = 0; i < size; i++) {
            double d = Math.abs(lu[i * size + i]);
            min = Math.min(min, d);
            max = Math.max(max, d);
        }
        if (!(min > PIVOT_RATIO_LIMIT * max)) {
            throw new SingularSystemException(String.format(
                    "the influence matrix is singular or badly conditioned (pivot ratio %.1e); "
                            + "check for coincident, crossing or degenerate panels", min / max));
        }
        this.rhs = new DMatrixRMaj(size, 1);
        this.solution = new DMatrixRMaj(size, 1);
    }

    /** Assembles and factorizes the system of the given symmetry. */
    public static InfluenceSystem of(Lattice lattice, Symmetry symmetry) {
        return new InfluenceSystem(symmetry, assemble(lattice, symmetry));
    }

    /** The symmetric and antisymmetric systems of a mirrored lattice. */
    public record Pair(InfluenceSystem symmetric, InfluenceSystem antisymmetric) {
    }

    /**
     * Both half-span systems from one pass over the influences: each direct term D and image term M is
     * evaluated once, and A_sym = D + M, A_anti = D - M.
     */
    public static Pair pair(Lattice lattice) {
        if (!lattice.mirrored()) {
            throw new IllegalArgumentException("a symmetric pair of systems needs a mirrored lattice");
        }
        int n = lattice.halfCount();
        DMatrixRMaj sym = new DMatrixRMaj(n, n);
        DMatrixRMaj anti = new DMatrixRMaj(n, n);
        double[] v = new double[3];
        for (int i = 0; i < n; i++) {
            double px = lattice.cx(i);
            double py = lattice.cy(i);
            double pz = lattice.cz(i);
            double nx = lattice.nx(i);
            double ny = lattice.ny(i);
            double nz = lattice.nz(i);
            for (int j = 0; j < n; j++) {
                HorseshoeKernel.velocity(lattice, j, px, py, pz, v);
                double direct = v[0] * nx + v[1] * ny + v[2] * nz;
                HorseshoeKernel.velocity(lattice, j + n, px, py, pz, v);
                double image = v[0] * nx + v[1] * ny + v[2] * nz;
                sym.data[i * n + j] = direct + image;
                anti.data[i * n + j] = direct - image;
            }
        }
        return new Pair(new InfluenceSystem(Symmetry.SYMMETRIC, sym), new InfluenceSystem(Symmetry.ANTISYMMETRIC, anti));
    }

    /** The influence matrix alone (for tests and benchmarks). */
    public static DMatrixRMaj assemble(Lattice lattice, Symmetry symmetry) {
        if (symmetry != Symmetry.FULL && !lattice.mirrored()) {
            throw new IllegalArgumentException("a " + symmetry + " system needs a mirrored lattice");
        }
        int n = symmetry == Symmetry.FULL ? lattice.panelCount() : lattice.halfCount();
        int half = lattice.halfCount();
        double sign = symmetry == Symmetry.ANTISYMMETRIC ? -1 : 1;
        DMatrixRMaj a = new DMatrixRMaj(n, n);
        double[] data = a.data;
        double[] v = new double[3];
        for (int i = 0; i < n; i++) {
            double px = lattice.cx(i);
            double py = lattice.cy(i);
            double pz = lattice.cz(i);
            double nx = lattice.nx(i);
            double ny = lattice.ny(i);
            double nz = lattice.nz(i);
            for (int j = 0; j < n; j++) {
                HorseshoeKernel.velocity(lattice, j, px, py, pz, v);
                double w = v[0] * nx + v[1] * ny + v[2] * nz;
                if (symmetry != Symmetry.FULL) {
                    HorseshoeKernel.velocity(lattice, j + half, px, py, pz, v);
                    w += sign * (v[0] * nx + v[1] * ny + v[2] * nz);
                }
                data[i * n + j] = w;
            }
        }
        return a;
    }

    public Symmetry symmetry() {
        return symmetry;
    }

    /** Number of unknowns. */
    public int size() {
        return size;
    }

    /**
     * Solves A x = b. Writes the solution into {@code x} (length {@link #size()}, overwritten);
     * {@code b} is not modified.
     */
    public void solve(double[] b, double[] x) {
        System.arraycopy(b, 0, rhs.data, 0, size);
        solver.solve(rhs, solution);
        System.arraycopy(solution.data, 0, x, 0, size);
        for (int i = 0; i < size; i++) {
            if (!Double.isFinite(x[i])) {
                throw new SingularSystemException("the influence system gave a non-finite circulation");
            }
        }
    }
}
