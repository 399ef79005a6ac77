/**
 * An independent nonlinear lifting-line check: Glauert's sine series with nonlinear section lift curves,
 * in the manner of Sivells and Neely (NACA TN 1269, 1947; NACA Report 865), for straight wings under
 * symmetric loading, to estimate the maximum lift coefficient from section data.
 *
 * <p>What was read of the sources: of NACA TN 1269 only the title page and the summary could be read
 * (the stored copies stop there), which say that the method obtains the induced angle from the spanwise
 * lift distribution with Multhopp's multipliers, at ten stations on the half span for symmetric loads,
 * and that wing characteristics calculated from nonlinear section data agree much better with
 * experiment near the maximum lift coefficient than those calculated from linear data. Its worked
 * examples and its comparisons with tunnel tests could not be read, so none is reproduced here. Of NACA
 * Report 1090 (Sivells and Westrick, 1952, the extension to flaps and ailerons) only the abstract.
 *
 * <p>The classes: {@link org.spanlift.validation.nonlinear.SectionLiftCurve} (section data),
 * {@link org.spanlift.validation.nonlinear.NonlinearWing} (planform and sections),
 * {@link org.spanlift.validation.nonlinear.NonlinearLiftingLineSolver} (one angle, the search for
 * CL_max, and the upward and downward sweep).
 */
package org.spanlift.validation.nonlinear;
