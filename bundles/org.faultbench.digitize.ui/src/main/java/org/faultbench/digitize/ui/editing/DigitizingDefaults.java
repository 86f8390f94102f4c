package org.faultbench.digitize.ui.editing;

import java.util.Objects;

import org.faultbench.digitize.sketch.ContourValueStepper;
import org.faultbench.digitize.sketch.MarkerKind;
import org.faultbench.digitize.sketch.StepDirection;
import org.faultbench.digitize.sketch.TraceSide;

/**
 * The attributes a newly digitized feature gets, so that a geologist tracing a contour map clicks lines rather than
 * typing: the horizon, the next contour value (stepped by the contour interval after each contour, as the
 * {@link ContourValueStepper} does), the fault name and its hanging-wall side, and the marker kind. Mutable editor
 * state, not part of the saved sheet.
 */
public final class DigitizingDefaults {
    private String horizon = "Horizon";
    private double nextContourValue = 1500;
    private double contourInterval = 10;
    private StepDirection stepDirection = StepDirection.DEEPER;
    private String fault = "F1";
    private TraceSide hangingWallSide = TraceSide.RIGHT;
    private MarkerKind markerKind = MarkerKind.CREST;

    public String horizon() {
        return horizon;
    }

    public void setHorizon(String horizon) {
        this.horizon = requireName(horizon, "horizon name");
    }

    public double nextContourValue() {
        return nextContourValue;
    }

    public void setNextContourValue(double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("next contour value must be a finite number of metres, was " + value);
        }
        nextContourValue = value;
    }

    public double contourInterval() {
        return contourInterval;
    }

    public void setContourInterval(double interval) {
        new ContourValueStepper(interval); // validates with the model's wording
        contourInterval = interval;
    }

    public StepDirection stepDirection() {
        return stepDirection;
    }

    public void setStepDirection(StepDirection direction) {
        stepDirection = Objects.requireNonNull(direction, "step direction");
    }

    /** Called after a contour of {@code value} was drawn: the next one is one interval further. */
    public void contourDrawn(double value) {
        nextContourValue = new ContourValueStepper(contourInterval).next(value, stepDirection);
    }

    public String fault() {
        return fault;
    }

    public void setFault(String fault) {
        this.fault = requireName(fault, "fault name");
    }

    public TraceSide hangingWallSide() {
        return hangingWallSide;
    }

    public void setHangingWallSide(TraceSide side) {
        hangingWallSide = Objects.requireNonNull(side, "hanging-wall side");
    }

    public MarkerKind markerKind() {
        return markerKind;
    }

    public void setMarkerKind(MarkerKind kind) {
        markerKind = Objects.requireNonNull(kind, "marker kind");
    }

    private static String requireName(String name, String field) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException(field + " is empty");
        }
        return name.strip();
    }
}
