package org.faultbench.strat.distribution;

import java.util.Map;

import org.faultbench.core.uncertain.UncertainValue;

/**
 * Builds one of the existing kinds of {@link UncertainValue} from the parameters a geologist thinks in (e.g. a P90 and
 * a P10), for extension point {@value DistributionContributions#POINT}. UncertainValue is sealed, so a contribution
 * is a parameterisation, not a new distribution.
 */
@FunctionalInterface
public interface DistributionFactory {

    /**
     * @param parameters exactly the declared parameter names, each with a finite value
     * @throws IllegalArgumentException when the values do not define a distribution; the message starts with the
     *         parameter at fault
     */
    UncertainValue create(Map<String, Double> parameters);
}
