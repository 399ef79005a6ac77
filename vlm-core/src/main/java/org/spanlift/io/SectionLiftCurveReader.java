package org.spanlift.io;

import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.NavigableMap;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

import org.spanlift.input.Field;
import org.spanlift.input.InputException;
import org.spanlift.section.MeasuredLiftCurve;
import org.spanlift.section.Table;

/**
 * Reads a section's measured lift curves, the keys {@code lift-curve} and {@code flap-lift-curves} of an entry
 * of a wing file's {@code sections}, checks them, and reconciles them with the section's other measured data.
 *
 * <p><b>Forms.</b> A curve is a mapping, in one of three forms:
 * <ul>
 * <li>{@code {alpha: [deg, ...], cl: [...]}}: one curve, without a Reynolds number;</li>
 * <li>{@code {reynolds: [...], alpha: [deg, ...], cl: [[...], [...]]}}: one cl list per Reynolds number, all
 * at the same angles;</li>
 * <li>{@code {file: name.csv}}: a CSV file relative to the wing file, one curve without a Reynolds number
 * ({@link LiftCurveFileReader} describes it).</li>
 * </ul>
 * {@code flap-lift-curves} is a list of such mappings, each with its {@code deflection} in degrees (trailing
 * edge down): the section with its flap deflected. The clean curve, at deflection 0, is {@code lift-curve},
 * which flap curves need.
 *
 * <p><b>Checks</b>, each refused with one line naming the file, the line and the field: angles from -90 to 90
 * degrees, strictly increasing, from {@value #MIN_ANGLES} to {@value #MAX_ANGLES} of them; |cl| at most 5;
 * one cl value per angle and one cl list per Reynolds number; Reynolds numbers from 1e3 to 1e9, strictly
 * increasing, at most {@value #MAX_REYNOLDS}; at most {@value #MAX_FLAP_CURVES} flap curves, deflections above
 * 0 and at most 60 degrees, strictly increasing. And at every Reynolds number the curve must have the shape of
 * a lift curve through the stall:
 * <ul>
 * <li>it must reach past its maximum: after the angle of the highest cl (the first, if it repeats) some angle
 * has a lower cl;</li>
 * <li>it must rise through zero lift below its maximum: some angle below the maximum's has cl at or below 0
 * and the next one cl above 0. The last such pair below the maximum holds the zero-lift angle (linear
 * interpolation at cl = 0), so a negative-stall region at low angles does not matter.</li>
 * </ul>
 *
 * <p><b>Agreement with the section's other data</b>, from the clean curve at its lowest Reynolds number:
 * <ul>
 * <li>zero-lift angle: the interpolated angle of zero lift above. Without {@code zero-lift-angle} the section
 * takes it (so the lattice's incidence correction, thin-airfoil zero-lift angle minus the measured one,
 * agrees with the curve), and it must then lie within -15 to 15 degrees as that key's values do; with it,
 * the two must agree within {@value #ZERO_LIFT_TOLERANCE_DEG} degree.</li>
 * <li>lift slope: the least-squares slope of the points from the last one at or below zero lift to the first
 * one at or above half the curve's maximum cl (both included, so at least two points). Without
 * {@code lift-slope} the section takes it, and it must lie within 0.03 to 0.13 per degree as that key's
 * values do; with it, the two must agree within 5% of the curve's.</li>
 * <li>cl_max: each curve's highest cl. Without {@code cl-max} the section takes the curve's maxima (a constant,
 * or a table against the curve's Reynolds numbers), which must lie within 0.3 to 4 as that key's values do, so
 * stall results work without further data; with it, at every Reynolds number of either table the cl-max
 * value and the maximum of the curve read there must agree within {@value #CL_MAX_TOLERANCE}.</li>
 * <li>flap increment: each flap curve's maximum (at its lowest Reynolds number) minus the clean curve's
 * maximum at that Reynolds number. Without {@code flap-cl-max} the section takes these increments, 0 at
 * deflection 0, each within 0 to 3 as that key's values are; with it, the table at each flap curve's
 * deflection must agree with the curve's increment within {@value #CL_MAX_TOLERANCE}.</li>
 * </ul>
 */
