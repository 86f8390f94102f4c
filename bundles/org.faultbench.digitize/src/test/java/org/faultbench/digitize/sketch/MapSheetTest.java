package org.faultbench.digitize.sketch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

/** Observable feature collection and undoable edits. */
class MapSheetTest {
    private final MapSheet sheet = new MapSheet();
    private final List<MapSheetEdit> history = new ArrayList<>();

    MapSheetTest() {
        sheet.addListener((changed, edit) -> history.add(edit));
    }

    @Test
    void changesAreAnnouncedAsEdits() {
        ContourFeature contour = Sheets.contour(sheet, 1500, 0, 0, 100, 0);
        ContourFeature moved = new ContourFeature(contour.id(), Sheets.HORIZON, 1510, Sheets.line(0, 10, 100, 10));
        sheet.replace(moved);
        sheet.remove(contour.id());
        assertEquals(List.of(MapSheetEdit.adding(contour), MapSheetEdit.replacing(contour, moved),
                MapSheetEdit.removing(moved)), history);
        assertEquals("add contour 1500 m on Top A", history.get(0).label());
        assertEquals("edit contour 1500 m on Top A", history.get(1).label());
        assertEquals("delete contour 1510 m on Top A", history.get(2).label());
        assertTrue(sheet.features().isEmpty());
    }

    @Test
    void aSnapshotKeepsTheFeaturesOfItsMomentAndNoListeners() {
        ContourFeature contour = Sheets.contour(sheet, 1500, 0, 0, 100, 0);
        MapSheet snapshot = sheet.snapshot();
        int announced = history.size();
        snapshot.remove(contour.id());
        assertEquals(announced, history.size(), "the snapshot tells the sheet's listeners nothing");
        assertEquals(List.of(contour), sheet.features(), "editing the snapshot leaves the sheet alone");
        Sheets.contour(sheet, 1510, 0, 10, 100, 10);
        assertTrue(snapshot.features().isEmpty(), "later sheet edits do not reach the snapshot");
        assertEquals(new FeatureId(2), snapshot.nextId(), "ids continue after the highest the sheet had given");
    }

    @Test
    void idsStayUniqueAndReplacingKeepsTheDrawingOrder() {
        ContourFeature first = Sheets.contour(sheet, 1500, 0, 0, 100, 0);
        FaultTraceFeature trace = new FaultTraceFeature(new FeatureId(7), "F1", Sheets.line(0, 0, 0, 100),
                TraceSide.LEFT);
        sheet.add(trace);
        assertEquals(new FeatureId(8), sheet.nextId(), "ids continue after the highest id added");
        sheet.replace(new ContourFeature(first.id(), Sheets.HORIZON, 1490, first.line()));
        assertEquals(List.of(first.id(), trace.id()), sheet.features().stream().map(SheetFeature::id).toList());
        assertEquals(List.of(trace), sheet.features(FaultTraceFeature.class));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> sheet.add(trace));
        assertTrue(e.getMessage().contains("#7") && e.getMessage().contains("already"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> sheet.remove(new FeatureId(99)));
        assertTrue(e.getMessage().contains("no feature #99"), e.getMessage());
    }

    @Test
    void revertingTheHistoryInReverseRestoresTheSheet() {
        ContourFeature a = Sheets.contour(sheet, 1500, 0, 0, 100, 0);
        ContourFeature b = Sheets.contour(sheet, 1510, 0, 10, 100, 10);
        sheet.replace(new ContourFeature(a.id(), Sheets.HORIZON, 1520, a.line()));
        sheet.remove(b.id());
        List<MapSheetEdit> done = List.copyOf(history);
        for (int k = done.size() - 1; k >= 2; k--) {
            done.get(k).revert(sheet);
        }
        assertEquals(List.of(a, b), sheet.features(), "back to the state after the two additions");
        for (int k = 2; k < done.size(); k++) {
            done.get(k).apply(sheet);
        }
        assertEquals(1, sheet.features().size(), "redo");
        assertEquals(1520, ((ContourFeature) sheet.features().get(0)).depth(), 0);
    }

    @Test
    void staleEditsAreRefused() {
        ContourFeature contour = Sheets.contour(sheet, 1500, 0, 0, 100, 0);
        MapSheetEdit adding = history.get(0);
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> adding.apply(sheet));
        assertTrue(e.getMessage().contains("has changed"), e.getMessage());
        sheet.replace(new ContourFeature(contour.id(), Sheets.HORIZON, 1510, contour.line()));
        assertThrows(IllegalStateException.class, () -> adding.revert(sheet), "sheet holds an edited version");
        assertEquals(2, history.size(), "refused edits change nothing");
    }

    @Test
    void editsNeedAFeatureAndMatchingIds() {
        assertThrows(IllegalArgumentException.class, () -> new MapSheetEdit(null, null));
        ContourFeature a = new ContourFeature(new FeatureId(1), Sheets.HORIZON, 1500, Sheets.line(0, 0, 1, 1));
        ContourFeature b = new ContourFeature(new FeatureId(2), Sheets.HORIZON, 1500, Sheets.line(0, 0, 1, 1));
        assertThrows(IllegalArgumentException.class, () -> MapSheetEdit.replacing(a, b));
        assertNull(MapSheetEdit.adding(a).inverse().after());
    }
}
