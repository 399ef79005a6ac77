package org.spanlift.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;
import org.spanlift.lattice.LatticeBuilder;
import org.spanlift.section.MeasuredLiftCurve;
import org.spanlift.section.Table;
import org.spanlift.section.ThinAirfoil;
import org.spanlift.stall.StripLimits;
import org.spanlift.sweep.ParameterPath;

/**
 * The section keys {@code lift-curve} and {@code flap-lift-curves}: their three forms, the values a section
 * takes from its curves, the agreement required with the values it gives, and the refusals of curves that
 * are not lift curves through the stall.
 */
class SectionLiftCurveReaderTest {

    private static final double TIGHT = 1e-12;

    /** Zero lift at -2 degrees, 0.1 per degree up to 8 degrees, maximum 1.4 at 14 degrees, falling after. */
    private static final String ALPHA = "[-6, -4, -2, 0, 2, 4, 6, 8, 10, 12, 14, 16, 18]";
    private static final String CL = "[-0.4, -0.2, 0.0, 0.2, 0.4, 0.6, 0.8, 1.0, 1.18, 1.32, 1.4, 1.3, 1.1]";

    @TempDir
    Path dir;

    private Path wingFile(String... sectionLines) throws IOException {
        StringBuilder b = new StringBuilder("units: m\nsurfaces:\n  - name: wing\n    section: main\n"
                + "    trapezoid: {span: 9, root-chord: 1.2}\n"
                + "    controls:\n      - {name: flap, kind: flap, from: 0.5, to: 2.5, chord-fraction: 0.25}\n"
                + "sections:\n  main:\n");
        for (String line : sectionLines) {
            b.append("    ").append(line).append('\n');
        }
        return Files.writeString(dir.resolve("w.wing.yaml"), b.toString());
    }

    private Section main(String... sectionLines) throws IOException {
        return WingFileReader.read(wingFile(sectionLines)).sections().get("main");
    }

    private InputException refused(String... sectionLines) throws IOException {
        Path file = wingFile(sectionLines);
        InputException e = assertThrows(InputException.class, () -> WingFileReader.read(file));
        assertFalse(e.getMessage().contains("\n"), e.getMessage());
        assertTrue(e.problem().contains("expected"), e.getMessage());
        return e;
    }

    private Path csv(String name, String text) throws IOException {
        return Files.writeString(dir.resolve(name), text);
    }

    private static String csvCurve() {
        StringBuilder b = new StringBuilder("# a curve\nalpha_deg,cl\n");
        String[] a = ALPHA.replaceAll("[\\[\\] ]", "").split(",");
        String[] c = CL.replaceAll("[\\[\\] ]", "").split(",");
        for (int i = 0; i < a.length; i++) {
            b.append(a[i]).append(',').append(c[i]).append('\n');
        }
        return b.toString();
    }

    @Test
    void anInlineCurveBecomesTheSectionsMeasuredCurveInRadians() throws IOException {
        Section s = main("lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}");
        MeasuredLiftCurve curve = s.liftCurve().orElseThrow();
        assertArrayEquals(new double[] {0}, curve.reynolds());
        assertEquals(Math.toRadians(-6), curve.alpha()[0], TIGHT);
        assertEquals(Math.toRadians(18), curve.alpha()[12], TIGHT);
        assertEquals(1.4, curve.cl(0)[10], 0.0);
        assertTrue(s.flapLiftCurves().isEmpty());
    }

    @Test
    void withoutZeroLiftAngleTheSectionTakesTheCurvesSoTheLatticeCorrectionAgreesWithIt() throws IOException {
        // Zero lift between the points at -2 (cl -0.05) and 0 (0.15): at -1.5 degrees.
        Section s = main("camber: NACA 2412",
                "lift-curve: {alpha: [-4, -2, 0, 2, 4, 6, 8, 10], cl: [-0.25, -0.05, 0.15, 0.35, 0.55, 0.7, 0.75, "
                + "0.6]}");
        assertEquals(Math.toRadians(-1.5), s.measuredZeroLiftAngle().getAsDouble(), TIGHT);
        assertEquals(ThinAirfoil.zeroLiftAngle(s.camber()) - Math.toRadians(-1.5), s.incidenceCorrection(), TIGHT);
    }

