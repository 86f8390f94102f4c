package org.faultbench.study;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.sim.SampledInput;

/**
 * Edits of an open study. Each edit changes the analysis file's JSON (so saving writes exactly what the user sees,
 * with every other field left as it was) and reads the result back through {@link AnalysisFileReader}, so an edit
 * that the file format or the model would reject is rejected here, before it reaches the active study.
 */
public final class StudyEdits {

    private StudyEdits() {
    }

    /** The study with one property of the unit at {@code unitIndex} (shallowest first) set to {@code value}. */
    public static AnalysisFile withUnitProperty(AnalysisFile analysis, int unitIndex, UnitProperty property,
            UncertainValue value) throws StudyFormatException {
        JsonElement json;
        try {
            json = UncertainValueFormat.write(value, property.bounds());
        } catch (IllegalArgumentException e) {
            throw new StudyFormatException(analysis.file().toString(), unitField(unitIndex, property.key()),
                    e.getMessage(), e);
        }
        return withUnitField(analysis, unitIndex, property.key(), json);
    }

    /** The study with the lithology of the unit at {@code unitIndex} changed. */
    public static AnalysisFile withUnitLithology(AnalysisFile analysis, int unitIndex, LithologyClass lithology)
            throws StudyFormatException {
        return withUnitField(analysis, unitIndex, "lithology",
                new JsonPrimitive(lithology.name().toLowerCase(java.util.Locale.ROOT)));
    }

    /**
     * The study with the plug-in sampled {@code input} included (with {@code distribution}, or the input's own when
     * null) or, when {@code included} is false, left out. An input already listed keeps its place in the draw order;
     * a new one is drawn last.
     */
    public static AnalysisFile withSampledInput(AnalysisFile analysis, SampledInput input, boolean included,
            UncertainValue distribution) throws StudyFormatException {
        String id = input.id();
        JsonObject document = analysis.document().deepCopy();
        JsonArray inputs = document.has("sampledInputs") && document.get("sampledInputs").isJsonArray()
                ? document.getAsJsonArray("sampledInputs") : new JsonArray();
        int at = -1;
        for (int k = 0; k < inputs.size(); k++) {
            JsonElement entry = inputs.get(k);
            if (entry.isJsonObject() && entry.getAsJsonObject().has("id")
                    && id.equals(entry.getAsJsonObject().get("id").getAsString())) {
                at = k;
            }
        }
        if (!included) {
            if (at >= 0) {
                inputs.remove(at);
            }
        } else {
            JsonObject entry = new JsonObject();
            entry.addProperty("id", id);
            if (distribution != null) {
                try {
                    entry.add("distribution", UncertainValueFormat.write(distribution, input.bounds()));
                } catch (IllegalArgumentException e) {
                    throw new StudyFormatException(analysis.file().toString(), "sampledInputs", e.getMessage(), e);
                }
            }
            if (at >= 0) {
                inputs.set(at, entry);
            } else {
                inputs.add(entry);
            }
        }
        if (inputs.isEmpty()) {
            document.remove("sampledInputs");
        } else {
            document.add("sampledInputs", inputs);
        }
        return new AnalysisFileReader().read(analysis.file(), StudyJson.pretty(document));
    }

    /** The analysis file's text as it would be saved: the edited JSON, pretty-printed. */
    public static byte[] content(AnalysisFile analysis) {
        return StudyJson.pretty(analysis.document());
    }

    private static AnalysisFile withUnitField(AnalysisFile analysis, int unitIndex, String key, JsonElement value)
            throws StudyFormatException {
        JsonObject document = analysis.document().deepCopy();
        JsonObject unit = document.getAsJsonObject("stratigraphy").getAsJsonArray("units").get(unitIndex)
                .getAsJsonObject();
        unit.add(key, value);
        return new AnalysisFileReader().read(analysis.file(), StudyJson.pretty(document));
    }

    private static String unitField(int unitIndex, String key) {
        return "stratigraphy.units[" + unitIndex + "]." + key;
    }
}
