package org.faultbench.sim;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.seal.BretanCapacity;
import org.faultbench.seal.SealCriterion;
import org.faultbench.seal.ShaleGougeRatioCriterion;
import org.faultbench.seal.SgrPressureModel;

/**
 * The fast path of {@link ShaleGougeRatioCriterion}: the same arithmetic as the criterion (shale gouge ratio of
 * Yielding, Freeman &amp; Needham 1997, summed unit by unit in column order over the throw window [s - T, s], then
 * the pressure model), without the objects the criterion builds per point, summing only over the units the window
 * touches and finding them from the units of the previous point. For the Bretan envelope the pressure is first
 * bracketed, from a table ({@link SgrPressureBrackets}) and an SGR read off the column's cumulative clay thickness,
 * and only worked out when asked for.
 *
 * <p>Points the criterion treats specially (no throw, a window that leaves the column, an invalid pressure) go to
 * the criterion itself, which also raises its errors. Bit for bit equal to the criterion (ShaleGougeThresholdTest
 * checks it); the burial depth is the one {@link SealSetup} validated.
 */
final class ShaleGougeThreshold implements PointThreshold {
    /** Rounding of an SGR between 0 and 100 % apart from that of its clay: a few units in the last place of 100. */
    private static final double SGR_TOLERANCE = 1e-9;

    private final SgrPressureModel pressureModel;
    private final double burialDepth;
    private final CriterionThreshold criterion;
    /** Null unless the model is known never to fall as SGR rises. */
    private final SgrPressureBrackets brackets;

    private ResolvedColumn column;
    /** Unit tops, and the column base at the end, as {@link ResolvedColumn#top} gives them. */
    private double[] tops;
    private double[] clayFraction;
    /** Clay thickness (Vcl times thickness) above the top of each unit. */
    private double[] clayAbove;
    private boolean[] reservoir;
    /**
     * Clay thicknesses summed unit by unit and read off {@link #clayAbove} differ by rounding alone: a few units in
     * the last place of the column thickness per unit. This bound is a thousand times wider, wide enough to cover the
     * rounding of the window length too.
     */
    private double clayTolerance;
    // the point last moved to
    private double depth;
    private double faultThrow;
    private double position;
    private double lowerBound;
    private double upperBound;
    private boolean known;
    private double pressure;
    /** Units at the top and base of the last throw window: the next point's window mostly starts and ends in them. */
    private int topUnit;
    private int baseUnit;

    ShaleGougeThreshold(SgrPressureModel pressureModel, double burialDepth, CriterionThreshold criterion) {
        this.pressureModel = pressureModel;
        this.burialDepth = burialDepth;
        this.criterion = criterion;
        // 10^(SGR/27 - C) bar: dividing, subtracting, Math.pow (semi-monotonic by its specification) and converting
        // to pascals never turn a larger SGR into a smaller pressure
        this.brackets = pressureModel instanceof BretanCapacity ? new SgrPressureBrackets(pressureModel, burialDepth)
                : null;
    }

    /** Passed on to the general path; the shale gouge ratio takes no contributed values. */
    @Override
    public void useCriterion(SealCriterion realisationCriterion) {
        criterion.useCriterion(realisationCriterion);
    }

    @Override
    public void useColumn(ResolvedColumn column) {
        criterion.useColumn(column);
        this.column = column;
        int n = column.size();
        tops = new double[n + 1];
        clayFraction = new double[n];
        clayAbove = new double[n + 1];
        reservoir = new boolean[n];
        for (int i = 0; i < n; i++) {
            tops[i] = column.top(i);
            clayFraction[i] = column.unit(i).clayFraction();
            reservoir[i] = column.unit(i).reservoir();
            clayAbove[i + 1] = clayAbove[i] + column.unit(i).thickness() * clayFraction[i];
        }
        tops[n] = column.thickness();
        clayTolerance = 1e-12 * (n + 4) * Math.max(1, column.thickness());
        topUnit = 0;
        baseUnit = 0;
    }

