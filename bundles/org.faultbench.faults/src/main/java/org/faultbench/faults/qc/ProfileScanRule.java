package org.faultbench.faults.qc;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.faults.profile.ThrowProfile;

/**
 * A rule that judges each horizon's throw profile on its own, from the stations that have a throw. Several built-in
 * rules have this shape; this class holds the loop over the profiles and the building of findings once, so each rule
 * keeps only its own test.
 */
abstract class ProfileScanRule implements FaultQcRule {

    private final String id;
    private final String name;
    private final Severity severity;

    /** @param severity the severity of every finding of the rule */
    ProfileScanRule(String id, String name, Severity severity) {
        this.id = id;
        this.name = name;
        this.severity = severity;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public List<QcFinding> check(FaultQcContext ctx) {
        List<QcFinding> findings = new ArrayList<>();
        for (ThrowProfile profile : ctx.throwProfiles()) {
            scan(ctx, profile, profile.validU(), profile.validThrows(), findings);
        }
        return findings;
    }

    /**
     * Adds the findings on one profile to {@code findings}.
     *
     * @param u along-strike distance (m) of each station with a throw
     * @param t throw (m) at each of them; a copy the rule may change
     */
    abstract void scan(FaultQcContext ctx, ThrowProfile profile, double[] u, double[] t, List<QcFinding> findings);

    /** A finding of this rule on {@code profile}'s horizon at {@code u}. */
    final QcFinding finding(FaultQcContext ctx, ThrowProfile profile, double u, String message, String suggestion) {
        return new QcFinding(id, severity, ctx.fault().id(), u, profile.horizon(), message, suggestion);
    }
}
