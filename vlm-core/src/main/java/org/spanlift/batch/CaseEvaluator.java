package org.spanlift.batch;

import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.balance.BalanceStudy;
import org.spanlift.flight.FlightCondition;
import org.spanlift.flight.FlightPoint;
import org.spanlift.flight.ReynoldsRule;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.input.RefusedException;
import org.spanlift.input.YamlValue;
import org.spanlift.io.StructureReader;
import org.spanlift.io.WingFileReader;
import org.spanlift.loads.LoadsAnalysis;
import org.spanlift.loads.SpanwiseLoads;
import org.spanlift.solve.InfluenceCache;
import org.spanlift.solve.linear.LuOptions;
import org.spanlift.solve.LiftCurve;
import org.spanlift.solve.SingularSystemException;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.MissingSectionDataException;
import org.spanlift.stall.StallStudy;
import org.spanlift.stall.StripLimits;
import org.spanlift.structure.LoadCase;
import org.spanlift.structure.WingStructure;
import org.spanlift.sweep.Constraint;
import org.spanlift.sweep.ParameterPath;
import org.spanlift.sweep.ResultColumn;
import org.spanlift.sweep.Sweep;
import org.spanlift.vocabulary.ControlGeometry;
import org.spanlift.vocabulary.ResultKey;
import org.spanlift.vocabulary.WingResult;


/**
 * Evaluates the cases of a sweep into flat rows of named scalar results. Not thread-safe: one per thread.
 *
 * <p>Each case computes its derived values from its swept values ({@code Derivation}; a value that is not a
 * finite number of a wing file's size fails the case, located in the sweep file), substitutes both into the
 * base wing tree, reads the wing and builds its lattice. The
 * factorized influence systems are kept in a small cache keyed by the lattice geometry (every panel's
 * vortex points, control point, normal and cut-off, compared bit for bit), so when a case changes only
 * what enters the right-hand side (twist, washout, camber, section data, deflections) the factorization is
 * reused and only new right-hand sides are solved. The antisymmetric system is built only when an aileron
 * is deflected. A cached system is the same matrix bit for bit, so results never depend on the cache (nor
 * on the thread that ran a case).
 */
public final class CaseEvaluator {

    /** Geometries kept per thread. */
    static final int CACHE_SIZE = 4;

    private final Sweep sweep;
    private final String baseFile;
    private final List<ResultColumn> columns;
    private final boolean wantStall;
    private final boolean wantFlaps;
    private final boolean wantLoads;
    private final boolean wantBalance;
    private final InfluenceCache cache;

    /** An evaluator that factorizes with {@link LuOptions#DEFAULT}. */
    public CaseEvaluator(Sweep sweep) {
        this(sweep, LuOptions.DEFAULT);
    }

    /** An evaluator that factorizes as {@code options} say (results do not depend on them). */
    public CaseEvaluator(Sweep sweep, LuOptions options) {
        this.sweep = sweep;
        this.cache = new InfluenceCache(CACHE_SIZE, options);
        this.baseFile = sweep.basePath().toString();
        this.columns = sweep.columns();
        this.wantStall = columns.stream().anyMatch(ResultColumn::needsClMax);
        this.wantFlaps = columns.stream().anyMatch(ResultColumn::needsFlaps);
        this.wantLoads = columns.stream().anyMatch(ResultColumn::needsLoadCase);
        this.wantBalance = columns.stream().anyMatch(ResultColumn::needsCentreOfGravity);
    }

    /** Factorizations done so far by this evaluator (for measurements). */
    public long factorizations() {
        return cache.factorizations();
    }

    /** Cases that reused a cached factorization. */
    public long reuses() {
        return cache.reuses();
    }

    /**
     * Evaluates case {@code index} of the design; a failure is recorded in the result, never thrown. A case
     * whose results include a number that is not finite (an infinity or NaN from degenerate values, such as a
     * reference area of 1e-300) fails with the first such column named: no row holds a non-finite number.
     */
    public CaseResult evaluate(long index) {
        String[] values = sweep.design().values(index);
        String id = CaseResult.id(sweep.parameters(), values);
        double[] derived = null;
        try {
            derived = sweep.derivation().values(values);
            Object[] results = compute(sweep.caseTree(values, derived));
            for (int k = 0; k < results.length; k++) {
                if (results[k] instanceof Double d && !Double.isFinite(d)) {
                    return failed(index, id, values, derived, "the result " + columns.get(k).name() + " is " + d
                            + ", not a finite number: the wing with these values is degenerate");
                }
            }
            Boolean feasible = null;
            if (!sweep.constraints().isEmpty()) {
                feasible = true;
                for (Constraint c : sweep.constraints()) {
                    feasible &= c.holds(number(results, c.left()), number(results, c.right()));
                }
            }
            return new CaseResult(index, id, values, derived, results, feasible, null);
        } catch (SingularSystemException e) {
            return failed(index, id, values, derived, "cannot solve this geometry: " + e.getMessage());
        } catch (InputException | RefusedException | ParameterPath.PathException e) {
            return failed(index, id, values, derived, e.getMessage());
        } catch (RuntimeException e) {
            return failed(index, id, values, derived, "internal error (" + e.getClass().getSimpleName()
                    + (e.getMessage() == null ? "" : ": " + e.getMessage()) + ")");
        }
    }

    private CaseResult failed(long index, String id, String[] values, double[] derived, String message) {
        String m = message.replace(baseFile + ":", sweep.baseName() + ":").replace('\n', ' ').replace('\r', ' ');
        return new CaseResult(index, id, values, derived, new Object[columns.size()], null, m);
    }

