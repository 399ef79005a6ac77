package org.spanlift.cli.sweep;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.function.LongSupplier;

/**
 * Progress of a sweep on standard error: on a terminal a bar redrawn in place with the rate and the time
 * remaining; otherwise (a log file, a pipe) a plain line now and then. The clock is injected, so nothing
 * here depends on timing for its result; only when lines appear does.
 */
public final class Progress {

    static final long TERMINAL_INTERVAL_NS = 200_000_000L;
    static final long PLAIN_INTERVAL_NS = 10_000_000_000L;
    private static final int BAR = 28;

    private final PrintWriter err;
    private final boolean terminal;
    private final long total;
    private final long already;
    private final LongSupplier clock;
    private final long start;
    private long last;
    private long done;
    private long failed;
    private boolean drawn;

    /**
     * @param total   cases of this run's slice
     * @param already of them, done before (a resumed run)
     */
    public Progress(PrintWriter err, boolean terminal, long total, long already, LongSupplier clock) {
        this.err = err;
        this.terminal = terminal;
        this.total = total;
        this.already = already;
        this.clock = clock;
        this.start = clock.getAsLong();
        this.last = start;
        this.done = already;
    }

    /** One more case written. */
    public void step(boolean caseFailed) {
        done++;
        if (caseFailed) {
            failed++;
        }
        long now = clock.getAsLong();
        if (now - last >= (terminal ? TERMINAL_INTERVAL_NS : PLAIN_INTERVAL_NS)) {
            last = now;
            draw(now);
        }
    }

    /** Ends the bar (on a terminal) so the summary starts on its own line. */
    public void finish() {
        if (terminal && drawn) {
            draw(clock.getAsLong());
            err.println();
            err.flush();
        }
    }

    /** Cases per second in this session. */
    public double rate() {
        double s = (clock.getAsLong() - start) / 1e9;
        return s > 0 ? (done - already) / s : 0;
    }

    private void draw(long now) {
        double s = (now - start) / 1e9;
        double rate = s > 0 ? (done - already) / s : 0;
        double fraction = total == 0 ? 1 : (double) done / total;
        String left = rate > 0 ? duration((total - done) / rate) : "?";
        String fails = failed == 0 ? "" : String.format(Locale.ROOT, ", %d failed", failed);
        if (terminal) {
            int filled = (int) Math.round(fraction * BAR);
            err.print(String.format(Locale.ROOT, "\r[%s%s] %5.1f%% %d/%d  %.0f cases/s  %s left%s   ",
                    "#".repeat(filled), ".".repeat(BAR - filled), 100 * fraction, done, total, rate, left, fails));
            drawn = true;
        } else {
            err.println(String.format(Locale.ROOT, "sweep: %d of %d cases (%.0f%%), %.0f cases/s, about %s left%s",
                    done, total, 100 * fraction, rate, left, fails));
        }
        err.flush();
    }

    static String duration(double seconds) {
        long s = Math.round(seconds);
        if (s < 60) {
            return s + " s";
        }
        if (s < 3600) {
            return String.format(Locale.ROOT, "%d:%02d", s / 60, s % 60);
        }
        return String.format(Locale.ROOT, "%d:%02d:%02d", s / 3600, (s / 60) % 60, s % 60);
    }
}
