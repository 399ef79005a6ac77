package org.spanlift.loads;

import java.util.List;
import java.util.function.Function;

/**
 * The governing cases at each station: for shear, bending and torsion, the largest positive and the most
 * negative value over all cases, with the index of the case that gives it. Immutable: the arrays are
 * copied on the way in and every array accessor returns a copy.
 *
 * @param y stations, m
 */
public record Governing(double[] y, Extremes shear, Extremes bending, Extremes torsion) {

    public Governing {
        y = y.clone();
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    /** Per station: the maximum and its case index, the minimum and its case index. */
    public record Extremes(double[] max, int[] maxCase, double[] min, int[] minCase) {

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

        @Override
        public double[] max() {
            return max.clone();
        }

        @Override
        public int[] maxCase() {
            return maxCase.clone();
        }

        @Override
        public double[] min() {
            return min.clone();
        }

        @Override
        public int[] minCase() {
            return minCase.clone();
        }
    }

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
