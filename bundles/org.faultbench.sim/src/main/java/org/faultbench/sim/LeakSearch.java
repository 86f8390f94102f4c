package org.faultbench.sim;

import java.util.Arrays;
import java.util.stream.IntStream;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.juxtaposition.ColumnIntervals;
import org.faultbench.juxtaposition.HungColumns;
import org.faultbench.seal.SealCriterion;

/**
 * Searches the bounding faults of one realisation for each reservoir unit's leak point: the shallowest free-water
 * level z + P_th / (Δρ·g) that its reservoir/reservoir contacts on the compartment side support. On the way it finds
 * each unit's shallowest connection across the attic fault and marks the fault-plane cells that leak before the trap
 * fills to its spill point.
 *
 * <p>The search skips, without changing any result, what cannot matter: columns and contacts that start below their
 * unit's depth of interest ({@link #depthOfInterest}), since a free-water level never lies above its point (threshold
 * pressures are &ge; 0), cells count only above the spill depth and connections only move up; and the rest of a
 * fault-rock window once a lower bound of its threshold pressure puts every free-water level deeper than that. It
 * also asks for exact threshold pressures only where their bounds leave a comparison open. The leak search of the
 * first implementation, which evaluated every point, is kept in LeakSearchTest as the reference it must match bit for
 * bit.
 *
 * <p>Not thread-safe: one per worker; it keeps the state of the realisation it searches.
 */
final class LeakSearch {
    /** Step below a window top for its first sample, so boundary round-off does not put the point in the unit above. */
    private static final double INSIDE = 1e-6;

    private final StudyGeometry geometry;
    private final int[] slotOfUnit;
    private final int atticFault;
    private final boolean juxtapositionOnly;
    private final ColumnIntervals intervals = new ColumnIntervals();
    /** Null when juxtaposition alone decides. */
    private final PointThreshold threshold;
    /** Per unit slot, the depths of the unit's top and base below the reference horizon in the realisation's column. */
    private final double[] topBelowReference;
    private final double[] baseBelowReference;
    /** Per unit slot, where the leak point is so far: fault (-1 = none), column and depth, kept as numbers. */
    private final int[] locationFault;
    private final int[] locationColumn;
    private final double[] locationDepth;
    /** Per unit slot, the depth of interest of its contacts ({@link #depthOfInterest}), kept up to date. */
    private final double[] interest;
    /**
     * Per unit slot, the free-water level of some point of this realisation's contacts, so at least its leak depth: a
     * point whose level cannot reach it cannot be the leak point, and its exact threshold pressure is not needed.
     */
    private final double[] bound;
    /** Per unit slot, the least level above the bound: a point at or below it may still be (or tie with) the leak. */
    private final double[] ceiling;
    /** Per unit slot, where the previous realisation's leak point was (fault -1 = none): the bound is sought there. */
    private final int[] hintFault;
    private final int[] hintColumn;
    /** Per fault, its columns in throw order (juxtaposition only, one column for all positions). */
    private final ThrowOrderedColumns[] byThrow;
    /** Unit boundaries below the reference horizon and the reservoir units, of the column in use. */
    private double[] boundaries;
    private int[] reservoirUnits;
    private double boundaryMagnitude;

    // the realisation being searched
    private RealisationInputs in;
    /** Whether unit thicknesses vary along the faults (isochores): then each fault-plane column has its own column. */
    private boolean columnPerPosition;
    private HungColumns hung;
    /** Depth of the reference unit's top below the column top in the column in use. */
    private double refTop;
    private double buoyancyPerMetre;
    private double thresholdFactor;
    private double[] spill;
    private double[] leak;
    private double[] connection;
    private LeakRuns leakRuns;
    // the fault and column being scanned
    private boolean attic;
    /** The last row marked in the column being scanned; rows only grow down a column. */
    private int lastMarkedRow;
    /** The run of marked rows not yet handed to {@link #leakRuns}: rows runFirst .. lastMarkedRow; -1 when none. */
    private int runFirst;

