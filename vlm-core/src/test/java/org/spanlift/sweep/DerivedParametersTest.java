package org.spanlift.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.spanlift.batch.CaseEvaluator;
import org.spanlift.batch.CaseResult;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.io.SweepFileReader;
import org.spanlift.io.WingFileReader;

/**
 * Derived sweep values: computed per case from swept values, base-file values and constants, applied to the
 * wing like swept values, shown in the case's result; refused up front where the file alone decides, failing
 * only their case's row otherwise.
 */
class DerivedParametersTest {

    @TempDir
    Path dir;

    /** A metre wing of area 10 x 1.6 x 1.5 / 2 = 12 m^2. */
    private static final double AREA = 12.0;

    private Sweep read(String sweep) {
        SweepFixtures.write(dir, "w.wing.yaml", SweepFixtures.TRAPEZOID);
        return SweepFileReader.read(SweepFixtures.write(dir, "s.sweep.yaml", "base: w.wing.yaml\n" + sweep), false);
    }

    private InputException refused(String sweep) {
        return assertThrows(InputException.class, () -> read(sweep));
    }

    private static Wing wingOf(Sweep s, CaseResult r) {
        return WingFileReader.fromTree(s.caseTree(r.values(), r.derived()), s.basePath().toString());
    }

    private static Object cell(Sweep s, CaseResult r, String column) {
        for (int i = 0; i < s.columns().size(); i++) {
            if (s.columns().get(i).name().equals(column)) {
                return r.results()[i];
            }
        }
        throw new AssertionError("no column " + column);
    }

    @Test
    void aConstantAreaSweepHoldsTheAreaInEveryRowWhileTaperAndSpanVary() {
        Sweep s = read("""
                parameters:
                  surfaces.wing.trapezoid.taper: {from: 0.2, to: 1.0, step: 0.1}
                  surfaces.wing.trapezoid.span: [9.6, 10, 12.5, 13.7]
                names: {taper: surfaces.wing.trapezoid.taper, span: surfaces.wing.trapezoid.span}
                constants: {area: 12}
                derived:
                  surfaces.wing.trapezoid.root-chord: 2 * area / (span * (1 + taper))
                columns: [reference.area, lift_slope_per_rad]
                """);
        assertEquals(36, s.design().count());
        CaseEvaluator ev = new CaseEvaluator(s);
        for (long i = 0; i < s.design().count(); i++) {
            CaseResult r = ev.evaluate(i);
            assertNull(r.error(), r.error());
            Wing wing = wingOf(s, r);
            assertEquals(AREA, wing.reference().area(), 1e-12 * AREA, "case " + i);
            assertEquals(AREA, wing.surfaces().get(0).area(), 1e-12 * AREA, "case " + i);
            assertEquals(AREA, (Double) cell(s, r, "reference.area"), 1e-12 * AREA, "case " + i);
            double taper = Double.parseDouble(r.values()[0]);
            double span = Double.parseDouble(r.values()[1]);
            assertEquals(1, r.derived().length);
            assertEquals(2 * AREA / (span * (1 + taper)), r.derived()[0], "the row shows the root chord used");
            assertEquals(r.derived()[0], wing.surfaces().get(0).planform().chord(0));
        }
    }

    @Test
    void theExampleSweepHoldsTheTourersAreaAndSpanInEveryCase() {
        Sweep s = SweepFileReader.read(Path.of("..", "geometries", "tourer-washout-taper.sweep.yaml"), false);
        double ft = 0.3048;
        double area = 34 * 5.6 * 1.5 / 2 * ft * ft;
        assertEquals(area, s.baseWing().reference().area(), 1e-12 * area, "142.8 ft^2 is the tourer's own area");
        assertEquals(63, s.design().count());
        for (long i = 0; i < s.design().count(); i++) {
            String[] values = s.design().values(i);
            Wing wing = WingFileReader.fromTree(s.caseTree(values, s.derivation().values(values)),
                    s.basePath().toString());
            assertEquals(area, wing.reference().area(), 1e-12 * area, "case " + i);
            assertEquals(34 * ft, wing.reference().span(), 1e-12, "case " + i);
        }
    }

