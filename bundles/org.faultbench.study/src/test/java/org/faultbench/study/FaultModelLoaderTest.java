package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.faultbench.digitize.io.EsriAsciiGridReader;
import org.faultbench.digitize.io.FileUnits;
import org.faultbench.faults.profile.ThrowProfile;
import org.faultbench.faults.qc.PolarityFlipRule;
import org.faultbench.faults.qc.QcFinding;
import org.faultbench.faults.qc.QcRuleCatalog;
import org.faultbench.faults.repair.FaultModel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FaultModelLoaderTest {
    private static final Path DEMO = Path.of("../../demo-workspace");

    private static FaultModel demo() throws Exception {
        var top = new EsriAsciiGridReader(FileUnits.METRES).read(DEMO.resolve("grids/top-sand-a.asc"));
        return new FaultModelLoader().load(DEMO.resolve("faults/faults.geojson"),
                List.of(new FaultModelLoader.Horizon("Top Sand A", top)));
    }

    @Test
    void theDemoFaultsGetThrowProfilesFromTheGrid() throws Exception {
        FaultModel model = demo();
        assertEquals(List.of("F-West", "F-East", "F-North"), model.faults().stream().map(f -> f.id()).toList());
        ThrowProfile east = model.throwProfiles("F-East").get(0);
        // the invented demo surface steps by up to about 80 m across F-East (demo-workspace/README.md): the profile
        // sampled from the grid must see a throw of that order, and less near the tips than in the middle
        assertTrue(east.maxAbsThrow() > 50 && east.maxAbsThrow() < 110, "max throw " + east.maxAbsThrow());
    }

    @Test
    void qcFindsTheOverCorrelatedFault() throws Exception {
        List<QcFinding> findings = demo().check(QcRuleCatalog.withBuiltIns(), null);
        // throw polarity changing sign along one trace: two faults joined across a relay (common practice)
        assertTrue(findings.stream().anyMatch(f -> f.faultId().equals("F-North")
                && f.ruleId().equals(PolarityFlipRule.ID)), findings.toString());
        assertFalse(findings.stream().anyMatch(f -> !f.faultId().equals("F-North")
                && f.ruleId().equals(PolarityFlipRule.ID)), findings.toString());
    }

    @Test
    void aFaultWithoutDipIsRefusedWithItsField(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("faults.geojson");
        Files.writeString(file, """
                {"type": "FeatureCollection", "features": [
                 {"type": "Feature", "properties": {"id": "A", "dipAzimuth": 90},
                  "geometry": {"type": "LineString", "coordinates": [[0, 0], [0, 100]]}}]}
                """);
        StudyFormatException e = org.junit.jupiter.api.Assertions.assertThrows(StudyFormatException.class,
                () -> new FaultModelLoader().load(file, List.of()));
        assertTrue(e.getMessage().contains("features[0].properties.dip"), e.getMessage());
    }
}
