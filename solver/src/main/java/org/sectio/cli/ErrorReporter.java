package org.sectio.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.CharacterCodingException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;
import org.sectio.geometry.file.SectionFileException;
import org.sectio.modes.SolveException;
import picocli.CommandLine;

/**
 * Turns every failure of a command into exactly one line on the error stream, {@code sectio: <what
 * and where>}, and an exit code: {@value #USAGE} when the request itself is wrong (options, input
 * files, output places), {@value #FAILURE} when the solve or writing its results failed. Never a
 * stack trace.
 */
final class ErrorReporter implements CommandLine.IParameterExceptionHandler, CommandLine.IExecutionExceptionHandler {

    /** Exit code for a request that cannot be carried out as given. */
    static final int USAGE = 2;
    /** Exit code for a solve or an output that failed. */
    static final int FAILURE = 1;

    @Override
    public int handleParseException(CommandLine.ParameterException problem, String[] args) {
        String message = problem.getMessage() == null ? "invalid command line" : problem.getMessage();
        report(problem.getCommandLine(), message.startsWith("Error: ") ? message.substring(7) : message);
        return USAGE;
    }

    @Override
    public int handleExecutionException(Exception problem, CommandLine command, CommandLine.ParseResult parsed) {
        if (problem instanceof SectionFileException || problem instanceof IllegalArgumentException) {
            report(command, problem.getMessage());
            return USAGE;
        }
        if (problem instanceof SolveException) {
            report(command, problem.getMessage());
            return FAILURE;
        }
        if (problem instanceof IOException io) {
            report(command, describe(io));
            return FAILURE;
        }
        report(command, "internal error (" + problem.getClass().getSimpleName() + "): " + problem.getMessage());
        return FAILURE;
    }

    /**
     * @param problem a failed file operation
     * @return what failed and where, in plain words
     */
    static String describe(IOException problem) {
        if (problem instanceof CharacterCodingException) {
            return "a text could not be written: it holds a character the file's encoding cannot represent";
        }
        if (problem instanceof FileSystemException fs && fs.getFile() != null) {
            String where = "'" + fs.getFile() + "'";
            if (problem instanceof NoSuchFileException) {
                return where + ": no such file or folder";
            } else if (problem instanceof AccessDeniedException) {
                return where + ": permission denied";
            } else if (problem instanceof FileAlreadyExistsException) {
                return where + ": already exists and is not a folder";
            } else if (problem instanceof NotDirectoryException) {
                return where + ": not a folder";
            }
            return where + ": " + (fs.getReason() != null ? fs.getReason() : "cannot be used");
        }
        return problem.getMessage() != null ? problem.getMessage() : "input/output failure";
    }

    private static void report(CommandLine command, String message) {
        PrintWriter err = command.getErr();
        String flat = message == null ? "failed" : message.replaceAll("\\s*[\\r\\n]+\\s*", " ").strip();
        err.println("sectio: " + flat);
        err.flush();
    }
}