    LeakSearch(StudyGeometry geometry, int[] slotOfUnit, int atticFault) {
        this.geometry = geometry;
        this.slotOfUnit = slotOfUnit;
        this.atticFault = atticFault;
        this.juxtapositionOnly = geometry.study.seal().juxtapositionOnly();
        this.threshold = juxtapositionOnly ? null : PointThreshold.of(geometry.study.seal());
        int slots = (int) Arrays.stream(slotOfUnit).filter(s -> s >= 0).count();
        topBelowReference = new double[slots];
        baseBelowReference = new double[slots];
        locationFault = new int[slots];
        locationColumn = new int[slots];
        locationDepth = new double[slots];
        interest = new double[slots];
        bound = new double[slots];
        ceiling = new double[slots];
        hintFault = new int[slots];
        hintColumn = new int[slots];
        Arrays.fill(hintFault, -1);
        byThrow = juxtapositionOnly ? geometry.faults.stream().map(ThrowOrderedColumns::new)
                .toArray(ThrowOrderedColumns[]::new) : null;
    }

    /**
     * Searches all bounding faults.
     *
     * @param spill per unit slot, the spill depth of this realisation
     * @param leak per unit slot, set to the leak depth (+infinity when no contact leaks)
     * @param connection per unit slot, set to the shallowest reservoir/reservoir contact on the attic fault
     * @param locations per unit slot, set to where the leak point is (left null when no contact leaks)
     * @param leakRuns where the runs of cells that leak before the trap fills to spill are added; may be null
     */
    void run(RealisationInputs in, double buoyancyPerMetre, double[] spill, double[] leak, double[] connection,
            LeakLocation[] locations, LeakRuns leakRuns) {
        this.in = in;
        this.columnPerPosition = in.columns() != null && in.columns().variesWithPosition();
        useColumn(in.column());
        if (threshold != null) {
            SealCriterion studyCriterion = geometry.study.seal().criterion();
            threshold.useCriterion(in.criterionValues().isEmpty() ? studyCriterion
                    : studyCriterion.forRealisation(in.criterionValues()));
        }
        this.buoyancyPerMetre = buoyancyPerMetre;
        this.thresholdFactor = geometry.study.seal().thresholdScale() * Math.pow(10, -in.calibrationShift());
        this.spill = spill;
        this.leak = leak;
        this.connection = connection;
        this.leakRuns = leakRuns;
        Arrays.fill(leak, Double.POSITIVE_INFINITY);
        Arrays.fill(connection, Double.POSITIVE_INFINITY);
        Arrays.fill(locationFault, -1);
        boolean byPair = juxtapositionOnly && !columnPerPosition;
        if (byPair) {
            usePairColumn();
        }
        Arrays.fill(bound, Double.POSITIVE_INFINITY);
        if (!juxtapositionOnly && !columnPerPosition) {
            boundFromHints();
        }
        for (int s = 0; s < bound.length; s++) {
            ceiling[s] = Math.nextUp(bound[s]);
        }
        for (FaultPlaneFrame frame : geometry.faults) {
            if (byPair && byThrow[frame.index].realise(in, in.throwScale()[frame.index])) {
                scanWindowsByPair(frame, byThrow[frame.index]);
            } else {
                scanFault(frame);
            }
        }
        for (int s = 0; s < leak.length; s++) {
            if (locationFault[s] >= 0) {
                hintFault[s] = locationFault[s];
                hintColumn[s] = locationColumn[s];
                FaultPlaneFrame frame = geometry.faults.get(locationFault[s]);
                locations[s] = new LeakLocation(frame.bounding.id(), frame.u[locationColumn[s]], locationDepth[s]);
            }
        }
    }

    /** Hangs both walls of the fault-plane columns to come on {@code column}. */
    private void useColumn(ResolvedColumn column) {
        this.hung = new HungColumns(column, column, geometry.referenceUnit);
        for (int unit = 0; unit < slotOfUnit.length; unit++) {
            if (slotOfUnit[unit] >= 0) {
                // the values juxtaposeReservoirs adds to a cut-off for this unit (both walls hang this column)
                topBelowReference[slotOfUnit[unit]] = hung.footwall().topBelowReference(unit);
                baseBelowReference[slotOfUnit[unit]] = hung.footwall().topBelowReference(unit + 1);
            }
        }
        if (threshold != null) {
            threshold.useColumn(column);
        }
        refTop = column.top(geometry.referenceUnit);
    }

    /** Takes the unit boundaries and reservoir units of the column in use for {@link #scanWindowsByPair}. */
    private void usePairColumn() {
        int size = hung.footwall().size();
        if (boundaries == null || boundaries.length != size + 1) {
            boundaries = new double[size + 1];
            reservoirUnits = new int[(int) IntStream.range(0, size).filter(hung.footwall()::isReservoir).count()];
        }
        boundaryMagnitude = 0;
        int n = 0;
        for (int i = 0; i <= size; i++) {
            boundaries[i] = hung.footwall().topBelowReference(i);
            boundaryMagnitude = Math.max(boundaryMagnitude, Math.abs(boundaries[i]));
            if (i < size && hung.footwall().isReservoir(i)) {
                reservoirUnits[n++] = i;
            }
        }
    }

