package org.spanlift.balance;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.function.DoubleUnaryOperator;

import org.spanlift.atmosphere.Airspeed;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.DeflectionLimits;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.SurfaceRole;
import org.spanlift.geometry.Vec3;
import org.spanlift.geometry.Wing;
import org.spanlift.input.RefusedException;
import org.spanlift.results.ProfileDrag;
import org.spanlift.results.Solution;
import org.spanlift.section.PlainFlap;
import org.spanlift.solve.TailDownwash;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.CoupledLift;
import org.spanlift.stall.FlapLift;
import org.spanlift.stall.StallAnalysis;
import org.spanlift.stall.StripLimits;

/**
 * The configuration in balance: its neutral point, pitch derivatives, trim in level flight and trimmed stall, on
 * one factorization of the whole configuration (wing, tail or canard and any other surface solved together).
 *
 * <p><b>Frames and signs.</b> x aft, z up, in the wing file's axes, metres. Cm positive nose-up on q S c with the
 * reference area and chord; a centre of gravity is a point (x, 0, z of the reference moment point). Elevator
 * deflection positive trailing edge down, radians. Mean aerodynamic chord fractions are of the wing's (first
 * surface's) MAC, from its leading edge.
 *
 * <p><b>The elevator.</b> Every control of kind elevator is moved together. Its lift is the lattice's
 * thin-airfoil lift times the handbook plain-flap effectiveness at the deflection ({@link PlainFlap}), where the
 * handbook data cover its chord fraction and deflection, and the inviscid lift beyond them: a real elevator gives
 * less than thin-airfoil theory, so the trim needs more deflection and the forward limit lies further aft (the
 * safe side).
 *
 * <p><b>What enters the moment.</b> The lattice's lift forces of every surface; the fuselage's empirical slope
 * ({@link FuselageMoment}) times the angle of attack, where a fuselage is described; in level flight, a thrust
 * equal to the drag along the body x axis at the thrust line's height above the centre of gravity, where a thrust
 * line is given. The tail sits in the lattice's wake with efficiency 1, with no propeller slipstream and out of
 * ground effect. Stall points are power off (no thrust).
 */
public final class Balance {

    /**
     * Step of the five-point central differences at zero angle of attack and deflection, rad: truncation of order
     * STEP^4, about 1e-12, rounding about 1e-13.
     */
    static final double STEP = 1e-3;
    /** Residual of the trim equations (CL and Cm) at which the trim is settled. */
    public static final double TRIM_TOLERANCE = 1e-12;
    /** Relative change of the stall speed at which a trimmed stall is settled. */
    public static final double SPEED_TOLERANCE = 1e-9;
    private static final int MAX_ITERATIONS = 60;

    private final WingAnalysis analysis;
    private final Wing wing;
    private final double[] base;
    private final List<Integer> elevators;
    private final OptionalInt pitchSurface;
    private final double mac;
    private final double macLeadingEdge;
    private final OptionalDouble fuselageSlope;

    private Balance(WingAnalysis analysis, double[] base) {
        this.analysis = analysis;
        this.wing = analysis.wing();
        this.base = base.clone();
        List<ControlSurface> controls = wing.controls();
        List<Integer> e = new ArrayList<>();
        for (int c = 0; c < controls.size(); c++) {
            if (controls.get(c).kind() == ControlKind.ELEVATOR) {
                e.add(c);
                this.base[c] = 0;
            }
        }
        this.elevators = List.copyOf(e);
        OptionalInt tail = wing.surfaceIndex(SurfaceRole.TAIL);
        this.pitchSurface = tail.isPresent() ? tail : wing.surfaceIndex(SurfaceRole.CANARD);
        Surface main = wing.main();
        this.mac = main.meanAerodynamicChord();
        this.macLeadingEdge = main.quarterMacPoint().x() - 0.25 * mac;
        this.fuselageSlope = wing.fuselage().isPresent()
                ? OptionalDouble.of(FuselageMoment.slope(wing, wing.fuselage().get())) : OptionalDouble.empty();
    }

