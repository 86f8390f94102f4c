package org.faultbench.faults.qc;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.faultbench.core.extension.IdRegistry;

/**
 * The fault QC rules of a project, by id, in registration order, and the run of all of them over one fault. Plain
 * Java so that QC runs headless; the extension point adds in-house rules through {@link QcRuleContributions}.
 */
public final class QcRuleCatalog {

    private final IdRegistry<FaultQcRule> rules = new IdRegistry<>("fault QC rule", FaultQcRule::name);

    /** A catalog with the built-in rules in their default settings. */
    public static QcRuleCatalog withBuiltIns() {
        QcRuleCatalog catalog = new QcRuleCatalog();
        catalog.register(new PolarityFlipRule());
        catalog.register(new TipThrowRule());
        catalog.register(new ThrowGradientRule());
        catalog.register(new ThrowMinimumRule());
        catalog.register(new DisplacementLengthRule());
        catalog.register(new DeeperLessThrowRule());
        catalog.register(new CrossingCutOffRule());
        catalog.register(new WallOrderRule());
        return catalog;
    }

    /** @throws IllegalArgumentException when the rule or its id is missing or the id is already taken */
    public void register(FaultQcRule rule) {
        rules.register(rule == null ? null : rule.id(), rule);
    }

    public Optional<FaultQcRule> find(String id) {
        return rules.find(id);
    }

    public List<FaultQcRule> list() {
        return rules.list();
    }

    /**
     * Findings of every rule on one fault, rule by rule. A rule that fails is reported as an error finding of that
     * rule instead of stopping the others, so one broken in-house rule cannot hide the built-in checks.
     */
    public List<QcFinding> check(FaultQcContext ctx) {
        List<QcFinding> findings = new ArrayList<>();
        for (FaultQcRule rule : list()) {
            try {
                findings.addAll(rule.check(ctx));
            } catch (RuntimeException e) {
                findings.add(new QcFinding(rule.id(), Severity.ERROR, ctx.fault().id(), Double.NaN, null,
                        "QC rule '" + rule.name() + "' failed on fault '" + ctx.fault().name() + "': " + e,
                        "The other rules ran normally; report this failure to the rule's author."));
            }
        }
        return findings;
    }
}
