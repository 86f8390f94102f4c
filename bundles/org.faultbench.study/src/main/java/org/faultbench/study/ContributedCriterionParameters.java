package org.faultbench.study;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;

import com.google.gson.Gson;

import org.faultbench.seal.CriterionParameters;
import org.faultbench.seal.SealCriterion;

/**
 * Hands an analysis file's {@code seal.parameters} object to the chosen criterion
 * ({@link SealCriterion#configured}), so contributed criteria can be set up from the file without the reader knowing
 * them. The criterion's message is prefixed with the file and JSON path.
 */
final class ContributedCriterionParameters {

    private static final Gson GSON = new Gson();

    private ContributedCriterionParameters() {
    }

    static SealCriterion configure(SealCriterion criterion, JsonNode seal, Path folder) throws StudyFormatException {
        if (!seal.has("parameters")) {
            return criterion;
        }
        JsonNode node = seal.field("parameters");
        if (!node.element().isJsonObject()) {
            throw node.error("expected an object { ... } of criterion parameters");
        }
        Map<String, Object> values = new LinkedHashMap<>();
        node.element().getAsJsonObject().entrySet()
                .forEach(entry -> values.put(entry.getKey(), GSON.fromJson(entry.getValue(), Object.class)));
        try {
            return criterion.configured(new CriterionParameters(folder, values));
        } catch (IllegalArgumentException e) {
            throw node.error(e.getMessage(), e);
        }
    }
}
