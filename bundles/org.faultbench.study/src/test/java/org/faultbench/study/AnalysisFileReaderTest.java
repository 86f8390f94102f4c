package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;

import org.eclipse.core.runtime.NullProgressMonitor;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.seal.ShaleGougeRatioCriterion;
import org.faultbench.sim.ContributedInput;
import org.faultbench.sim.ExceedanceLevel;
import org.faultbench.sim.InputTarget;
import org.faultbench.sim.MonteCarloSimulator;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.SimulationSettings;
import org.faultbench.sim.TrapStudy;
import org.faultbench.sim.UnitQuantity;
import org.faultbench.trap.Mechanism;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AnalysisFileReaderTest {
    @TempDir
    Path dir;

    private AnalysisFile read(String json) throws IOException, StudyFormatException {
        return new AnalysisFileReader().read(DomeStudyFiles.writeJson(dir, 20, json));
    }

    private StudyFormatException rejected(String json) throws IOException {
        Path file = DomeStudyFiles.writeJson(dir, 20, json);
        return assertThrows(StudyFormatException.class, () -> new AnalysisFileReader().read(file));
    }

    private static String valid(String criterion) {
        return DomeStudyFiles.VALID_TEMPLATE.replace("CRITERION", criterion).replace("THICKNESS_A", "30");
    }

    @Test
    void readsTheStudyAndItsDefaults() throws Exception {
        AnalysisFile analysis = read(valid("sgr"));
        assertEquals("Dome test", analysis.study().name());
        assertEquals(1, analysis.study().stratigraphy().referenceUnitIndex());
        assertEquals(4, analysis.study().stratigraphy().units().size());
        assertTrue(analysis.study().seal().criterion() instanceof ShaleGougeRatioCriterion);
        assertEquals(50, analysis.realisations());
        assertEquals(3L, analysis.seed());
        assertEquals(64, analysis.sha256().length());
        assertEquals("F1", analysis.study().attic().orElseThrow().drainedFaultId());
    }

    @Test
    void cutOffsSampledFromTheGridDriveTheJuxtapositionLeakPoint() throws Exception {
        // Cut-offs read 30 m off the trace on the cone (hand calculation): footwall 1000 + 0.05·470 = 1023.5 m,
        // hanging wall 1000 + 0.05·530 + 20 = 1046.5 m at y = 0. Footwall Sand A [1023.5, 1053.5) meets hanging-wall
        // Sand A from 1046.5 m: with juxtaposition only (Allan 1989) that window top is the leak point.
        AnalysisFile analysis = read(valid("juxtaposition"));
        SimulationResult result = new MonteCarloSimulator().run(analysis.study(),
                new SimulationSettings(10, 1, 1, 5), new NullProgressMonitor());
        var sandA = result.units().get(0);
        assertEquals(Mechanism.LEAK, sandA.baseMechanism());
        assertEquals(1046.5, sandA.statistics(UnitQuantity.CONTACT).level(ExceedanceLevel.P50), 0.01);
    }

    @Test
    void sampledInputsAreIncludedByIdWithTheirOwnOrTheFilesDistribution() throws Exception {
        String withInputs = valid("ssf").replace("\"attic\":", """
                "sampledInputs": [{"id": "ssf-maximum-sealing", "distribution": {"uniform": {"min": 5, "max": 6}}}],
                "attic":""");
        TrapStudy study = read(withInputs).study();
        assertEquals(1, study.contributedInputs().size());
        ContributedInput ssf = study.contributedInputs().get(0);
        assertEquals(InputTarget.CRITERION, ssf.target());
        assertEquals(UncertainValue.uniform(5, 6), ssf.distribution());
        TrapStudy byDefault = read(withInputs.replace(", \"distribution\": {\"uniform\": {\"min\": 5, \"max\": 6}}",
                "")).study();
        assertEquals(UncertainValue.uniform(4, 7), byDefault.contributedInputs().get(0).distribution(),
                "the contribution's own range: Gibson (1994) 4 to Lindsay et al. (1993) 7");
        assertTrue(read(valid("ssf")).study().contributedInputs().isEmpty(), "none unless the file names them");
    }

    @Test
    void unknownRepeatedOrOutOfBoundsSampledInputsAreNamed() throws Exception {
        String unknown = valid("sgr").replace("\"attic\":", "\"sampledInputs\": [{\"id\": \"nope\"}], \"attic\":");
        StudyFormatException e = rejected(unknown);
        assertEquals("sampledInputs[0].id", e.field());
        assertTrue(e.getMessage().contains("ssf-maximum-sealing"), "lists what is installed: " + e.getMessage());
        String twice = valid("ssf").replace("\"attic\":",
                "\"sampledInputs\": [{\"id\": \"ssf-maximum-sealing\"}, {\"id\": \"ssf-maximum-sealing\"}], \"attic\":");
        assertEquals("sampledInputs[1].id", rejected(twice).field());
        String below = valid("ssf").replace("\"attic\":", "\"sampledInputs\": [{\"id\": \"ssf-maximum-sealing\","
                + " \"distribution\": {\"uniform\": {\"min\": 0.5, \"max\": 3}}}], \"attic\":");
        assertEquals("sampledInputs[0].distribution", rejected(below).field());
    }

    @Test
    void negativeThicknessIsReportedAtItsField() throws Exception {
        String json = DomeStudyFiles.VALID_TEMPLATE.replace("CRITERION", "sgr").replace("THICKNESS_A", "-5");
        StudyFormatException e = rejected(json);
        assertEquals("stratigraphy.units[1]", e.field());
        assertTrue(e.getMessage().contains("thickness") && e.getMessage().contains("study.json"), e.getMessage());
    }

    @Test
    void clayFractionOutsideZeroToOneIsReported() throws Exception {
        StudyFormatException e = rejected(valid("sgr").replace("\"vcl\": 0.9", "\"vcl\": 1.5"));
        assertEquals("stratigraphy.units[2]", e.field());
        assertTrue(e.getMessage().contains("clay fraction"), e.getMessage());
    }

    @Test
    void faultWithOnePointIsReported() throws Exception {
        StudyFormatException e = rejected(valid("sgr").replace("[[0, -1990], [0, 1990]]", "[[0, -1990]]"));
        assertEquals("faults[0].trace", e.field());
        assertTrue(e.getMessage().contains("at least 2 points"), e.getMessage());
    }

    @Test
    void nanIsNotANumberHere() throws Exception {
        StudyFormatException e = rejected(valid("sgr").replace("\"burialDepth\": 2000", "\"burialDepth\": NaN"));
        assertEquals("seal.burialDepth", e.field());
    }

    @Test
    void missingGridFileIsNamed() throws Exception {
        StudyFormatException e = rejected(valid("sgr").replace("\"top.asc\"", "\"missing.asc\""));
        assertEquals("referenceTop.grid", e.field());
        assertTrue(e.getMessage().contains("missing.asc"), e.getMessage());
    }

    @Test
    void unknownCriterionAndReferenceUnitAreNamed() throws Exception {
        assertEquals("seal.criterion", rejected(valid("magic")).field());
        assertEquals("stratigraphy.referenceUnit",
                rejected(valid("sgr").replace("\"referenceUnit\": \"Sand A\"", "\"referenceUnit\": \"Sand Z\"")).field());
    }

    @Test
    void newerFormatVersionAndBrokenJsonAreRefused() throws Exception {
        StudyFormatException newer = rejected(valid("sgr").replace("\"formatVersion\": 1", "\"formatVersion\": 7"));
        assertTrue(newer.getMessage().contains("newer program"), newer.getMessage());
        StudyFormatException broken = rejected("{ \"format\": ");
        assertTrue(broken.getMessage().contains("not valid JSON"), broken.getMessage());
    }

    @Test
    void missingFileIsNamed() {
        StudyFormatException e = assertThrows(StudyFormatException.class,
                () -> new AnalysisFileReader().read(dir.resolve("nowhere.json")));
        assertTrue(e.getMessage().contains("nowhere.json") && e.getMessage().contains("not found"));
    }

    @Test
    void distributionsAreRead() throws Exception {
        AnalysisFile analysis = read(DomeStudyFiles.VALID_TEMPLATE.replace("CRITERION", "sgr")
                .replace("THICKNESS_A", "{\"triangular\": {\"min\": 20, \"mode\": 30, \"max\": 46}}"));
        // triangular mean (a + b + c) / 3 = 32 (common practice)
        assertEquals(32, analysis.study().stratigraphy().units().get(1).thickness().nominal(), 1e-9);
    }

    @Test
    void co2ThresholdsAreScaledByInterfacialTensionAndContactAngle() throws Exception {
        AnalysisFile oil = read(valid("sgr"));
        assertEquals(1.0, oil.study().seal().thresholdScale(), 0);
        AnalysisFile co2 = read(valid("sgr").replace("\"trapped\": \"oil\", \"density\": 750",
                "\"trapped\": \"co2\", \"density\": 700, \"interfacialTension\": 0.025, \"contactAngle\": 40"));
        // P_CO2 = P_oil * (0.025 cos 40) / (0.030 cos 0) (Purcell 1949; Schowalter 1979): 0.6384
        assertEquals(0.025 * Math.cos(Math.toRadians(40)) / 0.030, co2.study().seal().thresholdScale(), 1e-12);
        assertEquals(0.6384, co2.study().seal().thresholdScale(), 1e-4);
    }
}
