package org.spanlift.solve;

import java.util.ArrayDeque;
import java.util.Iterator;

import org.spanlift.lattice.Lattice;
import org.spanlift.solve.linear.LuOptions;

/**
 * Factorized influence systems of the last few lattice geometries, so that cases that change only the
 * right-hand sides (twist, washout, camber, section data, deflections) reuse one factorization. Systems
 * are built on first use: the antisymmetric one only when an aileron basis is needed. Not thread-safe:
 * one cache per thread.
 */
public final class InfluenceCache {

    private final int capacity;
    private final LuOptions options;
    private final ArrayDeque<Systems> entries = new ArrayDeque<>();
    private long factorizations;
    private long reuses;

    /** @param capacity how many geometries to keep (at least 1); factorized with {@link LuOptions#DEFAULT} */
    public InfluenceCache(int capacity) {
        this(capacity, LuOptions.DEFAULT);
    }

    /**
     * @param capacity how many geometries to keep (at least 1)
     * @param options  how to factorize (in a sweep: one thread per job when the jobs fill the machine)
     */
    public InfluenceCache(int capacity, LuOptions options) {
        if (capacity < 1) {
            throw new IllegalArgumentException("a cache keeps at least one geometry");
        }
        this.capacity = capacity;
        this.options = options;
    }

    /** A cache that keeps nothing between calls beyond the one lattice in use. */
    static InfluenceCache single() {
        return new InfluenceCache(1);
    }

    /** The systems of this lattice's geometry: cached ones when the geometry was seen, else new (empty). */
    public Systems systems(Lattice lattice) {
        for (Iterator<Systems> it = entries.iterator(); it.hasNext();) {
            Systems s = it.next();
            if (s.lattice.sameGeometry(lattice)) {
                it.remove();
                entries.addFirst(s);
                reuses++;
                return s;
            }
        }
        Systems s = new Systems(lattice);
        entries.addFirst(s);
        while (entries.size() > capacity) {
            entries.removeLast();
        }
        return s;
    }

    /** Geometries factorized so far (a measurement for sweeps). */
    public long factorizations() {
        return factorizations;
    }

    /** Calls that found their geometry cached. */
    public long reuses() {
        return reuses;
    }

    /**
     * The systems of one geometry, each factorized on first use; safe to use from several threads (a wing's
     * analysis may factorize its antisymmetric system late, on whichever thread first deflects an aileron).
     */
    public final class Systems {
        private final Lattice lattice;
        private InfluenceSystem symmetric;
        private InfluenceSystem antisymmetric;
        private InfluenceSystem full;
        private boolean counted;

        private Systems(Lattice lattice) {
            this.lattice = lattice;
        }

        private void count() {
            if (!counted) {
                counted = true;
                factorizations++;
            }
        }

        /** The symmetric system, factorized on first use. */
        public synchronized InfluenceSystem symmetric() {
            if (symmetric == null) {
                count();
                symmetric = InfluenceSystem.of(lattice, Symmetry.SYMMETRIC, options);
            }
            return symmetric;
        }

        /** The antisymmetric system, factorized on first use (with the symmetric one, if that is not yet). */
        public synchronized InfluenceSystem antisymmetric() {
            if (antisymmetric == null) {
                count();
                if (symmetric == null) {
                    InfluenceSystem.Pair pair = InfluenceSystem.pair(lattice, options);
                    symmetric = pair.symmetric();
                    antisymmetric = pair.antisymmetric();
                } else {
                    antisymmetric = InfluenceSystem.of(lattice, Symmetry.ANTISYMMETRIC, options);
                }
            }
            return antisymmetric;
        }

        /** Whether the antisymmetric system has been built. */
        synchronized boolean hasAntisymmetric() {
            return antisymmetric != null;
        }

        /** The full system (no symmetry), factorized on first use. */
        public synchronized InfluenceSystem full() {
            if (full == null) {
                count();
                full = InfluenceSystem.of(lattice, Symmetry.FULL, options);
            }
            return full;
        }
    }
}
