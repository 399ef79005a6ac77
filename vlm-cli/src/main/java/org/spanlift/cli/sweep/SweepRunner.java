package org.spanlift.cli.sweep;

import java.util.ArrayDeque;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.BiConsumer;
import java.util.function.Function;

import org.spanlift.batch.CaseEvaluator;
import org.spanlift.batch.CaseResult;
import org.spanlift.solve.linear.LuOptions;
import org.spanlift.sweep.Sweep;

/**
 * Runs cases {@code first} up to {@code end} of a sweep on {@code jobs} threads and hands the results to
 * the sink in case order: a finished case waits only for those before it. At most {@link #WINDOW_PER_JOB}
 * times {@code jobs} cases are in flight (submitted but not yet handed on), so memory stays bounded
 * whatever the number of cases, and the cases themselves are generated from their index when a thread
 * takes them. Each thread keeps its own {@link CaseEvaluator} (work arrays and factorization cache).
 */
public final class SweepRunner {

    /** Cases in flight per thread. */
    public static final int WINDOW_PER_JOB = 32;

    /** What a run did. */
    public record Outcome(long cases, long failed, long factorizations, long reuses) {
    }

    private record Done(CaseResult result, String row) {
    }

    private SweepRunner() {
    }

    /**
     * @param format turns a result into its row; runs on the worker threads, so it must be thread-safe
     * @param sink   receives each result with its row, in case order, on the calling thread
     */
    public static Outcome run(Sweep sweep, long first, long end, int jobs, Function<CaseResult, String> format,
            BiConsumer<CaseResult, String> sink) {
        List<CaseEvaluator> evaluators = new CopyOnWriteArrayList<>();
        // The jobs share the processors: each factorization gets its share, so the jobs never oversubscribe
        // them (results do not depend on the thread count).
        LuOptions lu = LuOptions.DEFAULT.withThreads(Math.max(1, LuOptions.DEFAULT.threads() / jobs));
        ThreadLocal<CaseEvaluator> local = ThreadLocal.withInitial(() -> {
            CaseEvaluator e = new CaseEvaluator(sweep, lu);
            evaluators.add(e);
            return e;
        });
        AtomicInteger names = new AtomicInteger();
        ExecutorService pool = Executors.newFixedThreadPool(jobs, r -> {
            Thread t = new Thread(r, "spanlift-sweep-" + names.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
        long failed = 0;
        long done = 0;
        try {
            ArrayDeque<Future<Done>> window = new ArrayDeque<>();
            int limit = WINDOW_PER_JOB * jobs;
            long next = first;
            while (next < end || !window.isEmpty()) {
                while (next < end && window.size() < limit) {
                    long index = next++;
                    window.add(pool.submit(() -> {
                        CaseResult r = local.get().evaluate(index);
                        return new Done(r, format.apply(r));
                    }));
                }
                Done d = take(window.poll());
                CaseResult r = d.result();
                sink.accept(r, d.row());
                done++;
                if (r.failed()) {
                    failed++;
                }
            }
        } finally {
            pool.shutdownNow();
        }
        long f = 0;
        long u = 0;
        for (CaseEvaluator e : evaluators) {
            f += e.factorizations();
            u += e.reuses();
        }
        return new Outcome(done, failed, f, u);
    }

    private static Done take(Future<Done> future) {
        try {
            return future.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("the sweep was interrupted", e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException re) {
                throw re;
            }
            if (cause instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(cause);
        }
    }
}
