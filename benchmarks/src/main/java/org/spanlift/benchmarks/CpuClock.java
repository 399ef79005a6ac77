package org.spanlift.benchmarks;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;

import org.openjdk.jmh.annotations.AuxCounters;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

/**
 * CPU time of the benchmark thread over each measured iteration, with the number of calls, reported by
 * JMH as the secondary results {@code cpuNanos} and {@code calls}. Their ratio is the CPU time per call,
 * which on a shared, loaded machine is a steadier figure than the wall time per call (the primary score):
 * it leaves out the time the thread waits for a core. It does not count the garbage collector's or the
 * compiler's threads.
 *
 * <p>A benchmark takes this state as a parameter and calls {@link #count()} once per call (a field
 * increment); the clock itself is read only at iteration boundaries, outside the timed loop.
 */
@State(Scope.Thread)
@AuxCounters(AuxCounters.Type.EVENTS)
public class CpuClock {

    private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

    /** CPU time of this thread over the iteration, ns. */
    public long cpuNanos;

    /** Calls in the iteration. */
    public long calls;

    private long start;

    @Setup(Level.Iteration)
    public void start() {
        cpuNanos = 0;
        calls = 0;
        start = THREADS.getCurrentThreadCpuTime();
    }

    @TearDown(Level.Iteration)
    public void stop() {
        cpuNanos = THREADS.getCurrentThreadCpuTime() - start;
    }

    /** Counts one call. */
    public void count() {
        calls++;
    }
}
