package org.spanlift.cli.options;

import java.util.ArrayList;
import java.util.List;

import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.input.quantity.Quantity;
import org.spanlift.input.quantity.QuantityFormatException;
import org.spanlift.input.quantity.QuantityKind;
import org.spanlift.washout.WashoutRequirement;

import picocli.CommandLine.Option;

/** The stall requirements of a washout search and the washouts it considers (washout, report, compare). */
public final class WashoutOptions {

    @Option(names = "--onset-inboard-of", paramLabel = "CONTROL",
            description = "Washout: require the stall onset inboard of this control's inner end (an aileron, say).")
    String inboardOf;

    @Option(names = "--clearance", paramLabel = "DISTANCE",
            description = "With --onset-inboard-of: by at least this distance (a length with its unit, 0.3m) or "
                    + "this fraction of the semi-span (a plain number, 0.05).")
    String clearance;

    @Option(names = "--aileron-margin", paramLabel = "DCL",
            description = "Washout: require the least aileron section margin (cl_max - cl) at stall onset to be at "
                    + "least this.")
    String aileronMargin;

    @Option(names = "--ailerons-below-peak",
            description = "Washout: require every aileron station below its section cl peak at the wing's maximum "
                    + "lift (from the section lift curves).")
    boolean belowPeak;

    @Option(names = "--between", paramLabel = "FROM:TO", defaultValue = "0:10",
            description = "The washouts to consider, degrees. Default: ${DEFAULT-VALUE}.")
    String between;

    /** True when some requirement is given. */
    public boolean asked() {
        return inboardOf != null || aileronMargin != null || belowPeak;
    }

    /**
     * The requirements given, checked.
     *
     * @throws InputException for a malformed value, a clearance without --onset-inboard-of, or none given
     */
    public List<WashoutRequirement> requirements(Wing wing) {
        if (clearance != null && inboardOf == null) {
            throw new InputException("--clearance", 0, "", "goes with --onset-inboard-of");
        }
        List<WashoutRequirement> r = new ArrayList<>();
        if (inboardOf != null) {
            double semi = wing.main().planform().yEnd();
            double by = 0;
            if (clearance != null) {
                String text = clearance.strip();
                if (!text.isEmpty() && Character.isLetter(text.charAt(text.length() - 1))) {
                    try {
                        by = Quantity.parse(text, QuantityKind.LENGTH).value();
                    } catch (QuantityFormatException e) {
                        throw new InputException("--clearance", 0, "", e.getMessage());
                    }
                } else {
                    by = OptionNumber.parse("--clearance", text) * semi;
                }
                if (!(by >= 0 && by < semi)) {
                    throw new InputException("--clearance", 0, "", "expected a clearance from 0 to the semi-span");
                }
            }
            r.add(new WashoutRequirement.OnsetInboard(inboardOf, by));
        }
        if (aileronMargin != null) {
            double dcl = OptionNumber.parse("--aileron-margin", aileronMargin);
            if (!(dcl >= 0 && dcl <= 1)) {
                throw new InputException("--aileron-margin", 0, "", "expected a section margin from 0 to 1, got "
                        + aileronMargin.strip());
            }
            r.add(new WashoutRequirement.AileronMargin(dcl));
        }
        if (belowPeak) {
            r.add(new WashoutRequirement.AileronsBelowPeak());
        }
        if (r.isEmpty()) {
            throw new InputException("washout", 0, "", "give at least one requirement: --onset-inboard-of CONTROL, "
                    + "--aileron-margin DCL or --ailerons-below-peak");
        }
        return r;
    }

    /** The washouts to consider, rad: {from, to}. */
    public double[] bounds() {
        String[] parts = between.split(":", -1);
        if (parts.length != 2) {
            throw new InputException("--between", 0, "", "expected FROM:TO in degrees, such as 0:10, got '"
                    + between.strip() + "'");
        }
        double from = Angles.parse("--between", parts[0], "a washout", 20);
        double to = Angles.parse("--between", parts[1], "a washout", 20);
        if (!(to > from) || from < -10) {
            throw new InputException("--between", 0, "", "expected washouts from -10 to 20 degrees, FROM below TO, "
                    + "got '" + between.strip() + "'");
        }
        return new double[] {Math.toRadians(from), Math.toRadians(to)};
    }
}
