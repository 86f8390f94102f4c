package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.sim.ContributedInput;
import org.faultbench.sim.MaximumSealingSsfInput;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class StudyEditsTest {
    @TempDir
    Path folder;

    private AnalysisFile dome() throws Exception {
        return new AnalysisFileReader().read(DomeStudyFiles.write(folder, 20, "sgr"));
    }

    @Test
    void aPropertyEditChangesTheStudyAndReadsBackFromTheSavedText() throws Exception {
        AnalysisFile original = dome();
        int sand = original.study().stratigraphy().indexOf("Sand A");
        AnalysisFile edited = StudyEdits.withUnitProperty(original, sand, UnitProperty.THICKNESS,
                UncertainValue.triangular(10, 12, 15));

        assertEquals(UncertainValue.triangular(10, 12, 15), edited.study().stratigraphy().units().get(sand).thickness());
        assertNotEquals(original.sha256(), edited.sha256(), "the edited content has its own hash");
        // the original is untouched: edits are values, so undo can put the old one back
        assertNotEquals(original.study().stratigraphy().units().get(sand).thickness(),
                edited.study().stratigraphy().units().get(sand).thickness());

        Path saved = folder.resolve("saved.json");
        Files.write(saved, StudyEdits.content(edited));
        AnalysisFile reread = new AnalysisFileReader().read(saved);
        assertEquals(edited.study().stratigraphy(), reread.study().stratigraphy());
        assertEquals(edited.sha256(), reread.sha256(), "the hash is that of the bytes that are saved");
    }

    @Test
    void anEditKeepsTheGridsItHasAlreadyRead() throws Exception {
        AnalysisFile original = dome();
        AnalysisFile edited = StudyEdits.withUnitProperty(original, 0, UnitProperty.THICKNESS,
                UncertainValue.fixed(55));
        assertSame(original.study().referenceTop(), edited.study().referenceTop(),
                "the reference-top grid file is not parsed again for a stratigraphy edit");
    }

    @Test
    void aPluginInputIsIncludedWithItsDistributionAndLeftOutAgain() throws Exception {
        AnalysisFile original = dome();
        MaximumSealingSsfInput ssf = new MaximumSealingSsfInput();
        AnalysisFile included = StudyEdits.withSampledInput(original, ssf, true, null);
        List<ContributedInput> inputs = included.study().contributedInputs();
        assertEquals(List.of("ssf-maximum-sealing"), inputs.stream().map(ContributedInput::id).toList());
        assertEquals(ssf.distribution(), inputs.get(0).distribution(), "the input's own distribution");
        AnalysisFile narrowed = StudyEdits.withSampledInput(included, ssf, true, UncertainValue.triangular(4, 5, 6));
        assertEquals(UncertainValue.triangular(4, 5, 6), narrowed.study().contributedInputs().get(0).distribution());
        assertEquals("[{\"id\":\"ssf-maximum-sealing\",\"distribution\":{\"triangular\":{\"min\":4.0,\"mode\":5.0,"
                + "\"max\":6.0}}}]", narrowed.document().get("sampledInputs").toString());
        AnalysisFile removed = StudyEdits.withSampledInput(narrowed, ssf, false, null);
        assertTrue(removed.study().contributedInputs().isEmpty());
        assertFalse(removed.document().has("sampledInputs"), "no empty list is left in the file");
        StudyFormatException e = assertThrows(StudyFormatException.class,
                () -> StudyEdits.withSampledInput(original, ssf, true, UncertainValue.uniform(0.2, 3)));
        assertEquals("sampledInputs[0].distribution", e.field(), "below the input's bound of 1");
    }

    @Test
    void anEditTheModelRejectsNamesTheField() throws Exception {
        AnalysisFile original = dome();
        // a seal turned into a reservoir lacks N/G, porosity, Sw and Bo: the reader names the unit
        StudyFormatException e = assertThrows(StudyFormatException.class,
                () -> StudyEdits.withUnitLithology(original, 0, LithologyClass.RESERVOIR));
        assertTrue(e.getMessage().contains("units[0]"), e.getMessage());
    }

    @Test
    void thicknessTruncatedAtZeroIsWrittenAsAPlainNormal() throws Exception {
        AnalysisFile edited = StudyEdits.withUnitProperty(dome(), 0, UnitProperty.THICKNESS,
                UncertainValue.normal(50, 5).within(UnitProperty.THICKNESS.bounds(), "t"));
        String unit = edited.document().getAsJsonObject("stratigraphy").getAsJsonArray("units").get(0).toString();
        assertTrue(unit.contains("\"normal\":{\"mean\":50.0,\"sd\":5.0}"), unit);
    }

    @Test
    void aTruncationTheFileCannotHoldIsRefused() throws Exception {
        AnalysisFile original = dome();
        StudyFormatException e = assertThrows(StudyFormatException.class, () -> StudyEdits.withUnitProperty(original,
                0, UnitProperty.THICKNESS, new org.faultbench.core.uncertain.LogNormalValue(50, 0.2, 30, 80)));
        assertTrue(e.getMessage().contains("stratigraphy.units[0].thickness"), e.getMessage());
    }

    @Test
    void savingWritesTheEditAndKeepsThePreviousVersion() throws Exception {
        AnalysisFile original = dome();
        byte[] before = Files.readAllBytes(original.file());
        AnalysisFile edited = StudyEdits.withUnitProperty(original, 0, UnitProperty.VCL, UncertainValue.fixed(0.66));
        new AnalysisFileSaver().save(edited);
        AnalysisFile saved = new AnalysisFileReader().read(original.file());
        assertEquals(UncertainValue.fixed(0.66), saved.study().stratigraphy().units().get(0).clayFraction());
        assertEquals(new String(before), Files.readString(original.file().resolveSibling(
                original.file().getFileName() + ".bak")), "the previous version is kept as .bak");
        assertEquals(edited.sha256(), AnalysisFileReader.sha256(Files.readAllBytes(original.file())),
                "the saved file holds exactly the edited study's content, so the editor keeps it as the saved study");
    }
}
