package org.faultbench.seal;

import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * Settings of a contributed seal criterion, as given in an analysis file's {@code seal.parameters} object: the JSON
 * values as plain Java (text, numbers as Double, true/false, lists, maps) and the folder relative paths are resolved
 * against. Accessors throw {@link IllegalArgumentException} whose message starts with the key path, e.g.
 * "units.Reef A.porosity: expected a number"; the file reader prefixes the file and JSON path.
 *
 * @param baseDirectory folder of the analysis file, for relative paths
 * @param values the parameters, keys in file order
 */
public record CriterionParameters(Path baseDirectory, Map<String, Object> values) {

    /** No parameters (the criterion's defaults). */
    public static final CriterionParameters NONE = new CriterionParameters(Path.of("."), Map.of());

    public CriterionParameters {
        if (baseDirectory == null || values == null) {
            throw new IllegalArgumentException("criterion parameters: base directory and values are required");
        }
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    public boolean isEmpty() {
        return values.isEmpty();
    }

    /** @throws IllegalArgumentException naming every key the criterion does not know */
    public void requireOnly(List<String> knownKeys) {
        List<String> unknown = values.keySet().stream().filter(key -> !knownKeys.contains(key)).toList();
        if (!unknown.isEmpty()) {
            throw new IllegalArgumentException(unknown.get(0) + ": unknown parameter; expected one of " + knownKeys);
        }
    }

    public Optional<String> text(String key) {
        Object value = values.get(key);
        if (value == null) {
            return Optional.empty();
        }
        if (!(value instanceof String text)) {
            throw new IllegalArgumentException(key + ": expected a text value in quotes, found " + value);
        }
        return Optional.of(text);
    }

    public Optional<Double> number(String key) {
        Object value = values.get(key);
        if (value == null) {
            return Optional.empty();
        }
        if (!(value instanceof Number number) || !Double.isFinite(number.doubleValue())) {
            throw new IllegalArgumentException(key + ": expected a finite number, found " + value);
        }
        return Optional.of(number.doubleValue());
    }

    /** A file named by the parameter, resolved against the analysis file's folder. */
    public Optional<Path> path(String key) {
        return text(key).map(baseDirectory::resolve);
    }

    /** A nested object as parameters of its own; wrap its reads in {@link #within} to prefix their messages. */
    public Optional<CriterionParameters> object(String key) {
        Object value = values.get(key);
        if (value == null) {
            return Optional.empty();
        }
        if (!(value instanceof Map<?, ?> map)) {
            throw new IllegalArgumentException(key + ": expected an object { ... }, found " + value);
        }
        Map<String, Object> nested = new LinkedHashMap<>();
        map.forEach((k, v) -> nested.put(String.valueOf(k), v));
        return Optional.of(new CriterionParameters(baseDirectory, nested));
    }

    /** Keys of a nested object in file order (empty when missing). */
    public List<String> keys() {
        return List.copyOf(values.keySet());
    }

    /** Runs a read of a nested object and prefixes its error messages with the key ("units.Reef A.porosity"). */
    public static <T> T within(String key, Supplier<T> read) {
        try {
            return read.get();
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(key + "." + e.getMessage(), e);
        }
    }
}
