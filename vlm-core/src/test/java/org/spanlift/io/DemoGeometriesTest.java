package org.spanlift.io;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Wing;

/** The example wing files shipped in {@code geometries/} at the repository root all read cleanly. */
class DemoGeometriesTest {

    private static final Path GEOMETRIES = Path.of("..", "geometries");

    @Test
    void everyDemoWingFileReadsWithFiniteReferenceValues() throws IOException {
        List<Path> files;
        try (Stream<Path> s = Files.list(GEOMETRIES)) {
            files = s.filter(p -> p.getFileName().toString().endsWith(".wing.yaml")).sorted().toList();
        }
        assertFalse(files.isEmpty(), "no demo wing files under " + GEOMETRIES.toAbsolutePath());
        for (Path p : files) {
            Wing wing = WingFileReader.read(p);
            Reference r = wing.reference();
            assertFalse(wing.surfaces().isEmpty(), p.toString());
            assertTrue(r.area() > 0 && Double.isFinite(r.area()), p + ": area " + r.area());
            assertTrue(r.span() > 0 && Double.isFinite(r.span()), p + ": span " + r.span());
            assertTrue(r.chord() > 0 && Double.isFinite(r.chord()), p + ": chord " + r.chord());
            assertTrue(Double.isFinite(r.momentPoint().x()), p + ": moment point");
        }
    }
}