    @Test
    void aStudyVariableSweepsTheAspectRatioAtConstantAreaInALatinHypercube() {
        Sweep s = read("""
                parameters:
                  surfaces.wing.trapezoid.taper: {from: 0.3, to: 1.0}
                  aspect_ratio: {from: 8, to: 14}
                design: {kind: latin-hypercube, cases: 25, seed: 11}
                names: {taper: surfaces.wing.trapezoid.taper}
                constants: {area: 12}
                derived:
                  surfaces.wing.trapezoid.span: sqrt(aspect_ratio * area)
                  surfaces.wing.trapezoid.root-chord: 2 * sqrt(area / aspect_ratio) / (1 + taper)
                columns: [reference.aspect_ratio, mean_aerodynamic_chord]
                """);
        assertTrue(s.parameters().get(1).isVariable());
        assertEquals("aspect_ratio", s.parameters().get(1).key());
        CaseEvaluator ev = new CaseEvaluator(s);
        for (long i = 0; i < s.design().count(); i++) {
            CaseResult r = ev.evaluate(i);
            assertNull(r.error(), r.error());
            Wing wing = wingOf(s, r);
            double ar = Double.parseDouble(r.values()[1]);
            assertEquals(AREA, wing.reference().area(), 1e-12 * AREA, "case " + i);
            assertEquals(ar, wing.reference().aspectRatio(), 1e-12 * ar, "case " + i);
            assertEquals(ar, (Double) cell(s, r, "reference.aspect_ratio"), 1e-12 * ar, "case " + i);
        }
    }

    @Test
    void aStudyVariableNoExpressionUsesIsRefusedSoATypoIsNotTakenForOne() {
        InputException e = refused("""
                parameters:
                  surfaces.wing.trapezoid.taper: [0.4, 0.7]
                  referenc: [1, 2]
                columns: [lift_slope_per_rad]
                """);
        assertEquals("parameters.referenc", e.field());
        assertTrue(e.problem().startsWith("'referenc' is not a key of a wing file's top level"), e.getMessage());
        InputException words = refused(OK.replace("[0.4, 0.7]", "[0.4, 0.7]\n  kind: [low, high]"));
        assertEquals("parameters.kind[0]", words.field());
        assertTrue(words.problem().startsWith("a study variable takes numbers"), words.getMessage());
    }

    @Test
    void aNameReadsTheBaseFilesValueWhereThePathIsNotSwept() {
        Sweep s = read("""
                parameters:
                  surfaces.wing.trapezoid.taper: [0.5, 1]
                names:
                  span: surfaces[0].trapezoid.span
                  chord: surfaces.wing.trapezoid.root-chord
                derived:
                  surfaces.wing.controls.aileron.to: span / 2 - 0.1 * chord
                columns: [controls.aileron.to]
                """);
        CaseResult r = new CaseEvaluator(s).evaluate(1);
        assertNull(r.error(), r.error());
        assertArrayEquals(new double[] {5 - 0.16}, r.derived());
        assertEquals(5 - 0.16, (Double) cell(s, r, "controls.aileron.to"), 1e-15);
    }

    @Test
    void aCaseWhoseExpressionFailsRecordsWhereAndWhyInItsRowAndTheSweepGoesOn() {
        Sweep s = read("""
                parameters:
                  surfaces.wing.trapezoid.taper: [0.4, 0.5, 0.6]
                names: {taper: surfaces.wing.trapezoid.taper}
                derived:
                  surfaces.wing.trapezoid.washout: 1 / (taper - 0.5)
                columns: [lift_slope_per_rad]
                """);
        CaseEvaluator ev = new CaseEvaluator(s);
        assertNull(ev.evaluate(0).error());
        CaseResult failed = ev.evaluate(1);
        String file = dir.resolve("s.sweep.yaml").toString();
        assertEquals(file + ":6: derived.surfaces.wing.trapezoid.washout: character 3 of the expression: division by "
                + "zero (1 / 0) (with taper = 0.5)", failed.error());
        assertNull(failed.derived(), "no derived value to show");
        assertNull(failed.results()[0]);
        CaseResult after = ev.evaluate(2);
        assertNull(after.error());
        assertEquals(10, after.derived()[0], 1e-12);
    }

    @Test
    void aFailingExpressionListsItsNamesInTheOrderItUsesThemInEveryRun() {
        Sweep s = read("""
                parameters:
                  surfaces.wing.trapezoid.taper: [0.5]
                names: {taper: surfaces.wing.trapezoid.taper}
                constants: {e: 5, d: 4, c: 3, b: 2, a: 1}
                derived:
                  surfaces.wing.trapezoid.washout: a + b + c + d + e + 1 / (taper - 0.5)
                columns: [lift_slope_per_rad]
                """);
        CaseResult r = new CaseEvaluator(s).evaluate(0);
        assertTrue(r.error().endsWith("division by zero (1 / 0) (with a = 1, b = 2, c = 3, d = 4, e = 5, taper = 0.5)"),
                r.error());
    }

