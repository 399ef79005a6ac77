package org.spanlift.solve;

import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.Vec3;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;
import org.spanlift.results.Solution;

/**
 * One wing, discretized and solved once: its lattice and basis solutions, from which any angle of attack
 * and control deflection follows by superposition. This is the library's entry point:
 *
 * <pre>
 * WingAnalysis analysis = WingAnalysis.of(wing);
 * Solution s = analysis.solve(Math.toRadians(4));
 * double cl = s.coefficients().lift();
 * </pre>
 *
 * Safe to share between threads once built (the strip bases it solves on demand are kept under a lock).
 */
public final class WingAnalysis {

    private final Wing wing;
    private final Lattice lattice;
    private final BasisSolutions basis;
    private final List<ControlSurface> controls;
    private final InfluenceCache.Systems systems;
    private final boolean halves;
    private final Map<StripKey, StripBasis> stripBases = new HashMap<>();

    private WingAnalysis(Wing wing, Lattice lattice, BasisSolutions basis, InfluenceCache.Systems systems,
            boolean halves) {
        this.wing = wing;
        this.lattice = lattice;
        this.basis = basis;
        this.controls = wing.controls();
        this.systems = systems;
        this.halves = halves;
    }

    private record StripKey(List<Integer> strips, boolean symmetric) {
    }

    /** Builds the lattice and solves the basis, with half-span symmetric systems where the wing allows. */
    public static WingAnalysis of(Wing wing) {
        return of(wing, true);
    }

    /**
     * As {@link #of(Wing)}; with {@code useSymmetry} false every panel is an unknown of one full-span
     * system (slower; for checks).
     */
    public static WingAnalysis of(Wing wing, boolean useSymmetry) {
        Lattice lattice = LatticeBuilder.build(wing);
        boolean[] all = new boolean[wing.controls().size()];
        Arrays.fill(all, true);
        InfluenceCache.Systems systems = InfluenceCache.single().systems(lattice);
        return new WingAnalysis(wing, lattice,
                BasisSolutions.solve(lattice, wing.controls(), systems, useSymmetry, all), systems,
                useSymmetry && lattice.mirrored());
    }

    /**
     * For many similar wings (sweeps): reuses the cache's factorization when the lattice geometry was seen
     * before, and solves the basis only of the controls deflected in some of the given deflection sets
     * (rad, control order); the others must stay at zero in later solves.
     */
    public static WingAnalysis of(Wing wing, InfluenceCache cache, double[]... deflectionSets) {
        Lattice lattice = LatticeBuilder.build(wing);
        int n = wing.controls().size();
        boolean[] needed = new boolean[n];
        for (double[] set : deflectionSets) {
            for (int c = 0; c < n; c++) {
                needed[c] |= set[c] != 0;
            }
        }
        InfluenceCache.Systems systems = cache.systems(lattice);
        for (int c = 0; c < n; c++) {
            if (needed[c] && lattice.mirrored() && wing.controls().get(c).kind() == ControlKind.AILERON) {
                systems.antisymmetric(); // an aileron will be deflected: both half-span systems in one pass
                break;
            }
        }
        return new WingAnalysis(wing, lattice, BasisSolutions.solve(lattice, wing.controls(), systems, true, needed),
                systems, lattice.mirrored());
    }

    /** The wing analysed. */
    public Wing wing() {
        return wing;
    }

    /** The wing's lattice. */
    public Lattice lattice() {
        return lattice;
    }

    /** The basis solutions every condition is superposed from. */
    public BasisSolutions basis() {
        return basis;
    }

    /**
     * The incidence-correction basis of the given strips, solved on the factorization of this wing's
     * systems on first use and kept.
     *
     * @param strips    lattice strip indices; right-half strips only when {@code symmetric}
     * @param symmetric each correction mirrored (a symmetric condition of a mirrored wing)
     */
    public StripBasis stripBasis(List<Integer> strips, boolean symmetric) {
        StripKey key = new StripKey(List.copyOf(strips), symmetric);
        synchronized (systems) {
            return stripBases.computeIfAbsent(key,
                    k -> StripBasis.solve(lattice, systems, halves, k.strips(), k.symmetric()));
        }
    }

    /**
     * The circulation per unit speed (m, every panel) of a steady nose-up pitch rate q about {@code centre} (m,
     * wing axes), per unit of q/V (1/m), with no angle of attack, incidence or deflection: the air meets each
     * control point at (-(z - z_c), 0, x - x_c) q, so the right-hand side is (z - z_c) n_x - (x - x_c) n_z. The
     * rotation is symmetric, so a mirrored wing solves it on its symmetric system. The wake stays along +x
     * (linear theory).
     */
    public double[] pitchRateCirculation(Vec3 centre) {
        int n = lattice.panelCount();
        double[] rhs = new double[n];
        for (int i = 0; i < n; i++) {
            rhs[i] = (lattice.cz(i) - centre.z()) * lattice.nx(i) - (lattice.cx(i) - centre.x()) * lattice.nz(i);
        }
        synchronized (systems) {
            InfluenceSystem main = halves ? systems.symmetric() : systems.full();
            return BasisSolutions.expand(lattice, main, rhs, 1);
        }
    }

    /** The control deflections of the wing file, rad, in control order. */
    public double[] fileDeflections() {
        return controls.stream().mapToDouble(ControlSurface::deflection).toArray();
    }

    /**
     * The file's deflections with some replaced, rad, in control order.
     *
     * @throws IllegalArgumentException naming a control the wing does not have
     */
    public double[] deflections(Map<String, Double> overrides) {
        double[] d = fileDeflections();
        for (Map.Entry<String, Double> e : overrides.entrySet()) {
            int index = controlIndex(e.getKey());
            d[index] = e.getValue();
        }
        return d;
    }

    /** Index of a control by name. */
    public int controlIndex(String name) {
        for (int i = 0; i < controls.size(); i++) {
            if (controls.get(i).name().equals(name)) {
                return i;
            }
        }
        throw new IllegalArgumentException("no control named '" + name + "'; the wing has "
                + (controls.isEmpty() ? "none" : String.join(", ", controls.stream().map(ControlSurface::name)
                        .toList())));
    }

    /** The condition at angle of attack {@code alpha} (rad) with the file's deflections. */
    public Solution solve(double alpha) {
        return solve(alpha, fileDeflections());
    }

    /** The condition at angle of attack {@code alpha} (rad) with deflections in rad, in control order. */
    public Solution solve(double alpha, double[] deflections) {
        double[] g = new double[lattice.panelCount()];
        basis.combine(alpha, deflections, g);
        return new Solution(lattice, wing.reference(), alpha, deflections, g);
    }

    /**
     * The lift line of the wing at the given deflections: CL(alpha) = R sin(alpha - alpha0) exactly, with
     * the freestream (cos alpha, 0, sin alpha).
     */
    public LiftCurve liftCurve(double[] deflections) {
        double x = 0;
        double z = 0;
        double s = wing.reference().area();
        int n = lattice.panelCount();
        basis.checkDeflections(deflections);
        for (int i = 0; i < n; i++) {
            double ly = lattice.by(i) - lattice.ay(i);
            x += 2 * basis.alongX(i, deflections) * ly;
            z += 2 * basis.alongZ(i) * ly;
        }
        return new LiftCurve(Math.hypot(x, z) / s, Math.atan2(-x, z));
    }
}
