package org.spanlift.results;

/**
 * Kutta-Joukowski force on each panel's bound leg over dynamic pressure, F/q = 2 (Gamma/V) (V/|V| x l),
 * in m^2, and its point of action (the bound leg's midpoint), m, wing axes. Index i is panel i of the
 * lattice (both halves). Multiply by q for newtons. Immutable: the arrays are copied on the way in and
 * every array accessor returns a copy; the indexed accessors read one panel without copying.
 */
public record PanelForces(double[] fx, double[] fy, double[] fz, double[] x, double[] y, double[] z) {

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

    @Override
    public double[] fx() {
        return fx.clone();
    }

    @Override
    public double[] fy() {
        return fy.clone();
    }

    @Override
    public double[] fz() {
        return fz.clone();
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    @Override
    public double[] z() {
        return z.clone();
    }

    public double fx(int panel) {
        return fx[panel];
    }

    public double fy(int panel) {
        return fy[panel];
    }

    public double fz(int panel) {
        return fz[panel];
    }

    public double x(int panel) {
        return x[panel];
    }

    public double y(int panel) {
        return y[panel];
    }

    public double z(int panel) {
        return z[panel];
    }
}
