package org.sectio.eigen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.ejml.data.DMatrixSparseCSC;
import org.junit.jupiter.api.Test;

/**
 * Thick-restart Lanczos started from a given vector (a sweep's previous eigenvectors) finds the same
 * pairs as from its seeded random start: on the 30 × 30 Dirichlet lattice Laplacian against its closed
 * form eigenvalues (4/h² (sin²(iπh/2) + sin²(jπh/2)), separation of variables), including the double
 * eigenvalues of the square, and on a neighbouring pencil against a cold solve.
 */
class ThickRestartLanczosStartTest {

    private static final int SIDE = 30;
    private static final double H = 1.0 / (SIDE + 1);
    private static final int COUNT = 6;

    private static double[] sum(Eigenpairs pairs) {
        double[] s = new double[pairs.vector(0).length];
        for (int k = 0; k < pairs.values().length; k++) {
            double[] v = pairs.vector(k);
            for (int i = 0; i < s.length; i++) {
                s[i] += v[i];
            }
        }
        return s;
    }

    @Test
    void aStartFromEigenvectorsOfANearbyPencilGivesTheSamePairsWithFewerApplications() {
        DMatrixSparseCSC a = TestPencils.laplacian2D(SIDE, H, false);
        double[] identity = TestPencils.constantDiagonal(SIDE * SIDE, 1.0);
        SymmetricFactorization factor = new EjmlCholesky(a, null);
        ThickRestartLanczos solver = new ThickRestartLanczos(LanczosSettings.forCount(COUNT)
                .withLanczosVectors(30));
        Eigenpairs cold = solver.solve(a, identity, 0.0, factor);
        double[] exact = Arrays.copyOf(TestPencils.laplacian2DEigenvalues(SIDE, H, false), COUNT);
        Eigenpairs warm = solver.solve(a, identity, 0.0, factor, IterationListener.NONE, new double[0][], sum(cold));
        for (int k = 0; k < COUNT; k++) {
            assertEquals(exact[k], warm.values()[k], 1e-10 * exact[k], "pair " + k);
        }

        // a neighbouring pencil: the mass perturbed by up to ±5 %, started from the first pencil's vectors
        double[] mass = TestPencils.randomDiagonal(SIDE * SIDE, 0.95, 1.05, 7L);
        Eigenpairs near = solver.solve(a, mass, 0.0, factor);
        Eigenpairs nearWarm = solver.solve(a, mass, 0.0, factor, IterationListener.NONE, new double[0][], sum(cold));
        for (int k = 0; k < COUNT; k++) {
            assertEquals(near.values()[k], nearWarm.values()[k], 1e-10 * near.values()[k], "pair " + k);
        }
        assertTrue(nearWarm.operatorApplications() < near.operatorApplications(),
                "warm " + nearWarm.operatorApplications() + " against cold " + near.operatorApplications());
    }

    @Test
    void aStartOfTheWrongLengthOrNotFiniteIsRefused() {
        DMatrixSparseCSC a = TestPencils.laplacian2D(10, 0.1, false);
        double[] m = TestPencils.constantDiagonal(100, 1.0);
        SymmetricFactorization factor = new EjmlCholesky(a, null);
        ThickRestartLanczos solver = new ThickRestartLanczos(LanczosSettings.forCount(3));
        assertThrows(IllegalArgumentException.class,
                () -> solver.solve(a, m, 0.0, factor, IterationListener.NONE, new double[0][], new double[99]));
        double[] bad = new double[100];
        bad[4] = Double.NaN;
        assertThrows(IllegalArgumentException.class,
                () -> solver.solve(a, m, 0.0, factor, IterationListener.NONE, new double[0][], bad));
    }
}
