package org.spanlift.sweep;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.spanlift.atmosphere.Airspeed;
import org.spanlift.flight.FlightCondition;
import org.spanlift.flight.StallSpeed;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.Strip;
import org.spanlift.stall.StripLimits;

/**
 * Stall onset by the critical-section method on the sweep's own basis solutions, step for step the
 * arithmetic of {@code StallAnalysis.estimate} and {@code StallSpeed.of} (which need a {@code WingAnalysis}
 * and so a fresh factorization): the per-strip lift terms are formed once per configuration, and only the
 * cl_max lookup is repeated while the stall speed and the Reynolds numbers settle. Tests hold the two
 * implementations to the same numbers.
 */
final class CriticalSection {

    /** The scalar results of one stall estimate; lengths in metres, angles in radians. */
    record Onset(double lift, double alpha, double y, double eta, Double marginDcl, Double marginY,
            Double halfSpanLift, boolean assumed) {
    }

    /** A stall speed with the estimate at its Reynolds numbers. */
    record Speed(double equivalent, double trueSpeed, Onset onset) {
    }

    private final Lattice lattice;
    private final Wing wing;
    private final StripLimits limits;
    private final double slope;
    private final double zeroLift;
    private final double semi;
    private final List<Integer> ids;
    private final double[] a;
    private final double[] b;
    private final double[] amplitude;
    private final double[] phase;

    /**
     * @param x, z, control basis circulations per unit speed (control rows may be null where the deflection is 0)
     * @param deflections   control deflections of this configuration, rad
     */
    CriticalSection(Lattice lattice, Wing wing, double[] x, double[] z, double[][] control, double[] deflections,
            double slope, double zeroLift, StripLimits limits) {
        this.lattice = lattice;
        this.wing = wing;
        this.limits = limits;
        this.slope = slope;
        this.zeroLift = zeroLift;
        Surface main = wing.main();
        this.semi = main.mirrored() ? main.planform().yEnd()
                : 0.5 * (main.planform().yEnd() - main.planform().yStart());
        this.ids = limits.strips();
        int n = ids.size();
        a = new double[n];
        b = new double[n];
        amplitude = new double[n];
        phase = new double[n];
        for (int i = 0; i < n; i++) {
            Strip st = lattice.strips().get(ids.get(i));
            double gx = 0;
            double gz = 0;
            for (int r = 0; r < st.rows(); r++) {
                int p = st.firstPanel() + r;
                double v = x[p];
                for (int c = 0; c < deflections.length; c++) {
                    if (control[c] != null) {
                        v += deflections[c] * control[c][p];
                    }
                }
                gx += v;
                gz += z[p];
            }
            a[i] = 2 * gx / st.chord();
            b[i] = 2 * gz / st.chord();
            amplitude[i] = Math.hypot(a[i], b[i]);
            phase[i] = Math.atan2(b[i], a[i]);
        }
    }

    private double lift(double alpha) {
        return slope * Math.sin(alpha - zeroLift);
    }

    /** The onset at the given Reynolds number per metre of chord (0: tables at their lowest Reynolds number). */
    Onset onset(double reynoldsPerMetre) {
        int n = ids.size();
        double[] clMax = new double[n];
        double[] reach = new double[n];
        for (int i = 0; i < n; i++) {
            Strip st = lattice.strips().get(ids.get(i));
            clMax[i] = limits.clMax(i, reynoldsPerMetre * st.chord());
            reach[i] = Math.abs(clMax[i]) <= amplitude[i] ? phase[i] - Math.acos(clMax[i] / amplitude[i])
                    : Double.POSITIVE_INFINITY;
        }
        int first = 0;
        for (int i = 1; i < n; i++) {
            if (reach[i] < reach[first] - 1e-12
                    || (Math.abs(reach[i] - reach[first]) <= 1e-12 && lattice.strips().get(ids.get(i)).y() > 0
                            && lattice.strips().get(ids.get(first)).y() < 0)) {
                first = i;
            }
        }
        if (!Double.isFinite(reach[first])) {
            throw new IllegalArgumentException("no station reaches its cl_max in linear theory; check the section data");
        }
        double alpha = reach[first];
        Double dcl = null;
        Double dclY = null;
        for (ControlSurface c : wing.main().controls()) {
            if (c.kind() != ControlKind.AILERON) {
                continue;
            }
            for (int i = 0; i < n; i++) {
                double sy = lattice.strips().get(ids.get(i)).y();
                double y = Math.abs(sy);
                if (y > c.from() && y < c.to()) {
                    double clOnset = a[i] * Math.cos(alpha) + b[i] * Math.sin(alpha);
                    double m = clMax[i] - clOnset;
                    if (dcl == null || m < dcl) {
                        dcl = m;
                        dclY = sy;
                    }
                }
            }
        }
        double total = 0;
        List<double[]> reached = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double w = lattice.strips().get(ids.get(i)).width();
            total += w;
            if (Double.isFinite(reach[i])) {
                reached.add(new double[] {lift(reach[i]), w});
            }
        }
        reached.sort(Comparator.comparingDouble(r -> r[0]));
        Double half = null;
        double covered = 0;
        for (double[] r : reached) {
            covered += r[1];
            if (covered >= 0.5 * total - 1e-12 * total) {
                half = r[0];
                break;
            }
        }
        Strip onset = lattice.strips().get(ids.get(first));
        return new Onset(lift(alpha), alpha, Math.abs(onset.y()), Math.abs(onset.y()) / semi, dcl,
                dclY == null ? null : Math.abs(dclY), half, limits.assumed());
    }

    /** The stall speed of the condition, iterated with the Reynolds numbers as {@code StallSpeed.of} does. */
    Speed speed(FlightCondition condition) {
        double nu = condition.atmosphere().kinematicViscosity();
        double vt = 30;
        for (int k = 1; k <= 100; k++) {
            Onset e = onset(vt / nu);
            double ve = condition.equivalentSpeedFor(e.lift(), wing.reference());
            double next = Airspeed.trueFromEquivalent(ve, condition.atmosphere());
            if (Math.abs(next - vt) <= StallSpeed.TOLERANCE * next) {
                return new Speed(ve, next, onset(next / nu));
            }
            vt = next;
        }
        throw new IllegalArgumentException("the stall speed and the Reynolds numbers did not settle; "
                + "check the cl-max table against Reynolds number");
    }
}
