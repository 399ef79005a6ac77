package org.spanlift.section;

import org.spanlift.io.CoordinateFileReader;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Extraction of the mean line from generated coordinate files. Reference: the analytic mean lines of
 * Report 460 / Report 537 from which the files were generated (thickness normal to the mean line,
 * Report 460 thickness with its open trailing edge).
 */
class CoordinateMeanLineTest {

    @TempDir
    Path dir;

    private CoordinateMeanLine extract(String text, String fileName) throws IOException {
        Path file = dir.resolve(fileName);
        Files.writeString(file, text);
        return CoordinateFileReader.read(file);
    }

    private CoordinateMeanLine extract(String spec, int stations) throws IOException {
        SectionCoordinates.Contour c = SectionCoordinates.naca(spec, stations, SectionCoordinates.TrailingEdge.OPEN);
        return extract(c.toText(), spec.replace(' ', '_') + "_" + stations + ".dat");
    }

    /** The extracted mean line in the file's own axes (undoing translation, rotation and scaling), at file x. */
    private static double zInFileAxes(CoordinateMeanLine line, double xFile) {
        double delta = line.chordAngleInFile();
        double c = line.chordInFileUnits();
        double ex = Math.cos(delta);
        double ey = -Math.sin(delta);
        double u = (xFile - line.leadingEdgeXInFile()) / c;
        for (int k = 0; k < 40; k++) {
            u = ((xFile - line.leadingEdgeXInFile()) / c + line.z(u) * ey) / ex;
        }
        return line.leadingEdgeYInFile() + c * (u * ey + line.z(u) * ex);
    }

    private static double maxErrorInFileAxes(CoordinateMeanLine extracted, CamberLine analytic) {
        double max = 0.0;
        for (double x = 0.1; x <= 0.95 + 1e-12; x += 0.0025) {
            max = Math.max(max, Math.abs(zInFileAxes(extracted, x) - analytic.z(x)));
        }
        return max;
    }

    /** Zero-lift angle of the extracted line referred to the file's chord line (x axis): alpha' - chord angle. */
    private static double zeroLiftAngleInFileAxes(CoordinateMeanLine extracted) {
        return ThinAirfoil.zeroLiftAngle(extracted) - extracted.chordAngleInFile();
    }

    @Test
    void naca2412MeanLineIsRecoveredAwayFromTheNose() throws IOException {
        // 80 cosine-spaced stations per surface. Measured: max |z error| over 0.1 < x < 0.95 = 6.0e-4 chord
        // (the midpoint-of-surfaces bias, about y_t * y_t' * sin(theta); unchanged from 20 to 160 stations, so not a
        // discretisation error); tolerance 8e-4. Zero-lift angle, referred to the file's chord: measured
        // -0.036 deg from the analytic -2.0772 deg; tolerance 0.05 deg.
        CamberLine analytic = CamberLines.parse("NACA 2412");
        CoordinateMeanLine extracted = extract("NACA 2412", 80);
        assertEquals("NACA 2412", extracted.designation());
        assertTrue(maxErrorInFileAxes(extracted, analytic) < 8e-4, "z error "
                + maxErrorInFileAxes(extracted, analytic));
        assertEquals(ThinAirfoil.zeroLiftAngle(analytic), zeroLiftAngleInFileAxes(extracted), Math.toRadians(0.05));
        // In its own chord frame (leading edge = foremost point, which for a cambered section lies slightly above
        // and ahead of the design leading edge) the chord line is inclined: measured 0.091 deg for this section.
        assertEquals(0.091, Math.toDegrees(extracted.chordAngleInFile()), 0.01);
    }

