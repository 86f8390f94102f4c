package org.faultbench.digitize.ui.editing;

import java.util.Objects;

import org.faultbench.digitize.sketch.ContourValueStepper;
import org.faultbench.digitize.sketch.MarkerKind;
import org.faultbench.digitize.sketch.StepDirection;
import org.faultbench.digitize.sketch.TraceSide;

/**
 * The attributes a newly digitized feature gets, so that a geologist tracing a contour map clicks lines rather than
 * typing: the horizon, the next contour value (stepped by the contour interval after each contour, as the
 * {@link ContourValueStepper} does), the fault name and its hanging-wall side, the marker kind and the next well
 * name (its number stepped after each well). Mutable editor
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
    private String wellName = "W-1";

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

    public String wellName() {
        return wellName;
    }

    public void setWellName(String name) {
        wellName = requireName(name, "well name");
    }

    /** Called after a well named {@code name} was posted: the next one gets the following number. */
    public void wellDrawn(String name) {
        wellName = nextName(name);
    }

    /**
     * The name after {@code name}: its trailing number plus one, keeping leading zeros ("W-09" gives "W-10"), or
     * "-2" appended when it ends in no number.
     */
    public static String nextName(String name) {
        int digits = name.length();
        while (digits > 0 && Character.isDigit(name.charAt(digits - 1))) {
            digits--;
        }
        if (digits == name.length()) {
            return name + "-2";
        }
        String number = name.substring(digits);
        String next = new java.math.BigInteger(number).add(java.math.BigInteger.ONE).toString();
        String padded = "0".repeat(Math.max(0, number.length() - next.length())) + next;
        return name.substring(0, digits) + padded;
    }
}
