package org.spanlift.loads;

import org.spanlift.structure.EnvelopeSpec;
import org.spanlift.structure.LoadCase;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Locale;

import org.spanlift.atmosphere.StandardAtmosphere;

/**
 * The corner points of a manoeuvre and gust envelope, as load cases. An aid to exploring loads, not a
 * statement of compliance with any airworthiness standard: the user chooses the load factors, speeds and
 * gust velocities, and the standard that applies decides which conditions must be shown.
 *
 * <p>Manoeuvre corners (the shape of the flight envelope of 14 CFR 23.333(b) and CS-23.333): n1 at VA and at
 * VD; n2 at VC; the negative limit at VD; with a most negative CL, also n2 where the negative stall line
 * meets it. Along a line of constant n the loads are linear in the dynamic pressure (the air load is
 * n W times the additional load plus q times the basic load, the inertia n g m), so the extremes of that
 * line lie at its ends. Gust corners: 1 +/- the gust increment of {@link GustFormula} at VC and VD (and
 * at VB when given). Points between corners on the sloping negative line are not searched.
 */
public final class Envelope {

    private Envelope() {
    }

    /**
     * One point of the envelope with the gust formula's intermediate values where it is a gust point.
     *
     * @param loadCase     the point as a load case
     * @param kind         {@code manoeuvre} or {@code gust}
     * @param speedName    the design speed it stands at ({@code VA}, {@code VC}, ...)
     * @param gustVelocity the derived gust velocity, m/s (NaN for a manoeuvre point)
     * @param massRatio    the gust mass ratio mu_g (NaN for a manoeuvre point)
     * @param alleviation  the gust alleviation factor K_g (NaN for a manoeuvre point)
     */
    public record Point(LoadCase loadCase, String kind, String speedName, double gustVelocity, double massRatio,
            double alleviation) {
    }

    /**
     * @param area       wing reference area, m^2
     * @param meanChord  mean geometric chord S/b, m
     * @param liftSlope  the wing's lift-curve slope per radian (used unless the spec gives one)
     */
    public static List<Point> points(EnvelopeSpec spec, double area, double meanChord, double liftSlope) {
        return points(spec, area, meanChord, liftSlope, OptionalDouble.empty());
    }

    /**
     * As {@link #points(EnvelopeSpec, double, double, double)}, with the positive stall line n = CNmax q S / W:
     * where it lies below n1 at VA, the manoeuvre corner at VA is replaced by the stall line's point at VA and
     * the point where the stall line meets n1 (the corner of the envelope the standards draw, 14 CFR 23.333(b)
     * pre-2017 text).
     *
     * @param maxNormal the wing's maximum normal-force coefficient, when known
     */
    public static List<Point> points(EnvelopeSpec spec, double area, double meanChord, double liftSlope,
            OptionalDouble maxNormal) {
        double a = spec.liftSlope().orElse(liftSlope);
        double h = spec.altitude();
        double rho = StandardAtmosphere.at(h, 0).density();
        List<Point> out = new ArrayList<>();
        for (double w : spec.weights()) {
            String wt = String.format(Locale.ROOT, "%.0f N", w);
            double stallAtVa = maxNormal.isPresent()
                    ? maxNormal.getAsDouble() * 0.5 * LoadCase.RHO0 * spec.va() * spec.va() * area / w
                    : Double.POSITIVE_INFINITY;
            if (stallAtVa < spec.positive()) {
                manoeuvre(out, "VA on the stall line", spec.va(), stallAtVa, w, h, wt);
                double corner = Math.sqrt(2 * spec.positive() * w / (LoadCase.RHO0 * area * maxNormal.getAsDouble()));
                manoeuvre(out, "the stall line", corner, spec.positive(), w, h, wt);
            } else {
                manoeuvre(out, "VA", spec.va(), spec.positive(), w, h, wt);
            }
            manoeuvre(out, "VD", spec.vd(), spec.positive(), w, h, wt);
            if (spec.minimumLift().isPresent()) {
                double v = Math.sqrt(2 * -spec.negative() * w
                        / (LoadCase.RHO0 * area * -spec.minimumLift().getAsDouble()));
                if (v < spec.vc()) {
                    manoeuvre(out, "negative stall", v, spec.negative(), w, h, wt);
                }
            }
            manoeuvre(out, "VC", spec.vc(), spec.negative(), w, h, wt);
            manoeuvre(out, "VD", spec.vd(), spec.negativeAtDive(), w, h, wt);
            if (spec.vb().isPresent()) {
                gust(out, "VB", spec.vb().getAsDouble(), spec.gustB().orElseThrow(), w, h, area, meanChord, a, rho, wt);
            }
            gust(out, "VC", spec.vc(), spec.gustC(), w, h, area, meanChord, a, rho, wt);
            gust(out, "VD", spec.vd(), spec.gustD(), w, h, area, meanChord, a, rho, wt);
        }
        return out;
    }

    private static void manoeuvre(List<Point> out, String speedName, double v, double n, double w, double h,
            String wt) {
        String name = String.format(Locale.ROOT, "manoeuvre n %+.2f at %s, %s", n, speedName, wt);
        out.add(new Point(new LoadCase(name, w, n, v, h, "manoeuvre " + speedName), "manoeuvre", speedName,
                Double.NaN, Double.NaN, Double.NaN));
    }

    private static void gust(List<Point> out, String speedName, double v, double u, double w, double h, double area,
            double meanChord, double a, double rho, String wt) {
        GustFormula.GustLoad g = GustFormula.of(w / area, meanChord, a, rho, u, v);
        for (int sign : new int[] {1, -1}) {
            double n = 1 + sign * g.increment();
            String name = String.format(Locale.ROOT, "%s gust %.2f m/s at %s, n %+.2f, %s", sign > 0 ? "up" : "down", u,
                    speedName, n, wt);
            out.add(new Point(new LoadCase(name, w, n, v, h, (sign > 0 ? "up" : "down") + " gust " + speedName),
                    "gust", speedName, u, g.massRatio(), g.alleviation()));
        }
    }
}
