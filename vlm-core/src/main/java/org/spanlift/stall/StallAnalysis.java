package org.spanlift.stall;

import org.spanlift.solve.LiftCurve;
import org.spanlift.input.RefusedException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.Strip;
import org.spanlift.solve.BasisSolutions;
import org.spanlift.solve.WingAnalysis;

/**
 * The critical-section method: with the freestream (cos a, 0, sin a), each strip's section lift is exactly
 * cl(a) = A cos a + B sin a in linear theory (A from the x basis with the deflections, B from the z basis),
 * so the angle at which it reaches cl_max is found in closed form on the rising branch; the wing stalls
 * first where that angle is lowest. The basic and additional loads (cl at zero wing lift, and per unit CL)
 * are reported for the usual decomposition cl = cl_basic + CL cl_additional. Flaps and ailerons lift as the
 * handbook plain-flap correction says ({@link FlapLift}), not with their inviscid lift.
 */
public final class StallAnalysis {

    private final WingAnalysis analysis;
    private final double[] deflections;
    private final double[] lifting;
    private final StripLimits limits;
    private final LiftCurve line;
    private final double semi;
    private final double[] a;
    private final double[] b;
    private final double[] amplitude;
    private final double[] phase;

    private StallAnalysis(WingAnalysis analysis, double[] deflections, StripLimits limits) {
        this.analysis = analysis;
        this.deflections = deflections.clone();
        this.limits = limits;
        this.lifting = FlapLift.deflections(analysis.wing(), deflections);
        this.line = analysis.liftCurve(lifting);
        Lattice lattice = analysis.lattice();
        BasisSolutions basis = analysis.basis();
        Wing wing = analysis.wing();
        this.semi = wing.main().mirrored() ? wing.main().planform().yEnd()
                : 0.5 * (wing.main().planform().yEnd() - wing.main().planform().yStart());
        List<Integer> ids = limits.strips();
        int n = ids.size();
        a = new double[n];
        b = new double[n];
        amplitude = new double[n];
        phase = new double[n];
        for (int i = 0; i < n; i++) {
            Strip st = lattice.strips().get(ids.get(i));
            double gx = 0;
            double gz = 0;
            for (int r = 0; r < st.rows(); r++) {
                int p = st.firstPanel() + r;
                gx += basis.alongX(p, lifting);
                gz += basis.alongZ(p);
            }
            a[i] = 2 * gx / st.chord();
            b[i] = 2 * gz / st.chord();
            amplitude[i] = Math.hypot(a[i], b[i]);
            phase[i] = Math.atan2(b[i], a[i]);
        }
    }

    /**
     * The per-strip lift terms of one configuration, formed once; {@link #estimate(double)} then repeats
     * only the cl_max lookup (as the stall speed and the Reynolds numbers settle).
     *
     * @param deflections control deflections, rad, control order
     * @param limits      cl_max per strip
     */
    public static StallAnalysis of(WingAnalysis analysis, double[] deflections, StripLimits limits) {
        return new StallAnalysis(analysis, deflections, limits);
    }

    /** Estimates stall onset in one call; see {@link #estimate(double)}. */
    public static StallEstimate estimate(WingAnalysis analysis, double[] deflections, StripLimits limits,
            double reynoldsPerMetre) {
        return of(analysis, deflections, limits).estimate(reynoldsPerMetre);
    }

