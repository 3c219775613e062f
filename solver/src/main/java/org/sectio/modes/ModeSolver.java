package org.sectio.modes;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.sectio.geometry.CrossSection;
import org.sectio.io.MatrixMarketWriter;
import org.sectio.mesh.CutCells;
import org.sectio.mesh.GridPlanner;
import org.sectio.mesh.TensorGrid;
import org.sectio.operator.LatticePencil;
import org.sectio.operator.PermittivityMap;

/**
 * The one entry point for a solve, used by the command line, batch work and the viewer alike.
 *
 * <p>A solve is: place a grid over the cross-section → cut it by the walls → for each family assemble
 * the pencil, factor it shifted, run shift-invert Lanczos → put the eigenvectors back on the grid.
 * With an error estimate the same is done on grids with half and a quarter as many cells across (every
 * second line, twice); both schemes converge at second order, so kc(h) − kc(2h) ≈ 3 (kc(h) − kc), and
 * the estimate reported is 2|kc(h) − kc(2h)| / (2^p − 1): the Richardson error of the fine value with
 * a safety factor of 2, because cut cells make the error of one grid fluctuate about its trend, and
 * with the order p observed on the three grids but held to [1, pMax] ({@link RichardsonEstimate}),
 * because a first-order part of the cut-cell error can dominate where the h² part is very small. The
 * quarter grid costs about 1/16 of the fine one.
 *
 * <p>Rule for guides with oblique or curved dielectric interfaces
 * ({@link PermittivityMap#hasOffAxisInterfaces}): there pMax = 1, because the Hz scheme keeps a small
 * first-order part of its error at such interfaces and an order-2 estimate was measured below the
 * true error; elsewhere pMax = 2.
 */
public final class ModeSolver {

    /** Speed of light in vacuum, m/s (exact, SI 2019). */
    public static final double SPEED_OF_LIGHT = 299_792_458.0;

    /** Cells across of the pilot solve that measures the error for a target accuracy. */
    public static final int PILOT_CELLS = 48;

    private ModeSolver() {
    }

    /**
     * Finds the lowest modes of a cross-section on the grid planned for it by {@link GridPlanner}: lines
     * on the bounding box and on every axis-aligned straight wall, cells graded toward re-entrant
     * corners, and every second line forming the coarse plan that the error estimate re-solves on.
     *
     * @param section the cross-section (metres)
     * @param settings modes, families, grid or target accuracy, error estimate, threads
     * @param progress told of each stage
     * @return the {@code settings.modeCount()} lowest modes over the chosen families, lowest cutoff first
     * @throws SolveException when the problem cannot be solved as asked (with a message for the user)
     */
    public static ModeSet solve(CrossSection section, SolveSettings settings, SolveProgress progress) {
        return solve(section, settings, progress, null);
    }

    /**
     * As {@link #solve(CrossSection, SolveSettings, SolveProgress)}, sharing work with earlier solves of
     * the same session: the symbolic factorization of a pencil whose pattern was seen before, and with a
     * warm session the last eigenvectors as the Lanczos start (see {@link SolveSession}). Without warm
     * starts the result is the same bit for bit as without a session.
     *
     * @param session what earlier solves on this thread left to reuse; null to share nothing; used by
     *     one thread only
     * @return as there
     * @throws SolveException as there
     */
    public static ModeSet solve(CrossSection section, SolveSettings settings, SolveProgress progress,
                                SolveSession session) {
        if (!Double.isNaN(settings.targetRelativeError())) {
            return solve(section, settings.withCellsAcross(cellsForTarget(section, settings, progress, session)),
                    progress, session);
        }
        return solveOnGrid(section, GridPlanner.plan(section, settings.cellsAcross()), settings, progress, session);
    }

