package org.sectio.geometry.svg;

/**
 * Reads the {@code d} attribute of an SVG path as specified in SVG 1.1, §8.3 "Path data", with the
 * grammar of §8.3.9: commands M m L l H h V v C c S s Q q T t A a Z z, implicit repetition of a
 * command's arguments (§8.3.2; extra pairs after M/m are L/l), numbers in every form the grammar
 * allows ({@code 1e-3}, {@code .5}, {@code -.5}, {@code 0.5.5} = 0.5 0.5, {@code 1-2} = 1 −2), comma
 * or white space between numbers, and arc flags written as single characters ({@code 0 1} or
 * {@code 01}). Relative coordinates are resolved here; the receiver sees absolute ones.
 */
final class PathDataReader {

    private static final String COMMANDS = "MmLlHhVvCcSsQqTtAaZz";

    private final String d;
    private final PathSink sink;
    private int at;
    private double x;
    private double y;
    private double startX;
    private double startY;
    /** The second control point of the previous C/S (or the control point of Q/T), for S and T. */
    private double controlX;
    private double controlY;
    private char previous = ' ';

    private PathDataReader(String d, PathSink sink) {
        this.d = d;
        this.sink = sink;
    }

    /**
     * Reads the whole path data, passing each command to {@code sink}.
     *
     * @param d the path data
     * @param sink the receiver
     * @throws SvgPathException at the first character that does not fit the grammar, or from the sink
     */
    static void read(String d, PathSink sink) throws SvgPathException {
        new PathDataReader(d, sink).readAll();
    }

    private void readAll() throws SvgPathException {
        skipSpace();
        if (at == d.length()) {
            throw new SvgPathException(1, "empty path data, expected a path starting with M or m");
        }
        if (Character.toLowerCase(d.charAt(at)) != 'm') {
            throw new SvgPathException(at + 1, "path data must begin with a moveto (M or m), got \""
                    + d.charAt(at) + "\"");
        }
        while (true) {
            skipSpace();
            if (at == d.length()) {
                return;
            }
            char c = d.charAt(at);
            if (startsNumber(c)) {
                throw new SvgPathException(at + 1, "a number where a command letter belongs (after \""
                        + previous + "\"), expected one of M L H V C S Q T A Z");
            }
            if (COMMANDS.indexOf(c) < 0) {
                throw new SvgPathException(at + 1, "unknown path command \"" + c
                        + "\", expected one of M L H V C S Q T A Z (or their lower-case relative forms)");
            }
            int position = at + 1;
            at++;
            command(c, position);
        }
    }

    /** One command letter and all its argument groups (implicit repetition). */
    private void command(char c, int position) throws SvgPathException {
        if (c == 'Z' || c == 'z') {
            sink.closePath(position);
            x = startX;
            y = startY;
            previous = c;
            return;
        }
        boolean first = true;
        do {
            int groupPosition = first ? position : at + 1;
            char effective = !first && (c == 'M' || c == 'm') ? (c == 'M' ? 'L' : 'l') : c;
            group(effective, groupPosition);
            first = false;
            skipCommaSpace();
        } while (at < d.length() && startsNumber(d.charAt(at)));
    }

