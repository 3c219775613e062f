package org.sectio.batch;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import org.sectio.modes.SolveSession;

/**
 * Runs a sweep (or one shard of it) into its output files: finds what earlier runs recorded, solves
 * the chains that still miss a point on {@code threads} worker threads, and appends each finished
 * point to every output as one complete record.
 *
 * <p>Each worker takes the next pending chain and solves its points in order with a fresh
 * {@link SolveSession}; workers share nothing but the outputs (whose appends are synchronized) and
 * the counters. With {@link Reuse#ALL} a point's Lanczos start comes from the points before it in its
 * chain, so a chain that an interrupted run left half done is solved again from its first point and
 * only the missing records are written: the records are then the same as in an uninterrupted run.
 */
public final class SweepRunner {

    /** A finished run. @param solved points recorded now @param failed of which failed @param recordedBefore found already */
    public record Summary(int solved, int failed, int recordedBefore, int inShard) {
    }

    /** One output to write. @param file where @param format which layout */
    public record Output(Path file, RecordFormat format) {
    }

    private SweepRunner() {
    }

    /**
     * @param sweep the sweep
     * @param outputs the files to append to (one or two layouts); created if missing
     * @param shard which chains to run
     * @param threads worker threads, ≥ 1
     * @param listener told of progress
     * @return the counts
     * @throws IOException if an output cannot be read or written (records written so far stay)
     * @throws IllegalArgumentException if an output holds something else than this sweep's records
     */
    public static Summary run(SweepDefinition sweep, List<Output> outputs, Shard shard, int threads,
                              SweepListener listener) throws IOException {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
        List<SweepOutput> open = new ArrayList<>();
        List<Path> created = new ArrayList<>();
        try {
            for (Output o : outputs) {
                if (!Files.exists(o.file())) {
                    created.add(o.file());
                }
                open.add(SweepOutput.open(o.file(), o.format(), sweep));
            }
        } catch (IOException | RuntimeException e) {
            for (SweepOutput o : open) {
                o.close();
            }
            for (Path p : created) {
                Files.deleteIfExists(p);
            }
            throw e;
        }
        try {
            return runOpen(sweep, open, shard, threads, listener);
        } finally {
            for (SweepOutput o : open) {
                o.close();
            }
        }
    }

    private static Summary runOpen(SweepDefinition sweep, List<SweepOutput> outputs, Shard shard, int threads,
                                   SweepListener listener) throws IOException {
        List<Integer> pending = new ArrayList<>();
        int inShard = 0;
        int toDo = 0;
        for (int c = 0; c < sweep.chainCount(); c++) {
            if (!shard.owns(c)) {
                continue;
            }
            int missing = 0;
            for (int index : sweep.chain(c)) {
                inShard++;
                if (!recordedEverywhere(outputs, index)) {
                    missing++;
                }
            }
            if (missing > 0) {
                pending.add(c);
                toDo += missing;
            }
        }
        listener.started(toDo, inShard - toDo, inShard);
        int workers = Math.max(1, Math.min(threads, pending.size()));
        PointEvaluator evaluator = new PointEvaluator(sweep, Math.max(1, threads / workers));
        AtomicInteger next = new AtomicInteger();
        AtomicInteger done = new AtomicInteger();
        AtomicInteger failed = new AtomicInteger();
        AtomicReference<Throwable> problem = new AtomicReference<>();
        int total = toDo;
        Runnable work = () -> {
            try {
                for (int k = next.getAndIncrement(); k < pending.size() && problem.get() == null;
                     k = next.getAndIncrement()) {
                    runChain(sweep, outputs, evaluator, pending.get(k), problem, record -> {
                        int f = record.failed() ? failed.incrementAndGet() : failed.get();
                        listener.pointDone(record, done.incrementAndGet(), f, total);
                    });
                }
            } catch (Throwable t) {
                problem.compareAndSet(null, t);
            }
        };
        List<Thread> pool = new ArrayList<>();
        for (int w = 0; w < workers; w++) {
            Thread t = new Thread(work, "sweep-worker-" + w);
            pool.add(t);
            t.start();
        }
        for (Thread t : pool) {
            try {
                t.join();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                problem.compareAndSet(null, e);
            }
        }
        Throwable t = problem.get();
        if (t instanceof IOException io) {
            throw io;
        } else if (t instanceof RuntimeException r) {
            throw r;
        } else if (t instanceof Error e) {
            throw e;
        } else if (t != null) {
            throw new IOException("sweep interrupted: " + t.getMessage(), t);
        }
        return new Summary(done.get(), failed.get(), inShard - toDo, inShard);
    }

    private interface Recorded {
        void accept(PointRecord record);
    }

    private static void runChain(SweepDefinition sweep, List<SweepOutput> outputs, PointEvaluator evaluator, int chain,
                                 AtomicReference<Throwable> problem, Recorded recorded) throws IOException {
        SolveSession session = sweep.reuse().session();
        List<Integer> members = sweep.chain(chain);
        int lastMissing = -1;
        for (int index : members) {
            if (!recordedEverywhere(outputs, index)) {
                lastMissing = index;
            }
        }
        for (int index : members) {
            if (problem.get() != null || index > lastMissing) {
                return;
            }
            boolean missing = !recordedEverywhere(outputs, index);
            // with warm starts the point also seeds the next one, so it is solved even if recorded
            if (!missing && sweep.reuse() != Reuse.ALL) {
                continue;
            }
            PointRecord record = evaluator.evaluate(index, session);
            if (missing) {
                for (SweepOutput o : outputs) {
                    o.append(record, sweep);
                }
                recorded.accept(record);
            }
        }
    }

    private static boolean recordedEverywhere(List<SweepOutput> outputs, int index) {
        for (SweepOutput o : outputs) {
            if (!o.has(index)) {
                return false;
            }
        }
        return true;
    }
}
