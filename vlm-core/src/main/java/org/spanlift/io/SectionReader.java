package org.spanlift.io;

import org.spanlift.input.Field;
import org.spanlift.input.InputException;
import org.spanlift.input.YamlValue;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import org.spanlift.geometry.Section;
import org.spanlift.section.CamberLine;
import org.spanlift.section.CamberLines;
import org.spanlift.section.ProfileDragPolar;
import org.spanlift.section.Table;
import org.spanlift.section.ThinAirfoil;

/**
 * Reads one entry of a wing file's {@code sections} mapping: the mean line ({@code camber} or
 * {@code camber-file}) and the measured data ({@code zero-lift-angle}, {@code lift-slope}, {@code cl-max},
 * {@code flap-cl-max}, {@code drag-polar}) and the measured lift curves ({@code lift-curve},
 * {@code flap-lift-curves}, read by {@link SectionLiftCurveReader}, which also takes the zero-lift angle, lift
 * slope, cl_max and flap increments from them where the section gives none).
 */
public final class SectionReader {

    /** Keys accepted in each entry of a wing file's {@code sections}. */
    public static final Set<String> KEYS = Set.of("camber", "camber-file", "zero-lift-angle", "lift-slope", "cl-max",
            "flap-cl-max", "drag-polar", "lift-curve", "flap-lift-curves");
    /** Keys of a {@code cl-max} given as a table against Reynolds number. */
    public static final Set<String> CL_MAX_TABLE_KEYS = Set.of("reynolds", "values");
    /** Keys of {@code flap-cl-max}. */
    public static final Set<String> FLAP_KEYS = Set.of("deflection", "increment");
    /** Keys of {@code drag-polar}. */
    public static final Set<String> POLAR_KEYS = Set.of("reynolds", "cl", "cd");

    private SectionReader() {
    }

    /**
     * @param wingFile the wing file, against whose folder a {@code camber-file} path is resolved
     */
    static Section read(Field f, String name, Path wingFile) {
        f.allowOnly(KEYS);
        if (f.has("camber") && f.has("camber-file")) {
            throw f.error("give either camber or camber-file, not both");
        }
        CamberLine camber = f.optional("camber").map(SectionReader::camber)
                .orElseGet(() -> f.optional("camber-file").<CamberLine>map(c -> {
            Path folder = wingFile.toAbsolutePath().getParent();
            Path coordinates;
            try {
                coordinates = (folder == null ? Path.of(c.text()) : folder.resolve(c.text())).normalize();
            } catch (InvalidPathException e) {
                throw c.error("not a path this system accepts (" + e.getReason() + "); expected the path of a text "
                        + "file of x y section coordinates, relative to the wing file");
            }
            try {
                return CoordinateFileReader.read(coordinates);
            } catch (InputException e) {
                throw c.error(e.getMessage());
            }
        }).orElseGet(() -> CamberLines.parse("flat")));

        OptionalDouble zeroLiftDeg = f.optional("zero-lift-angle")
                .map(z -> OptionalDouble.of(z.inRange(-15, 15))).orElse(OptionalDouble.empty());
        OptionalDouble slopePerDeg = f.optional("lift-slope")
                .map(s -> OptionalDouble.of(s.inRange(0.03, 0.13))).orElse(OptionalDouble.empty());
        Optional<Table> clMax = f.optional("cl-max").map(SectionReader::clMax);
        Optional<Table> flap = f.optional("flap-cl-max").map(SectionReader::flapIncrement);
        Optional<ProfileDragPolar> polar = f.optional("drag-polar").map(SectionReader::polar);
        // The measured curves, and the values the section takes from them where it gives none.
        SectionLiftCurveReader.Result curves = SectionLiftCurveReader.read(f, wingFile, zeroLiftDeg, slopePerDeg,
                clMax, flap);
        OptionalDouble measuredZeroLift = curves.zeroLiftDeg().isPresent()
                ? OptionalDouble.of(Math.toRadians(curves.zeroLiftDeg().getAsDouble())) : OptionalDouble.empty();
        double correction = measuredZeroLift.isPresent()
                ? ThinAirfoil.zeroLiftAngle(camber) - measuredZeroLift.getAsDouble() : 0;
        double liftSlope = curves.slopePerDeg().isPresent() ? Math.toDegrees(curves.slopePerDeg().getAsDouble())
                : Section.THIN_AIRFOIL_SLOPE;
        return new Section(name, camber, correction, liftSlope, curves.clMax(), curves.flapClMax(), polar,
                measuredZeroLift, curves.curve(), curves.flapCurves());
    }

