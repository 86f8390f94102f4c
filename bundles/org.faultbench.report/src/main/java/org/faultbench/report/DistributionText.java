package org.faultbench.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

/**
 * An uncertain input as written in the analysis file, in words: {@code 14} stays "14",
 * {@code {"normal": {"mean": 14, "sd": 2}}} becomes "normal (mean 14, sd 2)". Reading the file's own text keeps the
 * report faithful to what the geologist entered.
 */
final class DistributionText {
    private DistributionText() {
    }

    static String of(JsonElement value) {
        if (value == null || value.isJsonNull()) {
            return "-";
        }
        if (value.isJsonPrimitive()) {
            var p = value.getAsJsonPrimitive();
            return p.isNumber() ? ReportNumbers.plain(p.getAsDouble()) : p.getAsString();
        }
        if (value.isJsonObject() && value.getAsJsonObject().size() == 1) {
            Map.Entry<String, JsonElement> e = value.getAsJsonObject().entrySet().iterator().next();
            if (e.getValue().isJsonObject()) {
                List<String> parts = new ArrayList<>();
                for (Map.Entry<String, JsonElement> p : e.getValue().getAsJsonObject().entrySet()) {
                    parts.add(p.getKey() + " " + of(p.getValue()));
                }
                return e.getKey() + " (" + String.join(", ", parts) + ")";
            }
        }
        return value.toString();
    }

    /** The field of {@code object} in words, "-" when absent. */
    static String field(JsonObject object, String name) {
        return object != null && object.has(name) ? of(object.get(name)) : "-";
    }
}
