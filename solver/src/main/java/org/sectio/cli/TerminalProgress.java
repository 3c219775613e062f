package org.sectio.cli;

import java.io.PrintWriter;
import java.util.Locale;
import org.sectio.modes.SolveProgress;

/**
 * Shows solve progress as one line on a terminal, rewritten in place with a carriage return and
 * cleared by {@link #finish()}. Updates closer together than a tenth of a second are skipped.
 */
final class TerminalProgress implements SolveProgress {

    private static final long MIN_INTERVAL_NANOS = 100_000_000L;
    private static final int MAX_WIDTH = 78;

    private final PrintWriter terminal;
    private long lastShown = Long.MIN_VALUE;
    private int shownWidth;

    /** @param terminal the error stream of a terminal */
    TerminalProgress(PrintWriter terminal) {
        this.terminal = terminal;
    }

    @Override
    public synchronized void report(String stage, double fractionDone) {
        long now = System.nanoTime();
        if (lastShown != Long.MIN_VALUE && now - lastShown < MIN_INTERVAL_NANOS && fractionDone < 1) {
            return;
        }
        lastShown = now;
        String line = String.format(Locale.ROOT, "%3.0f%%  %s", 100 * Math.max(0, Math.min(1, fractionDone)), stage);
        if (line.length() > MAX_WIDTH) {
            line = line.substring(0, MAX_WIDTH - 1) + "…";
        }
        terminal.print("\r" + line + " ".repeat(Math.max(0, shownWidth - line.length())));
        terminal.flush();
        shownWidth = line.length();
    }

    /** Removes the progress line, leaving the cursor at the start of an empty line. */
    synchronized void finish() {
        if (shownWidth > 0) {
            terminal.print("\r" + " ".repeat(shownWidth) + "\r");
            terminal.flush();
            shownWidth = 0;
        }
    }
}
