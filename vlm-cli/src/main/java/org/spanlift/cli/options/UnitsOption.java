package org.spanlift.cli.options;

import java.util.Optional;

import org.spanlift.cli.output.DisplayUnits;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.input.InputException;

import picocli.CommandLine.Option;

/** The unit system of a command's tables ({@code --units}); JSON and CSV stay SI. */
public final class UnitsOption {

    @Option(names = "--units", paramLabel = "SYSTEM",
            description = "Units of the tables: si or us (si: m, N, N m, kg, m/s; us: ft, lbf, "
                    + "ft lbf, lb, kt). Default: the wing file's length unit decides (m: si; ft or in: us). JSON and "
                    + "CSV are always SI.")
    DisplayUnits.System system;

    /**
     * Refuses {@code --units} for an output that is always SI.
     *
     * @throws InputException when --units was given with JSON or CSV
     */
    public void check(Format format) {
        if (system != null && (format == Format.JSON || format == Format.CSV)) {
            throw new InputException("--units", 0, "", "does not apply to " + format + " output, which is always SI; "
                    + "it sets the units of tables and pages");
        }
    }

    /** The display units for a wing file in {@code fileUnit}. */
    public DisplayUnits units(LengthUnit fileUnit) {
        return DisplayUnits.of(Optional.ofNullable(system), fileUnit);
    }
}
