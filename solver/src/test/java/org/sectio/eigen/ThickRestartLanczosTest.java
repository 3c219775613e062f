package org.sectio.eigen;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.ejml.data.DMatrixSparseCSC;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Runs the eigensolver contract on the thick-restart Lanczos solver, plus what is particular to it. */
class ThickRestartLanczosTest extends SymmetricEigensolverContract {

    @Override
    protected Eigenpairs solve(DMatrixSparseCSC a, double[] m, double shift, SymmetricFactorization factor,
            int count) {
        return new ThickRestartLanczos(LanczosSettings.forCount(count)).solve(a, m, shift, factor);
    }

    private static final int SIDE = 30;
    private static final double H = 1.0 / (SIDE + 1);

    private static DMatrixSparseCSC square() {
        return TestPencils.laplacian2D(SIDE, H, false);
    }

    @Test
    @DisplayName("the same seed gives bit-identical eigenpairs and operator counts")
    void sameSeedGivesIdenticalResults() {
        DMatrixSparseCSC a = square();
        double[] m = TestPencils.randomDiagonal(SIDE * SIDE, 0.5, 1.5, 3L);
        SymmetricFactorization factor = new EjmlCholesky(a, null);
        ThickRestartLanczos solver = new ThickRestartLanczos(LanczosSettings.forCount(5));
        Eigenpairs first = solver.solve(a, m, 0.0, factor);
        Eigenpairs second = solver.solve(a, m, 0.0, factor);
        assertArrayEquals(first.values(), second.values(), 0.0);
        assertEquals(first.operatorApplications(), second.operatorApplications());
        for (int k = 0; k < first.count(); k++) {
            assertArrayEquals(first.vector(k), second.vector(k), 0.0, "vector " + k);
        }
    }

    @Test
    @DisplayName("the listener hears every operator application, counting 1, 2, 3, ... up to the reported total")
    void listenerHearsEveryOperatorApplicationInOrder() {
        DMatrixSparseCSC a = square();
        double[] m = TestPencils.constantDiagonal(SIDE * SIDE, 1.0);
        List<Integer> heard = new ArrayList<>();
        Eigenpairs pairs = new ThickRestartLanczos(LanczosSettings.forCount(4))
                .solve(a, m, 0.0, new EjmlCholesky(a, null), heard::add);
        assertTrue(pairs.operatorApplications() > 4, "more applications than pairs");
        assertEquals(pairs.operatorApplications(), heard.size());
        for (int k = 0; k < heard.size(); k++) {
            assertEquals(k + 1, heard.get(k));
        }
    }

    @Test
    @DisplayName("running out of restarts throws an EigenSolverException carrying the restarts, tolerance and counts")
    void runningOutOfRestartsThrowsWithTheCounts() {
        DMatrixSparseCSC a = square();
        double[] m = TestPencils.constantDiagonal(SIDE * SIDE, 1.0);
        LanczosSettings starved = new LanczosSettings(8, 9, 1e-14, 1, 5L);
        EigenSolverException failure = assertThrows(EigenSolverException.class,
                () -> new ThickRestartLanczos(starved).solve(a, m, 0.0, new EjmlCholesky(a, null)));
        assertEquals(1, failure.restarts());
        assertEquals(1e-14, failure.tolerance());
        assertEquals(0, failure.arpackCode(), "no ARPACK code, the solver is not ARPACK");
        assertTrue(failure.convergedCount() < 8, "fewer than the wanted pairs converged");
        String message = failure.getMessage();
        assertTrue(message.contains("after 1 restarts") && message.contains("10 operator applications")
                && message.contains("tolerance 1.0E-14") && message.contains("residual estimate is")
                && message.contains("maxRestarts"), message);
    }

    @Test
    @DisplayName("a small basis restarts several times and still matches the 1-D closed form 4/h² sin²(kπ/(2(n+1))) (Strang)")
    void smallBasisRestartsSeveralTimesAndStillConverges() {
        int n = 200;
        double h = 1.0 / (n + 1);
        DMatrixSparseCSC a = TestPencils.dirichlet1D(n, h);
        double[] m = TestPencils.constantDiagonal(n, 1.0);
        // 6 pairs in a basis of 10 keeps 8 Ritz vectors and adds only 2 per restart (measured: 8 restarts)
        LanczosSettings small = new LanczosSettings(6, 10, 1e-12, 500, 7L);
        ThickRestartLanczos.Solution solution = new ThickRestartLanczos(small).solveCounted(a, m, 0.0,
                new EjmlCholesky(a, null), IterationListener.NONE);
        assertTrue(solution.restarts() >= 3, "restarts: " + solution.restarts());
        assertValuesMatch(Arrays.copyOf(TestPencils.dirichlet1DEigenvalues(n, h), 6), solution.pairs().values(),
                EIGENVALUE_TOLERANCE);
        assertAccuratePairs(a, m, solution.pairs());
    }

    @Test
    @DisplayName("agrees with ARPACK's shift-invert Lanczos on a 2-D Laplacian with doublets to 1e-12 relative")
    void agreesWithArpackOnTheTwoDimensionalLaplacian() {
        DMatrixSparseCSC a = square();
        double[] m = TestPencils.randomDiagonal(SIDE * SIDE, 0.5, 1.5, 19L);
        SymmetricFactorization factor = new EjmlCholesky(TestPencils.shifted(a, m, -1.0), null);
        LanczosSettings settings = LanczosSettings.forCount(12);
        Eigenpairs reference = new ShiftInvertLanczos(settings).solve(a, m, -1.0, factor);
        Eigenpairs pairs = new ThickRestartLanczos(settings).solve(a, m, -1.0, factor);
        assertValuesMatch(reference.values(), pairs.values(), 1e-12);
        assertAccuratePairs(a, m, pairs);
    }

    @Test
    @DisplayName("the check after convergence recovers the copy of the Neumann (0,2)/(2,0) doublet that the single Krylov vector missed (closed form, Strang 1999 DCT)")
    void checkAfterConvergenceRecoversAMissedDoubletCopy() {
        int side = 30;
        double h = 1.0 / side;
        DMatrixSparseCSC a = TestPencils.laplacian2D(side, h, true);
        double[] m = TestPencils.constantDiagonal(side * side, 1.0);
        double[] closedForm = TestPencils.laplacian2DEigenvalues(side, h, true);
        double shift = -0.5 * closedForm[1];
        ThickRestartLanczos.Solution solution = new ThickRestartLanczos(LanczosSettings.forCount(6)).solveCounted(a,
                m, shift, new EjmlCholesky(TestPencils.shifted(a, m, shift), null), IterationListener.NONE);
        assertEquals(1, solution.misses(), "the main iteration returned 0, (0,1)x2, (1,1), (0,2), (1,2): one miss");
        double[] values = solution.pairs().values();
        assertEquals(values[4], values[5], 1e-12 * values[4], "both copies of the doublet are returned");
        assertValuesMatch(Arrays.copyOfRange(closedForm, 1, 6), Arrays.copyOfRange(values, 1, 6), EIGENVALUE_TOLERANCE);
        assertMOrthonormal(m, solution.pairs());
    }

}
