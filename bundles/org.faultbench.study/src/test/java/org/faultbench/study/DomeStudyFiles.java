package org.faultbench.study;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.digitize.io.EsriAsciiGridWriter;
import org.faultbench.digitize.io.FileUnits;

/**
 * Writes a hand-checkable analysis file: a cone-shaped top of Sand A, z = 1000 + 0.05·r around (−500, 0), cut by a
 * north–south normal fault along x = 0 dipping east with a constant throw; the compartment is the footwall west of it.
 * Column: Top Seal 50 m, Sand A 30 m (reference), Shale 10 m, Sand B 60 m.
 */
final class DomeStudyFiles {
    static final String VALID_TEMPLATE = """
            {
              "format": "faultbench-analysis",
              "formatVersion": 1,
              "name": "Dome test",
              "referenceTop": {"grid": "top.asc", "format": "esri-ascii", "unit": "m"},
              "compartment": [[-2000, -2000], [-1, -2000], [-1, 2000], [-2000, 2000]],
              "stratigraphy": {
                "referenceUnit": "Sand A",
                "units": [
                  {"name": "Top Seal", "lithology": "seal", "thickness": 50, "vcl": 0.8},
                  {"name": "Sand A", "lithology": "reservoir", "thickness": THICKNESS_A, "vcl": 0.1,
                   "ntg": 0.8, "porosity": 0.25, "sw": 0.3, "bo": 1.2},
                  {"name": "Shale", "lithology": "seal", "thickness": 10, "vcl": 0.9},
                  {"name": "Sand B", "lithology": "reservoir", "thickness": 60, "vcl": 0.1,
                   "ntg": 0.8, "porosity": 0.25, "sw": 0.3, "bo": 1.2}
                ]
              },
              "faults": [
                {"id": "F1", "name": "Test fault", "trace": [[0, -1990], [0, 1990]], "dip": 60, "dipAzimuth": 90,
                 "columns": 398, "cutOffs": {"gridOffset": 30}}
              ],
              "fluids": {"trapped": "oil", "density": 750, "brineDensity": 1050},
              "seal": {"criterion": "CRITERION", "burialDepth": 2000},
              "attic": {"drainedFault": "F1", "drainageDepth": 1060},
              "simulation": {"realisations": 50, "seed": 3}
            }
            """;

    /** Grid of the reference top. */
    static final GridGeometry GRID = new GridGeometry(201, 201, -2000, -2000, 20, 20);

    private DomeStudyFiles() {
    }

    static Path write(Path dir, double throwMetres, String criterion) throws IOException {
        return writeJson(dir, throwMetres, VALID_TEMPLATE.replace("CRITERION", criterion).replace("THICKNESS_A", "30"));
    }

    /** Writes the grid and the given JSON text; returns the JSON file. */
    static Path writeJson(Path dir, double throwMetres, String json) throws IOException {
        GridGeometry g = GRID;
        RegularGrid top = RegularGrid.sample(g,
                (x, y) -> 1000 + 0.05 * Math.hypot(x + 500, y) + (x > 0 ? throwMetres : 0));
        new EsriAsciiGridWriter(FileUnits.METRES, 4).write(top, dir.resolve("top.asc"));
        Path file = dir.resolve("study.json");
        Files.writeString(file, json, StandardCharsets.UTF_8);
        return file;
    }
}
