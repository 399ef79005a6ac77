package org.spanlift.solve;

import java.util.ArrayList;
import java.util.List;

import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;
import org.spanlift.lattice.Strip;

/**
 * The downwash that the other surfaces of a wing (the wing's wake) cause at one surface, the tail: its mean
 * downwash angle epsilon and its gradient d epsilon / d alpha, both over the tail's area.
 *
 * <p>Method: the tail is removed and the other surfaces are solved alone (file deflections of their
 * controls); their {@link InducedVelocity} gives epsilon (as defined there: alpha - atan2(sin alpha + v_z,
 * cos alpha + v_x), rad, positive with the flow turned down) at every control point of the tail's lattice
 * (the panels' three-quarter-chord points, both halves), and d epsilon / d alpha exactly from the basis
 * solutions (the circulation is cos alpha X + sin alpha Z). Weighting: each control point by its panel's
 * area (strip width in the y-z plane times the panel's chordwise length), so the result is the area mean
 * over the tail. The three-quarter-chord point is where a chordwise-linear change of angle acts on a
 * thin section's lift, so a panel's value stands for its whole chord. The tail's own load, and the tail's
 * effect on the wing, are left out by construction.
 *
 * @param angle    area-mean downwash angle at the tail, rad
 * @param gradient area-mean d epsilon / d alpha at the tail
 */
public record TailDownwash(double angle, double gradient) {

    /** At zero angle of attack. */
    public static TailDownwash of(Wing wing, int tail) {
        return of(wing, tail, 0);
    }

    /**
     * At angle of attack {@code alpha} (rad, freestream V (cos alpha, 0, sin alpha)).
     *
     * @param wing a wing of two or more surfaces
     * @param tail index of the tail surface in {@code wing.surfaces()}
     */
    public static TailDownwash of(Wing wing, int tail, double alpha) {
        List<Surface> surfaces = wing.surfaces();
        if (surfaces.size() < 2) {
            throw new IllegalArgumentException("the downwash at a tail needs a wing of two or more surfaces");
        }
        if (tail < 0 || tail >= surfaces.size()) {
            throw new IllegalArgumentException("no surface " + tail + "; the wing has " + surfaces.size());
        }
        List<Surface> others = new ArrayList<>(surfaces);
        others.remove(tail);
        Wing alone = new Wing(wing.name(), wing.displayUnit(), wing.reference(), others, wing.sections());
        WingAnalysis analysis = WingAnalysis.of(alone);
        Lattice wake = analysis.lattice();
        double[] deflections = analysis.fileDeflections();
        int n = wake.panelCount();
        double[] x = new double[n];
        double[] z = new double[n];
        for (int j = 0; j < n; j++) {
            x[j] = analysis.basis().alongX(j, deflections);
            z[j] = analysis.basis().alongZ(j);
        }
        InducedVelocity fieldX = new InducedVelocity(wake, x);
        InducedVelocity fieldZ = new InducedVelocity(wake, z);

        Lattice whole = LatticeBuilder.build(wing);
        double c = Math.cos(alpha);
        double s = Math.sin(alpha);
        double[] vx = new double[3];
        double[] vz = new double[3];
        double area = 0;
        double angle = 0;
        double gradient = 0;
        for (int j = 0; j < whole.panelCount(); j++) {
            Strip strip = whole.strips().get(whole.stripOf(j));
            if (strip.surface() != tail) {
                continue;
            }
            double px = whole.cx(j);
            double py = whole.cy(j);
            double pz = whole.cz(j);
            fieldX.at(px, py, pz, vx);
            fieldZ.at(px, py, pz, vz);
            // v = c vX + s vZ and its derivative v' = -s vX + c vZ; the flow angle theta = atan2(Ny, Nx)
            double nx = c + c * vx[0] + s * vz[0];
            double ny = s + c * vx[2] + s * vz[2];
            double dnx = -s - s * vx[0] + c * vz[0];
            double dny = c - s * vx[2] + c * vz[2];
            double theta = Math.atan2(ny, nx);
            double dTheta = (nx * dny - ny * dnx) / (nx * nx + ny * ny);
            double weight = strip.width() * chordwiseLength(whole, j);
            area += weight;
            angle += weight * (alpha - theta);
            gradient += weight * (1 - dTheta);
        }
        return new TailDownwash(angle / area, gradient / area);
    }

    /**
     * The chordwise length of panel j, m: twice the distance along x from its bound leg (a quarter of the
     * panel aft of its leading edge) to its control point (three quarters), the bound leg's x taken at the
     * control point's y.
     */
    private static double chordwiseLength(Lattice lattice, int j) {
        double f = (lattice.cy(j) - lattice.ay(j)) / (lattice.by(j) - lattice.ay(j));
        double boundX = lattice.ax(j) + f * (lattice.bx(j) - lattice.ax(j));
        return 2 * (lattice.cx(j) - boundX);
    }
}