    /**
     * The balance of the analysed configuration with the given deflections (rad, control order; the elevators'
     * entries are ignored: the trim sets them).
     */
    public static Balance of(WingAnalysis analysis, double[] deflections) {
        return new Balance(analysis, deflections);
    }

    /** The analysis of the configuration balanced. */
    public WingAnalysis analysis() {
        return analysis;
    }

    /** True when the configuration has an elevator, so that it can be trimmed. */
    public boolean hasElevator() {
        return !elevators.isEmpty();
    }

    /** The index of the tail, else of the canard, among the surfaces. */
    public OptionalInt pitchSurface() {
        return pitchSurface;
    }

    /** The wing's mean aerodynamic chord, m. */
    public double meanAerodynamicChord() {
        return mac;
    }

    /** The x of a fraction of the wing's MAC from its leading edge, m. */
    public double macPoint(double fraction) {
        return macLeadingEdge + fraction * mac;
    }

    /** The fraction of the wing's MAC from its leading edge at x (m). */
    public double macFraction(double x) {
        return (x - macLeadingEdge) / mac;
    }

    /** The centre of gravity at x (m): (x, 0, z of the reference moment point). */
    public Vec3 centreAt(double x) {
        return new Vec3(x, 0, wing.reference().momentPoint().z());
    }

    /**
     * The downwash gradient d epsilon / d alpha at the tail from the lattice, the tail removed (area mean over the
     * tail, at zero angle of attack; {@link TailDownwash}); empty without a surface whose role is tail.
     */
    public OptionalDouble downwashGradient() {
        OptionalInt tail = wing.surfaceIndex(SurfaceRole.TAIL);
        return tail.isPresent() ? OptionalDouble.of(TailDownwash.of(wing, tail.getAsInt()).gradient())
                : OptionalDouble.empty();
    }

    /** The fuselage's empirical dCm/dalpha, per radian, where a fuselage is described. */
    public OptionalDouble fuselageSlope() {
        return fuselageSlope;
    }

    /**
     * The stick-fixed neutral point: where dCm/dCL vanishes, at zero angle of attack and elevator.
     *
     * @param x           its x, m, wing axes
     * @param macFraction the fraction of the wing's MAC from its leading edge there
     */
    public record NeutralPoint(double x, double macFraction) {
    }

    /**
     * The stick-fixed neutral point, from dCm/dalpha over dCL/dalpha at zero angle of attack and elevator (central
     * differences of five points), the fuselage's slope included.
     */
    public NeutralPoint neutralPoint() {
        Vec3 ref = wing.reference().momentPoint();
        double liftSlope = derivative(a -> solve(a, 0).coefficients().lift());
        double momentSlope = derivative(a -> solve(a, 0).about(ref).coefficients().pitchingMoment())
                + fuselageSlope.orElse(0);
        if (!(liftSlope > 0)) {
            throw new RefusedException("the configuration's lift does not rise with angle of attack; no neutral point");
        }
        double x = ref.x() - wing.reference().chord() * momentSlope / liftSlope;
        return new NeutralPoint(x, macFraction(x));
    }

    /** The static margin at a centre of gravity at x (m): (x_np - x) over the wing's MAC. */
    public double staticMargin(double x) {
        return (neutralPoint().x() - x) / mac;
    }

    /**
     * The pitch derivatives about a centre of gravity, per radian; pitch rate per radian of q c / (2 V) with c the
     * reference chord; the elevator's with its small-deflection handbook effectiveness (absent without an
     * elevator).
     *
     * @param liftSlope         CL_alpha
     * @param momentSlope       Cm_alpha, the fuselage's included
     * @param liftPerRate       CL_q
     * @param momentPerRate     Cm_q
     * @param liftPerElevator   CL_de
     * @param momentPerElevator Cm_de
     */
    public record PitchDerivatives(double liftSlope, double momentSlope, double liftPerRate, double momentPerRate,
            OptionalDouble liftPerElevator, OptionalDouble momentPerElevator) {
    }

