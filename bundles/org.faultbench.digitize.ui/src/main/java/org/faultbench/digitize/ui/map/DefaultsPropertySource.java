package org.faultbench.digitize.ui.map;

import java.util.Locale;

import org.eclipse.ui.views.properties.ComboBoxPropertyDescriptor;
import org.eclipse.ui.views.properties.IPropertyDescriptor;
import org.eclipse.ui.views.properties.IPropertySource;
import org.eclipse.ui.views.properties.TextPropertyDescriptor;
import org.faultbench.digitize.sketch.MarkerKind;
import org.faultbench.digitize.sketch.StepDirection;
import org.faultbench.digitize.sketch.TraceSide;
import org.faultbench.digitize.ui.editing.DigitizingDefaults;

/**
 * The digitizing defaults in the Properties view, shown when the empty map is selected: what the next contour,
 * fault, marker or well will get, and the contour interval the value steps by after each contour.
 */
final class DefaultsPropertySource implements IPropertySource {
    private static final String HORIZON = "horizon";
    private static final String NEXT = "nextContour";
    private static final String INTERVAL = "interval";
    private static final String DIRECTION = "direction";
    private static final String FAULT = "fault";
    private static final String SIDE = "side";
    private static final String MARKER = "marker";
    private static final String WELL = "well";

    private final DigitizingDefaults defaults;

    DefaultsPropertySource(DigitizingDefaults defaults) {
        this.defaults = defaults;
    }

    @Override
    public Object getEditableValue() {
        return this;
    }

    @Override
    public IPropertyDescriptor[] getPropertyDescriptors() {
        return new IPropertyDescriptor[] { new TextPropertyDescriptor(HORIZON, "New features: horizon"),
            new TextPropertyDescriptor(NEXT, "Next contour value (m TVDSS)"),
            new TextPropertyDescriptor(INTERVAL, "Contour interval (m)"),
            new ComboBoxPropertyDescriptor(DIRECTION, "Next contour is",
                    Choices.labels(StepDirection.values(), d -> d.name().toLowerCase(Locale.ROOT))),
            new TextPropertyDescriptor(FAULT, "New features: fault"),
            new ComboBoxPropertyDescriptor(SIDE, "New traces: hanging wall (downthrown) side",
                    Choices.labels(TraceSide.values(), s -> s.name().toLowerCase(Locale.ROOT))),
            new ComboBoxPropertyDescriptor(MARKER, "New markers", Choices.labels(MarkerKind.values(),
                    MarkerKind::label)),
            new TextPropertyDescriptor(WELL, "Next well name") };
    }

    @Override
    public Object getPropertyValue(Object key) {
        return switch ((String) key) {
            case HORIZON -> defaults.horizon();
            case NEXT -> ContourLabels.text(defaults.nextContourValue());
            case INTERVAL -> ContourLabels.text(defaults.contourInterval());
            case DIRECTION -> defaults.stepDirection().ordinal();
            case FAULT -> defaults.fault();
            case SIDE -> defaults.hangingWallSide().ordinal();
            case MARKER -> defaults.markerKind().ordinal();
            case WELL -> defaults.wellName();
            default -> null;
        };
    }

    @Override
    public boolean isPropertySet(Object key) {
        return false;
    }

    @Override
    public void resetPropertyValue(Object key) {
        // no defaults to reset to
    }

    @Override
    public void setPropertyValue(Object key, Object value) {
        switch ((String) key) {
            case HORIZON -> defaults.setHorizon((String) value);
            case NEXT -> defaults.setNextContourValue(FeaturePropertySource.parseMetres(value));
            case INTERVAL -> defaults.setContourInterval(FeaturePropertySource.parseMetres(value));
            case DIRECTION -> defaults.setStepDirection(Choices.at(StepDirection.values(), value));
            case FAULT -> defaults.setFault((String) value);
            case SIDE -> defaults.setHangingWallSide(Choices.at(TraceSide.values(), value));
            case MARKER -> defaults.setMarkerKind(Choices.at(MarkerKind.values(), value));
            case WELL -> defaults.setWellName((String) value);
            default -> {
                // read-only
            }
        }
    }
}
