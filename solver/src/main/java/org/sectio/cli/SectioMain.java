package org.sectio.cli;

import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.Callable;
import java.util.logging.Level;
import java.util.logging.Logger;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * The {@code sectio} command line: {@code sectio solve [FILE] [options]}, {@code sectio --help},
 * {@code sectio --version}. Exit codes: 0 done, {@value ErrorReporter#USAGE} for a request that
 * cannot be carried out as given (options, input file, output places), {@value ErrorReporter#FAILURE}
 * for a solve or output that failed. Every error is one line on stderr starting with {@code sectio: }.
 */
@Command(name = "sectio", mixinStandardHelpOptions = true, versionProvider = SectioMain.Version.class,
        subcommands = {SolveCommand.class, JunctionCommand.class, SweepCommand.class, MergeCommand.class,
            SizeCommand.class, ToleranceCommand.class, CornerStudyCommand.class},
        description = "Finds the guided modes (TE and TM cutoffs and field patterns) of hollow metal waveguides.",
        footer = {"", "Exit codes: 0 done, 2 the request cannot be carried out as given, 1 the solve or an output failed."})
public final class SectioMain implements Callable<Integer> {

    /** Held so that the logger keeps its level: library log records would break the one-line error rule. */
    private static final Logger LIBRARY_LOG = Logger.getLogger("dev.ludovic.netlib");

    @Spec
    private CommandSpec spec;

    /**
     * Runs the command line and exits the Java process with its exit code.
     *
     * @param args the arguments as given by the shell
     */
    public static void main(String[] args) {
        System.setProperty("java.awt.headless", "true");
        LIBRARY_LOG.setLevel(Level.OFF);
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        int code = run(out, err, args);
        out.flush();
        err.flush();
        System.exit(code);
    }

    /**
     * Runs the command line in this process, without exiting.
     *
     * @param out where results and help go
     * @param err where errors and progress go
     * @param args the arguments
     * @return the exit code
     */
    public static int run(PrintWriter out, PrintWriter err, String... args) {
        return commandLine(out, err).execute(args);
    }

    /**
     * @param out where results and help go
     * @param err where errors and progress go
     * @return the configured picocli command line, ready to {@code execute}
     */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        ErrorReporter reporter = new ErrorReporter();
        CommandLine line = new CommandLine(new SectioMain());
        line.setCaseInsensitiveEnumValuesAllowed(true);
        line.setOut(out);
        line.setErr(err);
        line.setParameterExceptionHandler(reporter);
        line.setExecutionExceptionHandler(reporter);
        return line;
    }

    @Override
    public Integer call() {
        throw new CommandLine.ParameterException(spec.commandLine(),
                "missing command: use 'sectio solve [FILE]', or 'sectio --help' to list the commands");
    }

    /** Reports the version from the jar manifest. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String version = SectioMain.class.getPackage().getImplementationVersion();
            return new String[] {"sectio " + (version != null ? version : "(development build)")};
        }
    }
}