    /**
     * Estimates stall onset.
     *
     * @param reynoldsPerMetre rho V / mu at the flight condition (true speed), or 0 when unknown (tables are
     *                         then read at their lowest Reynolds number)
     */
    public StallEstimate estimate(double reynoldsPerMetre) {
        Lattice lattice = analysis.lattice();
        List<Integer> ids = limits.strips();
        int n = ids.size();
        double[] clMax = new double[n];
        double[] re = new double[n];
        double[] alphaReach = new double[n];
        for (int i = 0; i < n; i++) {
            Strip st = lattice.strips().get(ids.get(i));
            re[i] = reynoldsPerMetre * st.chord();
            clMax[i] = limits.clMax(i, re[i]);
            alphaReach[i] = Math.abs(clMax[i]) <= amplitude[i] && !pointedTip(st)
                    ? phase[i] - Math.acos(clMax[i] / amplitude[i]) : Double.POSITIVE_INFINITY;
        }
        int first = 0;
        for (int i = 1; i < n; i++) {
            if (alphaReach[i] < alphaReach[first] - 1e-12
                    || (Math.abs(alphaReach[i] - alphaReach[first]) <= 1e-12 && lattice.strips().get(ids.get(i)).y() > 0
                            && lattice.strips().get(ids.get(first)).y() < 0)) {
                first = i;
            }
        }
        if (!Double.isFinite(alphaReach[first])) {
            throw new RefusedException("no station reaches its cl_max in linear theory; check the section data");
        }
        double alpha = alphaReach[first];
        double alpha0 = line.zeroLiftAngle();
        double slope = line.slope();
        List<StallEstimate.StripStall> strips = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Strip st = lattice.strips().get(ids.get(i));
            double clOnset = a[i] * Math.cos(alpha) + b[i] * Math.sin(alpha);
            double clBasic = a[i] * Math.cos(alpha0) + b[i] * Math.sin(alpha0);
            double clAdd = (-a[i] * Math.sin(alpha0) + b[i] * Math.cos(alpha0)) / slope;
            OptionalDouble reach = Double.isFinite(alphaReach[i]) ? OptionalDouble.of(line.lift(alphaReach[i]))
                    : OptionalDouble.empty();
            strips.add(new StallEstimate.StripStall(st.y(), Math.abs(st.y()) / semi, st.chord(), limits.section(i),
                    re[i], clMax[i], clOnset, clBasic, clAdd, limits.sectionAngle(i, clOnset), reach));
        }
        OptionalDouble tipFrom = OptionalDouble.empty();
        for (int i = 0; i < n; i++) {
            Strip st = lattice.strips().get(ids.get(i));
            if (pointedTip(st) && (tipFrom.isEmpty() || Math.abs(st.yLeft()) < tipFrom.getAsDouble())) {
                tipFrom = OptionalDouble.of(Math.min(Math.abs(st.yLeft()), Math.abs(st.yRight())));
            }
        }
        Strip onset = lattice.strips().get(ids.get(first));
        Optional<StallEstimate.AileronMargin> margin = aileronMargin(analysis.wing(), strips);
        OptionalDouble half = halfSpan(lattice, ids, strips);
        List<StallEstimate.StripStall> sorted = new ArrayList<>(strips);
        sorted.sort(Comparator.comparingDouble(StallEstimate.StripStall::y));
        // the wing's own lift at the onset, with the flaps at their handbook lift as the line has them; a wing
        // alone is the whole configuration
        double wingLift = analysis.wing().surfaces().size() == 1 ? line.lift(alpha)
                : analysis.solve(alpha, lifting).coefficients(0).lift();
        return new StallEstimate(line.lift(alpha), wingLift, alpha, Math.abs(onset.y()), Math.abs(onset.y()) / semi,
                limits.section(first), margin, half, List.copyOf(sorted), limits.assumed(),
                limits.defaultFlapIncrement(), controlEndAt(onset, sorted), line, tipFrom);
    }

    /**
     * True for a strip of a chord under {@value #POINTED_TIP_CHORD} of the wing's mean aerodynamic chord: near a
     * tip that ends in a point, where linear theory's section lift grows without bound toward the tip (an
     * onset found there would fall with every refinement of the strips). Such strips are not onset candidates
     * (the outputs say so); the lift through the stall keeps them, limited by their section curves.
     */
    private boolean pointedTip(Strip st) {
        return st.chord() < POINTED_TIP_CHORD * analysis.wing().main().meanAerodynamicChord();
    }

    /** The strips left out of the onset with a chord under this fraction of the mean aerodynamic chord. */
    public static final double POINTED_TIP_CHORD = 0.05;

    /**
     * The deflected control of the wing with a side edge on one of the strip's edges (the lattice cuts strips
     * at control ends), not counting an end on the plane of symmetry of a mirrored wing, at or inside the
     * fuselage, or at the tip.
     */
    private Optional<StallEstimate.ControlEnd> controlEndAt(Strip strip, List<StallEstimate.StripStall> strips) {
        Wing wing = analysis.wing();
        if (strip.surface() != 0) {
            return Optional.empty();
        }
        double tol = 1e-9 * semi;
        DoubleUnaryOperator side = wing.main().mirrored() ? Math::abs : y -> y;
        List<ControlSurface> controls = wing.main().controls();
        for (int c = 0; c < controls.size(); c++) {
            ControlSurface control = controls.get(c);
            if (deflections[c] == 0) {
                continue;
            }
            for (double end : new double[] {control.from(), control.to()}) {
                double inner = Math.max(wing.main().planform().yStart(), wing.main().fuselageHalfWidth());
                boolean sideEdge = end > inner + tol && end < wing.main().planform().yEnd() - tol;
                boolean onStrip = Math.abs(side.applyAsDouble(strip.yLeft()) - end) <= tol
                        || Math.abs(side.applyAsDouble(strip.yRight()) - end) <= tol;
                if (sideEdge && onStrip) {
                    return Optional.of(new StallEstimate.ControlEnd(control.name(), end,
                            firstWithin(control, side, strips)));
                }
            }
        }
        return Optional.empty();
    }

    /**
     * The strip within the control's span (by its centre) that reaches cl_max at the lowest wing CL; of a
     * symmetric pair, the right-hand one (the strips come in increasing y).
     */
    private static Optional<StallEstimate.Reach> firstWithin(ControlSurface control, DoubleUnaryOperator side,
            List<StallEstimate.StripStall> strips) {
        StallEstimate.Reach best = null;
        for (StallEstimate.StripStall s : strips) {
            double y = side.applyAsDouble(s.y());
            if (y > control.from() && y < control.to() && s.liftToReach().isPresent()) {
                double lift = s.liftToReach().getAsDouble();
                if (best == null || lift <= best.lift()) {
                    best = new StallEstimate.Reach(lift, s.y());
                }
            }
        }
        return Optional.ofNullable(best);
    }

    private static Optional<StallEstimate.AileronMargin> aileronMargin(Wing wing,
            List<StallEstimate.StripStall> strips) {
        StallEstimate.AileronMargin best = null;
        for (ControlSurface c : wing.main().controls()) {
            if (c.kind() != ControlKind.AILERON) {
                continue;
            }
            for (StallEstimate.StripStall s : strips) {
                double y = Math.abs(s.y());
                if (y > c.from() && y < c.to()) {
                    double dcl = s.clMax() - s.clAtOnset();
                    if (best == null || dcl < best.dcl()) {
                        best = new StallEstimate.AileronMargin(dcl, s.y());
                    }
                }
            }
        }
        return Optional.ofNullable(best);
    }

    private static OptionalDouble halfSpan(Lattice lattice, List<Integer> ids, List<StallEstimate.StripStall> strips) {
        double total = 0;
        List<double[]> reach = new ArrayList<>();
        for (int i = 0; i < strips.size(); i++) {
            double w = lattice.strips().get(ids.get(i)).width();
            total += w;
            if (strips.get(i).liftToReach().isPresent()) {
                reach.add(new double[] {strips.get(i).liftToReach().getAsDouble(), w});
            }
        }
        reach.sort(Comparator.comparingDouble(r -> r[0]));
        double covered = 0;
        for (double[] r : reach) {
            covered += r[1];
            if (covered >= 0.5 * total - 1e-12 * total) {
                return OptionalDouble.of(r[0]);
            }
        }
        return OptionalDouble.empty();
    }
}
