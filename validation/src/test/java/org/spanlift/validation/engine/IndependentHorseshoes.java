package org.spanlift.validation.engine;

/**
 * A separate, minimal horseshoe-vortex solve, written from the Biot-Savart law for a straight segment
 * (Katz and Plotkin, Low-Speed Aerodynamics, 2001, the finite vortex segment; Bertin and Smith, the
 * vortex-lattice chapter) without any engine code: for checking the engine on one small lattice.
 */
final class IndependentHorseshoes {

    /** Length standing in for infinity, in chords: the far closing segment's influence is ~1e-14 of the rest. */
    private static final double FAR = 1e7;

    private IndependentHorseshoes() {
    }

    /**
     * Circulation per unit freestream along +z (per radian of alpha, times V) of n horseshoes per semi-span
     * on a flat, constant-chord wing of span b, chord c and quarter-chord sweep: bound legs on the
     * quarter-chord line, control points at three-quarter chord at each strip's middle, trailing legs
     * along +x, mirror images on the left. Returns the right-half values root to tip.
     */
    static double[] sweptExample(double span, double chord, double sweep, int n) {
        double width = 0.5 * span / n;
        double t = Math.tan(sweep);
        double[][] m = new double[n][n];
        double[] rhs = new double[n];
        for (int i = 0; i < n; i++) {
            double yc = (i + 0.5) * width;
            double[] p = {yc * t + 0.75 * chord, yc, 0};
            for (int j = 0; j < n; j++) {
                double y0 = j * width;
                double y1 = (j + 1) * width;
                double[] a = {y0 * t + 0.25 * chord, y0, 0};
                double[] b = {y1 * t + 0.25 * chord, y1, 0};
                // the image runs from (-y1) to (-y0), so its bound leg also points toward +y
                double[] am = {b[0], -y1, 0};
                double[] bm = {a[0], -y0, 0};
                m[i][j] = upwash(a, b, p) + upwash(am, bm, p);
            }
            rhs[i] = -1; // no flow through the plate: induced upwash cancels the unit freestream along +z
        }
        return gauss(m, rhs);
    }

    /** z-velocity at p of the unit horseshoe: far -> a, a -> b, b -> far, far points at +x. */
    private static double upwash(double[] a, double[] b, double[] p) {
        double[] aFar = {a[0] + FAR, a[1], a[2]};
        double[] bFar = {b[0] + FAR, b[1], b[2]};
        return segmentUpwash(aFar, a, p) + segmentUpwash(a, b, p) + segmentUpwash(b, bFar, p);
    }

    /**
     * z-velocity at p of a unit segment from a to b: (1 / 4 pi) (r1 x r2) / |r1 x r2|^2
     * r0 . (r1 / |r1| - r2 / |r2|), with r0 = b - a, r1 = p - a, r2 = p - b.
     */
    private static double segmentUpwash(double[] a, double[] b, double[] p) {
        double[] r0 = {b[0] - a[0], b[1] - a[1], b[2] - a[2]};
        double[] r1 = {p[0] - a[0], p[1] - a[1], p[2] - a[2]};
        double[] r2 = {p[0] - b[0], p[1] - b[1], p[2] - b[2]};
        double cx = r1[1] * r2[2] - r1[2] * r2[1];
        double cy = r1[2] * r2[0] - r1[0] * r2[2];
        double cz = r1[0] * r2[1] - r1[1] * r2[0];
        double c2 = cx * cx + cy * cy + cz * cz;
        double n1 = Math.sqrt(r1[0] * r1[0] + r1[1] * r1[1] + r1[2] * r1[2]);
        double n2 = Math.sqrt(r2[0] * r2[0] + r2[1] * r2[1] + r2[2] * r2[2]);
        double k = ((r0[0] * r1[0] + r0[1] * r1[1] + r0[2] * r1[2]) / n1
                - (r0[0] * r2[0] + r0[1] * r2[1] + r0[2] * r2[2]) / n2) / (4 * Math.PI * c2);
        return k * cz;
    }

    /** Gaussian elimination with partial pivoting. */
    private static double[] gauss(double[][] a, double[] b) {
        int n = b.length;
        for (int k = 0; k < n; k++) {
            int pivot = k;
            for (int i = k + 1; i < n; i++) {
                if (Math.abs(a[i][k]) > Math.abs(a[pivot][k])) {
                    pivot = i;
                }
            }
            double[] row = a[k];
            a[k] = a[pivot];
            a[pivot] = row;
            double v = b[k];
            b[k] = b[pivot];
            b[pivot] = v;
            for (int i = k + 1; i < n; i++) {
                double f = a[i][k] / a[k][k];
                for (int j = k; j < n; j++) {
                    a[i][j] -= f * a[k][j];
                }
                b[i] -= f * b[k];
            }
        }
        double[] x = new double[n];
        for (int i = n - 1; i >= 0; i--) {
            double s = b[i];
            for (int j = i + 1; j < n; j++) {
                s -= a[i][j] * x[j];
            }
            x[i] = s / a[i][i];
        }
        return x;
    }
}
