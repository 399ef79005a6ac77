package org.spanlift.vocabulary;

import org.spanlift.solve.LiftCurve;
import org.spanlift.solve.WingAnalysis;

/**
 * The wing-level results of one analysis at one set of deflections: the reference values, the lattice
 * and the lift curve.
 *
 * @param analysis the solved wing
 * @param curve    its lift curve at the deflections
 */
public record WingResult(WingAnalysis analysis, LiftCurve curve) {

    /** The wing's results at the given deflections (rad, control order). */
    public static WingResult of(WingAnalysis analysis, double[] deflections) {
        return new WingResult(analysis, analysis.liftCurve(deflections));
    }
}
