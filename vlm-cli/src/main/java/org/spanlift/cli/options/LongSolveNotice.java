package org.spanlift.cli.options;

import java.io.PrintWriter;
import java.util.Locale;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.solve.WingAnalysis;

/**
 * Solves a wing, saying first on standard error how long a very large lattice will take. The estimate uses
 * the rates measured on a two-core machine (the project's benchmarks): the LU factorization at 1.6 GFLOP/s,
 * (2/3) n^3 operations per system, and the assembly at 4.2e-8 s per matrix element; so it errs long on a
 * faster machine.
 */
public final class LongSolveNotice {

    /** Below this estimate nothing is said, seconds. */
    static final double QUIET_SECONDS = 10;
    private static final double FLOPS = 1.6e9;
    private static final double SECONDS_PER_ELEMENT = 4.2e-8;

    private LongSolveNotice() {
    }

    /** The analysis of {@code wing}, after a one-line notice on {@code err} when it will take long. */
    public static WingAnalysis analyse(Wing wing, PrintWriter err) {
        double seconds = estimatedSeconds(wing);
        if (seconds > QUIET_SECONDS) {
            err.println(String.format(Locale.ROOT, "spanlift: %d unknowns per system: solving takes about %s here "
                    + "(the work grows as the cube of strips times rows)", unknowns(wing), duration(seconds)));
            err.flush();
        }
        return WingAnalysis.of(wing);
    }

    /** Unknowns per system: half the panels when every surface is mirrored, else all of them. */
    static int unknowns(Wing wing) {
        boolean mirrored = wing.surfaces().stream().allMatch(Surface::mirrored);
        int panels = 0;
        for (Surface s : wing.surfaces()) {
            panels += s.lattice().strips() * s.lattice().rows() * (s.mirrored() && !mirrored ? 2 : 1);
        }
        return panels;
    }

    /** The estimated time to assemble and factorize the wing's systems, seconds. */
    static double estimatedSeconds(Wing wing) {
        double n = unknowns(wing);
        boolean mirrored = wing.surfaces().stream().allMatch(Surface::mirrored);
        // the antisymmetric system is built only when an aileron is deflected
        boolean ailerons = wing.controls().stream().anyMatch(c -> c.kind() == ControlKind.AILERON
                && c.deflection() != 0);
        int systems = mirrored && ailerons ? 2 : 1;
        return systems * (2.0 / 3.0 * n * n * n / FLOPS + SECONDS_PER_ELEMENT * n * n);
    }

    private static String duration(double seconds) {
        return seconds < 120 ? String.format(Locale.ROOT, "%.0f s", seconds)
                : String.format(Locale.ROOT, "%.0f min", seconds / 60);
    }
}
