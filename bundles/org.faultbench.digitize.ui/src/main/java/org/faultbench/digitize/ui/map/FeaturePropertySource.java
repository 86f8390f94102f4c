package org.faultbench.digitize.ui.map;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.eclipse.ui.views.properties.ComboBoxPropertyDescriptor;
import org.eclipse.ui.views.properties.IPropertyDescriptor;
import org.eclipse.ui.views.properties.IPropertySource;
import org.eclipse.ui.views.properties.PropertyDescriptor;
import org.eclipse.ui.views.properties.TextPropertyDescriptor;
import org.faultbench.digitize.io.WellTop;
import org.faultbench.digitize.sketch.ContourFeature;
import org.faultbench.digitize.sketch.CutOffFeature;
import org.faultbench.digitize.sketch.FaultPolygonFeature;
import org.faultbench.digitize.sketch.FaultTraceFeature;
import org.faultbench.digitize.sketch.FeatureId;
import org.faultbench.digitize.sketch.MapSheet;
import org.faultbench.digitize.sketch.MarkerFeature;
import org.faultbench.digitize.sketch.MarkerKind;
import org.faultbench.digitize.sketch.SheetFeature;
import org.faultbench.digitize.sketch.TraceSide;
import org.faultbench.digitize.sketch.Wall;
import org.faultbench.digitize.sketch.WellFeature;
import org.faultbench.digitize.ui.editing.WellTopsText;

/**
 * A selected feature in the Properties view: kind, id, horizon, contour value, fault, wall, hanging-wall side,
 * vertex count and length. Edits replace the feature on the sheet; the editor's property page wraps each one in a
 * command, so they are undone like drawing.
 */
final class FeaturePropertySource implements IPropertySource {
    static final String KIND = "kind";
    static final String ID = "id";
    static final String HORIZON = "horizon";
    static final String DEPTH = "depth";
    static final String FAULT = "fault";
    static final String WALL = "wall";
    static final String SIDE = "hangingWallSide";
    static final String MARKER = "marker";
    static final String VERTICES = "vertices";
    static final String LENGTH = "length";
    static final String WELL_NAME = "wellName";
    static final String TOPS = "tops";

    private final MapSheet sheet;
    private final FeatureId id;

    FeaturePropertySource(MapSheet sheet, FeatureId id) {
        this.sheet = sheet;
        this.id = id;
    }

    private SheetFeature feature() {
        return sheet.require(id);
    }

    @Override
    public Object getEditableValue() {
        return this;
    }

    @Override
    public IPropertyDescriptor[] getPropertyDescriptors() {
        SheetFeature f = feature();
        List<IPropertyDescriptor> d = new ArrayList<>();
        d.add(readOnly(KIND, "Kind"));
        d.add(readOnly(ID, "Id"));
        if (f instanceof ContourFeature) {
            d.add(new TextPropertyDescriptor(DEPTH, "Contour value (m TVDSS)"));
        }
        if (!(f instanceof FaultTraceFeature) && !(f instanceof WellFeature)) {
            d.add(new TextPropertyDescriptor(HORIZON, "Horizon"));
        }
        if (f instanceof FaultTraceFeature || f instanceof FaultPolygonFeature || f instanceof CutOffFeature) {
            d.add(new TextPropertyDescriptor(FAULT, "Fault"));
        }
        if (f instanceof CutOffFeature) {
            d.add(new ComboBoxPropertyDescriptor(WALL, "Wall", Choices.labels(Wall.values(), Wall::label)));
        }
        if (f instanceof FaultTraceFeature) {
            d.add(new ComboBoxPropertyDescriptor(SIDE, "Hanging wall (downthrown) side",
                    Choices.labels(TraceSide.values(), s -> s.name().toLowerCase(Locale.ROOT))));
        }
        if (f instanceof WellFeature) {
            d.add(new TextPropertyDescriptor(WELL_NAME, "Well name"));
            d.add(new TextPropertyDescriptor(TOPS, "Tops (surface = m TVDSS; ...)"));
        }
        if (f instanceof MarkerFeature) {
            d.add(new ComboBoxPropertyDescriptor(MARKER, "Marker", Choices.labels(MarkerKind.values(),
                    MarkerKind::label)));
        }
        d.add(readOnly(VERTICES, "Vertices"));
        d.add(readOnly(LENGTH, "Length (m)"));
        return d.toArray(IPropertyDescriptor[]::new);
    }

    private static PropertyDescriptor readOnly(String key, String label) {
        return new PropertyDescriptor(key, label);
    }

