package org.spanlift.spark;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

import org.apache.spark.TaskContext;
import org.apache.spark.api.java.function.FlatMapFunction;
import org.apache.spark.broadcast.Broadcast;
import org.spanlift.batch.CaseEvaluator;
import org.spanlift.batch.CaseResult;
import org.spanlift.cli.sweep.RowFormat;
import org.spanlift.sweep.Sweep;

/**
 * The work of one Spark task: a contiguous run of cases, from each start the partition holds up to {@code
 * casesPerTask} cases (never past {@code end}), evaluated by a {@link CaseEvaluator} of the task's own and
 * formatted into rows by the local runner's {@link RowFormat}, in case order. A case that fails records its
 * error in its row, as locally; only a lost executor or a fault of the runtime fails the task, and Spark runs
 * it again from its first case, so a retried task gives the same rows.
 */
final class CaseTask implements FlatMapFunction<Iterator<Long>, String> {

    private static final long serialVersionUID = 1L;

    private final Broadcast<SweepBundle> bundle;
    private final RowFormat format;
    private final int casesPerTask;
    private final long end;
    private final TaskFault fault;

    /**
     * @param fault a fault to inject (tests only), or null
     */
    CaseTask(Broadcast<SweepBundle> bundle, RowFormat format, int casesPerTask, long end, TaskFault fault) {
        this.bundle = bundle;
        this.format = format;
        this.casesPerTask = casesPerTask;
        this.end = end;
        this.fault = fault;
    }

    @Override
    public Iterator<String> call(Iterator<Long> starts) {
        SweepBundle.Opened opened = bundle.value().open();
        Sweep sweep = opened.sweep();
        List<String> names = RowFormat.columnNames(sweep);
        CaseEvaluator evaluator = new CaseEvaluator(sweep);
        TaskContext context = TaskContext.get();
        int attempt = context == null ? 0 : context.attemptNumber();
        List<String> rows = new ArrayList<>();
        while (starts.hasNext()) {
            long start = starts.next();
            long stop = Math.min(end, start + casesPerTask);
            for (long i = start; i < stop; i++) {
                CaseResult r = opened.restore(evaluator.evaluate(i));
                if (fault != null) {
                    fault.after(i, attempt);
                }
                rows.add(format.row(names, sweep, r));
            }
        }
        return rows.iterator();
    }

    /** A fault injected into a task's work, for tests of the retries: it throws to kill the attempt. */
    interface TaskFault extends Serializable {

        /** Called after case {@code index} was evaluated in the task's attempt {@code attempt} (0 first). */
        void after(long index, int attempt);
    }
}
