package org.faultbench.study;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;

import org.faultbench.core.uncertain.Bounds;
import org.faultbench.core.uncertain.FixedValue;
import org.faultbench.core.uncertain.LogNormalValue;
import org.faultbench.core.uncertain.NormalValue;
import org.faultbench.core.uncertain.TriangularValue;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.core.uncertain.UniformValue;
import org.faultbench.strat.distribution.DistributionContributions;
import org.faultbench.strat.distribution.DistributionType;

/**
 * Reads an uncertain input: a plain number (a fixed value) or an object with exactly one distribution key:
 * <pre>
 * 30
 * {"normal": {"mean": 30, "sd": 4}}
 * {"truncatedNormal": {"mean": 30, "sd": 4, "min": 20, "max": 40}}
 * {"uniform": {"min": 20, "max": 40}}
 * {"triangular": {"min": 20, "mode": 30, "max": 45}}
 * {"lognormal": {"median": 100, "sigmaLn": 0.5}}
 * {"p90p10Lognormal": {"p90": 50, "p10": 190}}
 * </pre>
 * The last form is any parameterisation of extension point {@value DistributionContributions#POINT}; it is read into
 * the kind it builds, so a saved file holds that kind (e.g. the lognormal's median and sigmaLn).
 */
final class UncertainValueFormat {
    static final List<String> KINDS = List.of("normal", "truncatedNormal", "uniform", "triangular", "lognormal");

    private UncertainValueFormat() {
    }

    static UncertainValue read(JsonNode node) throws StudyFormatException {
        if (node.isNumber()) {
            double value = node.number();
            return wrap(node, () -> UncertainValue.fixed(value));
        }
        List<String> keys = node.keys();
        Optional<DistributionType> contributed = keys.size() == 1 && !KINDS.contains(keys.get(0))
                ? DistributionContributions.platformCatalog().find(keys.get(0)) : Optional.empty();
        if (contributed.isPresent()) {
            return readContributed(node.field(keys.get(0)), contributed.get());
        }
        if (keys.size() != 1 || !KINDS.contains(keys.get(0))) {
            throw node.error("expected a number or one of " + KINDS + " or "
                    + DistributionContributions.platformCatalog().ids() + " with its parameters, found "
                    + node.element());
        }
        String kind = keys.get(0);
        JsonNode p = node.field(kind);
        switch (kind) {
        case "normal":
            double mean = p.field("mean").number();
            double sd = p.field("sd").number();
            return wrap(p, () -> UncertainValue.normal(mean, sd));
        case "truncatedNormal":
            double tMean = p.field("mean").number();
            double tSd = p.field("sd").number();
            double tMin = p.field("min").number();
            double tMax = p.field("max").number();
            return wrap(p, () -> UncertainValue.truncatedNormal(tMean, tSd, tMin, tMax));
        case "uniform":
            double uMin = p.field("min").number();
            double uMax = p.field("max").number();
            return wrap(p, () -> UncertainValue.uniform(uMin, uMax));
        case "triangular":
            double a = p.field("min").number();
            double c = p.field("mode").number();
            double b = p.field("max").number();
            return wrap(p, () -> UncertainValue.triangular(a, c, b));
        default:
            double median = p.field("median").number();
            double sigma = p.field("sigmaLn").number();
            return wrap(p, () -> UncertainValue.logNormal(median, sigma));
        }
    }

    private static UncertainValue readContributed(JsonNode p, DistributionType type) throws StudyFormatException {
        for (String key : p.keys()) {
            if (!type.parameterNames().contains(key)) {
                throw p.error("unknown parameter '" + key + "' of " + type.id() + "; expected " + type.parameterNames());
            }
        }
        Map<String, Double> parameters = new LinkedHashMap<>();
        for (String name : type.parameterNames()) {
            parameters.put(name, p.field(name).number());
        }
        return wrap(p, () -> type.create(parameters));
    }

    /**
     * The JSON form {@link #read} reads back to the same value. A truncation that only repeats {@code bounds} (the
     * limits the model adds itself, e.g. thickness &ge; 0) is left out.
     */
    static JsonElement write(UncertainValue value, Bounds bounds) {
        if (value instanceof FixedValue f) {
            return new JsonPrimitive(f.value());
        }
        JsonObject p = new JsonObject();
        String kind;
        if (value instanceof NormalValue n) {
            p.addProperty("mean", n.mean());
            p.addProperty("sd", n.standardDeviation());
            boolean explicit = limit(n.lower(), bounds.min()) || limit(n.upper(), bounds.max());
            if (explicit) {
                p.addProperty("min", n.lower());
                p.addProperty("max", n.upper());
            }
            kind = explicit ? "truncatedNormal" : "normal";
        } else if (value instanceof TriangularValue t) {
            p.addProperty("min", t.min());
            p.addProperty("mode", t.mode());
            p.addProperty("max", t.max());
            kind = "triangular";
        } else if (value instanceof UniformValue u) {
            p.addProperty("min", u.min());
            p.addProperty("max", u.max());
            kind = "uniform";
        } else {
            LogNormalValue l = (LogNormalValue) value;
            if (limit(l.lower(), bounds.min()) || limit(l.upper(), bounds.max())) {
                throw new IllegalArgumentException("the analysis file format has no truncated lognormal; "
                        + "truncate at the field's own limits " + bounds + " only");
            }
            p.addProperty("median", l.median());
            p.addProperty("sigmaLn", l.sigmaLn());
            kind = "lognormal";
        }
        JsonObject o = new JsonObject();
        o.add(kind, p);
        return o;
    }

    /** True when a truncation limit is one the user set, not open and not the field's own bound. */
    private static boolean limit(double limit, double bound) {
        return Double.isFinite(limit) && limit != bound;
    }

    /** Builds a value, turning the model's own validation message into an error at this field. */
    static <T> T wrap(JsonNode node, ModelStep<T> step) throws StudyFormatException {
        try {
            return step.build();
        } catch (IllegalArgumentException e) {
            throw node.error(e.getMessage(), e);
        }
    }

    @FunctionalInterface
    interface ModelStep<T> {
        T build();
    }
}
