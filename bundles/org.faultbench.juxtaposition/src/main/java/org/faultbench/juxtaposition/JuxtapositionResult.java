package org.faultbench.juxtaposition;

import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.function.Predicate;

/**
 * Juxtaposition summary of one fault for one realisation: window area per (footwall unit, hanging-wall unit) pair and
 * the windows themselves, shallowest first. Reservoir/reservoir windows feed the juxtaposition leak point and the
 * shallowest cross-fault connection of a reservoir.
 */
public final class JuxtapositionResult {

    private static final Comparator<JuxtapositionWindow> SHALLOWEST_FIRST =
            Comparator.comparingDouble((JuxtapositionWindow w) -> w.top().z()).thenComparingDouble(w -> w.top().u());

    private final String faultId;
    private final HungColumns walls;
    private final double[] pairArea;
    private final List<JuxtapositionWindow> windows;
    private final int columnsWithoutData;

    JuxtapositionResult(String faultId, HungColumns walls, double[] pairArea, List<JuxtapositionWindow> windows,
            int columnsWithoutData) {
        this.faultId = faultId;
        this.walls = walls;
        this.pairArea = pairArea;
        this.windows = windows.stream().sorted(SHALLOWEST_FIRST).toList();
        this.columnsWithoutData = columnsWithoutData;
    }

    public String faultId() {
        return faultId;
    }

    public HungColumns walls() {
        return walls;
    }

    /** Number of fault-plane columns skipped because a cut-off depth was missing. */
    public int columnsWithoutData() {
        return columnsWithoutData;
    }

    /** Area (m^2) where footwall unit {@code footwallUnit} faces hanging-wall unit {@code hangingWallUnit}. */
    public double area(int footwallUnit, int hangingWallUnit) {
        checkUnit(walls.footwall(), "footwall", footwallUnit);
        checkUnit(walls.hangingWall(), "hanging-wall", hangingWallUnit);
        return pairArea[(footwallUnit + 1) * (walls.hangingWall().size() + 2) + hangingWallUnit + 1];
    }

    /** Total area (m^2) of one juxtaposition class, within the depth span of the two columns. */
    public double area(JuxtapositionClass juxtapositionClass) {
        return windows.stream().filter(w -> w.juxtapositionClass() == juxtapositionClass)
                .mapToDouble(JuxtapositionWindow::area).sum();
    }

    /** Every window, shallowest first. */
    public List<JuxtapositionWindow> windows() {
        return windows;
    }

    /** Reservoir/reservoir windows (self- and cross-juxtaposed), shallowest first. */
    public List<JuxtapositionWindow> reservoirWindows() {
        return select(w -> w.juxtapositionClass() == JuxtapositionClass.RESERVOIR_RESERVOIR);
    }

    /** The shallowest reservoir/reservoir window: the juxtaposition leak point candidate of the fault. */
    public Optional<JuxtapositionWindow> shallowestReservoirWindow() {
        return reservoirWindows().stream().findFirst();
    }

    /** Windows of footwall unit {@code footwallUnit} against any hanging-wall reservoir, shallowest first. */
    public List<JuxtapositionWindow> footwallUnitAgainstHangingWallReservoirs(int footwallUnit) {
        checkUnit(walls.footwall(), "footwall", footwallUnit);
        return select(w -> w.footwallUnit() == footwallUnit && walls.hangingWall().isReservoir(w.hangingWallUnit()));
    }

    /** Windows of hanging-wall unit {@code hangingWallUnit} against any footwall reservoir, shallowest first. */
    public List<JuxtapositionWindow> hangingWallUnitAgainstFootwallReservoirs(int hangingWallUnit) {
        checkUnit(walls.hangingWall(), "hanging-wall", hangingWallUnit);
        return select(w -> w.hangingWallUnit() == hangingWallUnit && walls.footwall().isReservoir(w.footwallUnit()));
    }

    private List<JuxtapositionWindow> select(Predicate<JuxtapositionWindow> filter) {
        return windows.stream().filter(filter).toList();
    }

    private static void checkUnit(HungColumn column, String wall, int unit) {
        if (unit < -1 || unit > column.size()) {
            throw new IllegalArgumentException(wall + " unit index must be in [-1, " + column.size() + "], was " + unit);
        }
    }
}
