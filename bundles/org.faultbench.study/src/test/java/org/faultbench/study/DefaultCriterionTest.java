package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.faultbench.seal.ShaleGougeRatioCriterion;
import org.faultbench.seal.ShaleSmearFactorCriterion;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A seal section without a criterion takes the reader's default (the workbench passes the user's preference). */
class DefaultCriterionTest {
    @TempDir
    Path dir;

    private Path withoutCriterion() throws Exception {
        return DomeStudyFiles.writeJson(dir, 20, DomeStudyFiles.VALID_TEMPLATE.replace("\"criterion\": \"CRITERION\", ", "")
                .replace("THICKNESS_A", "30"));
    }

    @Test
    void theDefaultIsUsedAndWrittenIntoTheDocument() throws Exception {
        AnalysisFile analysis = new AnalysisFileReader("ssf").read(withoutCriterion());
        assertInstanceOf(ShaleSmearFactorCriterion.class, analysis.study().seal().criterion());
        assertEquals("ssf", analysis.document().getAsJsonObject("seal").get("criterion").getAsString(),
                "results and saves name the criterion used");
        // an edit reads the document back with a plain reader: the criterion travels with it
        AnalysisFile edited = StudyEdits.withUnitProperty(analysis, 0, UnitProperty.VCL,
                org.faultbench.core.uncertain.UncertainValue.fixed(0.7));
        assertInstanceOf(ShaleSmearFactorCriterion.class, edited.study().seal().criterion());
    }

    @Test
    void aCriterionInTheFileWinsOverTheDefault() throws Exception {
        Path file = DomeStudyFiles.write(dir, 20, "sgr");
        assertInstanceOf(ShaleGougeRatioCriterion.class, new AnalysisFileReader("ssf").read(file).study().seal()
                .criterion());
        assertTrue(Files.readString(file).contains("\"sgr\""));
    }

    @Test
    void withoutADefaultTheFileMustNameItsCriterion() throws Exception {
        StudyFormatException e = assertThrows(StudyFormatException.class,
                () -> new AnalysisFileReader().read(withoutCriterion()));
        assertTrue(e.getMessage().contains("criterion"), e.getMessage());
    }
}
