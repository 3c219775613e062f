package org.sectio.geometry.file;

import com.fasterxml.jackson.databind.JsonNode;
import org.sectio.geometry.expr.Expression;
import org.sectio.geometry.expr.ExpressionException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * One value of a geometry file with its place in the document, offering the typed reads the shape
 * checks need. Every read that fails throws a {@link SectionFileException} pointing at the offending
 * text (or, for a missing key, at the object that lacks it). A number may also be written as an
 * expression string over the file's parameters (see {@link Expression}); its faults point at the
 * character inside the string.
 *
 * <p>Public so that the project's other JSON inputs (sweep files) read values and report faults the
 * same way, {@code file:line:column: $.path: problem}.
 */
public final class SectionNode {

    private final LocatedDocument document;
    private final DocumentPath path;
    private final JsonNode node;
    private final Scope scope;

    SectionNode(LocatedDocument document, DocumentPath path, JsonNode node, Scope scope) {
        this.document = document;
        this.path = path;
        this.node = node;
        this.scope = scope;
    }

    /** @return the top-level value of a document, read in millimetres without parameters */
    public static SectionNode root(LocatedDocument document) {
        return new SectionNode(document, DocumentPath.ROOT, document.root(), Scope.DEFAULT);
    }

    /** @return this value read against another unit and parameters (its children inherit them) */
    SectionNode within(Scope newScope) {
        return new SectionNode(document, path, node, newScope);
    }

    /** @return the unit and parameters this value is read against */
    Scope scope() {
        return scope;
    }

    /** @return the unit of lengths */
    LengthUnit unit() {
        return scope.unit();
    }

    /** @return whether this value is a string */
    public boolean isText() {
        return node.isTextual();
    }

    /** @return whether this value is a number */
    public boolean isNumber() {
        return node.isNumber();
    }

    /** @return an error pointing at the {@code column}-th character (1-based) inside this string value */
    SectionFileException problemInText(int column, String text) {
        return document.errorInsideString(path, column, text);
    }

    /**
     * @return this string parsed as an expression
     * @throws SectionFileException at the character of the syntax fault
     */
    Expression expression() throws SectionFileException {
        String text = text();
        try {
            return Expression.parse(text);
        } catch (ExpressionException e) {
            throw problemInText(e.column(), "in the expression \"" + text + "\" at character " + e.column()
                    + ": " + e.problem());
        }
    }

    /** @return where this value is, e.g. {@code $.wall.circle} */
    DocumentPath path() {
        return path;
    }

    /** @return an error pointing at this value */
    public SectionFileException problem(String text) {
        return document.errorAtValue(path, text);
    }

    /** @throws SectionFileException unless this is an object */
    public SectionNode requireObject(String expected) throws SectionFileException {
        if (!node.isObject()) {
            throw problem("expected " + expected + ", got " + describe(node));
        }
        return this;
    }

    /**
     * Rejects keys of this object other than {@code allowed}.
     *
     * @throws SectionFileException at the first unknown key
     */
    public void allowOnly(String... allowed) throws SectionFileException {
        Set<String> known = Set.of(allowed);
        Iterator<String> names = node.fieldNames();
        while (names.hasNext()) {
            String name = names.next();
            if (!known.contains(name)) {
                throw document.errorAtKey(path.key(name), "unknown key \"" + name + "\", expected one of "
                        + quoted(allowed));
            }
        }
    }

    /** @return whether this object has the key */
    public boolean has(String key) {
        return node.has(key);
    }

    /** @return the names of this object's keys, in file order */
    public List<String> keys() {
        List<String> names = new ArrayList<>();
        node.fieldNames().forEachRemaining(names::add);
        return names;
    }

    /** @throws SectionFileException if the key is absent */
    public SectionNode get(String key) throws SectionFileException {
        if (!node.has(key)) {
            throw problem("missing key \"" + key + "\"");
        }
        return new SectionNode(document, path.key(key), node.get(key), scope);
    }