public final class SectionLiftCurveReader {

    /** Keys of {@code lift-curve}. */
    public static final Set<String> LIFT_CURVE_KEYS = Set.of("file", "reynolds", "alpha", "cl");
    /** Keys of each entry of {@code flap-lift-curves}. */
    public static final Set<String> FLAP_CURVE_KEYS = Set.of("deflection", "file", "reynolds", "alpha", "cl");

    /** Fewest angles of a curve. */
    public static final int MIN_ANGLES = 4;
    /** Most angles of a curve. */
    public static final int MAX_ANGLES = 1000;
    /** Most Reynolds numbers of a curve. */
    public static final int MAX_REYNOLDS = 50;
    /** Most flap curves of a section. */
    public static final int MAX_FLAP_CURVES = 20;
    /** Largest angle of attack in size, degrees. */
    public static final double ALPHA_LIMIT_DEG = 90;
    /** Largest |cl|. */
    public static final double CL_LIMIT = 5;
    /** Smallest Reynolds number accepted. */
    public static final double MIN_REYNOLDS = 1e3;
    /** Largest Reynolds number accepted. */
    public static final double MAX_REYNOLDS_NUMBER = 1e9;
    /** Largest flap deflection of a flap curve, degrees (the range of {@code flap-cl-max}). */
    public static final double MAX_FLAP_DEFLECTION_DEG = 60;
    /** Largest disagreement accepted between the curve's zero-lift angle and {@code zero-lift-angle}, degrees. */
    public static final double ZERO_LIFT_TOLERANCE_DEG = 0.5;
    /** Largest disagreement accepted between the curve's slope and {@code lift-slope}, a fraction of the former. */
    public static final double SLOPE_TOLERANCE = 0.05;
    /** Largest disagreement accepted between the curve's maxima and {@code cl-max} or {@code flap-cl-max}. */
    public static final double CL_MAX_TOLERANCE = 0.02;

    /** The ranges of the section keys whose values a curve gives when they are absent. */
    private static final double ZERO_LIFT_LIMIT_DEG = 15;
    private static final double MIN_SLOPE = 0.03;
    private static final double MAX_SLOPE = 0.13;
    private static final double MIN_CL_MAX = 0.3;
    private static final double MAX_CL_MAX = 4;
    private static final double MAX_FLAP_INCREMENT = 3;

    private SectionLiftCurveReader() {
    }

    /**
     * What the lift-curve keys give a section: its curves, and its measured values, given or taken from the
     * clean curve.
     *
     * @param zeroLiftDeg  the zero-lift angle, degrees, absent when neither given nor taken from a curve
     * @param slopePerDeg  the lift slope per degree, likewise
     */
    record Result(Optional<MeasuredLiftCurve> curve, NavigableMap<Double, MeasuredLiftCurve> flapCurves,
            OptionalDouble zeroLiftDeg, OptionalDouble slopePerDeg, Optional<Table> clMax, Optional<Table> flapClMax) {
    }

    /**
     * The shape of one curve at one Reynolds number.
     *
     * @param zeroLiftDeg the angle of zero lift, degrees
     * @param slopePerDeg the lift slope of the linear part, per degree
     * @param max         the highest cl
     * @param zero        index of the last point at or below zero lift below the maximum
     * @param half        index of the first point at or above half the maximum after {@code zero}
     * @param peak        index of the (first) highest cl
     */
    record Shape(double zeroLiftDeg, double slopePerDeg, double max, int zero, int half, int peak) {
    }

    /** A curve as read, with the shape of each of its Reynolds-number rows. */
    private record Read(LiftCurveTable table, Shape[] shapes) {
    }

