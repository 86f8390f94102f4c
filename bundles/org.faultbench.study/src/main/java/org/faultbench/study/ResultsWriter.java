package org.faultbench.study;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

import org.faultbench.core.units.VolumeUnit;
import org.faultbench.sim.ContributedInput;
import org.faultbench.sim.ExceedanceLevel;
import org.faultbench.sim.LeakLocation;
import org.faultbench.sim.LeakProbabilityMap;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.StreamingSummary;
import org.faultbench.sim.TornadoBar;
import org.faultbench.sim.UnitQuantity;
import org.faultbench.sim.UnitSummary;
import org.faultbench.trap.Mechanism;

/**
 * Writes a run's results into a folder: {@code results.json} (schema "faultbench-results" version
 * {@value #RESULTS_VERSION}, described in DEVELOPERS.md), {@code summary.csv} (one row per unit and quantity) and
 * one {@code leak-probability-<fault>.csv} per fault. Files are first written to a temporary folder beside the
 * target and then moved in, so a failed run leaves nothing half-written.
 */
public final class ResultsWriter {
    public static final int RESULTS_VERSION = 1;

    /** The cautions that go with every result file. */
    public static final List<String> CAUTIONS = List.of(
            "Decision support only: results are model estimates, not a decision.",
            "Inputs are uncertain; read the P90/P50/P10 ranges (exceedance convention: P90 is the low case), not single"
                    + " numbers.",
            "Seal calibrations are basin-specific; calibrate against field pressures and contacts.",
            "Clay-based seal rules do not apply to carbonates, evaporites or crystalline rocks.",
            "Defer to licensed professionals and local regulations for well, reserves and storage decisions.");

    private final String programVersion;

    public ResultsWriter(String programVersion) {
        this.programVersion = programVersion;
    }

    public void write(AnalysisFile analysis, SimulationResult result, Path outDir) throws IOException {
        Map<String, byte[]> files = new LinkedHashMap<>();
        files.put("results.json", utf8(new GsonBuilder().setPrettyPrinting().serializeSpecialFloatingPointValues()
                .create().toJson(resultsJson(analysis, result))));
        files.put("summary.csv", utf8(summaryCsv(result)));
        for (LeakProbabilityMap map : result.leakMaps()) {
            files.put("leak-probability-" + safe(map.faultId()) + ".csv", utf8(leakCsv(map)));
        }
        StagedOutput.write(outDir, files);
    }

    private static byte[] utf8(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }

    private static String safe(String id) {
        return id.replaceAll("[^A-Za-z0-9._-]", "_");
    }

    JsonObject resultsJson(AnalysisFile analysis, SimulationResult result) {
        JsonObject root = new JsonObject();
        root.addProperty("format", "faultbench-results");
        root.addProperty("formatVersion", RESULTS_VERSION);
        JsonObject program = new JsonObject();
        program.addProperty("name", "Faultbench");
        program.addProperty("version", programVersion);
        root.add("program", program);
        root.addProperty("study", result.studyName());
        root.addProperty("analysisFile", analysis.file().toString());
        root.addProperty("analysisSha256", analysis.sha256());
        root.addProperty("seed", result.settings().seed());
        root.addProperty("realisationsRequested", result.settings().realisations());
        root.addProperty("realisationsRun", result.realisationsRun());
        root.addProperty("complete", result.complete());
        root.addProperty("threads", result.settings().threads());
        JsonObject conventions = new JsonObject();
        conventions.addProperty("depth", "metres TVDSS, positive down");
        conventions.addProperty("volume", "stock-tank m3 (STOIIP); barrels = m3 x 6.2898");
        conventions.addProperty("percentiles", "exceedance convention (PRMS): P90 = low case = 10th percentile,"
                + " P10 = high case = 90th percentile; estimated in streaming form with the P2 algorithm");
        root.add("conventions", conventions);
        root.add("cautions", strings(CAUTIONS));
        root.add("warnings", strings(result.warnings()));
        JsonArray units = new JsonArray();
        for (UnitSummary unit : result.units()) {
            units.add(unitJson(unit));
        }
        root.add("units", units);
        root.add("tornado", tornadoJson(result.tornado()));
        JsonArray leaks = new JsonArray();
        for (LeakProbabilityMap map : result.leakMaps()) {
            JsonObject m = new JsonObject();
            m.addProperty("fault", map.faultId());
            m.addProperty("maximumProbability", map.maximum());
            m.addProperty("file", "leak-probability-" + safe(map.faultId()) + ".csv");
            m.addProperty("columns", map.columns());
            m.addProperty("rows", map.rows());
            m.addProperty("zTop", map.zTop());
            m.addProperty("cellHeight", map.cellHeight());
            leaks.add(m);
        }
        root.add("leakProbability", leaks);
        root.add("inputs", analysis.document());
        root.add("sampledInputs", sampledInputsJson(analysis.study().contributedInputs()));
        return root;
    }

    /** The plug-in inputs with the distributions drawn, which the echoed file may leave to the plug-in's default. */
    private static JsonArray sampledInputsJson(List<ContributedInput> contributed) {
        JsonArray inputs = new JsonArray();
        for (ContributedInput c : contributed) {
            JsonObject input = new JsonObject();
            input.addProperty("id", c.id());
            input.addProperty("name", c.input().name());
            input.addProperty("target", c.target().name());
            input.add("distribution", UncertainValueFormat.write(c.distribution(), c.input().bounds()));
            inputs.add(input);
        }
        return inputs;
    }

