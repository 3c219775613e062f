package org.sectio.eigen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;

/**
 * The fallback of {@link SmallEigen} (EJML's double-shift QR plus inverse iteration) against Commons
 * Math's EigenDecomposition, two independent general-purpose libraries, on a random non-symmetric
 * matrix with real eigenvalues and complex pairs: the same eigenvalues, and every block eigenvector
 * satisfies H y = λ y in the documented convention (column i + j·column i + 1 for re[i] + j·im[i]).
 */
class SmallEigenTest {

    @Test
    void ejmlPathGivesCommonsMathsEigenvaluesAndVectorsInItsConvention() {
        int p = 14;
        Random random = new Random(3);
        double[][] h = new double[p][p];
        for (double[] row : h) {
            for (int c = 0; c < p; c++) {
                row[c] = random.nextDouble() - 0.5;
            }
        }
        RealMatrix hm = new Array2DRowRealMatrix(h);
        SmallEigen.Result ours = SmallEigen.byEjml(hm, p);
        EigenDecomposition reference = new EigenDecomposition(hm);
        double[] a = sortedModuli(ours.re(), ours.im());
        double[] b = sortedModuli(reference.getRealEigenvalues(), reference.getImagEigenvalues());
        int pairs = 0;
        for (int i = 0; i < p; i++) {
            assertEquals(b[i], a[i], 1e-12, "eigenvalue modulus " + i);
        }
        for (int i = 0; i < p; i++) {
            double re = ours.re()[i];
            double im = ours.im()[i];
            double[] yr = ours.blocks().getColumn(i);
            double[] yi = im == 0 ? new double[p] : ours.blocks().getColumn(i + 1);
            if (im != 0) {
                assertEquals(-im, ours.im()[i + 1], 0.0, "the pair's partner follows it");
                pairs++;
            }
            double residual = 0;
            double norm = 0;
            for (int r = 0; r < p; r++) {
                double sr = -(re * yr[r] - im * yi[r]);
                double si = -(re * yi[r] + im * yr[r]);
                for (int c = 0; c < p; c++) {
                    sr += h[r][c] * yr[c];
                    si += h[r][c] * yi[c];
                }
                residual += sr * sr + si * si;
                norm += yr[r] * yr[r] + yi[r] * yi[r];
            }
            // measured: below 1e-15
            assertTrue(Math.sqrt(residual / norm) < 1e-12, "eigenpair " + i + " residual " + Math.sqrt(residual / norm));
            if (im != 0) {
                i++;
            }
        }
        assertTrue(pairs >= 2, "the test matrix should have complex pairs, has " + pairs);
    }

    private static double[] sortedModuli(double[] re, double[] im) {
        double[] m = new double[re.length];
        for (int i = 0; i < re.length; i++) {
            m[i] = Math.hypot(re[i], im[i]);
        }
        Arrays.sort(m);
        return m;
    }
}