    @Test
    void theZeroLiftAngleIsTheLastRiseThroughZeroBelowTheMaximumSoANegativeStallDoesNotMatter() throws IOException {
        // Past the negative stall at -12 degrees cl rises back toward zero but stays below it; it crosses at -2.
        Section s = main("lift-curve: {alpha: [-16, -14, -12, -10, -8, -4, -2, 0, 4, 8, 12, 14, 16],",
                "  cl: [-0.6, -0.9, -1.0, -0.8, -0.6, -0.2, 0.0, 0.2, 0.6, 1.0, 1.3, 1.35, 1.2]}");
        assertEquals(Math.toRadians(-2), s.measuredZeroLiftAngle().getAsDouble(), TIGHT);
    }

    @Test
    void withoutLiftSlopeTheSectionTakesTheLeastSquaresSlopeFromZeroLiftToHalfTheMaximum() throws IOException {
        // Points from -2 (the last at or below zero lift) to 6 degrees (the first at or above 1.4 / 2): exactly
        // 0.1 per degree; the rounding above 8 degrees does not enter.
        Section s = main("lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}");
        assertEquals(Math.toDegrees(0.1), s.liftSlope(), 1e-9);
        // Points off a line: least squares over -2, 0, 2 (cl 0, 0.22, 0.38; half the maximum is 0.35).
        Section t = main("lift-curve: {alpha: [-4, -2, 0, 2, 4, 6], cl: [-0.2, 0.0, 0.22, 0.38, 0.7, 0.6]}");
        assertEquals(Math.toDegrees(0.095), t.liftSlope(), 1e-9);
    }

    @Test
    void withoutClMaxTheSectionTakesTheCurvesMaximumSoStallResultsWork() throws IOException {
        Section s = main("lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}");
        Table clMax = s.clMax().orElseThrow();
        assertEquals(1.4, clMax.at(1e6), 0.0);
        Wing wing = WingFileReader.read(wingFile("lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}"));
        StripLimits limits = StripLimits.of(wing, LatticeBuilder.build(wing), new double[1], OptionalDouble.empty());
        assertFalse(limits.assumed(), "cl_max is the curve's, not assumed");
    }

    @Test
    void aCurveAgainstReynoldsNumberGivesClMaxAgainstReynoldsNumberAndTheLowestRowTheLinearValues()
            throws IOException {
        Section s = main("lift-curve:",
                "  reynolds: [1e6, 3e6]",
                "  alpha: " + ALPHA,
                "  cl: [" + CL + ",",
                "       [-0.42, -0.21, 0.0, 0.21, 0.42, 0.63, 0.84, 1.05, 1.25, 1.42, 1.52, 1.45, 1.2]]");
        MeasuredLiftCurve curve = s.liftCurve().orElseThrow();
        assertArrayEquals(new double[] {1e6, 3e6}, curve.reynolds());
        Table clMax = s.clMax().orElseThrow();
        assertEquals(1.4, clMax.at(1e6), 0.0);
        assertEquals(1.52, clMax.at(3e6), 0.0);
        assertEquals(1.46, clMax.at(2e6), 1e-12);
        assertEquals(Math.toDegrees(0.1), s.liftSlope(), 1e-9);
        assertEquals(Math.toRadians(-2), s.measuredZeroLiftAngle().getAsDouble(), TIGHT);
    }

    @Test
    void givenValuesWithinTheTolerancesAreKept() throws IOException {
        Section s = main("zero-lift-angle: -2.4", "lift-slope: 0.104", "cl-max: 1.41",
                "lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}");
        assertEquals(Math.toRadians(-2.4), s.measuredZeroLiftAngle().getAsDouble(), TIGHT);
        assertEquals(Math.toDegrees(0.104), s.liftSlope(), 1e-9);
        assertEquals(1.41, s.clMax().orElseThrow().at(1e6), 0.0);
    }

