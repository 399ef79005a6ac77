package org.spanlift.solve;

import java.util.Locale;

import org.spanlift.input.RefusedException;

/**
 * The memory guard of the influence systems: before a system is assembled, the bytes its matrix and its LU
 * factors take at their peak (two n x n matrices of doubles per system) are compared with what this Java
 * process can still use. A lattice that cannot fit is refused with the estimate and the limit, instead of
 * failing with an out-of-memory error halfway through. In a sweep each thread holds its own systems, so the
 * guard sees what the other threads already use.
 */
final class SolveBudget {

    /** Peak doubles per unknown squared of one system: the assembled matrix and its LU copy. */
    static final int MATRICES_PER_SYSTEM = 2;

    private SolveBudget() {
    }

    /**
     * @param unknowns the size of each system
     * @param systems  how many systems are assembled at once (two for the symmetric and antisymmetric pair)
     * @throws RefusedException when they cannot fit
     */
    static void require(int unknowns, int systems) {
        double bytes = 8.0 * MATRICES_PER_SYSTEM * systems * (double) unknowns * unknowns;
        if (bytes <= available()) {
            return;
        }
        System.gc(); // what is free may be hidden by garbage not yet collected: look once more before refusing
        double available = available();
        if (bytes > available) {
            throw new RefusedException(String.format(Locale.ROOT, "the lattice gives %d unknowns per system: "
                    + "assembling and factorizing %s needs about %s, more than the %s this Java process can still "
                    + "use (of %s at most); use fewer strips or rows, fewer jobs in a sweep, or give Java more memory "
                    + "(-Xmx)", unknowns, systems == 1 ? "it" : "its " + systems + " systems", size(bytes),
                    size(available), size(Runtime.getRuntime().maxMemory())));
        }
    }

    private static double available() {
        Runtime rt = Runtime.getRuntime();
        return rt.maxMemory() - (double) (rt.totalMemory() - rt.freeMemory());
    }

    private static String size(double bytes) {
        return bytes >= 1e9 ? String.format(Locale.ROOT, "%.1f GB", bytes / 1e9)
                : String.format(Locale.ROOT, "%.0f MB", bytes / 1e6);
    }
}
