package org.sectio.io;

import java.nio.file.Path;

/**
 * A Matrix Market file does not follow the format (NISTIR 5935, 1996) or is not the kind of matrix
 * asked for; the message names the file and the 1-based line.
 */
public final class MatrixMarketFormatException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final int lineNumber;

    /**
     * @param file the file being read
     * @param lineNumber the offending line, 1-based (0 if the problem is the end of the file)
     * @param problem what is wrong and what was expected
     */
    public MatrixMarketFormatException(Path file, int lineNumber, String problem) {
        super(file + (lineNumber > 0 ? ", line " + lineNumber : ", at end of file") + ": " + problem);
        this.lineNumber = lineNumber;
    }

    /** @return the offending line, 1-based, or 0 for a problem at the end of the file */
    public int lineNumber() {
        return lineNumber;
    }
}
