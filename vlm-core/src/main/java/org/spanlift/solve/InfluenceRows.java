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

    /** Row work space of one thread. */
    final class Work {
        final double[] row = new double[panels];
        final double[] trailing = new double[points];
        final double[] distance = new double[points];
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
     * (each shared trailing leg evaluated once; see {@link HorseshoeKernel} for the laws).
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
        double[] row = work.row;
        for (int k = 0; k < points; k++) {
            double rx = px - qx[k];
            double ry = py - qy[k];
            double rz = pz - qz[k];
            distance[k] = Math.sqrt(rx * rx + ry * ry + rz * rz); // a bound leg's |P - A| or |P - B|
            double d2 = ry * ry + rz * rz;
            double eps = qCut[k];
            double vy = 0;
            double vz = 0;
            if (!(d2 <= eps * eps)) {
                double r = Math.sqrt(rx * rx + d2);
                double core2 = qCore2[k];
                double c = (1 + rx / r) / (FOUR_PI * (d2 < core2 ? core2 : d2));
                vy -= c * rz;
                vz += c * ry;
            }
            trailing[k] = vy * ny + vz * nz;
        }
        for (int j = 0; j < panels; j++) {
            double r1x = px - ax[j];
            double r1y = py - ay[j];
            double r1z = pz - az[j];
            double r2x = px - bx[j];
            double r2y = py - by[j];
            double r2z = pz - bz[j];
            double cx = r1y * r2z - r1z * r2y;
            double cy = r1z * r2x - r1x * r2z;
            double cz = r1x * r2y - r1y * r2x;
            double c2 = cx * cx + cy * cy + cz * cz;
            double r1 = distance[aPoint[j]];
            double r2 = distance[bPoint[j]];
            double eps = cut[j];
            double vx = 0;
            double vy = 0;
            double vz = 0;
            if (!(c2 <= crossLimit[j] || r1 <= eps || r2 <= eps)) {
                double x0 = r0x[j];
                double y0 = r0y[j];
                double z0 = r0z[j];
                double c = ((x0 * r1x + y0 * r1y + z0 * r1z) / r1 - (x0 * r2x + y0 * r2y + z0 * r2z) / r2)
                        / (FOUR_PI * c2);
                vx += c * cx;
                vy += c * cy;
                vz += c * cz;
            }
            row[j] = vx * nx + vy * ny + vz * nz + trailing[bPoint[j]] - trailing[aPoint[j]];
        }
    }
}