    /**
     * Juxtaposition only, one column on both walls: the same windows as {@link #scanFault}, visited unit pair by unit
     * pair over the stretch of columns, in throw order, where the pair can face each other. A window's top, base and
     * cells do not depend on the order of the visit, and neither do the leak depth and the connection (minima); on a
     * tie the leak location stays the one the column-by-column scan finds first, the lowest column.
     */
    private void scanWindowsByPair(FaultPlaneFrame frame, ThrowOrderedColumns columns) {
        boolean onFootwall = frame.compartmentOnFootwall();
        attic = frame.index == atticFault;
        for (int s = 0; s < interest.length; s++) {
            interest[s] = depthOfInterest(s);
        }
        double[] b = boundaries;
        for (int i : reservoirUnits) {
            for (int j : reservoirUnits) {
                int s = slotOfUnit[onFootwall ? i : j];
                // the units overlap where b[i] - b[j + 1] < throw < b[i + 1] - b[j], up to rounding
                int first = columns.firstFrom(b[i] - b[j + 1], boundaryMagnitude);
                int end = columns.firstAbove(b[i + 1] - b[j], boundaryMagnitude);
                for (int from = first, to; from < end; from = to) {
                    to = columns.blockEnd(from, end);
                    if (blockStartsTooDeep(columns, s, i, j, from)) {
                        continue; // as scanPair would pass over each window: the depth of interest only rises
                    } else if (attic || leakRuns == null || Double.isNaN(boundaryMagnitude)) {
                        scanPair(frame, columns, s, i, j, from, to);
                    } else {
                        markPairBlock(frame, columns, s, i, j, from, to);
                    }
                }
            }
        }
    }

    /** Visits the windows of unit pair (i, j) at positions first .. end - 1, as {@link #scanFault} would. */
    private void scanPair(FaultPlaneFrame frame, ThrowOrderedColumns columns, int s, int i, int j, int first,
            int end) {
        double[] b = boundaries;
        for (int p = first; p < end; p++) {
            double zFw = columns.footwall(p);
            double zHw = columns.hangingWall(p);
            // the expressions of HungColumns.juxtaposeReservoirs, so that tops and bases are the same doubles
            double top = Math.max(zFw + b[i], zHw + b[j]);
            if (top > interest[s]) {
                continue; // a top at the depth of interest may still tie with the leak point in a lower column
            }
            double base = Math.min(zFw + b[i + 1], zHw + b[j + 1]);
            if (top < base) {
                pairWindow(frame, columns.column(p), s, top, base);
            }
        }
    }

    /**
     * Whether every window of unit pair (i, j) in the block of positions from {@code from} starts below the unit's
     * depth of interest: then {@link #scanPair} would pass over each of them.
     */
    private boolean blockStartsTooDeep(ThrowOrderedColumns columns, int s, int i, int j, int from) {
        double shallowest = columns.blockShallowestFootwall(from / ThrowOrderedColumns.BLOCK);
        double[] b = boundaries;
        // the expressions of the window top, with the block's shallowest footwall and least throw
        return Math.max(shallowest + b[i], (shallowest + columns.scaledThrows()[from]) + b[j]) > interest[s];
    }

