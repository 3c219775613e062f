package org.sectio.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/**
 * One in-process run of the command line with its output and errors captured.
 *
 * @param exitCode the exit code
 * @param out what went to standard output
 * @param err what went to standard error
 */
record CapturedRun(int exitCode, String out, String err) {

    static CapturedRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = SectioMain.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new CapturedRun(code, out.toString(), err.toString());
    }
}
