package org.spanlift.lattice;

import org.spanlift.input.RefusedException;
import java.util.ArrayList;
import java.util.List;

import org.spanlift.geometry.Spacing;

/**
 * Strip edges over one surface: the spacing law first, then the nearest edges moved onto forced cut lines
 * (control ends, stations). Between two fixed edges the law's edges are mapped linearly, so the local
 * spacing keeps its shape and the strip count stays exactly as requested.
 */
final class SpanwiseCuts {

    /** Strip edges (n + 1 values) and control-point positions (n values), metres. */
    record Edges(double[] edges, double[] controls) {
    }

    private SpanwiseCuts() {
    }

    /**
     * @param y0       start of the surface (root of a mirrored surface)
     * @param y1       end of the surface
     * @param n        strip count
     * @param spacing  the spacing law
     * @param halfSpan true for a mirrored surface (the law's right half, clustered at the tip), false for
     *                 a whole surface (clustered at both ends)
     * @param cuts     y of the forced cut lines; those at the ends are ignored
     */
    static Edges place(double y0, double y1, int n, Spacing spacing, boolean halfSpan, List<Double> cuts) {
        double length = y1 - y0;
        double[] law = new double[n + 1];
        double[] mid = new double[n];
        for (int k = 0; k <= n; k++) {
            law[k] = y0 + length * map(spacing, halfSpan, (double) k / n);
        }
        for (int k = 0; k < n; k++) {
            mid[k] = y0 + length * map(spacing, halfSpan, (k + 0.5) / n);
        }
        double tolerance = 1e-9 * length;
        List<Double> interior = new ArrayList<>();
        cuts.stream().sorted().forEach(c -> {
            boolean inside = c > y0 + tolerance && c < y1 - tolerance;
            boolean fresh = interior.isEmpty() || c - interior.get(interior.size() - 1) > tolerance;
            if (inside && fresh) {
                interior.add(c);
            }
        });
        int m = interior.size();
        if (m > n - 1) {
            throw new RefusedException(
                    "needs at least " + (m + 1) + " strips to fit its " + m + " cut lines");
        }
        int[] fixedIndex = new int[m + 2];
        double[] fixedY = new double[m + 2];
        fixedIndex[0] = 0;
        fixedY[0] = y0;
        for (int j = 0; j < m; j++) {
            double c = interior.get(j);
            int nearest = 1;
            for (int k = 1; k < n; k++) {
                if (Math.abs(law[k] - c) < Math.abs(law[nearest] - c)) {
                    nearest = k;
                }
            }
            int lowest = fixedIndex[j] + 1;
            int highest = n - (m - j);
            fixedIndex[j + 1] = Math.max(lowest, Math.min(highest, nearest));
            fixedY[j + 1] = c;
        }
        fixedIndex[m + 1] = n;
        fixedY[m + 1] = y1;

        double[] edges = new double[n + 1];
        double[] controls = new double[n];
        for (int seg = 0; seg <= m; seg++) {
            int ia = fixedIndex[seg];
            int ib = fixedIndex[seg + 1];
            double scale = (fixedY[seg + 1] - fixedY[seg]) / (law[ib] - law[ia]);
            for (int k = ia; k <= ib; k++) {
                edges[k] = fixedY[seg] + (law[k] - law[ia]) * scale;
            }
            for (int k = ia; k < ib; k++) {
                controls[k] = fixedY[seg] + (mid[k] - law[ia]) * scale;
            }
        }
        edges[0] = y0;
        edges[n] = y1;
        return new Edges(edges, controls);
    }

    private static double map(Spacing spacing, boolean halfSpan, double u) {
        return halfSpan ? spacing.half(u) : spacing.full(u);
    }
}
