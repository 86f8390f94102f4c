package org.faultbench.faults.scaling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.faultbench.faults.Fault;
import org.faultbench.faults.profile.BellProfile;
import org.faultbench.faults.profile.ThrowProfile;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

class DisplacementLengthDataTest {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    /** Vertical fault (throw = displacement) whose bell profile has D = 0.03 L. */
    private static Fault fault(String id, double length) {
        return new Fault(id, "Fault " + id, GEOMETRY.createLineString(new Coordinate[] {
            new Coordinate(0, 0), new Coordinate(length, 0)}), 90, 180, true);
    }

    private static ThrowProfile profile(String id, String horizon, double length, double dmax) {
        double[] u = new double[41];
        double[] t = new double[41];
        BellProfile bell = new BellProfile();
        for (int i = 0; i < u.length; i++) {
            u[i] = length * i / 40;
            t[i] = dmax * bell.value((u[i] - length / 2) / (length / 2));
        }
        return new ThrowProfile(id, horizon, u, t);
    }

    @Test
    void pointsAndTheLocalLawRecoverSchlischesRatio() {
        Map<Fault, List<ThrowProfile>> faults = new LinkedHashMap<>();
        for (double length : new double[] {500, 2000, 8000, 30_000}) {
            String id = "f" + (int) length;
            // deeper horizon with less throw: the point must come from the horizon with the largest throw
            faults.put(fault(id, length), List.of(profile(id, "Top A", length, 0.02 * length),
                    profile(id, "Base A", length, 0.03 * length)));
        }
        faults.put(fault("bare", 1000), List.of());
        DisplacementLengthData data = DisplacementLengthData.collect(faults, new BellProfile());

        assertEquals(4, data.points().size());
        for (DisplacementLengthPoint point : data.points()) {
            assertEquals("Base A", point.horizon());
            // Schlische et al. 1996, Geology 24: D = 0.03 L
            assertEquals(0.03, point.ratio(), 1e-4, point.faultId());
            assertEquals(0, point.log10Offset(ScalingLaws.SCHLISCHE_1996), 1e-3, point.faultId());
        }
        assertEquals(1, data.skipped().size());
        assertTrue(data.skipped().get(0).contains("Fault bare"), data.skipped().get(0));

        ScalingLaw local = data.localLaw().orElseThrow();
        assertEquals(0.03, local.c(), 1e-3);
        assertEquals(1, local.n(), 1e-3);
    }

    @Test
    void displacementIsThrowOverTheSineOfDip() {
        Fault dipping = new Fault("d", "Dipping", GEOMETRY.createLineString(new Coordinate[] {
            new Coordinate(0, 0), new Coordinate(2000, 0)}), 30, 180, true);
        DisplacementLengthData data = DisplacementLengthData.collect(Map.of(dipping,
                List.of(profile("d", "Top A", 2000, 50))), new BellProfile());
        // hand calculation: 50 m throw / sin 30 degrees = 100 m displacement
        assertEquals(100, data.points().get(0).maxDisplacement(), 0.01);
        assertTrue(data.localLaw().isEmpty(), "one point gives no law");
    }
}
