package org.sectio.cli;

import java.io.PrintWriter;
import java.util.Locale;
import org.sectio.batch.PointRecord;
import org.sectio.batch.SweepListener;

/**
 * Shows a sweep's progress: on a terminal one line rewritten in place (points done of those to do,
 * failed, rate, time left), cleared by {@link #finish()}; otherwise one plain log line per point, so
 * that a batch job's log shows every point and why one failed.
 */
final class SweepProgressLine implements SweepListener {

    private static final long MIN_INTERVAL_NANOS = 200_000_000L;

    private final PrintWriter err;
    private final boolean terminal;
    private final long start = System.nanoTime();
    private long lastShown = Long.MIN_VALUE;
    private int shownWidth;

    /**
     * @param err the error stream
     * @param terminal whether it is a terminal ({@code System.console() != null})
     */
    SweepProgressLine(PrintWriter err, boolean terminal) {
        this.err = err;
        this.terminal = terminal;
    }

    @Override
    public synchronized void started(int toDo, int alreadyRecorded, int inShard) {
        if (!terminal || alreadyRecorded > 0) {
            clear();
            err.printf(Locale.ROOT, "sweep: %d of %d points to solve, %d recorded by an earlier run%n", toDo, inShard,
                    alreadyRecorded);
            err.flush();
        }
    }

    @Override
    public synchronized void pointDone(PointRecord record, int done, int failed, int toDo) {
        long now = System.nanoTime();
        double seconds = (now - start) * 1e-9;
        double rate = done / Math.max(seconds, 1e-9);
        double left = (toDo - done) / rate;
        if (!terminal) {
            err.printf(Locale.ROOT, "sweep: point %d %s (%d/%d done, %d failed, %.2f points/s, about %s left)%s%n",
                    record.index(), record.failed() ? "failed" : "ok", done, toDo, failed, rate, duration(left),
                    record.failed() ? ": " + record.reason() : "");
            err.flush();
            return;
        }
        if (lastShown != Long.MIN_VALUE && now - lastShown < MIN_INTERVAL_NANOS && done < toDo) {
            return;
        }
        lastShown = now;
        String line = String.format(Locale.ROOT, "sweep: %d/%d points, %d failed, %.2f points/s, about %s left", done,
                toDo, failed, rate, duration(left));
        err.print("\r" + line + " ".repeat(Math.max(0, shownWidth - line.length())));
        err.flush();
        shownWidth = line.length();
    }

    /** Removes the progress line. */
    synchronized void finish() {
        clear();
    }

    private void clear() {
        if (shownWidth > 0) {
            err.print("\r" + " ".repeat(shownWidth) + "\r");
            err.flush();
            shownWidth = 0;
        }
    }

    private static String duration(double seconds) {
        if (!Double.isFinite(seconds)) {
            return "?";
        }
        long s = Math.round(seconds);
        return s >= 3600 ? String.format(Locale.ROOT, "%dh%02dm", s / 3600, s / 60 % 60)
                : s >= 60 ? String.format(Locale.ROOT, "%dm%02ds", s / 60, s % 60) : s + " s";
    }
}