    @Test
    void aDerivedValueOutsideWhatAWingFileHoldsFailsItsCase() {
        Sweep s = read("""
                parameters:
                  surfaces.wing.trapezoid.taper: [0.5, 1e-13]
                names: {taper: surfaces.wing.trapezoid.taper}
                derived:
                  surfaces.wing.trapezoid.root-chord: 1 / taper
                columns: [lift_slope_per_rad]
                """);
        CaseResult r = new CaseEvaluator(s).evaluate(1);
        assertTrue(r.error().endsWith(":6: derived.surfaces.wing.trapezoid.root-chord: the value 1e13 is "
                + "beyond 1e12 in "
                + "size; expected a value a wing file can hold (with taper = 1e-13)"), r.error());
    }

    @Test
    void aDerivedValueTheWingRefusesFailsItsCaseWithTheWingFilesMessage() {
        Sweep s = read("""
                parameters:
                  surfaces.wing.trapezoid.taper: [0.5, 1]
                names: {taper: surfaces.wing.trapezoid.taper}
                derived:
                  surfaces.wing.trapezoid.root-chord: 2 - 2 * taper
                columns: [lift_slope_per_rad]
                """);
        CaseResult r = new CaseEvaluator(s).evaluate(1);
        assertNotNull(r.error());
        assertTrue(r.error().startsWith("w.wing.yaml:"), r.error());
        assertTrue(r.error().contains("root-chord"), r.error());
        assertArrayEquals(new double[] {0}, r.derived(), "the value that failed is shown");
    }

    @Test
    void sweptAndDerivedValuesReachTheWingInThatOrder() {
        Sweep s = read("""
                parameters:
                  surfaces.wing.trapezoid.washout: [1, 3]
                names: {w: surfaces.wing.trapezoid.washout}
                derived:
                  surfaces.wing.trapezoid.root-twist: w / 2
                columns: [zero_lift_angle_deg]
                """);
        CaseResult r = new CaseEvaluator(s).evaluate(1);
        Wing wing = wingOf(s, r);
        var planform = wing.surfaces().get(0).planform();
        assertEquals(Math.toRadians(1.5), planform.twist(0), 1e-15, "root twist derived from the swept washout");
        assertEquals(Math.toRadians(-1.5), planform.twist(5), 1e-15, "tip twist: root twist less the swept washout");
    }

    private static final String OK = """
            parameters:
              surfaces.wing.trapezoid.taper: [0.4, 0.7]
            names: {taper: surfaces.wing.trapezoid.taper, span: surfaces.wing.trapezoid.span}
            constants: {area: 12}
            derived:
              surfaces.wing.trapezoid.root-chord: 2 * area / (span * (1 + taper))
            columns: [lift_slope_per_rad]
            """;

    @Test
    void theReadersSweepOfTheExampleIsAccepted() {
        Sweep s = read(OK);
        assertEquals(1, s.derivation().derived().size());
        assertEquals("surfaces.wing.trapezoid.root-chord", s.derivation().derived().get(0).path().text());
    }

