package org.spanlift.sweep;

import java.util.List;

/**
 * The cases of a sweep, by index from 0, without materializing them: each case's parameter values are
 * computed from its index alone, so any slice of a million cases costs no memory.
 */
public interface Design {

    /** The number of cases. */
    long count();

    /** The parameter values of case {@code index}, as text, in parameter order. */
    String[] values(long index);

    /** A short description for summaries: "grid 9 x 7" or "Latin hypercube of 200 cases, seed 7". */
    String describe();

    /** The full grid; the last parameter varies fastest (nested loops in the file's order). */
    static Design grid(List<Parameter> parameters) {
        return new Grid(parameters);
    }

    /** A Latin hypercube of {@code cases} cases, reproducible from its seed. */
    static Design latinHypercube(List<Parameter> parameters, long cases, long seed) {
        return new LatinHypercube(parameters, cases, seed);
    }

    /** The number of cases of a full grid, saturating at {@link Long#MAX_VALUE}. */
    static long gridCount(List<Parameter> parameters) {
        long n = 1;
        for (Parameter p : parameters) {
            try {
                n = Math.multiplyExact(n, p.gridCount());
            } catch (ArithmeticException e) {
                return Long.MAX_VALUE;
            }
        }
        return n;
    }

    /** The full grid. */
    final class Grid implements Design {
        private final List<Parameter> parameters;
        private final long count;

        Grid(List<Parameter> parameters) {
            this.parameters = List.copyOf(parameters);
            this.count = gridCount(parameters);
        }

        @Override
        public long count() {
            return count;
        }

        @Override
        public String[] values(long index) {
            if (index < 0 || index >= count) {
                throw new IndexOutOfBoundsException("case " + index + " of " + count);
            }
            String[] out = new String[parameters.size()];
            long rest = index;
            for (int p = parameters.size() - 1; p >= 0; p--) {
                long n = parameters.get(p).gridCount();
                out[p] = parameters.get(p).gridValue(rest % n);
                rest /= n;
            }
            return out;
        }

        @Override
        public String describe() {
            StringBuilder b = new StringBuilder("full grid ");
            for (int p = 0; p < parameters.size(); p++) {
                b.append(p == 0 ? "" : " x ").append(parameters.get(p).gridCount());
            }
            return b.toString();
        }
    }

    /**
     * A Latin hypercube: each parameter's extent is cut into {@code cases} equal strata, and every stratum
     * is used by exactly one case. The stratum of case i for parameter p is a pseudo-random permutation of
     * the case indices (a keyed Feistel network over the next power of four, with cycle walking), and the
     * point within the stratum a pseudo-random fraction; both come from the seed, p and i alone, in integer
     * arithmetic, so they are the same on every machine and need no memory per case.
     */
    final class LatinHypercube implements Design {
        private static final int ROUNDS = 6;
        private final List<Parameter> parameters;
        private final long count;
        private final long seed;
        private final int halfBits;

        LatinHypercube(List<Parameter> parameters, long count, long seed) {
            if (count < 1) {
                throw new IllegalArgumentException("a Latin hypercube needs at least one case");
            }
            this.parameters = List.copyOf(parameters);
            this.count = count;
            this.seed = seed;
            int bits = 64 - Long.numberOfLeadingZeros(Math.max(1, count - 1));
            this.halfBits = Math.max(1, (bits + 1) / 2);
        }

        @Override
        public long count() {
            return count;
        }

        @Override
        public String[] values(long index) {
            if (index < 0 || index >= count) {
                throw new IndexOutOfBoundsException("case " + index + " of " + count);
            }
            String[] out = new String[parameters.size()];
            for (int p = 0; p < parameters.size(); p++) {
                long stratum = permute(p, index);
                double jitter = (mix(seed ^ mix(0x5157L + p) ^ mix(index * 0x9E3779B97F4A7C15L + 1)) >>> 11)
                        * 0x1.0p-53;
                out[p] = parameters.get(p).sample((stratum + jitter) / count);
            }
            return out;
        }

        /** The stratum of case {@code index} for parameter {@code p}: a permutation of 0..count-1. */
        long permute(int p, long index) {
            long x = index;
            do {
                x = feistel(p, x);
            } while (x >= count);
            return x;
        }

        private long feistel(int p, long x) {
            long mask = (1L << halfBits) - 1;
            long left = x >>> halfBits;
            long right = x & mask;
            for (int r = 0; r < ROUNDS; r++) {
                long f = mix(seed + 0x632BE59BD9B4E019L * (p + 1) + 0x8CB92BA72F3D8DD7L * (r + 1) + right) & mask;
                long next = left ^ f;
                left = right;
                right = next;
            }
            return (left << halfBits) | right;
        }

        /** The SplitMix64 finalizer. */
        static long mix(long z) {
            z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
            z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
            return z ^ (z >>> 31);
        }

        @Override
        public String describe() {
            return "Latin hypercube of " + count + " cases, seed " + seed;
        }
    }
}
