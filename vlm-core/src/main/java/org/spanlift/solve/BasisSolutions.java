package org.spanlift.solve;

import java.util.List;

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
    private final double[][] controls;

    private BasisSolutions(double[] alongX, double[] alongZ, double[][] controls) {
        this.alongX = alongX;
        this.alongZ = alongZ;
        this.controls = controls;
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
        boolean aileronNeeded = false;
        for (int c = 0; c < controlList.size(); c++) {
            aileronNeeded |= needed[c] && controlList.get(c).kind() == ControlKind.AILERON;
        }
        if (halves && aileronNeeded) {
            systems.antisymmetric(); // builds both half-span systems in one assembly pass
        }
        InfluenceSystem main = halves ? systems.symmetric() : systems.full();
        double[] x = expand(lattice, main, rhsX, 1);
        double[] z = expand(lattice, main, rhsZ, 1);
        double[][] controlSolutions = new double[controlList.size()][];
        for (int c = 0; c < controlList.size(); c++) {
            if (!needed[c]) {
                continue;
            }
            double[] rhs = new double[n];
            for (int i = 0; i < n; i++) {
                if (lattice.controlOf(i) == c) {
                    rhs[i] = -lattice.controlSign(i);
                }
            }
            boolean aileron = controlList.get(c).kind() == ControlKind.AILERON;
            controlSolutions[c] = halves && aileron ? expand(lattice, systems.antisymmetric(), rhs, -1)
                    : expand(lattice, main, rhs, 1);
        }
        return new BasisSolutions(x, z, controlSolutions);
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
        for (int i = 0; i < out.length; i++) {
            out[i] = c * alongX(i, deflections) + s * alongZ[i];
        }
    }

    /**
     * The circulation per unit speed for unit freestream along +x with the given deflections (rad): the x
     * basis plus each deflected control's.
     */
    public double alongX(int panel, double[] deflections) {
        double g = alongX[panel];
        for (int k = 0; k < controls.length; k++) {
            if (deflections[k] != 0) {
                g += deflections[k] * controls[k][panel];
            }
        }
        return g;
    }

    /** Refuses a deflection of a control that was solved without its basis. */
    public void checkDeflections(double[] deflections) {
        if (deflections.length != controls.length) {
            throw new IllegalArgumentException("expected " + controls.length + " deflections, got "
                    + deflections.length);
        }
        for (int k = 0; k < controls.length; k++) {
            if (deflections[k] != 0 && controls[k] == null) {
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
        return controls[c] == null ? 0 : controls[c][panel];
    }
}
