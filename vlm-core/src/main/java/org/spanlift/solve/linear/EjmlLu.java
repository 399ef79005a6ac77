package org.spanlift.solve.linear;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.decomposition.lu.LUDecompositionAlt_DDRM;
import org.ejml.dense.row.linsol.lu.LinearSolverLu_DDRM;

/**
 * EJML's dense LU with partial pivoting ({@code LinearSolverLu_DDRM} over {@code LUDecompositionAlt_DDRM}),
 * single thread. EJML's solver keeps work arrays, so a solve holds this instance's lock.
 */
public final class EjmlLu implements DenseLu {

    private LinearSolverLu_DDRM solver;
    private int n;
    private DMatrixRMaj rhs;
    private DMatrixRMaj solution;
    private double ratio = Double.NaN;

    EjmlLu() {
    }

    @Override
    public void factor(double[] a, int size) {
        if (solver != null) {
            throw new IllegalStateException("this solver is factorized already");
        }
        if (a.length != size * size) {
            throw new IllegalArgumentException("the matrix holds " + a.length + " values, not " + size + " x " + size);
        }
        solver = new LinearSolverLu_DDRM(new LUDecompositionAlt_DDRM());
        DMatrixRMaj matrix = DMatrixRMaj.wrap(size, size, a);
        solver.setA(matrix); // decomposes; a singular matrix shows in the pivots
        n = size;
        ratio = DenseLu.pivotRatio(solver.getDecomposition().getLU().data, size);
        rhs = new DMatrixRMaj(size, 1);
        solution = new DMatrixRMaj(size, 1);
    }

    @Override
    public int size() {
        return n;
    }

    @Override
    public double pivotRatio() {
        return ratio;
    }

    @Override
    public synchronized void solve(double[] b, double[] x) {
        if (solver == null) {
            throw new IllegalStateException("factor the matrix first");
        }
        System.arraycopy(b, 0, rhs.data, 0, n);
        solver.solve(rhs, solution);
        System.arraycopy(solution.data, 0, x, 0, n);
    }
}
