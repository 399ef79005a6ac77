package org.spanlift.flight;

import java.util.OptionalDouble;

import org.spanlift.geometry.Wing;
import org.spanlift.results.Coefficients;
import org.spanlift.results.ProfileDrag;
import org.spanlift.results.Solution;

/**
 * One solved point with its drag build-up: the linear solution and, where every section gives a drag polar,
 * the profile drag coefficient from strip integration of the polars at the Reynolds number the rule gives
 * for the point's CL. CD = CDi (Trefftz plane) + CDp.
 *
 * @param solution    the solution at the point's angle of attack and deflections
 * @param profileDrag CDp on the reference area, when the sections give polars
 */
public record FlightPoint(Solution solution, OptionalDouble profileDrag) {

    /** The point of a solution, with profile drag at the rule's Reynolds number where polars exist. */
    public static FlightPoint of(Solution solution, Wing wing, ReynoldsRule rule) {
        double cl = solution.coefficients().lift();
        return new FlightPoint(solution, ProfileDrag.coefficient(solution, wing, rule.perMetre(cl)));
    }

    /** Angle of attack, rad. */
    public double alpha() {
        return solution.alpha();
    }

    /** The whole configuration's coefficients. */
    public Coefficients coefficients() {
        return solution.coefficients();
    }

    /** CD = CDi + CDp, when the sections give polars. */
    public OptionalDouble drag() {
        return profileDrag.isPresent()
                ? OptionalDouble.of(coefficients().inducedDrag() + profileDrag.getAsDouble()) : OptionalDouble.empty();
    }

    /** CL / CD, when the sections give polars. */
    public OptionalDouble liftToDrag() {
        return profileDrag.isPresent() ? OptionalDouble.of(coefficients().lift() / drag().getAsDouble())
                : OptionalDouble.empty();
    }
}
