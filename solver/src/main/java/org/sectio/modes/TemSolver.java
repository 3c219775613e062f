package org.sectio.modes;

import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.sectio.eigen.MultifrontalCholesky;
import org.sectio.eigen.NotPositiveDefiniteException;
import org.sectio.eigen.SymmetricFactorization;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Loop;
import org.sectio.mesh.CutCells;
import org.sectio.mesh.LinkConductors;
import org.sectio.mesh.NodeLinks;
import org.sectio.operator.ConductorSources;
import org.sectio.operator.DirichletNodeAssembler;
import org.sectio.operator.LatticePencil;
import org.sectio.operator.PermittivityMap;

/**
 * The TEM modes of a guide with N ≥ 2 conductors in a homogeneous medium εr (μr = 1).
 *
 * <p>Conductor 0 (the outer wall) is the reference. For each other conductor k the potential with
 * V_k = 1 and 0 on the rest solves −∇²φ = 0 on the cut-link node stencil ({@link ConductorSources});
 * the capacitance matrix per unit length is C_kl = ε0 εr E(φ_k, φ_l), F/m, from the discrete energy
 * (W = ½ VᵀCV). A TEM mode in a homogeneous medium travels at v = c / √εr with L = μ0 ε0 εr C⁻¹, so
 * for the voltage eigenvectors C V_i = c_i V_i the modal impedance is Z_i = 1 / (v c_i), Ω; with two
 * conductors that is the characteristic impedance Z0 = √(L / C) = 1 / (v C) (Pozar, Microwave
 * Engineering, 4th ed., §2.1–2.2). Modes are numbered by ascending impedance.
 *
 * <p>With dielectric regions of another εr the guide carries quasi-TEM modes, which are not computed
 * here: {@link #solve} then returns no modes.
 */
final class TemSolver {

    /** Vacuum permittivity, F/m (CODATA 2018). */
    static final double EPSILON_0 = 8.8541878128e-12;

    /**
     * The TEM modes on one grid.
     *
     * @param impedances Z_i ascending, Ω
     * @param residuals ‖A φ − b‖ / ‖b‖ of the solves behind each mode (the largest of them)
     * @param fields the potential of each mode on the nodes, peak +1
     * @param capacitance C per unit length, F/m, (N − 1) × (N − 1), conductor 0 the reference
     * @param seconds time taken
     */
    record Result(double[] impedances, double[] residuals, FieldMap[] fields, double[][] capacitance, double seconds) {
    }

    private TemSolver() {
    }

    /**
     * @throws SolveException if the Laplacian cannot be factored (no node between the conductors)
     */
    static Result solve(CrossSection section, CutCells cells, int threads) {
        long start = System.nanoTime();
        List<Loop> conductors = section.conductors();
        int count = conductors.size() - 1;
        PermittivityMap medium = PermittivityMap.of(section, cells.grid());
        if (count < 1 || !medium.isUniform()) {
            return new Result(new double[0], new double[0], new FieldMap[0], new double[0][0], 0);
        }
        NodeLinks links = NodeLinks.of(cells);
        LatticePencil pencil = DirichletNodeAssembler.assemble(links);
        ConductorSources sources = ConductorSources.of(links, LinkConductors.of(conductors, cells.grid()),
                conductors.size());
        SymmetricFactorization factor;
        try {
            factor = MultifrontalCholesky.factor(pencil.stiffness(), pencil.column(), pencil.row(), threads);
        } catch (NotPositiveDefiniteException e) {
            throw new SolveException("TEM: the Laplacian is not positive definite (" + e.getMessage() + ")", e);
        }
        int n = pencil.size();
        double[][] phi = new double[count][n];
        double worst = 0;
        for (int k = 0; k < count; k++) {
            factor.solve(sources.sources()[k + 1], phi[k]);
            worst = Math.max(worst, residual(pencil, phi[k], sources.sources()[k + 1]));
        }
        double epsilon = EPSILON_0 * medium.maximum();
        double[][] c = new double[count][count];
        for (int k = 0; k < count; k++) {
            for (int l = 0; l < count; l++) {
                double e = (k == l ? sources.wallWeights()[k + 1] : 0) - dot(phi[k], sources.sources()[l + 1]);
                c[k][l] = epsilon * e;
            }
        }
        for (int k = 0; k < count; k++) {
            for (int l = 0; l < k; l++) {
                double mean = 0.5 * (c[k][l] + c[l][k]);
                c[k][l] = mean;
                c[l][k] = mean;
            }
        }
        double speed = ModeSolver.SPEED_OF_LIGHT / Math.sqrt(medium.maximum());
        double[][] voltages = new double[count][];
        double[] modal = modalCapacitances(c, voltages);
        double[] z = new double[count];
        FieldMap[] fields = new FieldMap[count];
        double[] residuals = new double[count];
        for (int m = 0; m < count; m++) {
            z[m] = 1.0 / (speed * modal[m]);
            double[] potential = new double[n];
            for (int k = 0; k < count; k++) {
                for (int q = 0; q < n; q++) {
                    potential[q] += voltages[m][k] * phi[k][q];
                }
            }
            fields[m] = FamilySolver.fieldOf(ModeFamily.TEM, cells.grid(), pencil, potential);
            residuals[m] = worst;
        }
        return new Result(z, residuals, fields, c, (System.nanoTime() - start) * 1e-9);
    }

    /**
     * Eigenvalues of the symmetric C in descending order (so impedances ascend), eigenvectors into
     * {@code vectors}.
     */
    private static double[] modalCapacitances(double[][] c, double[][] vectors) {
        int size = c.length;
        if (size == 1) {
            vectors[0] = new double[] {1.0};
            return new double[] {c[0][0]};
        }
        EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(size, true, true);
        if (!eig.decompose(new DMatrixRMaj(c))) {
            throw new SolveException("TEM: the capacitance matrix could not be diagonalized");
        }
        Integer[] order = new Integer[size];
        double[] values = new double[size];
        for (int m = 0; m < size; m++) {
            order[m] = m;
            values[m] = eig.getEigenvalue(m).getReal();
        }
        java.util.Arrays.sort(order, (a, b) -> Double.compare(values[b], values[a]));
        double[] sorted = new double[size];
        for (int m = 0; m < size; m++) {
            sorted[m] = values[order[m]];
            vectors[m] = eig.getEigenVector(order[m]).getData().clone();
        }
        return sorted;
    }

    private static double residual(LatticePencil pencil, double[] x, double[] b) {
        var a = pencil.stiffness();
        double[] r = b.clone();
        for (int col = 0; col < a.numCols; col++) {
            for (int p = a.col_idx[col]; p < a.col_idx[col + 1]; p++) {
                r[a.nz_rows[p]] -= a.nz_values[p] * x[col];
            }
        }
        return Math.sqrt(dot(r, r) / dot(b, b));
    }

    private static double dot(double[] u, double[] v) {
        double s = 0;
        for (int q = 0; q < u.length; q++) {
            s += u[q] * v[q];
        }
        return s;
    }
}
