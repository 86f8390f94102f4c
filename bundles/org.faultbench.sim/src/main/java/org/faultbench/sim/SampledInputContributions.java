package org.faultbench.sim;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.IConfigurationElement;
import org.faultbench.core.extension.ContributionReader;

/**
 * Reads the {@value #POINT} extension point. What is left: InputSampler must draw one value per contributed input
 * per realisation (from the realisation's own random stream, so results stay reproducible and thread-count
 * independent), RealisationInputs must carry them by id, the tornado must rank them, and a criterion must be able to
 * read them (e.g. through FaultPointContext). Until then the catalog only validates and lists contributions.
 */
public final class SampledInputContributions {

    public static final String POINT = "org.faultbench.sim.sampledInputs";
    private static final ContributionReader READER = new ContributionReader("sampled input", "input");

    private SampledInputContributions() {
    }

    /** The valid contributions of the running platform by id (none outside OSGi). */
    public static Map<String, SampledInput> platformInputs() {
        Map<String, SampledInput> inputs = new LinkedHashMap<>();
        ContributionReader.log(SampledInputContributions.class,
                readInto(inputs, ContributionReader.platformElements(POINT)));
        return inputs;
    }

    /** Adds every valid contribution by id; returns one message per skipped contribution. */
    public static List<String> readInto(Map<String, SampledInput> inputs, IConfigurationElement[] elements) {
        return READER.read(elements, c -> {
            SampledInput input = c.createWithId(SampledInput.class, SampledInput::id);
            if (input.distribution() == null) {
                throw new IllegalArgumentException("distribution() returned nothing");
            }
            if (inputs.containsKey(c.id())) {
                throw new IllegalArgumentException("id '" + c.id() + "' is already registered");
            }
            inputs.put(c.id(), input);
        });
    }
}
