package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Properties;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import org.faultbench.core.units.LengthUnit;
import org.junit.jupiter.api.Test;

class ProjectFileFormatTest {
    private final ProjectFileFormat format = new ProjectFileFormat();

    static ProjectFile sample() {
        return new ProjectFile("Test workspace", LengthUnit.FOOT, OptionalInt.of(23031), "invented test grid",
                Optional.of("studies/a.json"), List.of("studies/a.json", "studies/b.json"),
                List.of("maps/sheet.mapsheet.json"), List.of("grids/top.asc"), List.of("wells/tops.csv"),
                List.of("faults/faults.geojson"));
    }

    private ProjectFile read(String json) throws StudyFormatException {
        return format.read(json.getBytes(StandardCharsets.UTF_8), "p.json");
    }

    @Test
    void writtenProjectReadsBackEqual() throws StudyFormatException {
        ProjectFile project = sample();
        assertEquals(project, format.read(format.write(project), "p.json"));
    }

    @Test
    void migrationStepTurnsTheSingleStudyIntoTheListAndTheActiveStudy() {
        JsonObject v1 = JsonParser.parseString(
                "{\"format\":\"faultbench-project\",\"schemaVersion\":1,\"name\":\"w\",\"study\":\"s/x.json\"}")
                .getAsJsonObject();
        JsonObject v2 = ProjectFileMigrations.version1To2(v1);
        assertEquals(2, v2.get("schemaVersion").getAsInt());
        assertEquals("s/x.json", v2.get("activeStudy").getAsString());
        assertEquals("[\"s/x.json\"]", v2.get("studies").toString());
        assertEquals("m", v2.get("lengthUnit").getAsString());
        assertEquals("[]", v2.get("grids").toString());
    }

    @Test
    void workspacePropertiesAreReadAsACurrentProject() throws StudyFormatException {
        Properties properties = new Properties();
        properties.setProperty("study", "studies/demo-study.json");
        ProjectFile project = format.readWorkspaceProperties(properties, "workspace.properties", "demo");
        assertEquals("demo", project.name());
        assertEquals(Optional.of("studies/demo-study.json"), project.activeStudy());
        assertEquals(List.of("studies/demo-study.json"), project.studies());
        assertEquals(LengthUnit.METRE, project.lengthUnit());
    }

    @Test
    void version1JsonIsMigratedOnReading() throws StudyFormatException {
        ProjectFile project = read(
                "{\"format\":\"faultbench-project\",\"schemaVersion\":1,\"name\":\"w\",\"study\":\"s/x.json\"}");
        assertEquals(Optional.of("s/x.json"), project.activeStudy());
    }

    @Test
    void newerVersionIsRefusedNamingTheField() {
        StudyFormatException e = assertThrows(StudyFormatException.class, () -> read(
                "{\"format\":\"faultbench-project\",\"schemaVersion\":3,\"name\":\"w\",\"lengthUnit\":\"m\"}"));
        assertEquals("schemaVersion", e.field());
        assertTrue(e.getMessage().contains("newer program"), e.getMessage());
    }

    @Test
    void pathLeavingTheWorkspaceIsRefusedNamingTheItem() {
        StudyFormatException e = assertThrows(StudyFormatException.class, () -> read(
                "{\"format\":\"faultbench-project\",\"schemaVersion\":2,\"name\":\"w\",\"lengthUnit\":\"m\","
                        + "\"grids\":[\"grids/a.asc\",\"../../etc/passwd\"]}"));
        assertEquals("grids[1]", e.field());
        assertEquals("p.json", e.file());
    }

    @Test
    void activeStudyMustBeListed() {
        StudyFormatException e = assertThrows(StudyFormatException.class, () -> read(
                "{\"format\":\"faultbench-project\",\"schemaVersion\":2,\"name\":\"w\",\"lengthUnit\":\"m\","
                        + "\"studies\":[\"a.json\"],\"activeStudy\":\"b.json\"}"));
        assertEquals("activeStudy", e.field());
    }

    @Test
    void nonFiniteEpsgCodeIsRefused() {
        StudyFormatException e = assertThrows(StudyFormatException.class, () -> read(
                "{\"format\":\"faultbench-project\",\"schemaVersion\":2,\"name\":\"w\",\"lengthUnit\":\"m\","
                        + "\"crs\":{\"epsg\":NaN}}"));
        assertEquals("crs.epsg", e.field());
    }
}
