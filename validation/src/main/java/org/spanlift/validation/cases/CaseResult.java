package org.spanlift.validation.cases;

import java.util.List;

import org.spanlift.geometry.LatticeSpec;

/**
 * The outcome of one {@link ReferenceCase}: the result on the case's lattice (which alone decides the error
 * and the verdict), and the refinement study where there is one.
 *
 * @param referenceCase the case
 * @param result        the quantity on the case's lattice
 * @param errorPct      its error, percent
 * @param pass          |errorPct| within the tolerance (and the result finite)
 * @param study         results at the refinement densities, coarse to fine (empty when there is none)
 * @param order         the observed order of convergence, or null where the study does not converge
 *                      monotonically
 * @param converged     the Richardson-extrapolated value, or null where the order is null
 */
public record CaseResult(ReferenceCase referenceCase, double result, double errorPct, boolean pass,
        List<Density> study, Double order, Double converged) {

    public CaseResult {
        study = List.copyOf(study);
    }

    /** One lattice of the refinement study and the quantity on it. */
    public record Density(LatticeSpec lattice, double result) {
    }
}
