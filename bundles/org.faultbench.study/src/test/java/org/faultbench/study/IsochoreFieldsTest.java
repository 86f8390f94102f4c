package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.DoubleBinaryOperator;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.digitize.io.EsriAsciiGridWriter;
import org.faultbench.digitize.io.FileUnits;
import org.faultbench.strat.IsochoreThickness;
import org.faultbench.strat.Stratigraphy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Thicknesses given as isochore grids in the analysis file, and the errors a geologist sees for bad ones. */
class IsochoreFieldsTest {
    private static final String ISOCHORE_A = "{\"isochore\": \"grids/sand-a-isochore.asc\","
            + " \"scale\": {\"truncatedNormal\": {\"mean\": 1, \"sd\": 0.1, \"min\": 0, \"max\": 2}}}";

    @TempDir
    Path dir;

    private Path write(GridGeometry geometry, DoubleBinaryOperator thickness) throws IOException {
        Files.createDirectories(dir.resolve("grids"));
        new EsriAsciiGridWriter(FileUnits.METRES, 4).write(RegularGrid.sample(geometry, thickness),
                dir.resolve("grids/sand-a-isochore.asc"));
        String json = DomeStudyFiles.VALID_TEMPLATE.replace("CRITERION", "juxtaposition").replace("THICKNESS_A",
                ISOCHORE_A);
        return DomeStudyFiles.writeJson(dir, 20, json);
    }

    @Test
    void aLinearIsochoreIsReadWithItsScaleAndResolvedAtAPosition() throws Exception {
        // t = 20 + 0.01·(y + 2000): at y = 500, 20 + 25 = 45 m (hand calculation), scale nominal 1
        Path file = write(DomeStudyFiles.GRID, (x, y) -> 20 + 0.01 * (y + 2000));
        Stratigraphy strat = new AnalysisFileReader().read(file).study().stratigraphy();
        assertTrue(strat.thicknessModel() instanceof IsochoreThickness);
        var column = strat.nominalDraw().columnAt(-300, 500);
        assertEquals(45, column.base(1) - column.top(1), 1e-9);
        assertEquals(50, column.top(1), 0, "Top Seal keeps its constant 50 m");
        assertEquals(45 + 10, column.top(3) - column.top(1), 1e-9, "Sand B hangs below Sand A's isochore base");
    }

    @Test
    void missingIsochoreFileIsNamed() throws Exception {
        Path file = write(DomeStudyFiles.GRID, (x, y) -> 30);
        Files.delete(dir.resolve("grids/sand-a-isochore.asc"));
        StudyFormatException e = assertThrows(StudyFormatException.class, () -> new AnalysisFileReader().read(file));
        assertEquals("stratigraphy.units[1].thickness.isochore", e.field());
        assertTrue(e.getMessage().contains("sand-a-isochore.asc") && e.getMessage().contains("study.json"),
                e.getMessage());
    }

    @Test
    void negativeThicknessInTheGridIsNamedWithItsNode() throws Exception {
        Path file = write(DomeStudyFiles.GRID, (x, y) -> x < -1500 && y < -1500 ? -2 : 30);
        StudyFormatException e = assertThrows(StudyFormatException.class, () -> new AnalysisFileReader().read(file));
        assertEquals("stratigraphy.units[1].thickness.isochore", e.field());
        assertTrue(e.getMessage().contains("negative thickness -2") && e.getMessage().contains("column 1, row 1"),
                e.getMessage());
    }

    @Test
    void aGridThatDoesNotCoverTheCompartmentIsRefused() throws Exception {
        // covers x from -1000 only; the compartment reaches x = -2000
        Path file = write(new GridGeometry(101, 201, -1000, -2000, 20, 20), (x, y) -> 30);
        StudyFormatException e = assertThrows(StudyFormatException.class, () -> new AnalysisFileReader().read(file));
        assertEquals("stratigraphy.units[1].thickness.isochore", e.field());
        assertTrue(e.getMessage().contains("does not cover the compartment"), e.getMessage());
    }

    @Test
    void aNegativeScaleBoundIsRefused() throws Exception {
        Path file = write(DomeStudyFiles.GRID, (x, y) -> 30);
        Files.writeString(file, Files.readString(file).replace("\"min\": 0, \"max\": 2", "\"min\": -1, \"max\": 2"));
        StudyFormatException e = assertThrows(StudyFormatException.class, () -> new AnalysisFileReader().read(file));
        assertTrue(e.field().startsWith("stratigraphy.units[1].thickness"), e.field());
    }
}
