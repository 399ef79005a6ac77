package org.spanlift.vocabulary;

import org.spanlift.geometry.Surface;
import org.spanlift.geometry.SurfaceRole;
import org.spanlift.results.Coefficients;
import org.spanlift.results.Solution;

/**
 * One surface's share of a solved flight point: its name, its role and its coefficients on the wing's
 * reference area, span and chord (moments about the wing's moment point), so that the surfaces' CL and Cm
 * add up to the configuration's, and their CDi too (each surface's circulation in the Trefftz-plane
 * downwash of every wake).
 *
 * @param name         the surface's name in the wing file
 * @param role         its role
 * @param coefficients its coefficients ({@code Solution.coefficients(int)})
 */
public record SurfaceResult(String name, SurfaceRole role, Coefficients coefficients) {

    /** The share of surface {@code index} of the solution's wing. */
    public static SurfaceResult of(Surface surface, Solution solution, int index) {
        return new SurfaceResult(surface.name(), surface.role(), solution.coefficients(index));
    }
}