    /**
     * {@link #scanPair} outside the attic fault with a leak map, where nearly all the time goes: one run per position,
     * without a branch on what varies from one position to the next. The windows {@link #scanPair} passes over change
     * nothing here either: an empty window, or one that starts below the depth of interest, which with a leak map lies
     * at or below the spill depth, has an empty run of cells, and only the other windows are compared with the leak
     * point, with the tie rule of {@link #pairWindow}. The pair's numbers are kept in locals; the leak depth and the
     * depth of interest change only with the leak point. Tops and bases are taken by comparisons rather than
     * Math.max and Math.min, which also order signed zeros and pass NaN on: cut-offs are finite here and unit
     * boundaries are numbers (the caller sees to it), so a sum is never NaN, and a zero's sign changes no comparison
     * and no row; the one place it could show, a leak depth, takes Math.max itself.
     */
    private void markPairBlock(FaultPlaneFrame frame, ThrowOrderedColumns columns, int s, int i, int j, int from,
            int to) {
        double[] fw = columns.footwalls();
        double[] hw = columns.hangingWalls();
        int[] column = columns.columnsInOrder();
        double topFw = boundaries[i];
        double topHw = boundaries[j];
        double baseFw = boundaries[i + 1];
        double baseHw = boundaries[j + 1];
        double spillDepth = spill[s];
        double leakDepth = leak[s];
        double interestDepth = interest[s];
        double firstCentre = frame.firstCentre();
        double inverseCellHeight = frame.inverseCellHeight();
        double[] centres = frame.rowCentres();
        int rows = frame.rows;
        double tolerance = frame.estimateTolerance();
        byte[] differences = leakRuns.differences(frame.index);
        for (int p = from; p < to; p++) {
            double zFw = fw[p];
            double zHw = hw[p];
            // the expressions of HungColumns.juxtaposeReservoirs, so that tops and bases are the same doubles
            double topOnFw = zFw + topFw;
            double topOnHw = zHw + topHw;
            double baseOnFw = zFw + baseFw;
            double baseOnHw = zHw + baseHw;
            double top = topOnFw > topOnHw ? topOnFw : topOnHw;
            double base = baseOnFw < baseOnHw ? baseOnFw : baseOnHw;
            if (top <= leakDepth && top < base && top <= interestDepth) {
                if (top < leakDepth || locationFault[s] == frame.index && column[p] < locationColumn[s]) {
                    double exactTop = Math.max(topOnFw, topOnHw);
                    lowerLeak(s, exactTop, frame, column[p], exactTop);
                    leakDepth = leak[s];
                    interestDepth = interest[s];
                }
            }
            int first = FaultPlaneFrame.rowCentredAtOrBelow(top, firstCentre, inverseCellHeight, centres, rows,
                    tolerance);
            int end = FaultPlaneFrame.rowCentredAtOrBelow(base < spillDepth ? base : spillDepth, firstCentre,
                    inverseCellHeight, centres, rows, tolerance);
            LeakRuns.addRunOrNothing(differences, column[p] * (rows + 1), first, end);
        }
    }

    /** {@link #juxtapositionWindow} for a window met out of column order. */
    private void pairWindow(FaultPlaneFrame frame, int column, int s, double top, double base) {
        if (attic) {
            connection[s] = Math.min(connection[s], top);
            interest[s] = depthOfInterest(s);
        }
        if (top < leak[s] || top == leak[s] && locationFault[s] == frame.index && column < locationColumn[s]) {
            lowerLeak(s, top, frame, column, top);
        }
        if (leakRuns != null) {
            // the windows of a column are disjoint, so their runs are too, in whatever order they come
            leakRuns.addRun(frame.index, column, frame.firstRowCentredAtOrBelow(top),
                    frame.firstRowCentredAtOrBelow(Math.min(base, spill[s])));
        }
    }

    /**
     * Fault rock: rates every point of the fault-plane columns where the previous realisation's leak points were, to
     * bound this realisation's leak depths from above. Realisations differ little, so the bound is usually close, and
     * the scan then works out exact threshold pressures almost only near the leak point. Where the leak point lies is
     * still decided by the scan alone (a point at the bound is rated exactly, so ties resolve as before).
     */
    private void boundFromHints() {
        for (int s = 0; s < hintFault.length; s++) {
            boolean seen = false;
            for (int t = 0; t < s; t++) {
                seen |= hintFault[t] == hintFault[s] && hintColumn[t] == hintColumn[s];
            }
            if (hintFault[s] >= 0 && !seen) {
                boundFromColumn(geometry.faults.get(hintFault[s]), hintColumn[s]);
            }
        }
    }