    /**
     * Finds the lowest modes on a given grid (the error estimate uses a grid with every second line).
     *
     * @throws SolveException when the problem cannot be solved as asked
     * @throws IllegalArgumentException if the grid does not cover the cross-section
     */
    public static ModeSet solveOnGrid(CrossSection section, TensorGrid grid, SolveSettings settings,
                                      SolveProgress progress) {
        return solveOnGrid(section, grid, settings, progress, null);
    }

    private static ModeSet solveOnGrid(CrossSection section, TensorGrid grid, SolveSettings settings,
                                       SolveProgress progress, SolveSession session) {
        long start = System.nanoTime();
        boolean estimate = settings.estimateError();
        double fineShare = estimate ? 0.8 : 1.0;
        Map<ModeFamily, FamilySolver.Result> fine = solveFamilies(section, grid, settings, progress, 0.0, fineShare, session);
        Map<ModeFamily, FamilySolver.Result> coarse = null;
        Map<ModeFamily, FamilySolver.Result> coarsest = null;
        if (estimate) {
            TensorGrid half = everySecondLine(grid);
            try {
                coarse = half == null ? null : solveFamilies(section, half, settings, progress, fineShare, 0.95, session);
            } catch (SolveException tooCoarse) {
                coarse = null; // the estimate is then reported as unknown (NaN)
            }
            TensorGrid quarter = coarse == null ? null : everySecondLine(half);
            try {
                coarsest = quarter == null ? null : solveFamilies(section, quarter, settings, progress, 0.95, 1.0, session);
            } catch (SolveException tooCoarse) {
                coarsest = null; // the order is then assumed (see RichardsonEstimate)
            }
        }
        // the highest order to credit (see the class comment)
        double maximumOrder = PermittivityMap.hasOffAxisInterfaces(section) ? 1.0 : 2.0;
        List<Mode> modes = new ArrayList<>();
        double assembly = 0;
        double factor = 0;
        double eigen = 0;
        for (FamilySolver.Result r : fine.values()) {
            assembly += r.assemblySeconds();
            factor += r.factorSeconds();
            eigen += r.eigenSeconds();
            for (int k = 0; k < r.cutoffWavenumbers().length; k++) {
                double kc = r.cutoffWavenumbers()[k];
                double err = Double.NaN;
                if (coarse != null) {
                    double[] c = coarse.get(r.family()).cutoffWavenumbers();
                    double[] cc = coarsest == null ? new double[0] : coarsest.get(r.family()).cutoffWavenumbers();
                    if (k < c.length) {
                        err = RichardsonEstimate.relativeError(kc, c[k], k < cc.length ? cc[k] : Double.NaN,
                                maximumOrder);
                    }
                }
                // the eigenvalue is k0², so fc = c k0 / (2π) whatever the filling
                modes.add(new Mode(r.family(), k + 1, kc, kc * SPEED_OF_LIGHT / (2 * Math.PI), r.residuals()[k], err,
                        r.fields()[k]));
            }
        }
        modes.addAll(temModes(section, grid, settings));
        for (var extra : Arrays.asList(coarse, coarsest)) {
            for (FamilySolver.Result r : extra == null ? List.<FamilySolver.Result>of() : extra.values()) {
                assembly += r.assemblySeconds();
                factor += r.factorSeconds();
                eigen += r.eigenSeconds();
            }
        }
        modes.sort(Comparator.comparingDouble(Mode::cutoffWavenumber));
        List<Mode> lowest = modes.subList(0, Math.min(settings.modeCount(), modes.size()));
        var te = fine.get(ModeFamily.TE);
        var tm = fine.get(ModeFamily.TM);
        GridSummary summary = new GridSummary(grid.cellsX(), grid.cellsY(), grid.x(1) - grid.x(0), grid.y(1) - grid.y(0),
                te == null ? 0 : te.unknowns(), tm == null ? 0 : tm.unknowns());
        progress.report("done", 1.0);
        return new ModeSet(section.name(), lowest, summary,
                new SolveTiming(assembly, factor, eigen, (System.nanoTime() - start) * 1e-9));
    }

