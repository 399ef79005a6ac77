package org.spanlift.results;

/**
 * Kutta-Joukowski force on each panel's bound leg over dynamic pressure, F/q = 2 (Gamma/V) (V/|V| x l),
 * in m^2, and its point of action (the bound leg's midpoint), m, wing axes. Index i is panel i of the
 * lattice (both halves). Multiply by q for newtons.
 */
public record PanelForces(double[] fx, double[] fy, double[] fz, double[] x, double[] y, double[] z) {
}
