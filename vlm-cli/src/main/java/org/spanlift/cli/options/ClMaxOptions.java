package org.spanlift.cli.options;

import java.util.OptionalDouble;

import org.spanlift.input.InputException;
import org.spanlift.stall.StripLimits;

import picocli.CommandLine.Option;

/** The option that lets stall results use an assumed cl_max for sections that give none. */
public final class ClMaxOptions {

    @Option(names = "--assume-cl-max", paramLabel = "CLMAX", arity = "0..1",
            fallbackValue = "" + StripLimits.CONSERVATIVE_CL_MAX,
            description = "For sections without cl-max data, assume this cl_max (flagged in the output). Without a "
                    + "value: the conservative default " + StripLimits.CONSERVATIVE_CL_MAX + ".")
    String assumeClMax;

    /** The assumed cl_max, if asked for, checked. */
    public OptionalDouble assumed() {
        if (assumeClMax == null) {
            return OptionalDouble.empty();
        }
        double clMax = OptionNumber.parse("--assume-cl-max", assumeClMax);
        if (!(clMax > 0.3 && clMax <= 3)) {
            throw new InputException("--assume-cl-max", 0, "", "expected a cl_max from 0.3 to 3, got "
                    + assumeClMax.strip());
        }
        return OptionalDouble.of(clMax);
    }
}