    private static JsonArray strings(List<String> values) {
        JsonArray array = new JsonArray();
        values.forEach(array::add);
        return array;
    }

    private static JsonObject unitJson(UnitSummary unit) {
        JsonObject u = new JsonObject();
        u.addProperty("name", unit.unitName());
        JsonObject base = new JsonObject();
        base.addProperty("mechanism", unit.baseMechanism().name());
        LeakLocation at = unit.baseLeakLocation();
        if (at != null) {
            JsonObject leak = new JsonObject();
            leak.addProperty("fault", at.faultId());
            leak.addProperty("u", at.u());
            leak.addProperty("z", at.z());
            base.add("leakLocation", leak);
        }
        for (Map.Entry<UnitQuantity, Double> e : unit.baseCase().entrySet()) {
            addNumber(base, key(e.getKey()), e.getValue());
        }
        u.add("baseCase", base);
        JsonObject fractions = new JsonObject();
        for (Map.Entry<Mechanism, Double> e : unit.mechanismFractions().entrySet()) {
            fractions.addProperty(e.getKey().name(), e.getValue());
        }
        u.add("mechanismFractions", fractions);
        JsonObject quantities = new JsonObject();
        for (UnitQuantity q : UnitQuantity.values()) {
            StreamingSummary s = unit.statistics(q);
            JsonObject o = new JsonObject();
            o.addProperty("label", q.label());
            o.addProperty("unit", q.unit());
            for (ExceedanceLevel level : ExceedanceLevel.values()) {
                addNumber(o, level.name(), s.level(level));
            }
            addNumber(o, "mean", s.mean());
            addNumber(o, "min", s.min());
            addNumber(o, "max", s.max());
            o.addProperty("finiteFraction", s.finiteFraction());
            if ("m3".equals(q.unit())) {
                o.add("stockTankBarrels", barrels(s));
            }
            quantities.add(key(q), o);
        }
        u.add("quantities", quantities);
        return u;
    }

    /** The same statistics converted to stock-tank barrels (1 m3 = 6.2898 bbl). */
    private static JsonObject barrels(StreamingSummary s) {
        JsonObject bbl = new JsonObject();
        for (ExceedanceLevel level : ExceedanceLevel.values()) {
            addNumber(bbl, level.name(), VolumeUnit.BARREL.fromCubicMetres(s.level(level)));
        }
        addNumber(bbl, "mean", VolumeUnit.BARREL.fromCubicMetres(s.mean()));
        return bbl;
    }

    private static JsonObject tornadoJson(Map<String, List<TornadoBar>> tornado) {
        JsonObject t = new JsonObject();
        for (Map.Entry<String, List<TornadoBar>> e : tornado.entrySet()) {
            JsonArray bars = new JsonArray();
            for (TornadoBar bar : e.getValue()) {
                JsonObject b = new JsonObject();
                b.addProperty("input", bar.input());
                addNumber(b, "contactWithP90Input", bar.contactWithLowInput());
                addNumber(b, "contactWithP10Input", bar.contactWithHighInput());
                b.addProperty("swing", bar.swing());
                bars.add(b);
            }
            t.add(e.getKey(), bars);
        }
        return t;
    }

    /** JSON has no NaN or infinity: such values are written as null. */
    private static void addNumber(JsonObject o, String key, double value) {
        if (Double.isFinite(value)) {
            o.addProperty(key, value);
        } else {
            o.add(key, com.google.gson.JsonNull.INSTANCE);
        }
    }

    static String key(UnitQuantity q) {
        String[] words = q.name().toLowerCase(Locale.ROOT).split("_");
        StringBuilder key = new StringBuilder(words[0]);
        for (int i = 1; i < words.length; i++) {
            key.append(Character.toUpperCase(words[i].charAt(0))).append(words[i].substring(1));
        }
        return key.toString();
    }

    static String summaryCsv(SimulationResult result) {
        StringBuilder csv = new StringBuilder(
                "unit,quantity,measure,P90_low,P50,P10_high,mean,finite_fraction,base_case,base_mechanism\n");
        for (UnitSummary unit : result.units()) {
            for (UnitQuantity q : UnitQuantity.values()) {
                StreamingSummary s = unit.statistics(q);
                List<String> cells = new ArrayList<>(List.of(csvText(unit.unitName()), key(q), q.unit()));
                for (ExceedanceLevel level : ExceedanceLevel.values()) {
                    cells.add(number(s.level(level)));
                }
                cells.add(number(s.mean()));
                cells.add(number(s.finiteFraction()));
                cells.add(number(unit.baseCase().get(q)));
                cells.add(unit.baseMechanism().name());
                csv.append(String.join(",", cells)).append('\n');
            }
        }
        return csv.toString();
    }

    private static String leakCsv(LeakProbabilityMap map) {
        StringBuilder csv = new StringBuilder("u,z,probability\n");
        for (int row = 0; row < map.rows(); row++) {
            double z = map.zTop() + (row + 0.5) * map.cellHeight();
            for (int c = 0; c < map.columns(); c++) {
                double p = map.probability(c, row);
                if (p > 0) {
                    csv.append(number(map.u()[c])).append(',').append(number(z)).append(',').append(number(p))
                            .append('\n');
                }
            }
        }
        return csv.toString();
    }

    private static String number(Double value) {
        return value == null || !Double.isFinite(value) ? "" : String.format(Locale.ROOT, "%.6g", value);
    }

    private static String csvText(String text) {
        return text.contains(",") || text.contains("\"") ? "\"" + text.replace("\"", "\"\"") + "\"" : text;
    }
}
