package org.faultbench.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;

/** A JSON value that knows its file and path, so every error names where it is. */
final class JsonNode {
    private final String file;
    private final String path;
    private final JsonElement element;

    JsonNode(String file, String path, JsonElement element) {
        this.file = file;
        this.path = path;
        this.element = element;
    }

    String path() {
        return path;
    }

    JsonElement element() {
        return element;
    }

    StudyFormatException error(String problem) {
        return new StudyFormatException(file, path, problem);
    }

    StudyFormatException error(String problem, Throwable cause) {
        return new StudyFormatException(file, path, problem, cause);
    }

    private JsonObject object() throws StudyFormatException {
        if (!element.isJsonObject()) {
            throw error("expected an object { ... }");
        }
        return element.getAsJsonObject();
    }

    private String child(String name) {
        return path.isEmpty() ? name : path + "." + name;
    }

    boolean has(String name) throws StudyFormatException {
        return object().has(name) && !object().get(name).isJsonNull();
    }

    JsonNode field(String name) throws StudyFormatException {
        if (!has(name)) {
            throw new StudyFormatException(file, child(name), "required field is missing");
        }
        return new JsonNode(file, child(name), object().get(name));
    }

    Optional<JsonNode> optional(String name) throws StudyFormatException {
        return has(name) ? Optional.of(field(name)) : Optional.empty();
    }

    List<String> keys() throws StudyFormatException {
        return new ArrayList<>(object().keySet());
    }

    List<JsonNode> array() throws StudyFormatException {
        if (!element.isJsonArray()) {
            throw error("expected an array [ ... ]");
        }
        JsonArray array = element.getAsJsonArray();
        List<JsonNode> items = new ArrayList<>(array.size());
        for (int i = 0; i < array.size(); i++) {
            items.add(new JsonNode(file, path + "[" + i + "]", array.get(i)));
        }
        return items;
    }

    String string() throws StudyFormatException {
        if (!(element.isJsonPrimitive() && element.getAsJsonPrimitive().isString())) {
            throw error("expected a text value in quotes");
        }
        return element.getAsString();
    }

    boolean isNumber() {
        return element.isJsonPrimitive() && element.getAsJsonPrimitive().isNumber();
    }

    double number() throws StudyFormatException {
        if (!isNumber()) {
            throw error("expected a number, found " + element);
        }
        double value = element.getAsDouble();
        if (!Double.isFinite(value)) {
            throw error("expected a finite number, found " + element);
        }
        return value;
    }

    int integer() throws StudyFormatException {
        double value = number();
        if (value != Math.rint(value) || Math.abs(value) > Integer.MAX_VALUE) {
            throw error("expected a whole number, found " + element);
        }
        return (int) value;
    }

    long longInteger() throws StudyFormatException {
        JsonPrimitive p = element.isJsonPrimitive() ? element.getAsJsonPrimitive() : null;
        if (p == null || !p.isNumber()) {
            throw error("expected a whole number, found " + element);
        }
        try {
            return Long.parseLong(p.getAsString());
        } catch (NumberFormatException e) {
            throw error("expected a whole number, found " + element, e);
        }
    }

    boolean bool() throws StudyFormatException {
        if (!(element.isJsonPrimitive() && element.getAsJsonPrimitive().isBoolean())) {
            throw error("expected true or false, found " + element);
        }
        return element.getAsBoolean();
    }

    /** An array of numbers of a fixed length, e.g. a point [x, y]. */
    double[] numbers(int length) throws StudyFormatException {
        List<JsonNode> items = array();
        if (items.size() != length) {
            throw error("expected " + length + " numbers, found " + items.size());
        }
        double[] values = new double[length];
        for (int i = 0; i < length; i++) {
            values[i] = items.get(i).number();
        }
        return values;
    }
}
