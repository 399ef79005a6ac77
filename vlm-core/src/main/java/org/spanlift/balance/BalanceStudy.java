package org.spanlift.balance;

import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.flight.FlightCondition;
import org.spanlift.input.RefusedException;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.MissingSectionDataException;
import org.spanlift.stall.StallStudy;
import org.spanlift.stall.StripLimits;

/**
 * The balance of a configuration at one centre of gravity, clean and with the flaps asked: neutral point, static
 * margin, derivatives, the trimmed stall (power off) and the forward limit that elevator power sets at the stall
 * (with the flaps when they are deflected). What the command line's {@code balance} prints for one {@code --cg} and
 * a sweep's {@code balance.*} columns read.
 *
 * @param clean        the balance with every flap at zero
 * @param flaps        the balance with the flaps asked, when some flap is deflected
 * @param cgX          the centre of gravity's x, m
 * @param neutralPoint the stick-fixed neutral point
 * @param derivatives  about the centre of gravity, clean
 * @param stallClean   the trimmed stall clean, with a weight, cl_max data and an elevator
 * @param stallFlaps   the trimmed stall with the flaps, likewise
 * @param forwardLimit the forward limit's x, m, with elevator limits, a weight and cl_max data
 * @param stallProblem why there is no trimmed stall, when there is none
 * @param downwashGradient d epsilon / d alpha at the tail, with a tail ({@link Balance#downwashGradient()})
 */
public record BalanceStudy(Balance clean, Optional<Balance> flaps, double cgX, Balance.NeutralPoint neutralPoint,
        Balance.PitchDerivatives derivatives, Optional<Balance.TrimmedStall> stallClean,
        Optional<Balance.TrimmedStall> stallFlaps, OptionalDouble forwardLimit, Optional<String> stallProblem,
        OptionalDouble downwashGradient) {

    /**
     * The study at one centre of gravity.
     *
     * @param asked        deflections, rad, control order (the flaps of the flapped configuration)
     * @param cg           the centre of gravity
     * @param condition    the weight and atmosphere of the stall speeds, if any
     * @param assumedClMax the cl_max of sections that give none, if allowed
     */
    public static BalanceStudy of(WingAnalysis analysis, double[] asked, CentreOfGravity cg,
            Optional<FlightCondition> condition, OptionalDouble assumedClMax) {
        double[] cleanDeflections = StallStudy.cleanDeflections(analysis.wing(), asked);
        Balance clean = Balance.of(analysis, cleanDeflections);
        Optional<Balance> flaps = StallStudy.anyFlapDeflected(analysis.wing(), asked)
                ? Optional.of(Balance.of(analysis, asked)) : Optional.empty();
        double x = cg.x(clean);
        Optional<Balance.TrimmedStall> stallClean = Optional.empty();
        Optional<Balance.TrimmedStall> stallFlaps = Optional.empty();
        OptionalDouble forward = OptionalDouble.empty();
        Optional<String> problem = Optional.empty();
        if (!clean.hasElevator()) {
            problem = Optional.of("no elevator: trim is unavailable");
        } else if (condition.isEmpty()) {
            problem = Optional.of("no weight given: the trimmed stall needs one");
        } else {
            try {
                stallClean = Optional.of(stall(clean, x, condition.get(), assumedClMax));
                if (flaps.isPresent()) {
                    stallFlaps = Optional.of(stall(flaps.get(), x, condition.get(), assumedClMax));
                }
                Balance limiting = flaps.orElse(clean);
                forward = limiting.forwardLimit(limits(limiting, assumedClMax), condition.get(),
                        basis(limiting, condition.get(), assumedClMax));
            } catch (MissingSectionDataException e) {
                problem = Optional.of(e.getMessage());
            } catch (RefusedException e) {
                problem = Optional.of(e.getMessage());
                stallClean = Optional.empty();
                stallFlaps = Optional.empty();
            }
        }
        return new BalanceStudy(clean, flaps, x, clean.neutralPoint(), clean.derivatives(x), stallClean, stallFlaps,
                forward, problem, clean.downwashGradient());
    }

    private static Balance.TrimmedStall stall(Balance b, double x, FlightCondition condition,
            OptionalDouble assumedClMax) {
        return b.trimmedStall(x, limits(b, assumedClMax), condition, basis(b, condition, assumedClMax));
    }

    private static StripLimits limits(Balance b, OptionalDouble assumedClMax) {
        WingAnalysis a = b.analysis();
        return StripLimits.of(a.wing(), a.lattice(), b.deflectionsWith(0), assumedClMax);
    }

    /**
     * The basis of the stall speed, as the stall study decides it for the same configuration: the maximum lift
     * where every section gives a measured lift curve, else the linear onset.
     */
    private static Balance.StallBasis basis(Balance b, FlightCondition condition, OptionalDouble assumedClMax) {
        String basis = StallStudy.configuration("balance", b.analysis(), b.deflectionsWith(0), assumedClMax,
                Optional.of(condition)).speedBasis();
        return basis.equals("max-lift") ? Balance.StallBasis.MAX_LIFT : Balance.StallBasis.ONSET;
    }

    /** The static margin at the centre of gravity, a fraction of the wing's MAC. */
    public double staticMargin() {
        return (neutralPoint.x() - cgX) / clean.meanAerodynamicChord();
    }

    /** The centre of gravity as a fraction of the wing's MAC. */
    public double cgMacFraction() {
        return clean.macFraction(cgX);
    }
}