    private static Map<ModeFamily, FamilySolver.Result> solveFamilies(CrossSection section, TensorGrid grid,
            SolveSettings settings, SolveProgress progress, double from, double to, SolveSession session) {
        progress.report(String.format(Locale.ROOT, "cutting a %d × %d grid", grid.cellsX(), grid.cellsY()), from);
        long cutStart = System.nanoTime();
        CutCells cells = CutCells.of(section, grid);
        double cutSeconds = (System.nanoTime() - cutStart) * 1e-9;
        Map<ModeFamily, FamilySolver.Result> results = new EnumMap<>(ModeFamily.class);
        List<ModeFamily> families = settings.families().stream().filter(f -> f != ModeFamily.TEM).sorted().toList();
        PermittivityMap medium = medium(section, grid);
        double share = (to - from) / Math.max(1, families.size());
        for (int f = 0; f < families.size(); f++) {
            ModeFamily family = families.get(f);
            FamilySolver.Result r = FamilySolver.solve(family, cells, medium, settings.modeCount(), settings.threads(),
                    progress, from + f * share, from + (f + 1) * share, session);
            // the cut cells serve both families; their time is booked to assembly, split evenly
            results.put(family, r.withExtraAssembly(cutSeconds / families.size()));
        }
        return results;
    }

    /** The materials on the grid, refusing magnetic ones with a message for the user. */
    private static PermittivityMap medium(CrossSection section, TensorGrid grid) {
        try {
            return PermittivityMap.of(section, grid);
        } catch (IllegalArgumentException e) {
            throw new SolveException(e.getMessage(), e);
        }
    }

    /**
     * The TEM modes (see {@link TemSolver}) when TEM is among the families and the guide has two or
     * more conductors, with the impedance's error estimated like a cutoff's from the coarser grid.
     */
    private static List<Mode> temModes(CrossSection section, TensorGrid grid, SolveSettings settings) {
        if (!settings.families().contains(ModeFamily.TEM) || section.conductors().size() < 2) {
            return List.of();
        }
        TemSolver.Result fine = TemSolver.solve(section, CutCells.of(section, grid), settings.threads());
        TemSolver.Result coarse = null;
        TensorGrid half = settings.estimateError() ? everySecondLine(grid) : null;
        if (half != null) {
            try {
                coarse = TemSolver.solve(section, CutCells.of(section, half), settings.threads());
            } catch (SolveException tooCoarse) {
                coarse = null;
            }
        }
        List<Mode> out = new ArrayList<>();
        for (int m = 0; m < fine.impedances().length; m++) {
            double z = fine.impedances()[m];
            double err = coarse != null && m < coarse.impedances().length
                    ? RichardsonEstimate.relativeError(z, coarse.impedances()[m], Double.NaN, 2.0) : Double.NaN;
            out.add(new Mode(ModeFamily.TEM, m + 1, 0.0, 0.0, fine.residuals()[m], err, fine.fields()[m], z));
        }
        return out;
    }

    /** The grid made of every second line of {@code grid}, or null if that would be too coarse. */
    static TensorGrid everySecondLine(TensorGrid grid) {
        if (Math.min(grid.cellsX(), grid.cellsY()) < 8) {
            return null;
        }
        return new TensorGrid(everySecond(grid.xLines()), everySecond(grid.yLines()));
    }

    private static double[] everySecond(double[] lines) {
        int cells = lines.length - 1;
        int coarseCells = (cells + 1) / 2;
        double[] out = new double[coarseCells + 1];
        for (int k = 0; k < coarseCells; k++) {
            out[k] = lines[2 * k];
        }
        out[coarseCells] = lines[cells]; // with an odd count the last coarse cell keeps the fine width
        return out;
    }

