package org.spanlift.stall;

import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.SectionBlend;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.input.Field;
import org.spanlift.input.RefusedException;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.Strip;
import org.spanlift.section.PlainFlap;
import org.spanlift.section.Table;
import org.spanlift.section.ThinAirfoil;

/**
 * Section cl_max of every strip of the wing (the first surface), from the section data interpolated
 * linearly between stations, at the strip's Reynolds number, raised on flapped strips by the flap's
 * cl_max increment.
 *
 * <p>Without an increment table, a deflected plain flap raises cl_max by {@link PlainFlap#clMaxIncrement}
 * (the handbook value 0.9 for a 25% flap at 60 degrees, scaled with the handbook-corrected lift increment)
 * within the chord fractions and deflections its data cover; beyond them by the handbook value taken at
 * 60 degrees and scaled linearly below it, and by the flap chord over 25% of the chord where the flap is
 * smaller. Either is far below the inviscid lift increment.
 */
public final class StripLimits {

    /**
     * The cl_max assumed, when asked, for sections that give none: deliberately below what ordinary
     * sections reach at light-aircraft Reynolds numbers, so that stall speeds come out high rather than low
     * (the safe direction); the outputs flag it.
     */
    public static final double CONSERVATIVE_CL_MAX = 1.2;

    /** Plain-flap cl_max increment at full deflection (handbook value, see the class notes). */
    public static final double PLAIN_FLAP_INCREMENT = 0.9;
    /** The deflection taken as full for {@link #PLAIN_FLAP_INCREMENT}, degrees. */
    public static final double PLAIN_FLAP_FULL_DEFLECTION_DEG = 60;
    /** The flap chord fraction the handbook value refers to. */
    public static final double PLAIN_FLAP_REFERENCE_CHORD = 0.25;

    private final List<Integer> strips;
    private final Table[] innerClMax;
    private final Table[] outerClMax;
    private final double[] weight;
    private final double[] increment;
    private final String[] section;
    private final double[] liftSlope;
    private final double[] zeroLiftAngle;
    private final boolean assumed;
    private final boolean defaultFlapIncrement;

    private StripLimits(List<Integer> strips, Table[] inner, Table[] outer, double[] weight, double[] increment,
            String[] section, double[] liftSlope, double[] zeroLiftAngle, boolean assumed,
            boolean defaultFlapIncrement) {
        this.liftSlope = liftSlope;
        this.zeroLiftAngle = zeroLiftAngle;
        this.strips = strips;
        this.innerClMax = inner;
        this.outerClMax = outer;
        this.weight = weight;
        this.increment = increment;
        this.section = section;
        this.assumed = assumed;
        this.defaultFlapIncrement = defaultFlapIncrement;
    }

    /**
     * The limits of the wing's strips at the given deflections (rad, control order).
     *
     * @param assumedClMax a cl_max for sections that give none, or empty to refuse them
     * @throws MissingSectionDataException when a section has no cl_max and none is assumed
     * @throws RefusedException when no strip of the wing lies outboard of the fuselage side
     */
    public static StripLimits of(Wing wing, Lattice lattice, double[] deflections, OptionalDouble assumedClMax) {
        Surface main = wing.main();
        List<ControlSurface> controls = wing.controls();
        List<Integer> ids = new ArrayList<>();
        for (int k = 0; k < lattice.strips().size(); k++) {
            Strip st = lattice.strips().get(k);
            if (st.surface() == 0 && !main.insideFuselage(st.y())) {
                ids.add(k);
            }
        }
        int n = ids.size();
        if (n == 0) {
            throw new RefusedException("no strip of the wing lies outboard of the fuselage side (fuselage "
                    + "half-width " + Field.brief(main.fuselageHalfWidth()) + " m), so no station can stall; check "
                    + "the fuselage half-width against the semi-span and the strips");
        }
        Table[] inner = new Table[n];
        Table[] outer = new Table[n];
        double[] w = new double[n];
        double[] inc = new double[n];
        String[] names = new String[n];
        double[] slope = new double[n];
        double[] alpha0 = new double[n];
        boolean assumed = false;
        boolean defaultIncrement = false;
        List<String> missing = new ArrayList<>();
        Map<Section, Double> zeroLift = new IdentityHashMap<>(); // one quadrature per section, not per strip
        for (int i = 0; i < n; i++) {
            Strip st = lattice.strips().get(ids.get(i));
            double y = Math.abs(st.y());
            SectionBlend blend = main.planform().section(main.mirrored() ? y : st.y());
            Section a = wing.sections().get(blend.inner());
            Section b = wing.sections().get(blend.outer());
            for (Section s : List.of(a, b)) {
                if (s.clMax().isEmpty() && assumedClMax.isEmpty() && !missing.contains(s.name())) {
                    missing.add(s.name());
                }
            }
            assumed |= a.clMax().isEmpty() || b.clMax().isEmpty();
            Table fallback = assumedClMax.isPresent() ? Table.constant(assumedClMax.getAsDouble()) : null;
            inner[i] = a.clMax().orElse(fallback);
            outer[i] = b.clMax().orElse(fallback);
            w[i] = blend.weight();
            names[i] = blend.weight() < 0.5 ? blend.inner() : blend.outer();
            slope[i] = (1 - w[i]) * a.liftSlope() + w[i] * b.liftSlope();
            alpha0[i] = (1 - w[i]) * zeroLift.computeIfAbsent(a, StripLimits::zeroLift)
                    + w[i] * zeroLift.computeIfAbsent(b, StripLimits::zeroLift);
            int c = flapAt(main, controls, y);
            if (c >= 0 && deflections[c] > 0) {
                double deg = Math.toDegrees(deflections[c]);
                Section near = blend.weight() < 0.5 ? a : b;
                if (near.flapClMaxIncrement().isPresent()) {
                    inc[i] = near.flapClMaxIncrement().get().at(deg);
                } else {
                    defaultIncrement = true;
                    inc[i] = defaultIncrement(controls.get(c).chordFraction(), deflections[c]);
                }
            }
        }
        if (!missing.isEmpty()) {
            throw new MissingSectionDataException(missing);
        }
        return new StripLimits(List.copyOf(ids), inner, outer, w, inc, names, slope, alpha0, assumed,
                defaultIncrement);
    }

