package org.faultbench.report;

import java.util.ArrayList;
import java.util.List;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

import org.faultbench.core.uncertain.UncertainValueNotation;
import org.faultbench.report.chart.MapWell;
import org.faultbench.sim.ContributedInput;
import org.faultbench.study.AnalysisFile;

/** The inputs section: stratigraphy with its distributions, faults, fluids, seal, wells and the other settings. */
final class InputsSummary {
    private InputsSummary() {
    }

    static List<Block> blocks(AnalysisFile analysis) {
        JsonObject doc = analysis.document();
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Block.Paragraph("Inputs as written in the analysis file " + analysis.file().getFileName()
                + ". Uncertain inputs are shown with their distributions; depths are m TVDSS, positive down."));
        blocks.add(stratigraphy(doc));
        blocks.add(faults(doc));
        blocks.add(settings(analysis, doc));
        List<ContributedInput> contributed = analysis.study().contributedInputs();
        if (!contributed.isEmpty()) {
            blocks.add(sampledInputs(contributed));
        }
        List<MapWell> wells = ReportWells.of(doc, analysis.file().getFileName().toString());
        if (!wells.isEmpty()) {
            List<List<String>> rows = new ArrayList<>();
            for (MapWell w : wells) {
                rows.add(List.of(w.name(), ReportNumbers.metres(w.x()), ReportNumbers.metres(w.y()), w.status()));
            }
            blocks.add(new Block.Table("inputs-wells", "Wells", List.of("well", "x [m]", "y [m]", "status"), rows,
                    0.25));
        }
        return blocks;
    }

    /** Plug-in inputs with the distributions actually drawn (a plug-in's default may change between versions). */
    static Block sampledInputs(List<ContributedInput> contributed) {
        List<List<String>> rows = new ArrayList<>();
        for (ContributedInput c : contributed) {
            rows.add(List.of(c.id(), c.input().name(), c.target().description(),
                    UncertainValueNotation.format(c.distribution(), c.input().bounds())));
        }
        return new Block.Table("inputs-sampled", "Sampled inputs from plug-ins, drawn after the built-in inputs in"
                + " this order", List.of("id", "name", "acts on", "distribution"), rows, 0.2);
    }

    private static Block stratigraphy(JsonObject doc) {
        JsonObject strat = object(doc, "stratigraphy");
        List<List<String>> rows = new ArrayList<>();
        if (strat != null && strat.has("units")) {
            for (JsonElement e : strat.getAsJsonArray("units")) {
                JsonObject u = e.getAsJsonObject();
                rows.add(List.of(DistributionText.field(u, "name"), DistributionText.field(u, "lithology"),
                        DistributionText.field(u, "thickness"), DistributionText.field(u, "vcl"),
                        DistributionText.field(u, "ntg"), DistributionText.field(u, "porosity"),
                        DistributionText.field(u, "sw"), DistributionText.field(u, "bo")));
            }
        }
        String reference = strat == null ? "-" : DistributionText.field(strat, "referenceUnit");
        return new Block.Table("inputs-stratigraphy", "Stratigraphy, shallowest first (reference unit: " + reference
                + ")", List.of("unit", "lithology", "thickness [m]", "Vcl [fraction]", "N/G [fraction]",
                        "porosity [fraction]", "Sw [fraction]", "Bo [rm3/sm3]"), rows, 0.12);
    }

    private static Block faults(JsonObject doc) {
        List<List<String>> rows = new ArrayList<>();
        if (doc.has("faults")) {
            for (JsonElement e : doc.getAsJsonArray("faults")) {
                JsonObject f = e.getAsJsonObject();
                boolean normal = !f.has("normal") || f.get("normal").getAsBoolean();
                JsonObject cutOffs = object(f, "cutOffs");
                String cut = cutOffs == null ? "from the grid"
                        : cutOffs.has("footwall") ? "digitized"
                        : "from the grid, " + DistributionText.field(cutOffs, "gridOffset") + " m off the trace";
                rows.add(List.of(DistributionText.field(f, "id"), DistributionText.field(f, "name"),
                        DistributionText.field(f, "dip"), DistributionText.field(f, "dipAzimuth"),
                        normal ? "normal" : "reverse", DistributionText.field(f, "columns"),
                        DistributionText.field(f, "throwScale"), cut));
            }
        }
        return new Block.Table("inputs-faults", "Bounding faults", List.of("id", "name", "dip [deg]",
                "dip azimuth [deg]", "sense", "columns", "throw scale [factor]", "cut-off lines"), rows, 0.1);
    }

    private static Block settings(AnalysisFile analysis, JsonObject doc) {
        List<List<String>> rows = new ArrayList<>();
        JsonObject top = object(doc, "referenceTop");
        rows.add(List.of("reference top grid", top == null ? "-"
                : DistributionText.field(top, "grid") + " (" + DistributionText.field(top, "format") + ", "
                        + DistributionText.field(top, "unit") + ")"));
        JsonObject fluids = object(doc, "fluids");
        rows.add(List.of("trapped fluid", DistributionText.field(fluids, "trapped")));
        rows.add(List.of("fluid density [kg/m3]", DistributionText.field(fluids, "density")));
        rows.add(List.of("brine density [kg/m3]", DistributionText.field(fluids, "brineDensity")));
        JsonObject seal = object(doc, "seal");
        rows.add(List.of("seal criterion", DistributionText.field(seal, "criterion")
                + (analysis.study().seal().criterion() == null ? "" : " - " + analysis.study().seal().criterion().name())));
        if (seal != null && seal.has("pressureModel")) {
            rows.add(List.of("seal calibration (pressure model)", DistributionText.field(seal, "pressureModel")));
        }
        rows.add(List.of("burial depth for the calibration [m]", DistributionText.field(seal, "burialDepth")));
        rows.add(List.of("calibration shift [log10 of threshold pressure]",
                DistributionText.field(seal, "calibrationShift")));
        JsonObject depth = object(doc, "depthUncertainty");
        rows.add(List.of("depth shift [m]", DistributionText.field(depth, "shift")));
        rows.add(List.of("depth residual sd [m]", DistributionText.field(depth, "residualSd")));
        rows.add(List.of("residual correlation length [m]", DistributionText.field(depth, "correlationLength")));
        rows.add(List.of("spill depth [m]", doc.has("spillDepth") ? DistributionText.field(doc, "spillDepth")
                : "computed (flooding from the crest, faults as barriers)"));
        rows.add(List.of("top-seal capacity [bar]", doc.has("topSealCapacityBar")
                ? DistributionText.field(doc, "topSealCapacityBar") : "not limiting"));
        JsonObject attic = object(doc, "attic");
        if (attic != null) {
            rows.add(List.of("drained block across fault", DistributionText.field(attic, "drainedFault")));
            rows.add(List.of("well drainage depth [m]", DistributionText.field(attic, "drainageDepth")));
        }
        rows.add(List.of("fault-plane cell height [m]", ReportNumbers.plain(analysis.cellHeight())));
        return new Block.Table("inputs-settings", "Fluids, seal, depth uncertainty, spill, attic",
                List.of("input", "value"), rows, 0.45);
    }

    private static JsonObject object(JsonObject parent, String name) {
        return parent != null && parent.has(name) && parent.get(name).isJsonObject() ? parent.getAsJsonObject(name)
                : null;
    }
}
