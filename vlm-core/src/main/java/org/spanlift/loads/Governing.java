package org.spanlift.loads;

import java.util.List;
import java.util.function.Function;

/**
 * The governing cases at each station: for shear, bending and torsion, the largest positive and the most
 * negative value over all cases, with the index of the case that gives it. Immutable: the arrays are
 * copied on the way in and every array accessor returns a copy.
 *
 * @param y       stations, m
 * @param shear   extremes of the shear, N
 * @param bending extremes of the bending moment, N m
 * @param torsion extremes of the torsion, N m
 */
public record Governing(double[] y, Extremes shear, Extremes bending, Extremes torsion) {

    /** Copies the stations. */
    public Governing {
        y = y.clone();
    }

    /** A copy of the stations, m. */
    @Override
    public double[] y() {
        return y.clone();
    }

    /**
     * Per station: the maximum and its case index, the minimum and its case index.
     *
     * @param max     largest value at each station
     * @param maxCase index of the case giving it
     * @param min     most negative value at each station
     * @param minCase index of the case giving it
     */
    public record Extremes(double[] max, int[] maxCase, double[] min, int[] minCase) {

        /** Checks that the arrays share one length and copies them. */
        public Extremes {
            int n = max.length;
            if (maxCase.length != n || min.length != n || minCase.length != n) {
                throw new IllegalArgumentException("extreme-load arrays differ in length");
            }
            max = max.clone();
            maxCase = maxCase.clone();
            min = min.clone();
            minCase = minCase.clone();
        }

        /** A copy of the largest value at each station (N or N m). */
        @Override
        public double[] max() {
            return max.clone();
        }

        /** A copy of the index of the case giving the largest value at each station. */
        @Override
        public int[] maxCase() {
            return maxCase.clone();
        }

        /** A copy of the most negative value at each station (N or N m). */
        @Override
        public double[] min() {
            return min.clone();
        }

        /** A copy of the index of the case giving the most negative value at each station. */
        @Override
        public int[] minCase() {
            return minCase.clone();
        }
    }

    /** The governing cases over the given loads, which share their stations; case indices are into the list. */
    public static Governing of(List<SpanwiseLoads> cases) {
        if (cases.isEmpty()) {
            throw new IllegalArgumentException("no load cases");
        }
        return new Governing(cases.get(0).y(), extremes(cases, SpanwiseLoads::shear),
                extremes(cases, SpanwiseLoads::bending), extremes(cases, SpanwiseLoads::torsion));
    }

    private static Extremes extremes(List<SpanwiseLoads> cases, Function<SpanwiseLoads, double[]> value) {
        int m = cases.get(0).stations();
        double[][] values = cases.stream().map(value).toArray(double[][]::new);
        double[] max = new double[m];
        double[] min = new double[m];
        int[] maxCase = new int[m];
        int[] minCase = new int[m];
        for (int k = 0; k < m; k++) {
            max[k] = Double.NEGATIVE_INFINITY;
            min[k] = Double.POSITIVE_INFINITY;
            for (int c = 0; c < cases.size(); c++) {
                double v = values[c][k];
                if (v > max[k]) {
                    max[k] = v;
                    maxCase[k] = c;
                }
                if (v < min[k]) {
                    min[k] = v;
                    minCase[k] = c;
                }
            }
        }
        return new Extremes(max, maxCase, min, minCase);
    }
}
