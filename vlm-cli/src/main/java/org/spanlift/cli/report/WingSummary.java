package org.spanlift.cli.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

import org.spanlift.solve.LiftCurve;
import org.spanlift.flight.FlightPoint;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.vocabulary.WingResult;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.results.Coefficients;
import org.spanlift.results.Solution;
import org.spanlift.solve.WingAnalysis;

/**
 * The headline numbers of one wing at given deflections, as the report and the comparison show them: the
 * reference geometry, the lift line, and the condition at a chosen lift coefficient. SI units, radians.
 *
 * @param mac          mean aerodynamic chord of the first surface, m
 * @param alphaAtCl    the angle of attack (rad) where CL equals {@code cl}
 * @param atCl         the coefficients there
 * @param spanLoadAtCl the solution there (for span-load plots)
 */
public record WingSummary(Path file, Wing wing, WingAnalysis analysis, double[] deflections,
        LiftCurve line, double mac, double cl, double alphaAtCl, Coefficients atCl,
        Solution spanLoadAtCl) {

    /** Solves the wing at its file lattice and the condition at lift coefficient {@code cl}. */
    public static WingSummary of(Path file, Wing wing, WingAnalysis analysis, double[] deflections, double cl) {
        LiftCurve line = analysis.liftCurve(deflections);
        double alpha = line.alphaFor(cl);
        Solution s = analysis.solve(alpha, deflections);
        return new WingSummary(file, wing, analysis, deflections.clone(), line, wing.main().meanAerodynamicChord(), cl,
                alpha, s.coefficients(), s);
    }

    /** The wing-level vocabulary source. */
    public WingResult wingResult() {
        return new WingResult(analysis, line);
    }

    /** The point at the chosen CL, as a vocabulary source (induced drag only). */
    public FlightPoint pointAtCl() {
        return new FlightPoint(spanLoadAtCl, OptionalDouble.empty());
    }

    public double liftSlope() {
        return line.slope();
    }

    public OptionalDouble spanEfficiency() {
        return atCl.spanEfficiency();
    }

    public double inducedDrag() {
        return atCl.inducedDrag();
    }

    /** The same wing with every surface's strip count doubled (rows and spacings kept). */
    public static Wing doubledStrips(Wing wing) {
        List<Surface> surfaces = new ArrayList<>();
        for (Surface s : wing.surfaces()) {
            LatticeSpec l = s.lattice();
            surfaces.add(s.withLattice(new LatticeSpec(2 * l.strips(), l.rows(), l.stripSpacing(), l.rowSpacing())));
        }
        return new Wing(wing.name(), wing.displayUnit(), wing.reference(), surfaces, wing.sections());
    }
}