    /** Lowers the bounds to the free-water levels of the points of one column, rated as the scan rates them. */
    private void boundFromColumn(FaultPlaneFrame frame, int k) {
        double zFw = frame.footwall[k] + in.depthError(frame.x[k], frame.y[k]);
        double throwK = in.throwScale()[frame.index] * (frame.hangingWall[k] - frame.footwall[k]);
        double zHw = zFw + throwK;
        if (!Double.isFinite(zFw) || !Double.isFinite(zHw)) {
            return; // the scan reports it
        }
        boolean onFootwall = frame.compartmentOnFootwall();
        hung.juxtaposeReservoirs(zFw, zHw, Double.POSITIVE_INFINITY, intervals);
        for (int n = 0; n < intervals.count(); n++) {
            int s = slotOfUnit[onFootwall ? intervals.footwallUnit(n) : intervals.hangingWallUnit(n)];
            double faultThrow = throwK >= 0 ? throwK : -throwK;
            double positionShift = refTop - (throwK >= 0 ? zFw : zHw);
            for (double z = intervals.top(n) + INSIDE; z < intervals.base(n); z = nextSample(frame, z)) {
                try {
                    threshold.moveTo(z, faultThrow, z + positionShift);
                    double level = freeWaterLevel(z, threshold.exact());
                    if (level < bound[s]) { // never NaN: that would bar every point
                        bound[s] = level;
                    }
                } catch (RuntimeException e) {
                    // a point the criterion cannot rate gives no bound; the scan reports it if it reaches it
                }
            }
        }
    }

    private void scanFault(FaultPlaneFrame frame) {
        double scale = in.throwScale()[frame.index];
        boolean onFootwall = frame.compartmentOnFootwall();
        attic = frame.index == atticFault;
        for (int s = 0; s < interest.length; s++) {
            interest[s] = depthOfInterest(s);
        }
        for (int k = 0; k < frame.columns; k++) {
            if (!frame.hasData[k]) {
                continue;
            }
            if (columnPerPosition) { // both walls take the thicknesses at the fault-plane column's trace position
                useColumn(in.columns().columnAt(frame.x[k], frame.y[k]));
            }
            double zFw = frame.footwall[k] + in.depthError(frame.x[k], frame.y[k]);
            double throwK = scale * (frame.hangingWall[k] - frame.footwall[k]);
            double zHw = zFw + throwK;
            double deepest = deepestOfInterest(onFootwall ? zFw : zHw);
            if (deepest == Double.NEGATIVE_INFINITY) {
                continue; // no contact in this column can change a result
            }
            hung.juxtaposeReservoirs(zFw, zHw, deepest, intervals);
            lastMarkedRow = -1;
            runFirst = -1;
            for (int n = 0; n < intervals.count(); n++) {
                int s = slotOfUnit[onFootwall ? intervals.footwallUnit(n) : intervals.hangingWallUnit(n)];
                double top = intervals.top(n);
                if (!(top < interest[s])) {
                    continue;
                }
                if (attic) {
                    connection[s] = Math.min(connection[s], top);
                    interest[s] = depthOfInterest(s);
                }
                if (juxtapositionOnly) {
                    juxtapositionWindow(frame, k, s, top, intervals.base(n));
                } else if (throwK >= 0) { // the criterion takes the footwall position s, s - T is in the hanging wall
                    sampleWindow(frame, k, s, top, intervals.base(n), throwK, refTop - zFw,
                            intervals.hangingWallUnit(n), intervals.footwallUnit(n));
                } else {
                    sampleWindow(frame, k, s, top, intervals.base(n), -throwK, refTop - zHw,
                            intervals.footwallUnit(n), intervals.hangingWallUnit(n));
                }
            }
            if (leakRuns != null) {
                flushRun(frame, k);
            }
        }
    }

    /**
     * A contact of unit slot {@code s} starting at or below this depth changes nothing: not the leak depth (its
     * free-water levels lie at or below its points), not the leak map (cells count only above the spill depth), not
     * the connection on the attic fault (it only moves up).
     */
    private double depthOfInterest(int s) {
        double depth = pointInterest(s);
        return attic ? Math.max(depth, connection[s]) : depth;
    }

    /**
     * The depth of interest of one point of a contact of unit slot s: it matters only if its level may lie above, or
     * for the leak depth, at or above the realisation's bound (which the leak depth cannot exceed).
     */
    private double pointInterest(int s) {
        double leakCut = Math.min(leak[s], ceiling[s]);
        return leakRuns != null ? Math.max(leakCut, spill[s]) : leakCut;
    }

    private void lowerLeak(int s, double level, FaultPlaneFrame frame, int column, double z) {
        leak[s] = level;
        locationFault[s] = frame.index;
        locationColumn[s] = column;
        locationDepth[s] = z;
        interest[s] = depthOfInterest(s);
    }

