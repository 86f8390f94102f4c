package org.faultbench.study;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Properties;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

import org.faultbench.core.units.LengthUnit;

/**
 * Reads and writes project files (format {@value #FORMAT}, schema version {@value #SCHEMA_VERSION}, described in
 * DEVELOPERS.md). Older versions are migrated on reading; writing always produces the current version.
 */
public final class ProjectFileFormat {
    public static final String FORMAT = "faultbench-project";
    public static final int SCHEMA_VERSION = 2;
    /** Name of the project file in a workspace folder. */
    public static final String FILE_NAME = "faultbench-project.json";

    /** Reads a project file of any known version. */
    public ProjectFile read(byte[] content, String fileName) throws StudyFormatException {
        JsonElement root = ProjectFileMigrations.CHAIN.migrate(StudyJson.parse(content, fileName), fileName);
        return fromCurrent(new JsonNode(fileName, "", root));
    }

    /** Reads a version 1 workspace ({@code workspace.properties}) as a current project. */
    public ProjectFile readWorkspaceProperties(Properties properties, String fileName, String folderName)
            throws StudyFormatException {
        JsonObject v1 = ProjectFileMigrations.fromWorkspaceProperties(properties, folderName);
        return fromCurrent(new JsonNode(fileName, "", ProjectFileMigrations.CHAIN.migrate(v1, fileName)));
    }

    public byte[] write(ProjectFile project) {
        JsonObject doc = new JsonObject();
        doc.addProperty("format", FORMAT);
        doc.addProperty("schemaVersion", SCHEMA_VERSION);
        doc.addProperty("name", project.name());
        doc.addProperty("lengthUnit", project.lengthUnit().symbol());
        JsonObject crs = new JsonObject();
        project.crsEpsg().ifPresent(code -> crs.addProperty("epsg", code));
        crs.addProperty("note", project.crsNote());
        doc.add("crs", crs);
        project.activeStudy().ifPresent(study -> doc.addProperty("activeStudy", study));
        doc.add("studies", array(project.studies()));
        doc.add("mapSheets", array(project.mapSheets()));
        doc.add("grids", array(project.grids()));
        doc.add("wells", array(project.wells()));
        doc.add("faults", array(project.faults()));
        return StudyJson.pretty(doc);
    }

    private static JsonArray array(List<String> paths) {
        JsonArray array = new JsonArray();
        paths.forEach(array::add);
        return array;
    }

    private static ProjectFile fromCurrent(JsonNode doc) throws StudyFormatException {
        StudyJson.checkHeader(doc, FORMAT, "schemaVersion", SCHEMA_VERSION);
        String name = doc.field("name").string().strip();
        if (name.isEmpty()) {
            throw doc.field("name").error("the project name is empty");
        }
        LengthUnit unit = lengthUnit(doc.field("lengthUnit"));
        OptionalInt epsg = OptionalInt.empty();
        String note = "";
        if (doc.has("crs")) {
            JsonNode crs = doc.field("crs");
            if (crs.has("epsg")) {
                int code = crs.field("epsg").integer();
                if (code < 1024 || code > 32767) {
                    throw crs.field("epsg").error("expected an EPSG code between 1024 and 32767, found " + code);
                }
                epsg = OptionalInt.of(code);
            }
            note = crs.has("note") ? crs.field("note").string() : "";
        }
        List<String> studies = StudyJson.relativePaths(doc, "studies");
        Optional<String> active = Optional.empty();
        if (doc.has("activeStudy")) {
            JsonNode node = doc.field("activeStudy");
            String path = StudyJson.relativePath(node);
            if (!studies.contains(path)) {
                throw node.error("\"" + path + "\" is not listed in studies");
            }
            active = Optional.of(path);
        }
        return new ProjectFile(name, unit, epsg, note, active, studies, StudyJson.relativePaths(doc, "mapSheets"),
                StudyJson.relativePaths(doc, "grids"), StudyJson.relativePaths(doc, "wells"),
                StudyJson.relativePaths(doc, "faults"));
    }

    private static LengthUnit lengthUnit(JsonNode node) throws StudyFormatException {
        String symbol = node.string().strip().toLowerCase(Locale.ROOT);
        for (LengthUnit unit : LengthUnit.values()) {
            if (unit.symbol().equals(symbol)) {
                return unit;
            }
        }
        throw node.error("expected \"m\" or \"ft\", found \"" + symbol + "\"");
    }
}
