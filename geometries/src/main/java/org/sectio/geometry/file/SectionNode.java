package org.sectio.geometry.file;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * One value of a geometry file with its place in the document, offering the typed reads the shape
 * checks need. Every read that fails throws a {@link SectionFileException} pointing at the offending
 * text (or, for a missing key, at the object that lacks it).
 */
final class SectionNode {

    private final LocatedDocument document;
    private final DocumentPath path;
    private final JsonNode node;

    SectionNode(LocatedDocument document, DocumentPath path, JsonNode node) {
        this.document = document;
        this.path = path;
        this.node = node;
    }

    /** @return the top-level value of a document */
    static SectionNode root(LocatedDocument document) {
        return new SectionNode(document, DocumentPath.ROOT, document.root());
    }

    /** @return where this value is, e.g. {@code $.wall.circle} */
    DocumentPath path() {
        return path;
    }

    /** @return an error pointing at this value */
    SectionFileException problem(String text) {
        return document.errorAtValue(path, text);
    }

    /** @throws SectionFileException unless this is an object */
    SectionNode requireObject(String expected) throws SectionFileException {
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
    void allowOnly(String... allowed) throws SectionFileException {
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
    boolean has(String key) {
        return node.has(key);
    }

    /** @return the names of this object's keys, in file order */
    List<String> keys() {
        List<String> names = new ArrayList<>();
        node.fieldNames().forEachRemaining(names::add);
        return names;
    }

    /** @throws SectionFileException if the key is absent */
    SectionNode get(String key) throws SectionFileException {
        if (!node.has(key)) {
            throw problem("missing key \"" + key + "\"");
        }
        return new SectionNode(document, path.key(key), node.get(key));
    }

    /** @return the text of this string value */
    String text() throws SectionFileException {
        if (!node.isTextual()) {
            throw problem("expected a string, got " + describe(node));
        }
        return node.textValue();
    }

    /** @return this finite number */
    double number() throws SectionFileException {
        if (!node.isNumber()) {
            throw problem("expected a number, got " + describe(node));
        }
        double value = node.doubleValue();
        if (!Double.isFinite(value)) {
            throw problem("expected a finite number, got " + value);
        }
        return value;
    }

    /** @return this number, a length in {@code unit}, converted to metres; must be &gt; 0 */
    double positiveLength(LengthUnit unit) throws SectionFileException {
        double value = number();
        if (!(value > 0)) {
            throw problem("must be a positive length in " + unit.keyword() + ", got " + node.asText());
        }
        return unit.toMetres(value);
    }

    /** @return this {@code [x, y]} pair in {@code unit}, converted to metres */
    double[] point(LengthUnit unit) throws SectionFileException {
        List<SectionNode> pair = elements("a point [x, y]");
        if (pair.size() != 2) {
            throw problem("expected a point [x, y] of two numbers, got " + pair.size() + " numbers");
        }
        return new double[] {unit.toMetres(pair.get(0).number()), unit.toMetres(pair.get(1).number())};
    }

    /** @return the elements of this array */
    List<SectionNode> elements(String expected) throws SectionFileException {
        if (!node.isArray()) {
            throw problem("expected " + expected + ", got " + describe(node));
        }
        List<SectionNode> items = new ArrayList<>(node.size());
        for (int i = 0; i < node.size(); i++) {
            items.add(new SectionNode(document, path.element(i), node.get(i)));
        }
        return items;
    }

    private static String describe(JsonNode value) {
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
