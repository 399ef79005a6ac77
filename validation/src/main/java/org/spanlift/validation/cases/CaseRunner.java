package org.spanlift.validation.cases;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/** Runs reference cases: the quantity on the case's lattice, then its refinement study. */
public final class CaseRunner {

    private CaseRunner() {
    }

    /** Runs one case. The densities that equal the case's lattice are not solved twice. */
    public static CaseResult run(ReferenceCase c) {
        double result = c.measure().applyAsDouble(c.lattice());
        List<CaseResult.Density> study = new ArrayList<>();
        for (var spec : c.densities()) {
            double r = spec.equals(c.lattice()) ? result : c.measure().applyAsDouble(spec);
            study.add(new CaseResult.Density(spec, r));
        }
        double[] f = study.stream().mapToDouble(CaseResult.Density::result).toArray();
        OptionalDouble order = Richardson.order(f);
        Double p = order.isPresent() ? order.getAsDouble() : null;
        OptionalDouble extrapolated = Richardson.extrapolated(f);
        Double converged = extrapolated.isPresent() ? extrapolated.getAsDouble() : null;
        double error = c.errorPct(result);
        boolean pass = Double.isFinite(result) && Math.abs(error) <= c.tolerancePct();
        return new CaseResult(c, result, error, pass, study, p, converged);
    }

    /** Runs every case, in order. */
    public static List<CaseResult> runAll(List<ReferenceCase> cases) {
        return cases.stream().map(CaseRunner::run).toList();
    }
}
