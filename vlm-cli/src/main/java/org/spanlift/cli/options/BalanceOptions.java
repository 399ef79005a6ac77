package org.spanlift.cli.options;

import java.util.ArrayList;
import java.util.List;

import org.spanlift.balance.CentreOfGravity;
import org.spanlift.input.InputException;
import org.spanlift.input.quantity.QuantityFormatException;

import picocli.CommandLine.Option;

/** The centres of gravity of a balance ({@code --cg}), shared by {@code balance} and {@code report}. */
public final class BalanceOptions {

    @Option(names = "--cg", paramLabel = "X",
            description = "Centre of gravity: a length with its unit, the x of the wing file's axes (0.62m, 24in), "
                    + "or a "
                    + "percentage of the wing's mean aerodynamic chord (25%%mac). Repeatable.")
    List<String> cgs = List.of();

    /** True when some centre of gravity was given. */
    public boolean asked() {
        return !cgs.isEmpty();
    }

    /**
     * The centres of gravity, in the order given.
     *
     * @throws InputException naming {@code --cg} for a malformed one
     */
    public List<CentreOfGravity> centres() {
        List<CentreOfGravity> out = new ArrayList<>();
        for (String c : cgs) {
            try {
                out.add(CentreOfGravity.parse(c));
            } catch (QuantityFormatException e) {
                throw new InputException("--cg", 0, "", e.getMessage());
            }
        }
        return out;
    }
}