    @Test
    void aZeroLiftAngleMoreThanHalfADegreeFromTheCurvesIsRefusedNamingBoth() throws IOException {
        InputException e = refused("zero-lift-angle: -2.6", "lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}");
        assertEquals("sections.main.zero-lift-angle", e.field());
        assertEquals(10, e.line());
        assertEquals("is -2.6 degrees, but the lift curve (line 11) crosses zero lift at -2 degrees; expected the "
                + "two within 0.5 degree, or leave zero-lift-angle out to take the curve's", e.problem());
    }

    @Test
    void aLiftSlopeMoreThanFivePercentFromTheCurvesIsRefusedNamingBoth() throws IOException {
        InputException e = refused("lift-slope: 0.094", "lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}");
        assertEquals("sections.main.lift-slope", e.field());
        assertTrue(e.problem().startsWith("is 0.094 per degree, but the lift curve (line 11) rises at 0.1 per degree "
                + "over its linear part (least squares from -2 to 6 degrees); expected the two within 5%"),
                e.getMessage());
    }

    @Test
    void aClMaxMoreThanTwoHundredthsFromTheCurvesMaximumIsRefusedNamingBoth() throws IOException {
        InputException e = refused("cl-max: 1.43", "lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}");
        assertEquals("sections.main.cl-max", e.field());
        assertEquals("is 1.43, but the lift curve (line 11) reaches at most 1.4; expected the two within 0.02, or "
                + "leave cl-max out to take the curve's maxima", e.problem());
        InputException byReynolds = refused("cl-max: {reynolds: [1e6, 3e6], values: [1.4, 1.6]}",
                "lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}");
        assertTrue(byReynolds.problem().startsWith("is 1.6 at Reynolds number 3000000, but the lift curve (line 11) "
                + "reaches at most 1.4 there"), byReynolds.getMessage());
    }

    @Test
    void aCurveThatEndsAtItsMaximumIsRefusedSayingItMustReachPastIt() throws IOException {
        InputException e = refused("lift-curve: {alpha: [-4, -2, 0, 2, 4, 6],",
                "  cl: [-0.2, 0.0, 0.2, 0.4, 0.6, 0.8]}");
        assertEquals("sections.main.lift-curve.cl[5]", e.field());
        assertTrue(e.problem().contains("expected the curve to reach past its maximum, to angles where cl falls"),
                e.getMessage());
        // A flat top with no fall after it does not reach past the maximum either.
        refused("lift-curve: {alpha: [-4, -2, 0, 2, 4, 6],", "  cl: [-0.2, 0.0, 0.2, 0.4, 0.6, 0.6]}");
    }

    @Test
    void aCurveThatDoesNotRiseThroughZeroLiftIsRefused() throws IOException {
        InputException e = refused("lift-curve: {alpha: [2, 4, 6, 8, 10], cl: [0.4, 0.6, 0.8, 0.9, 0.7]}");
        assertEquals("sections.main.lift-curve.cl[0]", e.field());
        assertTrue(e.problem().contains("does not rise through zero lift below its maximum"), e.getMessage());
        assertTrue(e.problem().contains("expected the curve to start at or below zero lift"), e.getMessage());
    }

    @Test
    void aCsvFileRelativeToTheWingFileGivesTheSameCurveAsTheInlineTable() throws IOException {
        Files.createDirectory(dir.resolve("data"));
        csv("data/main.csv", csvCurve());
        Section fromFile = main("lift-curve: {file: data/main.csv}");
        Section inline = main("lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}");
        assertArrayEquals(inline.liftCurve().orElseThrow().alpha(), fromFile.liftCurve().orElseThrow().alpha(), 0.0);
        assertArrayEquals(inline.liftCurve().orElseThrow().cl(0), fromFile.liftCurve().orElseThrow().cl(0), 0.0);
        assertEquals(inline.liftSlope(), fromFile.liftSlope(), 0.0);
        assertEquals(inline.incidenceCorrection(), fromFile.incidenceCorrection(), 0.0);
    }

