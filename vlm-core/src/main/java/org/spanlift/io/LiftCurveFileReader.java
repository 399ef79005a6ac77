package org.spanlift.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.spanlift.input.Field;
import org.spanlift.input.InputException;
import org.spanlift.input.TextFile;
import org.spanlift.input.quantity.Decimal;
import org.spanlift.section.MeasuredLiftCurve;

/**
 * Reads a section lift curve from a plain CSV file, the {@code file} of a wing file's {@code lift-curve} or
 * of an entry of its {@code flap-lift-curves}.
 *
 * <p>Format: UTF-8 text (read through {@link TextFile}: at most 16 MiB, no control characters other than
 * tabs and line breaks). Blank lines and lines whose first character other than spaces and tabs is
 * {@code #} are comments. The first other line is the header: column names separated by commas, in any
 * order, each once, case ignored: {@code alpha_deg} (angle of attack from the chord line, degrees) and
 * {@code cl} are required, {@code cd} and {@code cm} optional. Every further line is one angle: as many
 * values as the header has names, separated by commas, each a number in the one number syntax of every file
 * ({@link Decimal}), spaces and tabs around them ignored. {@code cd} and {@code cm} are checked to be numbers
 * and otherwise ignored for now: the section's profile drag comes from {@code drag-polar}, and no result uses
 * a section pitching moment. A file holds one curve, without a Reynolds number.
 *
 * <p>Checks: angles from -90 to 90 degrees, strictly increasing, from {@value SectionLiftCurveReader#MIN_ANGLES}
 * to {@value SectionLiftCurveReader#MAX_ANGLES} of them; |cl| at most 5;
 * and the shape every lift curve must have ({@link SectionLiftCurveReader}): rising through zero lift below
 * its maximum, and reaching past the maximum. A refusal names the file, the line and the column.
 */
public final class LiftCurveFileReader {

    /** What the file is, for messages. */
    static final String WHAT = "CSV file of a section lift curve";

    private static final List<String> COLUMNS = List.of("alpha_deg", "cl", "cd", "cm");
    private static final String EXPECT_HEADER = "a header line naming the columns alpha_deg and cl, and optionally "
            + "cd and cm, separated by commas";

    private LiftCurveFileReader() {
    }

    /**
     * Reads and checks a lift-curve file.
     *
     * @throws InputException with a one-line message naming the file, the line, the column and what is
     *         expected
     */
    public static MeasuredLiftCurve read(Path file) {
        LiftCurveTable table = parse(file);
        SectionLiftCurveReader.shape(table);
        return table.model();
    }

