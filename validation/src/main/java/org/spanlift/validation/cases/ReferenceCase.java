package org.spanlift.validation.cases;

import java.util.List;
import java.util.Objects;
import java.util.function.ToDoubleFunction;

import org.spanlift.geometry.LatticeSpec;

/**
 * One check against a published (or textbook, or common-practice) value: what is measured, the reference
 * and where it comes from, the tolerance and why it is what it is, the lattice the check is judged on and
 * the densities of its refinement study.
 *
 * @param name          a short unique name, usable on the command line
 * @param quantity      what is compared, with its unit
 * @param reference     the reference value
 * @param source        author, title, year and equation/table/figure; or "common practice"; or "recalled from
 *                      memory"
 * @param tolerancePct  the allowed |error|, percent
 * @param toleranceWhy  one line: why the tolerance is what it is
 * @param errorKind     how the error is formed from result and reference
 * @param lattice       the lattice the check is judged on
 * @param densities     lattices of the refinement study, coarse to fine, each twice as dense as the one before
 *                      in every direction that is refined (empty when the result does not depend on the lattice)
 * @param measure       computes the quantity on a lattice
 */
public record ReferenceCase(String name, String quantity, double reference, String source, double tolerancePct,
        String toleranceWhy, ErrorKind errorKind, LatticeSpec lattice, List<LatticeSpec> densities,
        ToDoubleFunction<LatticeSpec> measure) {

    /** How the error percentage is formed. */
    public enum ErrorKind {
        /** 100 (result - reference) / |reference|. */
        RELATIVE,
        /** The quantity is itself a deviation in percent (reference 0): the error is the result. */
        DEVIATION_PCT
    }

    public ReferenceCase {
        Objects.requireNonNull(name);
        densities = List.copyOf(densities);
        if (!(tolerancePct > 0)) {
            throw new IllegalArgumentException("a tolerance must be positive: " + name);
        }
    }

    /** The error of a result, percent. */
    public double errorPct(double result) {
        return errorKind == ErrorKind.RELATIVE ? 100 * (result - reference) / Math.abs(reference) : result;
    }
}