    @ParameterizedTest(name = "[{index}] {2}")
    // CHECKSTYLE.OFF: LineLength
    @CsvSource(delimiter = '|', quoteCharacter = '`', textBlock = """
            `surfaces.wing.trapezoid.root-chord: 2 * area / (span * (1 + taper))` | `surfaces.wing.trapezoid.taper: 2 * area / span` | 7 | derived.surfaces.wing.trapezoid.taper | this value is also swept (parameters.surfaces.wing.trapezoid.taper); a value is either swept or derived
            `surfaces.wing.trapezoid.root-chord: 2 * area / (span * (1 + taper))` | `surfaces[0].trapezoid.taper: 0.5` | 7 | derived.surfaces[0].trapezoid.taper | this value is also swept (parameters.surfaces.wing.trapezoid.taper)
            `span: surfaces.wing.trapezoid.span` | `span: surfaces.wing.trapezoid.root-chord` | 4 | names.span | names the derived value surfaces.wing.trapezoid.root-chord; expressions use swept values, values of the base file and constants, never derived values
            `2 * area / (span * (1 + taper))` | `2 * area / (spn * (1 + taper))` | 7 | derived.surfaces.wing.trapezoid.root-chord | character 13 of the expression: unknown name 'spn'; expected one of area, span, taper
            `2 * area / (span * (1 + taper))` | `2 * area / (span - span)` | 7 | derived.surfaces.wing.trapezoid.root-chord | character 10 of the expression: division by zero (24 / 0)
            `2 * area / (span * (1 + taper))` | `2 * area / (span * (1 + taper)` | 7 | derived.surfaces.wing.trapezoid.root-chord | character 31 of the expression: the expression ends too soon; expected ')' to close the '(' of character 12
            `2 * area / (span * (1 + taper))` | `area * 1e11` | 7 | derived.surfaces.wing.trapezoid.root-chord | the value 1.2e12 is beyond 1e12 in size
            `constants: {area: 12}` | `constants: {area: 12m2}` | 5 | constants.area | expected a plain number, got '12m2'; constants take no unit: every name stands for a number in the base wing file's own units (m for lengths, degrees for angles)
            `constants: {area: 12}` | `constants: {taper: 12}` | 4 | names.taper | the name taper is declared twice (as a study variable, under constants or under names)
            `constants: {area: 12}` | `constants: {area: 12, sqrt: 2}` | 5 | constants.sqrt | sqrt is a function of the expressions; choose another name
            `constants: {area: 12}` | `constants: {2area: 12}` | 5 | constants.2area | '2area' is not a name; expected a letter, then letters, digits or underscores
            `span: surfaces.wing.trapezoid.span` | `span: surfaces.wing.trapezoid.sweep` | 4 | names.span | the base file gives no value at surfaces.wing.trapezoid.sweep (its default applies); give the value in the base file, or sweep it
            `span: surfaces.wing.trapezoid.span` | `span: sections.main.camber` | 4 | names.span | the base file's value at sections.main.camber is 'NACA 4415', not a plain number
            `span: surfaces.wing.trapezoid.span` | `span: surfaces.wing.trapezoid.spam` | 4 | names.span | unknown key 'spam'
            """)
    // CHECKSTYLE.ON: LineLength
    void aFaultTheFileAloneDecidesIsRefusedUpFrontWithItsLineAndField(String from, String to, int line, String field,
            String fragment) {
        InputException e = refused(OK.replace(from, to));
        assertEquals(line, e.line(), e.getMessage());
        assertEquals(field, e.field(), e.getMessage());
        assertTrue(e.problem().startsWith(fragment), e.getMessage());
    }

    @Test
    void aResultColumnNamedLikeADerivedPathIsRefused() {
        InputException e = refused(OK.replace("surfaces.wing.trapezoid.root-chord:", "reference.area:")
                .replace("[lift_slope_per_rad]", "[lift_slope_per_rad, reference.area]"));
        assertEquals("columns", e.field());
        assertTrue(e.problem().startsWith("the result column reference.area has the name of a swept or derived value"),
                e.getMessage());
    }

    @Test
    void namesAndConstantsWithoutDerivedEntriesAreRefused() {
        InputException e = refused("""
                parameters:
                  surfaces.wing.trapezoid.taper: [0.4, 0.7]
                constants: {area: 12}
                columns: [lift_slope_per_rad]
                """);
        assertEquals("constants", e.field());
        assertTrue(e.problem().startsWith("names and constants serve the expressions of derived entries"),
                e.getMessage());
    }

    @Test
    void aNameOfASweptListWithWordsIsRefused() {
        InputException e = refused("""
                parameters:
                  surfaces.wing.lattice.strip-spacing: [cosine, uniform]
                names: {spacing: surfaces.wing.lattice.strip-spacing}
                derived:
                  surfaces.wing.trapezoid.taper: spacing
                columns: [lift_slope_per_rad]
                """);
        assertEquals("names.spacing", e.field());
        assertTrue(e.problem().contains("whose value 'cosine' is not a number"), e.getMessage());
    }

    @Test
    void anExpressionTooLongOrTooDeepIsRefusedWithItsPosition() {
        String longOne = "area" + " + 0".repeat(60);
        InputException tooLong = refused(OK.replace("2 * area / (span * (1 + taper))", longOne));
        assertEquals("character 201 of the expression: the expression is 244 characters long; expected at most 200",
                tooLong.problem());
        InputException tooDeep = refused(OK.replace("2 * area / (span * (1 + taper))",
                "(".repeat(17) + "area" + ")".repeat(17)));
        assertTrue(tooDeep.problem().startsWith("character 17 of the expression: the expression nests more than 16 "
                + "levels deep"), tooDeep.getMessage());
    }
}
