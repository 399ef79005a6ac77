package org.spanlift.validation.cases;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.ToDoubleFunction;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.Wing;
import org.spanlift.results.Solution;
import org.spanlift.solve.WingAnalysis;

/**
 * The study behind the default lattice: on ordinary light-aircraft planforms (aspect ratio 5 to 12, taper
 * 0.4 to 1, quarter-chord sweep under 15 degrees, with a flap and an aileron), how far each candidate lattice
 * is from the converged lift slope and span efficiency. The converged values are those of the 64 x 16 lattice
 * (cosine both ways), not extrapolated: with forced cut lines at the control ends the refinement sequence is
 * not smooth (it wanders by a few hundredths of a percent in lift slope), so a three-level Richardson
 * extrapolation takes a spurious low order and overshoots.
 *
 * <p>The aim: lift slope within {@link #SLOPE_AIM_PCT} and e (clean, and with the flap down 20 degrees)
 * within {@link #E_AIM_PCT} of converged, with at most {@link #MAX_PANELS_PER_HALF} panels per half.
 * {@code main} prints the study as markdown (the table of {@code validation/CONVERGENCE.md}).
 */
public final class ConvergenceStudy {

    public static final double SLOPE_AIM_PCT = 0.5;
    public static final double E_AIM_PCT = 1.0;
    public static final int MAX_PANELS_PER_HALF = 400;
    /** Flap deflection of the flapped span-efficiency check, rad. */
    public static final double FLAP_DOWN = Math.toRadians(20);

    /** The lattice that stands in for the converged values. */
    public static final LatticeSpec CONVERGED = ReferenceCases.cosine(64, 16);

    private ConvergenceStudy() {
    }

    /** A planform of the study: aspect ratio, taper and quarter-chord sweep in degrees. */
    public record Planform(double aspectRatio, double taper, double sweepDeg) {

        /** The wing: flap 0.10-0.55 of the semi-span (chord fraction 0.25), aileron 0.60-0.95 (0.22). */
        public Wing wing(LatticeSpec lattice) {
            List<ControlSurface> controls = List.of(
                    new ControlSurface("flap", ControlKind.FLAP, 0.10 * Wings.SEMI_SPAN, 0.55 * Wings.SEMI_SPAN, 0.25,
                            0),
                    new ControlSurface("aileron", ControlKind.AILERON, 0.60 * Wings.SEMI_SPAN, 0.95 * Wings.SEMI_SPAN,
                            0.22, 0));
            return Wings.trapezoid(aspectRatio, taper, Math.toRadians(sweepDeg), "flat", controls, lattice);
        }

        public String label() {
            return String.format(Locale.ROOT, "A=%s taper=%s sweep=%s", trim(aspectRatio), trim(taper), trim(sweepDeg));
        }
    }

    /** What one lattice gives on one planform. */
    public record Values(double liftSlope, double e, double eFlap, double flapLift, double aileronRoll) {

        static Values of(Wing wing) {
            WingAnalysis a = WingAnalysis.of(wing);
            double[] clean = {0, 0};
            double slope = a.liftCurve(clean).slope();
            Solution s = a.solve(Measures.ALPHA, clean);
            Solution f = a.solve(Measures.ALPHA, new double[] {FLAP_DOWN, 0});
            double da = Math.toRadians(10);
            Solution r = a.solve(Measures.ALPHA, new double[] {0, da});
            return new Values(slope, s.coefficients().spanEfficiency().orElse(Double.NaN),
                    f.coefficients().spanEfficiency().orElse(Double.NaN),
                    (f.coefficients().lift() - s.coefficients().lift()) / FLAP_DOWN,
                    r.coefficients().rollingMoment() / da);
        }

        double[] asArray() {
            return new double[] {liftSlope, e, eFlap, flapLift, aileronRoll};
        }
    }

    /** One row of the study: a planform, a lattice, and its errors against converged, percent. */
    public record Row(Planform planform, LatticeSpec lattice, double slopeErrPct, double eErrPct, double eFlapErrPct,
            double flapLiftErrPct, double aileronRollErrPct) {

        public boolean meetsAim() {
            return Math.abs(slopeErrPct) <= SLOPE_AIM_PCT && Math.abs(eErrPct) <= E_AIM_PCT
                    && Math.abs(eFlapErrPct) <= E_AIM_PCT;
        }
    }

    /** The planforms of the study. */
    public static List<Planform> planforms() {
        List<Planform> p = new ArrayList<>();
        for (double ar : new double[] {5, 8, 12}) {
            for (double taper : new double[] {0.4, 0.7, 1.0}) {
                for (double sweep : new double[] {0, 10}) {
                    p.add(new Planform(ar, taper, sweep));
                }
            }
        }
        return List.copyOf(p);
    }