    /**
     * Picks the cells across that meet the target error: a pilot solve gives the error at the pilot grid,
     * and second-order convergence scales it as (pilot / cells)².
     */
    private static int cellsForTarget(CrossSection section, SolveSettings settings, SolveProgress progress,
                                      SolveSession session) {
        SolveSettings pilot = new SolveSettings(settings.modeCount(), settings.families(), PILOT_CELLS, Double.NaN,
                true, settings.threads());
        ModeSet first = solveOnGrid(section, GridPlanner.plan(section, PILOT_CELLS), pilot,
                (stage, f) -> progress.report("choosing the grid: " + stage, 0.0), session);
        double worst = first.modes().stream().mapToDouble(Mode::relativeErrorEstimate).max().orElse(Double.NaN);
        return cellsForError(worst, settings.targetRelativeError());
    }

    /**
     * The grid rule behind a target accuracy, for callers that run their own pilot solves on
     * {@link #PILOT_CELLS} cells (batch work choosing one grid for many guides): second-order
     * convergence scales the pilot's error as (pilot / cells)², with a margin of 15 %.
     *
     * @param pilotError the largest relative error estimate of the pilot solves (NaN or ≤ 0: none known)
     * @param target the wanted relative error, 1e-7 … 0.1
     * @return the cells across, ≥ {@link #PILOT_CELLS}
     * @throws SolveException if the grid would exceed {@link SolveSettings#MAX_CELLS}
     */
    public static int cellsForError(double pilotError, double target) {
        if (!(pilotError > 0)) {
            return PILOT_CELLS;
        }
        double cells = PILOT_CELLS * Math.sqrt(pilotError / target) * 1.15;
        if (cells > SolveSettings.MAX_CELLS) {
            throw new SolveException(String.format(Locale.ROOT, "an accuracy of %.2g needs about %.0f cells across,"
                    + " more than the limit of %d; ask for a looser accuracy or fewer modes", target, cells,
                    SolveSettings.MAX_CELLS));
        }
        return Math.max(PILOT_CELLS, (int) Math.ceil(cells));
    }

    /**
     * Writes the assembled pencils (A and diagonal M for each chosen family) in Matrix Market format
     * into {@code directory}, as {@code te-stiffness.mtx}, {@code te-mass.mtx}, {@code tm-stiffness.mtx},
     * {@code tm-mass.mtx}; the directory is created if missing.
     *
     * @return the files written
     * @throws IOException if a file cannot be written
     */
    public static List<Path> exportPencils(CrossSection section, SolveSettings settings, Path directory)
            throws IOException {
        Files.createDirectories(directory);
        CutCells cells = CutCells.of(section, GridPlanner.plan(section, settings.cellsAcross()));
        List<Path> written = new ArrayList<>();
        PermittivityMap medium = medium(section, cells.grid());
        for (ModeFamily family : settings.families().stream().filter(f -> f != ModeFamily.TEM).sorted().toList()) {
            LatticePencil pencil = FamilySolver.pencil(family, cells, medium);
            String prefix = family.name().toLowerCase(Locale.ROOT);
            Path a = directory.resolve(prefix + "-stiffness.mtx");
            Path m = directory.resolve(prefix + "-mass.mtx");
            String where = "\ncross-section: " + section.name() + "\ngrid: " + settings.cellsAcross() + " cells across";
            try {
                MatrixMarketWriter.writeSymmetric(a, pencil.stiffness(), "Sectio " + family
                        + " stiffness matrix A of the pencil A x = lambda M x, lambda = k0^2 at cutoff (kc^2 for air) in rad^2/m^2" + where);
                MatrixMarketWriter.writeDiagonal(m, pencil.mass(), "Sectio " + family
                        + " mass matrix M (diagonal, m^2) of the pencil A x = lambda M x" + where);
            } catch (java.io.UncheckedIOException e) {
                throw e.getCause();
            }
            written.add(a);
            written.add(m);
        }
        return written;
    }
}
