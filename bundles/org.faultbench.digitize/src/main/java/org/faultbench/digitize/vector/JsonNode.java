package org.faultbench.digitize.vector;

import java.io.EOFException;
import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.faultbench.digitize.io.FormatException;

import com.google.gson.stream.JsonReader;
import com.google.gson.stream.JsonToken;
import com.google.gson.stream.MalformedJsonException;

/**
 * A JSON value read with gson's streaming parser, remembering where it starts so that errors found while
 * interpreting it can name the line and column. gson reports positions only in its {@code toString()} and messages
 * ("at line L column C path P"); after {@code peek()} that column lies one past the start of an object, array or
 * string, on the start of a number and past the end of true, false and null, which is corrected here.
 *
 * @param value a {@code Map<String, JsonNode>} (object, in file order), {@code List<JsonNode>} (array),
 *        {@code String}, {@code Double}, {@code Boolean} or null
 * @param line 1-based line where the value starts; 0 when gson gave no position
 * @param column 1-based column where the value starts; 0 when unknown
 * @param path JSONPath of the value as gson names it, e.g. {@code $.features[2].geometry}
 */
record JsonNode(Object value, int line, int column, String path) {
    private static final Pattern POSITION = Pattern.compile(" at line (\\d+) column (\\d+) path (\\S*)");
    private static final String LENIENCY_HINT =
            "Use JsonReader.setStrictness(Strictness.LENIENT) to accept malformed JSON";

    /** Parses one JSON document from {@code in}; syntax errors become positioned format errors. */
    static JsonNode parse(Reader in, String fileName) throws IOException {
        JsonReader reader = new JsonReader(in);
        try {
            JsonNode root = read(reader);
            // gson's default strictness refuses anything but white space after the document
            reader.peek();
            return root;
        } catch (MalformedJsonException | EOFException syntax) {
            throw syntaxError(fileName, syntax);
        }
    }

    private static JsonNode read(JsonReader reader) throws IOException {
        JsonToken token = reader.peek();
        Matcher at = POSITION.matcher(reader.toString());
        boolean positioned = at.find();
        int line = positioned ? Integer.parseInt(at.group(1)) : 0;
        int reported = positioned ? Integer.parseInt(at.group(2)) : 0;
        String path = positioned ? at.group(3) : "";
        return switch (token) {
            case BEGIN_OBJECT -> new JsonNode(object(reader), line, Math.max(0, reported - 1), path);
            case BEGIN_ARRAY -> new JsonNode(array(reader), line, Math.max(0, reported - 1), path);
            case STRING -> new JsonNode(reader.nextString(), line, Math.max(0, reported - 1), path);
            case NUMBER -> new JsonNode(reader.nextDouble(), line, reported, path);
            case BOOLEAN -> {
                boolean value = reader.nextBoolean();
                yield new JsonNode(value, line, Math.max(0, reported - (value ? 4 : 5)), path);
            }
            case NULL -> {
                reader.nextNull();
                yield new JsonNode(null, line, Math.max(0, reported - 4), path);
            }
            default -> throw new IllegalStateException("gson peeked " + token + " where a value starts");
        };
    }

    private static Map<String, JsonNode> object(JsonReader reader) throws IOException {
        Map<String, JsonNode> members = new LinkedHashMap<>();
        reader.beginObject();
        while (reader.hasNext()) {
            String name = reader.nextName();
            members.put(name, read(reader));
        }
        reader.endObject();
        return Collections.unmodifiableMap(members);
    }

    private static List<JsonNode> array(JsonReader reader) throws IOException {
        List<JsonNode> elements = new ArrayList<>();
        reader.beginArray();
        while (reader.hasNext()) {
            elements.add(read(reader));
        }
        reader.endArray();
        return Collections.unmodifiableList(elements);
    }

    private static FormatException syntaxError(String fileName, IOException syntax) {
        String message = String.valueOf(syntax.getMessage()).lines().findFirst().orElse("");
        Matcher at = POSITION.matcher(message);
        if (!at.find()) {
            return new FormatException(fileName, 0, 0, "not valid JSON: " + message);
        }
        String what = message.substring(0, at.start()).replace(LENIENCY_HINT, "malformed JSON");
        if (syntax instanceof EOFException) {
            what = "the file ends too early";
        }
        return new FormatException(fileName, Integer.parseInt(at.group(1)), 0,
                "at column " + at.group(2) + ", not valid JSON (" + what + ")");
    }

    /** A format error at this value: line, column and JSON path. */
    static FormatException error(String fileName, JsonNode node, String problem) {
        String where = node.column() > 0 ? "at column " + node.column() + " (" + node.path() + "), " : "";
        return new FormatException(fileName, node.line(), 0, where + problem);
    }

    @SuppressWarnings("unchecked")
    Map<String, JsonNode> members(String fileName, String what) throws FormatException {
        if (!(value instanceof Map)) {
            throw error(fileName, this, what + " must be a JSON object");
        }
        return (Map<String, JsonNode>) value;
    }

    @SuppressWarnings("unchecked")
    List<JsonNode> elements(String fileName, String what) throws FormatException {
        if (!(value instanceof List)) {
            throw error(fileName, this, what + " must be a JSON array");
        }
        return (List<JsonNode>) value;
    }

    String text(String fileName, String what) throws FormatException {
        if (!(value instanceof String text)) {
            throw error(fileName, this, what + " must be a JSON string");
        }
        return text;
    }

    double number(String fileName, String what) throws FormatException {
        if (!(value instanceof Double number)) {
            throw error(fileName, this, what + " must be a number");
        }
        return number;
    }
}