    @Override
    public void moveTo(double depth, double faultThrow, double position) {
        this.depth = depth;
        this.faultThrow = faultThrow;
        this.position = position;
        double top = position - faultThrow; // the hanging-wall position
        if (!(top >= 0 && top < position && position <= tops[tops.length - 1] && Double.isFinite(depth))) {
            setExact(criterion.at(depth, faultThrow, position)); // no throw, a window outside the column, bad input
            return;
        }
        topUnit = unitAt(top, topUnit);
        baseUnit = unitAt(position, baseUnit);
        if (!isReservoir(topUnit) || !isReservoir(baseUnit)) {
            setExact(Double.POSITIVE_INFINITY); // seals by juxtaposition
            return;
        }
        known = false;
        if (!bracket(top)) {
            exact();
        }
    }

    /**
     * Brackets the pressure by the table step that holds the SGR the cumulative clay gives, widened by its possible
     * rounding error (the exact SGR, summed unit by unit, lies inside).
     *
     * @return false when there is no table, or the widened SGR does not fit in one step of [0, 100] %
     */
    private boolean bracket(double top) {
        if (brackets == null) {
            return false;
        }
        double length = position - top;
        double clay = clayAbove(position, baseUnit) - clayAbove(top, topUnit);
        int step = brackets.step(100 * (clay - clayTolerance) / length);
        if (step < 0 || !(100 * (clay + clayTolerance) / length <= brackets.stepEnd(step))) {
            return false;
        }
        lowerBound = brackets.low(step);
        upperBound = brackets.high(step);
        return true;
    }

    private double clayAbove(double s, int unit) {
        return clayAbove[unit] + (s - tops[unit]) * clayFraction[unit];
    }

    /**
     * Along a reservoir/reservoir window the throw window [s - T, s] starts in one unit and ends in another, so its
     * clay, and the SGR, change linearly with s: the smaller SGR at the two ends, less its rounding tolerance, bounds
     * the SGR, and the table the pressure, at every point between. (At the ends a position may stray from its unit by
     * rounding; reading the unit's clay line a hair beyond its end stays within the tolerance.) A point that the
     * criterion finds not to face reservoir after all seals (+infinity) and keeps the bound too.
     */
    @Override
    public double lowerBoundAlong(double faultThrow, double firstPosition, double lastPosition, int topUnit,
            int baseUnit) {
        this.topUnit = topUnit;
        this.baseUnit = baseUnit;
        if (brackets == null || !(faultThrow > 0)) {
            return 0;
        }
        double sgr = Math.min(sgrNear(faultThrow, firstPosition), sgrNear(faultThrow, lastPosition));
        int step = brackets.step(Math.max(0, sgr - SGR_TOLERANCE));
        return step < 0 ? 0 : brackets.low(step);
    }

    /** SGR (%) at a position of the window, from the cumulative clay, less its rounding tolerance. */
    private double sgrNear(double faultThrow, double position) {
        double top = position - faultThrow;
        double clay = clayAbove(position, baseUnit) - clayAbove(top, topUnit);
        return 100 * (clay - clayTolerance) / (position - top);
    }

    @Override
    public double lowerBound() {
        return known ? pressure : lowerBound;
    }

    @Override
    public double upperBound() {
        return known ? pressure : upperBound;
    }

    @Override
    public double exact() {
        if (!known) {
            double top = position - faultThrow;
            double sgr = shaleGougeRatio(top, position, topUnit, baseUnit);
            double modelled = pressureModel.thresholdPressure(sgr, burialDepth);
            setExact(modelled >= 0 ? modelled : criterion.at(depth, faultThrow, position));
        }
        return pressure;
    }

    private void setExact(double value) {
        pressure = value;
        known = true;
    }

    /** {@link ResolvedColumn#unitAt}, answered at once when s lies in the unit of the previous point. */
    private int unitAt(double s, int previous) {
        if (previous >= 0 && previous < reservoir.length && tops[previous] <= s && s < tops[previous + 1]) {
            return previous;
        }
        return column.unitAt(s);
    }

    private boolean isReservoir(int unit) {
        return unit >= 0 && unit < reservoir.length && reservoir[unit];
    }

    /** SGR in % over [top, base]: a unit with a part inside the window lies between the units at its ends. */
    private double shaleGougeRatio(double top, double base, int first, int last) {
        double clay = 0;
        for (int i = first; i <= last; i++) {
            double overlap = Math.max(0, Math.min(base, tops[i + 1]) - Math.max(top, tops[i]));
            if (overlap > 0) {
                clay += overlap * clayFraction[i];
            }
        }
        return 100 * clay / (base - top);
    }
}