    private void group(char c, int position) throws SvgPathException {
        boolean relative = Character.isLowerCase(c);
        double ox = relative ? x : 0;
        double oy = relative ? y : 0;
        char upper = Character.toUpperCase(c);
        switch (upper) {
            case 'M' -> {
                x = ox + number(c, "x");
                y = oy + number(c, "y");
                startX = x;
                startY = y;
                sink.moveTo(x, y, position);
            }
            case 'L' -> {
                x = ox + number(c, "x");
                y = oy + number(c, "y");
                sink.lineTo(x, y, position);
            }
            case 'H' -> {
                x = ox + number(c, "x");
                sink.lineTo(x, y, position);
            }
            case 'V' -> {
                y = (relative ? y : 0) + number(c, "y");
                sink.lineTo(x, y, position);
            }
            case 'C', 'S' -> {
                double x1;
                double y1;
                if (upper == 'C') {
                    x1 = ox + number(c, "x1");
                    y1 = oy + number(c, "y1");
                } else {
                    boolean follows = "CcSs".indexOf(previous) >= 0;
                    x1 = follows ? 2 * x - controlX : x;
                    y1 = follows ? 2 * y - controlY : y;
                }
                double x2 = ox + number(c, "x2");
                double y2 = oy + number(c, "y2");
                double ex = ox + number(c, "x");
                double ey = oy + number(c, "y");
                sink.cubicTo(x1, y1, x2, y2, ex, ey, position);
                controlX = x2;
                controlY = y2;
                x = ex;
                y = ey;
            }
            case 'Q', 'T' -> {
                double x1;
                double y1;
                if (upper == 'Q') {
                    x1 = ox + number(c, "x1");
                    y1 = oy + number(c, "y1");
                } else {
                    boolean follows = "QqTt".indexOf(previous) >= 0;
                    x1 = follows ? 2 * x - controlX : x;
                    y1 = follows ? 2 * y - controlY : y;
                }
                double ex = ox + number(c, "x");
                double ey = oy + number(c, "y");
                sink.quadraticTo(x1, y1, ex, ey, position);
                controlX = x1;
                controlY = y1;
                x = ex;
                y = ey;
            }
            case 'A' -> {
                double rx = number(c, "rx");
                double ry = number(c, "ry");
                double rotation = number(c, "x-axis-rotation");
                boolean large = flag(c, "large-arc-flag");
                boolean sweep = flag(c, "sweep-flag");
                double ex = ox + number(c, "x");
                double ey = oy + number(c, "y");
                sink.arcTo(rx, ry, rotation, large, sweep, ex, ey, position);
                x = ex;
                y = ey;
            }
            default -> throw new IllegalStateException("command " + c);
        }
        previous = c;
    }

    /** Reads one number of the §8.3.9 grammar, after optional comma and white space. */
    private double number(char command, String what) throws SvgPathException {
        skipCommaSpace();
        int begin = at;
        if (at < d.length() && (d.charAt(at) == '+' || d.charAt(at) == '-')) {
            at++;
        }
        int digits = digits();
        if (at < d.length() && d.charAt(at) == '.') {
            at++;
            digits += digits();
        }
        if (digits == 0) {
            at = begin;
            throw missing(command, what);
        }
        if (at < d.length() && (d.charAt(at) == 'e' || d.charAt(at) == 'E')) {
            int mark = at;
            at++;
            if (at < d.length() && (d.charAt(at) == '+' || d.charAt(at) == '-')) {
                at++;
            }
            if (digits() == 0) {
                throw new SvgPathException(mark + 1, "an exponent without digits in the " + what
                        + " of command \"" + command + "\", expected e.g. 1e-3");
            }
        }
        return Double.parseDouble(d.substring(begin, at));
    }

    /** Reads an arc flag: the single character 0 or 1 (§8.3.9 "flag"). */
    private boolean flag(char command, String what) throws SvgPathException {
        skipCommaSpace();
        if (at < d.length() && (d.charAt(at) == '0' || d.charAt(at) == '1')) {
            return d.charAt(at++) == '1';
        }
        if (at == d.length()) {
            throw missing(command, what);
        }
        throw new SvgPathException(at + 1, "the " + what + " of command \"" + command + "\" must be 0 or 1, got \""
                + d.charAt(at) + "\"");
    }

    private SvgPathException missing(char command, String what) {
        String got = at == d.length() ? "the end of the path data" : "\"" + d.charAt(at) + "\"";
        return new SvgPathException(at + 1, "command \"" + command + "\" is missing its " + what
                + ", expected a number, got " + got);
    }

    private int digits() {
        int begin = at;
        while (at < d.length() && d.charAt(at) >= '0' && d.charAt(at) <= '9') {
            at++;
        }
        return at - begin;
    }

    private static boolean startsNumber(char c) {
        return (c >= '0' && c <= '9') || c == '.' || c == '-' || c == '+';
    }

    private void skipSpace() {
        while (at < d.length() && isSpace(d.charAt(at))) {
            at++;
        }
    }

    private void skipCommaSpace() {
        skipSpace();
        if (at < d.length() && d.charAt(at) == ',') {
            at++;
            skipSpace();
        }
    }

    private static boolean isSpace(char c) {
        return c == ' ' || c == '\t' || c == '\r' || c == '\n';
    }
}
