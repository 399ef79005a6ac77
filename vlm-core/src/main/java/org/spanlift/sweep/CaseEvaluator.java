package org.spanlift.sweep;

import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Reference;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.io.InputException;
import org.spanlift.io.WingFileReader;
import org.spanlift.io.YamlValue;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;
import org.spanlift.results.Coefficients;
import org.spanlift.results.Solution;
import org.spanlift.solve.InfluenceSystem;
import org.spanlift.solve.SingularSystemException;
import org.spanlift.solve.Symmetry;
import org.spanlift.stall.MissingSectionDataException;
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

    private final SweepFile sweep;
    private final String baseFile;
    private final List<ResultColumn> columns;
    private final boolean wantStall;
    private final boolean wantFlaps;
    private final boolean wantSpeed;
    private final ArrayDeque<Systems> cache = new ArrayDeque<>();
    private double[] key = new double[0];
    private long factorizations;
    private long reuses;

    /** The factorized systems of one lattice geometry. */
    private static final class Systems {
        final double[] key;
        InfluenceSystem symmetric;
        InfluenceSystem antisymmetric;
        InfluenceSystem full;

        Systems(double[] key) {
            this.key = key;
        }
    }

    public CaseEvaluator(SweepFile sweep) {
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
        return factorizations;
    }

    /** Cases that reused a cached factorization. */
    public long reuses() {
        return reuses;
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
        Lattice lattice = LatticeBuilder.build(wing);
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
        Basis basis = basis(lattice, controls, asked, wantFlaps && anyFlap ? flapped : null);
        Reference ref = wing.reference();
        double[] line = liftLine(lattice, basis, asked, ref.area());

        StripLimits cleanLimits = null;
        CriticalSection.Onset cleanOnset = null;
        CriticalSection.Speed cleanSpeed = null;
        CriticalSection.Onset flapOnset = null;
        CriticalSection.Speed flapSpeed = null;
        OptionalDouble assume = sweep.assumeClMax();
        Optional<FlightCondition> condition = sweep.condition();
        if (wantStall || wantFlaps) {
            cleanLimits = StripLimits.of(wing, lattice, clean, assume);
            double[] cl = liftLine(lattice, basis, clean, ref.area());
            CriticalSection cs = new CriticalSection(lattice, wing, basis.x, basis.z, basis.control, clean, cl[0], cl[1],
                    cleanLimits);
            if (condition.isPresent() && wantSpeed) {
                cleanSpeed = cs.speed(condition.get());
                cleanOnset = cleanSpeed.onset();
            } else {
                cleanOnset = cs.onset(0);
            }
            if (wantFlaps && anyFlap) {
                StripLimits fl = StripLimits.of(wing, lattice, flapped, assume);
                double[] fline = liftLine(lattice, basis, flapped, ref.area());
                CriticalSection fs = new CriticalSection(lattice, wing, basis.x, basis.z, basis.control, flapped,
                        fline[0], fline[1], fl);
                if (condition.isPresent() && wantSpeed) {
                    flapSpeed = fs.speed(condition.get());
                    flapOnset = flapSpeed.onset();
                } else {
                    flapOnset = fs.onset(0);
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
                    case "lift_slope_per_rad" -> line[0];
                    case "lift_slope_per_deg" -> line[0] * Math.PI / 180;
                    case "zero_lift_angle_deg" -> Math.toDegrees(line[1]);
                    case "reference.area" -> ref.area();
                    case "reference.span" -> ref.span();
                    case "reference.chord" -> ref.chord();
                    case "reference.aspect_ratio" -> ref.aspectRatio();
                    default -> (double) lattice.panelCount();
                };
                case POINT -> point(points, col, lattice, basis, asked, ref, line);
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
                case FLAG -> cleanOnset.assumed() || (flapOnset != null && flapOnset.assumed());
            };
        }
        return out;
    }

    private static Object onsetValue(CriticalSection.Onset o, String key) {
        if (o == null) {
            return null;
        }
        return switch (key) {
            case "CL" -> o.lift();
            case "alpha_deg" -> Math.toDegrees(o.alpha());
            case "y" -> o.y();
            case "eta" -> o.eta();
            case "aileron_margin.dcl" -> o.marginDcl();
            case "aileron_margin.y" -> o.marginY();
            default -> o.halfSpanLift();
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

    private Object point(Map<String, Point> points, ResultColumn col, Lattice lattice, Basis basis, double[] d,
            Reference ref, double[] line) {
        String k = (col.atLift() ? "CL=" : "alpha=") + col.at();
        Point p = points.get(k);
        if (p == null) {
            double alpha;
            if (col.atLift()) {
                if (Math.abs(col.at()) >= line[0]) {
                    throw new IllegalArgumentException("CL " + col.at() + " is beyond this wing's linear range");
                }
                alpha = line[1] + Math.asin(col.at() / line[0]);
            } else {
                alpha = Math.toRadians(col.at());
            }
            int n = lattice.panelCount();
            double[] g = basis.work;
            double c = Math.cos(alpha);
            double s = Math.sin(alpha);
            for (int i = 0; i < n; i++) {
                double v = basis.x[i];
                for (int q = 0; q < d.length; q++) {
                    if (basis.control[q] != null) {
                        v += d[q] * basis.control[q][i];
                    }
                }
                g[i] = c * v + s * basis.z[i];
            }
            p = new Point(alpha, new Solution(lattice, ref, alpha, d, Arrays.copyOf(g, n)).coefficients());
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

    /** Lift slope (per rad) and zero-lift angle (rad), as {@code WingAnalysis.liftLine} computes them. */
    private static double[] liftLine(Lattice lattice, Basis basis, double[] d, double area) {
        double x = 0;
        double z = 0;
        int n = lattice.panelCount();
        for (int i = 0; i < n; i++) {
            double ly = lattice.by(i) - lattice.ay(i);
            double gx = basis.x[i];
            for (int c = 0; c < d.length; c++) {
                if (basis.control[c] != null) {
                    gx += d[c] * basis.control[c][i];
                }
            }
            x += 2 * gx * ly;
            z += 2 * basis.z[i] * ly;
        }
        return new double[] {Math.hypot(x, z) / area, Math.atan2(-x, z)};
    }

    /** Basis circulations of one case; a control row is null when every configuration leaves it at 0. */
    private static final class Basis {
        final double[] x;
        final double[] z;
        final double[][] control;
        final double[] work;

        Basis(int n, int controls) {
            x = new double[n];
            z = new double[n];
            control = new double[controls][];
            work = new double[n];
        }
    }

    private Basis basis(Lattice lattice, List<ControlSurface> controls, double[] asked, double[] flapped) {
        int n = lattice.panelCount();
        Basis out = new Basis(n, controls.size());
        double[] rhsX = new double[n];
        double[] rhsZ = new double[n];
        for (int i = 0; i < n; i++) {
            rhsX[i] = -lattice.nx(i) - lattice.incidence(i);
            rhsZ[i] = -lattice.nz(i);
        }
        Systems sys = systems(lattice);
        boolean halves = lattice.mirrored();
        if (halves && sys.symmetric == null) {
            sys.symmetric = InfluenceSystem.of(lattice, Symmetry.SYMMETRIC);
        } else if (!halves && sys.full == null) {
            sys.full = InfluenceSystem.of(lattice, Symmetry.FULL);
        }
        solve(lattice, halves ? sys.symmetric : sys.full, rhsX, out.x, 1);
        solve(lattice, halves ? sys.symmetric : sys.full, rhsZ, out.z, 1);
        for (int c = 0; c < controls.size(); c++) {
            if (asked[c] == 0 && (flapped == null || flapped[c] == 0)) {
                continue;
            }
            double[] rhs = new double[n];
            for (int i = 0; i < n; i++) {
                if (lattice.controlOf(i) == c) {
                    rhs[i] = -lattice.controlSign(i);
                }
            }
            boolean aileron = controls.get(c).kind() == ControlKind.AILERON;
            InfluenceSystem s;
            if (!halves) {
                s = sys.full;
            } else if (aileron) {
                if (sys.antisymmetric == null) {
                    sys.antisymmetric = InfluenceSystem.of(lattice, Symmetry.ANTISYMMETRIC);
                }
                s = sys.antisymmetric;
            } else {
                s = sys.symmetric;
            }
            out.control[c] = new double[n];
            solve(lattice, s, rhs, out.control[c], halves && aileron ? -1 : 1);
        }
        return out;
    }

    /** Solves one right-hand side; on half-span systems fills the left half as the mirror, with the sign. */
    private static void solve(Lattice lattice, InfluenceSystem system, double[] rhs, double[] out, double sign) {
        if (system.symmetry() == Symmetry.FULL) {
            system.solve(rhs, out);
            return;
        }
        int half = lattice.halfCount();
        double[] right = new double[half];
        system.solve(rhs, right);
        for (int i = 0; i < half; i++) {
            out[i] = right[i];
            out[i + half] = sign * right[i];
        }
    }

    /** The cached systems of this lattice's geometry, or a new empty entry. */
    private Systems systems(Lattice lattice) {
        int n = lattice.panelCount();
        int size = 13 * n + 2;
        if (key.length != size) {
            key = new double[size];
        }
        int k = 0;
        key[k++] = n;
        key[k++] = lattice.mirrored() ? lattice.halfCount() : -1;
        for (int i = 0; i < n; i++) {
            key[k++] = lattice.ax(i);
            key[k++] = lattice.ay(i);
            key[k++] = lattice.az(i);
            key[k++] = lattice.bx(i);
            key[k++] = lattice.by(i);
            key[k++] = lattice.bz(i);
            key[k++] = lattice.cx(i);
            key[k++] = lattice.cy(i);
            key[k++] = lattice.cz(i);
            key[k++] = lattice.nx(i);
            key[k++] = lattice.ny(i);
            key[k++] = lattice.nz(i);
            key[k++] = lattice.cutoff(i);
        }
        for (Iterator<Systems> it = cache.iterator(); it.hasNext();) {
            Systems s = it.next();
            if (Arrays.equals(s.key, key)) {
                it.remove();
                cache.addFirst(s);
                reuses++;
                return s;
            }
        }
        factorizations++;
        Systems s = new Systems(key.clone());
        cache.addFirst(s);
        while (cache.size() > CACHE_SIZE) {
            cache.removeLast();
        }
        return s;
    }
}