    @Test
    void aCsvFileTakesItsColumnsInAnyOrderWithCommentsAndReadsButIgnoresCdAndCm() throws IOException {
        Path file = csv("c.csv", "# measured, invented\n\n  # indented comment\nCM , cd, CL ,Alpha_Deg\n"
                + "-0.05,0.010,-0.2,-4\n-0.05, 0.008, 0.0, -2\n-0.05,0.008,0.2,0\n-0.04,0.009,0.4,2\n"
                + "-0.04,0.012,0.55,4\n-0.06,0.03,0.5,6\n");
        MeasuredLiftCurve curve = LiftCurveFileReader.read(file);
        assertArrayEquals(new double[] {-0.2, 0.0, 0.2, 0.4, 0.55, 0.5}, curve.cl(0), 0.0);
        assertEquals(Math.toRadians(6), curve.alpha()[5], TIGHT);
        InputException e = assertThrows(InputException.class, () -> LiftCurveFileReader.read(csv("d.csv",
                "alpha_deg,cl,cd\n-2,0,0.01\n0,0.2,nan\n")));
        assertEquals(file.resolveSibling("d.csv") + ":3: cd: expected a finite number, got nan", e.getMessage());
    }

    @Test
    void aCsvFileFaultIsNamedAtTheFileKeyWithTheCsvFileLineAndColumn() throws IOException {
        csv("bad.csv", "alpha_deg,cl\n-2,0\n0,0.2\n2,7\n4,0.5\n");
        InputException e = refused("lift-curve: {file: bad.csv}");
        assertEquals("sections.main.lift-curve.file", e.field());
        assertEquals(10, e.line());
        assertTrue(e.problem().startsWith(dir.resolve("bad.csv") + ":4: cl: 7 is beyond 5 in size; expected section "
                + "lift coefficients from -5 to 5"), e.getMessage());
        // The shape checks name the file's line too.
        csv("flat.csv", "alpha_deg,cl\n-2,0\n0,0.2\n2,0.4\n4,0.6\n");
        InputException shape = refused("lift-curve: {file: flat.csv}");
        assertTrue(shape.problem().startsWith(dir.resolve("flat.csv") + ":5: cl: the curve ends without falling past "
                + "its maximum"), shape.getMessage());
    }

    @Test
    void aCsvFileHeaderWordsAreNeverEchoed() throws IOException {
        Path file = csv("passwd.csv", "root:x:0:0:root:/root:/bin/bash\n");
        InputException e = assertThrows(InputException.class, () -> LiftCurveFileReader.read(file));
        assertEquals(file + ":1: column 1 of the header is not one of alpha_deg, cl, cd, cm; expected a header line "
                + "naming the columns alpha_deg and cl, and optionally cd and cm, separated by commas", e.getMessage());
    }

    @Test
    void aCsvFileOfMoreThanAThousandAnglesIsRefusedAtTheLineThatPassesTheLimit() throws IOException {
        StringBuilder b = new StringBuilder("alpha_deg,cl\n");
        for (int i = 0; i <= 1000; i++) {
            b.append(-60 + i * 0.1).append(",0\n");
        }
        Path file = csv("long.csv", b.toString());
        InputException e = assertThrows(InputException.class, () -> LiftCurveFileReader.read(file));
        assertEquals(1002, e.line());
        assertTrue(e.problem().contains("expected at most 1000 lines of data"), e.getMessage());
    }

    @Test
    void aCsvFileIsReadUnderTheRulesOfEveryTextFile() throws IOException {
        Path file = dir.resolve("nul.csv");
        Files.write(file, new byte[] {'a', 'l', 'p', 'h', 'a', '_', 'd', 'e', 'g', ',', 'c', 'l', '\n', '1', 0, '\n'});
        InputException e = assertThrows(InputException.class, () -> LiftCurveFileReader.read(file));
        assertEquals(2, e.line());
        assertTrue(e.problem().contains("a NUL character on this line"), e.getMessage());
        assertTrue(e.problem().contains("CSV file of a section lift curve"), e.getMessage());
    }