    /** The derivatives about the centre of gravity at x (m), at zero angle of attack and elevator. */
    public PitchDerivatives derivatives(double x) {
        Vec3 cg = centreAt(x);
        double liftSlope = derivative(a -> solve(a, 0).coefficients().lift());
        double momentSlope = derivative(a -> solve(a, 0).about(cg).coefficients().pitchingMoment())
                + fuselageSlope.orElse(0);
        double c = wing.reference().chord();
        double[] rate = analysis.pitchRateCirculation(cg);
        for (int i = 0; i < rate.length; i++) {
            rate[i] *= 2 / c;
        }
        Solution q = new Solution(analysis.lattice(), wing.reference(), 0, new double[wing.controls().size()], rate)
                .about(cg);
        OptionalDouble liftPerElevator = OptionalDouble.empty();
        OptionalDouble momentPerElevator = OptionalDouble.empty();
        if (hasElevator()) {
            liftPerElevator = OptionalDouble.of(derivative(e -> solve(0, e).coefficients().lift()));
            momentPerElevator = OptionalDouble.of(derivative(e -> solve(0, e).about(cg).coefficients()
                    .pitchingMoment()));
        }
        return new PitchDerivatives(liftSlope, momentSlope, q.coefficients().lift(), q.coefficients().pitchingMoment(),
                liftPerElevator, momentPerElevator);
    }

    /**
     * The deflections (rad, control order) with every elevator at {@code elevator} (rad) times its handbook
     * effectiveness at that deflection: what the lattice solves.
     */
    public double[] deflectionsWith(double elevator) {
        double[] d = base.clone();
        List<ControlSurface> controls = wing.controls();
        for (int c : elevators) {
            d[c] = elevator * effectiveness(controls.get(c), elevator);
        }
        return d;
    }

    /** True when the handbook plain-flap data cover every elevator's chord fraction (at small deflections). */
    public boolean handbookElevator() {
        return elevators.stream().allMatch(c -> PlainFlap.coversChordFraction(wing.controls().get(c).chordFraction()));
    }

    private static double effectiveness(ControlSurface c, double deflection) {
        if (!PlainFlap.coversChordFraction(c.chordFraction())) {
            return 1;
        }
        PlainFlap flap = PlainFlap.of(c.chordFraction());
        double size = Math.abs(deflection);
        return flap.covers(size) ? flap.liftEffectiveness(size) : 1;
    }

    /** The travel every elevator allows together, if each states its limits. */
    public Optional<DeflectionLimits> elevatorLimits() {
        double least = Double.NEGATIVE_INFINITY;
        double greatest = Double.POSITIVE_INFINITY;
        for (int c : elevators) {
            Optional<DeflectionLimits> l = wing.controls().get(c).limits();
            if (l.isEmpty()) {
                return Optional.empty();
            }
            least = Math.max(least, l.get().least());
            greatest = Math.min(greatest, l.get().greatest());
        }
        return elevators.isEmpty() ? Optional.empty() : Optional.of(new DeflectionLimits(least, greatest));
    }

    /** f'(0) by the five-point central difference of step {@link #STEP}. */
    private static double derivative(DoubleUnaryOperator f) {
        return (8 * (f.applyAsDouble(STEP) - f.applyAsDouble(-STEP)) - (f.applyAsDouble(2 * STEP)
                - f.applyAsDouble(-2 * STEP))) / (12 * STEP);
    }

    private Solution solve(double alpha, double elevator) {
        return analysis.solve(alpha, deflectionsWith(elevator));
    }

