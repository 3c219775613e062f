package org.sectio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Command-line behaviour that is settled before any solve starts: help, version and every usage error. */
class SectioCommandLineTest {

    @TempDir
    Path folder;

    @Test
    void solveHelpMentionsEveryOption() {
        CapturedRun run = CapturedRun.of("solve", "--help");
        assertEquals(0, run.exitCode());
        for (String option : List.of("FILE", "-n,", "--modes", "--family", "--cells", "--accuracy", "--no-estimate",
                "--threads", "--format", "-o,", "--output", "--fields", "--image-width", "--pencil", "--help",
                "--version", "WR-90", "Exit codes")) {
            assertTrue(run.out().contains(option), "help lacks " + option + ":\n" + run.out());
        }
        assertEquals("", run.err());
    }

    @Test
    void topLevelHelpListsTheSolveCommand() {
        CapturedRun run = CapturedRun.of("--help");
        assertEquals(0, run.exitCode());
        assertTrue(run.out().startsWith("Usage: sectio "), run.out());
        assertTrue(run.out().contains("solve"), run.out());
    }

    @Test
    void versionNamesTheProgram() {
        CapturedRun run = CapturedRun.of("--version");
        assertEquals(0, run.exitCode());
        assertTrue(run.out().startsWith("sectio "), run.out());
    }

    @Test
    void noCommandIsAUsageError() {
        assertUsageError("sectio: missing command: use 'sectio solve [FILE]', or 'sectio --help' to list the commands");
    }

    @Test
    void anUnknownOptionIsAUsageError() {
        assertUsageError("sectio: Unknown option: '--speed'", "solve", "--speed");
    }

    @Test
    void cellsThatAreNotANumberAreAUsageError() {
        assertUsageError("sectio: Invalid value for option '--cells': 'many' is not an int", "solve", "--cells", "many");
    }

    @Test
    void zeroCellsAreRefusedWithTheAllowedRange() {
        assertUsageError("sectio: --cells 0: cells across must be 8 … 4000, got 0", "solve", "--cells", "0");
    }

    @Test
    void anAbsurdlyFineGridIsRefusedWithTheAllowedRange() {
        assertUsageError("sectio: --cells 100000: cells across must be 8 … 4000, got 100000",
                "solve", "--cells", "100000");
    }

    @Test
    void zeroModesAreRefused() {
        assertUsageError("sectio: --modes 0: number of modes must be 1 … 200, got 0", "solve", "-n", "0");
    }

    @Test
    void zeroThreadsAreRefused() {
        assertUsageError("sectio: --threads 0: threads must be at least 1, got 0", "solve", "--threads", "0");
    }

    @Test
    void anAccuracyOutsideTheRangeIsRefused() {
        assertUsageError("sectio: --accuracy 0.5: target relative error must be 1e-7 … 0.1, got 0.5",
                "solve", "--accuracy", "0.5");
    }

    @Test
    void cellsAndAccuracyTogetherAreAUsageError() {
        assertUsageError("sectio: --cells=N, --accuracy=REL are mutually exclusive (specify only one)",
                "solve", "--cells", "40", "--accuracy", "1e-4");
    }

    @Test
    void anUnknownFamilyIsAUsageErrorListingTheChoices() {
        CapturedRun run = CapturedRun.of("solve", "--family", "hybrid");
        assertOneLineUsageError(run);
        assertTrue(run.err().startsWith("sectio: Invalid value for option '--family': expected one of [TE, TM, BOTH]"),
                run.err());
    }

    @Test
    void anUnknownFormatIsAUsageError() {
        CapturedRun run = CapturedRun.of("solve", "--format", "xml");
        assertOneLineUsageError(run);
        assertTrue(run.err().startsWith("sectio: Invalid value for option '--format': expected one of [TABLE, CSV, JSON]"),
                run.err());
    }

    @Test
    void aMissingGeometryFileIsNamedInTheError() {
        Path missing = folder.resolve("absent.json");
        assertUsageError("sectio: cannot read geometry file: '" + missing + "': no such file or folder",
                "solve", missing.toString());
    }

    @Test
    void aFolderGivenAsGeometryFileIsRefused() {
        assertUsageError("sectio: geometry file '" + folder + "' is a folder, expected a JSON file",
                "solve", folder.toString());
    }

    @Test
    void brokenJsonIsReportedWithFileLineAndColumn() throws IOException {
        Path file = folder.resolve("broken.json");
        Files.writeString(file, "{\n  \"wall\": {\"circle\": {\"radius\": 5,}}\n}\n");
        CapturedRun run = CapturedRun.of("solve", file.toString());
        assertOneLineUsageError(run);
        assertTrue(run.err().startsWith("sectio: " + file + ":2:35: $.wall.circle: not valid JSON: "), run.err());
    }

    @Test
    void aZeroSizeInTheGeometryIsReportedWithItsPath() throws IOException {
        Path file = folder.resolve("flat.json");
        Files.writeString(file, "{\"wall\": {\"rectangle\": {\"width\": 22.86, \"height\": 0}}}");
        assertUsageError("sectio: " + file + ":1:51: $.wall.rectangle.height: must be a positive length in mm, got 0",
                "solve", file.toString());
    }

    @Test
    void anOutputIntoAMissingFolderIsRefusedBeforeSolving() {
        Path target = folder.resolve("no-such-folder").resolve("modes.txt");
        assertUsageError("sectio: --output " + target + ": the folder '" + target.getParent() + "' does not exist",
                "solve", "-o", target.toString());
    }

    @Test
    void anOutputThatIsAFolderIsRefused() {
        assertUsageError("sectio: --output " + folder + ": is a folder, expected a file name",
                "solve", "--output", folder.toString());
    }

    @Test
    void aFieldsFolderThatIsAFileIsRefused() throws IOException {
        Path file = Files.writeString(folder.resolve("taken"), "a file already here");
        assertUsageError("sectio: --fields " + file + ": exists and is not a folder", "solve", "--fields", file.toString());
        assertEquals("a file already here", Files.readString(file));
    }

    @Test
    void aFieldsFolderUnderAFileCannotBeCreated() throws IOException {
        Path file = Files.writeString(folder.resolve("plain"), "x");
        Path below = file.resolve("fields");
        CapturedRun run = CapturedRun.of("solve", "--fields", below.toString());
        assertOneLineUsageError(run);
        assertTrue(run.err().startsWith("sectio: --fields " + below + ": cannot create the folder: "), run.err());
    }

    @Test
    void aTinyImageWidthIsRefusedWhenFieldsAreAsked() {
        Path target = folder.resolve("fields");
        assertUsageError("sectio: --image-width 10: must be 200 … 8000 px", "solve", "--fields", target.toString(),
                "--image-width", "10");
    }

    @Test
    void pencilExportCannotBeCombinedWithATableFile() {
        assertUsageError("sectio: --pencil exports the matrices without solving; it cannot be combined with --output or"
                + " --fields", "solve", "--pencil", folder.resolve("m").toString(), "-o", folder.resolve("t").toString());
    }

    private void assertUsageError(String expectedLine, String... args) {
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
