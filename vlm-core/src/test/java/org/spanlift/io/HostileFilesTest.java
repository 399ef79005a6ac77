package org.spanlift.io;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.spanlift.input.InputException;

/**
 * The hostile cases, envelope, sweep, coordinate and lift-curve files beside {@code bad-wings/} (each folder holds
 * one kind) are refused by their reader with one line naming the file, the line, the field and what is expected.
 * Wing files have their own table in {@link BadWingFileTest}.
 */
class HostileFilesTest {

    private static final Path RESOURCES = Path.of("src", "test", "resources");

    /** The folders of this table and the reader of each. */
    private static final List<String> FOLDERS = List.of("bad-cases", "bad-envelopes", "bad-sweeps", "bad-coordinates",
            "bad-lift-curves");

    // CHECKSTYLE.OFF: LineLength
    /**
     * folder/file | the file the message names (empty: the file itself) | line | field | fragment of the message.
     */
    private static final String TABLE = """
            bad-cases/alias-bomb.cases.yaml              |                                    | 13 |                     | with its aliases expanded, the document grows past 100000 values here
            bad-cases/altitude-huge.cases.yaml           |                                    | 2  | cases[0].altitude   | a pressure altitude must be from -2000 m to 47000 m, got 1e200m
            bad-cases/cases-empty.cases.yaml             |                                    | 1  | cases               | expected from 1 to 500 cases, got 0
            bad-cases/empty.cases.yaml                   |                                    | 1  |                     | the file is empty; expected a list of load cases under the key cases
            bad-cases/load-factor-hexadecimal.cases.yaml |                                    | 2  | cases[0].load-factor | expected a decimal number (such as 1.25 or 3e-2), got '0x1p2'
            bad-cases/not-a-mapping.cases.yaml           |                                    | 1  |                     | the file holds plain text rather than keys with values; expected a mapping of keys
            bad-cases/speed-exponent-long.cases.yaml     |                                    | 2  | cases[0].speed      | got "1e-99999999kt": expected a decimal number (such as 1.25 or 3e-2) with an exponent of at most 3 digits
            bad-cases/speed-hexadecimal.cases.yaml       |                                    | 2  | cases[0].speed      | expected a speed with a unit (m/s, km/h, kt, mph, or ft/s), got "0x66kt"
            bad-cases/speed-huge.cases.yaml              |                                    | 2  | cases[0].speed      | a speed must be from 0.1 m/s to 1000 m/s (about 0.19 kt to 1944 kt), got "1e200kt"
            bad-cases/speed-negative.cases.yaml          |                                    | 2  | cases[0].speed      | a speed must be positive, got '-102kt'
            bad-cases/speed-tiny.cases.yaml              |                                    | 2  | cases[0].speed      | a speed must be from 0.1 m/s to 1000 m/s (about 0.19 kt to 1944 kt), got "1e-300m/s"
            bad-cases/too-many-cases.cases.yaml          |                                    | 1  | cases               | expected from 1 to 500 cases, got 501
            bad-cases/utf16-without-bom.cases.yaml       |                                    | 1  |                     | a NUL character on this line: the file holds binary data or UTF-16 text without a byte-order mark; expected a cases file saved as UTF-8
            bad-cases/weight-huge.cases.yaml             |                                    | 2  | cases[0].weight     | a weight must be from 0.01 N to 1e7 N (about 1 g to 1000 t as a mass), got "1e307kg"
            bad-cases/weight-tiny.cases.yaml             |                                    | 2  | cases[0].weight     | a weight must be from 0.01 N to 1e7 N (about 1 g to 1000 t as a mass), got "1e-300N"
            bad-envelopes/alias-bomb.envelope.yaml       |                                    | 17 |                     | with its aliases expanded, the document grows past 100000 values here
            bad-envelopes/altitude-below-range.envelope.yaml |                                | 2  | altitude            | a pressure altitude must be from -2000 m to 47000 m, got -1e200ft
            bad-envelopes/gust-huge.envelope.yaml        |                                    | 5  | gusts.vc            | a speed must be from 0.1 m/s to 1000 m/s (about 0.19 kt to 1944 kt), got "1e200ft/s"
            bad-envelopes/lift-slope-hexadecimal.envelope.yaml |                              | 6  | lift-slope          | expected a decimal number (such as 1.25 or 3e-2), got '0x5'
            bad-envelopes/speed-exponent-long.envelope.yaml |                                 | 4  | speeds.va           | with an exponent of at most 3 digits before the unit
            bad-envelopes/va-above-vc.envelope.yaml      |                                    | 4  | speeds.vc           | VC must not be below VA
            bad-envelopes/va-tiny.envelope.yaml          |                                    | 4  | speeds.va           | a speed must be from 0.1 m/s to 1000 m/s (about 0.19 kt to 1944 kt), got "1e-300kt"
            bad-envelopes/vd-huge.envelope.yaml          |                                    | 4  | speeds.vd           | a speed must be from 0.1 m/s to 1000 m/s (about 0.19 kt to 1944 kt), got "1e200kt"
            bad-envelopes/weight-huge.envelope.yaml      |                                    | 1  | weight[1]           | a weight must be from 0.01 N to 1e7 N (about 1 g to 1000 t as a mass), got "1e300kg"
            bad-envelopes/weights-empty.envelope.yaml    |                                    | 1  | weight              | expected from 1 to 20 weights, got 0
            bad-sweeps/alias-bomb.sweep.yaml             |                                    | 11 |                     | with its aliases expanded, the document grows past 100000 values here
            bad-sweeps/base-alias-bomb.sweep.yaml        | bad-wings/alias-bomb.wing.yaml     | 12 |                     | with its aliases expanded, the document grows past 100000 values here
            bad-sweeps/base-dev-zero.sweep.yaml          |                                    | 1  | base                | '/dev/zero' is not a regular file (a folder or a device); expected the base wing file
            bad-sweeps/base-etc-passwd.sweep.yaml        | /etc/passwd                        | 1  |                     | the file holds plain text rather than keys with values; expected a mapping of keys
            bad-sweeps/base-not-a-wing.sweep.yaml        | bad-wings/not-a-wing-paragraph.wing.yaml | 1 |              | the file holds plain text rather than keys with values; expected a mapping of keys
            bad-sweeps/base-nul-in-path.sweep.yaml       |                                    | 1  | base                | not a path this system accepts (Nul character not allowed); expected the base wing file
            bad-sweeps/constraints-empty.sweep.yaml      |                                    | 5  | constraints         | an empty list; expected at least one constraint, or leave constraints out
            bad-sweeps/derived-also-swept.sweep.yaml     |                                    | 6  | derived.surfaces[0].trapezoid.taper | this value is also swept (parameters.surfaces.wing.trapezoid.taper); a value is either swept or derived
            bad-sweeps/derived-constant-with-unit.sweep.yaml |                                | 5  | constants.area      | expected a plain number, got '93ft2'; constants take no unit
            bad-sweeps/derived-division-by-zero.sweep.yaml |                                  | 7  | derived.surfaces.wing.trapezoid.root-chord | character 37 of the expression: division by zero (1 / 0)
            bad-sweeps/derived-exponent-long.sweep.yaml  |                                    | 6  | derived.surfaces.wing.trapezoid.root-chord | character 1 of the expression: expected a decimal number (such as 1.25 or 3e-2) with an exponent of at most 3 digits, got '2e-99999999'
            bad-sweeps/derived-expression-too-deep.sweep.yaml |                               | 6  | derived.surfaces.wing.trapezoid.root-chord | character 17 of the expression: the expression nests more than 16 levels deep
            bad-sweeps/derived-expression-too-long.sweep.yaml |                               | 6  | derived.surfaces.wing.trapezoid.root-chord | character 201 of the expression: the expression is 244 characters long; expected at most 200
            bad-sweeps/derived-names-derived-path.sweep.yaml |                                | 4  | names.chord         | names the derived value surfaces.wing.trapezoid.root-chord; expressions use swept values, values of the base file and constants
            bad-sweeps/derived-number-hexadecimal.sweep.yaml |                                | 6  | derived.surfaces.wing.trapezoid.root-chord | character 2 of the expression: unexpected 'x'
            bad-sweeps/derived-overflow.sweep.yaml       |                                    | 6  | derived.surfaces.wing.trapezoid.washout | character 15 of the expression: the operator ^ gives a value beyond the range of numbers
            bad-sweeps/derived-unknown-name.sweep.yaml   |                                    | 6  | derived.surfaces.wing.trapezoid.root-chord | character 5 of the expression: unknown name 'area'; expected one of taper
            bad-sweeps/derived-variable-unused.sweep.yaml |                                   | 4  | parameters.aspect_ratio | 'aspect_ratio' is not a key of a wing file's top level
            bad-sweeps/flight-altitude-huge.sweep.yaml   |                                    | 5  | flight.altitude     | a pressure altitude must be from -2000 m to 47000 m, got 1e200m
            bad-sweeps/flight-isa-offset-huge.sweep.yaml |                                    | 5  | flight.isa-offset   | a temperature offset from the standard atmosphere must be from -100 K to 100 K, got "1e200K"
            bad-sweeps/flight-weight-huge.sweep.yaml     |                                    | 5  | flight.weight       | a weight must be from 0.01 N to 1e7 N (about 1 g to 1000 t as a mass), got "1e307kg"
            bad-sweeps/from-huge.sweep.yaml              |                                    | 3  | parameters.surfaces.wing.trapezoid.washout.from | is -1e200; expected 0 or a number from 1e-12 to 1e12 in size (either sign)
            bad-sweeps/load-case-speed-huge.sweep.yaml   |                                    | 5  | load-case.speed     | a speed must be from 0.1 m/s to 1000 m/s (about 0.19 kt to 1944 kt), got "1e200kt"
            bad-sweeps/lhs-cases-overflow.sweep.yaml     |                                    | 5  | design.cases        | expected a finite number, got 1e999 (beyond the range of numbers, about 1.8e308)
            bad-sweeps/parameter-list-empty.sweep.yaml   |                                    | 3  | parameters.surfaces.wing.trapezoid.taper | expected at least one value
            bad-sweeps/points-empty-list.sweep.yaml      |                                    | 5  | points.alpha        | expected from 1 to 100 values, got 0
            bad-sweeps/points-empty-mapping.sweep.yaml   |                                    | 5  | points              | expected alpha or CL (a list or a range {from, to, step}), or leave points out
            bad-sweeps/points-step-exponent-long.sweep.yaml |                                 | 5  | points.alpha.step   | with an exponent of at most 3 digits, got '1e-99999999'
            bad-sweeps/points-too-many.sweep.yaml        |                                    | 5  | points.alpha.step   | the range from 0 to 4 by 1e-5 gives more than 100 points; expected at most 100
            bad-sweeps/range-too-many-values.sweep.yaml  |                                    | 3  | parameters.surfaces.wing.trapezoid.washout.step | the range from 0 to 1e12 by 1e-3 has more than 1000000000 values; expected a coarser step
            bad-sweeps/step-exponent-huge.sweep.yaml     |                                    | 3  | parameters.surfaces.wing.trapezoid.taper.step | with an exponent of at most 3 digits, got '1e-999999999'
            bad-sweeps/step-exponent-long.sweep.yaml     |                                    | 3  | parameters.surfaces.wing.trapezoid.taper.step | with an exponent of at most 3 digits, got '1e-10000000'
            bad-sweeps/step-tiny.sweep.yaml              |                                    | 3  | parameters.surfaces.wing.trapezoid.taper.step | is 1e-999; expected 0 or a number from 1e-12 to 1e12 in size
            bad-coordinates/comma-decimal.dat            |                                    | 4  |                     | 4 columns; expected two columns x y
            bad-coordinates/control-character.dat        |                                    | 11 |                     | a control character U+000C on this line; expected a text file of x y section coordinates of plain text
            bad-coordinates/exponent-long.dat            |                                    | 8  |                     | value 2 on the line ('2.1213e-99999999') is not a number; expected two decimal numbers x y per line
            bad-coordinates/hexadecimal.dat              |                                    | 5  |                     | value 1 on the line is not a number; expected two decimal numbers x y per line
            bad-coordinates/infinity.dat                 |                                    | 9  |                     | x is Infinity; expected finite numbers x y
            bad-coordinates/java-suffix.dat              |                                    | 7  |                     | value 1 on the line ('0.629410f') is not a number
            bad-coordinates/latin1.dat                   |                                    | 1  |                     | the file is not UTF-8 text (byte 0xE9 on this line is not UTF-8); expected a text file of x y section coordinates saved as UTF-8
            bad-coordinates/name-too-long.dat            |                                    | 1  |                     | a first line of 158 characters that is not a pair of numbers; expected the section's name (at most 100 characters)
            bad-coordinates/prose.dat                    |                                    | 2  |                     | value 1 on the line is not a number; expected two decimal numbers x y per line
            bad-coordinates/utf16-without-bom.dat        |                                    | 1  |                     | a NUL character on this line: the file holds binary data or UTF-16 text without a byte-order mark
            bad-lift-curves/angle-beyond-90.csv   |                                    | 6  | alpha_deg           | 95 degrees is outside -90 to 90; expected angles of attack from -90 to 90 degrees
            bad-lift-curves/cl-beyond-5.csv       |                                    | 4  | cl                  | 40 is beyond 5 in size; expected section lift coefficients from -5 to 5
            bad-lift-curves/comments-only.csv     |                                    | 3  |                     | the file holds no header line; expected a header line naming the columns alpha_deg and cl
            bad-lift-curves/control-character.csv |                                    | 3  |                     | a control character U+000C on this line; expected a CSV file of a section lift curve of plain text
            bad-lift-curves/decimal-comma.csv     |                                    | 3  |                     | 3 values on the line; expected 2, one per column of the header (line 1), separated by commas
            bad-lift-curves/duplicate-column.csv  |                                    | 1  |                     | the column cl is named twice (columns 2 and 3); expected each column once
            bad-lift-curves/empty-value.csv       |                                    | 3  | cl                  | no value; expected a decimal number (such as 1.25 or 3e-2)
            bad-lift-curves/ends-at-maximum.csv   |                                    | 8  | cl                  | the curve ends without falling past its maximum (its highest cl, 0.8 at 6 degrees, has no lower cl after it); expected the curve to reach past its maximum
            bad-lift-curves/exponent-long.csv     |                                    | 4  | cl                  | not a number ('4e-99999999'); expected a decimal number (such as 1.25 or 3e-2) with an exponent of at most 3 digits
            bad-lift-curves/exponent-overflow.csv |                                    | 4  | cl                  | expected a finite number, got 4e999 (beyond the range of numbers, about 1.8e308)
            bad-lift-curves/latin1.csv            |                                    | 2  |                     | the file is not UTF-8 text (byte 0xE9 on this line is not UTF-8); expected a CSV file of a section lift curve saved as UTF-8
            bad-lift-curves/missing-cl-column.csv |                                    | 2  |                     | the header has no cl column; expected a header line naming the columns alpha_deg and cl
            bad-lift-curves/nan.csv               |                                    | 4  | cl                  | expected a finite number, got NaN
            bad-lift-curves/no-header.csv         |                                    | 1  |                     | the first line holds numbers, not a header; expected a header line naming the columns alpha_deg and cl
            bad-lift-curves/no-zero-lift.csv      |                                    | 2  | cl                  | the curve does not rise through zero lift below its maximum
            bad-lift-curves/not-a-number.csv      |                                    | 4  | cl                  | not a number ('0x1p-1'); expected a decimal number (such as 1.25 or 3e-2)
            bad-lift-curves/not-increasing.csv    |                                    | 4  | alpha_deg           | 0 degrees after 0 on line 3; expected angles that increase strictly from line to line
            bad-lift-curves/prose.csv             |                                    | 1  |                     | column 1 of the header is not one of alpha_deg, cl, cd, cm; expected a header line
            bad-lift-curves/too-few.csv           |                                    | 4  |                     | only 3 angles in the file; expected at least 4 lines of data
            bad-lift-curves/too-many.csv          |                                    | 1002|                     | more than 1000 angles; expected at most 1000 lines of data
            bad-lift-curves/unknown-column.csv    |                                    | 1  |                     | column 3 of the header is not one of alpha_deg, cl, cd, cm
            bad-lift-curves/utf16-without-bom.csv |                                    | 1  |                     | a NUL character on this line: the file holds binary data or UTF-16 text without a byte-order mark; expected a CSV file of a section lift curve saved as UTF-8
            bad-lift-curves/wrong-count.csv       |                                    | 3  |                     | 3 values on the line; expected 2, one per column of the header (line 1)
            """;
    // CHECKSTYLE.ON: LineLength