    /**
     * Reads the section's {@code lift-curve} and {@code flap-lift-curves} and reconciles them with the values
     * the section gives (each already read and checked on its own).
     */
    static Result read(Field section, Path wingFile, OptionalDouble zeroLiftDeg, OptionalDouble slopePerDeg,
            Optional<Table> clMax, Optional<Table> flapClMax) {
        Optional<Field> cleanField = section.optional("lift-curve");
        Optional<Field> flapsField = section.optional("flap-lift-curves");
        if (cleanField.isEmpty()) {
            if (flapsField.isPresent()) {
                throw flapsField.get().error("flap lift curves need the clean one; expected lift-curve in this "
                        + "section too (the curve at deflection 0)");
            }
            return new Result(Optional.empty(), new TreeMap<>(), zeroLiftDeg, slopePerDeg, clMax, flapClMax);
        }
        Field cf = cleanField.get();
        cf.allowOnly(LIFT_CURVE_KEYS);
        Read clean = curve(cf, wingFile, "the lift curve");
        LiftCurveTable table = clean.table();
        Shape first = clean.shapes()[0];
        String lowest = table.hasReynolds() ? " (at its lowest Reynolds number, " + Field.brief(table.reynolds()[0])
                + ")" : "";

        if (zeroLiftDeg.isPresent()) {
            double given = zeroLiftDeg.getAsDouble();
            if (Math.abs(given - first.zeroLiftDeg()) > ZERO_LIFT_TOLERANCE_DEG) {
                throw section.required("zero-lift-angle", "").error("is " + Field.brief(given) + " degrees, but "
                        + table.name() + " crosses zero lift at " + Field.brief(first.zeroLiftDeg()) + " degrees"
                        + lowest + "; expected the two within " + Field.brief(ZERO_LIFT_TOLERANCE_DEG) + " degree, "
                        + "or leave zero-lift-angle out to take the curve's");
            }
        } else if (Math.abs(first.zeroLiftDeg()) > ZERO_LIFT_LIMIT_DEG) {
            throw table.place().at(0, first.zero() + 1, "the curve crosses zero lift at "
                    + Field.brief(first.zeroLiftDeg()) + " degrees; expected a zero-lift angle from -15 to 15 degrees "
                    + "(the range of zero-lift-angle)");
        }
        OptionalDouble zeroLift = zeroLiftDeg.isPresent() ? zeroLiftDeg : OptionalDouble.of(first.zeroLiftDeg());

        String linear = " over its linear part (least squares from " + Field.brief(table.alphaDeg()[first.zero()])
                + " to " + Field.brief(table.alphaDeg()[first.half()]) + " degrees" + (lowest.isEmpty() ? ""
                : ", at its lowest Reynolds number") + ")";
        if (slopePerDeg.isPresent()) {
            double given = slopePerDeg.getAsDouble();
            if (Math.abs(given - first.slopePerDeg()) > SLOPE_TOLERANCE * first.slopePerDeg()) {
                throw section.required("lift-slope", "").error("is " + Field.brief(given) + " per degree, but "
                        + table.name() + " rises at " + Field.brief(first.slopePerDeg()) + " per degree" + linear
                        + "; expected the two within " + Math.round(100 * SLOPE_TOLERANCE) + "%, or leave lift-slope "
                        + "out to take the curve's");
            }
        } else if (first.slopePerDeg() < MIN_SLOPE || first.slopePerDeg() > MAX_SLOPE) {
            throw table.place().at(0, first.half(), "the curve rises at " + Field.brief(first.slopePerDeg())
                    + " per degree" + linear + "; expected a lift slope from 0.03 to 0.13 per degree (the range of "
                    + "lift-slope)");
        }
        OptionalDouble slope = slopePerDeg.isPresent() ? slopePerDeg : OptionalDouble.of(first.slopePerDeg());

        MeasuredLiftCurve cleanModel = table.model();
        Optional<Table> sectionClMax;
        if (clMax.isPresent()) {
            agreeWithClMax(section.required("cl-max", ""), clMax.get(), table, cleanModel);
            sectionClMax = clMax;
        } else {
            double[] maxima = new double[clean.shapes().length];
            for (int r = 0; r < maxima.length; r++) {
                Shape s = clean.shapes()[r];
                maxima[r] = s.max();
                if (s.max() < MIN_CL_MAX || s.max() > MAX_CL_MAX) {
                    throw table.place().at(r, s.peak(), "the curve's maximum cl is " + Field.brief(s.max())
                            + "; expected a maximum from 0.3 to 4 (the range of cl-max)");
                }
            }
            sectionClMax = Optional.of(table.hasReynolds() ? new Table(table.reynolds(), maxima)
                    : Table.constant(maxima[0]));
        }

        NavigableMap<Double, MeasuredLiftCurve> flaps = new TreeMap<>();
        Optional<Table> sectionFlap = flapClMax;
        if (flapsField.isPresent()) {
            List<Field> items = flapsField.get().items();
            if (items.isEmpty()) {
                throw flapsField.get().error("an empty list; expected at least one flap curve {deflection, alpha, "
                        + "cl} or {deflection, file}, or leave flap-lift-curves out");
            }
            if (items.size() > MAX_FLAP_CURVES) {
                throw flapsField.get().error("expected at most " + MAX_FLAP_CURVES + " flap curves, got "
                        + items.size());
            }
            double[] deflection = new double[items.size() + 1];
            double[] increment = new double[items.size() + 1];
            for (int i = 0; i < items.size(); i++) {
                Field item = items.get(i);
                item.allowOnly(FLAP_CURVE_KEYS);
                Field d = item.required("deflection", "the flap deflection of this curve, degrees, trailing edge down");
                double deg = d.number();
                if (!(deg > 0) || deg > MAX_FLAP_DEFLECTION_DEG) {
                    throw d.error("must be above 0 and at most 60 degrees, got " + Field.brief(deg) + "; expected the "
                            + "flap deflection of this curve (the clean curve, at 0, is lift-curve)");
                }
                if (!(deg > deflection[i])) {
                    throw d.error("is " + Field.brief(deg) + " degrees, not above the previous curve's "
                            + Field.brief(deflection[i]) + "; expected deflections that increase strictly from one "
                            + "curve to the next");
                }
                Read flap = curve(item, wingFile, "the flap curve at " + Field.brief(deg) + " degrees");
                LiftCurveTable ft = flap.table();
                double re = ft.reynolds()[0];
                double cleanMax = max(cleanModel.at(re));
                Shape s = flap.shapes()[0];
                double inc = s.max() - cleanMax;
                if (flapClMax.isPresent()) {
                    double given = flapClMax.get().at(deg);
                    if (Math.abs(given - inc) > CL_MAX_TOLERANCE) {
                        throw section.required("flap-cl-max", "").error("gives an increment of " + Field.brief(given)
                                + " at " + Field.brief(deg) + " degrees, but " + ft.name() + " reaches "
                                + Field.brief(s.max()) + ", " + Field.brief(inc) + " above the clean curve's "
                                + Field.brief(cleanMax) + (ft.hasReynolds() ? " at Reynolds number "
                                + Field.brief(re) : "") + "; expected the two within " + Field.brief(CL_MAX_TOLERANCE)
                                + ", or leave flap-cl-max out to take the curves' increments");
                    }
                } else if (inc < 0 || inc > MAX_FLAP_INCREMENT) {
                    throw ft.place().at(0, s.peak(), "the curve's maximum cl, " + Field.brief(s.max()) + ", is "
                            + Field.brief(Math.abs(inc)) + (inc < 0 ? " below" : " above") + " the clean curve's "
                            + Field.brief(cleanMax) + "; expected a flap curve that raises cl_max by 0 to 3 (the range "
                            + "of flap-cl-max increments)");
                }
                deflection[i + 1] = deg;
                increment[i + 1] = inc;
                flaps.put(deg, ft.model());
            }
            if (flapClMax.isEmpty()) {
                sectionFlap = Optional.of(new Table(deflection, increment));
            }
        }
        return new Result(Optional.of(cleanModel), flaps, zeroLift, slope, sectionClMax, sectionFlap);
    }

