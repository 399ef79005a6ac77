package org.spanlift.loads;

import java.util.List;
import java.util.function.Function;

/**
 * The governing cases at each station: for shear, bending and torsion, the largest positive and the most
 * negative value over all cases, with the index of the case that gives it.
 */
public record Governing(double[] y, Extremes shear, Extremes bending, Extremes torsion) {

    /** Per station: the maximum and its case index, the minimum and its case index. */
    public record Extremes(double[] max, int[] maxCase, double[] min, int[] minCase) {
    }

    public static Governing of(List<SpanwiseLoads> cases) {
        if (cases.isEmpty()) {
            throw new IllegalArgumentException("no load cases");
        }
        return new Governing(cases.get(0).y().clone(), extremes(cases, SpanwiseLoads::shear),
                extremes(cases, SpanwiseLoads::bending), extremes(cases, SpanwiseLoads::torsion));
    }

    private static Extremes extremes(List<SpanwiseLoads> cases, Function<SpanwiseLoads, double[]> value) {
        int m = cases.get(0).stations();
        double[] max = new double[m];
        double[] min = new double[m];
        int[] maxCase = new int[m];
        int[] minCase = new int[m];
        for (int k = 0; k < m; k++) {
            max[k] = Double.NEGATIVE_INFINITY;
            min[k] = Double.POSITIVE_INFINITY;
            for (int c = 0; c < cases.size(); c++) {
                double v = value.apply(cases.get(c))[k];
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