    /** The file's curve, with the line of each angle; every check but the curve's shape done. */
    static LiftCurveTable parse(Path file) {
        List<String> lines = TextFile.read(file, WHAT).lines().toList();
        String name = file.toString();
        int headerLine = 0;
        Map<String, Integer> columns = new HashMap<>();
        int width = 0;
        List<Double> alpha = new ArrayList<>();
        List<Double> cl = new ArrayList<>();
        List<Integer> at = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            int lineNo = i + 1;
            String text = lines.get(i).strip();
            if (text.isEmpty() || text.startsWith("#")) {
                continue;
            }
            String[] cells = text.split(",", -1);
            if (headerLine == 0) {
                headerLine = lineNo;
                width = cells.length;
                header(name, lineNo, cells, columns);
                continue;
            }
            if (cells.length != width) {
                throw new InputException(name, lineNo, "", cells.length + " value" + (cells.length == 1 ? "" : "s")
                        + " on the line; expected " + width + ", one per column of the header (line " + headerLine
                        + "), separated by commas");
            }
            if (alpha.size() == SectionLiftCurveReader.MAX_ANGLES) {
                throw new InputException(name, lineNo, "", "more than " + SectionLiftCurveReader.MAX_ANGLES
                        + " angles; expected at most " + SectionLiftCurveReader.MAX_ANGLES + " lines of data");
            }
            double a = number(name, lineNo, "alpha_deg", cells[columns.get("alpha_deg")]);
            double c = number(name, lineNo, "cl", cells[columns.get("cl")]);
            for (String optional : List.of("cd", "cm")) {
                if (columns.containsKey(optional)) {
                    number(name, lineNo, optional, cells[columns.get(optional)]);
                }
            }
            if (a < -SectionLiftCurveReader.ALPHA_LIMIT_DEG || a > SectionLiftCurveReader.ALPHA_LIMIT_DEG) {
                throw new InputException(name, lineNo, "alpha_deg", Field.brief(a) + " degrees is outside -90 to 90; "
                        + "expected angles of attack from -90 to 90 degrees");
            }
            if (!alpha.isEmpty() && !(a > alpha.get(alpha.size() - 1))) {
                throw new InputException(name, lineNo, "alpha_deg", Field.brief(a) + " degrees after "
                        + Field.brief(alpha.get(alpha.size() - 1)) + " on line " + at.get(at.size() - 1) + "; expected "
                        + "angles that increase strictly from line to line");
            }
            if (Math.abs(c) > SectionLiftCurveReader.CL_LIMIT) {
                throw new InputException(name, lineNo, "cl", Field.brief(c) + " is beyond 5 in size; expected "
                        + "section lift coefficients from -5 to 5");
            }
            alpha.add(a);
            cl.add(c);
            at.add(lineNo);
        }
        if (headerLine == 0) {
            throw new InputException(name, Math.max(1, lines.size()), "", "the file holds no header line; expected "
                    + EXPECT_HEADER + ", then one line per angle");
        }
        if (alpha.size() < SectionLiftCurveReader.MIN_ANGLES) {
            int last = at.isEmpty() ? headerLine : at.get(at.size() - 1);
            throw new InputException(name, last, "", "only " + alpha.size() + " angle" + (alpha.size() == 1 ? "" : "s")
                    + " in the file; expected at least " + SectionLiftCurveReader.MIN_ANGLES + " lines of data, "
                    + "through zero lift and past the maximum");
        }
        double[] a = alpha.stream().mapToDouble(Double::doubleValue).toArray();
        double[] c = cl.stream().mapToDouble(Double::doubleValue).toArray();
        int[] where = at.stream().mapToInt(Integer::intValue).toArray();
        LiftCurveTable.Place place = (row, point, problem) -> new InputException(name, where[point], "cl", problem);
        return new LiftCurveTable(new double[] {0}, a, new double[][] {c}, place,
                "the lift curve in " + Field.shown(String.valueOf(file.getFileName())));
    }

    private static void header(String name, int lineNo, String[] cells, Map<String, Integer> columns) {
        if (Arrays.stream(cells).allMatch(c -> Decimal.matches(c.strip()))) {
            throw new InputException(name, lineNo, "", "the first line holds numbers, not a header; expected "
                    + EXPECT_HEADER + " (then one line per angle)");
        }
        for (int k = 0; k < cells.length; k++) {
            String column = cells[k].strip().toLowerCase(Locale.ROOT);
            if (!COLUMNS.contains(column)) {
                // The name is not echoed: the file may be any file given by mistake.
                throw new InputException(name, lineNo, "", "column " + (k + 1) + " of the header is not one of "
                        + String.join(", ", COLUMNS) + "; expected " + EXPECT_HEADER);
            }
            Integer before = columns.put(column, k);
            if (before != null) {
                throw new InputException(name, lineNo, "", "the column " + column + " is named twice (columns "
                        + (before + 1) + " and " + (k + 1) + "); expected each column once");
            }
        }
        for (String required : List.of("alpha_deg", "cl")) {
            if (!columns.containsKey(required)) {
                throw new InputException(name, lineNo, "", "the header has no " + required + " column; expected "
                        + EXPECT_HEADER);
            }
        }
    }

    /** A value in the one number syntax; a refusal shows the text only when it looks like a mistyped number. */
    private static double number(String name, int lineNo, String column, String cell) {
        String t = cell.strip();
        if (t.isEmpty()) {
            throw new InputException(name, lineNo, column, "no value; expected " + Decimal.EXPECTED);
        }
        Optional<String> problem = Decimal.problem(t);
        if (problem.isPresent()) {
            throw new InputException(name, lineNo, column, problem.get().equals(Decimal.NOT_FINITE)
                    ? problem.get() + ", got " + t : "not a number" + shown(t) + "; " + problem.get());
        }
        double d = Double.parseDouble(t);
        if (!Double.isFinite(d)) {
            throw new InputException(name, lineNo, column, "expected a finite number, got " + t
                    + " (beyond the range of numbers, about 1.8e308)");
        }
        return d;
    }

    /**
     * A value for a message, quoted, only when it looks like a mistyped number (number characters, at most
     * 20): the file may be any file given by mistake, and its words are not for a message to echo.
     */
    private static String shown(String token) {
        return token.length() <= 20 && token.matches("[-+0-9.eEdDfFxXpP_]+") ? " ('" + token + "')" : "";
    }
}