    /**
     * Refuses a cl-max that disagrees with the curve: at every Reynolds number of either, the cl-max value and
     * the highest cl of the curve read there.
     */
    private static void agreeWithClMax(Field at, Table clMax, LiftCurveTable table, MeasuredLiftCurve curve) {
        TreeSet<Double> reynolds = new TreeSet<>();
        if (table.hasReynolds()) {
            for (double re : table.reynolds()) {
                reynolds.add(re);
            }
        }
        for (int i = 0; i < clMax.size(); i++) {
            reynolds.add(clMax.x(i));
        }
        for (double re : reynolds) {
            double given = clMax.at(re);
            double reached = max(curve.at(re));
            if (Math.abs(given - reached) > CL_MAX_TOLERANCE) {
                boolean named = re > 0 && (table.hasReynolds() || clMax.size() > 1);
                throw at.error("is " + Field.brief(given) + (named ? " at Reynolds number " + Field.brief(re) : "")
                        + ", but " + table.name() + " reaches at most " + Field.brief(reached) + (named ? " there" : "")
                        + "; expected the two within " + Field.brief(CL_MAX_TOLERANCE) + ", or leave cl-max out to "
                        + "take the curve's maxima");
            }
        }
    }

    private static double max(Table t) {
        double m = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < t.size(); i++) {
            m = Math.max(m, t.y(i));
        }
        return m;
    }

    /** One curve in any of its three forms, its values and shape checked. */
    private static Read curve(Field f, Path wingFile, String what) {
        LiftCurveTable table;
        if (f.has("file")) {
            if (f.has("alpha") || f.has("cl") || f.has("reynolds")) {
                throw f.error("both a file and a table; expected either file or the table (alpha and cl, with "
                        + "reynolds for several curves)");
            }
            Field c = f.required("file", "");
            Path folder = wingFile.toAbsolutePath().getParent();
            Path csv;
            try {
                csv = (folder == null ? Path.of(c.text()) : folder.resolve(c.text())).normalize();
            } catch (InvalidPathException e) {
                throw c.error("not a path this system accepts (" + e.getReason() + "); expected the path of a "
                        + LiftCurveFileReader.WHAT + ", relative to the wing file");
            }
            LiftCurveTable read;
            try {
                read = LiftCurveFileReader.parse(csv);
            } catch (InputException e) {
                throw c.error(e.getMessage());
            }
            LiftCurveTable.Place inFile = read.place();
            table = new LiftCurveTable(read.reynolds(), read.alphaDeg(), read.cl(),
                    (row, point, problem) -> c.error(inFile.at(row, point, problem).getMessage()),
                    what + " in " + Field.shown(c.text()));
        } else {
            table = inline(f, what);
        }
        return new Read(table, shape(table));
    }

    private static LiftCurveTable inline(Field f, String what) {
        double[] alpha = angles(f.required("alpha", "a list of strictly increasing angles of attack, degrees, with "
                + "cl (or file: a CSV file of the curve)"));
        Field clField = f.required("cl", "the lift coefficients, one per angle (with reynolds, one such list per "
                + "Reynolds number)");
        double[] reynolds;
        List<Field> rows;
        if (f.has("reynolds")) {
            reynolds = reynolds(f.required("reynolds", "a list of strictly increasing Reynolds numbers"));
            rows = clField.items();
            if (rows.size() != reynolds.length) {
                throw clField.error("expected one list of cl per Reynolds number (" + reynolds.length + "), got "
                        + rows.size());
            }
        } else {
            reynolds = new double[] {0};
            rows = List.of(clField);
        }
        double[][] cl = new double[rows.size()][];
        List<List<Field>> points = new ArrayList<>();
        for (int r = 0; r < rows.size(); r++) {
            List<Field> items = rows.get(r).items();
            if (items.size() != alpha.length) {
                throw rows.get(r).error("expected " + alpha.length + " values of cl, one per angle, got "
                        + items.size());
            }
            cl[r] = new double[alpha.length];
            for (int i = 0; i < alpha.length; i++) {
                cl[r][i] = items.get(i).inRange(-CL_LIMIT, CL_LIMIT);
            }
            points.add(items);
        }
        return new LiftCurveTable(reynolds, alpha, cl, (row, point, problem) -> points.get(row).get(point)
                .error(problem), what + " (line " + f.line() + ")");
    }

    private static double[] angles(Field f) {
        List<Field> items = f.items();
        if (items.size() < MIN_ANGLES || items.size() > MAX_ANGLES) {
            throw f.error("expected from " + MIN_ANGLES + " to " + MAX_ANGLES + " angles (through zero lift and past "
                    + "the maximum), got " + items.size());
        }
        return SectionReader.increasing(items, -ALPHA_LIMIT_DEG, ALPHA_LIMIT_DEG);
    }

    private static double[] reynolds(Field f) {
        List<Field> items = f.items();
        if (items.isEmpty() || items.size() > MAX_REYNOLDS) {
            throw f.error("expected from 1 to " + MAX_REYNOLDS + " Reynolds numbers, got " + items.size());
        }
        return SectionReader.increasing(items, MIN_REYNOLDS, MAX_REYNOLDS_NUMBER);
    }

    /**
     * Checks that every row of the curve reaches past its maximum and rises through zero lift below it, and
     * gives each row's zero-lift angle, linear slope and maximum (the rules of the class comment).
     */
    static Shape[] shape(LiftCurveTable t) {
        double[] a = t.alphaDeg();
        Shape[] out = new Shape[t.cl().length];
        for (int r = 0; r < out.length; r++) {
            double[] cl = t.cl()[r];
            int n = cl.length;
            int peak = 0;
            for (int i = 1; i < n; i++) {
                if (cl[i] > cl[peak]) {
                    peak = i;
                }
            }
            boolean falls = false;
            for (int i = peak + 1; i < n; i++) {
                falls |= cl[i] < cl[peak];
            }
            String at = t.hasReynolds() ? " at Reynolds number " + Field.brief(t.reynolds()[r]) : "";
            if (!falls) {
                throw t.place().at(r, n - 1, "the curve" + at + " ends without falling past its maximum (its highest "
                        + "cl, " + Field.brief(cl[peak]) + " at " + Field.brief(a[peak]) + " degrees, has no lower cl "
                        + "after it); expected the curve to reach past its maximum, to angles where cl falls");
            }
            int zero = -1;
            for (int i = peak - 1; i >= 0 && zero < 0; i--) {
                if (cl[i] <= 0 && cl[i + 1] > 0) {
                    zero = i;
                }
            }
            if (zero < 0) {
                throw t.place().at(r, 0, "the curve" + at + " does not rise through zero lift below its maximum (no "
                        + "angle below " + Field.brief(a[peak]) + " degrees has cl at or below 0 with cl above 0 "
                        + "at the "
                        + "next); expected the curve to start at or below zero lift, so that it holds its zero-lift "
                        + "angle");
            }
            double zeroLift = a[zero] - cl[zero] * (a[zero + 1] - a[zero]) / (cl[zero + 1] - cl[zero]);
            int half = zero + 1;
            while (cl[half] < 0.5 * cl[peak]) {
                half++;
            }
            double meanA = 0;
            double meanCl = 0;
            int m = half - zero + 1;
            for (int i = zero; i <= half; i++) {
                meanA += a[i] / m;
                meanCl += cl[i] / m;
            }
            double sxy = 0;
            double sxx = 0;
            for (int i = zero; i <= half; i++) {
                sxy += (a[i] - meanA) * (cl[i] - meanCl);
                sxx += (a[i] - meanA) * (a[i] - meanA);
            }
            out[r] = new Shape(zeroLift, sxy / sxx, cl[peak], zero, half, peak);
        }
        return out;
    }
}
