package org.spanlift.results;

/**
 * Kutta-Joukowski force on each panel's bound leg over dynamic pressure, F/q = 2 (Gamma/V) (V/|V| x l),
 * in m^2, and its point of action (the bound leg's midpoint), m, wing axes. Index i is panel i of the
 * lattice (both halves). Multiply by q for newtons. Immutable: the arrays are copied on the way in and
 * every array accessor returns a copy; the indexed accessors read one panel without copying.
 *
 * @param fx x components of F/q (aft), m^2
 * @param fy y components of F/q (toward the right tip), m^2
 * @param fz z components of F/q (up), m^2
 * @param x  x of the points of action, m
 * @param y  y of the points of action, m
 * @param z  z of the points of action, m
 */
public record PanelForces(double[] fx, double[] fy, double[] fz, double[] x, double[] y, double[] z) {

    /** Checks that the arrays share one length and copies them. */
    public PanelForces {
        int n = fx.length;
        if (fy.length != n || fz.length != n || x.length != n || y.length != n || z.length != n) {
            throw new IllegalArgumentException("panel-force arrays differ in length");
        }
        fx = fx.clone();
        fy = fy.clone();
        fz = fz.clone();
        x = x.clone();
        y = y.clone();
        z = z.clone();
    }

    /** A copy of the x components of F/q, m^2. */
    @Override
    public double[] fx() {
        return fx.clone();
    }

    /** A copy of the y components of F/q, m^2. */
    @Override
    public double[] fy() {
        return fy.clone();
    }

    /** A copy of the z components of F/q, m^2. */
    @Override
    public double[] fz() {
        return fz.clone();
    }

    /** A copy of the x of the points of action, m. */
    @Override
    public double[] x() {
        return x.clone();
    }

    /** A copy of the y of the points of action, m. */
    @Override
    public double[] y() {
        return y.clone();
    }

    /** A copy of the z of the points of action, m. */
    @Override
    public double[] z() {
        return z.clone();
    }

    /** The x component of the panel's F/q, m^2. */
    public double fx(int panel) {
        return fx[panel];
    }

    /** The y component of the panel's F/q, m^2. */
    public double fy(int panel) {
        return fy[panel];
    }

    /** The z component of the panel's F/q, m^2. */
    public double fz(int panel) {
        return fz[panel];
    }

    /** The x of the panel's point of action, m. */
    public double x(int panel) {
        return x[panel];
    }

    /** The y of the panel's point of action, m. */
    public double y(int panel) {
        return y[panel];
    }

    /** The z of the panel's point of action, m. */
    public double z(int panel) {
        return z[panel];
    }
}
