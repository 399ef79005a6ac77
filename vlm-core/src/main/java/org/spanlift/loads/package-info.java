/**
 * Spanwise structural loads for spar sizing: the wing's structure (spar line, distributed and point
 * masses), load cases (given, or the corner points of a manoeuvre and gust envelope), and shear, bending
 * and torsion at the strip edges of each half-wing from the panel forces less the inertia relief.
 *
 * <p>Sign conventions (right half, y toward the tip; the left half is its mirror image):
 * <ul>
 * <li>Every value at a station is the resultant of everything outboard of it (aerodynamic panel forces and
 * the inertia of the masses there), the load the outboard part puts on the inboard part.</li>
 * <li>Axes at a station: {@code e_s} along the spar line, outboard; {@code n} normal to the wing plane
 * (the plane through the spar line and the x axis), upward; {@code e_t = e_s x n}, in the wing plane
 * normal to the spar, aft.</li>
 * <li>Shear: the outboard resultant force along {@code n}, positive up.</li>
 * <li>Bending: the outboard resultant moment about the spar point, component along {@code e_t}; positive
 * when the outboard part is loaded upward (up-bending, upper spar cap in compression).</li>
 * <li>Torsion: the component along {@code e_s}; positive nose-up.</li>
 * <li>Chord shear and chord bending (in the wing plane): the force along {@code e_t}, positive aft, and
 * minus the moment component along {@code n}, positive when the outboard chordwise load is aft.</li>
 * </ul>
 * SI throughout: N, N m, m, kg.
 */
package org.spanlift.loads;