    @Override
    public Object getPropertyValue(Object key) {
        SheetFeature f = feature();
        return switch ((String) key) {
            case KIND -> kindOf(f);
            case ID -> f.id().toString();
            case DEPTH -> ContourLabels.text(((ContourFeature) f).depth());
            case HORIZON -> horizonOf(f);
            case FAULT -> faultOf(f);
            case WALL -> ((CutOffFeature) f).wall().ordinal();
            case SIDE -> ((FaultTraceFeature) f).hangingWallSide().ordinal();
            case MARKER -> ((MarkerFeature) f).kind().ordinal();
            case WELL_NAME -> ((WellFeature) f).name();
            case TOPS -> WellTopsText.format(((WellFeature) f).tops());
            case VERTICES -> String.valueOf(f.geometry().getNumPoints());
            case LENGTH -> String.format(Locale.ROOT, "%.1f", f.geometry().getLength());
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
        SheetFeature f = feature();
        SheetFeature edited = switch ((String) key) {
            case DEPTH -> {
                ContourFeature c = (ContourFeature) f;
                yield new ContourFeature(c.id(), c.horizon(), parseMetres(value), c.line());
            }
            case HORIZON -> withHorizon(f, (String) value);
            case FAULT -> withFault(f, (String) value);
            case WALL -> {
                CutOffFeature c = (CutOffFeature) f;
                yield new CutOffFeature(c.id(), c.fault(), c.horizon(), Choices.at(Wall.values(), value), c.line());
            }
            case SIDE -> {
                FaultTraceFeature t = (FaultTraceFeature) f;
                yield new FaultTraceFeature(t.id(), t.fault(), t.trace(), Choices.at(TraceSide.values(), value));
            }
            case MARKER -> {
                MarkerFeature m = (MarkerFeature) f;
                yield new MarkerFeature(m.id(), Choices.at(MarkerKind.values(), value), m.x(), m.y(), m.horizon(),
                        m.note());
            }
            case WELL_NAME -> renamed((WellFeature) f, (String) value);
            case TOPS -> {
                WellFeature w = (WellFeature) f;
                yield new WellFeature(w.id(), w.name(), w.x(), w.y(), WellTopsText.parse((String) value, w));
            }
            default -> f;
        };
        if (!edited.equals(f)) {
            sheet.replace(edited);
        }
    }

    /** The well under a new name, its tops carried over (each top names its well). */
    private static WellFeature renamed(WellFeature w, String name) {
        String newName = name == null ? "" : name.strip();
        return new WellFeature(w.id(), newName, w.x(), w.y(), w.tops().stream()
                .map(t -> new WellTop(newName.isEmpty() ? t.well() : newName, t.surface(), t.x(), t.y(), t.tvdss(),
                        t.md()))
                .toList());
    }

    static double parseMetres(Object value) {
        try {
            return Double.parseDouble(String.valueOf(value).strip());
        } catch (NumberFormatException notANumber) {
            throw new IllegalArgumentException("contour value must be a number of metres, was '" + value + "'");
        }
    }

    static String kindOf(SheetFeature f) {
        if (f instanceof ContourFeature) {
            return "Contour";
        } else if (f instanceof FaultTraceFeature) {
            return "Fault trace";
        } else if (f instanceof FaultPolygonFeature) {
            return "Fault polygon";
        } else if (f instanceof CutOffFeature c) {
            return c.wall() == Wall.FOOTWALL ? "Footwall cut-off" : "Hanging-wall cut-off";
        } else if (f instanceof MarkerFeature m) {
            return "Marker: " + m.kind().label();
        }
        return "Well";
    }

    private static String horizonOf(SheetFeature f) {
        if (f instanceof ContourFeature c) {
            return c.horizon();
        } else if (f instanceof FaultPolygonFeature p) {
            return p.horizon();
        } else if (f instanceof CutOffFeature c) {
            return c.horizon();
        } else if (f instanceof MarkerFeature m) {
            return m.horizon();
        }
        return "";
    }

    private static String faultOf(SheetFeature f) {
        if (f instanceof FaultTraceFeature t) {
            return t.fault();
        } else if (f instanceof FaultPolygonFeature p) {
            return p.fault();
        } else if (f instanceof CutOffFeature c) {
            return c.fault();
        }
        return "";
    }

    private static SheetFeature withHorizon(SheetFeature f, String horizon) {
        if (f instanceof ContourFeature c) {
            return new ContourFeature(c.id(), horizon, c.depth(), c.line());
        } else if (f instanceof FaultPolygonFeature p) {
            return new FaultPolygonFeature(p.id(), p.fault(), horizon, p.outline());
        } else if (f instanceof CutOffFeature c) {
            return new CutOffFeature(c.id(), c.fault(), horizon, c.wall(), c.line());
        } else if (f instanceof MarkerFeature m) {
            return new MarkerFeature(m.id(), m.kind(), m.x(), m.y(), horizon, m.note());
        }
        return f;
    }

    private static SheetFeature withFault(SheetFeature f, String fault) {
        if (f instanceof FaultTraceFeature t) {
            return new FaultTraceFeature(t.id(), fault, t.trace(), t.hangingWallSide());
        } else if (f instanceof FaultPolygonFeature p) {
            return new FaultPolygonFeature(p.id(), fault, p.horizon(), p.outline());
        } else if (f instanceof CutOffFeature c) {
            return new CutOffFeature(c.id(), fault, c.horizon(), c.wall(), c.line());
        }
        return f;
    }
}
