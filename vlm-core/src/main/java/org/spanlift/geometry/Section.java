package org.spanlift.geometry;

import java.util.Collections;
import java.util.NavigableMap;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeMap;

import org.spanlift.section.CamberLine;
import org.spanlift.section.MeasuredLiftCurve;
import org.spanlift.section.ProfileDragPolar;
import org.spanlift.section.Table;

/**
 * An airfoil section: its mean line and the measured data the user gives. Angles in radians.
 *
 * @param name                the section's name in the wing file
 * @param camber              the mean line (enters the lattice as the camber-line slope)
 * @param incidenceCorrection added to every panel of the section: zero, or the thin-airfoil zero-lift angle
 *                            minus a measured one
 * @param liftSlope           section lift slope per radian (2 pi unless measured); used where the stall
 *                            analysis converts between cl and section angle of attack, not in the lattice
 * @param clMax               section maximum lift coefficient against Reynolds number (a one-point table for
 *                            a constant), absent when not given
 * @param flapClMaxIncrement  increase of cl_max against flap deflection in degrees on flapped stations,
 *                            absent when not given (a handbook default then applies)
 * @param dragPolar           profile drag polar, absent when not given
 * @param measuredZeroLiftAngle the measured zero-lift angle, rad, absent when not given
 * @param liftCurve           the measured lift curve through the stall, absent when not given
 * @param flapLiftCurves      measured lift curves of the section with its flap deflected, by deflection in
 *                            degrees (empty when none)
 */
public record Section(String name, CamberLine camber, double incidenceCorrection, double liftSlope,
        Optional<Table> clMax, Optional<Table> flapClMaxIncrement, Optional<ProfileDragPolar> dragPolar,
        OptionalDouble measuredZeroLiftAngle, Optional<MeasuredLiftCurve> liftCurve,
        NavigableMap<Double, MeasuredLiftCurve> flapLiftCurves) {

    /** Keeps the flap lift curves in an unmodifiable copy sorted by deflection. */
    public Section {
        flapLiftCurves = Collections.unmodifiableNavigableMap(new TreeMap<>(flapLiftCurves));
    }

    /** A section without measured lift curves. */
    public Section(String name, CamberLine camber, double incidenceCorrection, double liftSlope,
            Optional<Table> clMax, Optional<Table> flapClMaxIncrement, Optional<ProfileDragPolar> dragPolar,
            OptionalDouble measuredZeroLiftAngle) {
        this(name, camber, incidenceCorrection, liftSlope, clMax, flapClMaxIncrement, dragPolar,
                measuredZeroLiftAngle, Optional.empty(), new TreeMap<>());
    }

    /** Thin-airfoil lift slope, per radian. */
    public static final double THIN_AIRFOIL_SLOPE = 2 * Math.PI;

    /** A section with a mean line only. */
    public static Section of(String name, CamberLine camber) {
        return new Section(name, camber, 0, THIN_AIRFOIL_SLOPE, Optional.empty(), Optional.empty(), Optional.empty(),
                OptionalDouble.empty());
    }

    /** The same section with the given cl_max against Reynolds number. */
    public Section withClMax(Table table) {
        return new Section(name, camber, incidenceCorrection, liftSlope, Optional.of(table), flapClMaxIncrement,
                dragPolar, measuredZeroLiftAngle, liftCurve, flapLiftCurves);
    }
}
