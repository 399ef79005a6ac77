package org.spanlift.validation.engine;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.Vec3;
import org.spanlift.geometry.Wing;
import org.spanlift.validation.wings.Wings;

/**
 * A seeded random mirrored wing for the property tests: a swept, tapered, twisted wing with dihedral and a
 * cambered section, often a flap and an aileron, sometimes a horizontal tail aft and above it, on a small
 * lattice (6-10 strips x 2-4 rows), plus a random flight condition. The same seed always gives the same
 * wing.
 */
record RandomWing(long seed, Trapezoid main, Trapezoid tail, List<ControlSurface> controls, LatticeSpec lattice,
        double alpha, double[] deflections) {

    private static final String[] SECTIONS = {"flat", "NACA 2412", "NACA 4415", "NACA 0012", "NACA 6409"};

    static RandomWing draw(long seed) {
        Random r = new Random(seed);
        double span = uniform(r, 4, 16);
        double rootChord = uniform(r, 0.6, 2.0);
        Trapezoid main = new Trapezoid(span, rootChord, uniform(r, 0.3, 1), deg(uniform(r, -15, 35)),
                deg(uniform(r, -4, 8)), deg(uniform(r, -2, 3)), deg(uniform(r, -1, 4)),
                SECTIONS[r.nextInt(SECTIONS.length)], uniform(r, -1, 1), uniform(r, -0.5, 0.5));
        double s = 0.5 * span;
        List<ControlSurface> controls = new ArrayList<>();
        if (r.nextDouble() < 0.7) {
            controls.add(new ControlSurface("flap", ControlKind.FLAP, uniform(r, 0, 0.2) * s,
                    uniform(r, 0.35, 0.55) * s, uniform(r, 0.2, 0.35), 0));
        }
        if (r.nextDouble() < 0.7) {
            controls.add(new ControlSurface("aileron", ControlKind.AILERON, uniform(r, 0.6, 0.7) * s,
                    uniform(r, 0.85, 1.0) * s, uniform(r, 0.2, 0.3), 0));
        }
        Trapezoid tail = null;
        if (r.nextDouble() < 0.3) {
            double tailSpan = uniform(r, 0.3, 0.4) * span;
            tail = new Trapezoid(tailSpan, uniform(r, 0.4, 0.7) * rootChord, uniform(r, 0.5, 1),
                    deg(uniform(r, 0, 20)), 0, deg(uniform(r, -3, 0)), 0, "NACA 0012",
                    main.rootNoseX() + uniform(r, 3, 4) * rootChord, main.rootNoseZ() + uniform(r, 0.3, 0.8));
        }
        Spacing[] spacings = Spacing.values();
        LatticeSpec lattice = new LatticeSpec(6 + r.nextInt(5), 2 + r.nextInt(3),
                spacings[r.nextInt(spacings.length)], spacings[r.nextInt(spacings.length)]);
        double[] deflections = new double[controls.size()];
        for (int i = 0; i < deflections.length; i++) {
            deflections[i] = deg(uniform(r, -15, 25));
        }
        return new RandomWing(seed, main, tail, controls, lattice, deg(uniform(r, -5, 15)), deflections);
    }

    private static double uniform(Random r, double lo, double hi) {
        return lo + (hi - lo) * r.nextDouble();
    }

    private static double deg(double degrees) {
        return Math.toRadians(degrees);
    }

    /** The wing, referred to the main surface's default reference values. */
    Wing wing() {
        return Wings.of("random " + seed, surfaces());
    }

    /** The wing with explicitly given reference values. */
    Wing wing(Reference reference) {
        return Wings.of("random " + seed, surfaces(), reference);
    }

    private List<Surface> surfaces() {
        List<Surface> surfaces = new ArrayList<>();
        surfaces.add(main.surface("wing", controls, lattice));
        if (tail != null) {
            surfaces.add(tail.surface("tail", List.of(),
                    new LatticeSpec(6, 2, lattice.stripSpacing(), lattice.rowSpacing())));
        }
        return surfaces;
    }

    /** True when an aileron is present. */
    boolean hasAileron() {
        return controls.stream().anyMatch(c -> c.kind() == ControlKind.AILERON);
    }

    /** The deflections with every aileron at zero (a symmetric condition). */
    double[] symmetricDeflections() {
        double[] d = deflections.clone();
        for (int i = 0; i < d.length; i++) {
            if (controls.get(i).kind() == ControlKind.AILERON) {
                d[i] = 0;
            }
        }
        return d;
    }

    /** Every length multiplied by k: surfaces, control spans; angles and chord fractions unchanged. */
    RandomWing scaled(double k) {
        List<ControlSurface> c = controls.stream().map(x -> new ControlSurface(x.name(), x.kind(), k * x.from(),
                k * x.to(), x.chordFraction(), x.deflection())).toList();
        return new RandomWing(seed, scaled(main, k), tail == null ? null : scaled(tail, k), c, lattice, alpha,
                deflections);
    }

    /** The whole wing moved by (dx, 0, dz). */
    RandomWing translated(double dx, double dz) {
        return new RandomWing(seed, translated(main, dx, dz), tail == null ? null : translated(tail, dx, dz),
                controls, lattice, alpha, deflections);
    }

    /** The same shape with every length multiplied by k (angles unchanged). */
    private static Trapezoid scaled(Trapezoid t, double k) {
        return new Trapezoid(k * t.span(), k * t.rootChord(), t.taper(), t.quarterChordSweep(), t.dihedral(),
                t.rootTwist(), t.washout(), t.section(), k * t.rootNoseX(), k * t.rootNoseZ());
    }

    /** The same shape moved by (dx, 0, dz). */
    private static Trapezoid translated(Trapezoid t, double dx, double dz) {
        return new Trapezoid(t.span(), t.rootChord(), t.taper(), t.quarterChordSweep(), t.dihedral(), t.rootTwist(),
                t.washout(), t.section(), t.rootNoseX() + dx, t.rootNoseZ() + dz);
    }

    /** The reference values scaled by k (area by k^2, lengths and moment point by k). */
    static Reference scaled(Reference r, double k) {
        return new Reference(k * k * r.area(), k * r.span(), k * r.chord(), r.momentPoint().times(k));
    }

    /** The reference values with the moment point moved by (dx, 0, dz). */
    static Reference translated(Reference r, double dx, double dz) {
        return new Reference(r.area(), r.span(), r.chord(), r.momentPoint().plus(new Vec3(dx, 0, dz)));
    }
}
