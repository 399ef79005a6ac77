package org.spanlift.cli.sweep;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.spanlift.cli.CliRun;

/** In-process runs of the command line, and the files of the test scenarios (invented wings). */
public final class Runs {

    public static final String WING = """
            name: Test trapezoid
            units: m
            surfaces:
              - name: wing
                section: main
                trapezoid: {span: 10.0, root-chord: 1.6, taper: 0.5, washout: 2}
                controls:
                  - {name: flap, kind: flap, from: 0.6, to: 2.8, chord-fraction: 0.25}
                  - {name: aileron, kind: aileron, from: 3.2, to: 4.8, chord-fraction: 0.24}
                lattice: {strips: 10, rows: 3}
            sections:
              main: {camber: NACA 4415, cl-max: 1.45}
            """;

    /** A sweep of 6 x 7 = 42 cases; taper 0.0 fails (zero tip chord is accepted, so use a negative span). */
    public static final String SWEEP = """
            base: w.wing.yaml
            parameters:
              surfaces.wing.trapezoid.taper: {from: 0.5, to: 1.0, step: 0.1}
              surfaces.wing.trapezoid.washout: {from: 0, to: 3, step: 0.5}
            flight: {weight: 8500N, altitude: 3000ft, flaps: 20}
            columns: [lift_slope_per_rad, e@CL=0.5, stall.CL, stall.eta, stall_speed.clean_eas, stall_flaps.CL,
              controls.aileron.from_eta]
            constraints: ["stall.eta < controls.aileron.from_eta"]
            rank: {by: e@CL=0.5, order: max, keep: 4}
            """;

    private Runs() {
    }

    public static CliRun of(String... args) {
        return CliRun.of(args);
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

    public static String read(Path p) {
        try {
            return Files.readString(p, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Copies a test resource ({@code /hostile/NAME} on the class path) into the folder under its own name. */
    public static Path resource(Path dir, String name) {
        String where = "/hostile/" + name;
        try (var in = Runs.class.getResourceAsStream(where)) {
            if (in == null) {
                throw new IllegalStateException("no test resource " + where);
            }
            Path p = dir.resolve(Path.of(name).getFileName().toString());
            Files.write(p, in.readAllBytes());
            return p;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Writes the test wing and a sweep; returns the sweep file. */
    public static Path scenario(Path dir, String sweep) {
        write(dir, "w.wing.yaml", WING);
        return write(dir, "s.sweep.yaml", sweep);
    }

    /** The newlines in a file (its complete rows), 0 when it does not exist yet. */
    static long newlines(java.nio.file.Path p) throws java.io.IOException {
        if (!java.nio.file.Files.exists(p)) {
            return 0;
        }
        long n = 0;
        for (byte b : java.nio.file.Files.readAllBytes(p)) {
            if (b == '\n') {
                n++;
            }
        }
        return n;
    }
}
