package org.faultbench.digitize.gridding;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;

class ContourCrossingsTest {

    @Test
    void firstCrossingPairIsNamedWithItsPosition() {
        // contours 2 and 4 cross at (500, 500) and contours 3 and 4 at (250, 250); the lowest pair is 2 and 4
        List<ContourLine> contours = List.of(new ContourLine(SyntheticHorizons.line(0, 950, 20, 950), 1400),
                new ContourLine(SyntheticHorizons.line(0, 1000, 1000, 0), 1500),
                new ContourLine(SyntheticHorizons.line(0, 500, 500, 0), 1550),
                new ContourLine(SyntheticHorizons.line(0, 0, 800, 800), 1600));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ContourCrossings.requireNone(contours));
        assertEquals("contours 2 (1500.0 m) and 4 (1600.0 m) cross near (500.0, 500.0); contours of different depth"
                + " may not meet", e.getMessage());
    }

    @Test
    void touchingEndToSideCounts() {
        List<ContourLine> contours = List.of(new ContourLine(SyntheticHorizons.line(0, 0, 1000, 0), 1500),
                new ContourLine(SyntheticHorizons.line(400, 0, 400, 600), 1510));
        assertThrows(IllegalArgumentException.class, () -> ContourCrossings.requireNone(contours));
    }

    @Test
    void contoursOfOneDepthMayMeetAndParallelOnesPass() {
        List<ContourLine> contours = List.of(new ContourLine(SyntheticHorizons.line(0, 0, 1000, 1000), 1500),
                new ContourLine(SyntheticHorizons.line(0, 1000, 1000, 0), 1500),
                new ContourLine(SyntheticHorizons.line(0, 20, 100, 120), 1490));
        assertDoesNotThrow(() -> ContourCrossings.requireNone(contours));
    }
}