    /** Candidate lattices, all within the panel budget, cosine both ways. */
    public static List<LatticeSpec> candidates() {
        return List.of(ReferenceCases.cosine(12, 4), ReferenceCases.cosine(16, 4), ReferenceCases.cosine(20, 5),
                ReferenceCases.cosine(24, 6), ReferenceCases.cosine(32, 6), ReferenceCases.cosine(32, 8),
                ReferenceCases.cosine(40, 10));
    }

    /** Converged values of one planform: those of {@link #CONVERGED}. */
    public static double[] converged(Planform p) {
        return Values.of(p.wing(CONVERGED)).asArray();
    }

    /** The study: every candidate on every planform. */
    public static List<Row> run(List<Planform> planforms, List<LatticeSpec> candidates) {
        List<Row> rows = new ArrayList<>();
        for (Planform p : planforms) {
            double[] ref = converged(p);
            for (LatticeSpec l : candidates) {
                double[] v = Values.of(p.wing(l)).asArray();
                rows.add(new Row(p, l, pct(v[0], ref[0]), pct(v[1], ref[1]), pct(v[2], ref[2]), pct(v[3], ref[3]),
                        pct(v[4], ref[4])));
            }
        }
        return rows;
    }

    /** The candidate with the fewest panels that meets the aim on every planform, or null. */
    public static LatticeSpec recommended(List<Row> rows, List<LatticeSpec> candidates) {
        return candidates.stream()
                .filter(l -> l.strips() * l.rows() <= MAX_PANELS_PER_HALF)
                .filter(l -> rows.stream().filter(r -> r.lattice().equals(l)).allMatch(Row::meetsAim))
                .min((x, y) -> Integer.compare(x.strips() * x.rows(), y.strips() * y.rows()))
                .orElse(null);
    }

    private static double pct(double v, double ref) {
        return 100 * (v - ref) / Math.abs(ref);
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? String.valueOf((int) v) : String.valueOf(v);
    }

    /** Prints the study as markdown. */
    public static void main(String[] args) {
        List<LatticeSpec> candidates = candidates();
        List<Row> rows = run(planforms(), candidates);
        StringBuilder b = new StringBuilder();
        b.append("| planform | lattice | panels/half | lift slope err % | e err % | e (flap 20 deg) err % | "
                + "flap dCL/d delta err % | aileron C_roll err % | aim met |\n");
        b.append("| --- | --- | ---: | ---: | ---: | ---: | ---: | ---: | --- |\n");
        for (Row r : rows) {
            b.append(String.format(Locale.ROOT, "| %s | %dx%d | %d | %+.3f | %+.3f | %+.3f | %+.2f | %+.2f | %s |%n",
                    r.planform().label(), r.lattice().strips(), r.lattice().rows(),
                    r.lattice().strips() * r.lattice().rows(), r.slopeErrPct(), r.eErrPct(), r.eFlapErrPct(),
                    r.flapLiftErrPct(), r.aileronRollErrPct(), r.meetsAim() ? "yes" : "no"));
        }
        b.append("\nWorst over the planforms, per lattice:\n\n| lattice | lift slope | e | e (flap) | "
                + "flap dCL/d delta | "
                + "aileron C_roll | aim met everywhere |\n| --- | ---: | ---: | ---: | ---: | ---: | --- |\n");
        for (LatticeSpec l : candidates) {
            List<Row> mine = rows.stream().filter(r -> r.lattice().equals(l)).toList();
            b.append(String.format(Locale.ROOT, "| %dx%d | %.3f | %.3f | %.3f | %.2f | %.2f | %s |%n", l.strips(),
                    l.rows(), worst(mine, Row::slopeErrPct), worst(mine, Row::eErrPct), worst(mine, Row::eFlapErrPct),
                    worst(mine, Row::flapLiftErrPct), worst(mine, Row::aileronRollErrPct),
                    mine.stream().allMatch(Row::meetsAim) ? "yes" : "no"));
        }
        LatticeSpec best = recommended(rows, candidates);
        b.append("\nSmallest lattice meeting the aim everywhere: ")
                .append(best == null ? "none" : best.strips() + " x " + best.rows()).append('\n');
        System.out.print(b);
    }

    private static double worst(List<Row> rows, ToDoubleFunction<Row> f) {
        return rows.stream().mapToDouble(r -> Math.abs(f.applyAsDouble(r))).max().orElse(Double.NaN);
    }
}
