package org.spanlift.stall;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;
import org.spanlift.solve.WingAnalysis;

/**
 * The stall study of a wing, clean and with flaps: each configuration's critical-section onset and, given
 * a flight condition, its stall speed, with the strips' Reynolds numbers iterated together with the speed.
 * Without a flight condition the cl-max tables are read at their lowest Reynolds number. "Clean" is the
 * asked deflections with every flap at zero (ailerons stay as asked); "flaps" is the asked deflections, when
 * a flap is deflected among them.
 *
 * <pre>
 * StallStudy study = StallStudy.of(analysis, analysis.deflections(Map.of("flap", Math.toRadians(30))),
 *         OptionalDouble.empty(), Optional.of(condition));
 * double vs0 = study.flaps().orElseThrow().speed().orElseThrow().equivalent();
 * </pre>
 *
 * @param clean     the clean configuration
 * @param flaps     the flapped configuration, when a flap is deflected
 * @param condition the flight condition of the stall speeds, if any
 */
public record StallStudy(Configuration clean, Optional<Configuration> flaps, Optional<FlightCondition> condition) {

    /**
     * One configuration.
     *
     * @param label       "clean" or "flaps"
     * @param deflections control deflections, rad, in control order (copied)
     * @param estimate    the stall onset, at the stall speed's Reynolds numbers when there is a condition
     * @param speed       the stall speed, with a flight condition
     */
    public record Configuration(String label, double[] deflections, StallEstimate estimate,
            Optional<StallSpeed> speed) {

        public Configuration {
            deflections = deflections.clone();
        }

        @Override
        public double[] deflections() {
            return deflections.clone();
        }
    }

    /**
     * The clean configuration and, when the asked deflections deflect a flap, the flapped one.
     *
     * @param asked        deflections, rad, in control order
     * @param assumedClMax the cl_max of sections that give none, if allowed
     * @throws MissingSectionDataException when a section gives no cl_max and none is assumed
     */
    public static StallStudy of(WingAnalysis analysis, double[] asked, OptionalDouble assumedClMax,
            Optional<FlightCondition> condition) {
        Wing wing = analysis.wing();
        double[] clean = cleanDeflections(wing, asked);
        Optional<double[]> flapped = anyFlapDeflected(wing, asked) ? Optional.of(asked) : Optional.empty();
        return of(analysis, clean, flapped, assumedClMax, condition);
    }

    /** As {@link #of(WingAnalysis, double[], OptionalDouble, Optional)} with both deflection sets given. */
    public static StallStudy of(WingAnalysis analysis, double[] clean, Optional<double[]> flapped,
            OptionalDouble assumedClMax, Optional<FlightCondition> condition) {
        Configuration c = configuration("clean", analysis, clean, assumedClMax, condition);
        Optional<Configuration> f = flapped.map(d -> configuration("flaps", analysis, d, assumedClMax, condition));
        return new StallStudy(c, f, condition);
    }

    /**
     * One configuration at the given deflections (rad, control order).
     *
     * @throws MissingSectionDataException when a section gives no cl_max and none is assumed
     */
    public static Configuration configuration(String label, WingAnalysis analysis, double[] deflections,
            OptionalDouble assumedClMax, Optional<FlightCondition> condition) {
        StripLimits limits = StripLimits.of(analysis.wing(), analysis.lattice(), deflections, assumedClMax);
        if (condition.isPresent()) {
            StallSpeed s = StallSpeed.of(analysis, deflections, limits, condition.get());
            return new Configuration(label, deflections, s.estimate(), Optional.of(s));
        }
        return new Configuration(label, deflections, StallAnalysis.estimate(analysis, deflections, limits, 0),
                Optional.empty());
    }

    /** The deflections with every flap at zero. */
    public static double[] cleanDeflections(Wing wing, double[] asked) {
        double[] clean = asked.clone();
        List<ControlSurface> controls = wing.controls();
        for (int c = 0; c < controls.size(); c++) {
            if (controls.get(c).kind() == ControlKind.FLAP) {
                clean[c] = 0;
            }
        }
        return clean;
    }

    /** True when some flap is deflected. */
    public static boolean anyFlapDeflected(Wing wing, double[] deflections) {
        List<ControlSurface> controls = wing.controls();
        for (int c = 0; c < controls.size(); c++) {
            if (controls.get(c).kind() == ControlKind.FLAP && deflections[c] != 0) {
                return true;
            }
        }
        return false;
    }

    /** How much the flaps raise the stall-onset CL, when flapped. */
    public OptionalDouble flapIncrement() {
        return flaps.isPresent() ? OptionalDouble.of(flaps.get().estimate().lift() - clean.estimate().lift())
                : OptionalDouble.empty();
    }

    /** True when some configuration used an assumed cl_max. */
    public boolean assumedClMax() {
        return clean.estimate().assumedClMax() || flaps.map(f -> f.estimate().assumedClMax()).orElse(false);
    }

    /** The configurations: clean, then flaps when present. */
    public List<Configuration> configurations() {
        return flaps.isPresent() ? List.of(clean, flaps.get()) : List.of(clean);
    }
}