    /**
     * One trimmed point of level flight.
     *
     * @param equivalentSpeed m/s
     * @param trueSpeed       m/s
     * @param lift            the configuration's CL
     * @param alpha           angle of attack of the body x axis, rad
     * @param elevator        elevator deflection, rad
     * @param wingLift        the wing's CL on the reference area
     * @param pitchLift       the tail's (or canard's) CL on its own area
     * @param pitchLoad       the tail's (or canard's) lift, N, positive up
     * @param inducedDrag     CDi of the configuration (Trefftz plane)
     * @param drag            CD = CDi + CDp where every section gives a polar
     * @param trimDrag        CDi trimmed minus CDi at the same CL with the elevator at zero
     * @param thrust          the thrust, N, where a thrust line is given (equal to the drag)
     * @param withinLimits    the elevator within its travel (true where no limits are given)
     * @param solution        the lattice solution, moments about the centre of gravity
     */
    public record TrimPoint(double equivalentSpeed, double trueSpeed, double lift, double alpha, double elevator,
            double wingLift, OptionalDouble pitchLift, OptionalDouble pitchLoad, double inducedDrag,
            OptionalDouble drag, double trimDrag, OptionalDouble thrust, boolean withinLimits, Solution solution) {
    }

    /**
     * Trims level flight at an equivalent airspeed: Cm = 0 about the centre of gravity at x (m) and
     * L + T sin(alpha) = W, by Newton's method on alpha and the elevator to {@value #TRIM_TOLERANCE}.
     *
     * @throws RefusedException without an elevator, or when no trim is found within the linear range
     */
    public TrimPoint trim(double x, double equivalentSpeed, FlightCondition condition) {
        requireElevator();
        Vec3 cg = centreAt(x);
        double ve = equivalentSpeed;
        double vt = Airspeed.trueFromEquivalent(ve, condition.atmosphere());
        double q = 0.5 * FlightCondition.seaLevelDensity() * ve * ve;
        double s = wing.reference().area();
        double required = condition.liftForce() / (q * s);
        double reynolds = vt / condition.atmosphere().kinematicViscosity();
        double alpha = analysis.liftCurve(deflectionsWith(0)).alphaFor(required);
        double elevator = 0;
        double[] r = residual(alpha, elevator, cg, required, reynolds);
        for (int k = 0; k < MAX_ITERATIONS && !(Math.abs(r[0]) < TRIM_TOLERANCE && Math.abs(r[1]) < TRIM_TOLERANCE);
                k++) {
            double h = 1e-7;
            double[] ra = residual(alpha + h, elevator, cg, required, reynolds);
            double[] re = residual(alpha, elevator + h, cg, required, reynolds);
            double a11 = (ra[0] - r[0]) / h;
            double a21 = (ra[1] - r[1]) / h;
            double a12 = (re[0] - r[0]) / h;
            double a22 = (re[1] - r[1]) / h;
            double det = a11 * a22 - a12 * a21;
            if (!(Math.abs(det) > 0)) {
                break;
            }
            alpha -= (a22 * r[0] - a12 * r[1]) / det;
            elevator -= (a11 * r[1] - a21 * r[0]) / det;
            if (!(Math.abs(alpha) < Math.toRadians(30) && Math.abs(elevator) < Math.toRadians(60))) {
                break;
            }
            r = residual(alpha, elevator, cg, required, reynolds);
        }
        if (!(Math.abs(r[0]) < TRIM_TOLERANCE && Math.abs(r[1]) < TRIM_TOLERANCE)) {
            throw new RefusedException(String.format(Locale.ROOT, "no trim at %.1f m/s (CL %.3f): the elevator and "
                    + "angle of attack needed leave the linear range", ve, required));
        }
        Solution sol = solve(alpha, elevator).about(cg);
        double cdi = sol.coefficients().inducedDrag();
        OptionalDouble cdp = ProfileDrag.coefficient(sol, wing, reynolds);
        OptionalDouble cd = cdp.isPresent() ? OptionalDouble.of(cdi + cdp.getAsDouble()) : OptionalDouble.empty();
        double lift = sol.coefficients().lift();
        double untrimmedAlpha = analysis.liftCurve(deflectionsWith(0)).alphaFor(lift);
        double trimDrag = cdi - solve(untrimmedAlpha, 0).coefficients().inducedDrag();
        OptionalDouble pitchLift = OptionalDouble.empty();
        OptionalDouble pitchLoad = OptionalDouble.empty();
        if (pitchSurface.isPresent()) {
            int t = pitchSurface.getAsInt();
            double tailLift = sol.coefficients(t).lift();
            pitchLift = OptionalDouble.of(tailLift * s / wing.surfaces().get(t).area());
            pitchLoad = OptionalDouble.of(tailLift * q * s);
        }
        OptionalDouble thrust = wing.thrustLineHeight().isPresent()
                ? OptionalDouble.of(cd.orElse(cdi) * q * s) : OptionalDouble.empty();
        boolean within = withinTravel(elevator);
        return new TrimPoint(ve, vt, lift, alpha, elevator, sol.coefficients(0).lift(), pitchLift, pitchLoad, cdi, cd,
                trimDrag, thrust, within, sol);
    }

