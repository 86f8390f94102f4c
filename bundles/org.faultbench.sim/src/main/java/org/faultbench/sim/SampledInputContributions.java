package org.faultbench.sim;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.IConfigurationElement;
import org.faultbench.core.extension.ContributionReader;

/**
 * Reads the {@value #POINT} extension point. A contribution is skipped (and logged with its bundle's id) when its id
 * is missing or taken, its class cannot be created, or it gives no distribution, no target, or a distribution its own
 * bounds reject.
 */
public final class SampledInputContributions {

    public static final String POINT = "org.faultbench.sim.sampledInputs";
    private static final ContributionReader READER = new ContributionReader("sampled input", "input");
    private static Map<String, SampledInput> platformInputs;

    private SampledInputContributions() {
    }

    /** The inputs that come with the simulator, by id, as the bundle's plugin.xml contributes them. */
    public static Map<String, SampledInput> builtIns() {
        Map<String, SampledInput> inputs = new LinkedHashMap<>();
        SampledInput ssf = new MaximumSealingSsfInput();
        inputs.put(ssf.id(), ssf);
        return inputs;
    }

    /**
     * The inputs a study may name, by id: every valid contribution of the running platform, the built-ins among them
     * (just the built-ins outside OSGi). Read once.
     */
    public static synchronized Map<String, SampledInput> platformInputs() {
        if (platformInputs == null) {
            Map<String, SampledInput> inputs = new LinkedHashMap<>();
            if (ContributionReader.registryAvailable()) {
                ContributionReader.log(SampledInputContributions.class,
                        readInto(inputs, ContributionReader.platformElements(POINT)));
            } else {
                inputs.putAll(builtIns());
            }
            platformInputs = Collections.unmodifiableMap(inputs);
        }
        return platformInputs;
    }

    /** Adds every valid contribution by id; returns one message per skipped contribution. */
    public static List<String> readInto(Map<String, SampledInput> inputs, IConfigurationElement[] elements) {
        return READER.read(elements, c -> {
            SampledInput input = c.createWithId(SampledInput.class, SampledInput::id);
            if (input.distribution() == null) {
                throw new IllegalArgumentException("distribution() returned nothing");
            }
            if (input.target() == null) {
                throw new IllegalArgumentException("target() returned nothing");
            }
            if (input.bounds() == null) {
                throw new IllegalArgumentException("bounds() returned nothing");
            }
            ContributedInput.withDefault(input); // its own distribution must fit its bounds
            if (inputs.containsKey(c.id())) {
                throw new IllegalArgumentException("id '" + c.id() + "' is already registered");
            }
            inputs.put(c.id(), input);
        });
    }
}
