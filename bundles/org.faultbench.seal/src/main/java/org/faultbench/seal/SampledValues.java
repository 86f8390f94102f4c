package org.faultbench.seal;

import java.util.Map;
import java.util.OptionalDouble;

/**
 * The values one Monte Carlo realisation drew for the contributed sampled inputs that act on the seal criterion,
 * by input id (see {@link SealCriterion#forRealisation}). Inputs the study did not include are absent, and a
 * criterion then keeps its own setting.
 */
public final class SampledValues {
    /** No contributed values: every criterion keeps its own settings. */
    public static final SampledValues NONE = new SampledValues(Map.of());

    private final Map<String, Double> values;

    private SampledValues(Map<String, Double> values) {
        this.values = values;
    }

    /** The values by input id; each must be a finite number. */
    public static SampledValues of(Map<String, Double> values) {
        values.forEach((id, value) -> {
            if (value == null || !Double.isFinite(value)) {
                throw new IllegalArgumentException("sampled input '" + id + "': value must be a finite number, was "
                        + value);
            }
        });
        return values.isEmpty() ? NONE : new SampledValues(Map.copyOf(values));
    }

    /** The value drawn for input {@code id}, empty when the study does not sample it. */
    public OptionalDouble value(String id) {
        Double value = values.get(id);
        return value == null ? OptionalDouble.empty() : OptionalDouble.of(value);
    }

    public boolean isEmpty() {
        return values.isEmpty();
    }

    @Override
    public String toString() {
        return "SampledValues" + values;
    }
}
