package org.faultbench.study;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonElement;
import com.google.gson.JsonParseException;
import com.google.gson.JsonParser;

/** Parsing, header checks and relative paths shared by the project and map-sheet files. */
final class StudyJson {
    private StudyJson() {
    }

    static JsonElement parse(byte[] content, String fileName) throws StudyFormatException {
        try {
            return JsonParser.parseString(new String(content, StandardCharsets.UTF_8));
        } catch (JsonParseException | StackOverflowError e) {
            throw new StudyFormatException(fileName, "", "is not valid JSON: " + e.getMessage(), e);
        }
    }

    static byte[] pretty(JsonElement doc) {
        return (new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create().toJson(doc) + "\n")
                .getBytes(StandardCharsets.UTF_8);
    }

    /** Checks the {@code format} field and that the version is one this program reads (after migration). */
    static void checkHeader(JsonNode doc, String format, String versionField, int current)
            throws StudyFormatException {
        String found = doc.field("format").string();
        if (!format.equals(found)) {
            throw doc.field("format").error("expected \"" + format + "\", found \"" + found + "\"");
        }
        int version = doc.field(versionField).integer();
        if (version != current) {
            throw doc.field(versionField).error("this program reads versions 1 to " + current + ", the file has "
                    + version + (version > current ? " (written by a newer program)" : ""));
        }
    }

    /** A path relative to the workspace, with {@code /} separators, that stays inside it. */
    static String relativePath(JsonNode node) throws StudyFormatException {
        String path = node.string().strip();
        if (path.isEmpty()) {
            throw node.error("the path is empty");
        }
        if (path.startsWith("/") || path.startsWith("\\") || path.contains(":") || path.contains("\\")) {
            throw node.error("expected a path relative to the workspace with / separators, found \"" + path
                    + "\"");
        }
        for (String part : path.split("/")) {
            if (part.equals("..")) {
                throw node.error("the path \"" + path + "\" leads outside the workspace");
            }
        }
        if (path.indexOf('\0') >= 0) {
            throw node.error("the path contains a NUL character");
        }
        return path;
    }

    static List<String> relativePaths(JsonNode doc, String field) throws StudyFormatException {
        List<String> paths = new ArrayList<>();
        if (doc.has(field)) {
            for (JsonNode item : doc.field(field).array()) {
                paths.add(relativePath(item));
            }
        }
        return paths;
    }
}
