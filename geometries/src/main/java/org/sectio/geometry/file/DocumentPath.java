package org.sectio.geometry.file;

import java.util.ArrayList;
import java.util.List;

/**
 * A position inside a JSON document, printed as a JSONPath (RFC 9535) in normalized form, e.g.
 * {@code $.wall.outline.steps[2].arc_to}. Immutable.
 */
record DocumentPath(List<Object> segments) {

    static final DocumentPath ROOT = new DocumentPath(List.of());

    DocumentPath {
        segments = List.copyOf(segments);
    }

    DocumentPath key(String name) {
        return append(name);
    }

    DocumentPath element(int index) {
        return append(index);
    }

    private DocumentPath append(Object segment) {
        List<Object> longer = new ArrayList<>(segments);
        longer.add(segment);
        return new DocumentPath(longer);
    }

    @Override
    public String toString() {
        StringBuilder text = new StringBuilder("$");
        for (Object segment : segments) {
            if (segment instanceof Integer index) {
                text.append('[').append(index).append(']');
            } else if (((String) segment).matches("[A-Za-z_][A-Za-z0-9_]*")) {
                text.append('.').append(segment);
            } else {
                text.append("['").append(((String) segment).replace("\\", "\\\\").replace("'", "\\'")).append("']");
            }
        }
        return text.toString();
    }
}
