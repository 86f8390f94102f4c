package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.uncertain.UncertainValue;
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
