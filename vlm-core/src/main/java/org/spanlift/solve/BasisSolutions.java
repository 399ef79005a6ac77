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
     * Solves the basis conditions, with symmetric and antisymmetric half-span systems when the lattice is
     * mirrored and {@code useSymmetry} is set, otherwise with the full system.
     */
    public static BasisSolutions solve(Lattice lattice, List<ControlSurface> controlList, boolean useSymmetry) {
        int n = lattice.panelCount();
        double[][] controlRhs = new double[controlList.size()][n];
        double[] rhsX = new double[n];
        double[] rhsZ = new double[n];
        for (int i = 0; i < n; i++) {
            rhsX[i] = -lattice.nx(i) - lattice.incidence(i);
            rhsZ[i] = -lattice.nz(i);
            int c = lattice.controlOf(i);
            if (c >= 0) {
                controlRhs[c][i] = -lattice.controlSign(i);
            }
        }
        double[][] controlSolutions = new double[controlList.size()][];
        if (useSymmetry && lattice.mirrored()) {
            boolean anyAileron = controlList.stream().anyMatch(c -> c.kind() == ControlKind.AILERON);
            InfluenceSystem symmetric;
            InfluenceSystem antisymmetric = null;
            if (anyAileron) {
                InfluenceSystem.Pair pair = InfluenceSystem.pair(lattice);
                symmetric = pair.symmetric();
                antisymmetric = pair.antisymmetric();
            } else {
                symmetric = InfluenceSystem.of(lattice, Symmetry.SYMMETRIC);
            }
            double[] x = expand(lattice, symmetric, rhsX, 1);
            double[] z = expand(lattice, symmetric, rhsZ, 1);
            for (int c = 0; c < controlList.size(); c++) {
                boolean aileron = controlList.get(c).kind() == ControlKind.AILERON;
                controlSolutions[c] = aileron ? expand(lattice, antisymmetric, controlRhs[c], -1)
                        : expand(lattice, symmetric, controlRhs[c], 1);
            }
            return new BasisSolutions(x, z, controlSolutions);
        }
        InfluenceSystem full = InfluenceSystem.of(lattice, Symmetry.FULL);
        double[] x = new double[n];
        double[] z = new double[n];
        full.solve(rhsX, x);
        full.solve(rhsZ, z);
        for (int c = 0; c < controlList.size(); c++) {
            controlSolutions[c] = new double[n];
            full.solve(controlRhs[c], controlSolutions[c]);
        }
        return new BasisSolutions(x, z, controlSolutions);
    }

    /** Solves on the right half and fills the left half as its mirror, with the given sign. */
    private static double[] expand(Lattice lattice, InfluenceSystem system, double[] rhs, double sign) {
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
        double c = Math.cos(alpha);
        double s = Math.sin(alpha);
        for (int i = 0; i < out.length; i++) {
            double g = alongX[i];
            for (int k = 0; k < controls.length; k++) {
                g += deflections[k] * controls[k][i];
            }
            out[i] = c * g + s * alongZ[i];
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

    /** The circulation per unit speed per radian of control {@code c} at unit freestream along +x. */
    public double control(int c, int panel) {
        return controls[c][panel];
    }

    public int controlCount() {
        return controls.length;
    }
}