    @Test
    void fileAndTableTogetherAreRefused() throws IOException {
        InputException e = refused("lift-curve: {file: a.csv, alpha: " + ALPHA + ", cl: " + CL + "}");
        assertEquals("sections.main.lift-curve", e.field());
        assertTrue(e.problem().startsWith("both a file and a table; expected either file or the table"),
                e.getMessage());
    }

    @Test
    void flapCurvesAreReadByDeflectionAndGiveTheFlapIncrementWhenFlapClMaxIsAbsent() throws IOException {
        csv("f30.csv", "alpha_deg,cl\n-16,-0.2\n-14,0.0\n-10,0.4\n-4,1.0\n2,1.5\n6,1.8\n8,1.9\n10,1.85\n14,1.5\n");
        Section s = main("lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}",
                "flap-lift-curves:",
                "  - {deflection: 15, alpha: [-12, -10, -6, 0, 6, 10, 12, 14], cl: [-0.1, 0.1, 0.5, 1.1, 1.55, 1.7, "
                        + "1.65,"
                        + " 1.4]}",
                "  - {deflection: 30, file: f30.csv}");
        assertEquals(List.of(15.0, 30.0), List.copyOf(s.flapLiftCurves().keySet()));
        assertEquals(1.9, s.flapLiftCurves().get(30.0).cl(0)[6], 0.0);
        Table increment = s.flapClMaxIncrement().orElseThrow();
        assertEquals(0, increment.at(0), 0.0);
        assertEquals(0.3, increment.at(15), 1e-12);
        assertEquals(0.5, increment.at(30), 1e-12);
        // The clean values stay the clean curve's.
        assertEquals(Math.toRadians(-2), s.measuredZeroLiftAngle().getAsDouble(), TIGHT);
    }

    @Test
    void aFlapClMaxThatDisagreesWithTheFlapCurvesIsRefused() throws IOException {
        InputException e = refused("lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}",
                "flap-cl-max: {deflection: [0, 20], increment: [0, 0.5]}",
                "flap-lift-curves:",
                "  - {deflection: 20, alpha: [-12, -10, -6, 0, 6, 10, 12, 14], cl: [-0.1, 0.1, 0.5, 1.1, 1.55, 1.7, "
                        + "1.65,"
                        + " 1.4]}");
        assertEquals("sections.main.flap-cl-max", e.field());
        assertTrue(e.problem().startsWith("gives an increment of 0.5 at 20 degrees, but the flap curve at 20 degrees "
                + "(line 13) reaches 1.7, 0.3 above the clean curve's 1.4"), e.getMessage());
    }

    @Test
    void flapCurvesNeedTheCleanCurveAndPositiveStrictlyIncreasingDeflections() throws IOException {
        String flap = "alpha: [-12, -10, -6, 0, 6, 10, 12, 14], cl: [-0.1, 0.1, 0.5, 1.1, 1.55, 1.7, 1.65, 1.4]";
        InputException e = refused("flap-lift-curves:", "  - {deflection: 20, " + flap + "}");
        assertEquals("sections.main.flap-lift-curves", e.field());
        assertTrue(e.problem().contains("expected lift-curve in this section too"), e.getMessage());
        String clean = "lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}";
        e = refused(clean, "flap-lift-curves:", "  - {deflection: 0, " + flap + "}");
        assertEquals("sections.main.flap-lift-curves[0].deflection", e.field());
        assertTrue(e.problem().startsWith("must be above 0 and at most 60 degrees, got 0"), e.getMessage());
        e = refused(clean, "flap-lift-curves:", "  - {deflection: 20, " + flap + "}", "  - {deflection: 20, " + flap
                + "}");
        assertEquals("sections.main.flap-lift-curves[1].deflection", e.field());
        assertTrue(e.problem().startsWith("is 20 degrees, not above the previous curve's 20"), e.getMessage());
        e = refused(clean, "flap-lift-curves: []");
        assertTrue(e.problem().startsWith("an empty list; expected at least one flap curve"), e.getMessage());
    }