    @Test
    void naca23012MeanLineIsRecoveredAwayFromTheNose() throws IOException {
        // Measured: max |z error| over 0.1 < x < 0.95 = 5.2e-4 chord; tolerance 7e-4. Zero-lift angle referred to
        // the file's chord: measured -0.040 deg from the analytic -1.0936 deg; tolerance 0.05 deg.
        // The steep nose of the 230 line (slope 0.305 at x = 0) puts the foremost point 0.0045 chord above the
        // design leading edge, so the extracted chord is inclined by 0.26 deg (measured) and the zero-lift angle
        // in the extracted chord frame is -0.874 deg; both checked here so that a change shows.
        CamberLine analytic = CamberLines.parse("NACA 23012");
        CoordinateMeanLine extracted = extract("NACA 23012", 80);
        assertTrue(maxErrorInFileAxes(extracted, analytic) < 7e-4, "z error "
                + maxErrorInFileAxes(extracted, analytic));
        assertEquals(ThinAirfoil.zeroLiftAngle(analytic), zeroLiftAngleInFileAxes(extracted), Math.toRadians(0.05));
        assertEquals(0.259, Math.toDegrees(extracted.chordAngleInFile()), 0.01);
        assertEquals(-0.874, Math.toDegrees(ThinAirfoil.zeroLiftAngle(extracted)), 0.01);
    }

    @Test
    void resultsDoNotDependOnThePointSpacing() throws IOException {
        // The leading edge is the vertex of a local parabola, not the nearest file point. Measured: zero-lift
        // angle in file axes differs by at most 1.3e-4 deg (23012) between 40 and 160 stations; tolerance 5e-4 deg.
        // (Taking the nearest file point instead moved it by up to 0.4 deg.)
        for (String spec : new String[] {"NACA 2412", "NACA 23012", "NACA 4415"}) {
            double a40 = zeroLiftAngleInFileAxes(extract(spec, 40));
            double a160 = zeroLiftAngleInFileAxes(extract(spec, 160));
            assertEquals(a160, a40, Math.toRadians(5e-4), spec);
        }
    }

    @Test
    void twoBlockFileGivesTheSameLineAsTheLoop() throws IOException {
        SectionCoordinates.Contour c = SectionCoordinates.naca("NACA 23012", 60,
                SectionCoordinates.TrailingEdge.CLOSED);
        CoordinateMeanLine loop = extract(c.toText(), "loop.dat");
        CoordinateMeanLine blocks = extract(c.toTwoBlockText(), "blocks.dat");
        for (double x = 0.0; x <= 1.0; x += 0.01) {
            assertEquals(loop.z(x), blocks.z(x), 1e-14);
            assertEquals(loop.slope(x), blocks.slope(x), 1e-11);
        }
    }

    @Test
    void inclinedScaledAndShiftedFileGivesTheSameLine() throws IOException {
        // Derotation and normalisation: a 2412 turned 6 deg nose up, scaled to 0.9 and shifted. The mean line must
        // agree with that of the plain file; the remaining difference is the leading-edge fit on the turned point
        // set. Measured 2.3e-8 chord in z, 1.3e-6 deg in alpha_L0, 1e-6 deg in the chord angle; tolerances
        // 1e-6 chord, 1e-4 deg, 1e-4 deg.
        SectionCoordinates.Contour c = SectionCoordinates.naca("NACA 2412", 80, SectionCoordinates.TrailingEdge.OPEN);
        CoordinateMeanLine plain = extract(c.toText(), "plain.dat");
        double turn = Math.toRadians(6.0);
        StringBuilder sb = new StringBuilder("turned 2412\n");
        for (int i = 0; i < c.size(); i++) {
            double x = c.x(i) - 0.25;
            double y = c.y(i);
            double xr = x * Math.cos(turn) + y * Math.sin(turn);   // nose up: leading edge raised
            double yr = -x * Math.sin(turn) + y * Math.cos(turn);
            sb.append(String.format(Locale.ROOT, "%.10f %.10f%n", 0.9 * xr + 0.2, 0.9 * yr + 0.01));
        }
        CoordinateMeanLine turned = extract(sb.toString(), "turned.dat");
        assertEquals(0.9, turned.chordInFileUnits() / plain.chordInFileUnits(), 1e-6);
        assertEquals(6.0, Math.toDegrees(turned.chordAngleInFile() - plain.chordAngleInFile()), 1e-4);
        double max = 0.0;
        for (double x = 0.0; x <= 1.0; x += 0.005) {
            max = Math.max(max, Math.abs(turned.z(x) - plain.z(x)));
        }
        assertTrue(max < 1e-6, "z difference " + max);
        assertEquals(ThinAirfoil.zeroLiftAngle(plain), ThinAirfoil.zeroLiftAngle(turned), Math.toRadians(1e-4));
    }

