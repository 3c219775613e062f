package org.sectio.eigen;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class NestedDissectionTest {

    static Stream<Arguments> regions() {
        return Stream.of(
                Arguments.of("1 x 1 lattice", LatticeProblems.rectangle(1, 1, 0, new Random(1)), 4),
                Arguments.of("37 x 23 rectangle", LatticeProblems.rectangle(37, 23, 0, new Random(2)), 16),
                Arguments.of("60 x 60 disc", LatticeProblems.disc(60), 16),
                Arguments.of("50 x 40 rectangle with 30 % holes", LatticeProblems.rectangle(50, 40, 0.3, new Random(3)), 1),
                Arguments.of("1 x 300 strip", LatticeProblems.rectangle(300, 1, 0, new Random(4)), 4));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("regions")
    @DisplayName("the ordering lists every unknown exactly once")
    void orderingIsAPermutation(String name, boolean[][] region, int leafSize) {
        LatticeProblems.Problem problem = LatticeProblems.matrix(region, 1, null);
        int[] perm = NestedDissection.latticeOrdering(problem.column(), problem.row());
        int[] sorted = perm.clone();
        Arrays.sort(sorted);
        int[] identity = new int[perm.length];
        Arrays.setAll(identity, k -> k);
        assertArrayEquals(identity, sorted);
    }

    /**
     * Separator property of nested dissection (George 1973): every lattice edge leaving a subtree ends
     * on the separator of an ancestor, so in particular no edge joins the two halves under a node.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("regions")
    @DisplayName("every lattice edge out of a subtree lands on an ancestor separator, so halves never touch")
    void separatorsSeparate(String name, boolean[][] region, int leafSize) {
        LatticeProblems.Problem problem = LatticeProblems.matrix(region, 1, null);
        DissectionTree tree = NestedDissection.dissect(problem.column(), problem.row(), leafSize);
        int n = problem.size();
        int[] position = new int[n];
        int[] nodeOf = new int[n];
        for (int p = 0; p < n; p++) {
            position[tree.permutation()[p]] = p;
        }
        for (int v = 0; v < tree.nodeCount(); v++) {
            for (int p = tree.columnStart()[v]; p < tree.columnEnd()[v]; p++) {
                nodeOf[p] = v;
            }
        }
        var a = problem.matrix();
        int checkedEdges = 0;
        for (int column = 0; column < n; column++) {
            int k = column;
            for (int idx = a.col_idx[k]; idx < a.col_idx[k + 1]; idx++) {
                int l = a.nz_rows[idx];
                int p = position[k], q = position[l];
                if (q <= p) {
                    continue;
                }
                checkedEdges++;
                int v = nodeOf[p];
                int w = nodeOf[q];
                boolean ancestorOrSelf = tree.subtreeStart()[w] <= tree.subtreeStart()[v]
                        && tree.columnEnd()[w] >= tree.columnEnd()[v];
                assertTrue(ancestorOrSelf, () -> "edge " + k + "-" + l + " joins node " + v + " to non-ancestor " + w);
            }
        }
        assertEquals(a.nz_length - n, 2 * checkedEdges, "every off-diagonal pair is checked once");
        for (int v = 0; v < tree.nodeCount(); v++) {
            int first = tree.firstChild()[v], second = tree.secondChild()[v];
            if (first >= 0 && second >= 0) {
                assertTrue(tree.columnEnd()[first] <= tree.subtreeStart()[second]
                        || tree.columnEnd()[second] <= tree.subtreeStart()[first], "sibling subtrees are disjoint");
            }
        }
    }

    @Test
    @DisplayName("the separator of a full rectangle is its middle lattice column, eliminated last")
    void rootSeparatorIsTheMiddleLine() {
        LatticeProblems.Problem problem = LatticeProblems.matrix(LatticeProblems.rectangle(41, 20, 0, new Random(5)), 1, null);
        DissectionTree tree = NestedDissection.dissect(problem.column(), problem.row(), 16);
        int root = tree.root();
        assertEquals(20, tree.width(root), "one unknown per lattice row on the cut");
        for (int p = tree.columnStart()[root]; p < tree.columnEnd()[root]; p++) {
            assertEquals(20, problem.column()[tree.permutation()[p]], "cut at column (0 + 40) / 2");
        }
        assertEquals(problem.size(), tree.columnEnd()[root]);
    }

    @Test
    @DisplayName("two unknowns on one lattice point are rejected")
    void repeatedPointIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> NestedDissection.latticeOrdering(new int[] {0, 1, 0}, new int[] {5, 5, 5}));
        assertTrue(e.getMessage().contains("(0, 5)"), e.getMessage());
    }
}