    @Test
    void aFlapCurveBelowTheCleanMaximumIsRefusedWhenItsIncrementIsTaken() throws IOException {
        InputException e = refused("lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}", "flap-lift-curves:",
                "  - {deflection: 10, alpha: [-8, -6, -2, 4, 8, 10], cl: [-0.1, 0.1, 0.5, 1.1, 1.3, 1.2]}");
        assertEquals("sections.main.flap-lift-curves[0].cl[4]", e.field());
        assertTrue(e.problem().contains("expected a flap curve that raises cl_max by 0 to 3"), e.getMessage());
    }

    @Test
    void tablesAreBoundedBeforeTheirValuesAreRead() throws IOException {
        StringBuilder many = new StringBuilder("[");
        for (int i = 0; i < 1001; i++) {
            many.append(i == 0 ? "" : ", ").append(i);
        }
        InputException e = refused("lift-curve: {alpha: " + many + "], cl: [0]}");
        assertEquals("expected from 4 to 1000 angles (through zero lift and past the maximum), got 1001", e.problem());
        StringBuilder reynolds = new StringBuilder("[");
        for (int i = 0; i < 51; i++) {
            reynolds.append(i == 0 ? "" : ", ").append(1e4 + i);
        }
        e = refused("lift-curve: {reynolds: " + reynolds + "], alpha: " + ALPHA + ", cl: [" + CL + "]}");
        assertEquals("expected from 1 to 50 Reynolds numbers, got 51", e.problem());
        StringBuilder flaps = new StringBuilder();
        for (int i = 1; i <= 21; i++) {
            flaps.append(i == 1 ? "" : ", ").append("{deflection: ").append(i).append(", file: f.csv}");
        }
        e = refused("lift-curve: {alpha: " + ALPHA + ", cl: " + CL + "}", "flap-lift-curves: [" + flaps + "]");
        assertEquals("expected at most 20 flap curves, got 21", e.problem());
    }

    @Test
    void sweepPathsCanNameTheCurvesPlainValues() {
        for (String path : List.of("sections.main.lift-curve.file", "sections.main.lift-curve.cl[3]",
                "sections.main.lift-curve.cl[1][3]", "sections.main.lift-curve.alpha[0]",
                "sections.main.lift-curve.reynolds[1]", "sections.main.flap-lift-curves[0].deflection",
                "sections.main.flap-lift-curves[1].file")) {
            assertEquals(path, ParameterPath.parse(path, WingSchema.ROOT).text());
        }
        assertThrows(ParameterPath.PathException.class, () -> ParameterPath.parse("sections.main.lift-curve",
                WingSchema.ROOT));
    }

    @Test
    void aSweepCanChooseTheCurveFileOfASection() throws IOException {
        csv("a.csv", csvCurve());
        csv("b.csv", csvCurve().replace("14,1.4", "14,1.5"));
        Path file = wingFile("lift-curve: {file: a.csv}");
        YamlValue tree = YamlParser.parse(Files.readString(file), file.toString());
        YamlValue swept = ParameterPath.parse("sections.main.lift-curve.file", WingSchema.ROOT).apply(tree, "b.csv");
        Section s = WingFileReader.fromTree(swept, file.toString()).sections().get("main");
        assertEquals(1.5, s.clMax().orElseThrow().at(0), 0.0);
    }

    @Test
    void theDemoWingTakesItsSectionValuesFromItsCurves() {
        Wing wing = WingFileReader.read(Path.of("..", "geometries", "club-low-wing.wing.yaml"));
        Section s = wing.sections().get("main");
        assertEquals(Math.toRadians(-2), s.measuredZeroLiftAngle().getAsDouble(), TIGHT);
        assertEquals(Math.toDegrees(0.105), s.liftSlope(), 1e-9);
        assertEquals(1.45, s.clMax().orElseThrow().at(2e6), 0.0);
        assertEquals(0.55, s.flapClMaxIncrement().orElseThrow().at(20), 1e-12);
        assertEquals(List.of(20.0), List.copyOf(s.flapLiftCurves().keySet()));
    }
}
