package org.spanlift.solve;

import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;

import org.spanlift.lattice.Lattice;

/**
 * The rows of a lattice's influence matrix, laid out for the loop: the lattice's points and legs copied once
 * into flat arrays, per-leg constants (the bound leg's vector, its squared length times the squared cut-off)
 * formed once per assembly, and per row the distance from the control point to every trailing point computed
 * once and shared by the bound legs that end there (a bound leg's ends are trailing points). The arithmetic of
 * every entry is that of {@link HorseshoeKernel}, operation for operation, so the matrix is the same bit for
 * bit; the rows of one assembly may be split between threads, each row computed whole by one of them.
 */
final class InfluenceRows {

    private static final double FOUR_PI = 4 * Math.PI;
    /** Rows below which an assembly stays on one thread. */
    static final int PARALLEL_ROWS = 192;

    private final Lattice lattice;
    private final int panels;
    private final int points;
    // trailing points
    private final double[] qx;
    private final double[] qy;
    private final double[] qz;
    private final double[] qCut;
    private final double[] qCore2;
    // bound legs
    private final int[] aPoint;
    private final int[] bPoint;
    private final double[] ax;
    private final double[] ay;
    private final double[] az;
    private final double[] bx;
    private final double[] by;
    private final double[] bz;
    private final double[] r0x;
    private final double[] r0y;
    private final double[] r0z;
    private final double[] cut;
    private final double[] crossLimit;

    InfluenceRows(Lattice lattice) {
        this.lattice = lattice;
        panels = lattice.panelCount();
        points = lattice.trailingPointCount();
        qx = new double[points];
        qy = new double[points];
        qz = new double[points];
        qCut = new double[points];
        qCore2 = new double[points];
        for (int k = 0; k < points; k++) {
            qx[k] = lattice.trailingX(k);
            qy[k] = lattice.trailingY(k);
            qz[k] = lattice.trailingZ(k);
            qCut[k] = lattice.trailingCutoff(k);
            qCore2[k] = lattice.trailingCoreSquared(k);
        }
        aPoint = new int[panels];
        bPoint = new int[panels];
        ax = new double[panels];
        ay = new double[panels];
        az = new double[panels];
        bx = new double[panels];
        by = new double[panels];
        bz = new double[panels];
        r0x = new double[panels];
        r0y = new double[panels];
        r0z = new double[panels];
        cut = new double[panels];
        crossLimit = new double[panels];
        for (int j = 0; j < panels; j++) {
            aPoint[j] = lattice.trailingPointA(j);
            bPoint[j] = lattice.trailingPointB(j);
            ax[j] = lattice.ax(j);
            ay[j] = lattice.ay(j);
            az[j] = lattice.az(j);
            bx[j] = lattice.bx(j);
            by[j] = lattice.by(j);
            bz[j] = lattice.bz(j);
            r0x[j] = bx[j] - ax[j];
            r0y[j] = by[j] - ay[j];
            r0z[j] = bz[j] - az[j];
            double r02 = r0x[j] * r0x[j] + r0y[j] * r0y[j] + r0z[j] * r0z[j];
            double eps = lattice.cutoff(j);
            cut[j] = eps;
            crossLimit[j] = eps * eps * r02;
        }
    }

    /** Row work space of one thread: the row, and per trailing point and per bound leg the loop's terms. */
    final class Work {
        final double[] row = new double[panels];
        final double[] trailing = new double[points];
        final double[] distance = new double[points];
        final double[] d2 = new double[points];
        final double[] num = new double[points];
        final double[] den = new double[points];
        final double[] r1 = new double[panels];
        final double[] r2 = new double[panels];
        final double[] c2 = new double[panels];
        final double[] cx = new double[panels];
        final double[] cy = new double[panels];
        final double[] cz = new double[panels];
        final double[] dot1 = new double[panels];
        final double[] dot2 = new double[panels];
        final double[] wash = new double[panels];
    }

    /** Receives each finished row (length panel count) with its index; called on the thread that built it. */
    interface RowSink {
        void accept(int i, double[] row);
    }

    /**
     * Builds rows 0..rows-1 into {@code sink}, split between the calling thread and the common fork-join
     * pool when {@code threads} allows and there are enough rows. The sink must accept rows from several
     * threads at once (each row writes its own part of a matrix).
     */
    void build(int rows, int threads, RowSink sink) {
        if (threads <= 1 || rows < PARALLEL_ROWS) {
            range(0, rows, sink);
            return;
        }
        int parts = Math.min(threads, rows / (PARALLEL_ROWS / 2));
        ForkJoinTask<?>[] tasks = new ForkJoinTask<?>[parts - 1];
        for (int t = 1; t < parts; t++) {
            int from = (int) ((long) rows * t / parts);
            int to = (int) ((long) rows * (t + 1) / parts);
            tasks[t - 1] = ForkJoinPool.commonPool().submit(() -> range(from, to, sink));
        }
        range(0, rows / parts, sink);
        for (ForkJoinTask<?> task : tasks) {
            task.join();
        }
    }

