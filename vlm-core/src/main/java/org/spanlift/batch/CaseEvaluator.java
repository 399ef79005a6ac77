package org.spanlift.batch;

import org.spanlift.sweep.Constraint;
import org.spanlift.sweep.Parameter;
import org.spanlift.sweep.ParameterPath;
import org.spanlift.sweep.ResultColumn;
import org.spanlift.sweep.Sweep;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.flight.FlightCondition;
import org.spanlift.flight.StallSpeed;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.io.WingFileReader;
import org.spanlift.input.YamlValue;
import org.spanlift.lattice.Lattice;
import org.spanlift.results.Coefficients;
import org.spanlift.solve.InfluenceCache;
import org.spanlift.solve.SingularSystemException;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.MissingSectionDataException;
import org.spanlift.stall.StallAnalysis;
import org.spanlift.stall.StallEstimate;
import org.spanlift.stall.StripLimits;

/**
 * Evaluates the cases of a sweep into flat rows of named scalar results. Not thread-safe: one per thread.
 *
 * <p>Each case substitutes its values into the base wing tree, reads the wing and builds its lattice. The
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
    private final boolean wantSpeed;
    private final InfluenceCache cache = new InfluenceCache(CACHE_SIZE);

    public CaseEvaluator(Sweep sweep) {
        this.sweep = sweep;
        this.baseFile = sweep.basePath().toString();
        this.columns = sweep.columns();
        this.wantStall = columns.stream().anyMatch(c -> c.group() == ResultColumn.Group.STALL
                || c.group() == ResultColumn.Group.STALL_SPEED || c.group() == ResultColumn.Group.FLAG
                || c.key().equals("flap_increment_CL"));
        this.wantFlaps = columns.stream().anyMatch(c -> c.group() == ResultColumn.Group.STALL_FLAPS
                || c.key().startsWith("stall_speed.flaps"));
        this.wantSpeed = columns.stream().anyMatch(c -> c.group() == ResultColumn.Group.STALL_SPEED)
                || (sweep.condition().isPresent() && (wantStall || wantFlaps));
    }

    /** Factorizations done so far by this evaluator (for measurements). */
    public long factorizations() {
        return cache.factorizations();
    }

    /** Cases that reused a cached factorization. */
    public long reuses() {
        return cache.reuses();
    }

    /** Evaluates case {@code index} of the design; a failure is recorded in the result, never thrown. */
    public CaseResult evaluate(long index) {
        String[] values = sweep.design().values(index);
        String id = CaseResult.id(sweep.parameters(), values);
        try {
            Object[] results = compute(values);
            Boolean feasible = null;
            if (!sweep.constraints().isEmpty()) {
                feasible = true;
                for (Constraint c : sweep.constraints()) {
                    feasible &= c.holds(number(results, c.left()), number(results, c.right()));
                }
            }
            return new CaseResult(index, id, values, results, feasible, null);
        } catch (InputException | MissingSectionDataException e) {
            return failed(index, id, values, e.getMessage());
        } catch (SingularSystemException e) {
            return failed(index, id, values, "cannot solve this geometry: " + e.getMessage());
        } catch (ParameterPath.PathException | IllegalArgumentException | IllegalStateException e) {
            return failed(index, id, values, String.valueOf(e.getMessage()));
        } catch (RuntimeException e) {
            return failed(index, id, values, "internal error (" + e.getClass().getSimpleName()
                    + (e.getMessage() == null ? "" : ": " + e.getMessage()) + ")");
        }
    }

    private CaseResult failed(long index, String id, String[] values, String message) {
        String m = message.replace(baseFile + ":", sweep.baseName() + ":").replace('\n', ' ').replace('\r', ' ');
        return new CaseResult(index, id, values, new Object[columns.size()], null, m);
    }

    private Double number(Object[] results, String column) {
        if (column == null) {
            return null;
        }
        for (int i = 0; i < columns.size(); i++) {
            if (columns.get(i).name().equals(column)) {
                return results[i] instanceof Double d ? d : null;
            }
        }
        return null;
    }

    private Object[] compute(String[] values) {
        YamlValue tree = sweep.baseTree();
        List<Parameter> parameters = sweep.parameters();
        for (int p = 0; p < parameters.size(); p++) {
            tree = parameters.get(p).path().apply(tree, values[p]);
        }
        Wing wing = WingFileReader.fromTree(tree, baseFile);
        List<ControlSurface> controls = wing.controls();
        int nc = controls.size();
        double[] asked = new double[nc];
        double[] clean = new double[nc];
        double[] flapped = new double[nc];
        boolean anyFlap = false;
        for (int c = 0; c < nc; c++) {
            asked[c] = controls.get(c).deflection();
            boolean flap = controls.get(c).kind() == ControlKind.FLAP;
            clean[c] = flap ? 0 : asked[c];
            flapped[c] = flap && sweep.flapsDeg().isPresent() ? Math.toRadians(sweep.flapsDeg().getAsDouble()) : asked[c];
            anyFlap |= flap && flapped[c] != 0;
        }
        boolean flapCase = wantFlaps && anyFlap;
        WingAnalysis analysis = flapCase ? WingAnalysis.of(wing, cache, asked, clean, flapped)
                : WingAnalysis.of(wing, cache, asked, clean);
        Lattice lattice = analysis.lattice();
        Reference ref = wing.reference();
        WingAnalysis.LiftLine line = analysis.liftLine(asked);

        StallEstimate cleanOnset = null;
        StallSpeed cleanSpeed = null;
        StallEstimate flapOnset = null;
        StallSpeed flapSpeed = null;
        OptionalDouble assume = sweep.assumeClMax();
        Optional<FlightCondition> condition = sweep.condition();
        boolean speeds = condition.isPresent() && wantSpeed;
        if (wantStall || wantFlaps) {
            StripLimits cleanLimits = StripLimits.of(wing, lattice, clean, assume);
            if (speeds) {
                cleanSpeed = StallSpeed.of(analysis, clean, cleanLimits, condition.get());
                cleanOnset = cleanSpeed.estimate();
            } else {
                cleanOnset = StallAnalysis.estimate(analysis, clean, cleanLimits, 0);
            }
            if (flapCase) {
                StripLimits flapLimits = StripLimits.of(wing, lattice, flapped, assume);
                if (speeds) {
                    flapSpeed = StallSpeed.of(analysis, flapped, flapLimits, condition.get());
                    flapOnset = flapSpeed.estimate();
                } else {
                    flapOnset = StallAnalysis.estimate(analysis, flapped, flapLimits, 0);
                }
            }
        }

        Object[] out = new Object[columns.size()];
        Map<String, Point> points = new HashMap<>();
        Surface main = wing.main();
        double semi = main.mirrored() ? main.planform().yEnd() : 0.5 * (main.planform().yEnd() - main.planform().yStart());
        for (int k = 0; k < columns.size(); k++) {
            ResultColumn col = columns.get(k);
            out[k] = switch (col.group()) {
                case WING -> switch (col.key()) {
                    case "lift_slope_per_rad" -> line.slope();
                    case "lift_slope_per_deg" -> line.slope() * Math.PI / 180;
                    case "zero_lift_angle_deg" -> Math.toDegrees(line.zeroLiftAngle());
                    case "reference.area" -> ref.area();
                    case "reference.span" -> ref.span();
                    case "reference.chord" -> ref.chord();
                    case "reference.aspect_ratio" -> ref.aspectRatio();
                    default -> (double) lattice.panelCount();
                };
                case POINT -> point(points, col, analysis, asked, line);
                case STALL -> onsetValue(cleanOnset, col.key().substring("stall.".length()));
                case STALL_FLAPS -> col.key().equals("flap_increment_CL")
                        ? (flapOnset == null ? null : (Object) (flapOnset.lift() - cleanOnset.lift()))
                        : onsetValue(flapOnset, col.key().substring("stall_flaps.".length()));
                case STALL_SPEED -> switch (col.key()) {
                    case "stall_speed.clean_eas" -> cleanSpeed.equivalent();
                    case "stall_speed.clean_tas" -> cleanSpeed.trueSpeed();
                    case "stall_speed.flaps_eas" -> flapSpeed == null ? null : (Object) flapSpeed.equivalent();
                    default -> flapSpeed == null ? null : (Object) flapSpeed.trueSpeed();
                };
                case CONTROL -> control(wing, col, semi);
                case FLAG -> cleanOnset.assumedClMax() || (flapOnset != null && flapOnset.assumedClMax());
            };
        }
        return out;
    }

    private static Object onsetValue(StallEstimate o, String key) {
        if (o == null) {
            return null;
        }
        return switch (key) {
            case "CL" -> o.lift();
            case "alpha_deg" -> Math.toDegrees(o.alpha());
            case "y" -> o.y();
            case "eta" -> o.eta();
            case "aileron_margin.dcl" -> o.aileronMargin().map(m -> (Object) m.dcl()).orElse(null);
            case "aileron_margin.y" -> o.aileronMargin().map(m -> (Object) Math.abs(m.y())).orElse(null);
            case "beside_control_end" -> o.besideControlEnd().map(e -> (Object) e.control()).orElse(null);
            default -> o.halfSpanLift().isPresent() ? (Object) o.halfSpanLift().getAsDouble() : null;
        };
    }

    private static Object control(Wing wing, ResultColumn col, double semi) {
        ControlSurface c = wing.control(col.control()).orElseThrow(() -> new IllegalArgumentException(
                "the wing has no control named '" + col.control() + "'"));
        return switch (col.key()) {
            case "from" -> c.from();
            case "to" -> c.to();
            case "from_eta" -> c.from() / semi;
            case "to_eta" -> c.to() / semi;
            case "chord_fraction" -> c.chordFraction();
            default -> Math.toDegrees(c.deflection());
        };
    }

    /** Coefficients at one flight point, shared by the columns that read it. */
    private record Point(double alpha, Coefficients coefficients) {
    }

    private Object point(Map<String, Point> points, ResultColumn col, WingAnalysis analysis, double[] d,
            WingAnalysis.LiftLine line) {
        String k = (col.atLift() ? "CL=" : "alpha=") + col.at();
        Point p = points.get(k);
        if (p == null) {
            double alpha = col.atLift() ? line.alphaFor(col.at()) : Math.toRadians(col.at());
            p = new Point(alpha, analysis.solve(alpha, d).coefficients());
            points.put(k, p);
        }
        Coefficients co = p.coefficients();
        return switch (col.key()) {
            case "CL" -> co.lift();
            case "CDi" -> co.inducedDrag();
            case "e" -> co.spanEfficiency().isPresent() ? (Object) co.spanEfficiency().getAsDouble() : null;
            case "Cm" -> co.pitchingMoment();
            case "C_roll" -> co.rollingMoment();
            default -> Math.toDegrees(p.alpha());
        };
    }
}
