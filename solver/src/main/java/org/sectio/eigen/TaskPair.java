package org.sectio.eigen;

import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;

/**
 * Runs two independent pieces of work, the second as a fork-join task (forked inside a pool, on the
 * common pool from outside one) while the caller runs the first. Callers arrange the arithmetic so
 * that the result is the same whether the pieces run one after the other or at once.
 */
final class TaskPair {

    private TaskPair() {
    }

    /** @param parallel whether to run the pieces concurrently (otherwise first, then second) */
    static void run(boolean parallel, Runnable first, Runnable second) {
        if (!parallel) {
            first.run();
            second.run();
            return;
        }
        ForkJoinTask<?> task = ForkJoinTask.adapt(second);
        if (ForkJoinTask.inForkJoinPool()) {
            task.fork();
        } else {
            ForkJoinPool.commonPool().execute(task);
        }
        first.run();
        task.join();
    }
}
