package org.spanlift.geometry;

import java.util.List;

/**
 * An elliptic mirrored planform with a straight, unswept quarter-chord line, described on its right half
 * from the root (y = 0) to the tip (y = semiSpan). SI units and radians; wing axes: x aft, y toward the
 * right tip, z up. Chord c(y) = c0 sqrt(1 - (y/s)^2), leading edge at x = x0 + c0/4 - c(y)/4, height
 * z = z0 + |y| tan(dihedral), twist (positive nose-up) linear in y from rootTwist at the root to
 * rootTwist - washout at the tip.
 *
 * @param semiSpan    half the tip-to-tip span, m (positive)
 * @param rootChord   c0, the chord at y = 0, m (positive)
 * @param rootNoseX   x0, x of the root leading edge, m
 * @param rootNoseZ   z0, z of the root leading edge, m
 * @param dihedral    dihedral of the leading edge, rad, positive with the tip up
 * @param rootTwist   twist at the root, rad, positive nose-up
 * @param washout     root twist minus tip twist, rad
 * @param sectionName name of the section of the whole span, a key of the wing's section map
 */
public record EllipticPlanform(double semiSpan, double rootChord, double rootNoseX, double rootNoseZ,
        double dihedral, double rootTwist, double washout, String sectionName) implements Planform {

    /** Checks that the semi-span and root chord are positive and a section is named. */
    public EllipticPlanform {
        if (!(semiSpan > 0) || !(rootChord > 0)) {
            throw new IllegalArgumentException("an elliptic planform needs a positive span and root chord");
        }
        if (sectionName == null) {
            throw new IllegalArgumentException("an elliptic planform needs a section name");
        }
    }

    @Override
    public double yStart() {
        return 0;
    }

    @Override
    public double yEnd() {
        return semiSpan;
    }

    @Override
    public double chord(double y) {
        double eta = Math.min(1, Math.abs(y) / semiSpan);
        return rootChord * Math.sqrt(Math.max(0, 1 - eta * eta));
    }

    @Override
    public double noseX(double y) {
        return rootNoseX + 0.25 * (rootChord - chord(y));
    }

    @Override
    public double noseZ(double y) {
        return rootNoseZ + Math.abs(y) * Math.tan(dihedral);
    }

    @Override
    public double twist(double y) {
        return rootTwist - washout * Math.abs(y) / semiSpan;
    }

    @Override
    public SectionBlend section(double y) {
        return SectionBlend.of(sectionName);
    }

    @Override
    public List<String> sectionNames() {
        return List.of(sectionName);
    }

    @Override
    public List<Double> stationYs() {
        return List.of(0.0, semiSpan);
    }

    @Override
    public double area() {
        return Math.PI * rootChord * semiSpan / 4;
    }

    @Override
    public double chordSquaredIntegral() {
        return 2.0 / 3.0 * rootChord * rootChord * semiSpan;
    }

    @Override
    public double chordNoseXIntegral() {
        // integral of c (x0 + c0/4 - c/4) dy
        return (rootNoseX + 0.25 * rootChord) * area() - 0.25 * chordSquaredIntegral();
    }

    @Override
    public double chordYIntegral() {
        return rootChord * semiSpan * semiSpan / 3;
    }

    @Override
    public double chordNoseZIntegral() {
        return rootNoseZ * area() + Math.tan(dihedral) * chordYIntegral();
    }

    @Override
    public EllipticPlanform withWashoutChange(double change) {
        return new EllipticPlanform(semiSpan, rootChord, rootNoseX, rootNoseZ, dihedral, rootTwist, washout + change,
                sectionName);
    }
}
