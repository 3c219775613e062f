package org.sectio.eigen;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.ejml.data.DMatrixSparseCSC;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Runs the eigensolver contract on ARPACK's shift-invert Lanczos, plus what is particular to it. */
class ShiftInvertLanczosTest extends SymmetricEigensolverContract {

    @Override
    protected Eigenpairs solve(DMatrixSparseCSC a, double[] m, double shift, SymmetricFactorization factor,
            int count) {
        return new ShiftInvertLanczos(LanczosSettings.forCount(count)).solve(a, m, shift, factor);
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
        ShiftInvertLanczos solver = new ShiftInvertLanczos(LanczosSettings.forCount(5));
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
        Eigenpairs pairs = new ShiftInvertLanczos(LanczosSettings.forCount(4))
                .solve(a, m, 0.0, new EjmlCholesky(a, null), heard::add);
        assertEquals(pairs.operatorApplications(), heard.size());
        for (int k = 0; k < heard.size(); k++) {
            assertEquals(k + 1, heard.get(k));
        }
    }

    @Test
    @DisplayName("running out of restarts throws an EigenSolverException carrying ARPACK info 1, restarts and tolerance")
    void runningOutOfRestartsThrowsWithTheCounts() {
        DMatrixSparseCSC a = square();
        double[] m = TestPencils.constantDiagonal(SIDE * SIDE, 1.0);
        LanczosSettings starved = new LanczosSettings(8, 9, 1e-14, 1, 5L);
        EigenSolverException failure = assertThrows(EigenSolverException.class,
                () -> new ShiftInvertLanczos(starved).solve(a, m, 0.0, new EjmlCholesky(a, null)));
        assertEquals(1, failure.arpackCode());
        assertEquals(1, failure.restarts());
        assertEquals(1e-14, failure.tolerance());
        assertTrue(failure.convergedCount() < 8, "fewer than the wanted pairs converged");
        assertTrue(failure.getMessage().contains("info = 1") && failure.getMessage().contains("maxRestarts"),
                failure.getMessage());
    }

}