    /** True when the elevator deflection (rad) lies within the travel, or no travel is given. */
    public boolean withinTravel(double elevator) {
        return elevatorLimits().map(l -> l.contains(elevator, 1e-9)).orElse(true);
    }

    /** The trim residuals: CL + CT sin(alpha) - W/(q S), and Cm about the centre of gravity with every term. */
    private double[] residual(double alpha, double elevator, Vec3 cg, double required, double reynolds) {
        Solution sol = solve(alpha, elevator).about(cg);
        double cl = sol.coefficients().lift();
        double cm = sol.coefficients().pitchingMoment() + fuselageSlope.orElse(0) * alpha;
        if (wing.thrustLineHeight().isPresent()) {
            double cd = sol.coefficients().inducedDrag() + ProfileDrag.coefficient(sol, wing, reynolds).orElse(0);
            cl += cd * Math.sin(alpha);
            cm -= cd * wing.thrustLineHeight().getAsDouble() / wing.reference().chord();
        }
        return new double[] {cl - required, cm};
    }

    private void requireElevator() {
        if (!hasElevator()) {
            throw new RefusedException("the configuration has no elevator (a control of kind elevator on the tail or "
                    + "canard), so it cannot be trimmed");
        }
    }

    /** What a stall point stands on: the maximum lift of the section lift curves, or the linear onset. */
    public enum StallBasis {
        /** The maximum of the lift traced through the stall from the section lift curves. */
        MAX_LIFT,
        /** The linear stall onset: the first station reaching its cl_max (below the maximum lift: the safe side). */
        ONSET;

        /** The word of the outputs. */
        public String word() {
            return this == MAX_LIFT ? "max-lift" : "onset";
        }
    }

    /**
     * The stall in balance, power off: the wing at its stall point (by the basis) with the elevator that makes
     * Cm = 0 about the centre of gravity, and the weight carried by every surface together.
     *
     * @param basis           what the stall point stands on
     * @param lift            the configuration's CL
     * @param wingLift        the wing's CL on the reference area
     * @param alpha           rad
     * @param elevator        rad
     * @param equivalentSpeed the stall speed, m/s
     * @param trueSpeed       m/s
     * @param withinLimits    the elevator within its travel (true where no limits are given)
     */
    public record TrimmedStall(StallBasis basis, double lift, double wingLift, double alpha, double elevator,
            double equivalentSpeed, double trueSpeed, boolean withinLimits) {
    }