    @Test
    void roundingTheFileToFiveDecimalsChangesLittle() throws IOException {
        // Coordinate files often carry 5 decimals (rounding noise up to 5e-6 chord, which the interpolating spline
        // passes on to the slope). Measured change of alpha_L0: 1.7e-3 deg; tolerance 0.01 deg.
        SectionCoordinates.Contour c = SectionCoordinates.naca("NACA 2412", 80, SectionCoordinates.TrailingEdge.OPEN);
        StringBuilder sb = new StringBuilder("rounded 2412\n");
        for (int i = 0; i < c.size(); i++) {
            sb.append(String.format(Locale.ROOT, "%.5f %.5f%n", c.x(i), c.y(i)));
        }
        CoordinateMeanLine exact = extract(c.toText(), "exact.dat");
        CoordinateMeanLine rounded = extract(sb.toString(), "rounded.dat");
        assertEquals(ThinAirfoil.zeroLiftAngle(exact), ThinAirfoil.zeroLiftAngle(rounded), Math.toRadians(0.01));
    }

    @Test
    void symmetricSectionGivesAFlatLine() throws IOException {
        CoordinateMeanLine line = extract("NACA 0012", 50);
        for (double x = 0.0; x <= 1.0; x += 0.01) {
            assertEquals(0.0, line.z(x), 1e-12);
        }
        assertEquals(0.0, ThinAirfoil.zeroLiftAngle(line), 1e-12);
    }

    @Test
    void commentsBlankLinesAndNameAreAccepted() throws IOException {
        Path file = Path.of("src/test/resources/section/valid-commented.dat");
        CoordinateMeanLine line = CoordinateFileReader.read(file);
        assertEquals("thin test section", line.designation());
        assertEquals(0.0, line.z(0.5), 1e-6);
        assertFalse(line.slopeBoundedAtLeadingEdge());
        assertFalse(ThinAirfoil.idealAngle(line).isPresent());
        assertTrue(Double.isFinite(line.slope(0.0)));
    }

    @Test
    void generatorPutsTheThicknessNormalToTheMeanLine() {
        // Report 460 construction: upper and lower points of one station are y_t from the mean-line point, along its
        // normal; the open trailing edge has y_t(1) = 5 t (0.2969 - 0.1260 - 0.3516 + 0.2843 - 0.1015) = 0.00126 at
        // t = 0.12, the closed form 0.
        CamberLine line = CamberLines.parse("NACA 2412");
        SectionCoordinates.Contour c = SectionCoordinates.naca("NACA 2412", 40, SectionCoordinates.TrailingEdge.OPEN);
        int stations = 40;
        for (int i = 0; i <= stations; i++) {
            double xc = 0.5 * (1 - Math.cos(Math.PI * i / stations));
            double mx = 0.5 * (c.x(stations - i) + c.x(stations + i));
            double my = 0.5 * (c.y(stations - i) + c.y(stations + i));
            assertEquals(xc, mx, 1e-12);
            assertEquals(line.z(xc), my, 1e-12);
            double dx = c.x(stations - i) - c.x(stations + i);
            double dy = c.y(stations - i) - c.y(stations + i);
            assertEquals(0.0, dx + dy * line.slope(xc), 1e-12); // along the normal (-slope, 1)
        }
        assertEquals(0.00126, SectionCoordinates.halfThickness(0.12, 1.0, SectionCoordinates.TrailingEdge.OPEN), 1e-9);
        assertEquals(0.0, SectionCoordinates.halfThickness(0.12, 1.0, SectionCoordinates.TrailingEdge.CLOSED), 1e-15);
        // Maximum half thickness 0.06 at about x = 0.3 (Report 460: thickness t at 30 per cent chord).
        assertEquals(0.06, SectionCoordinates.halfThickness(0.12, 0.3, SectionCoordinates.TrailingEdge.OPEN), 2e-5);
    }
}
