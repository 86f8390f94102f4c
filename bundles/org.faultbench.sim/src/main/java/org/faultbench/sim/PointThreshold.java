package org.faultbench.sim;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.seal.SealCriterion;
import org.faultbench.seal.ShaleGougeRatioCriterion;

/**
 * The threshold pressure that the study's seal criterion gives the fault points of a realisation's column, point by
 * point. The leak search visits tens of thousands of points per realisation and mostly only needs to know on which
 * side of a depth their free-water level lies, so an implementation may answer with cheap bounds first and work out
 * the exact pressure only when asked; the exact value must be what the criterion's own evaluation gives.
 *
 * <p>Not thread-safe: one per worker; it keeps the column and the point it was last moved to.
 */
interface PointThreshold {

    /** The column of the realisation whose points follow. */
    void useColumn(ResolvedColumn column);

    /**
     * The criterion of the realisation whose points follow ({@code SealCriterion.forRealisation} of the study's
     * criterion); until called, the study's criterion. Fast paths for built-in criteria that take no contributed
     * values keep their own arithmetic.
     */
    void useCriterion(SealCriterion realisationCriterion);

    /**
     * Moves to the point {@code new FaultPointContext(depth, faultThrow, position, column, burialDepth)} of the
     * criterion, raising the criterion's errors where it would.
     */
    void moveTo(double depth, double faultThrow, double position);

    /** A lower bound of the threshold pressure at the point, Pa. */
    double lowerBound();

    /** An upper bound of the threshold pressure at the point, Pa. */
    double upperBound();

    /** The threshold pressure at the point, Pa, exactly as the criterion evaluates it. */
    double exact();

    /**
     * A lower bound of the threshold pressure, Pa, at every point of a reservoir/reservoir window whose points have
     * throw {@code faultThrow} and positions from {@code firstPosition} to {@code lastPosition}. It lets the leak
     * search leave a window as soon as no deeper point in it can matter.
     *
     * @param topUnit the unit at position - throw along the window (up to rounding at its ends)
     * @param baseUnit the unit at the position along the window (up to rounding at its ends)
     */
    double lowerBoundAlong(double faultThrow, double firstPosition, double lastPosition, int topUnit, int baseUnit);

    /** The criterion of {@code seal}: the shale gouge ratio fast path where it applies, else the criterion itself. */
    static PointThreshold of(SealSetup seal) {
        CriterionThreshold generic = new CriterionThreshold(seal);
        if (seal.criterion() instanceof ShaleGougeRatioCriterion sgr) {
            return new ShaleGougeThreshold(sgr.pressureModel(), seal.burialDepth(), generic);
        }
        return generic;
    }
}
