package org.spanlift.io;

import org.spanlift.input.InputException;
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
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every malformed wing file under {@code bad-wings/} is refused with one line of the form
 * {@code FILE:LINE: FIELD: what is wrong; what is expected}, naming the right line and field.
 */
class BadWingFileTest {

    private static final Path BAD = Path.of("src", "test", "resources", "bad-wings");

    // CHECKSTYLE.OFF: LineLength
    /** file | line | field path (empty: the fault is in the YAML itself) | fragment of the message. */
    private static final String TABLE = """
            missing-units                | 2  | units                                  | missing key; expected the length unit of the file: m, ft or in
            missing-surfaces             | 1  | surfaces                               | missing key; expected a list of surfaces
            missing-station-y            | 6  | surfaces[0].stations[1].y              | missing key; expected the station's spanwise position
            missing-station-chord        | 7  | surfaces[0].stations[1].chord          | missing key; expected the local chord
            missing-control-kind         | 6  | surfaces[0].controls[0].kind           | missing key; expected flap, aileron or elevator
            empty-required-value         | 6  | surfaces[0].stations[0].chord          | the key has no value; expected the local chord
            empty-optional-value         | 7  | surfaces[0].trapezoid.washout          | the key has no value; expected a value, or leave the key out
            unknown-top-key              | 2  | colour                                 | unknown key; expected one of fuselage, name, reference, sections, structure, surfaces, thrust-line, units
            unknown-surface-key          | 4  | surfaces[0].mirrored                   | unknown key; expected one of controls, elliptic, fuselage-half-width, lattice, mirror,
            unknown-station-key          | 6  | surfaces[0].stations[1].incidence      | unknown key; expected one of chord, nose-x, nose-z, section, twist, y
            unknown-trapezoid-key        | 7  | surfaces[0].trapezoid.tip-chord        | unknown key; expected one of dihedral, root-chord, root-nose,
            unknown-control-key          | 11 | surfaces[0].controls[0].hinge          | unknown key; expected one of chord-fraction, deflection, from, kind,
            unknown-lattice-key          | 5  | surfaces[0].lattice.columns            | unknown key; expected one of row-spacing, rows, strip-spacing, strips
            unknown-section-key          | 9  | sections.main.thickness                | unknown key; expected one of camber
            unknown-reference-key        | 2  | reference.mac                          | unknown key; expected one of area, chord, moment-point, span
            chord-is-list                | 5  | surfaces[0].stations[0].chord          | expected a number, got a list
            span-is-text                 | 4  | surfaces[0].trapezoid.span             | expected a decimal number (such as 1.25 or 3e-2), got 'wide'
            quoted-number                | 4  | surfaces[0].trapezoid.root-chord       | expected a number, got the quoted text "1.2"; write numbers without quotes
            number-with-suffix           | 4  | surfaces[0].trapezoid.root-chord       | expected a decimal number (such as 1.25 or 3e-2), got '1.2f'
            mirror-not-boolean           | 4  | surfaces[0].mirror                     | expected true or false, got 'yes'
            fuselage-negative            | 4  | surfaces[0].fuselage-half-width        | must not be negative, got -0.3
            fuselage-beyond-tip          | 4  | surfaces[0].fuselage-half-width        | must be less than the semi-span (4.5), got 4.5
            fuselage-unmirrored          | 5  | surfaces[0].fuselage-half-width        | applies to a mirrored surface only; expected mirror: true
            negative-chord               | 6  | surfaces[0].stations[1].chord          | must not be negative, got -0.2; expected a tip chord of 0 or more
            zero-chord-inner-station     | 6  | surfaces[0].stations[1].chord          | must be positive, got 0; expected a chord above 0 (only the tip station may have zero chord)
            stations-not-increasing      | 7  | surfaces[0].stations[2].y              | is 2.5, after a station at 3; expected stations in increasing y
            mirrored-root-below-zero     | 6  | surfaces[0].stations[0].y              | the root is at -0.5, but a mirrored surface is described on its right half; expected a root y of 0 or more
            absurd-length                | 4  | surfaces[0].trapezoid.span             | beyond any wing; expected a length within 10000 m
            control-outside-span         | 6  | surfaces[0].controls[0].to             | 6 lies outside the surface; expected a y from 0 to 4.5
            control-from-not-below-to    | 6  | surfaces[0].controls[0].to             | is 2.5, not beyond 'from' (2.5); expected the outer end, greater than 'from'
            controls-overlap             | 7  | surfaces[0].controls[1].from           | overlaps control 'flap' (y from 0.5 to 2.5); expected controls that do not overlap
            duplicate-control-name       | 7  | surfaces[0].controls[1].name           | another control has the name 'flap'; expected a name no other control
            duplicate-surface-name       | 5  | surfaces[1].name                       | another surface has the name 'wing'; expected a name no other surface has
            chord-fraction-zero          | 6  | surfaces[0].controls[0].chord-fraction | is 0; expected a fraction of the local chord between 0 and 1, both excluded
            chord-fraction-one           | 6  | surfaces[0].controls[0].chord-fraction | is 1; expected a fraction of the local chord between 0 and 1, both excluded
            chord-fraction-above-one     | 6  | surfaces[0].controls[0].chord-fraction | is 1.3; expected a fraction of the local chord between 0 and 1, both excluded
            aileron-unmirrored           | 9  | surfaces[0].controls[0].kind           | an aileron deflects antisymmetrically and needs a mirrored surface; expected kind flap
            unknown-section-name         | 4  | surfaces[0].section                    | unknown section 'main'; expected flat or one of the file's sections: inner
            unknown-station-section      | 8  | surfaces[0].stations[1].section        | unknown section 'outer'; expected flat or one of the file's sections: inner
            flat-section-redefined       | 6  | sections.flat                          | the section name 'flat' is built in
            unknown-units                | 1  | units                                  | expected one of m, ft, in, got 'furlong'
            newline-in-text              | 1  | units                                  | expected one of m, ft, in, got 'm\\nft'
            unknown-camber               | 7  | sections.main.camber                   | unknown camber designation 'NACA 24x2'; expected flat, NACA MPTT (four-digit
            camber-without-position      | 7  | sections.main.camber                   | the camber designation 'NACA 4012' has camber but no camber position (its second digit is 0)
            strips-zero                  | 5  | surfaces[0].lattice.strips             | must be from 1 to 400, got 0
            strips-huge                  | 5  | surfaces[0].lattice.strips             | must be from 1 to 400, got 100000
            rows-huge                    | 5  | surfaces[0].lattice.rows               | must be from 1 to 64, got 500
            strips-fractional            | 5  | surfaces[0].lattice.strips             | expected a whole number, got 12.5
            too-few-strips-for-cuts      | 8  | surfaces[0].lattice.strips             | 3 strips cannot place a strip edge on each of the surface's 4 control ends and stations; expected at least 5 strips
            one-row-with-controls        | 7  | surfaces[0].lattice.rows               | is 1, but the surface has controls; expected at least 2 rows
            too-many-panels              | 5  | surfaces[0].lattice                    | the lattice would have 51200 panels over the whole wing; expected at most 12000
            stations-and-trapezoid       | 7  | surfaces[0].trapezoid                  | the surface already has 'stations' (line 4); expected only one of stations, trapezoid or elliptic
            no-planform                  | 3  | surfaces[0]                            | missing the planform; expected one of the keys stations, trapezoid or elliptic
            no-surfaces-listed           | 2  | surfaces                               | expected at least one surface
            nan-dot                      | 4  | surfaces[0].trapezoid.span             | expected a finite number, got .nan
            nan-word                     | 4  | surfaces[0].trapezoid.root-chord       | expected a finite number, got NaN
            infinity                     | 6  | surfaces[0].stations[1].y              | expected a finite number, got .inf
            duplicate-key                | 7  | surfaces[0].trapezoid.span             | duplicate key (first given on line 5); expected each key once
            type-tag                     | 3  | surfaces[0].name                       | type tags such as !!python/object:os.system are not accepted; expected a plain value
            not-a-mapping                | 1  |                                        | expected a mapping of keys, got a list
            empty                        | 1  |                                        | the file is empty; expected a wing description
            comment-only                 | 1  |                                        | the file holds only comments; expected a wing description
            unbalanced-brackets          | 4  |                                        | not valid YAML: the file ends inside the flow sequence that starts on this line; expected ',' or ']'
            tab-indented                 | 5  |                                        | a tab character where YAML expects indentation or a value; expected spaces
            recursive-alias              | 5  |                                        | the alias *loop refers to the list or mapping that contains it
            deep-nesting                 | 2  |                                        | lists and mappings nested 33 deep; expected at most 32 levels
            alias-bomb                   | 12 |                                        | with its aliases expanded, the document grows past 100000 values here; expected at most 100000
            alias-wide                   | 4  |                                        | with its aliases expanded, the document grows past 100000 values here
            too-many-aliases             | 3  |                                        | more than 50 aliases (*name); expected at most 50, or the values written out
            alias-undefined              | 4  |                                        | the alias *nothing names no anchor; expected an anchor &nothing given earlier in the file
            merge-key                    | 6  | surfaces[0].trapezoid.<<               | merge keys are not supported; expected the keys written out
            two-documents                | 5  |                                        | a second document starts here (after ---); expected a single document
            key-is-list                  | 2  |                                        | a key that is a list, a mapping or tagged; expected plain names as keys
            binary-noise                 | 1  |                                        | the file is not UTF-8 text (byte 0xE9 on this line is not UTF-8); expected a wing file saved as UTF-8
            latin1-on-line-3             | 3  |                                        | the file is not UTF-8 text (byte 0xE9 on this line is not UTF-8); expected a wing file saved as UTF-8
            utf16-with-bom               | 1  |                                        | the file starts with a UTF-16 or UTF-32 byte-order mark; expected a wing file saved as UTF-8
            utf16-without-bom            | 1  |                                        | a NUL character on this line: the file holds binary data or UTF-16 text without a byte-order mark
            nul-byte                     | 2  |                                        | a NUL character on this line
            control-character            | 2  |                                        | a control character U+0007 on this line; expected a wing file of plain text
            not-a-wing-paragraph         | 1  |                                        | the file holds plain text rather than keys with values; expected a mapping of keys
            camber-file-dev-zero         | 7  | sections.main.camber-file              | /dev/zero:1: the file goes on past 16 MiB (the limit is reached on this line); expected a text file of x y section coordinates of at most 16 MiB
            camber-file-dev-urandom      | 7  | sections.main.camber-file              | the file goes on past 16 MiB (the limit is reached on this line)
            camber-file-prose            | 7  | sections.main.camber-file              | bad-coordinates/prose.dat:2: value 1 on the line is not a number; expected two decimal numbers x y per line
            camber-file-hexadecimal      | 7  | sections.main.camber-file              | bad-coordinates/hexadecimal.dat:5: value 1 on the line is not a number
            camber-file-is-folder        | 7  | sections.main.camber-file              | bad-coordinates: is a folder; expected the path of a text file of x y section coordinates
            camber-file-nul-in-path      | 7  | sections.main.camber-file              | not a path this system accepts (Nul character not allowed); expected the path of a text file
            number-hexadecimal           | 4  | surfaces[0].trapezoid.span             | expected a decimal number (such as 1.25 or 3e-2), got '0x10'
            number-double-suffix         | 4  | surfaces[0].trapezoid.root-chord       | expected a decimal number (such as 1.25 or 3e-2), got '1.5d'
            number-octal                 | 5  | surfaces[0].lattice.strips             | expected a decimal number (such as 1.25 or 3e-2), got '0o17'
            number-underscore            | 4  | surfaces[0].trapezoid.span             | expected a decimal number (such as 1.25 or 3e-2), got '1_000'
            strips-hexadecimal           | 5  | surfaces[0].lattice.strips             | expected a decimal number (such as 1.25 or 3e-2), got '0x20'
            number-exponent-long         | 4  | surfaces[0].trapezoid.span             | expected a decimal number (such as 1.25 or 3e-2) with an exponent of at most 3 digits, got '1e-10000000'
            number-exponent-overflow     | 4  | surfaces[0].trapezoid.span             | expected a finite number, got 1e999 (beyond the range of numbers, about 1.8e308)
            number-too-long              | 4  | surfaces[0].trapezoid.span             | expected a decimal number (such as 1.25 or 3e-2) of at most 40 characters, got '9.00000000000000000000000000000000000...'
            number-plus-infinity         | 6  | surfaces[0].stations[1].twist          | expected a finite number, got +.inf
            deflection-overflow          | 6  | surfaces[0].controls[0].deflection     | expected a finite number, got 1e999
            reynolds-overflow            | 8  | sections.main.cl-max.reynolds[1]       | expected a finite number, got 1e999
            cl-max-exponent-long         | 7  | sections.main.cl-max                   | with an exponent of at most 3 digits, got '1e-99999'
            reference-area-tiny          | 5  | reference.area                         | is 1e-300 m^2; expected an area from 1e-6 to 1e8 m^2 (1 mm by 1 mm to 10 km by 10 km)
            reference-area-huge          | 5  | reference.area                         | is 1e12 m^2; expected an area from 1e-6 to 1e8 m^2
            reference-span-tiny          | 5  | reference.span                         | is 1e-300, smaller than any part of a wing; expected a length of at least 0.001 m (1 mm)
            reference-chord-tiny         | 5  | reference.chord                        | is 1e-9, smaller than any part of a wing; expected a length of at least 0.001 m (1 mm)
            moment-point-far             | 5  | reference.moment-point                 | is 1e300, beyond any wing; expected a length within 10000 m
            span-tiny                    | 4  | surfaces[0].trapezoid.span             | is 1e-300, smaller than any part of a wing; expected a length of at least 0.001 m (1 mm)
            root-chord-tiny              | 4  | surfaces[0].trapezoid.root-chord       | is 0.0001, smaller than any part of a wing; expected a length of at least 0.001 m (1 mm)
            elliptic-span-subnormal      | 4  | surfaces[0].elliptic.span              | is 4.9e-324, smaller than any part of a wing; expected a length of at least 0.001 m (1 mm)
            station-chord-tiny           | 5  | surfaces[0].stations[0].chord          | is 1e-9, smaller than any part of a wing; expected a chord of at least 0.001 m (1 mm)
            tip-chord-tiny               | 6  | surfaces[0].stations[1].chord          | is 1e-7, smaller than any part of a wing; expected a chord of at least 0.003281 ft (1 mm), or 0 for a pointed tip
            fuselage-covers-every-strip  | 5  | surfaces[0].fuselage-half-width        | leaves no strip of the lattice outboard of the fuselage side (the outermost strip's centre is at y 4.899); expected a half-width below that
            controls-empty               | 5  | surfaces[0].controls                   | an empty list; expected at least one control {name, kind, from, to, chord-fraction}, or leave controls out
            structure-mass-huge          | 6  | structure.mass                         | a mass must be from 0 kg to 1e6 kg (0 lb to 2.2e6 lb), got "1e307kg"
            structure-mass-exponent-long | 6  | structure.mass                         | got "1e-99999kg": expected a decimal number (such as 1.25 or 3e-2) with an exponent of at most 3 digits before the unit
            point-mass-huge              | 7  | structure.point-masses[0].mass         | a mass must be from 0 kg to 1e6 kg (0 lb to 2.2e6 lb), got "1e300kg"
            point-mass-x-far             | 7  | structure.point-masses[0].x            | is 1e300, beyond any wing; expected an x within 10000 of the origin, in the file's units
            point-masses-empty           | 6  | structure.point-masses                 | an empty list; expected at least one point mass {name, mass, y, x}, or leave point-masses out
            mass-per-span-huge           | 7  | structure.mass-table[0].mass-per-span  | a mass per unit span must be from 0 to 100000 kg/m (a thousand tonnes over ten metres), got '1e300kg/m'
            units-very-long              | 1  | units                                  | expected one of m, ft, in, got 'metremetremetremetremetremetremetreme...'
            lift-curve-angles-not-increasing        | 8  | sections.main.lift-curve.alpha[4]      | the values must increase strictly; 0 follows 0
            lift-curve-angle-beyond-90              | 8  | sections.main.lift-curve.alpha[0]      | must be from -90 to 90, got -95
            lift-curve-angle-exponent-long          | 9  | sections.main.lift-curve.alpha[6]      | with an exponent of at most 3 digits, got '6e-99999999'
            lift-curve-too-few-angles               | 8  | sections.main.lift-curve.alpha         | expected from 4 to 1000 angles (through zero lift and past the maximum), got 3
            lift-curve-too-many-angles              | 9  | sections.main.lift-curve.alpha         | expected from 4 to 1000 angles (through zero lift and past the maximum), got 1001
            lift-curve-cl-beyond-5                  | 8  | sections.main.lift-curve.cl[5]         | must be from -5 to 5, got 6.5
            lift-curve-cl-infinite                  | 10 | sections.main.lift-curve.cl[5]         | expected a finite number, got .inf
            lift-curve-cl-hexadecimal               | 10 | sections.main.lift-curve.cl[3]         | expected a decimal number (such as 1.25 or 3e-2), got '0x1'
            lift-curve-row-too-short                | 10 | sections.main.lift-curve.cl            | expected 7 values of cl, one per angle, got 6
            lift-curve-rows-per-reynolds            | 11 | sections.main.lift-curve.cl            | expected one list of cl per Reynolds number (2), got 3
            lift-curve-reynolds-row-too-long        | 12 | sections.main.lift-curve.cl[1]         | expected 13 values of cl, one per angle, got 14
            lift-curve-reynolds-not-increasing      | 9  | sections.main.lift-curve.reynolds[1]   | the values must increase strictly; 1000000 follows 3000000
            lift-curve-reynolds-tiny                | 9  | sections.main.lift-curve.reynolds[0]   | must be from 1000 to 1000000000, got 100
            lift-curve-too-many-reynolds            | 9  | sections.main.lift-curve.reynolds      | expected from 1 to 50 Reynolds numbers, got 51
            lift-curve-no-zero-lift                 | 8  | sections.main.lift-curve.cl[0]         | does not rise through zero lift below its maximum (no angle below 8 degrees has cl at or below 0 with cl above 0 at the next); expected the curve to start at or below zero lift
            lift-curve-ends-at-maximum              | 8  | sections.main.lift-curve.cl[5]         | the curve ends without falling past its maximum (its highest cl, 0.8 at 6 degrees, has no lower cl after it); expected the curve to reach past its maximum
            lift-curve-reynolds-row-ends-at-maximum | 13 | sections.main.lift-curve.cl[1][12]     | the curve at Reynolds number 3000000 ends without falling past its maximum
            lift-curve-zero-lift-disagrees          | 8  | sections.main.zero-lift-angle          | is -3 degrees, but the lift curve (line 9) crosses zero lift at -2 degrees; expected the two within 0.5 degree
            lift-curve-slope-disagrees              | 8  | sections.main.lift-slope               | is 0.11 per degree, but the lift curve (line 9) rises at 0.1 per degree over its linear part (least squares from -2 to 6 degrees); expected the two within 5%
            lift-curve-cl-max-disagrees             | 8  | sections.main.cl-max                   | is 1.5, but the lift curve (line 9) reaches at most 1.4; expected the two within 0.02
            lift-curve-cl-max-table-disagrees       | 8  | sections.main.cl-max                   | is 1.6 at Reynolds number 3000000, but the lift curve (line 9) reaches at most 1.52 there; expected the two within 0.02
            lift-curve-zero-lift-beyond-15          | 8  | sections.main.lift-curve.cl[1]         | the curve crosses zero lift at -20.67 degrees; expected a zero-lift angle from -15 to 15 degrees
            lift-curve-slope-too-steep              | 8  | sections.main.lift-curve.cl[3]         | the curve rises at 0.2 per degree over its linear part (least squares from -2 to 2 degrees); expected a lift slope from 0.03 to 0.13 per degree
            lift-curve-maximum-too-low              | 8  | sections.main.lift-curve.cl[4]         | the curve's maximum cl is 0.2; expected a maximum from 0.3 to 4 (the range of cl-max)
            lift-curve-file-and-table               | 8  | sections.main.lift-curve               | both a file and a table; expected either file or the table
            lift-curve-unknown-key                  | 8  | sections.main.lift-curve.cd            | unknown key; expected one of alpha, cl, file, reynolds
            lift-curve-missing-cl                   | 8  | sections.main.lift-curve.cl            | missing key; expected the lift coefficients, one per angle
            lift-curve-not-a-mapping                | 8  | sections.main.lift-curve               | expected a mapping of keys, got a list
            lift-curve-file-dev-zero                | 8  | sections.main.lift-curve.file          | /dev/zero:1: the file goes on past 16 MiB (the limit is reached on this line); expected a CSV file of a section lift curve of at most 16 MiB
            lift-curve-file-missing                 | 8  | sections.main.lift-curve.file          | bad-wings/no-such-curve.csv: no such file; expected the path of a CSV file of a section lift curve
            lift-curve-file-is-folder               | 8  | sections.main.lift-curve.file          | bad-lift-curves: is a folder; expected the path of a CSV file of a section lift curve
            lift-curve-file-nul-in-path             | 8  | sections.main.lift-curve.file          | not a path this system accepts (Nul character not allowed); expected the path of a CSV file of a section lift curve
            lift-curve-file-prose                   | 8  | sections.main.lift-curve.file          | bad-lift-curves/prose.csv:1: column 1 of the header is not one of alpha_deg, cl, cd, cm
            lift-curve-file-ends-at-maximum         | 8  | sections.main.lift-curve.file          | bad-lift-curves/ends-at-maximum.csv:8: cl: the curve ends without falling past its maximum
            lift-curve-file-not-a-number            | 8  | sections.main.lift-curve.file          | bad-lift-curves/not-a-number.csv:4: cl: not a number ('0x1p-1'); expected a decimal number
            lift-curve-file-coordinates             | 8  | sections.main.lift-curve.file          | section/valid-commented.dat:2: column 1 of the header is not one of alpha_deg, cl, cd, cm
            flap-lift-curves-without-clean          | 8  | sections.main.flap-lift-curves         | flap lift curves need the clean one; expected lift-curve in this section too
            flap-lift-curves-empty                  | 9  | sections.main.flap-lift-curves         | an empty list; expected at least one flap curve {deflection, alpha, cl} or {deflection, file}
            flap-lift-curves-too-many               | 9  | sections.main.flap-lift-curves         | expected at most 20 flap curves, got 21
            flap-lift-curve-deflection-zero         | 10 | sections.main.flap-lift-curves[0].deflection | must be above 0 and at most 60 degrees, got 0
            flap-lift-curve-deflection-beyond-60    | 10 | sections.main.flap-lift-curves[0].deflection | must be above 0 and at most 60 degrees, got 70
            flap-lift-curves-not-increasing         | 11 | sections.main.flap-lift-curves[1].deflection | is 20 degrees, not above the previous curve's 30; expected deflections that increase strictly
            flap-lift-curve-missing-deflection      | 10 | sections.main.flap-lift-curves[0].deflection | missing key; expected the flap deflection of this curve
            flap-lift-curve-unknown-key             | 10 | sections.main.flap-lift-curves[0].reynolds-number | unknown key; expected one of alpha, cl, deflection, file, reynolds
            flap-lift-curve-below-clean             | 10 | sections.main.flap-lift-curves[0].cl[4] | the curve's maximum cl, 1.3, is 0.1 below the clean curve's 1.4; expected a flap curve that raises cl_max by 0 to 3
            flap-lift-curve-no-zero-lift            | 10 | sections.main.flap-lift-curves[0].cl[0] | does not rise through zero lift below its maximum
            flap-lift-curve-file-ends-at-maximum    | 10 | sections.main.flap-lift-curves[0].file | bad-lift-curves/ends-at-maximum.csv:8: cl: the curve ends without falling past its maximum
            second-surface-role-wing                | 6  | surfaces[1].role                       | only the first surface is the wing; expected tail or canard, or no role
            first-surface-role-canard               | 4  | surfaces[0].role                       | the first surface is the wing; expected role wing here, or put the wing first
            elevator-without-tail-role              | 8  | surfaces[1].controls[0].kind           | an elevator belongs on the tail or the canard; expected role: tail or role: canard on this surface, or another kind
            elevator-limits-reversed                | 9  | surfaces[1].controls[0].limits         | is [15, -25]; expected [least, greatest] in degrees, the least first
            elevator-deflection-beyond-limits       | 9  | surfaces[1].controls[0].limits         | do not hold the control's deflection of 20 degrees; expected limits around it
            two-tails                               | 9  | surfaces[2].role                       | another surface is already the tail; expected one tail at most
            fuselage-missing-width                  | 5  | fuselage.width                         | missing key; expected the fuselage's greatest width
            thrust-line-unknown-key                 | 5  | thrust-line.angle                      | unknown key; expected one of height
            flap-cl-max-disagrees-with-flap-curve   | 9  | sections.main.flap-cl-max              | gives an increment of 0.5 at 20 degrees, but the flap curve at 20 degrees (line 11) reaches 1.7, 0.3 above the clean curve's 1.4; expected the two within 0.02
            """;
    // CHECKSTYLE.ON: LineLength

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '`', textBlock = TABLE)
    void malformedFileIsRefusedWithOneLineNamingLineFieldAndExpectation(String name, int line, String field,
            String fragment) {
        Path path = BAD.resolve(name + ".wing.yaml");
        String fieldPath = field == null ? "" : field;
        InputException e = assertThrows(InputException.class, () -> WingFileReader.read(path));
        String message = e.getMessage();
        String prefix = path + ":" + line + ": " + (fieldPath.isEmpty() ? "" : fieldPath + ": ");
        assertAll(
                () -> assertFalse(message.contains("\n") || message.contains("\r"), "one line: " + message),
                () -> assertTrue(message.startsWith(prefix), "expected to start with [" + prefix + "]: " + message),
                () -> assertEquals(line, e.line(), message),
                () -> assertEquals(fieldPath, e.field(), message),
                () -> assertTrue(message.contains(fragment), "expected [" + fragment + "] in: " + message),
                () -> assertTrue(e.problem().contains("expected") || e.problem().contains("must"),
                        "says what is expected: " + message));
    }

    @Test
    void everyBadFileHasARowInTheTable() throws IOException {
        Set<String> listed = Arrays.stream(TABLE.strip().split("\n")).map(r -> r.split("\\|")[0].trim())
                .collect(Collectors.toCollection(TreeSet::new));
        Set<String> files;
        try (Stream<Path> s = Files.list(BAD)) {
            files = s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".wing.yaml"))
                    .map(n -> n.substring(0, n.length() - ".wing.yaml".length()))
                    .collect(Collectors.toCollection(TreeSet::new));
        }
        assertEquals(files, listed);
        assertTrue(files.size() >= 30, "at least 30 bad files, found " + files.size());
    }

    @Test
    void missingFileIsOneLineNamingThePath(@TempDir Path dir) {
        Path path = dir.resolve("absent.wing.yaml");
        InputException e = assertThrows(InputException.class, () -> WingFileReader.read(path));
        assertEquals(path + ": no such file; expected the path of a wing file", e.getMessage());
    }

    @Test
    void folderGivenForAFileIsRefusedAsSuch(@TempDir Path dir) {
        InputException e = assertThrows(InputException.class, () -> WingFileReader.read(dir));
        assertEquals(dir + ": is a folder; expected the path of a wing file", e.getMessage());
    }

    @Test
    void fileThatIsNotUtf8IsRefusedAsSuchOnTheLineOfTheFirstBadByte(@TempDir Path dir) throws IOException {
        Path path = dir.resolve("latin1.wing.yaml");
        Files.write(path, new byte[] {'u', 'n', 'i', 't', 's', ':', ' ', 'm', '\n', 'n', 'a', 'm', 'e', ':', ' ',
            (byte) 0xE9, '\n'});
        InputException e = assertThrows(InputException.class, () -> WingFileReader.read(path));
        assertEquals(path + ":2: the file is not UTF-8 text (byte 0xE9 on this line is not UTF-8); expected a wing "
                + "file saved as UTF-8", e.getMessage());
    }

    @Test
    void aKeyOfThousandsOfCharactersIsCutShortInTheMessage(@TempDir Path dir) throws IOException {
        Path path = dir.resolve("long-key.wing.yaml");
        // A plain key is at most 1024 characters in YAML; an explicit key (?) may be longer.
        Files.writeString(path, "units: m\n? " + "k".repeat(5000) + "\n: 1\n");
        InputException e = assertThrows(InputException.class, () -> WingFileReader.read(path));
        assertEquals(5000, e.field().length(), "the exception keeps the whole path");
        assertTrue(e.getMessage().length() < path.toString().length() + 300, e.getMessage());
        assertTrue(e.getMessage().startsWith(path + ":2: " + "k".repeat(117) + "...: unknown key"), e.getMessage());
    }

    @Test
    void controlCharactersInEchoedTextStayOnOneLine() {
        InputException e = new InputException("f.wing.yaml", 3, "name", List.of("a\r\nb", "c\u0007d")
                .toString());
        assertEquals("f.wing.yaml:3: name: [a\\r\\nb, c\\u0007d]", e.getMessage());
    }
}
