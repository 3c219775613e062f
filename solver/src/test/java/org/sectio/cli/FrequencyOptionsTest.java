package org.sectio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The frequency and analysis options of {@code solve} and {@code junction}, refused before any solve. */
class FrequencyOptionsTest {

    @Test
    void solveHelpDocumentsEveryFrequencyAndAnalysisOption() {
        CapturedRun run = CapturedRun.of("solve", "--help");
        assertEquals(0, run.exitCode());
        for (String option : List.of("--freq", "--band", "--conductor", "--roughness", "--breakdown-field",
                "--derating", "--impedance", "--voltage-path", "--plots", "caution")) {
            assertTrue(run.out().contains(option), "help lacks " + option + ":\n" + run.out());
        }
    }

    @Test
    void junctionHelpNamesBothGuidesAndTheEstimate() {
        CapturedRun run = CapturedRun.of("junction", "--help");
        assertEquals(0, run.exitCode());
        for (String word : List.of("A", "B", "--freq", "--band", "--impedance", "--cells", "--format",
                "ignores the energy stored at the step")) {
            assertTrue(run.out().contains(word), "help lacks " + word + ":\n" + run.out());
        }
    }

    @Test
    void freqAndBandTogetherAreAUsageError() {
        assertUsageError("sectio: --freq=F, --band=START:STOP:POINTS are mutually exclusive (specify only one)",
                "solve", "--freq", "10GHz", "--band", "8GHz:12GHz:5");
    }

    @Test
    void aSweepGivenToFreqIsAUsageErrorThatPointsToBand() {
        assertUsageError("sectio: --freq 8GHz:12GHz:5: one frequency expected; use --band START:STOP:POINTS for a sweep",
                "solve", "--freq", "8GHz:12GHz:5");
    }

    @Test
    void aBadFrequencyUnitIsNamed() {
        CapturedRun run = CapturedRun.of("solve", "--freq", "10 parsecs");
        assertOneLineUsageError(run);
        assertTrue(run.err().startsWith("sectio: --freq 10 parsecs: bad frequency unit \"parsecs\""), run.err());
    }

    @Test
    void analysisOptionsWithoutAFrequencyAreAUsageError() {
        assertUsageError("sectio: --conductor needs --freq F or --band START:STOP:POINTS: it sets how modes are"
                + " analysed at a frequency", "solve", "--conductor", "gold");
    }

    @Test
    void plotsNeedABand() {
        assertUsageError("sectio: --plots draws curves over a band: use --band START:STOP:POINTS instead of --freq",
                "solve", "--freq", "10GHz", "--plots", "out");
    }

    @Test
    void anUnknownMetalListsTheKnownOnes() {
        CapturedRun run = CapturedRun.of("solve", "--freq", "10GHz", "--conductor", "unobtainium");
        assertOneLineUsageError(run);
        assertTrue(run.err().startsWith("sectio: --conductor unobtainium: unknown conductor"), run.err());
        assertTrue(run.err().contains("copper"), run.err());
    }

    @Test
    void aRoughnessInAnUnknownUnitIsAUsageError() {
        CapturedRun run = CapturedRun.of("solve", "--freq", "10GHz", "--roughness", "2 furlongs");
        assertOneLineUsageError(run);
        assertTrue(run.err().startsWith("sectio: --roughness 2 furlongs: unknown unit"), run.err());
    }

    @Test
    void aDeratingBelowOneIsAUsageError() {
        CapturedRun run = CapturedRun.of("solve", "--freq", "10GHz", "--derating", "0.5");
        assertOneLineUsageError(run);
        assertTrue(run.err().startsWith("sectio: --derating 0.5: field derating must be finite and ≥ 1"), run.err());
    }

    @Test
    void aVoltagePathWithOneEndIsAUsageError() {
        CapturedRun run = CapturedRun.of("solve", "--freq", "10GHz", "--voltage-path", "11.43,0");
        assertOneLineUsageError(run);
        assertTrue(run.err().startsWith("sectio: --voltage-path 11.43,0: expected X1,Y1:X2,Y2 in mm"), run.err());
    }

    @Test
    void aJunctionNeedsAFrequency() {
        CapturedRun run = CapturedRun.of("junction", "a.json", "b.json");
        assertOneLineUsageError(run);
        assertTrue(run.err().contains("--freq"), run.err());
    }

    @Test
    void aJunctionWithAMissingFileSaysWhichFile() {
        CapturedRun run = CapturedRun.of("junction", "no-such-a.json", "no-such-b.json", "--freq", "10GHz");
        assertOneLineUsageError(run);
        assertTrue(run.err().contains("no-such-a.json': no such file"), run.err());
    }

    private static void assertUsageError(String expectedLine, String... args) {
        CapturedRun run = CapturedRun.of(args);
        assertOneLineUsageError(run);
        assertEquals(expectedLine + System.lineSeparator(), run.err());
    }

    private static void assertOneLineUsageError(CapturedRun run) {
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out());
        assertEquals(1, run.err().lines().count(), run.err());
        assertFalse(run.err().contains("Exception"), run.err());
        assertFalse(run.err().contains("at org."), run.err());
    }
}
