package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;

/** A progress callback that throws {@link SolveCancelledException} stops the solve, at any stage. */
class SolveCancellationTest {

    private final CrossSection guide = Shapes.rectangle(22.86e-3, 10.16e-3);
    private final SolveSettings settings = new SolveSettings(3, EnumSet.of(ModeFamily.TE, ModeFamily.TM), 40,
            Double.NaN, true, 1);

    /** Cancels at the first report whose stage starts with {@code prefix} and whose fraction is ≥ {@code from}. */
    private List<String> cancelAt(String prefix, double from) {
        List<String> heard = new ArrayList<>();
        boolean[] cancelled = {false};
        SolveCancelledException e = assertThrows(SolveCancelledException.class, () -> ModeSolver.solve(guide, settings,
                (stage, fraction) -> {
                    assertTrue(!cancelled[0], "no report after the cancel, got " + stage);
                    heard.add(stage);
                    if (stage.startsWith(prefix) && fraction >= from) {
                        cancelled[0] = true;
                        throw new SolveCancelledException("cancelled at " + stage);
                    }
                }));
        assertTrue(e.getMessage().startsWith("cancelled at " + prefix));
        return heard;
    }

    @Test
    @DisplayName("cancelling before the first factorization stops the solve there")
    void atTheStart() {
        assertEquals(1, cancelAt("cutting", 0).size());
    }

    @Test
    @DisplayName("cancelling inside a Lanczos iteration leaves the solver")
    void inLanczos() {
        assertTrue(cancelAt("TM: Lanczos step", 0).size() > 2);
    }

    @Test
    @DisplayName("cancelling in the error-estimate solve is not taken for a too-coarse grid (which would be swallowed)")
    void inTheErrorEstimate() {
        List<String> heard = cancelAt("TE: Lanczos step", 0.8);
        assertTrue(heard.stream().anyMatch(s -> s.startsWith("TM: Lanczos")), "the fine grid was solved first");
    }
}