    /**
     * The trimmed stall at the centre of gravity at x (m), power off, with the wing's deflections of this balance,
     * the stall speed and the strips' Reynolds numbers iterated together to {@value #SPEED_TOLERANCE}.
     *
     * @throws RefusedException without an elevator, or when the iteration does not settle
     */
    public TrimmedStall trimmedStall(double x, StripLimits limits, FlightCondition condition, StallBasis basis) {
        requireElevator();
        Vec3 cg = centreAt(x);
        double nu = condition.atmosphere().kinematicViscosity();
        double vt = 30;
        double elevator = 0;
        double previousElevator = Double.NaN;
        double previousMoment = Double.NaN;
        double slope = derivatives(x).momentPerElevator().getAsDouble();
        for (int k = 0; k < MAX_ITERATIONS; k++) {
            Solution sol = stallPoint(elevator, limits, vt / nu, basis).about(cg);
            double moment = sol.coefficients().pitchingMoment() + fuselageSlope.orElse(0) * sol.alpha();
            double lift = sol.coefficients().lift();
            double ve = condition.equivalentSpeedFor(lift, wing.reference());
            double next = Airspeed.trueFromEquivalent(ve, condition.atmosphere());
            boolean settled = Math.abs(moment) < 1e-10 && Math.abs(next - vt) <= SPEED_TOLERANCE * next;
            if (settled) {
                return new TrimmedStall(basis, lift, sol.coefficients(0).lift(), sol.alpha(), elevator, ve, next,
                        withinTravel(elevator));
            }
            if (!Double.isNaN(previousMoment) && moment != previousMoment && elevator != previousElevator) {
                slope = (moment - previousMoment) / (elevator - previousElevator);
            }
            previousMoment = moment;
            previousElevator = elevator;
            elevator -= moment / slope;
            vt = next;
            if (!(Math.abs(elevator) < Math.toRadians(60))) {
                break;
            }
        }
        throw new RefusedException("no elevator deflection within 60 degrees balances the configuration at its "
                + "stall: the elevator lacks the power at this centre of gravity (move it aft, or give the tail more "
                + "area, arm or incidence)");
    }

    /**
     * The forward limit of the centre of gravity set by elevator power at the stall: the x (m) at which the elevator
     * at its trailing-edge-up stop just balances the configuration at its stall point, power off; empty without
     * elevator limits.
     */
    public OptionalDouble forwardLimit(StripLimits limits, FlightCondition condition, StallBasis basis) {
        requireElevator();
        Optional<DeflectionLimits> travel = elevatorLimits();
        if (travel.isEmpty()) {
            return OptionalDouble.empty();
        }
        double stop = travel.get().least();
        double nu = condition.atmosphere().kinematicViscosity();
        Vec3 ref = wing.reference().momentPoint();
        double vt = 30;
        for (int k = 0; k < MAX_ITERATIONS; k++) {
            Solution sol = stallPoint(stop, limits, vt / nu, basis).about(ref);
            double ve = condition.equivalentSpeedFor(sol.coefficients().lift(), wing.reference());
            double next = Airspeed.trueFromEquivalent(ve, condition.atmosphere());
            if (Math.abs(next - vt) <= SPEED_TOLERANCE * next) {
                double moment = sol.coefficients().pitchingMoment() + fuselageSlope.orElse(0) * sol.alpha();
                return OptionalDouble.of(ref.x() - wing.reference().chord() * moment / sol.normalForce());
            }
            vt = next;
        }
        throw new RefusedException("the stall speed at the elevator's stop and the Reynolds numbers did not settle");
    }

    /** The solution at the stall point with the elevator at {@code elevator} (rad), moments about the reference. */
    private Solution stallPoint(double elevator, StripLimits limits, double reynoldsPerMetre, StallBasis basis) {
        double[] d = deflectionsWith(elevator);
        if (basis == StallBasis.MAX_LIFT) {
            return CoupledLift.of(analysis, d, limits, reynoldsPerMetre).maximumSolution();
        }
        double alpha = StallAnalysis.estimate(analysis, d, limits, reynoldsPerMetre).alpha();
        return analysis.solve(alpha, FlapLift.deflections(wing, d));
    }
}