    private static void read(String folder, Path path) {
        switch (folder) {
            case "bad-cases" -> CasesReader.read(path);
            case "bad-envelopes" -> EnvelopeReader.read(path);
            case "bad-sweeps" -> SweepFileReader.read(path, false);
            case "bad-coordinates" -> CoordinateFileReader.read(path);
            case "bad-lift-curves" -> LiftCurveFileReader.read(path);
            default -> throw new IllegalArgumentException("no reader for " + folder);
        }
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '`', textBlock = TABLE)
    void hostileFileIsRefusedWithOneLineNamingFileLineAndField(String name, String named, int line, String field,
            String fragment) {
        Path path = RESOURCES.resolve(name);
        String folder = name.substring(0, name.indexOf('/'));
        InputException e = assertThrows(InputException.class, () -> read(folder, path));
        String message = e.getMessage();
        String file = named == null ? path.toString() : named;
        String fieldPath = field == null ? "" : field;
        assertAll(
                () -> assertFalse(message.contains("\n") || message.contains("\r"), "one line: " + message),
                () -> assertTrue(e.file().endsWith(file) || Path.of(e.file()).normalize().endsWith(file),
                        "names " + file + ": " + message),
                () -> assertEquals(line, e.line(), message),
                () -> assertEquals(fieldPath, e.field(), message),
                () -> assertTrue(message.contains(fragment), "expected [" + fragment + "] in: " + message),
                () -> assertTrue(message.length() < 400, "short: " + message));
    }

    @Test
    void everyHostileFileHasARowInTheTable() throws IOException {
        Set<String> listed = Arrays.stream(TABLE.strip().split("\n")).map(r -> r.split("\\|")[0].trim())
                .collect(Collectors.toCollection(TreeSet::new));
        Set<String> files = new TreeSet<>();
        for (String folder : FOLDERS) {
            try (Stream<Path> s = Files.list(RESOURCES.resolve(folder))) {
                s.filter(Files::isRegularFile).forEach(p -> files.add(folder + "/" + p.getFileName()));
            }
        }
        assertEquals(files, listed);
    }

    @Test
    void theBaseOfTheHostileSweepsIsAValidWing() {
        // The sweeps above fail for their own faults, not for their base.
        assertEquals("wing", WingFileReader.read(RESOURCES.resolve("bad-sweeps/base/ok.wing.yaml")).main().name());
    }
}
