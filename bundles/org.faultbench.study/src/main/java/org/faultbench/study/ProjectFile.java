package org.faultbench.study;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;

import org.faultbench.core.units.LengthUnit;

/**
 * A workspace as described by its project file ({@code faultbench-project.json}, format "faultbench-project",
 * schema version {@value ProjectFileFormat#SCHEMA_VERSION}; see DEVELOPERS.md). Every path is relative to the
 * workspace folder, uses {@code /} and stays inside it.
 *
 * @param name shown in the title bar and reports
 * @param lengthUnit unit in which the user enters and sees lengths and depths
 * @param crsEpsg EPSG code of the map coordinates; empty for a local engineering grid
 * @param crsNote free text describing the coordinates (may be empty)
 * @param activeStudy the analysis file the workbench opens at start-up, one of {@code studies}
 * @param studies analysis files
 * @param mapSheets map-sheet files (format "faultbench-mapsheet")
 * @param grids grid files (ESRI ASCII, ZMAP+)
 * @param wells well files (tops CSV, LAS)
 * @param faults fault files (GeoJSON, WKT)
 */
public record ProjectFile(String name, LengthUnit lengthUnit, OptionalInt crsEpsg, String crsNote,
        Optional<String> activeStudy, List<String> studies, List<String> mapSheets, List<String> grids,
        List<String> wells, List<String> faults) {
    public ProjectFile {
        Objects.requireNonNull(name, "project name");
        Objects.requireNonNull(lengthUnit, "project length unit");
        Objects.requireNonNull(crsEpsg, "project CRS code");
        crsNote = crsNote == null ? "" : crsNote;
        Objects.requireNonNull(activeStudy, "active study");
        studies = List.copyOf(studies);
        mapSheets = List.copyOf(mapSheets);
        grids = List.copyOf(grids);
        wells = List.copyOf(wells);
        faults = List.copyOf(faults);
        if (activeStudy.isPresent() && !studies.contains(activeStudy.get())) {
            throw new IllegalArgumentException("active study " + activeStudy.get() + " is not one of the studies "
                    + studies);
        }
    }
}
