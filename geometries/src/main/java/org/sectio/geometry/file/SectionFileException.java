package org.sectio.geometry.file;

/**
 * A geometry file that cannot be read as a cross-section. The message is one line,
 * {@code <file>:<line>:<column>: <JSON path>: <what is wrong and what was expected>}, e.g.
 * {@code feed.json:4:23: $.wall.rectangle.width: must be a positive length, got -2}.
 */
public final class SectionFileException extends Exception {

    private static final long serialVersionUID = 1L;

    private final String file;
    private final int line;
    private final int column;
    private final String jsonPath;
    private final String problem;

    /**
     * @param file the file as the user named it
     * @param line 1-based line of the offending text
     * @param column 1-based column of the offending text
     * @param jsonPath where in the document, e.g. {@code $.wall.circle.radius}
     * @param problem what is wrong and what was expected, one line
     */
    public SectionFileException(String file, int line, int column, String jsonPath, String problem) {
        super(file + ":" + line + ":" + column + ": " + jsonPath + ": " + oneLine(problem));
        this.file = file;
        this.line = line;
        this.column = column;
        this.jsonPath = jsonPath;
        this.problem = oneLine(problem);
    }

    /** @return the file as the user named it */
    public String file() {
        return file;
    }

    /** @return the 1-based line of the offending text */
    public int line() {
        return line;
    }

    /** @return the 1-based column of the offending text */
    public int column() {
        return column;
    }

    /** @return where in the document, e.g. {@code $.wall.outline.steps[2]} */
    public String jsonPath() {
        return jsonPath;
    }

    /** @return what is wrong and what was expected, without the location */
    public String problem() {
        return problem;
    }

    private static String oneLine(String text) {
        String flat = text == null ? "unreadable" : text.replaceAll("\\s*[\\r\\n]+\\s*", " ").strip();
        return flat.isEmpty() ? "unreadable" : flat;
    }
}
