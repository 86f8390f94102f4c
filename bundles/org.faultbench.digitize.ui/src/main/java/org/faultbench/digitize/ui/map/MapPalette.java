package org.faultbench.digitize.ui.map;

import org.eclipse.gef.palette.MarqueeToolEntry;
import org.eclipse.gef.palette.PaletteGroup;
import org.eclipse.gef.palette.PaletteRoot;
import org.eclipse.gef.palette.PaletteSeparator;
import org.eclipse.gef.palette.SelectionToolEntry;
import org.eclipse.gef.palette.ToolEntry;
import org.faultbench.digitize.ui.editing.DigitizeKind;

/** The map editor's palette: Select, Marquee, then one digitizing tool per feature kind and the control point. */
public final class MapPalette {

    private MapPalette() {
    }

    public static PaletteRoot create() {
        PaletteRoot root = new PaletteRoot();
        PaletteGroup selection = new PaletteGroup("Select");
        SelectionToolEntry select = new SelectionToolEntry("Select", "Select, move and reshape features");
        selection.add(select);
        selection.add(new MarqueeToolEntry("Marquee", "Select the features inside a rectangle"));
        root.add(selection);
        root.add(new PaletteSeparator());
        PaletteGroup digitize = new PaletteGroup("Digitize");
        for (DigitizeKind kind : DigitizeKind.values()) {
            digitize.add(entry(kind));
        }
        root.add(digitize);
        root.setDefaultEntry(select);
        return root;
    }

    /** The palette entry of the tool that digitizes {@code kind}. */
    static ToolEntry entry(DigitizeKind kind) {
        String description = kind.isPoint() ? "Click to place a " + kind.label().toLowerCase()
                : "Click the points of the " + kind.label().toLowerCase() + "; double-click or Enter ends it,"
                        + " Escape cancels, Backspace removes the last point";
        ToolEntry entry = new ToolEntry(kind.label(), description, PaletteIcons.of(kind), PaletteIcons.of(kind),
                DigitizeTool.class) {
        };
        entry.setToolProperty(DigitizeTool.KIND, kind);
        entry.setId(kind.name());
        return entry;
    }
}
