package org.spanlift.solve.linear;

/**
 * How a dense system is factorized: the implementation and the most threads it may use. The result does not
 * depend on {@code threads} (bit for bit); only the time does.
 *
 * @param method  which factorization
 * @param threads the most threads one factorization may use (at least 1); {@link TiledLu} uses the calling
 *                thread and the common fork-join pool, and stays on one thread for small systems
 */
public record LuOptions(Method method, int threads) {

    /** The factorizations behind the seam. */
    public enum Method {
        /** EJML's {@code LUDecompositionAlt_DDRM} (LU with partial pivoting, Crout's order); single thread. */
        EJML,
        /** {@link TiledLu}: EJML's arithmetic, blocked for the cache and spread over threads. */
        TILED
    }

    /** What the engine uses: the tiled LU on as many threads as the machine has processors. */
    public static final LuOptions DEFAULT = new LuOptions(Method.TILED, Runtime.getRuntime().availableProcessors());

    /** Checks that a method is given. */
    public LuOptions {
        if (method == null) {
            throw new IllegalArgumentException("a factorization method is required");
        }
        if (threads < 1) {
            throw new IllegalArgumentException("a factorization uses at least one thread, got " + threads);
        }
    }

    /** These options with another thread count. */
    public LuOptions withThreads(int count) {
        return new LuOptions(method, count);
    }
}
