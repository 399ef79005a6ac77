package org.spanlift.cli.sweep;

import java.io.PrintWriter;

import org.spanlift.cli.output.Cautions;
import org.spanlift.sweep.ResultColumn;
import org.spanlift.sweep.Sweep;

/**
 * The lines that close a sweep's summary on standard error, the same for every runner: failed cases, the
 * assumed cl_max, the load case, and the cautions the sweep's columns call for.
 */
public final class SweepNotes {

    private SweepNotes() {
    }

    /** Writes the notes and cautions of a finished sweep with {@code failed} failed cases, and flushes. */
    public static void print(PrintWriter err, Sweep sweep, long failed) {
        if (failed > 0) {
            err.println("  some cases failed; their rows say why (column error)");
        }
        if (sweep.columns().stream().anyMatch(ResultColumn::needsClMax)) {
            if (sweep.assumeClMax().isPresent()) {
                err.println("  NOTE: sections without cl-max data use the assumed cl_max "
                        + sweep.assumeClMax().getAsDouble() + " (column " + ResultColumn.ASSUMED_CL_MAX + ")");
            }
            err.println("  " + Cautions.SWEEP);
        }
        if (sweep.columns().stream().anyMatch(ResultColumn::needsCentreOfGravity)) {
            err.println("  " + Cautions.BALANCE);
        }
        if (sweep.columns().stream().anyMatch(ResultColumn::needsLoadCase)) {
            err.println("  load case: " + sweep.loadCase().orElseThrow().name() + ", clean");
            err.println("  " + Cautions.SWEEP_LOADS);
        }
        err.flush();
    }
}
