package org.faultbench.juxtaposition;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.faults.Wall;

/**
 * The footwall and hanging-wall columns of one fault, both hung from the same reference horizon. Each wall has its
 * own column so thickness changes across growth faults are honoured. Computes, for one fault-plane column, the exact
 * depth intervals where footwall unit i faces hanging-wall unit j by merging the two sorted boundary lists.
 */
public final class HungColumns {

    private final HungColumn footwall;
    private final HungColumn hangingWall;

    /**
     * @param footwall footwall column (one realisation)
     * @param hangingWall hanging-wall column; may be the same object as {@code footwall}
     * @param referenceUnit index of the unit whose top is the reference horizon, valid in both columns
     */
    public HungColumns(ResolvedColumn footwall, ResolvedColumn hangingWall, int referenceUnit) {
        this.footwall = new HungColumn(footwall, referenceUnit, "footwall");
        this.hangingWall = new HungColumn(hangingWall, referenceUnit, "hanging-wall");
    }

    public HungColumn footwall() {
        return footwall;
    }

    public HungColumn hangingWall() {
        return hangingWall;
    }

    public HungColumn wall(Wall wall) {
        return wall == Wall.FOOTWALL ? footwall : hangingWall;
    }

    /**
     * Fills {@code out} with the juxtaposition intervals of one fault-plane column, shallowest first, covering depth
     * from the shallower column top to the deeper column base without gaps; zero-length intervals are left out.
     * Allocates nothing once {@code out} has grown to size.
     *
     * @param footwallCutOff footwall cut-off depth of the reference horizon (m, positive down)
     * @param hangingWallCutOff hanging-wall cut-off depth of the reference horizon
     */
    public void juxtapose(double footwallCutOff, double hangingWallCutOff, ColumnIntervals out) {
        checkDepth("footwall", footwallCutOff);
        checkDepth("hanging-wall", hangingWallCutOff);
        int lastFootwall = footwall.size();
        int lastHangingWall = hangingWall.size();
        out.reset(lastFootwall + lastHangingWall + 2);
        int i = -1;
        int j = -1;
        double z = Math.min(footwallCutOff + footwall.boundary(0), hangingWallCutOff + hangingWall.boundary(0));
        while (true) {
            while (i < lastFootwall && footwallCutOff + footwall.boundary(i + 1) <= z) {
                i++;
            }
            while (j < lastHangingWall && hangingWallCutOff + hangingWall.boundary(j + 1) <= z) {
                j++;
            }
            double next = Math.min(
                    i < lastFootwall ? footwallCutOff + footwall.boundary(i + 1) : Double.POSITIVE_INFINITY,
                    j < lastHangingWall ? hangingWallCutOff + hangingWall.boundary(j + 1) : Double.POSITIVE_INFINITY);
            if (next == Double.POSITIVE_INFINITY) {
                return;
            }
            out.add(z, next, i, j, JuxtapositionClass.of(footwall.isReservoir(i), hangingWall.isReservoir(j)));
            z = next;
        }
    }

    /**
     * Fills {@code out} with the reservoir-against-reservoir intervals of {@link #juxtapose} that start shallower than
     * {@code shallowerThan}, shallowest first: the same intervals, to the last bit, found by pairing the reservoir
     * units of the two walls instead of walking every unit boundary. Leak-point searches in Monte Carlo loops look at
     * nothing else, and usually only down to some depth, so they skip the sealing intervals and the deep ones.
     *
     * @param shallowerThan depth below which no interval is wanted; +infinity for all
     */
    public void juxtaposeReservoirs(double footwallCutOff, double hangingWallCutOff, double shallowerThan,
            ColumnIntervals out) {
        checkDepth("footwall", footwallCutOff);
        checkDepth("hanging-wall", hangingWallCutOff);
        out.reset(footwall.reservoirCount() + hangingWall.reservoirCount());
        int a = 0;
        int b = 0;
        while (a < footwall.reservoirCount() && b < hangingWall.reservoirCount()) {
            int i = footwall.reservoirUnit(a);
            int j = hangingWall.reservoirUnit(b);
            // the expressions of juxtapose(), so that tops and bases are the same doubles
            double top = Math.max(footwallCutOff + footwall.boundary(i), hangingWallCutOff + hangingWall.boundary(j));
            if (!(top < shallowerThan)) {
                return; // both walls only go deeper from here
            }
            double footwallBase = footwallCutOff + footwall.boundary(i + 1);
            double hangingWallBase = hangingWallCutOff + hangingWall.boundary(j + 1);
            double base = Math.min(footwallBase, hangingWallBase);
            if (top < base) {
                out.add(top, base, i, j, JuxtapositionClass.RESERVOIR_RESERVOIR);
            }
            if (footwallBase <= hangingWallBase) {
                a++;
            }
            if (hangingWallBase <= footwallBase) {
                b++;
            }
        }
    }

    private static void checkDepth(String wall, double depth) {
        if (!Double.isFinite(depth)) {
            throw new IllegalArgumentException(wall + " cut-off depth must be a finite number, was " + depth);
        }
    }
}
