package org.spanlift.stall;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.flight.FlightCondition;
import org.spanlift.input.RefusedException;
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
     * One configuration: its linear stall onset, its stall speed with a flight condition, and, computed
     * on first use (it traces the coupled lift curve through the stall), its maximum lift from the
     * section lift curves.
     */
    public static final class Configuration {
        private final String label;
        private final double[] deflections;
        private final StallEstimate estimate;
        private final Optional<StallSpeed> speed;
        private final WingAnalysis analysis;
        private final StripLimits limits;
        private final Optional<FlightCondition> condition;
        private MaximumLift maximumLift;
        private String maximumLiftProblem;
        private String speedBasis;

        Configuration(String label, double[] deflections, StallEstimate estimate, Optional<StallSpeed> speed,
                WingAnalysis analysis, StripLimits limits, Optional<FlightCondition> condition) {
            this.label = label;
            this.deflections = deflections.clone();
            this.estimate = estimate;
            this.speed = speed;
            this.analysis = analysis;
            this.limits = limits;
            this.condition = condition;
        }

        /** "clean" or "flaps". */
        public String label() {
            return label;
        }

        /** Control deflections, rad, in control order (a copy). */
        public double[] deflections() {
            return deflections.clone();
        }

        /** The linear stall onset, at the stall speed's Reynolds numbers when there is a condition. */
        public StallEstimate estimate() {
            return estimate;
        }

        /** The stall speed at the onset CL, with a flight condition. */
        public Optional<StallSpeed> speed() {
            return speed;
        }

        /**
         * The maximum lift from the section lift curves, with its stall speed when there is a flight
         * condition (the Reynolds numbers iterated with it); without one, curves and tables at their lowest
         * Reynolds number.
         */
        public synchronized MaximumLift maximumLift() {
            if (maximumLift == null) {
                maximumLift = condition.isPresent()
                        ? MaximumLift.atStall(analysis, deflections, limits, condition.get())
                        : MaximumLift.of(analysis, deflections, limits, 0);
            }
            return maximumLift;
        }

        /**
         * The maximum lift, or empty when the section data cannot give one (a flap deflected beyond a
         * section's measured flapped curves, say); {@link #maximumLiftProblem()} then says why.
         */
        public synchronized Optional<MaximumLift> maximumLiftIfAny() {
            if (maximumLift == null && maximumLiftProblem == null) {
                try {
                    maximumLift();
                } catch (RefusedException e) {
                    maximumLiftProblem = e.getMessage();
                }
            }
            return Optional.ofNullable(maximumLift);
        }

        /** Why there is no maximum lift, when {@link #maximumLiftIfAny()} is empty. */
        public synchronized Optional<String> maximumLiftProblem() {
            maximumLiftIfAny();
            return Optional.ofNullable(maximumLiftProblem);
        }

        /**
         * The basis of the headline stall speed: {@code max-lift} when every strip's section curve is measured
         * (and the maximum lift can be found), else {@code onset} (the linear onset errs safe; a synthetic
         * curve's maximum is shown beside it).
         */
        public synchronized String speedBasis() {
            if (speedBasis == null) {
                boolean measured;
                try {
                    measured = !StripCurves.of(analysis.wing(), analysis.lattice(), deflections, limits, 0).synthetic()
                            && condition.map(fc -> maximumLiftIfAny().isPresent()).orElse(true);
                } catch (RefusedException e) {
                    measured = false;
                }
                speedBasis = measured ? "max-lift" : "onset";
            }
            return speedBasis;
        }

        /** The headline stall speed, equivalent airspeed, m/s, by {@link #speedBasis()}. */
        public OptionalDouble headlineEquivalent() {
            if (condition.isEmpty()) {
                return OptionalDouble.empty();
            }
            return OptionalDouble.of(speedBasis().equals("max-lift")
                    ? maximumLift().speed().orElseThrow().equivalent() : speed.orElseThrow().equivalent());
        }

        /** The headline stall speed, true airspeed, m/s, by {@link #speedBasis()}. */
        public OptionalDouble headlineTrue() {
            if (condition.isEmpty()) {
                return OptionalDouble.empty();
            }
            return OptionalDouble.of(speedBasis().equals("max-lift")
                    ? maximumLift().speed().orElseThrow().trueSpeed() : speed.orElseThrow().trueSpeed());
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
            return new Configuration(label, deflections, s.estimate(), Optional.of(s), analysis, limits, condition);
        }
        return new Configuration(label, deflections, StallAnalysis.estimate(analysis, deflections, limits, 0),
                Optional.empty(), analysis, limits, condition);
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
