package org.faultbench.report;

import java.util.ArrayList;
import java.util.List;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

import org.faultbench.report.chart.MapWell;

/**
 * The optional {@code "wells"} list of an analysis file, shown on the report's map and in the inputs summary:
 * {@code [{"name": "EX-1", "x": 402450, "y": 6203100, "status": "oil producer"}]}. The analysis ignores it.
 */
final class ReportWells {
    private ReportWells() {
    }

    static List<MapWell> of(JsonObject document, String file) {
        List<MapWell> wells = new ArrayList<>();
        if (document == null || !document.has("wells")) {
            return wells;
        }
        if (!document.get("wells").isJsonArray()) {
            throw new IllegalArgumentException(file + ": wells: expected a list of {name, x, y, status}");
        }
        int index = 0;
        for (JsonElement element : document.getAsJsonArray("wells")) {
            String where = file + ": wells[" + index++ + "]";
            if (!element.isJsonObject()) {
                throw new IllegalArgumentException(where + ": expected an object with name, x and y");
            }
            JsonObject w = element.getAsJsonObject();
            wells.add(new MapWell(text(w, "name", where), number(w, "x", where), number(w, "y", where),
                    w.has("status") ? w.get("status").getAsString() : ""));
        }
        return wells;
    }

    private static String text(JsonObject w, String field, String where) {
        if (!w.has(field) || !w.get(field).isJsonPrimitive()) {
            throw new IllegalArgumentException(where + "." + field + ": missing (expected text)");
        }
        return w.get(field).getAsString();
    }

    private static double number(JsonObject w, String field, String where) {
        if (!w.has(field) || !w.get(field).isJsonPrimitive() || !w.get(field).getAsJsonPrimitive().isNumber()) {
            throw new IllegalArgumentException(where + "." + field + ": missing or not a number (expected metres)");
        }
        return w.get(field).getAsDouble();
    }
}