    private void range(int from, int to, RowSink sink) {
        Work work = new Work();
        for (int i = from; i < to; i++) {
            row(i, work);
            sink.accept(i, work.row);
        }
    }

    /**
     * Writes into {@code work.row} the normalwash at control point i of every horseshoe at unit circulation
     * (each shared trailing leg evaluated once; see {@link HorseshoeKernel} for the laws). The loops are split
     * so that the square roots and divisions run in loops without branches, which the JIT vectorizes; the
     * cut-offs and the core's choice follow in plain loops. Each value is formed by the same operations in
     * the same order as the kernel's.
     */
    void row(int i, Work work) {
        double px = lattice.cx(i);
        double py = lattice.cy(i);
        double pz = lattice.cz(i);
        double nx = lattice.nx(i);
        double ny = lattice.ny(i);
        double nz = lattice.nz(i);
        double[] trailing = work.trailing;
        double[] distance = work.distance;
        double[] d2s = work.d2;
        double[] num = work.num;
        double[] den = work.den;
        for (int k = 0; k < points; k++) {
            double rx = px - qx[k];
            double ry = py - qy[k];
            double rz = pz - qz[k];
            distance[k] = Math.sqrt(rx * rx + ry * ry + rz * rz); // a bound leg's |P - A| or |P - B|
        }
        for (int k = 0; k < points; k++) {
            double ry = py - qy[k];
            double rz = pz - qz[k];
            d2s[k] = ry * ry + rz * rz;
        }
        for (int k = 0; k < points; k++) {
            double rx = px - qx[k];
            num[k] = 1 + rx / Math.sqrt(rx * rx + d2s[k]);
        }
        for (int k = 0; k < points; k++) {
            double d2 = d2s[k];
            double core2 = qCore2[k];
            den[k] = FOUR_PI * (d2 < core2 ? core2 : d2);
        }
        for (int k = 0; k < points; k++) {
            double c = num[k] / den[k];
            double vy = 0 - c * (pz - qz[k]);
            double vz = 0 + c * (py - qy[k]);
            trailing[k] = vy * ny + vz * nz;
        }
        double noTrailing = 0.0 * ny + 0.0 * nz; // a point within a leg's cut-off gets no velocity from it
        for (int k = 0; k < points; k++) {
            double eps = qCut[k];
            if (d2s[k] <= eps * eps) {
                trailing[k] = noTrailing;
            }
        }
        double[] r1s = work.r1;
        double[] r2s = work.r2;
        double[] c2s = work.c2;
        double[] cxs = work.cx;
        double[] cys = work.cy;
        double[] czs = work.cz;
        double[] dot1 = work.dot1;
        double[] dot2 = work.dot2;
        double[] wash = work.wash;
        for (int j = 0; j < panels; j++) {
            r1s[j] = distance[aPoint[j]];
            r2s[j] = distance[bPoint[j]];
        }
        for (int j = 0; j < panels; j++) {
            cxs[j] = (py - ay[j]) * (pz - bz[j]) - (pz - az[j]) * (py - by[j]);
        }
        for (int j = 0; j < panels; j++) {
            cys[j] = (pz - az[j]) * (px - bx[j]) - (px - ax[j]) * (pz - bz[j]);
        }
        for (int j = 0; j < panels; j++) {
            czs[j] = (px - ax[j]) * (py - by[j]) - (py - ay[j]) * (px - bx[j]);
        }
        for (int j = 0; j < panels; j++) {
            c2s[j] = cxs[j] * cxs[j] + cys[j] * cys[j] + czs[j] * czs[j];
        }
        for (int j = 0; j < panels; j++) {
            dot1[j] = r0x[j] * (px - ax[j]) + r0y[j] * (py - ay[j]) + r0z[j] * (pz - az[j]);
        }
        for (int j = 0; j < panels; j++) {
            dot2[j] = r0x[j] * (px - bx[j]) + r0y[j] * (py - by[j]) + r0z[j] * (pz - bz[j]);
        }
        for (int j = 0; j < panels; j++) {
            dot1[j] = dot1[j] / r1s[j];
        }
        for (int j = 0; j < panels; j++) {
            dot2[j] = dot2[j] / r2s[j];
        }
        for (int j = 0; j < panels; j++) {
            dot1[j] = (dot1[j] - dot2[j]) / (FOUR_PI * c2s[j]);
        }
        for (int j = 0; j < panels; j++) {
            double c = dot1[j];
            wash[j] = (0 + c * cxs[j]) * nx + (0 + c * cys[j]) * ny + (0 + c * czs[j]) * nz;
        }
        double noBound = 0.0 * nx + 0.0 * ny + 0.0 * nz;
        double[] row = work.row;
        for (int j = 0; j < panels; j++) {
            double eps = cut[j];
            double w = c2s[j] <= crossLimit[j] || r1s[j] <= eps || r2s[j] <= eps ? noBound : wash[j];
            row[j] = w + trailing[bPoint[j]] - trailing[aPoint[j]];
        }
    }
}
