package org.faultbench.faults.qc;

import java.util.List;

import org.faultbench.faults.profile.DipSlip;
import org.faultbench.faults.profile.ThrowProfile;
import org.faultbench.faults.scaling.ScalingEnvelope;

/**
 * Maximum displacement over trace length outside the band normal faults usually occupy (about 0.001 to 0.1: Cowie
 * &amp; Scholz 1992; Schlische et al. 1996 found 0.03 for small rift faults). Far above it, the trace is probably
 * too short (tips not mapped) or the throw mis-picked; far below it, several faults were probably joined into one
 * trace or drag was left out of the throw (Kim &amp; Sanderson 2005). Uses mapped values, so the numbers in the
 * message can be checked on the map.
 */
public final class DisplacementLengthRule implements FaultQcRule {

    public static final String ID = "dmax-length";

    private final ScalingEnvelope envelope;

    public DisplacementLengthRule() {
        this(ScalingEnvelope.NORMAL_FAULTS);
    }

    public DisplacementLengthRule(ScalingEnvelope envelope) {
        if (envelope == null) {
            throw new IllegalArgumentException("QC rule '" + ID + "': D/L envelope is missing");
        }
        this.envelope = envelope;
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String name() {
        return "Displacement/length ratio";
    }

    @Override
    public List<QcFinding> check(FaultQcContext ctx) {
        ThrowProfile largest = null;
        for (ThrowProfile profile : ctx.throwProfiles()) {
            if (profile.validU().length > 0 && (largest == null || profile.maxAbsThrow() > largest.maxAbsThrow())) {
                largest = profile;
            }
        }
        if (largest == null) {
            return List.of();
        }
        double length = ctx.fault().length();
        double displacement = DipSlip.displacement(largest.maxAbsThrow(), ctx.fault().dipDegrees());
        if (envelope.contains(displacement, length)) {
            return List.of();
        }
        boolean high = displacement / length > envelope.maxRatio();
        String message = "Maximum displacement " + Numbers.metres(displacement) + " (throw "
                + Numbers.metres(largest.maxAbsThrow()) + " on horizon '" + largest.horizon() + "', dip "
                + Numbers.ratio(ctx.fault().dipDegrees()) + " degrees) over trace length " + Numbers.metres(length)
                + " gives D/L = " + Numbers.ratio(displacement / length) + ", " + (high ? "above" : "below")
                + " the usual range " + Numbers.ratio(envelope.minRatio()) + " to " + Numbers.ratio(envelope.maxRatio())
                + " (" + envelope.source() + ").";
        String suggestion = high
                ? "Check whether the trace stops short of the tips (extend it where throw continues) and whether the"
                        + " largest throws are mis-picked."
                : "Check whether several faults were joined into one trace (look for throw minima and polarity flips"
                        + " and split there) and whether drag was left out of the throw.";
        return List.of(new QcFinding(ID, Severity.WARNING, ctx.fault().id(), Double.NaN, largest.horizon(), message,
                suggestion));
    }
}