    /**
     * The handbook cl_max increment of a plain flap ({@link PlainFlap#clMaxIncrement}) within the chord
     * fractions and deflections its data cover; beyond them the handbook value at full deflection scaled
     * linearly with deflection and flap chord (the conservative rule of the class notes).
     */
    static double defaultIncrement(double chordFraction, double deflection) {
        if (PlainFlap.coversChordFraction(chordFraction)) {
            PlainFlap flap = PlainFlap.of(chordFraction);
            if (flap.covers(deflection)) {
                return flap.clMaxIncrement(deflection);
            }
        }
        double chordScale = Math.min(1, chordFraction / PLAIN_FLAP_REFERENCE_CHORD);
        return PLAIN_FLAP_INCREMENT * Math.min(1, Math.toDegrees(deflection) / PLAIN_FLAP_FULL_DEFLECTION_DEG)
                * chordScale;
    }

    /** The section's zero-lift angle: the measured one where given, else thin-airfoil theory's, rad. */
    private static double zeroLift(Section s) {
        return s.measuredZeroLiftAngle().isPresent() ? s.measuredZeroLiftAngle().getAsDouble()
                : ThinAirfoil.zeroLiftAngle(s.camber());
    }

    private static int flapAt(Surface main, List<ControlSurface> controls, double y) {
        for (int c = 0; c < controls.size(); c++) {
            ControlSurface cs = controls.get(c);
            if (cs.kind() == ControlKind.FLAP && main.controls().contains(cs) && y > cs.from() && y < cs.to()) {
                return c;
            }
        }
        return -1;
    }

    /** The lattice strip indices of the wing, in lattice order. */
    public List<Integer> strips() {
        return strips;
    }

    /** cl_max of wing strip i (index into {@link #strips()}) at Reynolds number re. */
    public double clMax(int i, double re) {
        return (1 - weight[i]) * innerClMax[i].at(re) + weight[i] * outerClMax[i].at(re) + increment[i];
    }

    /** The flap's cl_max increment on wing strip i. */
    public double flapIncrement(int i) {
        return increment[i];
    }

    /**
     * The effective section angle of attack (rad) at which wing strip i carries section lift cl:
     * alpha_0 + cl / a0, with the section's lift slope a0 (measured where given, else 2 pi) and its zero-lift
     * angle (measured, else thin-airfoil theory). On a flapped strip the flap's lift counts as angle.
     */
    public double sectionAngle(int i, double cl) {
        return zeroLiftAngle[i] + cl / liftSlope[i];
    }

    /** The section lift slope of wing strip i, per radian (measured where given, else 2 pi). */
    public double liftSlope(int i) {
        return liftSlope[i];
    }

    /** The section zero-lift angle of wing strip i, rad (measured where given, else thin-airfoil). */
    public double zeroLiftAngle(int i) {
        return zeroLiftAngle[i];
    }

    /** The name of the section nearest to wing strip i. */
    public String section(int i) {
        return section[i];
    }

    /** True when some strip uses an assumed cl_max rather than section data. */
    public boolean assumed() {
        return assumed;
    }

    /** True when some flapped strip uses the handbook default increment. */
    public boolean defaultFlapIncrement() {
        return defaultFlapIncrement;
    }
}
