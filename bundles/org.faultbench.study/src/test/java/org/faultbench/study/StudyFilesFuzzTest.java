package org.faultbench.study;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.digitize.io.EsriAsciiGridWriter;
import org.faultbench.digitize.io.FileUnits;
import org.faultbench.core.fuzz.FuzzRun;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Mutated analysis, project and map-sheet files either parse or raise {@link StudyFormatException}. */
class StudyFilesFuzzTest {
    @TempDir
    Path dir;

    @Test
    void analysisFile() throws IOException, InterruptedException {
        // a coarse version of the dome grid keeps each read fast
        GridGeometry g = new GridGeometry(41, 41, -2000, -2000, 100, 100);
        RegularGrid top = RegularGrid.sample(g, (x, y) -> 1000 + 0.05 * Math.hypot(x + 500, y) + (x > 0 ? 40 : 0));
        new EsriAsciiGridWriter(FileUnits.METRES, 4).write(top, dir.resolve("top.asc"));
        String valid = DomeStudyFiles.VALID_TEMPLATE.replace("THICKNESS_A", "{\"normal\": {\"mean\": 30, \"sd\": 3}}")
                .replace("\"columns\": 398", "\"columns\": 40");
        List<byte[]> seeds = List.of(valid.replace("CRITERION", "sgr").getBytes(StandardCharsets.UTF_8),
                valid.replace("CRITERION", "juxtaposition").getBytes(StandardCharsets.UTF_8));
        Path file = dir.resolve("study.json");
        AnalysisFileReader reader = new AnalysisFileReader();
        System.out.println(FuzzRun.run("analysis file", 600, seeds, StudyFormatException.class, in -> {
            Files.write(file, in);
            reader.read(file);
        }));
    }

    @Test
    void projectFile() throws InterruptedException {
        ProjectFileFormat format = new ProjectFileFormat();
        List<byte[]> seeds = List.of(format.write(ProjectFileFormatTest.sample()),
                "{\"format\":\"faultbench-project\",\"schemaVersion\":1,\"name\":\"w\",\"study\":\"s/x.json\"}"
                        .getBytes(StandardCharsets.UTF_8));
        System.out.println(FuzzRun.run("project file", seeds, StudyFormatException.class,
                in -> format.read(in, "faultbench-project.json")));
    }

    @Test
    void mapSheetFile() throws InterruptedException {
        MapSheetFileFormat format = new MapSheetFileFormat();
        System.out.println(FuzzRun.run("map-sheet file", List.of(format.write(MapSheetFileFormatTest.sample())),
                StudyFormatException.class, in -> format.read(in, "sheet.mapsheet.json")));
    }
}
