package org.spanlift.solve;

import java.util.List;
import java.util.concurrent.atomic.AtomicReferenceArray;
import java.util.function.IntFunction;

import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.lattice.Lattice;

/**
 * Circulations (per unit freestream speed, so in metres) of every panel of the lattice, both halves, for
 * the basis conditions: unit freestream along +x with the panels' incidence (twist, camber, section
 * correction), unit freestream along +z, and each control at one radian with unit freestream along +x.
 * Any condition is their combination:
 *
 * <pre>Gamma / V = cos(alpha) (x + sum_c delta_c control_c) + sin(alpha) z</pre>
 *
 * with the freestream V (cos alpha, 0, sin alpha); exact in linear theory, since every panel's chordwise
 * vector t is +x and the boundary condition is (V + v) . n = -eps V . t.
 */
public final class BasisSolutions {

    private final double[] alongX;
    private final double[] alongZ;
    /** Each control's solution, or null until it is first needed (an aileron's) or when it has no basis. */
    private final AtomicReferenceArray<double[]> controls;
    /** Whether each control has a basis. */
    private final boolean[] solved;
    /** Solves an aileron's basis on first use; null when no control was left for later. */
    private final IntFunction<double[]> later;

    private BasisSolutions(double[] alongX, double[] alongZ, double[][] controls, boolean[] solved,
            IntFunction<double[]> later) {
        this.alongX = alongX;
        this.alongZ = alongZ;
        this.controls = new AtomicReferenceArray<>(controls);
        this.solved = solved;
        this.later = later;
    }

    /**
     * Solves the basis conditions with the given (possibly cached) systems, for the controls marked
     * {@code needed} only; the others have no basis and must stay at zero deflection.
     */
    public static BasisSolutions solve(Lattice lattice, List<ControlSurface> controlList,
            InfluenceCache.Systems systems, boolean useSymmetry, boolean[] needed) {
        int n = lattice.panelCount();
        double[] rhsX = new double[n];
        double[] rhsZ = new double[n];
        for (int i = 0; i < n; i++) {
            rhsX[i] = -lattice.nx(i) - lattice.incidence(i);
            rhsZ[i] = -lattice.nz(i);
        }
        boolean halves = useSymmetry && lattice.mirrored();
        InfluenceSystem main = halves ? systems.symmetric() : systems.full();
        double[] x = expand(lattice, main, rhsX, 1);
        double[] z = expand(lattice, main, rhsZ, 1);
        double[][] controlSolutions = new double[controlList.size()][];
        boolean[] solved = needed.clone();
        boolean anyLater = false;
        for (int c = 0; c < controlList.size(); c++) {
            boolean aileron = controlList.get(c).kind() == ControlKind.AILERON;
            if (needed[c] && !(halves && aileron)) {
                controlSolutions[c] = expand(lattice, main, controlRhs(lattice, c), 1);
            }
            anyLater |= needed[c] && halves && aileron;
        }
        // An aileron's basis needs the antisymmetric system, a second factorization: it is solved when a
        // deflection first asks for it, so a run that never deflects an aileron never factorizes that system.
        IntFunction<double[]> later = anyLater
                ? c -> expand(lattice, systems.antisymmetric(), controlRhs(lattice, c), -1) : null;
        return new BasisSolutions(x, z, controlSolutions, solved, later);
    }

    /** The right-hand side of control {@code c}'s basis: its panels turned by one radian. */
    private static double[] controlRhs(Lattice lattice, int c) {
        int n = lattice.panelCount();
        double[] rhs = new double[n];
        for (int i = 0; i < n; i++) {
            if (lattice.controlOf(i) == c) {
                rhs[i] = -lattice.controlSign(i);
            }
        }
        return rhs;
    }

    /** Control {@code c}'s solution, solved now if it was left for later; null when it has no basis. */
    private double[] controlSolution(int c) {
        double[] s = controls.get(c);
        if (s != null || !solved[c]) {
            return s;
        }
        synchronized (this) {
            s = controls.get(c);
            if (s == null) {
                s = later.apply(c);
                controls.set(c, s);
            }
            return s;
        }
    }

    /**
     * Solves one right-hand side; on a half-span system fills the left half as the mirror of the right,
     * with the given sign.
     */
    static double[] expand(Lattice lattice, InfluenceSystem system, double[] rhs, double sign) {
        if (system.symmetry() == Symmetry.FULL) {
            double[] all = new double[lattice.panelCount()];
            system.solve(rhs, all);
            return all;
        }
        int half = lattice.halfCount();
        double[] right = new double[half];
        system.solve(rhs, right);
        double[] all = new double[2 * half];
        for (int i = 0; i < half; i++) {
            all[i] = right[i];
            all[i + half] = sign * right[i];
        }
        return all;
    }

    /**
     * Writes into {@code out} (length panel count, overwritten) the circulation per unit speed at angle of
     * attack {@code alpha} (rad) and control deflections {@code deflections} (rad, in control order).
     */
    public void combine(double alpha, double[] deflections, double[] out) {
        checkDeflections(deflections);
        double c = Math.cos(alpha);
        double s = Math.sin(alpha);
        double[][] deflected = deflectedSolutions(deflections);
        for (int i = 0; i < out.length; i++) {
            double g = alongX[i];
            for (int k = 0; k < deflected.length; k++) {
                if (deflections[k] != 0) {
                    g += deflections[k] * deflected[k][i];
                }
            }
            out[i] = c * g + s * alongZ[i];
        }
    }

    /** The solutions of the deflected controls (null for the others), solving any left for later. */
    private double[][] deflectedSolutions(double[] deflections) {
        double[][] deflected = new double[deflections.length][];
        for (int k = 0; k < deflections.length; k++) {
            if (deflections[k] != 0) {
                deflected[k] = controlSolution(k);
            }
        }
        return deflected;
    }

    /**
     * The circulation per unit speed for unit freestream along +x with the given deflections (rad): the x
     * basis plus each deflected control's.
     */
    public double alongX(int panel, double[] deflections) {
        double g = alongX[panel];
        for (int k = 0; k < deflections.length; k++) {
            if (deflections[k] != 0) {
                g += deflections[k] * controlSolution(k)[panel];
            }
        }
        return g;
    }

    /** Refuses a deflection of a control that was solved without its basis. */
    public void checkDeflections(double[] deflections) {
        if (deflections.length != solved.length) {
            throw new IllegalArgumentException("expected " + solved.length + " deflections, got "
                    + deflections.length);
        }
        for (int k = 0; k < solved.length; k++) {
            if (deflections[k] != 0 && !solved[k]) {
                throw new IllegalStateException("control " + k + " was solved without its basis");
            }
        }
    }

    /** The circulation per unit speed for unit freestream along +x, incidence included (read-only view). */
    public double alongX(int panel) {
        return alongX[panel];
    }

    /** The circulation per unit speed for unit freestream along +z. */
    public double alongZ(int panel) {
        return alongZ[panel];
    }

    /**
     * The circulation per unit speed per radian of control {@code c} at unit freestream along +x (zero for
     * a control solved without its basis).
     */
    public double control(int c, int panel) {
        double[] s = controlSolution(c);
        return s == null ? 0 : s[panel];
    }
}
