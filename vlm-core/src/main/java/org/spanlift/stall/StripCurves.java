package org.spanlift.stall;

import java.util.List;
import java.util.Map;
import java.util.NavigableMap;

import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.SectionBlend;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.input.Field;
import org.spanlift.input.RefusedException;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.Strip;
import org.spanlift.section.MeasuredLiftCurve;
import org.spanlift.section.PlainFlap;
import org.spanlift.section.ThinAirfoil;

/**
 * The section lift curve of every strip of {@link StripLimits} (the wing's strips outboard of the fuselage
 * side), at the strips' Reynolds numbers, and the zero-lift angle that the lattice gives each strip in
 * thin-airfoil form. A section with a measured lift curve uses it; one without gets a
 * {@link SyntheticCurve} from its lift slope, zero-lift angle and cl_max (assumed where allowed), and the
 * curves say so. Between stations the curves are blended as the sections are.
 */
public final class StripCurves {

    private final StripLimits limits;
    private final SectionCurve[] curves;
    private final double[] latticeZeroLift;
    private final boolean synthetic;
    private final boolean handbookFlap;
    private final boolean inviscidFlap;
    private final double[] lineSlope;
    private final double[] lineZeroLift;

    private StripCurves(StripLimits limits, SectionCurve[] curves, double[] latticeZeroLift, boolean synthetic,
            boolean handbookFlap, boolean inviscidFlap) {
        this.limits = limits;
        this.curves = curves;
        this.latticeZeroLift = latticeZeroLift;
        this.synthetic = synthetic;
        this.handbookFlap = handbookFlap;
        this.inviscidFlap = inviscidFlap;
        this.lineSlope = new double[curves.length];
        this.lineZeroLift = new double[curves.length];
        for (int i = 0; i < curves.length; i++) {
            lineZeroLift[i] = zeroCrossing(curves[i], latticeZeroLift[i]);
            lineSlope[i] = curves[i].slope(lineZeroLift[i]);
        }
    }

    /**
     * The curves of the wing's strips at the given deflections (rad, control order).
     *
     * @param reynoldsPerMetre rho V / mu at the flight condition (true speed), or 0 when unknown (measured
     *                         curves and cl_max tables are then read at their lowest Reynolds number)
     * @throws RefusedException beyond a section's measured flapped curves
     */
    public static StripCurves of(Wing wing, Lattice lattice, double[] deflections, StripLimits limits,
            double reynoldsPerMetre) {
        Surface main = wing.main();
        List<Integer> ids = limits.strips();
        int n = ids.size();
        SectionCurve[] curves = new SectionCurve[n];
        double[] zeta = new double[n];
        boolean synthetic = false;
        boolean handbookFlap = false;
        boolean inviscidFlap = false;
        for (int i = 0; i < n; i++) {
            Strip st = lattice.strips().get(ids.get(i));
            SectionBlend blend = main.planform().section(main.mirrored() ? Math.abs(st.y()) : st.y());
            Section a = wing.sections().get(blend.inner());
            Section b = wing.sections().get(blend.outer());
            double w = blend.weight();
            double re = reynoldsPerMetre * st.chord();
            zeta[i] = (1 - w) * zeroLift(a) + w * zeroLift(b);
            int last = st.firstPanel() + st.rows() - 1;
            int control = lattice.controlOf(last);
            double delta = control < 0 ? 0 : deflections[control] * lattice.controlSign(last);
            double chordFraction = control < 0 ? 0 : wing.controls().get(control).chordFraction();
            if (delta != 0) {
                zeta[i] -= PlainFlap.glauertTau(chordFraction) * delta;
            }
            SectionCurve clean;
            if (a.liftCurve().isEmpty() && b.liftCurve().isEmpty()) {
                synthetic = true;
                clean = new SyntheticCurve(limits.liftSlope(i), limits.zeroLiftAngle(i),
                        limits.clMax(i, re) - limits.flapIncrement(i));
            } else {
                synthetic |= a.liftCurve().isEmpty() || b.liftCurve().isEmpty();
                clean = SectionCurve.blend(curve(a, re, limits, i), curve(b, re, limits, i), w);
            }
            Section near = w < 0.5 ? a : b;
            if (delta == 0) {
                curves[i] = clean;
            } else if (delta > 0 && !near.flapLiftCurves().isEmpty()) {
                curves[i] = measuredFlapped(near, clean, Math.toDegrees(delta), re);
            } else {
                ControlSurface cs = wing.controls().get(control);
                boolean covered = FlapLift.covered(wing, cs, Math.abs(delta));
                handbookFlap |= covered;
                inviscidFlap |= !covered;
                curves[i] = flapped(clean, limits, i, cs, delta, near, covered);
            }
        }
        return new StripCurves(limits, curves, zeta, synthetic, handbookFlap, inviscidFlap);
    }

