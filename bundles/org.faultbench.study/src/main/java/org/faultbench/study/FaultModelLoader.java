package org.faultbench.study;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.faultbench.core.grid.RegularGrid;
import org.faultbench.digitize.gridding.FaultBarriers;
import org.faultbench.digitize.gridding.SurfaceSampler;
import org.faultbench.digitize.io.FileUnits;
import org.faultbench.digitize.vector.GeoJsonReader;
import org.faultbench.digitize.vector.VectorFeature;
import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.faultbench.faults.Wall;
import org.faultbench.faults.repair.FaultModel;
import org.locationtech.jts.geom.LineString;

/**
 * Builds the fault model that fault QC reviews from a project's fault traces (GeoJSON LineStrings with id, name, dip
 * and dipAzimuth properties) and its gridded horizons: the cut-off lines of each horizon are sampled a fixed distance
 * off the trace on each wall, with every trace a barrier, so the throw profiles come from the mapped surfaces.
 */
public final class FaultModelLoader {
    /** Distance off the trace at which a horizon is read, m (beyond the badly gridded fault zone; common practice). */
    public static final double CUT_OFF_OFFSET = 50;
    /** Along-strike spacing of the cut-off stations, m. */
    public static final double STATION_SPACING = 25;

    /** A gridded horizon and its name. */
    public record Horizon(String name, RegularGrid grid) {
    }

    /**
     * @param faultsFile GeoJSON file of fault traces
     * @param horizonsTopDown gridded horizons, shallowest first
     */
    public FaultModel load(Path faultsFile, List<Horizon> horizonsTopDown) throws IOException, StudyFormatException {
        List<Fault> faults = readFaults(faultsFile);
        FaultModel model = new FaultModel(horizonsTopDown.stream().map(Horizon::name).toList());
        faults.forEach(model::addFault);
        FaultBarriers barriers = FaultBarriers.of(faults.stream().map(Fault::trace).toList(), List.of());
        for (Horizon horizon : horizonsTopDown) {
            SurfaceSampler sampler = new SurfaceSampler(horizon.grid(), barriers);
            for (Fault fault : faults) {
                int stations = Math.max(2, (int) Math.ceil(fault.length() / STATION_SPACING) + 1);
                for (Wall wall : Wall.values()) {
                    model.putCutOff(CutOffLine.sampled(fault, horizon.name(), wall, sampler::valueAt, CUT_OFF_OFFSET,
                            stations));
                }
            }
        }
        return model;
    }

    private static List<Fault> readFaults(Path file) throws IOException, StudyFormatException {
        List<Fault> faults = new ArrayList<>();
        List<VectorFeature> features = new GeoJsonReader(FileUnits.METRES).read(file);
        for (int i = 0; i < features.size(); i++) {
            VectorFeature feature = features.get(i);
            String field = "features[" + i + "]";
            if (!(feature.geometry() instanceof LineString trace)) {
                throw new StudyFormatException(file.toString(), field + ".geometry",
                        "a fault trace must be a LineString, found " + feature.geometry().getGeometryType());
            }
            Map<String, Object> p = feature.properties();
            String id = text(p, "id", "F" + (i + 1));
            try {
                faults.add(new Fault(id, text(p, "name", id), trace, number(file, field, p, "dip"),
                        number(file, field, p, "dipAzimuth"), !Boolean.FALSE.equals(p.get("normal"))));
            } catch (IllegalArgumentException e) {
                throw new StudyFormatException(file.toString(), field, e.getMessage(), e);
            }
        }
        return faults;
    }

    private static String text(Map<String, Object> properties, String key, String fallback) {
        Object value = properties.get(key);
        return value == null ? fallback : value.toString();
    }

    private static double number(Path file, String field, Map<String, Object> properties, String key)
            throws StudyFormatException {
        if (!(properties.get(key) instanceof Number n) || !Double.isFinite(n.doubleValue())) {
            throw new StudyFormatException(file.toString(), field + ".properties." + key,
                    "expected a number, found " + properties.get(key));
        }
        return n.doubleValue();
    }
}
