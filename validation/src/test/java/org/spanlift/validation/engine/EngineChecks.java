package org.spanlift.validation.engine;

import org.spanlift.geometry.Wing;
import org.spanlift.results.SpanLoad;
import org.spanlift.solve.WingAnalysis;

/** Small measurements shared by the engine checks. */
final class EngineChecks {

    /** Angle of attack for span-efficiency and span-load checks: any alpha with |CL| >= 0.05 gives the same e. */
    static final double ALPHA = Math.toRadians(4);

    private EngineChecks() {
    }

    /** dCL/dalpha at zero lift, per radian, with every control at zero. */
    static double liftSlope(WingAnalysis analysis) {
        return analysis.liftCurve(new double[analysis.wing().controls().size()]).slope();
    }

    static double liftSlope(Wing wing) {
        return liftSlope(WingAnalysis.of(wing));
    }

    /** Span efficiency at {@link #ALPHA}, controls at zero. */
    static double spanEfficiency(Wing wing) {
        WingAnalysis analysis = WingAnalysis.of(wing);
        return analysis.solve(ALPHA, new double[wing.controls().size()]).coefficients().spanEfficiency()
                .orElseThrow();
    }

    /**
     * The largest departure of the span load c*cl from the ellipse of the same lift, over the peak of that
     * ellipse. The ellipse amplitude comes from the load itself: integral c*cl dy = (pi / 4) b (c*cl)_0.
     */
    static double ellipticDeparture(SpanLoad load, double span) {
        double integral = 0;
        for (int i = 0; i < load.size(); i++) {
            integral += load.clc()[i] * (load.yRight()[i] - load.yLeft()[i]);
        }
        double peak = 4 * integral / (Math.PI * span);
        double worst = 0;
        for (int i = 0; i < load.size(); i++) {
            double eta = 2 * load.y()[i] / span;
            worst = Math.max(worst, Math.abs(load.clc()[i] - peak * Math.sqrt(1 - eta * eta)));
        }
        return worst / peak;
    }
}
