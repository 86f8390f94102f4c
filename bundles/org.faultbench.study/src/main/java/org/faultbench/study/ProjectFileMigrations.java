package org.faultbench.study;

import java.util.List;
import java.util.Properties;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

/**
 * The history of the project file. Version 1 is the {@code workspace.properties} of the first releases (one key,
 * {@code study=relative/path.json}), lifted to JSON by {@link #fromWorkspaceProperties}; version 2 is the JSON
 * project file.
 */
final class ProjectFileMigrations {
    static final MigrationChain CHAIN = new MigrationChain("schemaVersion", ProjectFileFormat.SCHEMA_VERSION,
            List.of(new FormatMigration(1, ProjectFileMigrations::version1To2)));

    private ProjectFileMigrations() {
    }

    /** Version 1 as JSON: every property as a text field, plus the format, the version and the folder's name. */
    static JsonObject fromWorkspaceProperties(Properties properties, String folderName) {
        JsonObject doc = new JsonObject();
        doc.addProperty("format", ProjectFileFormat.FORMAT);
        doc.addProperty("schemaVersion", 1);
        doc.addProperty("name", folderName);
        for (String key : properties.stringPropertyNames()) {
            doc.addProperty(key, properties.getProperty(key));
        }
        return doc;
    }

    /** Version 1 → 2: the single {@code study} becomes the list of studies and the active one; metres, no CRS. */
    static JsonObject version1To2(JsonObject v1) {
        JsonObject v2 = new JsonObject();
        v2.addProperty("format", ProjectFileFormat.FORMAT);
        v2.addProperty("schemaVersion", 2);
        JsonElement name = v1.get("name");
        v2.add("name", name != null ? name : new com.google.gson.JsonPrimitive("Workspace"));
        v2.addProperty("lengthUnit", "m");
        JsonArray studies = new JsonArray();
        JsonElement study = v1.get("study");
        if (study != null) {
            studies.add(study);
            v2.add("activeStudy", study);
        }
        v2.add("studies", studies);
        for (String list : List.of("mapSheets", "grids", "wells", "faults")) {
            v2.add(list, new JsonArray());
        }
        return v2;
    }
}
