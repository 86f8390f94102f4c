package org.faultbench.seal;

/**
 * The result of a seal criterion at one fault point: the seal attribute (for painting on the fault) and the
 * threshold pressure the point holds against buoyancy.
 *
 * @param attributeName short name of the attribute, e.g. "SGR"
 * @param attributeUnit unit of the attribute, e.g. "%", empty when dimensionless
 * @param attributeValue the attribute; NaN when there is no fault rock to describe (zero throw, or a criterion that
 *        has no attribute)
 * @param thresholdPressure capillary entry pressure, Pa, &ge; 0; +infinity when the point seals whatever the column,
 *        0 when it leaks
 * @param basis whether juxtaposition or fault rock decides the threshold
 */
public record SealEvaluation(String attributeName, String attributeUnit, double attributeValue,
        double thresholdPressure, SealBasis basis) {

    public SealEvaluation {
        if (attributeName == null || attributeUnit == null || basis == null) {
            throw new IllegalArgumentException("seal evaluation: attribute name, unit and basis are required");
        }
        if (!(thresholdPressure >= 0)) {
            throw new IllegalArgumentException("seal evaluation: threshold pressure must be >= 0 Pa, was "
                    + thresholdPressure);
        }
        if (basis == SealBasis.FAULT_ROCK && Double.isNaN(attributeValue)) {
            throw new IllegalArgumentException("seal evaluation: a fault-rock threshold needs an attribute value");
        }
    }

    /** Juxtaposition only: reservoir against reservoir leaks (0 Pa), anything else seals (+infinity). */
    public static SealEvaluation juxtaposition(boolean reservoirAgainstReservoir) {
        return new SealEvaluation("juxtaposition", "", Double.NaN,
                reservoirAgainstReservoir ? 0 : Double.POSITIVE_INFINITY, SealBasis.JUXTAPOSITION);
    }
}