    private Double number(Object[] results, String column) {
        if (column == null) {
            return null;
        }
        for (int i = 0; i < columns.size(); i++) {
            if (columns.get(i).name().equals(column)) {
                return results[i] instanceof Number v ? v.doubleValue() : null;
            }
        }
        return null;
    }

    private Object[] compute(YamlValue tree) {
        Wing wing = WingFileReader.fromTree(tree, baseFile);
        List<ControlSurface> controls = wing.controls();
        int nc = controls.size();
        double[] asked = new double[nc];
        double[] flapped = new double[nc];
        for (int c = 0; c < nc; c++) {
            asked[c] = controls.get(c).deflection();
            boolean flap = controls.get(c).kind() == ControlKind.FLAP;
            flapped[c] = flap && sweep.flapsDeg().isPresent() ? Math.toRadians(sweep.flapsDeg().getAsDouble())
                    : asked[c];
        }
        double[] clean = StallStudy.cleanDeflections(wing, asked);
        boolean flapCase = wantFlaps && StallStudy.anyFlapDeflected(wing, flapped);
        // The elevators' bases too when the balance trims with them.
        double[] elevators = new double[nc];
        for (int c = 0; c < nc; c++) {
            elevators[c] = wantBalance && controls.get(c).kind() == ControlKind.ELEVATOR ? 1 : 0;
        }
        WingAnalysis analysis = flapCase ? WingAnalysis.of(wing, cache, asked, clean, flapped, elevators)
                : WingAnalysis.of(wing, cache, asked, clean, elevators);
        WingResult wingResult = WingResult.of(analysis, asked);

        StallStudy study = null;
        if (wantStall) {
            Optional<FlightCondition> condition = sweep.condition();
            study = StallStudy.of(analysis, clean, flapCase ? Optional.of(flapped) : Optional.empty(),
                    sweep.assumeClMax(), condition);
        }
        ReynoldsRule rule = sweep.condition().map(fc -> ReynoldsRule.of(wing.reference(), fc.atmosphere(),
                OptionalDouble.empty(), Optional.of(fc))).orElse(ReynoldsRule.lowest());

        Object[] out = new Object[columns.size()];
        Map<String, FlightPoint> points = new HashMap<>();
        SpanwiseLoads loads = wantLoads ? loads(tree, wing, analysis, clean) : null;
        BalanceStudy balance = wantBalance ? BalanceStudy.of(analysis, flapCase ? flapped : clean,
                sweep.centreOfGravity().orElseThrow(), sweep.condition(), sweep.assumeClMax()) : null;
        for (int k = 0; k < columns.size(); k++) {
            ResultColumn col = columns.get(k);
            out[k] = switch (col.group()) {
                case WING -> value(col, wingResult);
                case POINT -> value(col, point(points, col, analysis, asked, wingResult.curve(), wing, rule));
                case STALL -> value(col, study.clean().estimate());
                case STALL_FLAPS -> study.flaps().map(f -> value(col, f.estimate())).orElse(null);
                case MAX_LIFT -> value(col, study.clean().maximumLift());
                case MAX_LIFT_FLAPS -> study.flaps().map(f -> value(col, f.maximumLift())).orElse(null);
                case STUDY -> value(col, study);
                case CONTROL -> value(col, ControlGeometry.of(wing, wing.control(col.control()).orElseThrow(
                        () -> new InputException(baseFile, 0, "controls", "the wing has no control named '"
                                + col.control() + "'"))));
                case LOADS -> value(col, loads);
                case BALANCE -> value(col, balance);
            };
        }
        return out;
    }

    /**
     * The loads of the sweep's load case on the case's wing, clean, with the structure of the case's tree (as
     * {@code compare} gives them). A case that needs more wing lift than the stall onset gives cannot be flown
     * at that speed and fails, as {@code loads} refuses it; without cl-max data the onset is not checked.
     */
    private SpanwiseLoads loads(YamlValue tree, Wing wing, WingAnalysis analysis, double[] clean) {
        LoadCase loadCase = sweep.loadCase().orElseThrow();
        WingStructure structure = StructureReader.fromTree(tree, baseFile, wing);
        LoadsAnalysis la = LoadsAnalysis.of(analysis, structure, clean);
        SpanwiseLoads l = la.loads(loadCase);
        StripLimits limits;
        try {
            limits = StripLimits.of(wing, analysis.lattice(), clean, sweep.assumeClMax());
        } catch (MissingSectionDataException e) {
            return l;
        }
        double onset = la.stallOnsetLift(loadCase, limits);
        if (LoadsAnalysis.beyondStall(l, onset)) {
            throw new RefusedException(String.format(Locale.ROOT, "the load case needs a wing CL of %.3f, above the "
                    + "stall onset %.3f: it cannot be flown at that speed (no loads.* values)", l.liftCoefficient(),
                    onset));
        }
        return l;
    }

    /** The column's value from its source (the column's group says which source type it reads). */
    @SuppressWarnings("unchecked")
    private static <S> Object value(ResultColumn col, S source) {
        return ((ResultKey<S>) col.key()).of(source);
    }

    private static FlightPoint point(Map<String, FlightPoint> points, ResultColumn col, WingAnalysis analysis,
            double[] d, LiftCurve curve, Wing wing, ReynoldsRule rule) {
        String k = (col.atLift() ? "CL=" : "alpha=") + col.at();
        FlightPoint p = points.get(k);
        if (p == null) {
            double alpha = col.atLift() ? curve.alphaFor(col.at()) : Math.toRadians(col.at());
            p = FlightPoint.of(analysis.solve(alpha, d), wing, rule);
            points.put(k, p);
        }
        return p;
    }
}