    private static CamberLine camber(Field c) {
        String text = c.text();
        String compact = text.trim().toUpperCase(Locale.ROOT).replace(" ", "");
        // A four-digit designation with camber but with its position digit 0 puts the highest camber at the
        // leading edge: not a defined mean line of that family.
        if (compact.matches("NACA[1-9]0\\d\\d")) {
            throw c.error("the camber designation '" + Field.shown(text)
                    + "' has camber but no camber position (its second "
                    + "digit is 0); expected a position digit from 1 to 9, or 00 for a symmetric section");
        }
        try {
            return CamberLines.parse(text);
        } catch (IllegalArgumentException e) {
            throw c.error("unknown camber designation '" + Field.shown(text) + "'; expected " + CamberLines.ACCEPTED);
        }
    }

    private static Table clMax(Field f) {
        if (f.value() instanceof YamlValue.Scalar) {
            return Table.constant(f.inRange(0.3, 4));
        }
        f.allowOnly(CL_MAX_TABLE_KEYS);
        double[] re = increasing(f.required("reynolds", "a list of increasing Reynolds numbers"), 1e3, 1e9);
        double[] values = list(f.required("values", "a list of cl_max values, one per Reynolds number"), re.length,
                0.3, 4);
        return new Table(re, values);
    }

    private static Table flapIncrement(Field f) {
        f.allowOnly(FLAP_KEYS);
        double[] deflection = increasing(f.required("deflection", "a list of increasing flap deflections, degrees"),
                0, 60);
        double[] increment = list(f.required("increment", "a list of cl_max increments, one per deflection"),
                deflection.length, 0, 3);
        return new Table(deflection, increment);
    }

    private static ProfileDragPolar polar(Field f) {
        f.allowOnly(POLAR_KEYS);
        double[] cl = increasing(f.required("cl", "a list of increasing section lift coefficients"), -3, 4);
        Field cdField = f.required("cd", "drag coefficients, one per cl (a list of such lists with reynolds)");
        if (!f.has("reynolds")) {
            return new ProfileDragPolar(new double[] {0}, List.of(new Table(cl, list(cdField, cl.length, 0, 1))));
        }
        double[] re = increasing(f.required("reynolds", ""), 1e3, 1e9);
        List<Field> rows = cdField.items();
        if (rows.size() != re.length) {
            throw cdField.error("expected one list of cd per Reynolds number (" + re.length + "), got " + rows.size());
        }
        List<Table> polars = new ArrayList<>();
        for (Field row : rows) {
            polars.add(new Table(cl, list(row, cl.length, 0, 1)));
        }
        return new ProfileDragPolar(re, polars);
    }

    private static double[] increasing(Field f, double lo, double hi) {
        List<Field> items = f.items();
        if (items.isEmpty()) {
            throw f.error("expected a non-empty list of numbers");
        }
        return increasing(items, lo, hi);
    }

    /** The items' numbers, each within [lo, hi], refused unless they increase strictly. */
    static double[] increasing(List<Field> items, double lo, double hi) {
        double[] out = new double[items.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = items.get(i).inRange(lo, hi);
            if (i > 0 && !(out[i] > out[i - 1])) {
                throw items.get(i).error("the values must increase strictly; " + Field.format(out[i]) + " follows "
                        + Field.format(out[i - 1]));
            }
        }
        return out;
    }

    private static double[] list(Field f, int n, double lo, double hi) {
        List<Field> items = f.items();
        if (items.size() != n) {
            throw f.error("expected " + n + " values (one per entry of the table), got " + items.size());
        }
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = items.get(i).inRange(lo, hi);
        }
        return out;
    }
}
