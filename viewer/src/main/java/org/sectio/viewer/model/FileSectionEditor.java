package org.sectio.viewer.model;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import org.sectio.geometry.file.SectionFileException;
import org.sectio.geometry.file.SectionFiles;

/**
 * A geometry file in the form: its top-level {@code "parameters"} and the values of a {@code "family"}
 * guide are editable (numbers or expressions, in the file's units), and every edit re-reads the
 * edited document with {@link SectionFiles}, so the messages are the file reader's, as the command line
 * prints them. The file on disk is never changed.
 */
public final class FileSectionEditor extends SectionEditor {

    private static final ObjectMapper JSON = new ObjectMapper();

    private final Path file;
    private final String originalText;
    private final ObjectNode tree;
    private final List<ParameterEntry> original;

    private FileSectionEditor(Path file, String text, ObjectNode tree, List<ParameterEntry> entries) {
        super(file.getFileName().toString(), entries);
        this.file = file;
        this.originalText = text;
        this.tree = tree;
        this.original = List.copyOf(entries);
        rebuild();
    }

    /**
     * @param file a geometry file (JSON, docs/geometry-files.md)
     * @return an editor on it; when the file has a problem the editor holds the reader's message in
     *     {@link #generalError()} and no section
     * @throws IOException if the file cannot be read
     */
    public static FileSectionEditor open(Path file) throws IOException {
        if (Files.isDirectory(file)) {
            throw new IOException("geometry file '" + file + "' is a folder, expected a JSON file");
        }
        String text = Files.readString(file, StandardCharsets.UTF_8);
        ObjectNode tree = null;
        List<ParameterEntry> entries = new ArrayList<>();
        try {
            JsonNode root = JSON.readTree(text);
            if (root instanceof ObjectNode object) {
                tree = object;
                String units = object.path("units").asText("mm");
                collect(object.path("parameters"), "file parameter; lengths in " + units, entries);
                JsonNode family = object.path("family");
                if (family.isObject() && family.size() == 1) {
                    String name = family.fieldNames().next();
                    collect(family.get(name), name + " value; lengths in " + units, entries);
                }
            }
        } catch (JsonProcessingException notJson) {
            tree = null; // the reader's own message is shown by rebuild
        }
        return new FileSectionEditor(file, text, tree, entries);
    }

    /** @return the file being edited */
    public Path file() {
        return file;
    }

    private static void collect(JsonNode object, String description, List<ParameterEntry> into) {
        if (!object.isObject()) {
            return;
        }
        for (Iterator<Map.Entry<String, JsonNode>> it = object.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> field = it.next();
            JsonNode v = field.getValue();
            if (v.isNumber() || v.isTextual()) {
                into.add(new ParameterEntry(field.getKey(), description, "", v.isNumber() ? v.asText() : v.textValue(), ""));
            }
        }
    }

    @Override
    void rebuild() {
        if (original == null) {
            return; // called by the super constructor before the fields are set
        }
        boolean unchanged = true;
        for (int k = 0; k < entries().size(); k++) {
            unchanged &= entries().get(k).text().equals(original.get(k).text());
        }
        List<ParameterEntry> cleared = new ArrayList<>();
        entries().forEach(e -> cleared.add(e.withText(e.text())));
        replaceEntries(cleared);
        try {
            setResult(SectionFiles.parse(file.toString(), unchanged || tree == null ? originalText : edited()), "");
        } catch (SectionFileException e) {
            setResult(null, "");
            String message = unchanged ? e.getMessage() : file + ": " + e.jsonPath() + ": " + e.problem();
            String path = e.jsonPath();
            for (ParameterEntry entry : entries()) {
                if (path.endsWith("." + entry.name()) || path.contains("." + entry.name() + ".")) {
                    List<ParameterEntry> marked = new ArrayList<>();
                    entries().forEach(x -> marked.add(x == entry ? x.withError(message) : x));
                    replaceEntries(marked);
                    return;
                }
            }
            setResult(null, message);
        }
    }

    /** The document with the typed values put in: plain numbers as numbers, anything else as an expression. */
    private String edited() {
        ObjectNode copy = tree.deepCopy();
        for (ParameterEntry e : entries()) {
            ObjectNode holder = holderOf(copy, e.name());
            if (holder != null) {
                String t = e.text().strip();
                if (SectionEditor.number(t)) {
                    holder.put(e.name(), Double.parseDouble(t));
                } else {
                    holder.put(e.name(), t);
                }
            }
        }
        return copy.toPrettyString();
    }

    private static ObjectNode holderOf(ObjectNode root, String name) {
        if (root.path("parameters").has(name)) {
            return (ObjectNode) root.get("parameters");
        }
        JsonNode family = root.path("family");
        if (family.isObject() && family.size() == 1) {
            JsonNode values = family.elements().next();
            if (values.isObject() && values.has(name)) {
                return (ObjectNode) values;
            }
        }
        return null;
    }
}