    /**
     * The depth from which on no contact of a fault-plane column matters; -infinity when none does. A contact of unit
     * slot s lies inside that unit on the compartment wall, so it matters only if it starts above the unit's depth of
     * interest, which must then lie below the unit's top there, and above the unit's base there.
     *
     * @param compartmentCutOff the reference horizon's cut-off on the compartment wall
     */
    private double deepestOfInterest(double compartmentCutOff) {
        double deepest = Double.NEGATIVE_INFINITY;
        for (int s = 0; s < interest.length; s++) {
            if (compartmentCutOff + topBelowReference[s] < interest[s]) {
                deepest = Math.max(deepest, Math.min(compartmentCutOff + baseBelowReference[s], interest[s]));
            }
        }
        return deepest;
    }

    /**
     * Juxtaposition only: the window top leaks, and so do the cells centred in the window above the spill depth, a run
     * of rows from the first centred at or below the top to the last centred above the bottom.
     */
    private void juxtapositionWindow(FaultPlaneFrame frame, int column, int s, double top, double base) {
        if (top < leak[s]) {
            lowerLeak(s, top, frame, column, top);
        }
        if (leakRuns == null) {
            return;
        }
        double bottom = Math.min(base, spill[s]);
        int first = Math.max(frame.firstRowCentredAtOrBelow(top), lastMarkedRow + 1); // count each cell once
        int end = frame.firstRowCentredAtOrBelow(bottom);
        if (first < end) {
            markRun(frame, column, first, end);
        }
    }

    /**
     * Fault rock: samples the window at its top and then at every cell centre, down to its base or as long as a point
     * is of interest. The exact threshold pressure is worked out only where its bounds leave open whether the point
     * lowers the leak depth or leaks before spill.
     *
     * @param faultThrow throw, &ge; 0
     * @param positionShift stratigraphic position minus depth of the wall whose position the criterion is given
     * @param topUnit unit at position - throw
     * @param baseUnit unit at the position
     */
    private void sampleWindow(FaultPlaneFrame frame, int column, int s, double top, double base, double faultThrow,
            double positionShift, int topUnit, int baseUnit) {
        double first = top + INSIDE;
        double lowest = threshold.lowerBoundAlong(faultThrow, first + positionShift, base + positionShift, topUnit,
                baseUnit);
        // no point at or below z in this window supports a free-water level shallower than z + rise
        double rise = lowest * thresholdFactor / buoyancyPerMetre;
        for (double z = first; z < base && z + rise < pointInterest(s); z = nextSample(frame, z)) {
            threshold.moveTo(z, faultThrow, z + positionShift);
            double shallowest = freeWaterLevel(z, threshold.lowerBound());
            if (shallowest < leak[s] && shallowest < ceiling[s]) {
                double level = freeWaterLevel(z, threshold.exact());
                if (level < leak[s]) {
                    lowerLeak(s, level, frame, column, z);
                }
            }
            if (leakRuns != null && z > top + INSIDE && shallowest < spill[s]
                    && (freeWaterLevel(z, threshold.upperBound()) < spill[s]
                            || freeWaterLevel(z, threshold.exact()) < spill[s])) {
                mark(frame, column, frame.row(z));
            }
        }
    }

    /** The free-water level a threshold pressure supports at depth z; never falls as the pressure rises. */
    private double freeWaterLevel(double z, double thresholdPressure) {
        return z + thresholdPressure * thresholdFactor / buoyancyPerMetre;
    }

    /** The next sample depth: the centre of the next leak-probability cell below z (cells continue past the frame). */
    private static double nextSample(FaultPlaneFrame frame, double z) {
        double centre = frame.zTop + (Math.floor((z - frame.zTop) / frame.cellHeight) + 0.5) * frame.cellHeight;
        return centre > z ? centre : centre + frame.cellHeight;
    }

    /** Counts a cell once per realisation: a column is scanned once, top down, so a repeat can only be its last row. */
    private void mark(FaultPlaneFrame frame, int column, int row) {
        if (row < 0 || row >= frame.rows || row == lastMarkedRow) {
            return;
        }
        markRun(frame, column, row, row + 1);
    }

    /** Marks rows first .. end - 1 (first past the last marked row), extending the pending run when they follow it. */
    private void markRun(FaultPlaneFrame frame, int column, int first, int end) {
        if (runFirst < 0 || first != lastMarkedRow + 1) {
            flushRun(frame, column);
            runFirst = first;
        }
        lastMarkedRow = end - 1;
    }

    /** Hands the pending run of the column to the leak runs. */
    private void flushRun(FaultPlaneFrame frame, int column) {
        if (runFirst >= 0) {
            leakRuns.addRun(frame.index, column, runFirst, lastMarkedRow + 1);
            runFirst = -1;
        }
    }
}
