/**
 * Section geometry: camber (mean) lines and their thin-airfoil results.
 *
 * <p>A {@link org.spanlift.section.CamberLine} gives the mean-line ordinate {@code z(x)} and slope
 * {@code dz/dx} over the chord, with x the chord fraction from 0 at the leading edge to 1 at the trailing
 * edge and z in chords. The vortex-lattice engine evaluates {@code slope(x)} at each panel's control point;
 * analytic lines evaluate it exactly in a few floating-point operations.
 *
 * <p>Lines available:
 * <ul>
 *   <li>{@link org.spanlift.section.FlatPlate}: z = 0;</li>
 *   <li>{@link org.spanlift.section.NacaFourDigit}: the NACA four-digit mean line (Jacobs, Ward and
 *       Pinkerton, NACA Report 460, 1933; Abbott and von Doenhoff, Theory of Wing Sections, 1959,
 *       section 6.4), including the symmetric 00xx sections;</li>
 *   <li>{@link org.spanlift.section.NacaFiveDigit}: the non-reflexed mean lines 210 to 250 of the NACA
 *       five-digit 230-series family (Jacobs and Pinkerton, NACA Report 537; constants from the table of
 *       mean-line constants in Abbott and von Doenhoff, section 6.4);</li>
 *   <li>{@link org.spanlift.section.CoordinateMeanLine}: the mean line extracted from a plain two-column
 *       x/y coordinate file of an airfoil.</li>
 * </ul>
 *
 * <p>{@link org.spanlift.section.CamberLines} parses designations and reads coordinate files;
 * {@link org.spanlift.section.ThinAirfoil} gives the zero-lift angle, the quarter-chord moment and the
 * ideal angle with its lift coefficient; {@link org.spanlift.section.SectionCoordinates} builds NACA
 * section contours (thickness laid normal to the mean line); {@link org.spanlift.section.PlainFlap} corrects
 * a plain flap's thin-airfoil lift for viscous losses and large deflections and gives its cl_max increment
 * (handbook method; its tabulated values are recalled, not read, as its notes say).
 */
package org.spanlift.section;
