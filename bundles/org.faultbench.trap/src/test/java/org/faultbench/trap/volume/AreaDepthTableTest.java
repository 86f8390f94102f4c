package org.faultbench.trap.volume;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.GridMask;
import org.faultbench.core.grid.RegularGrid;
import org.junit.jupiter.api.Test;

class AreaDepthTableTest {
    private static final double CREST = 2000;

    /** Node spacing 10 m over ±2.5 km around the apex at (0, 0). */
    private static final GridGeometry GEOMETRY = new GridGeometry(501, 501, -2500, -2500, 10, 10);

    private static RegularGrid cone(double slope) {
        return RegularGrid.sample(GEOMETRY, (x, y) -> CREST + slope * Math.hypot(x, y));
    }

    @Test
    void coneVolumeMatchesItsClosedForm() {
        // Cone z = crest + s·r filled 100 m below its apex: V = π h³ / (3 s²) = 1.0472e8 m³ for s = 0.1
        // (analytic, common practice). Node-centred sums converge with spacing; 0.5 % at 10 m.
        AreaDepthTable table = new AreaDepthTable(cone(0.1), GridMask.all(GEOMETRY));
        double h = 100;
        assertEquals(Math.PI * h * h * h / (3 * 0.01), table.grossRockVolume(0, CREST + h, Double.POSITIVE_INFINITY),
                0.005 * 1.0472e8);
        assertEquals(1.0472e8, Math.PI * h * h * h / (3 * 0.01), 1e4);
        // attic above a well that meets the top 50 m below the crest: (50/100)^3 = 12.5 % of the column, 1.3090e7 m³
        assertEquals(1.3090e7, table.grossRockVolume(0, CREST + 50, Double.POSITIVE_INFINITY), 0.005 * 1.3090e7);
    }

    @Test
    void paraboloidVolumeMatchesItsClosedForm() {
        // z = crest + a·r², a = 1e-4, h = 100 m: V = π h² / (2a) = 1.5708e8 m³ (analytic, common practice)
        RegularGrid top = RegularGrid.sample(GEOMETRY, (x, y) -> CREST + 1e-4 * (x * x + y * y));
        double expected = Math.PI * 100 * 100 / (2 * 1e-4);
        assertEquals(1.5708e8, expected, 1e4);
        assertEquals(expected, new AreaDepthTable(top, GridMask.all(GEOMETRY)).grossRockVolume(0, CREST + 100,
                Double.POSITIVE_INFINITY), 0.005 * expected);
    }

    @Test
    void offsetAndBaseClippingEqualTheDirectNodeSum() {
        RegularGrid top = cone(0.05);
        AreaDepthTable table = new AreaDepthTable(top, GridMask.all(GEOMETRY));
        double offset = 12.5;
        double contact = CREST + 70;
        double thickness = 20;
        double direct = 0;
        for (int k = 0; k < GEOMETRY.size(); k++) {
            double z = top.value(k) + offset;
            direct += top.cellArea() * Math.max(0, Math.min(contact, z + thickness) - z);
        }
        // GRV = Σ A·max(0, min(contact, base) − top) (common practice)
        assertEquals(direct, table.grossRockVolume(offset, contact, thickness), 1e-6 * direct);
        assertEquals(0, table.grossRockVolume(offset, CREST, thickness), 0, "contact at the crest holds nothing");
    }

    @Test
    void onlyNodesOfTheCompartmentCount() {
        RegularGrid top = cone(0.1);
        boolean[] east = new boolean[GEOMETRY.size()];
        for (int k = 0; k < east.length; k++) {
            east[k] = top.geometry().x(GEOMETRY.column(k)) > 0;
        }
        AreaDepthTable half = new AreaDepthTable(top, GridMask.of(GEOMETRY, east));
        AreaDepthTable whole = new AreaDepthTable(top, GridMask.all(GEOMETRY));
        double all = whole.grossRockVolume(0, CREST + 100, Double.POSITIVE_INFINITY);
        assertEquals(all / 2, half.grossRockVolume(0, CREST + 100, Double.POSITIVE_INFINITY), 0.01 * all);
    }
}
