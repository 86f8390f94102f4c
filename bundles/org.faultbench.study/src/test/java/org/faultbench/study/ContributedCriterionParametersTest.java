package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ContributedCriterionParametersTest {

    @TempDir
    Path dir;

    @Test
    void parametersForACriterionThatTakesNoneNameTheFileAndPath() throws IOException {
        String json = DomeStudyFiles.VALID_TEMPLATE.replace("THICKNESS_A", "30").replace(
                "\"seal\": {\"criterion\": \"CRITERION\", \"burialDepth\": 2000}",
                "\"seal\": {\"criterion\": \"juxtaposition\", \"burialDepth\": 2000, \"parameters\": {\"table\": \"x.csv\"}}");
        Path file = DomeStudyFiles.writeJson(dir, 20, json);
        StudyFormatException e = assertThrows(StudyFormatException.class, () -> new AnalysisFileReader().read(file));
        assertTrue(e.getMessage().contains("study.json") && e.getMessage().contains("seal.parameters")
                && e.getMessage().contains("table: unknown parameter"), e.getMessage());
    }

    @Test
    void parametersMustBeAnObject() throws IOException {
        String json = DomeStudyFiles.VALID_TEMPLATE.replace("THICKNESS_A", "30").replace(
                "\"seal\": {\"criterion\": \"CRITERION\", \"burialDepth\": 2000}",
                "\"seal\": {\"criterion\": \"juxtaposition\", \"burialDepth\": 2000, \"parameters\": 3}");
        Path file = DomeStudyFiles.writeJson(dir, 20, json);
        StudyFormatException e = assertThrows(StudyFormatException.class, () -> new AnalysisFileReader().read(file));
        assertTrue(e.getMessage().contains("seal.parameters") && e.getMessage().contains("expected an object"),
                e.getMessage());
    }
}
