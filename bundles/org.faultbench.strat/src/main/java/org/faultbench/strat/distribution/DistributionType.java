package org.faultbench.strat.distribution;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeSet;

import org.faultbench.core.uncertain.UncertainValue;

/**
 * A named parameterisation of an uncertain input: id (the key an analysis file uses), name, the parameter names it
 * expects and the factory.
 */
public record DistributionType(String id, String name, List<String> parameterNames, DistributionFactory factory) {

    public DistributionType {
        if (id == null || id.isBlank() || name == null || name.isBlank()) {
            throw new IllegalArgumentException("a distribution needs an id and a name");
        }
        parameterNames = List.copyOf(parameterNames);
        if (parameterNames.isEmpty() || new TreeSet<>(parameterNames).size() != parameterNames.size()) {
            throw new IllegalArgumentException("distribution '" + id + "' needs distinct parameter names, has "
                    + parameterNames);
        }
        Objects.requireNonNull(factory, "factory");
    }

    /**
     * Builds the value.
     *
     * @throws IllegalArgumentException when a parameter is missing, unknown or not finite, or the factory refuses
     *         the values
     */
    public UncertainValue create(Map<String, Double> parameters) {
        if (!new TreeSet<>(parameters.keySet()).equals(new TreeSet<>(parameterNames))) {
            throw new IllegalArgumentException(id + " expects the parameters " + parameterNames + ", found "
                    + parameters.keySet());
        }
        parameters.forEach((key, value) -> {
            if (value == null || !Double.isFinite(value)) {
                throw new IllegalArgumentException(key + " must be a finite number, was " + value);
            }
        });
        UncertainValue value = factory.create(Map.copyOf(parameters));
        if (value == null) {
            throw new IllegalArgumentException("distribution '" + name + "' (" + id + ") built no value");
        }
        return value;
    }
}
