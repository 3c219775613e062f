package org.sectio.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;

/**
 * Checks, before a long solve, that the places results will be written to can be used, so that a
 * bad path is reported at once as a usage error rather than after the work is done.
 */
final class OutputPlaces {

    private OutputPlaces() {
    }

    /**
     * @param option the option naming the file, for the message
     * @param file a file to be created or replaced
     * @throws CommandLine.ParameterException if its folder is missing or not writable, or it is a folder
     */
    static void checkFile(String option, Path file, CommandSpec spec) {
        Path folder = file.toAbsolutePath().getParent();
        if (Files.isDirectory(file)) {
            throw problem(spec, option + " " + file + ": is a folder, expected a file name");
        }
        if (folder == null || !Files.isDirectory(folder)) {
            throw problem(spec, option + " " + file + ": the folder '" + folder + "' does not exist");
        }
        if (!Files.isWritable(folder)) {
            throw problem(spec, option + " " + file + ": the folder '" + folder + "' is not writable");
        }
    }

    /**
     * Creates the folder (and its parents) if missing.
     *
     * @param option the option naming the folder, for the message
     * @param folder the folder results go into
     * @throws CommandLine.ParameterException if it cannot be created or written to
     */
    static void prepareFolder(String option, Path folder, CommandSpec spec) {
        if (Files.exists(folder) && !Files.isDirectory(folder)) {
            throw problem(spec, option + " " + folder + ": exists and is not a folder");
        }
        try {
            Files.createDirectories(folder);
        } catch (IOException e) {
            throw problem(spec, option + " " + folder + ": cannot create the folder: " + ErrorReporter.describe(e));
        }
        if (!Files.isWritable(folder)) {
            throw problem(spec, option + " " + folder + ": the folder is not writable");
        }
    }

    private static CommandLine.ParameterException problem(CommandSpec spec, String message) {
        return new CommandLine.ParameterException(spec.commandLine(), message);
    }
}
