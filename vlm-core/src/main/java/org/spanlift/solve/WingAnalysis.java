package org.spanlift.solve;

import java.util.List;
import java.util.Map;

import org.spanlift.geometry.ControlSurface;
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
 * Immutable and safe to share between threads once built.
 */
public final class WingAnalysis {

    private final Wing wing;
    private final Lattice lattice;
    private final BasisSolutions basis;
    private final List<ControlSurface> controls;

    private WingAnalysis(Wing wing, Lattice lattice, BasisSolutions basis) {
        this.wing = wing;
        this.lattice = lattice;
        this.basis = basis;
        this.controls = wing.controls();
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
        return new WingAnalysis(wing, lattice, BasisSolutions.solve(lattice, wing.controls(), useSymmetry));
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
        return new WingAnalysis(wing, lattice,
                BasisSolutions.solve(lattice, wing.controls(), cache.systems(lattice), true, needed));
    }

    public Wing wing() {
        return wing;
    }

    public Lattice lattice() {
        return lattice;
    }

    public BasisSolutions basis() {
        return basis;
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
                + (controls.isEmpty() ? "none" : String.join(", ", controls.stream().map(ControlSurface::name).toList())));
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
