package org.sectio.io;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;

/**
 * Numbers in Sectio's JSON output: JSON has no NaN or infinity, so such values are written as null;
 * finite values print the shortest decimal that reads back to the same double.
 */
final class JsonNumbers {

    private JsonNumbers() {
    }

    /**
     * @param node the object to add to
     * @param key the key
     * @param value the value, null in the JSON when not finite
     */
    static void put(ObjectNode node, String key, double value) {
        if (Double.isFinite(value)) {
            node.put(key, value);
        } else {
            node.putNull(key);
        }
    }

    /**
     * @param mapper an indenting mapper
     * @param root the tree
     * @return its text with '\n' line ends and a final newline
     */
    static String text(ObjectMapper mapper, ObjectNode root) {
        try {
            return mapper.writeValueAsString(root).replace("\r\n", "\n") + "\n";
        } catch (IOException e) {
            throw new IllegalStateException("a JSON tree of plain values could not be written", e);
        }
    }
}
