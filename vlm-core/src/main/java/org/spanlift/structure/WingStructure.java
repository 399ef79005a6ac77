package org.spanlift.structure;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The structural description of the wing (the first surface) that the loads need: where the spar line is,
 * and the masses whose inertia relieves the air load. Composed beside the {@code Wing}, read from the same
 * file's {@code structure} section. SI units.
 *
 * @param sparFraction       chord fraction of the spar line (the bending and torsion axis), 0..1
 * @param massCentreFraction chord fraction of the centre line of the wing's distributed mass, 0..1
 * @param wingMass           the whole wing's distributed mass, both halves, kg, spread over each half in
 *                           proportion to the local chord; empty when a mass table is given instead
 * @param table              mass per unit span of one half instead of {@code wingMass}
 * @param pointMasses        concentrated masses on the right half, mirrored on the left
 * @param longitudinalAxis   the angle of the airplane's longitudinal axis above the wing file's x axis, nose-up
 *                           positive, rad; empty for the wing's root chord line (the default). The load factor
 *                           is the aerodynamic force normal to this axis over the weight
 */
public record WingStructure(double sparFraction, double massCentreFraction, Optional<Double> wingMass,
        Optional<MassTable> table, List<PointMass> pointMasses, OptionalDouble longitudinalAxis) {

    /** Default chord fraction of the spar line. */
    public static final double DEFAULT_SPAR = 0.35;
    /** Default chord fraction of the distributed mass's centre line. */
    public static final double DEFAULT_MASS_CENTRE = 0.40;

    /** No masses, spar and mass centre at their defaults. */
    public static final WingStructure NONE = new WingStructure(DEFAULT_SPAR, DEFAULT_MASS_CENTRE, Optional.empty(),
            Optional.empty(), List.of());

    /** A structure whose longitudinal axis is the wing's root chord line. */
    public WingStructure(double sparFraction, double massCentreFraction, Optional<Double> wingMass,
            Optional<MassTable> table, List<PointMass> pointMasses) {
        this(sparFraction, massCentreFraction, wingMass, table, pointMasses, OptionalDouble.empty());
    }

    /**
     * Checks the values (chord fractions from 0 to 1, not both a wing mass and a table, a finite mass not
     * negative, a longitudinal axis within 30 degrees) and copies the point masses.
     */
    public WingStructure {
        if (!(sparFraction >= 0 && sparFraction <= 1) || !(massCentreFraction >= 0 && massCentreFraction <= 1)) {
            throw new IllegalArgumentException("chord fractions must be from 0 to 1");
        }
        if (wingMass.isPresent() && table.isPresent()) {
            throw new IllegalArgumentException("give a wing mass or a mass table, not both");
        }
        wingMass.ifPresent(m -> {
            if (!(m >= 0) || !Double.isFinite(m)) {
                throw new IllegalArgumentException("the wing mass must not be negative");
            }
        });
        pointMasses = List.copyOf(pointMasses);
        if (longitudinalAxis.isPresent() && !(Math.abs(longitudinalAxis.getAsDouble()) <= Math.toRadians(30))) {
            throw new IllegalArgumentException("the longitudinal axis must lie within 30 degrees of the x axis");
        }
    }

    /** A copy whose distributed mass is {@code kg} for the whole wing, spread by chord (the table dropped). */
    public WingStructure withWingMass(double kg) {
        return new WingStructure(sparFraction, massCentreFraction, Optional.of(kg), Optional.empty(), pointMasses,
                longitudinalAxis);
    }

    /** True when some mass (distributed or point) is given. */
    public boolean hasMass() {
        return wingMass.map(m -> m > 0).orElse(false) || table.isPresent()
                || pointMasses.stream().anyMatch(p -> p.mass() > 0);
    }

    /** The point masses' total on one side, kg. */
    public double pointMassPerSide() {
        return pointMasses.stream().mapToDouble(PointMass::mass).sum();
    }
}
