package org.sectio.batch.tolerance;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.sectio.batch.size.GuidePoint;
import org.sectio.batch.size.GuidePointSolver;
import org.sectio.geometry.file.SectionFileException;
import org.sectio.modes.SolveException;

/**
 * Solves many parameter sets in parallel, one solve per worker thread at a time (each solve itself
 * single-threaded: the solver's settings should say threads = 1), results in the order given. A set
 * that cannot be built or solved gives its reason instead of a point; the others go on.
 */
final class PointBatch {

    /**
     * One parameter set's outcome.
     *
     * @param point the solved guide, or null on failure
     * @param failure why it failed, or null
     */
    record Outcome(GuidePoint point, String failure) {
    }

    private PointBatch() {
    }

    /**
     * @param solver the solver (threads = 1 recommended)
     * @param sets parameter values, template units
     * @param threads worker threads, ≥ 1
     * @return one outcome per set, in order
     */
    static List<Outcome> solveAll(GuidePointSolver solver, List<Map<String, Double>> sets, int threads) {
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, Math.min(threads, sets.size())), r -> {
            Thread t = new Thread(r, "sectio-tolerance");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<Outcome>> futures = new ArrayList<>();
            for (Map<String, Double> set : sets) {
                futures.add(pool.submit(() -> {
                    try {
                        return new Outcome(solver.solve(set), null);
                    } catch (SectionFileException | SolveException | IllegalArgumentException e) {
                        return new Outcome(null, e.getMessage());
                    }
                }));
            }
            List<Outcome> out = new ArrayList<>();
            for (Future<Outcome> f : futures) {
                out.add(f.get());
            }
            return out;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new SolveException("interrupted while solving the tolerance points");
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof OutOfMemoryError) {
                throw new SolveException("out of memory solving the tolerance points in parallel; use fewer --threads"
                        + " or a coarser grid");
            }
            throw new SolveException("a tolerance point failed: " + cause);
        } finally {
            pool.shutdownNow();
        }
    }
}
