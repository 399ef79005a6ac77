package org.spanlift.spark;

import java.util.ArrayDeque;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;

import org.apache.spark.api.java.JavaFutureAction;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.broadcast.Broadcast;
import org.apache.spark.executor.TaskMetrics;
import org.apache.spark.scheduler.SparkListener;
import org.apache.spark.scheduler.SparkListenerTaskEnd;
import org.spanlift.cli.sweep.RowFormat;

/**
 * Runs cases {@code first} up to {@code end} of a sweep as Spark jobs and hands the rows to a sink in case
 * order, as the local runner does with threads. Each task is one job over a contiguous run of cases ({@link
 * CaseTask}); at most {@link #JOBS_PER_CORE} times the cluster's default parallelism jobs are in flight, so the
 * driver holds at most that many tasks' rows whatever the number of cases, and the executors stay busy while
 * the driver waits for the oldest. The sweep's files travel once per executor, as a broadcast {@link
 * SweepBundle}. A task that fails (a lost executor) is run again by Spark; its rows are the same, so the output
 * does not change.
 */
public final class SparkSweepRunner {

    /** Jobs in flight per core of the cluster. */
    public static final int JOBS_PER_CORE = 2;
    /** Fewest and most cases in a task when the size is chosen automatically. */
    public static final int MIN_CASES_PER_TASK = 16;
    public static final int MAX_CASES_PER_TASK = 4096;
    /** Tasks per core aimed at when the size is chosen automatically (for balance at the end of a run). */
    public static final int TASKS_PER_CORE = 8;

    private SparkSweepRunner() {
    }

    /**
     * What a run did: cases and tasks; the time the tasks ran on the executors and the processor time they used
     * (Spark's task metrics, of the attempts that finished, retried ones included), and the driver's time
     * handing rows to the sink.
     */
    public record Outcome(long cases, long tasks, double taskSeconds, double taskCpuSeconds, double sinkSeconds) {
    }

    /** Adds up the run time and processor time of the tasks that end. */
    private static final class TaskTimes extends SparkListener {
        private final AtomicLong runMs = new AtomicLong();
        private final AtomicLong cpuNs = new AtomicLong();

        @Override
        public void onTaskEnd(SparkListenerTaskEnd end) {
            TaskMetrics m = end.taskMetrics();
            if (m != null) {
                runMs.addAndGet(m.executorRunTime());
                cpuNs.addAndGet(m.executorCpuTime());
            }
        }
    }

    /**
     * The automatic task size: about {@link #TASKS_PER_CORE} tasks per core, within {@link #MIN_CASES_PER_TASK}
     * and {@link #MAX_CASES_PER_TASK} cases.
     */
    public static int casesPerTask(long cases, int cores) {
        long per = Math.max(1, cases) / ((long) TASKS_PER_CORE * Math.max(1, cores));
        return (int) Math.max(MIN_CASES_PER_TASK, Math.min(MAX_CASES_PER_TASK, per));
    }

    /**
     * @param sink receives each row (with its line feed) in case order, on the calling thread
     * @param fault a fault to inject into the tasks (tests only), or null
     */
    static Outcome run(JavaSparkContext jsc, SweepBundle bundle, RowFormat format, long first, long end,
            int casesPerTask, CaseTask.TaskFault fault, Consumer<String> sink) {
        Broadcast<SweepBundle> shared = jsc.broadcast(bundle);
        CaseTask task = new CaseTask(shared, format, casesPerTask, end, fault);
        ArrayDeque<JavaFutureAction<List<String>>> window = new ArrayDeque<>();
        long cases = 0;
        long tasks = 0;
        long sinkNs = 0;
        TaskTimes times = new TaskTimes();
        jsc.sc().addSparkListener(times);
        try {
            long next = first;
            while (next < end || !window.isEmpty()) {
                int limit = Math.max(2, JOBS_PER_CORE * jsc.defaultParallelism());
                while (next < end && window.size() < limit) {
                    long start = next;
                    next = Math.min(end, next + casesPerTask);
                    jsc.setJobDescription("spanlift sweep: cases " + start + " to " + (next - 1));
                    window.add(jsc.parallelize(List.of(start), 1).mapPartitions(task).collectAsync());
                    tasks++;
                }
                List<String> rows = take(window.poll());
                long t = System.nanoTime();
                for (String row : rows) {
                    sink.accept(row);
                    cases++;
                }
                sinkNs += System.nanoTime() - t;
            }
        } finally {
            for (JavaFutureAction<List<String>> f : window) {
                f.cancel(true);
            }
            shared.destroy();
            jsc.sc().removeSparkListener(times);
        }
        return new Outcome(cases, tasks, times.runMs.get() / 1e3, times.cpuNs.get() / 1e9, sinkNs / 1e9);
    }

    private static List<String> take(JavaFutureAction<List<String>> job) {
        try {
            return job.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("the sweep was interrupted", e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause() == null ? e : e.getCause();
            throw new ClusterFailure(cause.getMessage() == null ? cause.getClass().getSimpleName()
                    : cause.getMessage().lines().findFirst().orElse(""), cause);
        }
    }

    /** Spark gave up on a task (after its retries): the rows written so far stay, and --resume finishes the run. */
    public static final class ClusterFailure extends RuntimeException {

        private static final long serialVersionUID = 1L;

        ClusterFailure(String message, Throwable cause) {
            super(message, cause);
        }
    }
}
