package org.faultbench.seal.carbonate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

import org.eclipse.core.runtime.NullProgressMonitor;
import org.faultbench.seal.SealCriterionCatalog;
import org.faultbench.seal.SealCriterionContributions;
import org.faultbench.sim.ExceedanceLevel;
import org.faultbench.sim.MonteCarloSimulator;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.SimulationSettings;
import org.faultbench.sim.UnitQuantity;
import org.faultbench.study.AnalysisFile;
import org.faultbench.study.AnalysisFileReader;
import org.faultbench.study.StudyFormatException;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The invented carbonate study of src/test/resources/carbonate-study: a cone-shaped top of Reef A (z = 1000 + 0.05 r
 * around (-500, 0), crest 1000 m) in the footwall of a north-south fault at x = 0 with 20 m throw; the hanging-wall
 * Reef A meets the footwall Reef A from 1045 m down, and the compartment spills at its western edge at 1075 m.
 */
class CarbonateStudyTest {

    @TempDir
    Path dir;

    /** Outside OSGi the platform catalog has only the built-ins: register the criterion as plugin.xml does. */
    @BeforeAll
    static void registerAsTheExtensionRegistryWould() {
        SealCriterionCatalog catalog = SealCriterionContributions.platformCatalog();
        if (catalog.find(CarbonateFaultRockCriterion.ID).isEmpty()) {
            catalog.register(new CarbonateFaultRockCriterion());
        }
    }

    private Path study(String seal) throws IOException, URISyntaxException {
        Path original = Path.of(getClass().getResource("/carbonate-study/carbonate-study.json").toURI());
        Files.copy(original.resolveSibling("top-reef-a.asc"), dir.resolve("top-reef-a.asc"),
                StandardCopyOption.REPLACE_EXISTING);
        String json = Files.readString(original, StandardCharsets.UTF_8);
        String replaced = seal == null ? json : json.replaceAll("(?s)\"seal\": \\{.*?\"thresholdCase\": \"mode\"\\}\\}", seal);
        assertTrue(seal == null || !replaced.equals(json), "the seal block was replaced");
        Path file = dir.resolve("study.json");
        Files.writeString(file, replaced, StandardCharsets.UTF_8);
        return file;
    }

    private static SimulationResult run(Path file) throws StudyFormatException {
        AnalysisFile analysis = new AnalysisFileReader().read(file);
        return new MonteCarloSimulator().run(analysis.study(),
                new SimulationSettings(analysis.realisations(), analysis.seed(), 1, analysis.cellHeight()),
                new NullProgressMonitor());
    }

    private static double p50Contact(SimulationResult result) {
        return result.units().get(0).statistics(UnitQuantity.CONTACT).level(ExceedanceLevel.P50);
    }

    @Test
    void faultRockInPorousGrainstoneHoldsTheColumnDownToSpill() throws Exception {
        double juxtapositionOnly = p50Contact(run(study("\"seal\": {\"criterion\": \"juxtaposition\", "
                + "\"burialDepth\": 2000}")));
        SimulationResult carbonate = run(study(null));
        double withFaultRock = p50Contact(carbonate);
        // juxtaposition only: Reef A leaks where it first meets Reef A across the fault, about 1045 m (geometry)
        assertEquals(1045, juxtapositionOnly, 6);
        // grainstone fault rock, 5 bar (seed table, from memory) holds 5e5 / (300 kg/m3 * 9.81) = 170 m of oil
        // above 1045 m, more than the spill point allows: the contact moves to spill, about 1075 m (geometry)
        assertEquals(1075, withFaultRock, 6);
        assertTrue(withFaultRock > juxtapositionOnly + 20, "the carbonate criterion changes the contact");
        assertEquals(0, carbonate.warnings().size(), carbonate.warnings().toString());
    }

    @Test
    void aClayBasedCriterionOnTheCarbonateStudyIsFlagged() throws Exception {
        SimulationResult sgr = run(study("\"seal\": {\"criterion\": \"sgr\", \"burialDepth\": 2000}"));
        assertEquals(1, sgr.warnings().size(), sgr.warnings().toString());
        assertTrue(sgr.warnings().get(0).contains("Reef A"), sgr.warnings().get(0));
    }

    @Test
    void aWrongFaciesInTheAnalysisFileNamesTheFileAndField() throws Exception {
        Path file = study(null);
        Files.writeString(file, Files.readString(file).replace("\"grainstone\"", "\"oolite\""));
        StudyFormatException e = org.junit.jupiter.api.Assertions.assertThrows(StudyFormatException.class,
                () -> new AnalysisFileReader().read(file));
        assertTrue(e.getMessage().contains("study.json") && e.getMessage().contains("seal.parameters")
                && e.getMessage().contains("units.Reef A.facies"), e.getMessage());
    }
}
