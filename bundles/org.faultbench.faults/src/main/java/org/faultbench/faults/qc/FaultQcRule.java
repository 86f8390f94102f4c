package org.faultbench.faults.qc;

import java.util.List;

/**
 * A check of one fault of the fault model. Built-in rules are listed by {@link QcRuleCatalog#withBuiltIns()}; more
 * are contributed through the extension point {@value QcRuleContributions#POINT}. Implementations must be stateless
 * with respect to faults so that one instance can check every fault of a project.
 */
public interface FaultQcRule {

    /** Stable identifier, e.g. "throw-polarity-flip"; also the {@link QcFinding#ruleId()} of its findings. */
    String id();

    /** Name shown to the user. */
    String name();

    /** Findings on {@code ctx.fault()}; empty when the fault passes. */
    List<QcFinding> check(FaultQcContext ctx);
}