    /** @return the text of this string value */
    public String text() throws SectionFileException {
        if (!node.isTextual()) {
            throw problem("expected a string, got " + describe(node));
        }
        return node.textValue();
    }

    /**
     * @return this finite number, or the value of this expression string over the parameters
     * @throws SectionFileException if it is neither, if the expression does not parse or evaluate
     *     (pointing at the character inside the string), or if the value is not finite
     */
    public double number() throws SectionFileException {
        double value;
        if (node.isTextual()) {
            Expression expression = expression();
            try {
                value = expression.evaluate(scope.parameters());
            } catch (ExpressionException e) {
                throw problemInText(e.column(), "in the expression \"" + node.textValue() + "\" at character "
                        + e.column() + ": " + e.problem());
            }
        } else if (node.isNumber()) {
            value = node.doubleValue();
        } else {
            throw problem("expected a number or an expression string, got " + describe(node));
        }
        if (!Double.isFinite(value)) {
            throw problem("expected a finite number, got " + value);
        }
        return value;
    }

    /** @return how this value was written, for messages: the number, or the expression and its value */
    private String written(double value) {
        return node.isTextual() ? "\"" + node.textValue() + "\" = " + value : node.asText();
    }

    /** @return this number, a length in the file's unit, converted to metres; must be &gt; 0 */
    double positiveLength() throws SectionFileException {
        double value = number();
        if (!(value > 0)) {
            throw problem("must be a positive length in " + unit().keyword() + ", got " + written(value));
        }
        return unit().toMetres(value);
    }

    /** @return this number, a length in the file's unit, converted to metres; must be ≥ 0 */
    double nonNegativeLength() throws SectionFileException {
        double value = number();
        if (!(value >= 0)) {
            throw problem("must be a length ≥ 0 in " + unit().keyword() + ", got " + written(value));
        }
        return unit().toMetres(value);
    }

    /** @return this number, a length of either sign in the file's unit, converted to metres */
    double length() throws SectionFileException {
        return unit().toMetres(number());
    }

    /** @return this number, which must lie in [min, max] (what it is, for the message) */
    public double numberIn(double min, double max, String what) throws SectionFileException {
        double value = number();
        if (!(value >= min && value <= max)) {
            throw problem("expected " + what + ", got " + written(value));
        }
        return value;
    }

    /** @return this boolean */
    public boolean bool() throws SectionFileException {
        if (!node.isBoolean()) {
            throw problem("expected true or false, got " + describe(node));
        }
        return node.booleanValue();
    }

    /** @return this {@code [x, y]} pair in the file's unit, converted to metres */
    double[] point() throws SectionFileException {
        List<SectionNode> pair = elements("a point [x, y]");
        if (pair.size() != 2) {
            throw problem("expected a point [x, y] of two numbers, got " + pair.size() + " numbers");
        }
        return new double[] {pair.get(0).length(), pair.get(1).length()};
    }

    /** @return the elements of this array */
    public List<SectionNode> elements(String expected) throws SectionFileException {
        if (!node.isArray()) {
            throw problem("expected " + expected + ", got " + describe(node));
        }
        List<SectionNode> items = new ArrayList<>(node.size());
        for (int i = 0; i < node.size(); i++) {
            items.add(new SectionNode(document, path.element(i), node.get(i), scope));
        }
        return items;
    }

    /** @return what this value is, for messages, e.g. {@code an array} or {@code the number 2} */
    public String described() {
        return describe(node);
    }

    static String describe(JsonNode value) {
        if (value.isObject()) {
            return "an object";
        } else if (value.isArray()) {
            return "an array";
        } else if (value.isTextual()) {
            return "the string \"" + value.textValue() + "\"";
        } else if (value.isNull()) {
            return "null";
        } else if (value.isBoolean()) {
            return value.asText();
        }
        return "the number " + value.asText();
    }

    static String quoted(String... words) {
        return Arrays.stream(words).map(w -> "\"" + w + "\"").collect(Collectors.joining(", "));
    }
}
