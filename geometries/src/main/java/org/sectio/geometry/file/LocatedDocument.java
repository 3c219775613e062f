package org.sectio.geometry.file;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.util.HashMap;
import java.util.Map;

/**
 * A JSON document read into Jackson's tree model together with where each value and each key began
 * in the text, so that a later check can point at the line and column of what it rejects.
 *
 * <p>NaN and Infinity are accepted as numbers here so that the checks can reject them with a plain
 * message; duplicate keys and content after the top-level value are rejected while reading.
 *
 * <p>Public, with {@link SectionNode}, so that the project's other JSON inputs (sweep files) locate
 * their faults the same way.
 */
public final class LocatedDocument {

    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .build();

    private final String file;
    private final JsonNode root;
    private final Map<DocumentPath, JsonLocation> valueStarts;
    private final Map<DocumentPath, JsonLocation> keyStarts;

    private LocatedDocument(String file, JsonNode root, Map<DocumentPath, JsonLocation> valueStarts,
                            Map<DocumentPath, JsonLocation> keyStarts) {
        this.file = file;
        this.root = root;
        this.valueStarts = Map.copyOf(valueStarts);
        this.keyStarts = Map.copyOf(keyStarts);
    }

    /**
     * @param file the file name to put in messages
     * @param text the whole document
     * @throws SectionFileException if the text is not one well-formed JSON value
     */
    public static LocatedDocument parse(String file, String text) throws SectionFileException {
        Reading reading = new Reading();
        try (JsonParser parser = FACTORY.createParser(text)) {
            JsonToken first = parser.nextToken();
            if (first == null) {
                throw new SectionFileException(file, 1, 1, "$", "the file is empty, expected a JSON object");
            }
            JsonNode root = reading.value(parser, DocumentPath.ROOT);
            reading.at = DocumentPath.ROOT;
            if (parser.nextToken() != null) {
                JsonLocation where = parser.currentTokenLocation();
                throw new SectionFileException(file, where.getLineNr(), where.getColumnNr(), "$",
                        "unexpected text after the end of the top-level value");
            }
            return new LocatedDocument(file, root, reading.values, reading.keys);
        } catch (JsonProcessingException e) {
            JsonLocation where = e.getLocation();
            int line = where == null ? 1 : Math.max(1, where.getLineNr());
            int column = where == null ? 1 : Math.max(1, where.getColumnNr());
            throw new SectionFileException(file, line, column, reading.at.toString(),
                    "not valid JSON: " + e.getOriginalMessage());
        } catch (IOException e) {
            throw new SectionFileException(file, 1, 1, "$", "cannot be read: " + e.getMessage());
        }
    }

    /** @return the file name used in messages */
    public String file() {
        return file;
    }

    /** @return the top-level value */
    JsonNode root() {
        return root;
    }

    /** @return an error located at the start of the value at {@code path} */
    SectionFileException errorAtValue(DocumentPath path, String problem) {
        return errorAt(valueStarts.get(path), path, problem);
    }

    /**
     * @return an error located at the {@code column}-th character (1-based) of the string value at
     *     {@code path}; exact when the string holds no escape sequences (expressions need none)
     */
    SectionFileException errorInsideString(DocumentPath path, int column, String problem) {
        JsonLocation where = valueStarts.get(path);
        int line = where == null ? 1 : where.getLineNr();
        int start = where == null ? 1 : where.getColumnNr();
        return new SectionFileException(file, line, start + column, path.toString(), problem);
    }

    /** @return an error located at the key that introduces {@code path} (or its value) */
    SectionFileException errorAtKey(DocumentPath path, String problem) {
        JsonLocation where = keyStarts.get(path);
        return errorAt(where != null ? where : valueStarts.get(path), path, problem);
    }

    private SectionFileException errorAt(JsonLocation where, DocumentPath path, String problem) {
        int line = where == null ? 1 : where.getLineNr();
        int column = where == null ? 1 : where.getColumnNr();
        return new SectionFileException(file, line, column, path.toString(), problem);
    }

    /** One pass over the tokens, building the tree and noting locations. */
    private static final class Reading {
        private final JsonNodeFactory nodes = JsonNodeFactory.instance;
        private final Map<DocumentPath, JsonLocation> values = new HashMap<>();
        private final Map<DocumentPath, JsonLocation> keys = new HashMap<>();
        private DocumentPath at = DocumentPath.ROOT;

        /** Reads the value whose first token is current. */
        JsonNode value(JsonParser parser, DocumentPath path) throws IOException {
            at = path;
            values.put(path, parser.currentTokenLocation());
            JsonToken token = parser.currentToken();
            switch (token) {
                case START_OBJECT:
                    ObjectNode object = nodes.objectNode();
                    while (parser.nextToken() == JsonToken.FIELD_NAME) {
                        String name = parser.currentName();
                        DocumentPath child = path.key(name);
                        at = child;
                        keys.put(child, parser.currentTokenLocation());
                        parser.nextToken();
                        object.set(name, value(parser, child));
                        at = path;
                    }
                    return object;
                case START_ARRAY:
                    ArrayNode array = nodes.arrayNode();
                    int index = 0;
                    while (parser.nextToken() != JsonToken.END_ARRAY) {
                        array.add(value(parser, path.element(index++)));
                        at = path;
                    }
                    return array;
                case VALUE_STRING:
                    return nodes.textNode(parser.getText());
                case VALUE_NUMBER_INT:
                    return nodes.numberNode(parser.getBigIntegerValue());
                case VALUE_NUMBER_FLOAT:
                    return nodes.numberNode(parser.getDoubleValue());
                case VALUE_TRUE:
                case VALUE_FALSE:
                    return nodes.booleanNode(token == JsonToken.VALUE_TRUE);
                case VALUE_NULL:
                    return nodes.nullNode();
                default:
                    throw new IllegalStateException("unexpected JSON token " + token);
            }
        }
    }
}