    /**
     * The clean curve moved by a plain flap's lift increment dcl_0 and raised by its cl_max increment
     * dcl_max: {@code clean(alpha + (dcl_0 - dcl_max) / a0) + dcl_max}, so the straight part gains dcl_0 and
     * the peak dcl_max, at an angle lower by (dcl_0 - dcl_max) / a0. Within the handbook data
     * ({@link FlapLift#covered}) dcl_0 is the handbook increment ({@link PlainFlap}); beyond them the
     * inviscid thin-airfoil one, 2 pi tau delta (flagged). dcl_max is the section's flap-cl-max table where
     * given, else the strip limits' increment. A deflection up (an aileron's) lowers both by the same rule
     * (an assumption of the project's: the handbook data are for deflections down).
     */
    private static SectionCurve flapped(SectionCurve clean, StripLimits limits, int i, ControlSurface control,
            double delta, Section near, boolean covered) {
        double size = Math.abs(delta);
        double sign = Math.signum(delta);
        double chord = control.chordFraction();
        double lift = sign * (covered ? PlainFlap.of(chord).liftIncrement(size)
                : 2 * Math.PI * PlainFlap.glauertTau(chord) * size);
        double peak = near.flapClMaxIncrement().isPresent() && delta > 0
                ? near.flapClMaxIncrement().get().at(Math.toDegrees(size))
                : sign * StripLimits.defaultIncrement(chord, size);
        return SectionCurve.shifted(clean, (lift - peak) / limits.liftSlope(i), peak);
    }

    /**
     * The measured curves of a flapped section, linear in deflection (degrees) between the given ones and
     * the clean curve at zero.
     *
     * @throws RefusedException beyond the largest deflection measured
     */
    private static SectionCurve measuredFlapped(Section near, SectionCurve clean, double deg, double re) {
        NavigableMap<Double, MeasuredLiftCurve> tables = near.flapLiftCurves();
        Map.Entry<Double, MeasuredLiftCurve> hi = tables.ceilingEntry(deg);
        if (hi == null) {
            throw new RefusedException("section " + near.name() + " gives flapped lift curves up to "
                    + Field.brief(tables.lastKey()) + " degrees, not " + Field.brief(deg));
        }
        SectionCurve upper = SectionCurve.table(hi.getValue().at(re));
        Map.Entry<Double, MeasuredLiftCurve> lo = tables.lowerEntry(deg);
        double from = lo == null ? 0 : lo.getKey();
        SectionCurve lower = lo == null ? clean : SectionCurve.table(lo.getValue().at(re));
        return SectionCurve.blend(lower, upper, (deg - from) / (hi.getKey() - from));
    }

    private static SectionCurve curve(Section s, double re, StripLimits limits, int i) {
        if (s.liftCurve().isPresent()) {
            return SectionCurve.table(s.liftCurve().get().at(re));
        }
        return new SyntheticCurve(s.liftSlope(), zeroLift(s), limits.clMax(i, re) - limits.flapIncrement(i));
    }

    /** The section's zero-lift angle as the lattice sees it: measured where given, else thin-airfoil, rad. */
    private static double zeroLift(Section s) {
        return s.measuredZeroLiftAngle().isPresent() ? s.measuredZeroLiftAngle().getAsDouble()
                : ThinAirfoil.zeroLiftAngle(s.camber());
    }

    /**
     * Replaces every curve by the thin-airfoil line of its strip, cl = 2 pi (alpha - alpha_0,lattice): the
     * section curve for which the coupled solution is the linear one.
     */
    public StripCurves thinAirfoilLines() {
        SectionCurve[] lines = new SectionCurve[latticeZeroLift.length];
        for (int i = 0; i < lines.length; i++) {
            lines[i] = SectionCurve.line(2 * Math.PI, latticeZeroLift[i]);
        }
        return new StripCurves(limits, lines, latticeZeroLift, false, false, false);
    }

    /** The lift slope of the straight part of wing strip i's curve, per radian: its slope at zero lift. */
    public double lineSlope(int i) {
        return lineSlope[i];
    }

    /** The zero-lift angle of wing strip i's curve, rad: where it crosses zero lift below its peak. */
    public double lineZeroLift(int i) {
        return lineZeroLift[i];
    }

    /** The zero crossing of a curve over the 40 degrees below its peak (bisection). */
    private static double zeroCrossing(SectionCurve f, double latticeZeroLift) {
        double hi = f.peakAngle();
        if (Double.isInfinite(hi)) {
            hi = latticeZeroLift + Math.PI / 4;
        }
        double lo = hi - Math.toRadians(40);
        for (int k = 0; k < 100 && hi - lo > 1e-15; k++) {
            double mid = 0.5 * (lo + hi);
            if (f.lift(mid) > 0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** The limits whose strips these curves follow. */
    public StripLimits limits() {
        return limits;
    }

    /** The curve of wing strip i (index into {@link StripLimits#strips()}). */
    public SectionCurve curve(int i) {
        return curves[i];
    }

    /**
     * The zero-lift angle of wing strip i in the lattice's thin-airfoil form, rad: the angle of attack of
     * the strip's chord line at which its lattice lift would vanish in two dimensions (the section's
     * measured or thin-airfoil zero-lift angle, less the thin-airfoil effect of a deflected control).
     */
    public double latticeZeroLift(int i) {
        return latticeZeroLift[i];
    }

    /** True when some deflected strip's curve follows the handbook plain-flap correction ({@link PlainFlap}). */
    public boolean handbookFlap() {
        return handbookFlap;
    }

    /**
     * True when some deflected strip's control lies outside the handbook data (chord fraction or deflection),
     * so its curve carries the inviscid flap lift.
     */
    public boolean inviscidFlap() {
        return inviscidFlap;
    }

    /** True when some strip's curve was built from lift slope, zero-lift angle and cl_max. */
    public boolean synthetic() {
        return synthetic;
    }
}
