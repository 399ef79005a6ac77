package org.spanlift.sweep;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Wing and sweep files of invented test scenarios, written into a test's temporary folder. */
public final class SweepFixtures {

    /** A tapered wing given by stations, with a flap, a deflected aileron and cl-max data (one table). */
    public static final String WING = """
            name: Test wing with stations
            units: m
            surfaces:
              - name: wing
                stations:
                  - {y: 0.0, chord: 1.5, twist: 1.0, section: inner}
                  - {y: 2.0, chord: 1.3, nose-x: 0.05, nose-z: 0.10, twist: 0.0, section: inner}
                  - {y: 5.0, chord: 0.8, nose-x: 0.20, nose-z: 0.30, twist: -2.0, section: outer}
                controls:
                  - {name: flap, kind: flap, from: 0.4, to: 2.4, chord-fraction: 0.25, deflection: 0}
                  - {name: aileron, kind: aileron, from: 3.0, to: 4.7, chord-fraction: 0.22, deflection: 3}
                lattice: {strips: 16, rows: 4}
            sections:
              inner: {camber: NACA 2412, cl-max: {reynolds: [1.0e6, 3.0e6], values: [1.40, 1.55]}}
              outer: {camber: NACA 0012, cl-max: 1.25}
            """;

    /** The same wing as a trapezoid without cl-max data, lattice left to its default. */
    public static final String TRAPEZOID = """
            name: Test trapezoid
            units: m
            surfaces:
              - name: wing
                section: main
                trapezoid: {span: 10.0, root-chord: 1.6, taper: 0.5, washout: 2}
                controls:
                  - {name: aileron, kind: aileron, from: 3.2, to: 4.8, chord-fraction: 0.24}
            sections:
              main: {camber: NACA 4415}
            """;

    private SweepFixtures() {
    }

    public static Path write(Path dir, String name, String text) {
        try {
            Path p = dir.resolve(name);
            Files.writeString(p, text, StandardCharsets.UTF_8);
            return p;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
